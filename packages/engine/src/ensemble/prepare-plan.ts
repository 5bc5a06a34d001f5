import { applyDefaults } from "../spec/apply-defaults.js";
import type { RunSpec, RunSpecInput } from "../spec/types.js";
import { validateSpec } from "../spec/validate-spec.js";
import { createKernelMemory, type KernelMemory } from "../kernels/kernel-memory.js";
import { MEMBER_BLOCK } from "./advance-year.js";
import { ALL_SUMMARIES, allocateState, type EnsemblePlan, type SummaryChoice } from "./ensemble-plan.js";
import { layOutKernels } from "./kernel-layout.js";
import { doublingSourceOf } from "./doubling-forcing.js";
import { allocateMemberClimate } from "./member-climate.js";
import { buildPathwayForcing, type PathwayForcing } from "./pathway-forcing.js";
import { PlanSetup, type SetupArrays } from "./plan-setup.js";
import { listModelInputs } from "./uncertain-inputs.js";
import { spanYears } from "./year-spans.js";
import { yearlyLength } from "./yearly-layout.js";

/**
 * Validates the spec, samples every input once and builds each member's propagator and
 * each pathway's forcing: all the deterministic set-up of a run on this thread (the
 * parallel runner shares the same pieces out: allocatePlan, plan-setup.ts). Every
 * per-member array goes into one new shared kernel memory (kernel-memory.ts), which worker
 * threads can share. summaries: forcing and imbalance series on (default) or off (ensemble-plan.ts
 * SummaryChoice). onSetup(fraction): set-up's own progress, 0–1, so a caller's progress can
 * move before the first year is simulated. The set-up is returned too: the runner rebuilds
 * the member climate with it for a pathway that feels another source of F2x.
 */
export function preparePlan(
  input: RunSpecInput | RunSpec,
  summaries: Partial<SummaryChoice> = {},
  onSetup?: (fraction: number) => void,
): { spec: RunSpec; plan: EnsemblePlan; setup: PlanSetup } {
  const { spec, plan, setup, pathwayError } = allocatePlan(input, summaries);
  setup.runAll(onSetup && ((done, of) => onSetup(done / of)));
  // A pathway's forcing error comes after the samples' own refusals (their order always).
  if (pathwayError !== null) throw pathwayError;
  onSetup?.(1);
  return { spec, plan: plan!, setup };
}

/** A run's arrays allocated and its pathways' forcing built, before any input is sampled. */
export interface AllocatedPlan {
  spec: RunSpec;
  /** Null when a pathway's forcing could not be built (pathwayError says why). */
  plan: EnsemblePlan | null;
  /** The set-up's pieces over the plan's arrays; its clean flags live in the kernel memory. */
  setup: PlanSetup;
  pathwayError: Error | null;
}

/**
 * Validates the spec and allocates everything a run holds — input columns, member climate,
 * state — in one new kernel memory, and builds each pathway's forcing; nothing is sampled
 * yet (setup does that, on one thread or shared out). Throws SpecError for a spec that
 * fails validation; a pathway's forcing error is returned, to be thrown after set-up's own
 * refusals.
 */
export function allocatePlan(input: RunSpecInput | RunSpec, summaries: Partial<SummaryChoice>): AllocatedPlan {
  const spec = applyDefaults(input);
  validateSpec(spec);
  const memory = createKernelMemory();
  const inputs = listModelInputs(spec);
  const columns = inputs.map(() => memory.float64(spec.members));
  const ecs = columns[inputs.findIndex((x) => x.name === "ecs")]!;
  const sources = spec.pathways.map(doublingSourceOf);
  const variants = [...new Set(sources)];
  const climate = allocateMemberClimate(ecs, memory.float64(spec.members), memory.float64);
  const tcr = memory.float64(spec.members);
  const setup = new PlanSetup(
    spec,
    { inputs, columns, climate, tcr, memory: memory.memory },
    memory.int32(PlanSetup.piecesOf(spec)),
  );
  let pathways: PathwayForcing[];
  try {
    const names = inputs.map((x) => x.name);
    pathways = spec.pathways.map((_, i) => buildPathwayForcing(spec, i, names));
  } catch (error) {
    return { spec, plan: null, setup, pathwayError: error instanceof Error ? error : new Error(String(error)) };
  }
  const pathwayClimate = sources.map((s) => variants.indexOf(s));
  const plan = assemblePlan(spec, { inputs, columns, climate, tcr, memory: memory.memory }, pathwayClimate, pathways, memory, summaries);
  return { spec, plan, setup, pathwayError: null };
}

function assemblePlan(
  spec: RunSpec,
  { inputs, columns, climate, tcr }: SetupArrays,
  pathwayClimate: number[],
  pathways: PathwayForcing[],
  memory: KernelMemory,
  summaries: Partial<SummaryChoice>,
): EnsemblePlan {
  const maxYears = Math.max(...pathways.map((p) => p.years));
  const probs = spec.percentiles.map((p) => p / 100);
  const span = spanYears(spec.members);
  const blocks = Math.ceil(spec.members / MEMBER_BLOCK);
  const state = allocateState(
    spec.members,
    spec.thresholds.length,
    spec.horizons.length,
    span,
    blocks,
    yearlyLength(probs.length, spec.thresholds.length, maxYears),
    memory,
  );
  return {
    members: spec.members,
    inputs,
    columns,
    kernels: layOutKernels(memory, climate, state, columns, pathways),
    climate,
    pathwayClimate,
    tcr,
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
