import { vi } from "vitest";

export interface StubRequest {
  method: string;
  path: string;
  search: URLSearchParams;
  body: unknown;
}

type Handler = (req: StubRequest) => { status?: number; body?: unknown } | undefined;

/**
 * Replaces fetch for one test with a tiny in-memory server: each request is recorded and
 * answered by the handler (unanswered requests get a 404 in the API's error shape). The
 * real api-client, QueryClient and hooks run unchanged on top of it.
 */
export function stubFetch(handler: Handler) {
  const calls: StubRequest[] = [];
  const fn = vi.fn((input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
    const url = new URL(typeof input === "string" ? input : input instanceof URL ? input.href : input.url);
    const raw = init?.body;
    const req: StubRequest = {
      method: (init?.method ?? "GET").toUpperCase(),
      path: url.pathname,
      search: url.searchParams,
      body: typeof raw === "string" ? JSON.parse(raw) : raw ?? null,
    };
    calls.push(req);
    const answer = handler(req) ?? { status: 404, body: { error: { code: "not_found", message: `No route ${req.method} ${req.path}` } } };
    return Promise.resolve(
      new Response(answer.body === undefined ? null : JSON.stringify(answer.body), {
        status: answer.status ?? 200,
        headers: { "Content-Type": "application/json" },
      }),
    );
  });
  vi.stubGlobal("fetch", fn);
  return { calls, count: (method: string, path: string) => calls.filter((c) => c.method === method && c.path === path).length };
}
