import { z } from "zod";
import { modelSpecSchema, percentileSchema } from "../engine/run-spec.js";
import { boundedUniqueList, MAX_HORIZONS, MAX_PERCENTILES, MAX_THRESHOLDS } from "../engine/spec-limits.js";
import { defaultRunSettings } from "../engine/default-assumptions.js";
import { authorAndDateFilters, pagedQuerySchema, pageSchema, type ListQueryInput } from "./paging.js";

/**
 * Model versions: the uncertainty assumptions (the engine's `model` object) plus the run
 * defaults, under governance: draft -> in-review -> approved | rejected; approved -> retired.
 */
export const MODEL_VERSION_STATUSES = ["draft", "in-review", "approved", "rejected", "retired"] as const;
export type ModelVersionStatus = (typeof MODEL_VERSION_STATUSES)[number];
export const CHANGE_CLASSES = ["major", "minor"] as const;
export type ChangeClass = (typeof CHANGE_CLASSES)[number];

const finite = () => z.number({ error: "must be a number" }).refine(Number.isFinite, "must be finite");
const year = () => z.number({ error: "must be a year" }).int("must be a whole year");

/** Defaults a run takes from its model version unless the run overrides them. */
export const modelVersionDefaultsSchema = z
  .object({
    percentiles: boundedUniqueList(percentileSchema, MAX_PERCENTILES, "percentiles")
      .min(1, "must list at least one percentile")
      .default(() => defaultRunSettings().percentiles),
    thresholds: boundedUniqueList(finite(), MAX_THRESHOLDS, "thresholds").default(() => defaultRunSettings().thresholds),
    horizons: boundedUniqueList(year(), MAX_HORIZONS, "horizons").default(() => defaultRunSettings().horizons),
    baseline: z
      .tuple([year(), year()], { error: "must be [firstYear, lastYear]" })
      .refine(([a, b]) => b >= a, "must not end before it starts")
      .default(() => defaultRunSettings().baseline),
  })
  .strict();
export type ModelVersionDefaults = z.output<typeof modelVersionDefaultsSchema>;

const name = () => z.string({ error: "must be text" }).trim().min(1, "must not be empty").max(120, "must be at most 120 characters");
const notes = () => z.string({ error: "must be text" }).max(10000, "must be at most 10000 characters");

export const createModelVersionBodySchema = z
  .object({
    name: name(),
    parentId: z.string().min(1).nullable().optional(),
    model: modelSpecSchema,
    defaults: modelVersionDefaultsSchema.default(defaultRunSettings),
    notes: notes().default(""),
    /** Pathways this version is meant to be run with (optional; pinned pathways lock on approval). */
    pathwayIds: z.array(z.string().min(1)).default([]),
    /** Peril profiles reviewed with this version (peril lens). */
    perilProfileIds: z.array(z.string().min(1)).default([]),
  })
  .strict();
export type CreateModelVersionBody = z.input<typeof createModelVersionBodySchema>;

export const updateModelVersionBodySchema = z
  .object({
    name: name().optional(),
    parentId: z.string().min(1).nullable().optional(),
    model: modelSpecSchema.optional(),
    defaults: modelVersionDefaultsSchema.optional(),
    notes: notes().optional(),
    pathwayIds: z.array(z.string().min(1)).optional(),
    perilProfileIds: z.array(z.string().min(1)).optional(),
  })
  .strict();
export type UpdateModelVersionBody = z.input<typeof updateModelVersionBodySchema>;

export const submitModelVersionBodySchema = z
  .object({
    changeClass: z.enum(CHANGE_CLASSES, { error: 'must be "major" or "minor"' }),
    note: z.string().max(2000).optional(),
  })
  .strict();

export const decideModelVersionBodySchema = z
  .object({ comment: z.string({ error: "must be text" }).trim().min(1, "must not be empty").max(4000) })
  .strict();

export const retireModelVersionBodySchema = z.object({ comment: z.string().max(4000).optional() }).strict();

export const MODEL_VERSION_SORT_KEYS = ["updatedAt", "createdAt", "name", "versionNumber", "status"] as const;
/**
 * GET /api/model-versions: `q` searches name and notes; `author` the author's name or email;
 * `mine` the signed-in person's own versions; `undrafted` versions no other version was drafted
 * from (a rejected one its author has not acted on yet).
 */
export const listModelVersionsQuerySchema = pagedQuerySchema(MODEL_VERSION_SORT_KEYS, "updatedAt:desc").extend({
  status: z.enum(MODEL_VERSION_STATUSES, { error: `must be one of ${MODEL_VERSION_STATUSES.join(", ")}` }).optional(),
  mine: z.enum(["true", "false"], { error: 'must be "true" or "false"' }).optional(),
  undrafted: z.enum(["true", "false"], { error: 'must be "true" or "false"' }).optional(),
  ...authorAndDateFilters,
});
export type ListModelVersionsQuery = z.infer<typeof listModelVersionsQuerySchema>;
export type ListModelVersionsQueryInput = ListQueryInput<typeof listModelVersionsQuerySchema>;

export const diffModelVersionQuerySchema = z.object({ against: z.string().min(1).optional() });

export const modelVersionSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  versionNumber: z.number().int(),
  status: z.enum(MODEL_VERSION_STATUSES),
  parentId: z.string().nullable(),
  changeClass: z.enum(CHANGE_CLASSES).nullable(),
  authorId: z.string(),
  authorName: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
  submittedAt: z.string().nullable(),
  decidedBy: z.string().nullable(),
  decidedByName: z.string().nullable(),
  decidedAt: z.string().nullable(),
});
export type ModelVersionSummary = z.infer<typeof modelVersionSummarySchema>;
export const modelVersionPageSchema = pageSchema(modelVersionSummarySchema);
export type ModelVersionPage = z.infer<typeof modelVersionPageSchema>;

export const modelVersionSchema = modelVersionSummarySchema.extend({
  model: modelSpecSchema,
  defaults: modelVersionDefaultsSchema,
  notes: z.string(),
  submissionNote: z.string().nullable(),
  decisionComment: z.string().nullable(),
  retiredAt: z.string().nullable(),
  pathwayIds: z.array(z.string()),
  perilProfileIds: z.array(z.string()),
});
export type ModelVersion = z.infer<typeof modelVersionSchema>;

/** One structured difference: a dotted/indexed path and the value on each side (null when absent). */
export const modelVersionChangeSchema = z.object({
  path: z.string(),
  before: z.unknown(),
  after: z.unknown(),
});
export type ModelVersionChange = z.infer<typeof modelVersionChangeSchema>;

export const modelVersionDiffSchema = z.object({
  against: z.object({ id: z.string(), name: z.string(), versionNumber: z.number().int() }).nullable(),
  changes: z.array(modelVersionChangeSchema),
});
export type ModelVersionDiff = z.infer<typeof modelVersionDiffSchema>;
