import { renderHook, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { testQueryClient, wrapperFor } from "@/testing/render-with-client";
import { impactFixture } from "../testing/impact-fixture";
import { getModelVersionImpactQueryOptions, useModelVersionImpact } from "./get-model-version-impact";

afterEach(() => vi.unstubAllGlobals());

describe("useModelVersionImpact", () => {
  it("keys each preview by version, comparison, pathway and members under the model-versions root", () => {
    expect(getModelVersionImpactQueryOptions("mv-3").queryKey).toEqual(["model-versions", "impact", "mv-3", { againstId: null, pathwayIds: null, members: null }]);
    expect(getModelVersionImpactQueryOptions("mv-3", { againstId: "mv-1", members: 500 }).queryKey).toEqual([
      "model-versions",
      "impact",
      "mv-3",
      { againstId: "mv-1", pathwayIds: null, members: 500 },
    ]);
  });

  it("POSTs the choices once, parses the answer, and does not ask again on a second mount", async () => {
    const server = stubFetch((req) => (req.method === "POST" && req.path === "/api/model-versions/mv-3/impact" ? { body: impactFixture() } : undefined));
    const client = testQueryClient();
    const wrapper = wrapperFor(client);
    const first = renderHook(() => useModelVersionImpact("mv-3", { members: 2000 }), { wrapper });
    await waitFor(() => expect(first.result.current.data?.pathways[0]?.pathway.name).toBe("Harbourline Middle"));
    expect(server.calls[0]).toMatchObject({ method: "POST", body: { members: 2000 } });
    renderHook(() => useModelVersionImpact("mv-3", { members: 2000 }), { wrapper });
    await new Promise((r) => setTimeout(r, 20));
    expect(server.count("POST", "/api/model-versions/mv-3/impact")).toBe(1);
  });

  it("waits while disabled and surfaces the server's 400 as an error", async () => {
    const server = stubFetch(() => ({
      status: 400,
      body: { error: { code: "validation_failed", message: "The request has invalid fields.", details: [{ path: "againstId", message: "has no parent" }] } },
    }));
    const wrapper = wrapperFor(testQueryClient());
    const idle = renderHook(() => useModelVersionImpact("mv-3", {}, { enabled: false }), { wrapper });
    await new Promise((r) => setTimeout(r, 20));
    expect(idle.result.current.fetchStatus).toBe("idle");
    expect(server.calls).toHaveLength(0);
    const failing = renderHook(() => useModelVersionImpact("mv-3"), { wrapper });
    await waitFor(() => expect(failing.result.current.isError).toBe(true));
    expect(failing.result.current.error).toMatchObject({ status: 400, details: [{ path: "againstId", message: "has no parent" }] });
  });
});
