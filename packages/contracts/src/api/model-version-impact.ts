import { z } from "zod";
import { MODEL_VERSION_STATUSES } from "./model-versions.js";
import { materialityFiringSchema, materialityPolicySchema } from "./materiality.js";
import { percentileSetSchema, precisionSchema } from "../engine/run-result.js";

/**
 * Effect of a model version on key outputs (POST /api/model-versions/:id/impact): a small,
 * seeded preview ensemble of the version and of the version it is compared against (its
 * parent by default), on every pathway the version pins (or those asked for), built exactly
 * as a run would be. Indicative: the run is the record.
 */
export const IMPACT_DEFAULT_MEMBERS = 2000;
export const IMPACT_MIN_MEMBERS = 200;
export const IMPACT_MAX_MEMBERS = 20000;
/** A preview runs every pathway in both ensembles, so its cost grows with their number. */
export const IMPACT_MAX_PATHWAYS = 8;
/** Fixed seed: the same two versions and pathways always give the same preview. */
export const IMPACT_SEED = "impact-preview";
export const IMPACT_SAMPLING = "latin-hypercube" as const;

export const modelVersionImpactBodySchema = z
  .object({
    /** Version to compare against; default the version's parent. */
    againstId: z.string({ error: "must be a model version id" }).min(1, "must not be empty").optional(),
    /** Pathways to run both on; default every pathway the version pins (else its comparison's, else the seeded middle pathway). */
    pathwayIds: z
      .array(z.string({ error: "must be a pathway id" }).min(1, "must not be empty"), { error: "must be a list of pathway ids" })
      .min(1, "must name at least one pathway")
      .max(IMPACT_MAX_PATHWAYS, `must name at most ${IMPACT_MAX_PATHWAYS} pathways (a preview)`)
      .optional(),
    members: z
      .number({ error: "must be a number" })
      .int("must be a whole number")
      .min(IMPACT_MIN_MEMBERS, `must be at least ${IMPACT_MIN_MEMBERS}`)
      .max(IMPACT_MAX_MEMBERS, `must be at most ${IMPACT_MAX_MEMBERS} (a preview; start a run for more)`)
      .optional(),
  })
  .strict();
export type ModelVersionImpactBody = z.input<typeof modelVersionImpactBodySchema>;

const impactHorizonSchema = z.object({
  year: z.number().int(),
  temperature: percentileSetSchema,
  /** Distribution-free 95 % interval of each temperature percentile (null: ensemble too small). */
  precision: precisionSchema,
  /** Probability of exceeding each threshold in that year, keyed by threshold ("1.5"). */
  exceedance: z.record(z.string(), z.number()),
});

export const impactSideSchema = z.object({
  version: z.object({ id: z.string(), name: z.string(), versionNumber: z.number().int(), status: z.enum(MODEL_VERSION_STATUSES) }),
  engineVersion: z.string(),
  inputHash: z.string(),
  resultHash: z.string(),
  effectiveMembers: z.number(),
  implied: z.object({ ecs: percentileSetSchema, tcr: percentileSetSchema }),
});
export type ImpactSide = z.infer<typeof impactSideSchema>;

/** Version minus comparison: shift of the median and change in the 5–95 width (K). */
export const spreadChangeSchema = z.object({ medianShift: z.number(), widthChange: z.number() });
export type SpreadChange = z.infer<typeof spreadChangeSchema>;

const horizonDifferenceSchema = spreadChangeSchema.extend({
  year: z.number().int(),
  /** Change in exceedance probability per threshold (version minus comparison). */
  exceedance: z.record(z.string(), z.number()),
});

/** One pathway of the preview: the horizons of both versions on it, and the differences. */
export const impactPathwaySchema = z.object({
  pathway: z.object({ id: z.string(), name: z.string() }),
  version: z.array(impactHorizonSchema),
  against: z.array(impactHorizonSchema),
  differences: z.array(horizonDifferenceSchema),
});
export type ImpactPathway = z.infer<typeof impactPathwaySchema>;

export const modelVersionImpactSchema = z.object({
  /** Every pathway previewed, in the order asked for (default: the version's pinned order). */
  pathways: z.array(impactPathwaySchema).min(1),
  members: z.number().int(),
  seed: z.string(),
  sampling: z.enum(["latin-hypercube", "monte-carlo"]),
  percentiles: z.array(z.number()),
  thresholds: z.array(z.number()),
  /** The version under review. */
  version: impactSideSchema,
  /** The version it is compared against. */
  against: impactSideSchema,
  /** Implied sensitivities do not depend on the pathway: one difference per run. */
  differences: z.object({ ecs: spreadChangeSchema, tcr: spreadChangeSchema }),
  /** The policy in force when this answer was made, and every threshold the preview passed. */
  materiality: z.object({ policy: materialityPolicySchema, fired: z.array(materialityFiringSchema) }),
  /** True when the answer came from the cache (same pair of input hashes). */
  cached: z.boolean(),
  computedAt: z.string(),
  /** Wall time of the two preview ensembles, seconds. */
  seconds: z.number(),
});
export type ModelVersionImpact = z.infer<typeof modelVersionImpactSchema>;
