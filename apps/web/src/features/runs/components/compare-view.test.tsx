import { render, screen } from "@testing-library/react";
import type { PathwayResult, RunResult } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { fanFixture } from "@/testing/fixtures";
import { CompareView } from "./compare-view";

/** A result around the shared fan fixture (invented numbers): one pathway, one 2100 horizon. */
function result(offset = 0): RunResult {
  const f = fanFixture("p1", "Middle road", offset);
  const at = (xs: number[]) => xs.at(-1)!;
  const pathway = {
    id: f.id,
    name: f.name,
    years: f.years,
    temperature: { p5: f.p5, p17: f.p17, p50: f.p50, p83: f.p83, p95: f.p95 },
    horizons: [
      {
        year: f.years.at(-1)!,
        temperature: { p5: at(f.p5), p17: at(f.p17), p50: at(f.p50), p83: at(f.p83), p95: at(f.p95) },
        exceedance: { "2": 0.6 + offset / 10 },
      },
    ],
  } as unknown as PathwayResult;
  return { pathways: [pathway] } as unknown as RunResult;
}

describe("CompareView", () => {
  it("names the shared baseline on every warming axis and raises no warning", () => {
    render(
      <CompareView
        sides={[
          { label: "A", result: result(), pathwayId: "p1", baseline: [1850, 1900] },
          { label: "B", result: result(), pathwayId: "p1", baseline: [1850, 1900] },
        ]}
      />,
    );
    expect(screen.getAllByText("Warming above 1850–1900 (K)").length).toBeGreaterThanOrEqual(3);
    expect(screen.queryByRole("note")).toBeNull();
  });

  it("warns when the two runs measure warming from different baselines", () => {
    render(
      <CompareView
        sides={[
          { label: "A", result: result(), pathwayId: "p1", baseline: [1850, 1900] },
          { label: "B", result: result(), pathwayId: "p1", baseline: [1995, 2014] },
        ]}
      />,
    );
    expect(screen.getByRole("note")).toHaveTextContent("different baselines (1850–1900 and 1995–2014)");
    expect(screen.getAllByText("Warming above each run's baseline (K)").length).toBeGreaterThanOrEqual(3);
  });

  it("labels the horizon rows by run name with differences from the first run", () => {
    render(
      <CompareView
        sides={[
          { label: "Core v1", result: result(), pathwayId: "p1", baseline: [1850, 1900] },
          { label: "Wider aerosols", result: result(0.25), pathwayId: "p1", baseline: [1850, 1900] },
          { label: "Cooler", result: result(-0.1), pathwayId: "p1", baseline: [1850, 1900] },
        ]}
      />,
    );
    const table = screen.getByRole("table", { name: "Warming in 2100" });
    const rows = Array.from(table.querySelectorAll("tbody tr")).map((r) => Array.from(r.children).map((c) => c.textContent));
    expect(rows.map((r) => r[0])).toEqual(["Core v1 (reference)", "Wider aerosols", "Cooler"]);
    // The fixture's 2100 median is 3.0 K; offsets of +0.25 and −0.1 K; the chance moves by offset/10 (2.5 pp, −1 pp).
    expect(rows[1]!.slice(2, 4)).toEqual(["3.25", "+0.25"]);
    expect(rows[2]!.slice(2, 4)).toEqual(["2.90", "−0.10"]);
    expect(rows[1]!.at(-1)).toBe("+2.5 pp");
    expect(rows[2]!.at(-1)).toBe("−1.0 pp");
    // Widths are equal (same band), so no width difference.
    expect(rows[1]![5]).toBe("0.00");
    expect(screen.queryByText(/left|right/i)).toBeNull();
  });
});
