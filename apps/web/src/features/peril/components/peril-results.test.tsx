import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { PERIL_RULES } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { tickMap } from "@/testing/svg-geometry";
import { perilResultFixture } from "../testing/peril-fixtures";
import { PERIL_CAUTIONS, PerilResults } from "./peril-results";

const baselineRows = [{ region: "Northmere Coast", peril: "flood-heavy-rainfall", currency: "EUR", aal: 1000, loss100: 20000, loss200: 26000 }];

describe("PerilResults", () => {
  it("shows the multiplier percentiles of the first profile at each horizon", () => {
    render(<PerilResults result={perilResultFixture()} baselineRows={baselineRows} />);
    const table = screen.getByRole("table", { name: "Multipliers — Flood, Northmere" });
    const rows = within(table).getAllByRole("row");
    expect(within(rows[0]!).getAllByRole("columnheader").map((c) => c.textContent)).toEqual(["Horizon", "5th pct", "17th pct", "50th pct", "83rd pct", "95th pct", "Mean"]);
    expect(within(rows[2]!).getAllByRole("cell").map((c) => c.textContent)).toEqual(["2100", "1.050", "1.100", "1.150", "1.220", "1.300", "1.160"]);
  });

  it("lists projected losses per horizon and measure in the row's currency", () => {
    render(<PerilResults result={perilResultFixture()} />);
    const table = screen.getByRole("table", { name: "Projected losses — Northmere Coast flood-heavy-rainfall" });
    const cells = within(table).getAllByRole("row").slice(1).map((r) => within(r).getAllByRole("cell").map((c) => c.textContent));
    // Money at three significant figures in one scale per table (the fixture's largest loss is in thousands: EUR k).
    expect(cells[4]).toEqual(["2100", "1-in-100 loss", "21.0", "22.0", "23.0", "24.4", "26.0", "23.2"]);
    expect(screen.getByRole("heading", { name: /Projected losses — Northmere Coast, flood-heavy-rainfall \(EUR k\)/ })).toBeTruthy();
    expect(screen.queryByRole("table", { name: /Return periods/ })).toBeNull(); // severity: no return periods
  });

  it("draws the projected AAL ranges where the axis puts the percentiles, with today's AAL as reference", () => {
    const { container } = render(<PerilResults result={perilResultFixture()} baselineRows={baselineRows} />);
    const y = tickMap(container, "y");
    const h2100 = container.querySelector('[data-horizon="2100"]')!;
    const whisker = h2100.querySelector('[data-range="p5-p95"]')!;
    expect(Number(whisker.getAttribute("y1"))).toBeCloseTo(y(1300), 6);
    expect(Number(whisker.getAttribute("y2"))).toBeCloseTo(y(1050), 6);
    expect(Number(h2100.querySelector('[data-point="p50"]')!.getAttribute("cy"))).toBeCloseTo(y(1150), 6);
    expect(Number(container.querySelector('[data-testid="baseline-aal"] line')!.getAttribute("y1"))).toBeCloseTo(y(1000), 6);
  });

  it("shows a frequency profile's shifted return periods after choosing it", async () => {
    render(<PerilResults result={perilResultFixture()} />);
    await userEvent.click(screen.getByRole("radio", { name: "Hot days, Vellan" }));
    const table = screen.getByRole("table", { name: "Return periods — Hot days, Vellan" });
    const cells = within(table).getAllByRole("row").slice(1).map((r) => within(r).getAllByRole("cell").map((c) => c.textContent));
    expect(cells).toEqual([
      ["2050", "1-in-100", "40.0", "41.7", "50.0", "62.5", "66.7", "51.0"],
      ["2050", "1-in-200", "80.0", "83.3", "100.0", "125.0", "133.3", "102.0"],
    ]);
    expect(screen.getByText(/no losses projected/i)).toBeInTheDocument();
  });

  it("lists the unmatched portfolio rows and every peril caution and rule", () => {
    render(<PerilResults result={perilResultFixture()} />);
    expect(within(screen.getByRole("region", { name: "Portfolio rows not projected" })).getByText("Ostrand Uplands — hail")).toBeInTheDocument();
    const cautions = screen.getByRole("complementary", { name: "Peril cautions" });
    for (const c of [...PERIL_CAUTIONS, ...PERIL_RULES]) expect(cautions).toHaveTextContent(c);
  });

  it("says so when the run carried no profiles", () => {
    render(<PerilResults result={{ portfolioId: null, pathways: [], unmatchedRows: [] }} />);
    expect(screen.getByText("No peril profiles in this run")).toBeInTheDocument();
  });
});
