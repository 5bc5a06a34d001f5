import type { ImpactSide, ModelVersionImpact } from "@plumeline/contracts";

/**
 * A hand-made impact preview (invented round numbers, not engine output) shaped like the API's
 * answer: version "Core v3" against its parent "Core v2" on two horizons. In 2100 the median
 * moves +0.30 K (well beyond its ±0.042 K noise); in 2050 by +0.02 K (within the noise).
 */
function side(versionNumber: number, h2050: [number, number, number], h2100: [number, number, number], exceed2100: [number, number, number], ecs: [number, number, number]): ImpactSide {
  const set = ([p5, p50, p95]: [number, number, number]) => ({ p5, p17: (p5 + p50) / 2, p50, p83: (p50 + p95) / 2, p95 });
  const precision = (p50: number) => ({ p5: null, p17: null, p50: [p50 - 0.03, p50 + 0.03] as [number, number], p83: null, p95: null });
  return {
    version: { id: `mv-${versionNumber}`, name: "Core", versionNumber, status: versionNumber === 3 ? "in-review" : "approved" },
    engineVersion: "test",
    inputHash: `in-${versionNumber}`,
    resultHash: `out-${versionNumber}`,
    effectiveMembers: 2000,
    horizons: [
      { year: 2050, temperature: set(h2050), precision: precision(h2050[1]), exceedance: { "1.5": 0.8, "2": 0.3, "3": 0 } },
      { year: 2100, temperature: set(h2100), precision: precision(h2100[1]), exceedance: { "1.5": exceed2100[0], "2": exceed2100[1], "3": exceed2100[2] } },
    ],
    implied: { ecs: set(ecs), tcr: set([1.2, 1.8, 2.5]) },
  };
}

export function impactFixture(over: Partial<ModelVersionImpact> = {}): ModelVersionImpact {
  const version = side(3, [1.5, 1.92, 2.5], [2.1, 2.9, 4.1], [1, 0.9, 0.35], [2.2, 3.4, 5.6]);
  const against = side(2, [1.45, 1.9, 2.45], [2.0, 2.6, 3.6], [1, 0.8, 0.2], [2.0, 3.0, 5.0]);
  return {
    pathway: { id: "pw-middle", name: "Harbourline Middle" },
    members: 2000,
    seed: "impact-preview",
    sampling: "latin-hypercube",
    percentiles: [5, 17, 50, 83, 95],
    thresholds: [1.5, 2, 3],
    version,
    against,
    differences: {
      horizons: [
        { year: 2050, medianShift: 0.02, widthChange: 0.05, exceedance: { "1.5": 0, "2": 0, "3": 0 } },
        { year: 2100, medianShift: 0.3, widthChange: 0.4, exceedance: { "1.5": 0, "2": 0.1, "3": 0.15 } },
      ],
      ecs: { medianShift: 0.4, widthChange: 0.4 },
      tcr: { medianShift: 0, widthChange: 0 },
    },
    cached: false,
    computedAt: "2026-01-01T00:00:00.000Z",
    seconds: 3.2,
    ...over,
  };
}
