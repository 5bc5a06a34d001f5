import { z } from "zod";
import { FORCING_AGENTS } from "../engine/agents.js";
import { plausibleYear } from "../engine/spec-limits.js";

const finite = () => z.number({ error: "must be a number" }).refine(Number.isFinite, "must be finite");
const agent = () => z.enum(FORCING_AGENTS, { error: "must be a forcing agent id" });
const pathwayId = () => z.string({ error: "must be a pathway id" }).min(1, "must name a pathway");

/** Multiply one agent's series by `factor`, in every year or only fromYear–toYear (inclusive). */
export const scaleStepSchema = z
  .object({
    kind: z.literal("scale"),
    agent: agent(),
    factor: finite(),
    fromYear: plausibleYear().optional(),
    toYear: plausibleYear().optional(),
  })
  .strict();

/** Replace fromYear–toYear (inclusive) of one agent with another pathway's values for those years. */
export const spliceStepSchema = z
  .object({ kind: z.literal("splice"), agent: agent(), sourcePathwayId: pathwayId(), fromYear: plausibleYear(), toYear: plausibleYear() })
  .strict();

/** weight·(pathway so far) + (1 − weight)·(other pathway), agent by agent, year by year. */
export const blendStepSchema = z
  .object({
    kind: z.literal("blend"),
    otherPathwayId: pathwayId(),
    weight: finite().refine((w) => w >= 0 && w <= 1, "must lie from 0 to 1"),
  })
  .strict();

/**
 * Continue every agent past the last year up to `toYear`: hold the last value, or continue the
 * least-squares line through the last `fitYears` values.
 */
export const extendStepSchema = z
  .object({
    kind: z.literal("extend"),
    toYear: plausibleYear(),
    method: z.enum(["hold", "linear"], { error: 'must be "hold" or "linear"' }),
    fitYears: z
      .number({ error: "must be a number of years" })
      .int("must be a whole number of years")
      .min(2, "must be at least 2 (a line needs two points)")
      .optional(),
  })
  .strict()
  .superRefine((step, ctx) => {
    if (step.method === "linear" && step.fitYears === undefined)
      ctx.addIssue({
        code: "custom",
        path: ["fitYears"],
        message: "must be given for a linear trend (how many of the last years the line is fitted over)",
      });
  });

export const composeStepSchema = z.discriminatedUnion("kind", [scaleStepSchema, spliceStepSchema, blendStepSchema, extendStepSchema], {
  error: 'must be a step of kind "scale", "splice", "blend" or "extend"',
});

/** How a pathway was composed: the pathway it started from, then each step in order. */
export const pathwayRecipeSchema = z
  .object({
    basePathwayId: pathwayId(),
    steps: z.array(composeStepSchema, { error: "must be a list of steps" }).max(50, "must hold at most 50 steps"),
  })
  .strict();

export type ScaleStep = z.infer<typeof scaleStepSchema>;
export type SpliceStep = z.infer<typeof spliceStepSchema>;
export type BlendStep = z.infer<typeof blendStepSchema>;
export type ExtendStep = z.infer<typeof extendStepSchema>;
export type ComposeStep = z.infer<typeof composeStepSchema>;
export type PathwayRecipe = z.infer<typeof pathwayRecipeSchema>;
