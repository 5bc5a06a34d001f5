import type { PathwayPerilResult } from "../peril/types.js";
import type { PathwayResult, PercentileSet, RunResult, RunSpec } from "../spec/types.js";
import { assembleResult } from "./assemble-result.js";
import type { EnsemblePlan } from "./ensemble-plan.js";
import { finishPathway, type PathwayWeights } from "./finish-pathway.js";
import { createFinishWorkspace } from "./finish-workspace.js";
import { impliedSensitivities } from "./implied-sensitivity.js";
import { pathwayPerils, runPerils } from "./pathway-perils.js";
import { weighPathway } from "./pathway-weights.js";

/** A pass the pipeline needs run over every member before it can go on. */
export type PassRequest =
  /** Rebuild the member climate in place for source `variant` of F2x (plan.climate), before `pathway`'s passes. */
  | { kind: "climate"; pathway: number; variant: number }
  | { kind: "baseline"; pathway: number }
  | { kind: "report"; pathway: number; weighting: PathwayWeights };

/** One pathway's per-member values, as onPathwayMembers hands them out. */
export interface PathwayMembers {
  pathwayIndex: number;
  /** Per horizon (spec order), each member's warming (annual-mean anomaly, K). */
  horizonWarming: Float64Array[];
  /** Constraint weights (largest 1), or null when the run has no constraint. */
  weights: Float64Array | null;
  /** Every model input with its sampled column, in the sampler's order. */
  inputs: { name: string; kind: "climate" | "agent"; fixed: boolean; values: Float64Array }[];
  /** Agents this pathway carries. */
  agents: string[];
}

/**
 * The run pipeline both runners share (run-ensemble.ts on one thread, node/run-ensemble-
 * parallel.ts over worker threads): per pathway, the member climate rebuilt if the pathway
 * feels another source of F2x than the one before, the first pass (baseline and constraint
 * window), the constraint weights, the reporting pass, then the pathway's result, its peril
 * lens and — for the first pathway — the implied ECS and TCR; finally the stamped result.
 *
 * A generator, so the same steps serve a synchronous and an asynchronous runner: it yields
 * each pass it needs (PassRequest) and the runner runs it over all members however it
 * likes, then resumes it. The runners differ only in who runs the passes, so they give the
 * same numbers.
 */
export function* runPipeline(
  spec: RunSpec,
  plan: EnsemblePlan,
  onPathwayMembers?: (members: PathwayMembers) => void,
): Generator<PassRequest, RunResult, void> {
  const pathways: PathwayResult[] = [];
  const perils: (PathwayPerilResult | null)[] = [];
  let implied: { ecs: PercentileSet; tcr: PercentileSet } | null = null;
  const finishWork = createFinishWorkspace(plan.members, plan.horizons.length);
  let climate = 0; // set-up built the first pathway's
  for (let p = 0; p < plan.pathways.length; p++) {
    if (plan.pathwayClimate[p] !== climate) {
      climate = plan.pathwayClimate[p]!;
      yield { kind: "climate", pathway: p, variant: climate };
    }
    yield { kind: "baseline", pathway: p };
    const weighting = weighPathway(plan);
    yield { kind: "report", pathway: p, weighting };
    pathways.push(finishPathway(spec, plan, p, weighting, finishWork));
    onPathwayMembers?.({
      pathwayIndex: p,
      horizonWarming: plan.state.horizonTemperature,
      weights: weighting.weights,
      inputs: plan.inputs.map((x, i) => ({ name: x.name, kind: x.kind, fixed: x.distribution.type === "fixed", values: plan.columns[i]! })),
      agents: plan.pathways[p]!.agents,
    });
    perils.push(pathwayPerils(spec, plan, p, weighting));
    if (p === 0) implied = impliedSensitivities(plan, spec.percentiles, weighting, finishWork.selector);
  }
  return assembleResult(spec, pathways, implied!, runPerils(spec, perils));
}
