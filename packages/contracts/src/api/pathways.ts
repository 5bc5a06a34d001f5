import { z } from "zod";
import { pathwayAgentsSchema } from "../engine/run-spec.js";
import { MAX_YEAR, MIN_YEAR, plausibleYear } from "../engine/spec-limits.js";
import { authorAndDateFilters, pagedQuerySchema, pageSchema, type ListQueryInput } from "./paging.js";
import { pathwayRecipeSchema } from "../compose/pathway-recipe.js";

/**
 * Pathway bodies and responses (docs/API.md "pathways"). A pathway's `agents` are exactly the
 * engine's pathway spec series (ERF per agent, or ppm/ppb for CO2/CH4/N2O), one value per year
 * from `startYear`.
 */
const text = (max: number) => z.string({ error: "must be text" }).trim().max(max, `must be at most ${max} characters`);
const requiredText = (max: number) => text(max).min(1, "must not be empty");

export const pathwayMetadataSchema = z
  .object({
    name: requiredText(120),
    description: text(2000).default(""),
    /** Where the numbers came from (publication, dataset, or "invented, shaped from …"). */
    source: requiredText(500),
    /** Which release/edition of the source (inputs get revised upstream: see RESULT_CAUTIONS). */
    vintage: requiredText(120),
  })
  .strict();

/** Years a pathway's longest series reaches past its start must stay plausible too. */
function lastYearIssue(startYear: number, agents: Record<string, Record<string, number[]> | undefined>): string | null {
  const length = Math.max(0, ...Object.values(agents).flatMap((s) => (s ? Object.values(s).map((v) => v.length) : [])));
  const last = startYear + length - 1;
  // An implausible start is reported on its own (plausibleYear); only a plausible one is followed.
  return startYear >= MIN_YEAR && startYear <= MAX_YEAR && last > MAX_YEAR
    ? `with ${length} yearly values runs to ${last}; years must lie from ${MIN_YEAR} to ${MAX_YEAR}`
    : null;
}

export const createPathwayBodySchema = pathwayMetadataSchema
  .extend({
    startYear: plausibleYear(),
    agents: pathwayAgentsSchema,
    /**
     * How a composed pathway was made (compose/pathway-recipe.ts). The API replays it from the
     * pathways it names and refuses the body unless the series match, then audits it.
     */
    recipe: pathwayRecipeSchema.optional(),
  })
  .strict()
  .superRefine((body, ctx) => {
    const issue = lastYearIssue(body.startYear, body.agents);
    if (issue) ctx.addIssue({ code: "custom", path: ["startYear"], message: issue });
  });
export type CreatePathwayBody = z.input<typeof createPathwayBodySchema>;

/** Editing a pathway that is not yet locked: any of the create fields. */
export const updatePathwayBodySchema = pathwayMetadataSchema
  .extend({ startYear: plausibleYear(), agents: pathwayAgentsSchema })
  .partial()
  .strict()
  .superRefine((body, ctx) => {
    if (body.startYear === undefined || body.agents === undefined) return;
    const issue = lastYearIssue(body.startYear, body.agents);
    if (issue) ctx.addIssue({ code: "custom", path: ["startYear"], message: issue });
  });
export type UpdatePathwayBody = z.input<typeof updatePathwayBodySchema>;

/** Multipart text fields sent with an upload; `preview=true` parses without saving. */
export const uploadPathwayFieldsSchema = z.object({
  name: z.string().optional(),
  description: z.string().optional(),
  source: z.string().optional(),
  vintage: z.string().optional(),
  preview: z
    .enum(["true", "false"], { error: 'must be "true" or "false"' })
    .optional()
    .transform((v) => v === "true"),
});

export const pathwaySummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  description: z.string(),
  source: z.string(),
  vintage: z.string(),
  startYear: z.number().int(),
  endYear: z.number().int(),
  /** Agent ids carried, in the engine's order (FORCING_AGENTS). */
  agents: z.array(z.string()),
  /** The quantity each agent is given in: "erf" (W m-2), "ppm" or "ppb". */
  quantities: z.record(z.string(), z.enum(["erf", "ppm", "ppb"])),
  /** SHA-256 (hex) of the canonical JSON of { startYear, agents }. */
  checksum: z.string(),
  locked: z.boolean(),
  createdBy: z.string(),
  createdAt: z.string(),
});
export type PathwaySummary = z.infer<typeof pathwaySummarySchema>;
export const pathwayPageSchema = pageSchema(pathwaySummarySchema);
export type PathwayPage = z.infer<typeof pathwayPageSchema>;

export const PATHWAY_SORT_KEYS = ["createdAt", "name", "startYear", "endYear"] as const;
/** GET /api/pathways: `q` searches name, description, source and vintage; `author` the uploader's name or email. */
export const listPathwaysQuerySchema = pagedQuerySchema(PATHWAY_SORT_KEYS, "createdAt:desc").extend({
  locked: z.enum(["true", "false"], { error: 'must be "true" or "false"' }).optional(),
  ...authorAndDateFilters,
});
export type ListPathwaysQuery = z.infer<typeof listPathwaysQuerySchema>;
export type ListPathwaysQueryInput = ListQueryInput<typeof listPathwaysQuerySchema>;

/** A pathway in full: `agents` is the series object exactly as the engine's pathway spec takes it. */
export const pathwaySchema = pathwaySummarySchema.extend({ agents: pathwayAgentsSchema });
export type Pathway = z.infer<typeof pathwaySchema>;

export const pathwayPreviewSchema = z.object({
  startYear: z.number().int(),
  endYear: z.number().int(),
  agents: z.array(z.object({ agent: z.string(), quantity: z.enum(["erf", "ppm", "ppb"]), column: z.string() })),
  rows: z.array(z.record(z.string(), z.number())),
  /** Every year of every column as the pathway would store it, so the preview can draw them. */
  series: pathwayAgentsSchema,
});
export type PathwayPreview = z.infer<typeof pathwayPreviewSchema>;
