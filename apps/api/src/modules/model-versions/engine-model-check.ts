import type { ModelSpec, ModelVersionDefaults } from "@plumeline/contracts";
import { badRequest } from "../../errors/app-error.js";

/** Loaded on first use, like the runs service: the app starts while the engine is rebuilt. */
const loadEngine = () => import("@plumeline/engine");

/**
 * Checks a draft's assumptions with the engine's own validateSpec when the draft is saved, so
 * a version every run would fail on (a fixed ECS of -3 K) can never be submitted or approved.
 * The engine checks whole run specs, so the model is wrapped in a probe spec: one member and
 * a flat pathway covering the defaults' years. Only problems in `model.*` are reported here;
 * the pathway and run choices are checked again when a run is built from real pathways.
 */
export async function assertEngineAcceptsModel(model: ModelSpec, defaults: ModelVersionDefaults): Promise<void> {
  const { validateSpec, applyDefaults, SpecError } = await loadEngine();
  const years = [...defaults.baseline, ...defaults.horizons, ...(model.constraint ? [model.constraint.from, model.constraint.to] : [])];
  const first = Math.min(...years);
  const last = Math.max(...years);
  const probe = {
    seed: "model-check",
    members: 1,
    sampling: "monte-carlo" as const,
    baseline: defaults.baseline,
    percentiles: defaults.percentiles,
    thresholds: defaults.thresholds,
    horizons: defaults.horizons,
    pathways: [{ id: "probe", name: "probe", startYear: first, agents: { co2: { erf: new Array<number>(last - first + 1).fill(0) } } }],
    model,
  };
  try {
    validateSpec(applyDefaults(probe as never));
  } catch (error) {
    if (!(error instanceof SpecError) || !error.field.startsWith("model")) return;
    const problem = error.message.startsWith(`${error.field} `) ? error.message.slice(error.field.length + 1) : error.message;
    throw badRequest([{ path: error.field, message: problem }], "The engine refuses these model assumptions; every run on them would fail.");
  }
}
