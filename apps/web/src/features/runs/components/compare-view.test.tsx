import { render, screen } from "@testing-library/react";
import type { PathwayResult, RunResult } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { fanFixture } from "@/testing/fixtures";
import { CompareView } from "./compare-view";

/** A result around the shared fan fixture (invented numbers): one pathway, one 2100 horizon. */
function result(): RunResult {
  const f = fanFixture();
  const at = (xs: number[]) => xs.at(-1)!;
  const pathway = {
    id: f.id,
    name: f.name,
    years: f.years,
    temperature: { p5: f.p5, p17: f.p17, p50: f.p50, p83: f.p83, p95: f.p95 },
    horizons: [{ year: f.years.at(-1)!, temperature: { p5: at(f.p5), p17: at(f.p17), p50: at(f.p50), p83: at(f.p83), p95: at(f.p95) } }],
  } as unknown as PathwayResult;
  return { pathways: [pathway] } as unknown as RunResult;
}

describe("CompareView", () => {
  it("names the shared baseline on every warming axis and raises no warning", () => {
    render(<CompareView a={{ label: "A", result: result(), pathwayId: "p1", baseline: [1850, 1900] }} b={{ label: "B", result: result(), pathwayId: "p1", baseline: [1850, 1900] }} />);
    expect(screen.getAllByText("Warming above 1850–1900 (K)").length).toBeGreaterThanOrEqual(3);
    expect(screen.queryByRole("note")).toBeNull();
  });

  it("warns when the two runs measure warming from different baselines", () => {
    render(<CompareView a={{ label: "A", result: result(), pathwayId: "p1", baseline: [1850, 1900] }} b={{ label: "B", result: result(), pathwayId: "p1", baseline: [1995, 2014] }} />);
    expect(screen.getByRole("note")).toHaveTextContent("different baselines (1850–1900 and 1995–2014)");
    expect(screen.getAllByText("Warming above each run's baseline (K)").length).toBeGreaterThanOrEqual(3);
  });
});
