import type { PathwayResult, PercentileSeries, RunSpec } from "../spec/types.js";
import type { EnsemblePlan } from "./ensemble-plan.js";
import { crossingShareByYear, crossingSummary } from "./crossing-summary.js";
import type { FinishWorkspace } from "./finish-workspace.js";
import { percentilePrecision } from "./percentile-precision.js";
import { percentileKey, percentileSet } from "./percentile-set.js";
import { likelihoodSd } from "./constraint-weights.js";
import { sensitivityBudget } from "./sensitivity-budget.js";
import { QUANTITIES, exceedanceRow, summaryRow } from "./yearly-layout.js";

export interface PathwayWeights {
  weights: Float64Array | null;
  totalWeight: number;
  effectiveMembers: number;
}

/**
 * Turns the streamed per-year summaries and the horizon snapshots of one pathway into its
 * result: series, exceedance, crossing years, horizon tables (with committed warming,
 * forcing by agent and precision), sensitivity budget and constraint diagnostics.
 * `work`: the run's working arrays (finish-workspace.ts), shared by its pathways.
 */
export function finishPathway(
  spec: RunSpec,
  plan: EnsemblePlan,
  pathwayIndex: number,
  weighting: PathwayWeights,
  work: FinishWorkspace,
): PathwayResult {
  const pathwaySpec = spec.pathways[pathwayIndex]!;
  const pathway = plan.pathways[pathwayIndex]!;
  const years = pathway.years;
  const yearly = plan.state.yearly;
  const percentiles = spec.percentiles;
  const P = percentiles.length;
  const row = (r: number) => Array.from(yearly.subarray(r * years, (r + 1) * years));
  const series = (quantity: number): PercentileSeries => {
    const out: PercentileSeries = {};
    if ((quantity === 1 && !plan.summaries.forcing) || (quantity === 2 && !plan.summaries.imbalance)) return out; // not asked for
    percentiles.forEach((p, j) => (out[percentileKey(p)] = row(summaryRow(quantity, j, P))));
    out.mean = row(summaryRow(quantity, P, P));
    return out;
  };
  const [temperature, forcing, imbalance] = QUANTITIES.map((_, q) => series(q)) as [PercentileSeries, PercentileSeries, PercentileSeries];
  const exceedance: Record<string, number[]> = {};
  spec.thresholds.forEach((th, i) => (exceedance[String(th)] = row(exceedanceRow(i, P))));

  const { weights, totalWeight, effectiveMembers } = weighting;
  const selector = work.selector;
  // One member column for every threshold's crossing years and every horizon's agent forcing
  // in turn (each is written in full before it is read).
  const scratch = work.column;
  const crossing: PathwayResult["crossing"] = {};
  const crossingShare: Record<string, number[]> = {};
  spec.thresholds.forEach((th) => {
    const ascendingIndex = plan.thresholdsAscending.indexOf(th);
    crossingShare[String(th)] = crossingShareByYear(plan.state.crossing[ascendingIndex]!, years, weights, totalWeight);
    crossing[String(th)] = crossingSummary(
      selector,
      plan.state.crossing[ascendingIndex]!,
      pathway.startYear,
      years,
      percentiles,
      weights,
      totalWeight,
      scratch,
    );
  });

  const horizons = spec.horizons.map((year, h) => {
    const t = year - pathway.startYear;
    const horizonExceedance: Record<string, number> = {};
    spec.thresholds.forEach((th, i) => (horizonExceedance[String(th)] = yearly[exceedanceRow(i, P) * years + t]!));
    const agentValues = scratch;
    const forcingByAgent: Record<string, Record<string, number>> = {};
    pathway.agents.forEach((agent, k) => {
      const b = pathway.base[k]![t]!;
      const column = pathway.scaleInput[k]!;
      if (column < 0) agentValues.fill(pathway.fixedScale[k]! * b);
      else {
        const scale = plan.columns[column]!;
        for (let m = 0; m < plan.members; m++) agentValues[m] = scale[m]! * b;
      }
      forcingByAgent[agent] = percentileSet(selector, agentValues, percentiles, weights, totalWeight);
    });
    return {
      year,
      temperature: percentileSet(selector, plan.state.horizonTemperature[h]!, percentiles, weights, totalWeight),
      exceedance: horizonExceedance,
      committed: percentileSet(selector, plan.state.horizonCommitted[h]!, percentiles, weights, totalWeight),
      precision: percentilePrecision(selector, plan.state.horizonTemperature[h]!, percentiles, weights, totalWeight, effectiveMembers),
      forcing: percentileSet(selector, plan.state.horizonForcing[h]!, percentiles, weights, totalWeight),
      forcingByAgent,
    };
  });

  const sensitivity = sensitivityBudget(plan, pathwayIndex, weighting, work);

  const c = spec.model.constraint;
  const constraint = c
    ? {
        from: c.from,
        to: c.to,
        observed: c.observed,
        sd: c.sd,
        internalVariability: c.internalVariability,
        likelihoodSd: likelihoodSd(c),
        effectiveMembers,
        windowWarmingPrior: percentileSet(selector, plan.state.windowMean, percentiles, null, 0),
        windowWarmingPosterior: percentileSet(selector, plan.state.windowMean, percentiles, weights, totalWeight),
        ecsPrior: percentileSet(selector, plan.climate.ecs, percentiles, null, 0),
        ecsPosterior: percentileSet(selector, plan.climate.ecs, percentiles, weights, totalWeight),
      }
    : null;

  return {
    id: pathwaySpec.id,
    name: pathwaySpec.name,
    years: Array.from({ length: years }, (_, t) => pathway.startYear + t),
    temperature,
    forcing,
    imbalance,
    exceedance,
    crossing,
    crossingShare,
    horizons,
    sensitivity,
    effectiveMembers,
    constraint,
  };
}
