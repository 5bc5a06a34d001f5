import { z } from "zod";
import { perilProfileSchema, TABLE_WARMING_RANGE } from "../engine/peril-profile.js";
import { portfolioRowSchema } from "../engine/peril-portfolio.js";
import { authorAndDateFilters, pagedQuerySchema, pageSchema, type ListQueryInput } from "./paging.js";

/**
 * Peril profiles and portfolio baselines over the REST API (docs/API.md "peril-profiles",
 * "portfolios"). A stored profile is the engine's peril profile (engine/peril-profile.ts) plus who
 * made it and whether it is locked: a profile that an approved (or retired) model version
 * pins, or that a run used, is part of a record and cannot change — copy it instead.
 */

/** The editable fields of a profile: the engine profile without its id (the server assigns it). */
export const perilProfileBodySchema = perilProfileSchema.omit({ id: true });
export type PerilProfileBody = z.input<typeof perilProfileBodySchema>;

/** PATCH: any of the editable fields; the merged profile is validated again as a whole. */
export const updatePerilProfileBodySchema = perilProfileSchema.omit({ id: true }).partial().strict();
export type UpdatePerilProfileBody = z.input<typeof updatePerilProfileBodySchema>;

/** POST /:id/copy: an optional name for the copy (default "<name> (copy)"). */
export const copyPerilProfileBodySchema = z
  .object({ name: z.string({ error: "must be text" }).trim().min(1, "must not be empty").max(120, "must be at most 120 characters").optional() })
  .strict();

/** Why a profile is locked: the records that depend on it. */
export const perilProfileLockSchema = z.object({
  modelVersions: z.array(z.object({ id: z.string(), name: z.string(), versionNumber: z.number().int(), status: z.string() })),
  runIds: z.array(z.string()),
});
export type PerilProfileLock = z.infer<typeof perilProfileLockSchema>;

export const perilProfileRecordSchema = z.object({
  id: z.string(),
  name: z.string(),
  peril: z.string(),
  region: z.string(),
  metric: z.enum(["frequency", "severity"]),
  baselineWarming: z.number(),
  scaling: perilProfileSchema.shape.scaling,
  source: z.string().optional(),
  locked: z.boolean(),
  lockedBy: perilProfileLockSchema,
  /** Profile this one was copied from, if any. */
  copiedFrom: z.string().nullable(),
  createdBy: z.string(),
  createdByName: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type PerilProfileRecord = z.infer<typeof perilProfileRecordSchema>;
export const perilProfilePageSchema = pageSchema(perilProfileRecordSchema);
export type PerilProfilePage = z.infer<typeof perilProfilePageSchema>;

export const PERIL_PROFILE_SORT_KEYS = ["peril", "region", "name", "updatedAt", "createdAt"] as const;
/** GET /api/peril-profiles: `q` searches name, peril, region and source; `author` the creator's name or email. */
export const listPerilProfilesQuerySchema = pagedQuerySchema(PERIL_PROFILE_SORT_KEYS, "peril:asc").extend({
  metric: z.enum(["frequency", "severity"], { error: "must be one of frequency, severity" }).optional(),
  ...authorAndDateFilters,
});
export type ListPerilProfilesQuery = z.infer<typeof listPerilProfilesQuerySchema>;
export type ListPerilProfilesQueryInput = ListQueryInput<typeof listPerilProfilesQuerySchema>;

const DEFAULT_CURVE_PERCENTILES = [5, 17, 50, 83, 95];
/** Most warming levels a preview curve may ask for (keeps the response small). */
export const MAX_CURVE_LEVELS = 401;

const numberText = (field: string) =>
  z.preprocess(
    (v) => (typeof v === "string" && v.trim() !== "" ? Number(v) : v),
    z.number({ error: `${field} must be a number` }).refine(Number.isFinite, "must be finite"),
  );

/**
 * The warming levels of a preview curve: from `from` to `to` K (above 1850–1900) in steps of
 * `step`. Defaults 0 to 5 K by 0.1 K, percentiles 5/17/50/83/95.
 */
export const curveRangeSchema = z
  .object({
    from: numberText("from").default(0),
    to: numberText("to").default(5),
    step: numberText("step").default(0.1),
    percentiles: z
      .preprocess(
        (v) => (typeof v === "string" ? v.split(",").filter((s) => s.trim() !== "").map(Number) : v),
        z.array(z.number().refine((p) => p > 0 && p < 100, "must lie strictly between 0 and 100")).min(1, "must list at least one percentile"),
      )
      .default(DEFAULT_CURVE_PERCENTILES),
  })
  .superRefine((r, ctx) => {
    if (r.from < TABLE_WARMING_RANGE[0] || r.from > TABLE_WARMING_RANGE[1])
      ctx.addIssue({ code: "custom", path: ["from"], message: `must lie between ${TABLE_WARMING_RANGE[0]} and ${TABLE_WARMING_RANGE[1]} K` });
    if (!(r.to > r.from) || r.to > TABLE_WARMING_RANGE[1])
      ctx.addIssue({ code: "custom", path: ["to"], message: `must be above from and at most ${TABLE_WARMING_RANGE[1]} K` });
    if (!(r.step > 0)) ctx.addIssue({ code: "custom", path: ["step"], message: "must be > 0" });
    else if ((r.to - r.from) / r.step + 1 > MAX_CURVE_LEVELS)
      ctx.addIssue({ code: "custom", path: ["step"], message: `gives more than ${MAX_CURVE_LEVELS} warming levels; use a larger step` });
  });
export type CurveRange = z.output<typeof curveRangeSchema>;

/** POST /api/peril-profiles/preview: an unsaved draft profile and the curve range. */
export const perilCurvePreviewBodySchema = z
  .object({ profile: perilProfileBodySchema, range: curveRangeSchema.optional() })
  .strict();
export type PerilCurvePreviewBody = z.input<typeof perilCurvePreviewBodySchema>;

/**
 * Multiplier against global warming with the bands of the scaling uncertainty alone (exact
 * percentiles, no sampling): `bands.p5[i]` is the 5th percentile at `warming[i]`.
 */
export const perilCurveSchema = z.object({
  warming: z.array(z.number()),
  bands: z.record(z.string(), z.array(z.number())),
  percentiles: z.array(z.number()),
  baselineWarming: z.number(),
  metric: z.enum(["frequency", "severity"]),
  /** Table profiles: each table's multiplier at each warming level, by the event return period it states (`bands` show the most frequent table). */
  tables: z.array(z.object({ returnPeriod: z.number(), multiplier: z.array(z.number()) })).optional(),
});
export type PerilCurve = z.infer<typeof perilCurveSchema>;

/** Multipart text fields of a portfolio upload; `preview=true` parses without saving. */
export const uploadPortfolioFieldsSchema = z.object({
  name: z.string().optional(),
  description: z.string().optional(),
  preview: z
    .enum(["true", "false"], { error: 'must be "true" or "false"' })
    .optional()
    .transform((v) => v === "true"),
});

export const portfolioMetadataSchema = z
  .object({
    name: z.string({ error: "must be text" }).trim().min(1, "must not be empty").max(120, "must be at most 120 characters"),
    description: z.string({ error: "must be text" }).trim().max(2000, "must be at most 2000 characters").default(""),
  })
  .strict();

export const portfolioSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  description: z.string(),
  rowCount: z.number().int(),
  regions: z.array(z.string()),
  perils: z.array(z.string()),
  currencies: z.array(z.string()),
  /** SHA-256 (hex) of the canonical JSON (RFC 8785) of the rows. */
  checksum: z.string(),
  fileName: z.string(),
  createdBy: z.string(),
  createdByName: z.string().nullable(),
  createdAt: z.string(),
});
export type PortfolioSummary = z.infer<typeof portfolioSummarySchema>;

export const portfolioRecordSchema = portfolioSummarySchema.extend({ rows: z.array(portfolioRowSchema) });
export type PortfolioRecord = z.infer<typeof portfolioRecordSchema>;

/** What a preview upload read: every row (portfolios are short) and the checksum it would get. */
export const portfolioPreviewSchema = z.object({
  rows: z.array(portfolioRowSchema),
  rowCount: z.number().int(),
  currencies: z.array(z.string()),
  checksum: z.string(),
});
export type PortfolioPreview = z.infer<typeof portfolioPreviewSchema>;
