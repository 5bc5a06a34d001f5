import type { ImpactSide, ModelVersionImpact, PercentileSet, RunResult, SpreadChange } from "@plumeline/contracts";

type VersionRef = ImpactSide["version"];

/**
 * The key outputs a reviewer compares, taken from one preview ensemble's result: per horizon
 * the temperature percentiles, their Monte Carlo precision and the exceedance probabilities
 * (first and only pathway), plus the implied ECS/TCR percentiles. Nothing is recomputed here:
 * every number is the engine's own, so it matches a run of the same spec exactly.
 */
export function impactSide(version: VersionRef, result: RunResult): ImpactSide {
  const pathway = result.pathways[0];
  if (!pathway) throw new Error("the preview ensemble returned no pathway");
  return {
    version,
    engineVersion: result.engineVersion,
    inputHash: result.inputHash,
    resultHash: result.resultHash,
    effectiveMembers: result.effectiveMembers,
    horizons: pathway.horizons.map((h) => ({ year: h.year, temperature: h.temperature, precision: h.precision, exceedance: h.exceedance })),
    implied: result.implied,
  };
}

/**
 * Version minus comparison for one percentile set: the shift of the median (p50) and the change
 * of the 5–95 width ((p95 − p5) of the version minus the same of the comparison). Needs p5, p50
 * and p95 on both sides (the impact spec always asks for them).
 */
export function spreadChange(version: PercentileSet, against: PercentileSet): SpreadChange {
  const need = (set: PercentileSet, key: string) => {
    const value = set[key];
    if (value === undefined) throw new Error(`percentile ${key} missing from the preview result`);
    return value;
  };
  const width = (set: PercentileSet) => need(set, "p95") - need(set, "p5");
  return { medianShift: need(version, "p50") - need(against, "p50"), widthChange: width(version) - width(against) };
}

/** Differences at every horizon (matched by year) and for the implied sensitivities. */
export function impactDifferences(version: ImpactSide, against: ImpactSide): ModelVersionImpact["differences"] {
  const againstByYear = new Map(against.horizons.map((h) => [h.year, h]));
  const horizons = version.horizons.flatMap((h) => {
    const other = againstByYear.get(h.year);
    if (!other) return [];
    const exceedance = Object.fromEntries(
      Object.entries(h.exceedance).flatMap(([threshold, p]) => {
        const q = other.exceedance[threshold];
        return q === undefined ? [] : [[threshold, p - q]];
      }),
    );
    return [{ year: h.year, ...spreadChange(h.temperature, other.temperature), exceedance }];
  });
  return {
    horizons,
    ecs: spreadChange(version.implied.ecs, against.implied.ecs),
    tcr: spreadChange(version.implied.tcr, against.implied.tcr),
  };
}
