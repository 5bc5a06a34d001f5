import type { ImpactPathway, ImpactSide, ModelVersionImpact, PercentileSet, RunResult, SpreadChange } from "@plumeline/contracts";

type VersionRef = ImpactSide["version"];

/**
 * The run-wide facts of one preview ensemble's result: hashes, effective members and the
 * implied ECS/TCR percentiles (these do not depend on the pathway). Nothing is recomputed here:
 * every number is the engine's own, so it matches a run of the same spec exactly.
 */
export function impactSide(version: VersionRef, result: RunResult): ImpactSide {
  return {
    version,
    engineVersion: result.engineVersion,
    inputHash: result.inputHash,
    resultHash: result.resultHash,
    effectiveMembers: result.effectiveMembers,
    implied: result.implied,
  };
}

type Horizons = ImpactPathway["version"];

const horizonsOf = (result: RunResult, pathwayId: string, side: string): Horizons => {
  const pathway = result.pathways.find((p) => p.id === pathwayId);
  if (!pathway) throw new Error(`the ${side} preview ensemble returned no pathway ${pathwayId}`);
  return pathway.horizons.map((h) => ({ year: h.year, temperature: h.temperature, precision: h.precision, exceedance: h.exceedance }));
};

/** Per pathway (in the order given): both versions' horizons, matched by pathway id, and their differences. */
export function impactPathways(pathways: Array<{ id: string; name: string }>, mine: RunResult, theirs: RunResult): ImpactPathway[] {
  return pathways.map((p) => {
    const version = horizonsOf(mine, p.id, "version's");
    const against = horizonsOf(theirs, p.id, "comparison's");
    return { pathway: { id: p.id, name: p.name }, version, against, differences: horizonDifferences(version, against) };
  });
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

/** Differences at every horizon of one pathway, matched by year (version minus comparison). */
export function horizonDifferences(version: Horizons, against: Horizons): ImpactPathway["differences"] {
  const againstByYear = new Map(against.map((h) => [h.year, h]));
  return version.flatMap((h) => {
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
}

/** Differences of the implied sensitivities (run-wide, not per pathway). */
export function impliedDifferences(version: ImpactSide, against: ImpactSide): ModelVersionImpact["differences"] {
  return {
    ecs: spreadChange(version.implied.ecs, against.implied.ecs),
    tcr: spreadChange(version.implied.tcr, against.implied.tcr),
  };
}
