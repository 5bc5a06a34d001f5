import { render, screen } from "@testing-library/react";
import type { PerilProfileResult } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { TableReach } from "./table-reach";

const summary = { p5: 1, p50: 2, p95: 3, mean: 2 };
const horizon = (year: number, above: number) => ({
  year,
  multiplier: summary,
  tailMultipliers: { "100": summary, "200": summary },
  beyondTable: { below: 0, above },
  returnPeriods: null,
  losses: [],
});
const profile = (aboveIn2100: number): PerilProfileResult => ({
  profileId: "heat",
  name: "Hot days, Vellan",
  peril: "heat",
  region: "Vellan",
  metric: "frequency",
  baselineWarming: 1.1,
  table: { returnPeriods: [10, 50], warmingRange: [0, 4], beyondTable: "hold", beyondReturnPeriods: "hold", readOutside: [100, 200] },
  multiplierReturnPeriod: 10,
  horizons: [horizon(2050, 0), horizon(2100, aboveIn2100)],
});

describe("TableReach", () => {
  it("states the tables' return periods, the table AAL uses and the tail read beyond them", () => {
    render(<TableReach profile={profile(0)} />);
    expect(screen.getByText(/Tables for 10-year and 50-year events\. The multiplier above and the AAL use the 10-year table; the 1-in-100 and 1-in-200 figures lie beyond the tables' return periods and are read by holding the nearest table\./)).toBeInTheDocument();
  });

  it("shows the share beyond the table per horizon and warns once it passes 5 %", () => {
    render(<TableReach profile={profile(0.57)} />);
    const rows = screen.getByRole("table", { name: "Members beyond the table — Hot days, Vellan" }).querySelectorAll("tbody tr");
    expect(rows[1]!.textContent).toBe("21000 %57 %");
    expect(screen.getByRole("alert").textContent).toMatch(/^More than 5 % of members lie beyond the table's 0–4 K at 2100: their multipliers are held at the table's end value/);
  });

  it("does not warn at 5 % or below", () => {
    render(<TableReach profile={profile(0.05)} />);
    expect(screen.queryByRole("alert")).toBeNull();
  });

  it("shows nothing for a per-kelvin profile", () => {
    const { container } = render(<TableReach profile={{ ...profile(0.5), table: null }} />);
    expect(container.textContent).toBe("");
  });
});
