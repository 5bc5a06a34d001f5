import { renderHook, waitFor, act } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { runSummary } from "@/testing/api-fixtures";
import { stubFetch } from "@/testing/fetch-stub";
import { testQueryClient, wrapperFor } from "@/testing/render-with-client";
import { useCancelRun } from "./cancel-run";
import { useCreateRun } from "./create-run";
import { getRunQueryOptions } from "./get-run";
import { getRunsQueryOptions, useRuns } from "./get-runs";

afterEach(() => vi.unstubAllGlobals());

describe("run hooks", () => {
  it("keys run lists by their filter and sends the filter as the query string", async () => {
    expect(getRunsQueryOptions({ mine: true }).queryKey).toEqual(["runs", "list", { mine: "true" }]);
    // Empty values leave the key (and the URL): these two are one query.
    expect(getRunsQueryOptions({ mine: false, q: "", status: undefined }).queryKey).toEqual(["runs", "list", {}]);
    expect(getRunsQueryOptions({ q: "coastal", sort: "name:asc", offset: 50 }).queryKey).toEqual(["runs", "list", { q: "coastal", sort: "name:asc", offset: 50 }]);
    expect(getRunQueryOptions("r1").queryKey).toEqual(["runs", "detail", "r1"]);
    const server = stubFetch((req) => (req.path === "/api/runs" ? { body: { items: [runSummary({ status: "succeeded", progress: 1 })], total: 1 } } : undefined));
    const client = testQueryClient();
    const { result } = renderHook(() => useRuns({ mine: true }), { wrapper: wrapperFor(client) });
    await waitFor(() => expect(result.current.isSuccess).toBe(true));
    expect(server.calls[0]!.search.get("mine")).toBe("true");
    expect(client.getQueryData<{ items: unknown[] }>(["runs", "list", { mine: "true" }])?.items).toHaveLength(1);
  });

  it("polls while a listed run is active and stops once none is", () => {
    // Defaults from env: poll every 1500 ms while any run is queued or running.
    const opts = getRunsQueryOptions();
    const interval = opts.refetchInterval as (q: { state: { data: unknown } }) => number | false;
    expect(interval({ state: { data: { items: [runSummary({ status: "running" })], total: 1 } } })).toBe(1500);
    expect(interval({ state: { data: { items: [runSummary({ status: "succeeded" })], total: 1 } } })).toBe(false);
  });

  it("refreshes every run list after a run is created", async () => {
    let runs = [runSummary({ id: "old", status: "succeeded", progress: 1 })];
    const server = stubFetch((req) => {
      if (req.method === "GET" && req.path === "/api/runs") return { body: { items: runs, total: runs.length } };
      if (req.method === "POST" && req.path === "/api/runs") {
        const created = runSummary({ id: "new", status: "queued", progress: 0 });
        runs = [created, ...runs];
        return { status: 201, body: created };
      }
      return undefined;
    });
    const client = testQueryClient();
    const wrapper = wrapperFor(client);
    const list = renderHook(() => useRuns({ mine: true }), { wrapper });
    await waitFor(() => expect(list.result.current.data?.items).toHaveLength(1));
    const create = renderHook(() => useCreateRun(), { wrapper });
    await act(() => create.result.current.mutateAsync({ modelVersionId: "mv-1", pathwayIds: ["p1"], members: 100, seed: "s", sampling: "monte-carlo" }));
    await waitFor(() => expect(list.result.current.data?.total).toBe(2));
    expect(server.count("GET", "/api/runs")).toBe(2);
  });

  it("refreshes the run and the lists after a cancel", async () => {
    stubFetch((req) => {
      if (req.method === "POST" && req.path === "/api/runs/run-1/cancel") return { body: runSummary({ status: "cancelled" }) };
      return undefined;
    });
    const client = testQueryClient();
    const spy = vi.spyOn(client, "invalidateQueries");
    const { result } = renderHook(() => useCancelRun(), { wrapper: wrapperFor(client) });
    await act(() => result.current.mutateAsync("run-1"));
    const keys = spy.mock.calls.map((c) => c[0]?.queryKey);
    expect(keys).toContainEqual(["runs", "detail", "run-1"]);
    expect(keys).toContainEqual(["runs", "list"]);
  });
});
