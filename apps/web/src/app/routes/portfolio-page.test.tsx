import { screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { apiError } from "@/features/peril/testing/records";
import { renderRoute } from "@/testing/render-route";
import PortfolioPage from "./portfolio-page";

afterEach(() => vi.unstubAllGlobals());

const at = (id: string) => ({ path: "/peril-lens/portfolios/:portfolioId", url: `/peril-lens/portfolios/${id}` });

describe("PortfolioPage states", () => {
  it("shows an unknown id as a missing portfolio with the way back", async () => {
    stubFetch(() => apiError(404, "not_found", "Portfolio pf-gone does not exist."));
    renderRoute(<PortfolioPage />, at("pf-gone"));
    expect(screen.getByText("Loading portfolio…")).toBeInTheDocument();
    expect(await screen.findByRole("heading", { name: "No portfolio here" })).toBeInTheDocument();
    expect(screen.getByText("There is no portfolio at this address")).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Back to the peril lens" })).toHaveAttribute("href", "/peril-lens");
  });

  it("keeps the server's reason and a retry for other failures", async () => {
    stubFetch(() => apiError(500, "internal_error", "An unexpected error occurred."));
    renderRoute(<PortfolioPage />, at("pf-1"));
    const alert = await screen.findByRole("alert");
    expect(alert).toHaveTextContent("An unexpected error occurred.");
    expect(within(alert).getByRole("button", { name: "Try again" })).toBeInTheDocument();
    expect(screen.getByRole("heading", { name: "The portfolio could not be loaded" })).toBeInTheDocument();
  });
});
