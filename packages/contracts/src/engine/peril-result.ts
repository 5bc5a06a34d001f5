import { z } from "zod";
import { PERIL_METRICS } from "./peril-profile.js";

/**
 * What the peril lens reports in a run result: per pathway, each profile's multipliers, return
 * periods and projected losses by horizon, and the portfolio's totals per currency. The rules
 * behind the figures are with the profile (peril-profile.ts).
 */

/** Summary of one uncertain output: the requested percentiles ("p5" …) and the (weighted) mean. */
export const perilSummarySchema = z.record(z.string().regex(/^(p\d+(\.\d+)?|mean)$/), z.number());

export const projectedLossSchema = z.object({
  region: z.string(),
  peril: z.string(),
  currency: z.string(),
  aal: perilSummarySchema,
  loss100: perilSummarySchema,
  loss200: perilSummarySchema,
});

/** Share of members (weighted) whose warming lies outside a table profile's warming range, 0–1. */
export const beyondTableShareSchema = z.object({ below: z.number(), above: z.number() });

/** Above this share of members beyond a table's warming range, screens and exports warn. */
export const BEYOND_TABLE_WARNING_SHARE = 0.05;

export const perilHorizonResultSchema = z.object({
  year: z.number().int(),
  /** The multiplier AAL uses: for a table profile, that of its most frequent table's return period. */
  multiplier: perilSummarySchema,
  /** Multipliers of today's 1-in-100 and 1-in-200 events, m(100) and m(200). Optional: newer engines. */
  tailMultipliers: z.object({ "100": perilSummarySchema, "200": perilSummarySchema }).optional(),
  /** Table profiles: members beyond the table's warming range; null for per-kelvin. Optional: newer engines. */
  beyondTable: beyondTableShareSchema.nullable().optional(),
  /** Frequency profiles: return period (years) of today's 1-in-100 and 1-in-200 events; null for severity. */
  returnPeriods: z.object({ "100": perilSummarySchema, "200": perilSummarySchema }).nullable(),
  losses: z.array(projectedLossSchema),
});

export const perilProfileResultSchema = z.object({
  profileId: z.string(),
  name: z.string(),
  peril: z.string(),
  region: z.string(),
  metric: z.enum(PERIL_METRICS),
  baselineWarming: z.number(),
  /** Table profiles: the tables' return periods (years) and the warming range (K) every table covers; null for per-kelvin. */
  table: z
    .object({
      returnPeriods: z.array(z.number()),
      warmingRange: z.tuple([z.number(), z.number()]),
      beyondTable: z.enum(["hold", "extrapolate"]),
      beyondReturnPeriods: z.enum(["hold", "extrapolate"]),
      /** Reported return periods (1-in-100, 1-in-200) outside the tables' return periods: read by holding or extrapolating. */
      readOutside: z.array(z.number()),
    })
    .nullable()
    .optional(),
  /** Return period (years) whose multiplier `multiplier` and AAL use; null when one multiplier serves every return period. */
  multiplierReturnPeriod: z.number().nullable().optional(),
  horizons: z.array(perilHorizonResultSchema),
});

const portfolioFiguresSchema = z.object({ aal: z.number(), loss100: z.number(), loss200: z.number() });

/**
 * The portfolio's totals in one currency: every member's projected figures added over all the
 * rows in that currency (rows no profile projects enter at their baseline figures), then
 * summarised; `baseline` is today's sum of the rows. Currencies are never added together.
 */
export const portfolioTotalSchema = z.object({
  currency: z.string(),
  rows: z.number().int(),
  projectedRows: z.number().int(),
  baseline: portfolioFiguresSchema,
  horizons: z.array(
    z.object({ year: z.number().int(), aal: perilSummarySchema, loss100: perilSummarySchema, loss200: perilSummarySchema }),
  ),
});

export const pathwayPerilResultSchema = z.object({
  pathwayId: z.string(),
  profiles: z.array(perilProfileResultSchema),
  /** With a portfolio: its totals, one per currency (absent in results made before totals existed, or when refused). */
  totals: z.array(portfolioTotalSchema).optional(),
});

export const perilResultSchema = z.object({
  portfolioId: z.string().nullable(),
  pathways: z.array(pathwayPerilResultSchema),
  /** Portfolio rows no profile matched (same peril and region): not projected. */
  unmatchedRows: z.array(z.object({ region: z.string(), peril: z.string() })),
  /** Why the portfolio has no totals (a row two profiles would project). */
  totalsRefused: z.string().optional(),
});

/** What the portfolio totals are and are not; shown beside them on screen, in the workbook and the report. */
export const PORTFOLIO_TOTAL_NOTES: readonly string[] = [
  "Totals are added member by member: each ensemble member's projected figures are summed over all rows of the portfolio, then percentiles are taken; percentiles are never added.",
  "Rows no peril profile projects enter the totals at their baseline figures, unchanged.",
  "Adding 1-in-100 and 1-in-200 losses within a member gives no diversification credit between perils and regions, so read the tail totals as an upper bound in that sense, not as the portfolio's own 1-in-100 or 1-in-200 loss. Adding the rows' tail losses assumes their tail events strike in the same year (perfectly dependent); for a percentile measure that is conservative in practice but not a guaranteed bound, because percentiles of a sum can exceed the sum of percentiles when losses are heavy-tailed. Defer to the firm's capital model and licensed actuarial judgement for aggregate tail losses.",
  "Currencies are kept apart: a portfolio with rows in several currencies gets one total per currency and no combined total. Plumeline converts no currency.",
];

export type BeyondTableShare = z.infer<typeof beyondTableShareSchema>;
export type PerilSummary = z.infer<typeof perilSummarySchema>;
export type ProjectedLoss = z.infer<typeof projectedLossSchema>;
export type PerilHorizonResult = z.infer<typeof perilHorizonResultSchema>;
export type PerilProfileResult = z.infer<typeof perilProfileResultSchema>;
export type PortfolioTotal = z.infer<typeof portfolioTotalSchema>;
export type PathwayPerilResult = z.infer<typeof pathwayPerilResultSchema>;
export type PerilResult = z.infer<typeof perilResultSchema>;
