import { applyDefaults } from "../spec/apply-defaults.js";
import { SpecError } from "../spec/spec-error.js";
import type { RunSpec, RunSpecInput } from "../spec/types.js";
import { validateSpec } from "../spec/validate-spec.js";
import { createKernelMemory, type KernelMemory } from "../kernels/kernel-memory.js";
import { MEMBER_BLOCK } from "./advance-year.js";
import { ALL_SUMMARIES, allocateState, type EnsemblePlan, type SummaryChoice } from "./ensemble-plan.js";
import { layOutKernels } from "./kernel-layout.js";
import { doublingSourceOf, expressionDoublingForcing, fillDoublingForcing } from "./doubling-forcing.js";
import { allocateMemberClimate, buildMemberClimate, type MemberClimate } from "./member-climate.js";
import { buildPathwayForcing, type PathwayForcing } from "./pathway-forcing.js";
import { sampleInputs } from "./sample-inputs.js";
import { listModelInputs, type ModelInput } from "./uncertain-inputs.js";
import { spanYears } from "./year-spans.js";
import { yearlyLength } from "./yearly-layout.js";

/**
 * Validates the spec, samples every input once and builds each member's propagator and
 * each pathway's forcing: all the deterministic set-up of a run, shared by the one-thread
 * and the worker-thread runners (which only differ in who advances which members).
 * Every per-member array goes into one new shared kernel memory (kernel-memory.ts), which
 * worker threads can share. spansInRing: how many spans of year slots exist at once (1 for
 * one thread; 2 lets workers simulate the next span while the last one is being
 * summarised). summaries: forcing and imbalance series on (default) or off
 * (ensemble-plan.ts SummaryChoice). onSetup(fraction): set-up's own progress, 0–1 (sampling
 * is most of it), so a caller's progress can move before the first year is simulated.
 */
export function preparePlan(
  input: RunSpecInput | RunSpec,
  spansInRing = 1,
  summaries: Partial<SummaryChoice> = {},
  early?: EarlyPlan,
  onSetup?: (fraction: number) => void,
): { spec: RunSpec; plan: EnsemblePlan } {
  const spec = applyDefaults(input);
  validateSpec(spec);
  const memory = createKernelMemory();
  const inputs = listModelInputs(spec);
  const names = inputs.map((x) => x.name);
  // Sampling is about 80 % of set-up; the propagators and forcing the rest.
  const columns = sampleInputs(spec, inputs, memory.float64, onSetup && ((done, of) => onSetup((0.8 * done) / of)));
  const column = (name: string) => columns[names.indexOf(name)]!;
  // A pathway's forcing error is given after the samples' own refusals (their order before
  // `early` existed); the forcing is built first so the plan can be handed out early.
  let pathways: PathwayForcing[] | null = null;
  let pathwayError: Error | null = null;
  try {
    pathways = spec.pathways.map((_, i) => buildPathwayForcing(spec, i, names));
  } catch (error) {
    pathwayError = error instanceof Error ? error : new Error(String(error));
  }
  let plan: EnsemblePlan | null = null;
  const sources = spec.pathways.map(doublingSourceOf);
  const variants = [...new Set(sources)];
  const pathwayClimate = sources.map((s) => variants.indexOf(s));
  const co2Index = names.indexOf("co2");
  const climateInputs = [
    { field: "model.climate.ecs", values: column("ecs") },
    { field: "model.climate.f2x", values: column("f2x") },
    ...(co2Index >= 0 ? [{ field: "model.agents.co2.scale", values: columns[co2Index]! }] : []),
    ...(["upperHeatCapacity", "deepHeatCapacity", "heatExchange", "deepEfficacy"] as const).map((name) => ({
      field: `model.climate.${name}`,
      values: column(name),
    })),
  ];
  const expressionF2x = variants.includes("concentration") ? expressionDoublingForcing(spec.model.forcingExpression) : NaN;
  // One climate per source of F2x the pathways use (at most two), all allocated first so a
  // plan handed out early (to worker threads, which get a copy of the plan object over the
  // same shared memory) already holds every one; the first pathway's is filled first, so the
  // workers can warm on its first members while the rest are built.
  const climateColumns = variants.map((source) => ({
    ecs: column("ecs"),
    doublingForcing: fillDoublingForcing(source, column("f2x"), expressionF2x, co2Index >= 0 ? columns[co2Index]! : null, 1, memory.float64(spec.members)),
    upperHeatCapacity: column("upperHeatCapacity"),
    deepHeatCapacity: column("deepHeatCapacity"),
    heatExchange: column("heatExchange"),
    deepEfficacy: column("deepEfficacy"),
  }));
  const climates = climateColumns.map((c) => allocateMemberClimate(c, memory.float64));
  climateColumns.forEach((c, v) => {
    const earlyClimate =
      v === 0 && early && pathways
        ? {
            members: early.members,
            filled: () => {
              plan = assemblePlan(spec, inputs, columns, climates, pathwayClimate, pathways, spansInRing, memory, summaries);
              early.ready(plan);
            },
          }
        : undefined;
    buildMemberClimate(c, climateInputs, climates[v]!, earlyClimate);
  });
  inputs.forEach((x, i) => {
    if (x.kind !== "agent") return;
    const values = columns[i]!;
    for (let m = 0; m < values.length; m++)
      if (!Number.isFinite(values[m]!)) throw new SpecError(x.field, `sampled a non-finite value at member ${m + 1}`);
  });
  if (pathwayError !== null) throw pathwayError;
  const done = plan ?? assemblePlan(spec, inputs, columns, climates, pathwayClimate, pathways!, spansInRing, memory, summaries);
  onSetup?.(1);
  return { spec, plan: done };
}

/**
 * Hands out the plan before set-up ends: `ready` gets it once every input is sampled and
 * the first `members` members' propagators are built (the rest are still being built and
 * nothing is checked yet: a refusal may still follow, and then preparePlan throws).
 */
export interface EarlyPlan {
  members: number;
  ready(plan: EnsemblePlan): void;
}

function assemblePlan(
  spec: RunSpec,
  inputs: ModelInput[],
  columns: Float64Array[],
  climates: MemberClimate[],
  pathwayClimate: number[],
  pathways: PathwayForcing[],
  spansInRing: number,
  memory: KernelMemory,
  summaries: Partial<SummaryChoice>,
): EnsemblePlan {
  const maxYears = Math.max(...pathways.map((p) => p.years));
  const probs = spec.percentiles.map((p) => p / 100);
  const span = spanYears(spec.members, spansInRing);
  const blocks = Math.ceil(spec.members / MEMBER_BLOCK);
  const state = allocateState(
    spec.members,
    spec.thresholds.length,
    spec.horizons.length,
    span * spansInRing,
    blocks,
    yearlyLength(probs.length, spec.thresholds.length, maxYears),
    memory,
  );
  return {
    members: spec.members,
    inputs,
    columns,
    kernels: layOutKernels(memory, climates, state, columns, pathways),
    climate: climates[0]!,
    climates,
    pathwayClimate,
    pathways,
    probs,
    thresholds: [...spec.thresholds],
    thresholdsAscending: [...spec.thresholds].sort((a, b) => a - b),
    baseline: spec.baseline,
    constraint: spec.model.constraint,
    horizons: [...spec.horizons],
    summaries: { ...ALL_SUMMARIES, ...summaries },
    blocks,
    spanYears: span,
    state,
  };
}
