import { act, renderHook, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { modelVersion } from "@/testing/api-fixtures";
import { stubFetch } from "@/testing/fetch-stub";
import { testQueryClient, wrapperFor } from "@/testing/render-with-client";
import { getModelVersionQueryOptions, useModelVersion } from "./get-model-version";
import { getModelVersionsQueryOptions, useModelVersions } from "./get-model-versions";
import { useTransitionModelVersion } from "./transition-model-version";

afterEach(() => vi.unstubAllGlobals());

describe("model-version hooks", () => {
  it("owns one key per list filter and per version", () => {
    expect(getModelVersionsQueryOptions({ status: "in-review" }).queryKey).toEqual(["model-versions", "list", { status: "in-review" }]);
    expect(getModelVersionQueryOptions("mv-2").queryKey).toEqual(["model-versions", "detail", "mv-2"]);
  });

  it("an approval updates the version and refreshes the review queue", async () => {
    let status: "in-review" | "approved" = "in-review";
    const server = stubFetch((req) => {
      if (req.method === "GET" && req.path === "/api/model-versions") return { body: status === "in-review" ? { items: [modelVersion()], total: 1 } : { items: [], total: 0 } };
      if (req.method === "GET" && req.path === "/api/model-versions/mv-2") return { body: modelVersion({ status }) };
      if (req.method === "POST" && req.path === "/api/model-versions/mv-2/approve") {
        status = "approved";
        return { body: modelVersion({ status: "approved", decisionComment: (req.body as { comment: string }).comment }) };
      }
      return undefined;
    });
    const client = testQueryClient();
    const wrapper = wrapperFor(client);
    const queue = renderHook(() => useModelVersions({ status: "in-review" }), { wrapper });
    const detail = renderHook(() => useModelVersion("mv-2"), { wrapper });
    await waitFor(() => expect(queue.result.current.data?.items).toHaveLength(1));
    await waitFor(() => expect(detail.result.current.data?.status).toBe("in-review"));
    const decide = renderHook(() => useTransitionModelVersion(), { wrapper });
    await act(() => decide.result.current.mutateAsync({ action: "approve", id: "mv-2", comment: "Ranges reproduced" }));
    await waitFor(() => expect(queue.result.current.data?.total).toBe(0));
    expect(detail.result.current.data?.status).toBe("approved");
    expect(server.calls.find((c) => c.method === "POST")!.body).toEqual({ comment: "Ranges reproduced" });
  });
});
