import { z } from "zod";
import { MAX_MEMBERS, percentileSchema } from "../engine/run-spec.js";
import { boundedUniqueList, MAX_HORIZONS, MAX_PATHWAYS_PER_RUN, MAX_PERCENTILES, MAX_THRESHOLDS } from "../engine/spec-limits.js";
import { MODEL_VERSION_STATUSES } from "./model-versions.js";
import { authorAndDateFilters, pagedQuerySchema, pageSchema, type ListQueryInput } from "./paging.js";

/** Runs: an ensemble of one model version over one or more pathways, executed by the queue. */
export const RUN_STATUSES = ["queued", "running", "succeeded", "failed", "cancelled"] as const;
export type RunStatus = (typeof RUN_STATUSES)[number];

const finite = () => z.number({ error: "must be a number" }).refine(Number.isFinite, "must be finite");

export const createRunBodySchema = z
  .object({
    name: z.string({ error: "must be text" }).trim().max(120, "must be at most 120 characters").optional(),
    modelVersionId: z.string({ error: "must be a model version id" }).min(1, "must not be empty"),
    pathwayIds: z
      .array(z.string().min(1, "must not be empty"), { error: "must be a list of pathway ids" })
      .min(1, "must hold at least one pathway")
      .max(MAX_PATHWAYS_PER_RUN, `must hold at most ${MAX_PATHWAYS_PER_RUN} pathways (the limit per run)`)
      .refine((ids) => new Set(ids).size === ids.length, "must not repeat a pathway"),
    members: z
      .number({ error: "must be a number" })
      .int("must be a whole number")
      .min(1, "must be at least 1")
      .max(MAX_MEMBERS, `must be at most ${MAX_MEMBERS}`),
    seed: z.string({ error: "must be text" }).trim().min(1, "must not be empty").max(200),
    sampling: z.enum(["latin-hypercube", "monte-carlo"], { error: 'must be "latin-hypercube" or "monte-carlo"' }),
    horizons: boundedUniqueList(z.number({ error: "must be a year" }).int("must be a whole year"), MAX_HORIZONS, "horizons").optional(),
    thresholds: boundedUniqueList(finite(), MAX_THRESHOLDS, "thresholds").optional(),
    percentiles: boundedUniqueList(percentileSchema, MAX_PERCENTILES, "percentiles").min(1, "must list at least one percentile").optional(),
    perilProfileIds: z.array(z.string().min(1)).optional(),
    portfolioId: z.string().min(1).nullable().optional(),
  })
  .strict();
export type CreateRunBody = z.input<typeof createRunBodySchema>;

export const RUN_SORT_KEYS = ["createdAt", "name", "status", "members"] as const;
/** GET /api/runs: `q` searches the run's name; `author` the creator's name or email; `exploratory` made with a version that was not approved. */
export const listRunsQuerySchema = pagedQuerySchema(RUN_SORT_KEYS, "createdAt:desc").extend({
  mine: z.enum(["true", "false"], { error: 'must be "true" or "false"' }).optional(),
  exploratory: z.enum(["true", "false"], { error: 'must be "true" or "false"' }).optional(),
  status: z.enum(RUN_STATUSES, { error: `must be one of ${RUN_STATUSES.join(", ")}` }).optional(),
  ...authorAndDateFilters,
});
export type ListRunsQuery = z.infer<typeof listRunsQuerySchema>;
export type ListRunsQueryInput = ListQueryInput<typeof listRunsQuerySchema>;

export const runSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  status: z.enum(RUN_STATUSES),
  /** 0–1, share of simulated years done. */
  progress: z.number(),
  /** True when the model version was not approved when the run was made; never changes. */
  exploratory: z.boolean(),
  modelVersion: z.object({
    id: z.string(),
    name: z.string(),
    versionNumber: z.number().int(),
    status: z.enum(MODEL_VERSION_STATUSES),
  }),
  pathwayIds: z.array(z.string()),
  members: z.number().int(),
  seed: z.string(),
  sampling: z.enum(["latin-hypercube", "monte-carlo"]),
  perilProfileIds: z.array(z.string()),
  portfolioId: z.string().nullable(),
  createdBy: z.string(),
  createdByName: z.string().nullable(),
  createdAt: z.string(),
  startedAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
  error: z.string().nullable(),
  /**
   * The owner asked to cancel and the worker has not confirmed yet (the run is still queued
   * or running); the final state follows once the worker stops at its next year boundary.
   */
  cancelRequested: z.boolean(),
});
export type RunSummary = z.infer<typeof runSummarySchema>;
export const runPageSchema = pageSchema(runSummarySchema);
export type RunPage = z.infer<typeof runPageSchema>;

export const runSchema = runSummarySchema.extend({
  manifest: z.object({
    engineVersion: z.string().nullable(),
    inputHash: z.string(),
    resultHash: z.string().nullable(),
    /** The validated engine run spec, exactly as queued. */
    spec: z.unknown(),
    pathways: z.array(z.object({ id: z.string(), name: z.string(), checksum: z.string(), source: z.string(), vintage: z.string() })),
  }),
});
export type Run = z.infer<typeof runSchema>;

/**
 * A replay: the run's stored spec computed again through the same queue and worker limit as
 * runs, and its result hash compared with the stored one. `matched` is null until it finished.
 */
export const replaySchema = z.object({
  id: z.string(),
  runId: z.string(),
  status: z.enum(RUN_STATUSES),
  /** 0–1, as a run's. */
  progress: z.number(),
  matched: z.boolean().nullable(),
  resultHash: z.string().nullable(),
  replayHash: z.string().nullable(),
  engineVersion: z.string().nullable(),
  error: z.string().nullable(),
  requestedBy: z.string(),
  createdAt: z.string(),
  finishedAt: z.string().nullable(),
});
export type Replay = z.infer<typeof replaySchema>;
/** @deprecated name kept for callers of the old synchronous replay; same shape as Replay. */
export const replayResponseSchema = replaySchema;
export type ReplayResponse = Replay;

/** Payload of an "ensemble-replay" queue job. */
export const replayJobPayloadSchema = z.object({ replayId: z.string().min(1) }).strict();

/** Payload of an "ensemble-run" queue job (the queue validates it before running). */
export const runJobPayloadSchema = z.object({ runId: z.string().min(1) }).strict();
export type RunJobPayload = z.infer<typeof runJobPayloadSchema>;
