import { act, renderHook } from "@testing-library/react";
import type { ReactNode } from "react";
import { createMemoryRouter, RouterProvider, useLocation } from "react-router-dom";
import { describe, expect, it } from "vitest";
import { useListQuery } from "./use-list-query";

/** Renders the hook inside a real data router at `url`, and reports the URL it leaves behind. */
function renderAt(url: string, options: Parameters<typeof useListQuery<string>>[0]) {
  let location = { pathname: "", search: "" };
  let router: ReturnType<typeof createMemoryRouter> | undefined;
  const hook = renderHook(
    () => {
      const loc = useLocation();
      location = { pathname: loc.pathname, search: loc.search };
      return useListQuery(options);
    },
    {
      wrapper: ({ children }: { children: ReactNode }) => {
        router ??= createMemoryRouter([{ path: "*", element: children }], { initialEntries: [url] });
        return <RouterProvider router={router} />;
      },
    },
  );
  return { hook, location: () => location, router: () => router! };
}

const RUNS = { defaultSort: "createdAt:desc", filterKeys: ["status", "author", "mine"] as const };

describe("useListQuery", () => {
  it("keeps every change made before the page renders again (a search, then at once a sort and a page)", () => {
    const { hook, location } = renderAt("/runs?status=failed", { ...RUNS, filterKeys: [...RUNS.filterKeys] });
    const { update, setOffset } = hook.result.current;
    act(() => {
      update({ q: "coastal" });
      update({ sort: "name:asc" });
      setOffset(50);
    });
    expect(new URLSearchParams(location().search).toString()).toBe("status=failed&q=coastal&sort=name%3Aasc&offset=50");
  });

  it("reads search, sort, page and filters from the URL, with defaults for what is missing", () => {
    const { hook } = renderAt("/runs?q=coastal&sort=name:asc&offset=100&status=failed", { ...RUNS, filterKeys: [...RUNS.filterKeys] });
    expect(hook.result.current.state).toEqual({
      q: "coastal",
      sort: "name:asc",
      limit: 50,
      offset: 100,
      filters: { status: "failed", author: "", mine: "" },
    });
    expect(hook.result.current.filtered).toBe(true);
  });

  it("ignores a page number that is not a whole number ≥ 0 rather than sending it", () => {
    const { hook } = renderAt("/runs?offset=-5&limit=abc", { ...RUNS, filterKeys: [...RUNS.filterKeys] });
    expect(hook.result.current.state).toMatchObject({ offset: 0, limit: 50 });
    expect(hook.result.current.filtered).toBe(false);
  });

  it("writes a change into the URL, leaves defaults out, and returns to the first page", () => {
    const { hook, location } = renderAt("/runs?offset=100&status=failed", { ...RUNS, filterKeys: [...RUNS.filterKeys] });
    act(() => hook.result.current.update({ q: " inland ", filters: { status: "", author: "ines" } }));
    expect(Object.fromEntries(new URLSearchParams(location().search))).toEqual({ author: "ines", q: "inland" });
    act(() => hook.result.current.update({ sort: "createdAt:desc" }));
    expect(new URLSearchParams(location().search).get("sort")).toBeNull();
    act(() => hook.result.current.update({ sort: "members:desc" }));
    expect(new URLSearchParams(location().search).get("sort")).toBe("members:desc");
    expect(hook.result.current.state).toMatchObject({
      q: "inland",
      sort: "members:desc",
      offset: 0,
      filters: { author: "ines", status: "" },
    });
  });

  it("pages with a history entry, so Back returns to the previous page", async () => {
    const { hook, location, router } = renderAt("/runs?q=x", { ...RUNS, filterKeys: [...RUNS.filterKeys] });
    act(() => hook.result.current.setOffset(50));
    expect(location().search).toBe("?q=x&offset=50");
    act(() => hook.result.current.setOffset(100));
    expect(hook.result.current.state.offset).toBe(100);
    await act(() => router().navigate(-1));
    expect(hook.result.current.state.offset).toBe(50);
    act(() => hook.result.current.setOffset(0));
    expect(location().search).toBe("?q=x");
  });

  it("keeps a filter that is on by default on until the URL turns it off", () => {
    const { hook, location } = renderAt("/admin/audit", {
      defaultSort: "createdAt:desc",
      filterKeys: ["hideSignIns"],
      defaultFilters: { hideSignIns: "true" },
    });
    expect(hook.result.current.state.filters.hideSignIns).toBe("true");
    expect(hook.result.current.filtered).toBe(false);
    act(() => hook.result.current.update({ filters: { hideSignIns: "false" } }));
    expect(location().search).toBe("?hideSignIns=false");
    act(() => hook.result.current.update({ filters: { hideSignIns: "true" } }));
    expect(location().search).toBe("");
  });
});
