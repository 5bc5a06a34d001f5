import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { apiError, perilProfileRecord } from "@/features/peril/testing/records";
import { PerilLens } from "./peril-lens-page";

afterEach(() => vi.unstubAllGlobals());

const writer = { userId: "u-actuary", canWrite: true };
const reader = { userId: "u-manager", canWrite: false };

describe("PerilLens states", () => {
  it("names each list while it loads", () => {
    stubFetch((req) => ({ body: req.path === "/api/peril-profiles" ? { items: [], total: 0 } : [] }));
    renderWithClient(<PerilLens viewer={writer} />);
    // The first render is before any answer: both cards say what they are waiting for.
    expect(screen.getByText("Loading peril profiles…")).toBeInTheDocument();
    expect(screen.getByText("Loading portfolio baselines…")).toBeInTheDocument();
  });

  it("explains empty lists and offers a writer the way to fill them", async () => {
    stubFetch((req) => ({ body: req.path === "/api/peril-profiles" ? { items: [], total: 0 } : [] }));
    renderWithClient(<PerilLens viewer={writer} />);
    expect(await screen.findByText("No peril profiles yet")).toBeInTheDocument();
    expect(screen.getByText("No portfolios yet")).toBeInTheDocument();
    expect(screen.getByText(/Without one, a run shows multipliers and return periods but no projected losses/)).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Write the first profile" })).toHaveAttribute("href", "/peril-lens/profiles/new");
    expect(screen.getByRole("link", { name: "Upload a portfolio" })).toHaveAttribute("href", "/peril-lens/portfolios/upload");
  });

  it("tells a read-only role who can add profiles and portfolios instead of offering buttons", async () => {
    stubFetch((req) => ({ body: req.path === "/api/peril-profiles" ? { items: [], total: 0 } : [] }));
    renderWithClient(<PerilLens viewer={reader} />);
    expect(await screen.findByText("No peril profiles yet")).toBeInTheDocument();
    // docs/API.md permission table: perils:write is held by the analyst and actuary roles.
    expect(screen.getAllByText(/Only the analyst or actuary role can add them\./)).toHaveLength(2);
    expect(screen.queryByRole("link", { name: "Write the first profile" })).toBeNull();
    expect(screen.queryByRole("link", { name: "Upload a portfolio" })).toBeNull();
  });

  it("says which list failed, keeps the other, and tries again on request", async () => {
    let fail = true;
    const server = stubFetch((req) => {
      if (req.path === "/api/peril-profiles") return fail ? apiError(500, "internal_error", "An unexpected error occurred.") : { body: { items: [perilProfileRecord()], total: 1 } };
      if (req.path === "/api/portfolios") return { body: [] };
      return undefined;
    });
    renderWithClient(<PerilLens viewer={writer} />);
    const alert = await screen.findByRole("alert");
    expect(alert).toHaveTextContent("The peril profiles could not be loaded");
    expect(alert).toHaveTextContent("An unexpected error occurred.");
    expect(screen.getByText("No portfolios yet")).toBeInTheDocument();

    fail = false;
    await userEvent.click(within(alert).getByRole("button", { name: "Try again" }));
    expect(await screen.findByRole("link", { name: "Flood, Northmere" })).toBeInTheDocument();
    expect(server.count("GET", "/api/peril-profiles")).toBe(2);
    expect(screen.queryByRole("alert")).toBeNull();
  });
});
