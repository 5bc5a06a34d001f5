import { render, screen, within } from "@testing-library/react";
import type { PathwayResult } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { HorizonTable } from "./horizon-table";

/**
 * One horizon shaped like the engine's result (invented values). The exceedance shares are
 * those of a seeded 5,000-member run of the demo's Low pathway in 2100: 64.34 % above 1.5 K,
 * and 24 members (0.48 %) above 3 K.
 */
const t = { p5: 1.12, p17: 1.32, p50: 1.63, p83: 2.05, p95: 2.42 };
const pathway = {
  id: "low",
  name: "Low",
  horizons: [{ year: 2100, temperature: t, precision: { p5: null, p17: null, p50: null, p83: null, p95: null }, exceedance: { "1.5": 0.6434, "3": 0.0048 }, committed: { p50: 0.62 } }],
} as unknown as PathwayResult;

describe("HorizonTable", () => {
  it("shows a small but real chance of exceeding as '< 1 %', never as an impossible 0 %", () => {
    render(<HorizonTable pathway={pathway} />);
    const row = within(screen.getByRole("table", { name: "Warming percentiles at the horizons for Low" })).getByRole("row", { name: /^2100 / });
    const cells = within(row).getAllByRole("cell").map((c) => c.textContent);
    expect(cells.slice(5, 7)).toEqual(["64 %", "< 1 %"]);
  });

  it("says what committed warming is: the equilibrium warming F/λ minus the warming since the pathway start (what the engine computes)", () => {
    render(<HorizonTable pathway={pathway} />);
    expect(screen.getByText(/the equilibrium warming F\/λ minus the warming since the pathway start/)).toBeInTheDocument();
    expect(screen.queryByText(/minus the anomaly/)).toBeNull();
  });
});
