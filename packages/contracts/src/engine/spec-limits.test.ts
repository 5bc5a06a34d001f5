import { describe, expect, it } from "vitest";
import { createModelVersionBodySchema, modelVersionDefaultsSchema } from "../api/model-versions.js";
import { createPathwayBodySchema } from "../api/pathways.js";
import { createRunBodySchema } from "../api/runs.js";
import { formatIssues } from "./format-issues.js";
import { MAX_PATHWAY_YEARS, runSpecSchema } from "./run-spec.js";
import { MAX_HORIZONS, MAX_PATHWAYS_PER_RUN, MAX_PERCENTILES, MAX_THRESHOLDS, MAX_YEAR, MIN_YEAR } from "./spec-limits.js";

// Bounds on lists a run carries: each threshold, horizon and percentile multiplies engine work,
// result rows and workbook columns (a run with 17,000 thresholds held the database for minutes).

function problems(schema: { safeParse(v: unknown): { success: boolean; error?: unknown } }, value: unknown): string[] {
  const out = schema.safeParse(value);
  expect(out.success).toBe(false);
  return formatIssues(out.error as Parameters<typeof formatIssues>[0]);
}

const years = (n: number) => Array.from({ length: n }, (_, i) => i / 100);
const pathway = (id = "p", startYear = 1850, length = 251) => ({ id, name: id, startYear, agents: { co2: { erf: years(length) } } });
const model = {
  climate: {
    ecs: { type: "fixed", value: 3 },
    f2x: { type: "fixed", value: 3.93 },
    upperHeatCapacity: { type: "fixed", value: 7.3 },
    deepHeatCapacity: { type: "fixed", value: 106 },
    heatExchange: { type: "fixed", value: 0.73 },
    deepEfficacy: { type: "fixed", value: 1 },
  },
};
const spec = (over: Record<string, unknown> = {}) => ({ seed: "s", members: 10, sampling: "monte-carlo", pathways: [pathway()], model, ...over });
const runBody = (over: Record<string, unknown> = {}) => ({ modelVersionId: "v", pathwayIds: ["p"], members: 10, seed: "s", sampling: "monte-carlo", ...over });

describe("run lists are bounded and free of repeats", () => {
  const many = (n: number, from = 0) => Array.from({ length: n }, (_, i) => from + i / 10);
  const horizonsOf = (n: number) => Array.from({ length: n }, (_, i) => 1900 + i);

  it("refuses more thresholds, horizons or percentiles than the limit, naming the field and the limit", () => {
    expect(problems(runSpecSchema, spec({ thresholds: many(MAX_THRESHOLDS + 1) }))).toEqual([
      `thresholds must list at most ${MAX_THRESHOLDS} values (the limit per run)`,
    ]);
    expect(problems(runSpecSchema, spec({ horizons: horizonsOf(MAX_HORIZONS + 1) }))).toEqual([
      `horizons must list at most ${MAX_HORIZONS} values (the limit per run)`,
    ]);
    expect(problems(runSpecSchema, spec({ percentiles: many(MAX_PERCENTILES + 1, 1) }))).toEqual([
      `percentiles must list at most ${MAX_PERCENTILES} values (the limit per run)`,
    ]);
    expect(problems(createRunBodySchema, runBody({ thresholds: many(17_000) }))).toEqual([
      `thresholds must list at most ${MAX_THRESHOLDS} values (the limit per run)`,
    ]);
    expect(problems(modelVersionDefaultsSchema, { horizons: horizonsOf(10_040) })).toEqual([
      `horizons must list at most ${MAX_HORIZONS} values (the limit per run)`,
    ]);
  });

  it("accepts lists at the limit", () => {
    expect(runSpecSchema.safeParse(spec({ thresholds: many(MAX_THRESHOLDS), horizons: horizonsOf(MAX_HORIZONS), percentiles: many(MAX_PERCENTILES, 1) })).success).toBe(true);
  });

  it("refuses a repeated threshold, horizon or percentile, naming its position", () => {
    expect(problems(runSpecSchema, spec({ horizons: [2030, 2050, 2030] }))).toEqual(["horizons[2] repeats 2030 (already horizons[0])"]);
    expect(problems(runSpecSchema, spec({ thresholds: [1.5, 2, 2] }))).toEqual(["thresholds[2] repeats 2 (already thresholds[1])"]);
    expect(problems(createRunBodySchema, runBody({ percentiles: [50, 50] }))).toEqual(["percentiles[1] repeats 50 (already percentiles[0])"]);
    expect(problems(createModelVersionBodySchema, { name: "n", model, defaults: { percentiles: [5, 95], thresholds: [2, 2] } })).toEqual([
      "defaults.thresholds[1] repeats 2 (already thresholds[0])",
    ]);
  });

  it("refuses more pathways per run than the limit", () => {
    const pathways = Array.from({ length: MAX_PATHWAYS_PER_RUN + 1 }, (_, i) => pathway(`p${i}`));
    expect(problems(runSpecSchema, spec({ pathways }))).toEqual([`pathways must hold at most ${MAX_PATHWAYS_PER_RUN} pathways (the limit per run)`]);
    const ids = pathways.map((p) => p.id);
    expect(problems(createRunBodySchema, runBody({ pathwayIds: ids }))).toEqual([
      `pathwayIds must hold at most ${MAX_PATHWAYS_PER_RUN} pathways (the limit per run)`,
    ]);
  });
});

describe("pathway bounds", () => {
  const body = (over: Record<string, unknown> = {}) => ({ name: "n", source: "s", vintage: "v", startYear: 1850, agents: { co2: { erf: years(251) } }, ...over });

  it("refuses a series longer than the pathway length limit, naming it", () => {
    expect(problems(createPathwayBodySchema, body({ startYear: 1000, agents: { co2: { erf: years(MAX_PATHWAY_YEARS + 1) } } }))).toEqual([
      `agents.co2.erf must hold at most ${MAX_PATHWAY_YEARS} values (the pathway length limit, in years)`,
    ]);
  });

  it("refuses implausible years: a start before 1000 or a last year after 3000", () => {
    expect(problems(createPathwayBodySchema, body({ startYear: 1e15 }))).toEqual([
      `startYear must be a year from ${MIN_YEAR} to ${MAX_YEAR}`,
    ]);
    expect(problems(createPathwayBodySchema, body({ startYear: 2900 }))).toEqual([
      `startYear with 251 yearly values runs to 3150; years must lie from ${MIN_YEAR} to ${MAX_YEAR}`,
    ]);
    expect(problems(runSpecSchema, spec({ pathways: [pathway("p", 999)] }))).toContain(
      `pathways[0].startYear must be a year from ${MIN_YEAR} to ${MAX_YEAR}`,
    );
  });
});
