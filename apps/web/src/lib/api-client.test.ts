import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { api, onUnauthorized } from "./api-client";
import { ApiError } from "./api-error";

afterEach(() => vi.unstubAllGlobals());

describe("api client", () => {
  it("turns the API's error body into a typed ApiError with field details", async () => {
    stubFetch(() => ({
      status: 400,
      body: { error: { code: "validation_failed", message: "The request has 1 problem", details: [{ path: "members", message: "must be at least 1" }] } },
    }));
    const err = await api.post("/api/runs", { members: 0 }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiError);
    expect(err).toMatchObject({ status: 400, code: "validation_failed", message: "The request has 1 problem" });
    expect((err as ApiError).fieldMessages()).toEqual({ members: "must be at least 1" });
  });

  it("keeps the server's 403 reason for the screen", async () => {
    stubFetch(() => ({ status: 403, body: { error: { code: "forbidden", message: "You cannot approve a version you wrote" } } }));
    await expect(api.post("/api/model-versions/x/approve", { comment: "ok" })).rejects.toMatchObject({ status: 403, message: "You cannot approve a version you wrote" });
  });

  it("tells listeners when the session has ended (401)", async () => {
    stubFetch(() => ({ status: 401, body: { error: { code: "unauthorized", message: "Sign in first" } } }));
    const heard = vi.fn();
    const stop = onUnauthorized(heard);
    await api.get("/api/runs").catch(() => undefined);
    stop();
    expect(heard).toHaveBeenCalledTimes(1);
    expect(heard.mock.calls[0]![0]).toMatchObject({ status: 401, code: "unauthorized" });
  });

  it("reports an unreachable server as status 0", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => Promise.reject(new TypeError("Failed to fetch"))));
    await expect(api.get("/api/me")).rejects.toMatchObject({ status: 0, code: "network_error" });
  });

  it("rejects an answer that does not match the contracts schema", async () => {
    stubFetch(() => ({ body: { user: null } }));
    const { meSchema } = await import("@plumeline/contracts");
    await expect(api.get("/api/me", { schema: meSchema })).rejects.toMatchObject({ code: "unexpected_response" });
  });
});
