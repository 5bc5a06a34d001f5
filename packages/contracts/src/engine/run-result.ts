import { z } from "zod";
import { perilResultSchema } from "./peril-result.js";

/**
 * Percentile summaries keyed "p" + percentile ("p5", "p17", "p50", …), following the
 * percentiles the spec asked for. Linear interpolation between order statistics
 * (R type 7, NumPy's default); weighted when an observational constraint applies.
 */
export const percentileSetSchema = z.record(z.string().regex(/^p\d+(\.\d+)?$/), z.number());
export type PercentileSet = z.infer<typeof percentileSetSchema>;

/** Per-year series: one array per percentile key plus the (weighted) mean. */
export const percentileSeriesSchema = z.record(z.string(), z.array(z.number()));
export type PercentileSeries = z.infer<typeof percentileSeriesSchema>;

/**
 * Distribution-free 95 % interval for each reported percentile (order statistics; Conover,
 * Practical Nonparametric Statistics, 3rd ed., Section 3.2);
 * null when the ensemble is too small for such an interval to exist.
 */
export const precisionSchema = z.record(z.string(), z.tuple([z.number(), z.number()]).nullable());

export const crossingSchema = z.record(
  z.string(),
  z.record(z.string(), z.number().nullable()),
);

export const horizonSchema = z.object({
  year: z.number().int(),
  temperature: percentileSetSchema,
  exceedance: z.record(z.string(), z.number()),
  /** Committed warming if forcing stayed at this year's level: the equilibrium warming F/λ minus the warming since the pathway start. */
  committed: percentileSetSchema,
  precision: precisionSchema,
  forcing: percentileSetSchema,
  forcingByAgent: z.record(z.string(), percentileSetSchema),
});

export const sensitivityEntrySchema = z.object({
  input: z.string(),
  horizon: z.number().int(),
  /** Spearman's rank correlation of the input with the horizon warming; weighted under a constraint (engine 0.3.0 on). */
  index: z.number(),
  /**
   * The input's first-order share (0–1) of the variance of the horizon warming (a Sobol main
   * effect estimated from the ensemble; weighted under a constraint). The shares of all inputs
   * add up to at most 1; the remainder is interactions. Absent in results of engines before 0.3.0.
   */
  varianceShare: z.number().min(0).max(1).optional(),
});

export const pathwayResultSchema = z.object({
  id: z.string(),
  name: z.string(),
  years: z.array(z.number().int()),
  temperature: percentileSeriesSchema,
  forcing: percentileSeriesSchema,
  imbalance: percentileSeriesSchema,
  exceedance: z.record(z.string(), z.array(z.number())),
  crossing: crossingSchema,
  /** Per threshold, per year (aligned with `years`): share of members (0–1) first crossing that year. Optional: newer engines. */
  crossingShare: z.record(z.string(), z.array(z.number())).optional(),
  horizons: z.array(horizonSchema),
  sensitivity: z.array(sensitivityEntrySchema),
  effectiveMembers: z.number(),
  constraint: z
    .object({
      from: z.number().int(),
      to: z.number().int(),
      observed: z.number(),
      sd: z.number(),
      /** Internal variability used (1 sd, K) and the likelihood's total sd; absent before engine 0.3.0. */
      internalVariability: z.number().optional(),
      likelihoodSd: z.number().optional(),
      effectiveMembers: z.number(),
      windowWarmingPrior: percentileSetSchema,
      windowWarmingPosterior: percentileSetSchema,
      ecsPrior: percentileSetSchema,
      ecsPosterior: percentileSetSchema,
    })
    .nullable(),
});

export const runResultSchema = z.object({
  engineVersion: z.string(),
  inputHash: z.string(),
  resultHash: z.string(),
  members: z.number().int(),
  effectiveMembers: z.number(),
  /** Implied sensitivities of the sampled members (weighted by the first pathway's constraint, if any). */
  implied: z.object({ ecs: percentileSetSchema, tcr: percentileSetSchema }),
  pathways: z.array(pathwayResultSchema),
  /** Peril lens results, present when the spec carried perils (peril-result.ts). */
  perils: perilResultSchema.optional(),
});

export type HorizonResult = z.infer<typeof horizonSchema>;
export type SensitivityEntry = z.infer<typeof sensitivityEntrySchema>;
export type PathwayResult = z.infer<typeof pathwayResultSchema>;
export type RunResult = z.infer<typeof runResultSchema>;
