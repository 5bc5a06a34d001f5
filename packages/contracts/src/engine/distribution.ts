import { z } from "zod";

/**
 * One uncertain input, as the engine contract spells it (packages/engine/README.md).
 * Units follow the input it describes (K, W m-2, W yr m-2 K-1, W m-2 K-1, or a unitless scale).
 * "range" is how assessment reports publish an input: a median with a 90 % (5–95) or
 * 66 % (17–83) range, fitted as a split (two-piece) law — lognormal or normal — whose halves
 * have their own spreads, so its density jumps at the median when the range is asymmetric.
 */
const finite = () => z.number({ error: "must be a number" }).refine(Number.isFinite, "must be finite");
const positive = () => finite().refine((v) => v > 0, "must be > 0");

export const fixedDistributionSchema = z.object({ type: z.literal("fixed"), value: finite() }).strict();
export const normalDistributionSchema = z
  .object({ type: z.literal("normal"), mean: finite(), sd: positive() })
  .strict();
export const lognormalDistributionSchema = z
  .object({ type: z.literal("lognormal"), median: positive(), logSd: positive() })
  .strict();
export const uniformDistributionSchema = z
  .object({ type: z.literal("uniform"), min: finite(), max: finite() })
  .strict()
  .superRefine((d, ctx) => {
    if (d.max <= d.min) ctx.addIssue({ code: "custom", path: ["max"], message: "must be > min" });
  });
export const triangularDistributionSchema = z
  .object({ type: z.literal("triangular"), min: finite(), mode: finite(), max: finite() })
  .strict()
  .superRefine((d, ctx) => {
    if (d.max <= d.min) ctx.addIssue({ code: "custom", path: ["max"], message: "must be > min" });
    else if (d.mode < d.min || d.mode > d.max)
      ctx.addIssue({ code: "custom", path: ["mode"], message: "must lie between min and max" });
  });
export const truncatedNormalDistributionSchema = z
  .object({ type: z.literal("truncated-normal"), mean: finite(), sd: positive(), min: finite(), max: finite() })
  .strict()
  .superRefine((d, ctx) => {
    if (d.max <= d.min) ctx.addIssue({ code: "custom", path: ["max"], message: "must be > min" });
  });
export const rangeDistributionSchema = z
  .object({
    type: z.literal("range"),
    p50: finite(),
    low: finite(),
    high: finite(),
    coverage: z.union([z.literal(90), z.literal(66)], { error: "must be 90 or 66" }),
    shape: z.enum(["lognormal", "split-normal"], { error: 'must be "lognormal" or "split-normal"' }),
  })
  .strict()
  .superRefine((d, ctx) => {
    if (!(d.low < d.p50)) ctx.addIssue({ code: "custom", path: ["low"], message: "must be < p50" });
    if (!(d.high > d.p50)) ctx.addIssue({ code: "custom", path: ["high"], message: "must be > p50" });
    if (d.shape === "lognormal" && d.low <= 0)
      ctx.addIssue({ code: "custom", path: ["low"], message: "must be > 0 for a lognormal shape" });
  });

export const distributionSchema = z.discriminatedUnion(
  "type",
  [
    fixedDistributionSchema,
    normalDistributionSchema,
    lognormalDistributionSchema,
    uniformDistributionSchema,
    triangularDistributionSchema,
    truncatedNormalDistributionSchema,
    rangeDistributionSchema,
  ],
  {
    error:
      'type must be one of "fixed", "normal", "lognormal", "uniform", "triangular", "truncated-normal", "range"',
  },
);

export type Distribution = z.infer<typeof distributionSchema>;

/**
 * What a range's `shape` fits, named for what it is: two half-laws of probability 1/2 each
 * that meet at the median with different spreads (not a single fitted lognormal or normal).
 */
export const RANGE_SHAPE_LABELS: Record<"lognormal" | "split-normal", string> = {
  lognormal: "split (two-piece) lognormal",
  "split-normal": "split (two-piece) normal",
};
export type DistributionType = Distribution["type"];
