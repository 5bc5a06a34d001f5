import { issueDetails } from "@plumeline/contracts";
import type { z } from "zod";
import { ApiError, apiErrorFromBody } from "./api-error";
import { env } from "./env";

type Query = Record<string, string | number | boolean | undefined | null>;

interface RequestOptions<T> {
  query?: Query;
  body?: unknown;
  /** Optional contracts schema: the response is parsed with it so a drifted API fails loudly. */
  schema?: z.ZodType<T>;
  signal?: AbortSignal;
}

type UnauthorizedListener = (error: ApiError) => void;
const unauthorizedListeners = new Set<UnauthorizedListener>();

/** The app shell subscribes here to send an expired session back to sign-in with a message. */
export function onUnauthorized(listener: UnauthorizedListener): () => void {
  unauthorizedListeners.add(listener);
  return () => unauthorizedListeners.delete(listener);
}

export function buildUrl(path: string, query?: Query): string {
  const url = new URL(path, env.apiOrigin);
  for (const [k, v] of Object.entries(query ?? {})) {
    if (v !== undefined && v !== null && v !== "") url.searchParams.set(k, String(v));
  }
  return url.toString();
}

async function request<T>(method: string, path: string, opts: RequestOptions<T> = {}): Promise<T> {
  const isForm = typeof FormData !== "undefined" && opts.body instanceof FormData;
  let res: Response;
  try {
    res = await fetch(buildUrl(path, opts.query), {
      method,
      credentials: "include",
      headers: {
        Accept: "application/json",
        ...(opts.body !== undefined && !isForm ? { "Content-Type": "application/json" } : {}),
      },
      body: opts.body === undefined ? undefined : isForm ? (opts.body as FormData) : JSON.stringify(opts.body),
      signal: opts.signal,
    });
  } catch (e) {
    if ((e as Error).name === "AbortError") throw e;
    throw new ApiError(0, "network_error", "The server could not be reached. Check your connection and try again.");
  }

  const text = await res.text();
  let body: unknown = null;
  if (text) {
    try {
      body = JSON.parse(text);
    } catch {
      body = text;
    }
  }
  if (!res.ok) {
    const error = apiErrorFromBody(res.status, body, `${method} ${path} failed with status ${res.status}`);
    if (res.status === 401) unauthorizedListeners.forEach((l) => l(error));
    throw error;
  }
  if (opts.schema) {
    const parsed = opts.schema.safeParse(body);
    if (!parsed.success) {
      throw new ApiError(
        res.status,
        "unexpected_response",
        `The server's answer to ${method} ${path} did not have the expected shape`,
        issueDetails(parsed.error),
      );
    }
    return parsed.data;
  }
  return body as T;
}

/** The one HTTP client: JSON in and out, cookies included, errors as ApiError. */
export const api = {
  get: <T>(path: string, opts?: Omit<RequestOptions<T>, "body">) => request<T>("GET", path, opts),
  post: <T>(path: string, body?: unknown, opts?: Omit<RequestOptions<T>, "body">) =>
    request<T>("POST", path, { ...opts, body: body ?? {} }),
  patch: <T>(path: string, body: unknown, opts?: Omit<RequestOptions<T>, "body">) => request<T>("PATCH", path, { ...opts, body }),
  put: <T>(path: string, body: unknown, opts?: Omit<RequestOptions<T>, "body">) => request<T>("PUT", path, { ...opts, body }),
  delete: <T>(path: string, opts?: Omit<RequestOptions<T>, "body">) => request<T>("DELETE", path, opts),
};
