import { applyDefaults } from "../spec/apply-defaults.js";
import { SpecError } from "../spec/spec-error.js";
import type { RunSpec, RunSpecInput } from "../spec/types.js";
import { validateSpec } from "../spec/validate-spec.js";
import { MEMBER_BLOCK } from "./advance-year.js";
import { ALL_SUMMARIES, allocateState, type EnsemblePlan, type SummaryChoice } from "./ensemble-plan.js";
import { buildMemberClimate } from "./member-climate.js";
import { buildPathwayForcing } from "./pathway-forcing.js";
import { allocateLocal, sampleInputs, type Allocate } from "./sample-inputs.js";
import { listModelInputs } from "./uncertain-inputs.js";
import { spanYears } from "./year-spans.js";
import { yearlyLength } from "./yearly-layout.js";

/**
 * Validates the spec, samples every input once and builds each member's propagator and
 * each pathway's forcing: all the deterministic set-up of a run, shared by the one-thread
 * and the worker-thread runners (which only differ in who advances which members).
 * summaries: forcing and imbalance series on (default) or off (ensemble-plan.ts SummaryChoice).
 * spansInRing: how many spans of year slots exist at once (1 for one thread; 2 lets
 * workers simulate the next span while the last one is being summarised).
 */
export function preparePlan(
  input: RunSpecInput | RunSpec,
  spansInRing = 1,
  allocate: Allocate = allocateLocal,
  summaries: Partial<SummaryChoice> = {},
): { spec: RunSpec; plan: EnsemblePlan } {
  const spec = applyDefaults(input);
  validateSpec(spec);
  const inputs = listModelInputs(spec);
  const names = inputs.map((x) => x.name);
  const columns = sampleInputs(spec, inputs, allocate);
  const column = (name: string) => columns[names.indexOf(name)]!;
  const climate = buildMemberClimate(
    {
      ecs: column("ecs"),
      f2x: column("f2x"),
      upperHeatCapacity: column("upperHeatCapacity"),
      deepHeatCapacity: column("deepHeatCapacity"),
      heatExchange: column("heatExchange"),
      deepEfficacy: column("deepEfficacy"),
    },
    allocate,
  );
  inputs.forEach((x, i) => {
    if (x.kind !== "agent") return;
    const values = columns[i]!;
    for (let m = 0; m < values.length; m++)
      if (!Number.isFinite(values[m]!)) throw new SpecError(x.field, `sampled a non-finite value at member ${m + 1}`);
  });
  const pathways = spec.pathways.map((_, i) => buildPathwayForcing(spec, i, names));
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
    allocate,
  );
  const plan: EnsemblePlan = {
    members: spec.members,
    inputs,
    columns,
    slotScales: pathways.map((p) =>
      Array.from({ length: p.scaleWidth }, (_, j) => (j < p.slotColumns.length ? columns[p.slotColumns[j]!]! : state.zeros)),
    ),
    climate,
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
  return { spec, plan };
}
