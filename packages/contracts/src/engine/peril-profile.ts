import { z } from "zod";
import { distributionSchema, type Distribution } from "./distribution.js";
import { finite, label, slug } from "./peril-fields.js";

/**
 * Peril lens: how a hazard or loss metric scales with global
 * warming beyond the warming already in the insurer's own view of risk, and the portfolio
 * baseline figures it is applied to.
 *
 * Rules the engine follows (shown again in PERIL_RULES for screens and exports):
 * * Warming is the global-mean anomaly against 1850–1900, in K. `baselineWarming` (ΔT0) is
 *   the warming already contained in the firm's baseline risk view.
 * * per-kelvin: multiplier = (1 + r)^(ΔT − ΔT0), r a fraction per K (0.07 = 7 %/K), r > −1.
 *   Below the baseline warming the multiplier falls below 1, by the same law.
 * * table: the points give the metric at global warming levels relative to any fixed
 *   reference (AR6 SPM.6 uses 1850–1900 = 1). The multiplier is the table value at ΔT
 *   divided by the table value at ΔT0, so it is exactly 1 at the warming already in the
 *   risk view; when the table's value at ΔT0 is 1 the points are the multipliers
 *   themselves. Inside the table: straight lines between points (linear in warming).
 *   Outside: "hold" keeps the end point's value; "extrapolate" continues the end segment
 *   at its constant per-kelvin rate (geometric), so a multiplier never reaches 0.
 * * return periods: each table states the return period T_k of the events its multipliers
 *   describe. The multiplier m(T) of a 1-in-T event interpolates the tables' multipliers
 *   linearly in log multiplier against log return period (a power law between neighbouring
 *   tables). Outside the tables' return periods: "hold" keeps the nearest table's
 *   multiplier, "extrapolate" continues the end segment's power law; either way the result
 *   flags the reported return periods that lie outside the tables. One table: m(T) is its
 *   multiplier for every T.
 * * frequency metric: an event of return period T becomes one of return period T / m(T).
 *   AAL scales by the multiplier of the most frequent table's return period (frequent events
 *   make most of an average annual loss). A loss level of baseline return period t is
 *   exceeded m(t) times as often; the loss at return period T after scaling is the baseline
 *   loss at the smallest t ≥ 1 with t / m(t) ≥ T (t = T·m when m is the same for every
 *   return period), read off the baseline loss curve drawn straight on a log-return-period
 *   axis through the 1-in-100 and 1-in-200 points, extrapolated with the same slope both
 *   ways and floored at 0.
 * * severity metric: AAL scales by the most frequent table's multiplier, the 1-in-100 and
 *   1-in-200 losses by m(100) and m(200); return periods are not shifted (they need a
 *   hazard-to-loss curve the lens does not have).
 * * warming beyond a table: the result reports, per horizon, the (weighted) share of members
 *   whose warming lies below or above the warming range every table covers, so a held or
 *   extrapolated end value is never silent.
 * * A portfolio row is projected by every profile with the same peril and region.
 */

/** Perils the demo and the editor offer; any lower-case slug is accepted. */
export const SUGGESTED_PERILS = ["flood-heavy-rainfall", "heat", "wind", "drought", "wildfire", "hail", "coastal-flood"] as const;

export const PERIL_METRICS = ["frequency", "severity"] as const;
export type PerilMetric = (typeof PERIL_METRICS)[number];

/** Limits on the warming already contained in a baseline risk view (K above 1850–1900). */
export const BASELINE_WARMING_RANGE = [0, 3] as const;
/** Warming levels a table may list (K above 1850–1900). */
export const TABLE_WARMING_RANGE = [0, 10] as const;
/** Baseline return periods the lens reports (years): the pricing/solvency tail points. */
export const BASELINE_RETURN_PERIODS = [100, 200] as const;

/** z-scores of the upper end of a central range: 90 % -> 95th percentile, 66 % -> 83rd. */
const RANGE_Z: Record<90 | 66, number> = { 90: 1.6448536269514722, 66: 0.9541652531461943 };
/** Standard deviations below the centre that must stay above a rate of −100 % (P < 1e-9). */
const RATE_SAFETY_SDS = 6;

/**
 * Checks that a rate distribution cannot give r ≤ −1 (a multiplier base 1 + r ≤ 0).
 * Bounded shapes need their lower bound above −1; normal and split-normal shapes need
 * their centre six standard deviations above −1 (truncate them to bound them exactly).
 */
function rateSupportProblem(d: Distribution): { field: string; message: string } | null {
  const floor = "must be > -1 (a rate of -100 % per K or less leaves no hazard)";
  switch (d.type) {
    case "fixed":
      return d.value > -1 ? null : { field: "value", message: floor };
    case "uniform":
    case "triangular":
    case "truncated-normal":
      return d.min > -1 ? null : { field: "min", message: floor };
    case "lognormal":
      return null;
    case "normal":
      return d.mean - RATE_SAFETY_SDS * d.sd > -1
        ? null
        : { field: "sd", message: "lets the rate reach -100 % per K (mean - 6 sd must be > -1; use truncated-normal)" };
    case "range": {
      if (d.shape === "lognormal") return null;
      const lowSd = (d.p50 - d.low) / RANGE_Z[d.coverage];
      return d.p50 - RATE_SAFETY_SDS * lowSd > -1
        ? null
        : { field: "low", message: "lets the rate reach -100 % per K (p50 - 6 lower sd must be > -1)" };
    }
  }
}

export const perKelvinScalingSchema = z
  .object({
    kind: z.literal("per-kelvin"),
    /** Fractional change per K of warming beyond the baseline (0.07 = 7 %/K), uncertain. */
    rate: distributionSchema,
  })
  .strict()
  .superRefine((s, ctx) => {
    const problem = rateSupportProblem(s.rate);
    if (problem) ctx.addIssue({ code: "custom", path: ["rate", problem.field], message: problem.message });
  });

export const tablePointSchema = z
  .object({
    warming: finite().refine(
      (v) => v >= TABLE_WARMING_RANGE[0] && v <= TABLE_WARMING_RANGE[1],
      `must lie between ${TABLE_WARMING_RANGE[0]} and ${TABLE_WARMING_RANGE[1]} K above 1850–1900`,
    ),
    multiplier: finite().refine((v) => v > 0, "must be > 0"),
  })
  .strict();

/** Event return periods (years) a multiplier table may state it belongs to. */
export const TABLE_RETURN_PERIOD_RANGE = [1, 10000] as const;
/**
 * The return period read for a table saved before tables stated one (a bare `points` list):
 * 10 years, the event frequency of most published multiplier tables (AR6 WGI SPM Figure SPM.6
 * gives its heavy-precipitation and drought panels, and one of its hot-extreme panels, for
 * 10-year events). With one table every return period gets its multipliers, and the lens flags
 * the 1-in-100 and 1-in-200 figures as read beyond it.
 */
export const LEGACY_TABLE_RETURN_PERIOD = 10;

function warmingsIncrease(points: readonly { warming: number }[], ctx: z.RefinementCtx, path: (string | number)[]): void {
  points.forEach((p, i) => {
    const prev = points[i - 1];
    if (prev && !(p.warming > prev.warming))
      ctx.addIssue({
        code: "custom",
        path: [...path, i, "warming"],
        message: `must be greater than points[${i - 1}].warming (${prev.warming}): warming levels must strictly increase`,
      });
  });
}

const tablePointsSchema = () =>
  z.array(tablePointSchema, { error: "must be a list of { warming, multiplier }" }).min(2, "must hold at least two points");

/** One table: the multipliers by warming level for events of one return period. */
export const returnPeriodTableSchema = z
  .object({
    /** Return period (years) of the events whose change the multipliers describe, e.g. 10 for a 1-in-10-year event. */
    returnPeriod: finite().refine(
      (v) => v >= TABLE_RETURN_PERIOD_RANGE[0] && v <= TABLE_RETURN_PERIOD_RANGE[1],
      `must lie between ${TABLE_RETURN_PERIOD_RANGE[0]} and ${TABLE_RETURN_PERIOD_RANGE[1]} years`,
    ),
    points: tablePointsSchema(),
  })
  .strict()
  .superRefine((t, ctx) => warmingsIncrease(t.points, ctx, ["points"]));

/**
 * Table scaling: one table per event return period (at least one, return periods strictly
 * increasing). A stored profile from before return periods were stated (`points` instead of
 * `tables`) is read as one table for LEGACY_TABLE_RETURN_PERIOD-year events.
 */
export const tableScalingSchema = z
  .object({
    kind: z.literal("table"),
    tables: z
      .array(returnPeriodTableSchema, { error: "must be a list of { returnPeriod, points }" })
      .min(1, "must hold at least one table")
      .max(6, "must hold at most 6 tables")
      .optional(),
    /** Superseded by `tables`: a table saved before return periods were stated. */
    points: tablePointsSchema().optional(),
    beyondTable: z.enum(["hold", "extrapolate"], { error: 'must be "hold" or "extrapolate"' }),
    /** Outside the tables' return periods: keep the nearest table's multiplier, or continue the end segment's power law. */
    beyondReturnPeriods: z.enum(["hold", "extrapolate"], { error: 'must be "hold" or "extrapolate"' }).default("hold"),
  })
  .strict()
  .superRefine((s, ctx) => {
    if (s.tables && s.points)
      ctx.addIssue({
        code: "custom",
        path: ["points"],
        message: "must not be given with tables (put the points in a table with its return period)",
      });
    if (!s.tables && !s.points) ctx.addIssue({ code: "custom", path: ["tables"], message: "must hold at least one table" });
    if (s.points) warmingsIncrease(s.points, ctx, ["points"]);
    s.tables?.forEach((t, i) => {
      const prev = s.tables![i - 1];
      if (prev && !(t.returnPeriod > prev.returnPeriod))
        ctx.addIssue({
          code: "custom",
          path: ["tables", i, "returnPeriod"],
          message: `must be greater than tables[${i - 1}].returnPeriod (${prev.returnPeriod}): return periods must strictly increase`,
        });
    });
  })
  .transform((s) => ({
    kind: s.kind,
    tables: s.tables ?? [{ returnPeriod: LEGACY_TABLE_RETURN_PERIOD, points: s.points! }],
    beyondTable: s.beyondTable,
    beyondReturnPeriods: s.beyondReturnPeriods,
  }));

export const perilScalingSchema = z.discriminatedUnion("kind", [perKelvinScalingSchema, tableScalingSchema], {
  error: 'kind must be "per-kelvin" or "table"',
});

export const perilProfileSchema = z
  .object({
    id: z.string({ error: "must be text" }).trim().min(1, "must not be empty").max(64, "must be at most 64 characters"),
    name: label(),
    peril: slug("flood-heavy-rainfall"),
    region: label(),
    metric: z.enum(PERIL_METRICS, { error: 'must be "frequency" or "severity"' }),
    baselineWarming: finite().refine(
      (v) => v >= BASELINE_WARMING_RANGE[0] && v <= BASELINE_WARMING_RANGE[1],
      `must lie between ${BASELINE_WARMING_RANGE[0]} and ${BASELINE_WARMING_RANGE[1]} K (warming above 1850–1900 already in the risk view)`,
    ),
    scaling: perilScalingSchema,
    /** Where the scaling comes from and how sure it is (e.g. "AR6 WGI SPM B.2.4; common practice"). */
    source: z.string({ error: "must be text" }).trim().max(500, "must be at most 500 characters").optional(),
  })
  .strict();

/** Profiles of one run: ids unique. */
export const perilProfilesSchema = z.array(perilProfileSchema, { error: "must be a list of peril profiles" }).superRefine((ps, ctx) => {
  const seen = new Map<string, number>();
  ps.forEach((p, i) => {
    const first = seen.get(p.id);
    if (first !== undefined) ctx.addIssue({ code: "custom", path: [i, "id"], message: `"${p.id}" is used twice (also perils[${first}])` });
    else seen.set(p.id, i);
  });
});

/**
 * Cross-field checks for a run spec carrying perils: warming levels and baseline warming are
 * measured against 1850–1900, so the run's anomaly baseline must be 1850–1900.
 */
export function perilSpecIssues(spec: {
  baseline: readonly [number, number];
  perils?: readonly unknown[] | undefined;
  portfolio?: unknown;
}): { path: (string | number)[]; message: string }[] {
  const issues: { path: (string | number)[]; message: string }[] = [];
  const hasPerils = (spec.perils?.length ?? 0) > 0;
  if (hasPerils && (spec.baseline[0] !== 1850 || spec.baseline[1] !== 1900))
    issues.push({
      path: ["baseline"],
      message: "must be [1850, 1900] when perils are given (peril warming levels are measured against 1850–1900)",
    });
  if (spec.portfolio !== undefined && spec.portfolio !== null && !hasPerils)
    issues.push({ path: ["portfolio"], message: "needs at least one peril profile in perils to be projected" });
  return issues;
}

/** The rules above in plain words, for result screens and workbook cautions. */
export const PERIL_RULES: readonly string[] = [
  "Warming is the global-mean anomaly against 1850–1900; multipliers apply only to warming beyond the baseline warming already in the firm's risk view.",
  "Per-kelvin scaling: multiplier = (1 + r)^(warming − baseline warming), r as a fraction per K, sampled member by member so warming and scaling uncertainty combine.",
  "Table scaling: straight lines between the table's points, divided by the table's value at the baseline warming (multiplier 1 there); outside the table the end value is held or the end segment's per-kelvin rate is continued, as the profile states. The share of members whose warming lies beyond the table is reported for every horizon, with a warning above 5 %.",
  "Return periods: each table states the return period of the events its multipliers describe; a 1-in-T event's multiplier is interpolated between the tables as a straight line of log multiplier against log return period; outside the tables' return periods the nearest table is held or the end segment continued, as the profile states, and the figures read there are flagged.",
  "Frequency profiles: an event of return period T becomes one of return period T / m(T); AAL scales by the multiplier of the most frequent table's return period; a loss level of baseline return period t is exceeded m(t) times as often, so the loss at return period T becomes the baseline loss at the smallest t for which t / m(t) is at least T (T × m when every return period has the same multiplier), read on a straight line through the 1-in-100 and 1-in-200 losses against the logarithm of the return period (same slope beyond them, never below 0).",
  "Severity profiles: AAL scales by the most frequent table's multiplier, the 1-in-100 and 1-in-200 losses by the multipliers of those return periods; return periods are not shifted.",
  "Not a catastrophe model: multipliers adjust the firm's own view of risk. Scaling differs by region, peril and return period (rarer events can change more in frequency); exposure growth, adaptation, compound perils and tipping points are not included.",
];

export type PerKelvinScaling = z.output<typeof perKelvinScalingSchema>;
export type TableScaling = z.output<typeof tableScalingSchema>;
export type ReturnPeriodTable = z.output<typeof returnPeriodTableSchema>;
export type PerilScaling = z.output<typeof perilScalingSchema>;
export type PerilProfile = z.output<typeof perilProfileSchema>;
