import type { ImpactPathway, ImpactSide, ModelVersionImpact } from "@plumeline/contracts";

/**
 * A hand-made impact preview (invented round numbers, not engine output) shaped like the API's
 * answer: version "Core v3" against its parent "Core v2" on two pathways and two horizons. On
 * Harbourline Middle in 2100 the median moves +0.30 K (well beyond its ±0.042 K noise and the
 * 0.1 K default threshold); in 2050 by +0.02 K (within the noise). Harbourline Low moves less.
 */
type Triple = [number, number, number];
const set = ([p5, p50, p95]: Triple) => ({ p5, p17: (p5 + p50) / 2, p50, p83: (p50 + p95) / 2, p95 });
const precision = (p50: number) => ({ p5: null, p17: null, p50: [p50 - 0.03, p50 + 0.03] as [number, number], p83: null, p95: null });

function horizons(h2050: Triple, h2100: Triple, exceed2100: Triple): ImpactPathway["version"] {
  return [
    { year: 2050, temperature: set(h2050), precision: precision(h2050[1]), exceedance: { "1.5": 0.8, "2": 0.3, "3": 0 } },
    { year: 2100, temperature: set(h2100), precision: precision(h2100[1]), exceedance: { "1.5": exceed2100[0], "2": exceed2100[1], "3": exceed2100[2] } },
  ];
}

function side(versionNumber: number, ecs: Triple): ImpactSide {
  return {
    version: { id: `mv-${versionNumber}`, name: "Core", versionNumber, status: versionNumber === 3 ? "in-review" : "approved" },
    engineVersion: "test",
    inputHash: `in-${versionNumber}`,
    resultHash: `out-${versionNumber}`,
    effectiveMembers: 2000,
    implied: { ecs: set(ecs), tcr: set([1.2, 1.8, 2.5]) },
  };
}

export const fixtureMiddle: ImpactPathway = {
  pathway: { id: "pw-middle", name: "Harbourline Middle" },
  version: horizons([1.5, 1.92, 2.5], [2.1, 2.9, 4.1], [1, 0.9, 0.35]),
  against: horizons([1.45, 1.9, 2.45], [2.0, 2.6, 3.6], [1, 0.8, 0.2]),
  differences: [
    { year: 2050, medianShift: 0.02, widthChange: 0.05, exceedance: { "1.5": 0, "2": 0, "3": 0 } },
    { year: 2100, medianShift: 0.3, widthChange: 0.4, exceedance: { "1.5": 0, "2": 0.1, "3": 0.15 } },
  ],
};

export const fixtureLow: ImpactPathway = {
  pathway: { id: "pw-low", name: "Harbourline Low" },
  version: horizons([1.4, 1.7, 2.1], [1.4, 1.8, 2.4], [0.6, 0.2, 0]),
  against: horizons([1.4, 1.68, 2.1], [1.4, 1.75, 2.35], [0.58, 0.18, 0]),
  differences: [
    { year: 2050, medianShift: 0.02, widthChange: 0, exceedance: { "1.5": 0, "2": 0, "3": 0 } },
    { year: 2100, medianShift: 0.05, widthChange: 0.05, exceedance: { "1.5": 0.02, "2": 0.02, "3": 0 } },
  ],
};

export function impactFixture(over: Partial<ModelVersionImpact> = {}): ModelVersionImpact {
  return {
    pathways: [fixtureMiddle, fixtureLow],
    members: 2000,
    seed: "impact-preview",
    sampling: "latin-hypercube",
    percentiles: [5, 17, 50, 83, 95],
    thresholds: [1.5, 2, 3],
    version: side(3, [2.2, 3.4, 5.6]),
    against: side(2, [2.0, 3.0, 5.0]),
    differences: { ecs: { medianShift: 0.4, widthChange: 0.4 }, tcr: { medianShift: 0, widthChange: 0 } },
    materiality: {
      policy: { medianShiftK: 0.1, exceedancePoints: 5, widthChangePercent: 10 },
      fired: [
        { pathwayId: "pw-middle", pathwayName: "Harbourline Middle", year: 2100, metric: "median-shift", warmingThreshold: null, value: 0.3, limit: 0.1, unit: "K" },
        { pathwayId: "pw-middle", pathwayName: "Harbourline Middle", year: 2100, metric: "width-change", warmingThreshold: null, value: 25, limit: 10, unit: "%" },
        { pathwayId: "pw-middle", pathwayName: "Harbourline Middle", year: 2100, metric: "exceedance", warmingThreshold: 2, value: 10, limit: 5, unit: "pts" },
        { pathwayId: "pw-middle", pathwayName: "Harbourline Middle", year: 2100, metric: "exceedance", warmingThreshold: 3, value: 15, limit: 5, unit: "pts" },
      ],
    },
    cached: false,
    computedAt: "2026-01-01T00:00:00.000Z",
    seconds: 3.2,
    ...over,
  };
}
