import { render, screen, within } from "@testing-library/react";
import { PORTFOLIO_TOTAL_NOTES, type PortfolioTotal } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { PortfolioTotals } from "./portfolio-totals";

const s = (p5: number, p50: number, p95: number) => ({ p5, p17: p50 - 1e6, p50, p83: p50 + 1e6, p95, mean: p50 });
const total: PortfolioTotal = {
  currency: "EUR",
  rows: 5,
  projectedRows: 4,
  baseline: { aal: 73_900_000, loss100: 1_223_000_000, loss200: 1_699_000_000 },
  horizons: [{ year: 2050, aal: s(74e6, 78_456_789, 83e6), loss100: s(1.23e9, 1.26e9, 1.3e9), loss200: s(1.7e9, 1.75e9, 1.8e9) }],
};

describe("PortfolioTotals", () => {
  it("writes money in one scale per table at three significant figures, with the median's change and the notes", () => {
    render(<PortfolioTotals totals={[total]} />);
    const table = screen.getByRole("table", { name: "Portfolio totals (EUR)" });
    const rows = within(table).getAllByRole("row").slice(1).map((r) => within(r).getAllByRole("cell").map((c) => c.textContent));
    // Largest figure 1.8 bn: EUR bn; AAL 78,456,789 → 0.0785; today 73.9 m → 0.0739; change to today's decimals.
    expect(rows[0]).toEqual(["2050", "Average annual loss", "0.0739", "0.0740", "0.0775", "0.0785", "0.0795", "0.0830", "+0.0046"]);
    expect(rows[2]![2]).toBe("1.70");
    expect(screen.getByText("EUR bn")).toBeTruthy();
    const notes = screen.getByRole("complementary", { name: "What the portfolio totals are" });
    for (const n of PORTFOLIO_TOTAL_NOTES) expect(notes.textContent).toContain(n);
  });

  it("says why there are no totals, and keeps currencies apart", () => {
    const { unmount } = render(<PortfolioTotals totals={undefined} refused="portfolio row X / flood is projected by two profiles" />);
    expect(screen.getByText(/No portfolio totals: portfolio row X/)).toBeTruthy();
    unmount();
    render(<PortfolioTotals totals={[total, { ...total, currency: "GBP" }]} />);
    expect(screen.getByText(/one total per currency, never added together/)).toBeTruthy();
    expect(screen.getByRole("table", { name: "Portfolio totals (GBP)" })).toBeTruthy();
  });
});
