import { z } from "zod";

/**
 * The materiality policy: how far a model version may move the preview's key outputs, on any
 * pathway it pins, and still be filed as a "minor" change. Admins set it
 * (GET/PUT /api/settings/materiality). The defaults are common practice for a first policy,
 * not a published standard: a tenth of a kelvin in any horizon median, five percentage points
 * in any exceedance probability, a tenth of any 5–95 % width. Each firm sets its own with its
 * actuarial function; these numbers are a starting point, not advice.
 */
export const MATERIALITY_DEFAULTS = { medianShiftK: 0.1, exceedancePoints: 5, widthChangePercent: 10 } as const;

export const materialityPolicySchema = z
  .object({
    /** Largest shift of any horizon's median warming (K) a minor change may make. */
    medianShiftK: z.number({ error: "must be a number (K)" }).gt(0, "must be more than 0 K").max(5, "must be at most 5 K"),
    /** Largest change of any exceedance probability, in percentage points. */
    exceedancePoints: z.number({ error: "must be a number (percentage points)" }).gt(0, "must be more than 0 points").max(100, "must be at most 100 points"),
    /** Largest change of any 5–95 % width, in percent of the comparison's width. */
    widthChangePercent: z.number({ error: "must be a number (%)" }).gt(0, "must be more than 0 %").max(1000, "must be at most 1000 %"),
  })
  .strict();
export type MaterialityPolicy = z.infer<typeof materialityPolicySchema>;

export const updateMaterialityBodySchema = materialityPolicySchema
  .extend({
    /** Why the policy changes: kept in the audit trail beside the old and new values. */
    reason: z.string({ error: "is required: say why the thresholds change" }).trim().min(3, "must be at least 3 characters").max(500, "must be at most 500 characters"),
  })
  .strict();
export type UpdateMaterialityBody = z.input<typeof updateMaterialityBodySchema>;

export const materialitySettingsSchema = z.object({
  policy: materialityPolicySchema,
  /** False while the defaults apply (no admin has set the policy yet). */
  customised: z.boolean(),
  updatedAt: z.string().nullable(),
  updatedByName: z.string().nullable(),
});
export type MaterialitySettings = z.infer<typeof materialitySettingsSchema>;

export const MATERIALITY_METRICS = ["median-shift", "exceedance", "width-change"] as const;
export type MaterialityMetric = (typeof MATERIALITY_METRICS)[number];

/** One threshold a preview passed: where, what, by how much, and the limit it passed. */
export const materialityFiringSchema = z.object({
  pathwayId: z.string(),
  pathwayName: z.string(),
  year: z.number().int(),
  metric: z.enum(MATERIALITY_METRICS),
  /** For "exceedance": the warming threshold (K) whose probability moved; else null. */
  warmingThreshold: z.number().nullable(),
  /** The change, in the limit's unit (K, percentage points, percent of width); signed. */
  value: z.number(),
  limit: z.number(),
  unit: z.enum(["K", "pts", "%"]),
});
export type MaterialityFiring = z.infer<typeof materialityFiringSchema>;
