import type { ImpactPathway, ModelVersionImpact } from "@plumeline/contracts";

type Horizons = ImpactPathway["version"];

/**
 * Monte Carlo precision of an impact preview, for the reader of the side-by-side tables.
 *
 * Medians: half the width of the engine's distribution-free 95 % interval for p50 (order
 * statistics; Conover, Practical Nonparametric Statistics, 3rd ed., Section 3.2), per horizon. A shift counts as beyond preview noise when it is
 * larger than the two half-widths combined in quadrature — conservative, because both
 * ensembles share the seed and so much of their sampling error cancels in the difference.
 *
 * Exceedance: the worst-case 95 % binomial half-width, 1.96·√(p(1−p)/n) at p = ½, i.e.
 * 0.98/√n (common practice; Latin hypercube sampling is usually tighter). n = 2,000 -> ±2.2 points.
 */
export function medianHalfWidth(horizons: Horizons, year: number): number | null {
  const interval = horizons.find((h) => h.year === year)?.precision.p50;
  return interval ? (interval[1] - interval[0]) / 2 : null;
}

export function shiftNoise(pathway: ImpactPathway, year: number): number | null {
  const a = medianHalfWidth(pathway.version, year);
  const b = medianHalfWidth(pathway.against, year);
  return a === null || b === null ? null : Math.hypot(a, b);
}

export function exceedanceHalfWidth(members: number): number {
  return 0.98 / Math.sqrt(members);
}

/** Widest median half-width over every pathway and horizon of both versions (the headline precision). */
export function widestMedianHalfWidth(impact: ModelVersionImpact): number | null {
  const all = impact.pathways.flatMap((p) => [p.version, p.against]).flatMap((side) => side.map((h) => medianHalfWidth(side, h.year)));
  const known = all.filter((x): x is number => x !== null);
  return known.length ? Math.max(...known) : null;
}
