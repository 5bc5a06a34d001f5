import { QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import { createMemoryRouter, RouterProvider } from "react-router-dom";
import { afterEach, describe, expect, it, vi } from "vitest";
import { analystMe, modelVersion, runSummary } from "@/testing/api-fixtures";
import { stubFetch, type StubRequest } from "@/testing/fetch-stub";
import { testQueryClient } from "@/testing/render-with-client";
import { routes } from "../router";

afterEach(() => vi.unstubAllGlobals());

const me = analystMe.user.id;
const day = (d: number) => new Date(Date.UTC(2026, 0, 1) + d * 86_400_000).toISOString();

// 250 versions by someone else, all changed more recently than any of the analyst's own.
const others = Array.from({ length: 250 }, (_, i) =>
  modelVersion({ id: `other-${i}`, name: `Colleague's version ${i}`, authorId: "u-other", status: "approved", parentId: null, updatedAt: day(100 + i) }),
);
const mine = [
  modelVersion({ id: "old-draft", name: "My old draft", authorId: me, status: "draft", parentId: null, updatedAt: day(1) }),
  modelVersion({ id: "returned", name: "Returned and untouched", authorId: me, status: "rejected", parentId: null, updatedAt: day(2) }),
  modelVersion({ id: "acted-on", name: "Returned, redrafted", authorId: me, status: "rejected", parentId: null, updatedAt: day(3) }),
  modelVersion({ id: "redraft", name: "The redraft", authorId: me, status: "draft", parentId: "acted-on", updatedAt: day(4) }),
];
const versions = [...others, ...mine];

/** GET /api/model-versions as the server answers it: filters, newest change first, one page. */
function versionPage(search: StubRequest["search"]) {
  const matching = versions
    .filter((v) => search.get("mine") !== "true" || v.authorId === me)
    .filter((v) => !search.get("status") || v.status === search.get("status"))
    .filter((v) => search.get("undrafted") !== "true" || !versions.some((child) => child.parentId === v.id))
    .sort((a, b) => b.updatedAt.localeCompare(a.updatedAt));
  const offset = Number(search.get("offset") ?? 0);
  return { items: matching.slice(offset, offset + Number(search.get("limit") ?? 50)), total: matching.length };
}

const exploratoryRuns = Array.from({ length: 9 }, (_, i) => runSummary({ id: `x-${i}`, name: `Exploratory ${i}`, status: "succeeded", exploratory: true }));

function renderDesk() {
  const server = stubFetch((req) => {
    if (req.path === "/api/me") return { body: analystMe };
    if (req.path === "/api/model-versions") return { body: versionPage(req.search) };
    if (req.path === "/api/runs" && req.search.get("exploratory") === "true") {
      const limit = Number(req.search.get("limit"));
      return { body: { items: exploratoryRuns.slice(0, limit), total: exploratoryRuns.length } };
    }
    if (req.path === "/api/runs" || req.path === "/api/exports") return { body: { items: [], total: 0 } };
    return undefined;
  });
  render(
    <QueryClientProvider client={testQueryClient()}>
      <RouterProvider router={createMemoryRouter(routes, { initialEntries: ["/"] })} />
    </QueryClientProvider>,
  );
  return server;
}

describe("the desk's own lists", () => {
  it("lists the analyst's old draft and untouched return even behind 250 newer versions of others", async () => {
    const server = renderDesk();
    await screen.findByRole("heading", { name: "My model versions in progress" }, { timeout: 15_000 });
    expect(await screen.findByText("My old draft")).toBeInTheDocument();
    expect(screen.getByText("The redraft")).toBeInTheDocument();
    // Returned to me (listed as "name vN"): the rejection nothing was drafted from, not the one already redrafted.
    expect(await screen.findByText("Returned and untouched v2")).toBeInTheDocument();
    expect(screen.queryByText("Returned, redrafted v2")).not.toBeInTheDocument();
    const asked = server.calls.filter((c) => c.path === "/api/model-versions").map((c) => Object.fromEntries(c.search));
    expect(asked).toContainEqual(expect.objectContaining({ mine: "true", status: "rejected", undrafted: "true" }));
    expect(asked.every((q) => q.mine === "true" || q.status === "in-review")).toBe(true);
  });

  it("shows the newest exploratory results and says how many more there are", async () => {
    renderDesk();
    expect(await screen.findByText("Exploratory 0", {}, { timeout: 15_000 })).toBeInTheDocument();
    expect(screen.getByText("Exploratory 5")).toBeInTheDocument();
    expect(screen.queryByText("Exploratory 6")).not.toBeInTheDocument();
    expect(screen.getByText("and 3 older ones on the Runs page")).toBeInTheDocument();
  });
});
