import type { PathwayResult } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { runResultFixture } from "@/testing/result-fixture";
import { toCrossing, toFocusedFanSeries, toVarianceShareRows } from "./result-adapters";

const years = [2030, 2031, 2032, 2033];
const pathway = (extra: Partial<PathwayResult> = {}): PathwayResult => ({
  id: "p1",
  name: "Middle road",
  years,
  temperature: {},
  forcing: {},
  imbalance: {},
  exceedance: {},
  crossing: { "2": { p5: 2031, p17: 2031, p50: 2032, p83: 2033, p95: null, never: 0.1 } },
  horizons: [],
  sensitivity: [],
  effectiveMembers: 100,
  constraint: null,
  ...extra,
});

describe("toCrossing", () => {
  it("builds the histogram from the per-year first-crossing shares when the result has them", () => {
    const c = toCrossing(pathway({ crossingShare: { "2": [0, 0.4, 0.35, 0.15] } }), "2");
    expect(c.binSource).toBe("per-year");
    expect(c.bins).toEqual([
      { from: 2031, to: 2032, share: 0.4 },
      { from: 2032, to: 2033, share: 0.35 },
      { from: 2033, to: 2034, share: 0.15 },
    ]);
    expect(c.never).toBe(0.1);
    expect(c.lastYear).toBe(2033);
  });

  it("falls back to spreading members between percentiles without per-year shares", () => {
    const c = toCrossing(pathway(), "2");
    expect(c.binSource).toBe("percentiles");
    // p17 − p5 = 12 % between 2031 and 2031 (same year), 33 % over 2031–2032, 33 % over 2032–2033; p95 never.
    expect(c.bins.map((b) => [b.from, b.to, Math.round(b.share * 100)])).toEqual([
      [2031, 2031, 12],
      [2031, 2032, 33],
      [2032, 2033, 33],
    ]);
  });

  it("falls back too when the shares do not line up with the years", () => {
    expect(toCrossing(pathway({ crossingShare: { "2": [0.5, 0.5] } }), "2").binSource).toBe("percentiles");
  });
});

describe("toFocusedFanSeries", () => {
  const band = { p5: [1, 1, 1, 1], p17: [2, 2, 2, 2], p50: [3, 3, 3, 3], p83: [4, 4, 4, 4], p95: [5, 5, 5, 5] };
  const three = ["low", "middle", "high"].map((id) => pathway({ id, name: id, temperature: band }));

  it("fills only the pathway in focus and shows the others' medians; their bands as outlines on request", () => {
    const series = toFocusedFanSeries(three, "middle");
    expect(series.map((s) => [s.id, s.treatment])).toEqual([
      ["low", "median"],
      ["middle", "filled"],
      ["high", "median"],
    ]);
    expect(toFocusedFanSeries(three, "middle", true).map((s) => s.treatment)).toEqual(["outline", "filled", "outline"]);
    // The percentiles pass through untouched.
    expect(series[1]!.p83).toEqual(band.p83);
  });

  it("fills a lone pathway", () => {
    expect(toFocusedFanSeries(three.slice(0, 1), "low")[0]!.treatment).toBe("filled");
  });
});

describe("toVarianceShareRows", () => {
  it("pairs each input's variance share with its rank correlation at the horizon", () => {
    const p = runResultFixture().pathways[0]!;
    expect(toVarianceShareRows(p, 2100)).toEqual([
      { input: "ecs", label: "ECS", share: 0.55, rankCorrelation: 0.8 },
      { input: "aerosol-cloud", label: "Aerosol–cloud scale", share: 0.2, rankCorrelation: -0.4 },
      { input: "f2x", label: "F2x", share: 0.05, rankCorrelation: 0.1 },
    ]);
  });

  it("gives null for a result without variance shares (older engines), so the page shows correlations only", () => {
    const p = runResultFixture().pathways[0]!;
    const old = { ...p, sensitivity: p.sensitivity.map(({ input, horizon, index }) => ({ input, horizon, index })) };
    expect(toVarianceShareRows(old, 2100)).toBeNull();
    expect(toVarianceShareRows(p, 1999)).toBeNull();
  });
});
