import { PercentileSelector } from "../summary/percentile-selector.js";
import { SpecError } from "../spec/spec-error.js";
import { perKelvinMultiplier } from "./per-kelvin-multiplier.js";
import { projectRowAcrossReturnPeriods } from "./project-losses.js";
import { planPortfolioTotals, PortfolioTotalsAccumulator } from "./portfolio-totals.js";
import { multiplierAtReturnPeriod } from "./return-period-multiplier.js";
import { tableProfileReader } from "./table-profile.js";
import { sampleRates } from "./sample-rates.js";
import { summariseValues } from "./summarise-values.js";
import { BASELINE_RETURN_PERIODS, shiftedReturnPeriod } from "./return-periods.js";
import type {
  BeyondTableShare,
  PathwayPerilResult,
  PerilHorizonResult,
  PerilProfile,
  PerilProfileResult,
  Portfolio,
  PortfolioRow,
  ProjectedLoss,
  TableScaling,
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
 * each horizon the member's multipliers are computed from its own warming and its own rate,
 * so warming uncertainty and scaling uncertainty combine member by member. A table profile
 * gives one multiplier per table (per event return period); a 1-in-T event's multiplier m(T)
 * is read between them in log return period (multiplierAtReturnPeriod). From the member
 * multipliers: the AAL multiplier (the most frequent table's), m(100) and m(200), return
 * periods of today's 1-in-100 and 1-in-200 events (T / m(T), frequency profiles only) and
 * projected AAL, 1-in-100 and 1-in-200 losses of each portfolio row with the profile's peril
 * and region (projectRowAcrossReturnPeriods). Each output is summarised by weighted R-7
 * percentiles and the weighted mean (summariseValues). For a table profile each horizon also
 * reports the weighted share of members whose warming lies below or above the warming range
 * every table covers, so a held or extrapolated end value is never silent. With a portfolio,
 * the portfolio totals per currency are added up member by member across all rows before they
 * are summarised (PortfolioTotalsAccumulator), so no percentiles are ever added.
 * Memory O(members × tables); cost O(members × horizons × (tables + outputs)) plus O(members)
 * sampling per profile. Pure: same inputs, same numbers.
 *
 * Example: one member, warming 2.1 at 2050, profile per-kelvin fixed 7 %/K, baseline 1.1,
 * metric frequency → multiplier { p50: 1.07, mean: 1.07 }, returnPeriods["100"].p50 = 93.46.
 */
export function applyPerilLens(input: PerilLensInput): PathwayPerilResult {
  const members = checkLensInput(input);
  const selector = new PercentileSelector();
  const scratch = new Float64Array(members);
  const plan = input.portfolio ? planPortfolioTotals(input.profiles, input.portfolio) : null;
  const totals =
    input.portfolio && plan && !("refused" in plan) ? new PortfolioTotalsAccumulator(input.portfolio, plan, input.horizons, members) : null;
  const profiles = input.profiles.map((profile, index): PerilProfileResult => {
    const lens = memberLens(profile, index, members, input);
    const tables = lens.returnPeriods.length;
    const perTable = Array.from({ length: tables }, () => new Float64Array(members));
    const at100 = new Float64Array(members);
    const at200 = new Float64Array(members);
    const one = new Float64Array(tables);
    const rows = matchingRows(profile, input.portfolio);
    const summarise = (fill: (i: number) => number) => {
      for (let i = 0; i < members; i++) scratch[i] = fill(i);
      return summariseValues(scratch, input.weights, input.percentiles, selector);
    };
    const horizons = input.horizons.map((year, h): PerilHorizonResult => {
      const warming = input.warmingAtHorizons[h]!;
      for (let i = 0; i < members; i++) {
        lens.multipliersAt(warming[i]!, i, one);
        for (let k = 0; k < tables; k++) perTable[k]![i] = one[k]!;
        at100[i] = multiplierAtReturnPeriod(lens.returnPeriods, one, lens.beyondReturnPeriods, BASELINE_RETURN_PERIODS[0]);
        at200[i] = multiplierAtReturnPeriod(lens.returnPeriods, one, lens.beyondReturnPeriods, BASELINE_RETURN_PERIODS[1]);
      }
      const multiplier = summariseValues(perTable[0]!, input.weights, input.percentiles, selector);
      const tailMultipliers = { "100": summariseValues(at100, input.weights, input.percentiles, selector), "200": summariseValues(at200, input.weights, input.percentiles, selector) };
      const returnPeriods =
        profile.metric === "frequency"
          ? {
              "100": summarise((i) => shiftedReturnPeriod(BASELINE_RETURN_PERIODS[0], at100[i]!)),
              "200": summarise((i) => shiftedReturnPeriod(BASELINE_RETURN_PERIODS[1], at200[i]!)),
            }
          : null;
      const figuresOf = (row: PortfolioRow, i: number) => {
        for (let k = 0; k < tables; k++) one[k] = perTable[k]![i]!;
        return projectRowAcrossReturnPeriods(row, profile.metric, { returnPeriods: lens.returnPeriods, multipliers: one, beyond: lens.beyondReturnPeriods });
      };
      totals?.addProfile(index, h, figuresOf);
      const losses = rows.map((row): ProjectedLoss => {
        const aal = new Float64Array(members);
        const loss100 = new Float64Array(members);
        const loss200 = new Float64Array(members);
        for (let i = 0; i < members; i++) {
          const figures = figuresOf(row, i);
          aal[i] = figures.aal;
          loss100[i] = figures.loss100;
          loss200[i] = figures.loss200;
        }
        return {
          region: row.region,
          peril: row.peril,
          currency: row.currency,
          aal: summariseValues(aal, input.weights, input.percentiles, selector),
          loss100: summariseValues(loss100, input.weights, input.percentiles, selector),
          loss200: summariseValues(loss200, input.weights, input.percentiles, selector),
        };
      });
      const beyondTable = lens.warmingRange ? shareBeyond(warming, lens.warmingRange, input.weights) : null;
      return { year, multiplier, tailMultipliers, beyondTable, returnPeriods, losses };
    });
    return {
      profileId: profile.id,
      name: profile.name,
      peril: profile.peril,
      region: profile.region,
      metric: profile.metric,
      baselineWarming: profile.baselineWarming,
      table: lens.warmingRange
        ? {
            returnPeriods: lens.returnPeriods.slice(),
            warmingRange: lens.warmingRange,
            beyondTable: (profile.scaling as TableScaling).beyondTable,
            beyondReturnPeriods: lens.beyondReturnPeriods,
            readOutside: BASELINE_RETURN_PERIODS.filter((t) => t < lens.returnPeriods[0]! || t > lens.returnPeriods[tables - 1]!),
          }
        : null,
      multiplierReturnPeriod: tables > 1 ? lens.returnPeriods[0]! : null,
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

/**
 * Weighted share of members whose warming lies below range[0] or above range[1]:
 * Σ w_i [ΔT_i < low] / Σ w_i and Σ w_i [ΔT_i > high] / Σ w_i (equal weights without a constraint).
 * Cost O(members).
 *
 * Example: warming [0.5, 1, 5], range [0, 4], no weights → { below: 0, above: 1/3 }.
 */
export function shareBeyond(warming: Float64Array, range: readonly [number, number], weights: Float64Array | null): BeyondTableShare {
  let below = 0;
  let above = 0;
  let total = 0;
  for (let i = 0; i < warming.length; i++) {
    const w = weights ? weights[i]! : 1;
    total += w;
    if (warming[i]! < range[0]) below += w;
    else if (warming[i]! > range[1]) above += w;
  }
  return { below: below / total, above: above / total };
}

interface MemberLens {
  /** Return periods of the profile's tables (one entry, NaN, for a per-kelvin profile: one multiplier for every return period). */
  returnPeriods: number[];
  beyondReturnPeriods: "hold" | "extrapolate";
  /** Table profiles: the warming range every table covers; null for per-kelvin. */
  warmingRange: [number, number] | null;
  /** Fills out[k] with the member's multiplier for table k at this warming. */
  multipliersAt(warming: number, member: number, out: Float64Array): void;
}

/** The member-by-member multipliers of one profile. */
function memberLens(profile: PerilProfile, index: number, members: number, input: PerilLensInput): MemberLens {
  const at = `perils[${index}]`;
  const scaling = profile.scaling;
  if (scaling.kind === "table") {
    let reader: ReturnType<typeof tableProfileReader>;
    try {
      reader = tableProfileReader(scaling, profile.baselineWarming);
    } catch (error) {
      throw new SpecError(`${at}.scaling`, (error as Error).message);
    }
    return {
      returnPeriods: reader.returnPeriods,
      beyondReturnPeriods: scaling.beyondReturnPeriods ?? "hold",
      warmingRange: reader.warmingRange,
      multipliersAt: (warming, _member, out) => reader.multipliersAt(warming, out),
    };
  }
  const rates = sampleRates(scaling.rate, members, input.seed, profile.id, input.sampling, `${at}.scaling.rate`);
  for (let i = 0; i < members; i++)
    if (!(rates[i]! > -1))
      throw new SpecError(`${at}.scaling.rate`, `drew ${rates[i]} for member ${i}: rates must stay above -1 (-100 % per K); bound the distribution`);
  const baseline = profile.baselineWarming;
  return {
    returnPeriods: [Number.NaN],
    beyondReturnPeriods: "hold",
    warmingRange: null,
    multipliersAt: (warming, member, out) => {
      out[0] = perKelvinMultiplier(rates[member]!, warming, baseline);
    },
  };
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
