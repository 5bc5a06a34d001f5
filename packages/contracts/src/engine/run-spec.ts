import { z } from "zod";
import { distributionSchema } from "./distribution.js";
import { defaultRunSettings } from "./default-assumptions.js";
import { CLIMATE_INPUTS, FORCING_AGENTS, FORCING_EXPRESSIONS, type ForcingAgent } from "./agents.js";
import { perilProfilesSchema, perilSpecIssues } from "./peril-profile.js";
import { portfolioSchema } from "./peril-portfolio.js";
import { boundedUniqueList, MAX_HORIZONS, MAX_PATHWAYS_PER_RUN, MAX_PERCENTILES, MAX_THRESHOLDS, plausibleYear } from "./spec-limits.js";

export * from "./spec-limits.js";

/**
 * Upper limit on ensemble size. Engine memory grows linearly with members; measured peak
 * RSS (2 computing threads, 2026-12-02, packages/engine/README.md "Performance"): 440–564 MB
 * at 1,000,000 members and 719–840 MB at 2,000,000 (W1 workload / every per-year summary).
 * Each extra horizon adds about 24 bytes and each threshold about 8 bytes per member.
 */
export const MAX_MEMBERS = 2_000_000;
/** Longest pathway accepted, in years. */
export const MAX_PATHWAY_YEARS = 1000;

const finite = () => z.number({ error: "must be a number" }).refine(Number.isFinite, "must be finite");
const year = () => z.number({ error: "must be a year" }).int("must be a whole year");
const series = () => z.array(finite(), { error: "must be an array of numbers" });
const nonNegativeSeries = () =>
  z.array(
    finite().refine((v) => v >= 0, "must not be negative (a concentration)"),
    { error: "must be an array of numbers" },
  );

const erfSeriesSchema = z.object({ erf: series() }).strict();
const agentSeriesSchema = z.union([erfSeriesSchema], { error: 'must be { "erf": [..] }' });
const co2SeriesSchema = z.union([erfSeriesSchema, z.object({ ppm: nonNegativeSeries() }).strict()], {
  error: 'must be { "erf": [..] } or { "ppm": [..] }',
});
const ppbSeriesSchema = z.union([erfSeriesSchema, z.object({ ppb: nonNegativeSeries() }).strict()], {
  error: 'must be { "erf": [..] } or { "ppb": [..] }',
});

export const pathwayAgentsSchema = z
  .object({
    co2: co2SeriesSchema.optional(),
    ch4: ppbSeriesSchema.optional(),
    n2o: ppbSeriesSchema.optional(),
    "other-wmghg": agentSeriesSchema.optional(),
    ozone: agentSeriesSchema.optional(),
    "aerosol-radiation": agentSeriesSchema.optional(),
    "aerosol-cloud": agentSeriesSchema.optional(),
    "land-use": agentSeriesSchema.optional(),
    solar: agentSeriesSchema.optional(),
    volcanic: agentSeriesSchema.optional(),
    other: agentSeriesSchema.optional(),
  })
  .strict()
  // Checked here, not on each series: inside the unions above a too-long series would only
  // read "must be { "erf": [..] }", without naming the limit.
  .superRefine((agents, ctx) => {
    for (const [agent, series] of Object.entries(agents)) {
      for (const [key, values] of Object.entries<number[]>(series ?? {})) {
        if (values.length > MAX_PATHWAY_YEARS)
          ctx.addIssue({
            code: "custom",
            path: [agent, key],
            message: `must hold at most ${MAX_PATHWAY_YEARS} values (the pathway length limit, in years)`,
          });
      }
    }
  });

export const pathwaySpecSchema = z
  .object({
    id: z.string().min(1, "must not be empty"),
    name: z.string().min(1, "must not be empty"),
    startYear: plausibleYear(),
    agents: pathwayAgentsSchema,
  })
  .strict();

const climateSchema = z
  .object({
    ecs: distributionSchema,
    f2x: distributionSchema,
    upperHeatCapacity: distributionSchema,
    deepHeatCapacity: distributionSchema,
    heatExchange: distributionSchema,
    deepEfficacy: distributionSchema,
  })
  .strict();

const agentScaleSchema = z.object({ scale: distributionSchema }).strict();

export const correlationSchema = z
  .object({
    between: z.tuple([z.string(), z.string()], { error: "must name two inputs" }),
    rank: finite().refine((v) => v > -1 && v < 1, "must lie strictly between -1 and 1"),
  })
  .strict();

export const constraintSchema = z
  .object({
    from: year(),
    to: year(),
    observed: finite(),
    sd: finite().refine((v) => v > 0, "must be > 0"),
    /**
     * Internal variability of the window's mean warming, 1 sd (K), added in quadrature to sd in
     * the likelihood. Default 0.21 K: IPCC AR6 WGI SPM A.1.3's −0.2 to +0.2 °C (likely) for
     * 2010–2019, read as a 17–83 % normal range (the engine's constraint-defaults.ts).
     */
    internalVariability: finite().refine((v) => v >= 0, "must be ≥ 0").default(0.21),
  })
  .strict();

export const modelSpecSchema = z
  .object({
    climate: climateSchema,
    agents: z
      .object(Object.fromEntries(FORCING_AGENTS.map((a) => [a, agentScaleSchema.optional()])) as Record<
        ForcingAgent,
        z.ZodOptional<typeof agentScaleSchema>
      >)
      .strict()
      .default({}),
    correlations: z.array(correlationSchema).default([]),
    constraint: constraintSchema.nullable().default(null),
    /** Concentration-to-forcing expression; by default the Meinshausen et al. 2020 re-fit that IPCC AR6 WGI Ch. 7 uses. */
    forcingExpression: z.enum(FORCING_EXPRESSIONS).default("ar6"),
  })
  .strict();

export const percentileSchema = finite().refine((v) => v > 0 && v < 100, "must lie strictly between 0 and 100");

export const runSpecSchema = z
  .object({
    seed: z.string({ error: "must be text" }).min(1, "must not be empty"),
    members: z
      .number({ error: "must be a number" })
      .int("must be a whole number")
      .min(1, "must be at least 1")
      .max(MAX_MEMBERS, `must be at most ${MAX_MEMBERS}`),
    sampling: z.enum(["latin-hypercube", "monte-carlo"], {
      error: 'must be "latin-hypercube" or "monte-carlo"',
    }),
    baseline: z.tuple([year(), year()]).default(() => defaultRunSettings().baseline),
    percentiles: boundedUniqueList(percentileSchema, MAX_PERCENTILES, "percentiles")
      .min(1, "must list at least one percentile")
      .default(() => defaultRunSettings().percentiles),
    thresholds: boundedUniqueList(finite(), MAX_THRESHOLDS, "thresholds").default(() => defaultRunSettings().thresholds),
    horizons: boundedUniqueList(year(), MAX_HORIZONS, "horizons").default(() => defaultRunSettings().horizons),
    pathways: z
      .array(pathwaySpecSchema)
      .min(1, "must hold at least one pathway")
      .max(MAX_PATHWAYS_PER_RUN, `must hold at most ${MAX_PATHWAYS_PER_RUN} pathways (the limit per run)`),
    model: modelSpecSchema,
    /** Optional peril lens (peril-profile.ts, peril-portfolio.ts): profiles applied at the horizons, and a portfolio baseline. */
    perils: perilProfilesSchema.optional(),
    portfolio: portfolioSchema.optional(),
  })
  .strict()
  .superRefine((spec, ctx) => {
    for (const issue of perilSpecIssues(spec)) ctx.addIssue({ code: "custom", ...issue });
    const [b0, b1] = spec.baseline;
    if (b1 < b0) ctx.addIssue({ code: "custom", path: ["baseline"], message: `baseline ${b0}–${b1} ends before it starts` });
    const seenIds = new Set<string>();
    spec.pathways.forEach((p, i) => {
      if (seenIds.has(p.id)) ctx.addIssue({ code: "custom", path: ["pathways", i, "id"], message: `"${p.id}" is used twice` });
      seenIds.add(p.id);
      const entries = Object.entries(p.agents).filter(([, s]) => s !== undefined);
      if (entries.length === 0) {
        ctx.addIssue({ code: "custom", path: ["pathways", i, "agents"], message: "must hold at least one agent" });
        return;
      }
      // The length most agents share is the expected one, so the odd series out is named.
      const lengths = entries.map(([, s]) => Object.values(s as Record<string, number[]>)[0]!.length);
      const counts = lengths.map((l) => lengths.filter((x) => x === l).length);
      // On a tie the longest: a cut-short series is the usual mistake.
      const modal = counts.reduce((best, c, i) => (c > counts[best]! || (c === counts[best]! && lengths[i]! > lengths[best]!) ? i : best), 0);
      const [firstAgent, firstSeries] = entries[modal]!;
      const firstKey = Object.keys(firstSeries)[0]!;
      const expected = lengths[modal]!;
      if (expected < 1 || expected > MAX_PATHWAY_YEARS) {
        ctx.addIssue({
          code: "custom",
          path: ["pathways", i, "agents", firstAgent, firstKey],
          message: `has ${expected} values, expected 1 to ${MAX_PATHWAY_YEARS}`,
        });
        return;
      }
      for (const [agent, s] of entries) {
        const key = Object.keys(s)[0]!;
        const n = (s as Record<string, number[]>)[key]!.length;
        if (n !== expected)
          ctx.addIssue({
            code: "custom",
            path: ["pathways", i, "agents", agent, key],
            message: `has ${n} values, expected ${expected}`,
          });
      }
      const lastYear = p.startYear + expected - 1;
      if (b0 < p.startYear || b1 > lastYear)
        ctx.addIssue({
          code: "custom",
          path: ["baseline"],
          message: `baseline ${b0}–${b1} lies outside the pathway years ${p.startYear}–${lastYear} (pathways[${i}])`,
        });
      spec.horizons.forEach((h, j) => {
        if (h < p.startYear || h > lastYear)
          ctx.addIssue({
            code: "custom",
            path: ["horizons", j],
            message: `${h} lies outside the pathway years ${p.startYear}–${lastYear} (pathways[${i}])`,
          });
      });
      const c = spec.model.constraint;
      if (c && (c.from < p.startYear || c.to > lastYear))
        ctx.addIssue({
          code: "custom",
          path: ["model", "constraint"],
          message: `window ${c.from}–${c.to} lies outside the pathway years ${p.startYear}–${lastYear} (pathways[${i}])`,
        });
    });
    const c = spec.model.constraint;
    if (c && c.to < c.from)
      ctx.addIssue({ code: "custom", path: ["model", "constraint", "to"], message: "must not be before from" });
    const inputs = new Set<string>([...CLIMATE_INPUTS, ...FORCING_AGENTS]);
    const pairs = new Set<string>();
    spec.model.correlations.forEach((corr, i) => {
      const [a, b] = corr.between;
      [a, b].forEach((name, j) => {
        if (!inputs.has(name))
          ctx.addIssue({
            code: "custom",
            path: ["model", "correlations", i, "between", j],
            message: `"${name}" is not an input (one of ${[...inputs].join(", ")})`,
          });
      });
      if (a === b)
        ctx.addIssue({ code: "custom", path: ["model", "correlations", i, "between"], message: "must name two different inputs" });
      const key = [a, b].sort().join("|");
      if (pairs.has(key))
        ctx.addIssue({ code: "custom", path: ["model", "correlations", i, "between"], message: "repeats a pair already given" });
      pairs.add(key);
    });
  });

/** A run spec as written by a user (defaults not yet applied). */
export type RunSpecInput = z.input<typeof runSpecSchema>;
/** A run spec with every default applied: what the engine runs. */
export type RunSpec = z.output<typeof runSpecSchema>;
export type PathwaySpec = z.output<typeof pathwaySpecSchema>;
export type ModelSpec = z.output<typeof modelSpecSchema>;
export type ObservationalConstraint = z.output<typeof constraintSchema>;
