import { PercentileSelector } from "../summary/percentile-selector.js";
import { SpecError } from "../spec/spec-error.js";
import { perKelvinMultiplier } from "./per-kelvin-multiplier.js";
import { projectRow } from "./project-losses.js";
import { planPortfolioTotals, PortfolioTotalsAccumulator } from "./portfolio-totals.js";
import { sampleRates } from "./sample-rates.js";
import { summariseValues } from "./summarise-values.js";
import { tableMultiplierAt } from "./table-multiplier.js";
import { BASELINE_RETURN_PERIODS, shiftedReturnPeriod } from "./return-periods.js";
import type {
  PathwayPerilResult,
  PerilHorizonResult,
  PerilProfile,
  PerilProfileResult,
  Portfolio,
  PortfolioRow,
  ProjectedLoss,
} from "./types.js";

export interface PerilLensInput {
  /** Id of the pathway these warmings belong to (copied to the result). */
  pathwayId: string;
  /** The run's seed; each profile draws its rates from its own sub-stream of it. */
  seed: string;
  /** How the rates are drawn; pass the run's sampling. */
  sampling: "latin-hypercube" | "monte-carlo";
  /** Profiles in spec order; their index names them in errors (perils[i]). */
  profiles: readonly PerilProfile[];
  portfolio: Portfolio | null;
  /** Horizon years, in the order of warmingAtHorizons. */
  horizons: readonly number[];
  /** Per horizon, each member's warming (K, anomaly against 1850–1900): one array per horizon, all of length members. */
  warmingAtHorizons: readonly Float64Array[];
  /** Member weights from the observational constraint (non-negative, not all 0), or null for equal weights. */
  weights: Float64Array | null;
  /** Percentiles to report, in (0, 100): the run's percentiles. */
  percentiles: readonly number[];
}

/**
 * Applies the peril profiles to one pathway's ensemble at its horizons.
 *
 * Method: for each profile, each member gets its own rate (sampleRates: the profile's own
 * seeded stream, independent of the pathway, so a member keeps its rate everywhere); at
 * each horizon the member's multiplier is computed from its own warming and its own rate,
 * so warming uncertainty and scaling uncertainty combine member by member. From the
 * member multipliers m_i: return periods of today's 1-in-100 and 1-in-200 events (T / m_i,
 * frequency profiles only) and projected AAL, 1-in-100 and 1-in-200 losses of each
 * portfolio row with the profile's peril and region (projectRow). Each output is summarised
 * by weighted R-7 percentiles and the weighted mean (summariseValues). With a portfolio, the
 * portfolio totals per currency are added up member by member across all rows before they
 * are summarised (PortfolioTotalsAccumulator), so no percentiles are ever added.
 * Memory O(members); cost O(members × horizons × (1 + outputs)) plus O(members) sampling
 * per profile. Pure: same inputs, same numbers.
 *
 * Example: one member, warming 2.1 at 2050, profile per-kelvin fixed 7 %/K, baseline 1.1,
 * metric frequency → multiplier { p50: 1.07, mean: 1.07 }, returnPeriods["100"].p50 = 93.46.
 */
export function applyPerilLens(input: PerilLensInput): PathwayPerilResult {
  const members = checkLensInput(input);
  const selector = new PercentileSelector();
  const multipliers = new Float64Array(members);
  const scratch = new Float64Array(members);
  const plan = input.portfolio ? planPortfolioTotals(input.profiles, input.portfolio) : null;
  const totals =
    input.portfolio && plan && !("refused" in plan) ? new PortfolioTotalsAccumulator(input.portfolio, plan, input.horizons, members) : null;
  const profiles = input.profiles.map((profile, index): PerilProfileResult => {
    const multiplierAt = memberMultiplier(profile, index, members, input);
    const rows = matchingRows(profile, input.portfolio);
    const horizons = input.horizons.map((year, h): PerilHorizonResult => {
      const warming = input.warmingAtHorizons[h]!;
      for (let i = 0; i < members; i++) multipliers[i] = multiplierAt(warming[i]!, i);
      totals?.addProfile(index, profile.metric, h, multipliers);
      const summarise = (fill: (m: number) => number) => {
        for (let i = 0; i < members; i++) scratch[i] = fill(multipliers[i]!);
        return summariseValues(scratch, input.weights, input.percentiles, selector);
      };
      const multiplier = summariseValues(multipliers, input.weights, input.percentiles, selector);
      const returnPeriods =
        profile.metric === "frequency"
          ? {
              "100": summarise((m) => shiftedReturnPeriod(BASELINE_RETURN_PERIODS[0], m)),
              "200": summarise((m) => shiftedReturnPeriod(BASELINE_RETURN_PERIODS[1], m)),
            }
          : null;
      const losses = rows.map(
        (row): ProjectedLoss => ({
          region: row.region,
          peril: row.peril,
          currency: row.currency,
          aal: summarise((m) => projectRow(row, profile.metric, m).aal),
          loss100: summarise((m) => projectRow(row, profile.metric, m).loss100),
          loss200: summarise((m) => projectRow(row, profile.metric, m).loss200),
        }),
      );
      return { year, multiplier, returnPeriods, losses };
    });
    return {
      profileId: profile.id,
      name: profile.name,
      peril: profile.peril,
      region: profile.region,
      metric: profile.metric,
      baselineWarming: profile.baselineWarming,
      horizons,
    };
  });
  const result: PathwayPerilResult = { pathwayId: input.pathwayId, profiles };
  if (totals) result.totals = totals.summarise(input.weights, input.percentiles, selector);
  return result;
}

/** Portfolio rows a profile projects: same peril and same region (exact text). */
export function matchingRows(profile: Pick<PerilProfile, "peril" | "region">, portfolio: Portfolio | null): PortfolioRow[] {
  if (!portfolio) return [];
  return portfolio.rows.filter((row) => row.peril === profile.peril && row.region === profile.region);
}

/** The member-by-member multiplier of one profile: (warming, member index) → multiplier. */
function memberMultiplier(
  profile: PerilProfile,
  index: number,
  members: number,
  input: PerilLensInput,
): (warming: number, member: number) => number {
  const at = `perils[${index}]`;
  const scaling = profile.scaling;
  if (scaling.kind === "table") {
    const table = tableMultiplierAt(scaling.points, scaling.beyondTable, profile.baselineWarming);
    return (warming) => table(warming);
  }
  const rates = sampleRates(scaling.rate, members, input.seed, profile.id, input.sampling, `${at}.scaling.rate`);
  for (let i = 0; i < members; i++)
    if (!(rates[i]! > -1))
      throw new SpecError(`${at}.scaling.rate`, `drew ${rates[i]} for member ${i}: rates must stay above -1 (-100 % per K); bound the distribution`);
  const baseline = profile.baselineWarming;
  return (warming, member) => perKelvinMultiplier(rates[member]!, warming, baseline);
}

/** Checks the arrays and returns the member count. */
function checkLensInput(input: PerilLensInput): number {
  if (input.horizons.length !== input.warmingAtHorizons.length)
    throw new RangeError(`warmingAtHorizons must hold one array per horizon (${input.horizons.length}), got ${input.warmingAtHorizons.length}`);
  if (input.percentiles.length === 0) throw new RangeError("percentiles must list at least one percentile");
  input.percentiles.forEach((p, i) => {
    if (!(p > 0 && p < 100)) throw new RangeError(`percentiles[${i}] must lie strictly between 0 and 100`);
  });
  const members = input.warmingAtHorizons[0]?.length ?? input.weights?.length ?? 1;
  if (members < 1) throw new RangeError("warmingAtHorizons arrays must not be empty");
  input.warmingAtHorizons.forEach((w, h) => {
    if (w.length !== members) throw new RangeError(`warmingAtHorizons[${h}] has ${w.length} members, expected ${members}`);
    for (let i = 0; i < members; i++)
      if (!Number.isFinite(w[i]!)) throw new RangeError(`warmingAtHorizons[${h}][${i}] must be finite`);
  });
  if (input.weights) {
    if (input.weights.length !== members) throw new RangeError(`weights has ${input.weights.length} members, expected ${members}`);
    let total = 0;
    for (let i = 0; i < members; i++) {
      const w = input.weights[i]!;
      if (!(w >= 0 && Number.isFinite(w))) throw new RangeError(`weights[${i}] must be a finite number ≥ 0`);
      total += w;
    }
    if (!(total > 0)) throw new RangeError("weights must not all be 0");
  }
  return members;
}
