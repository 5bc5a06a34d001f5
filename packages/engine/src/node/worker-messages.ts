import type { EnsemblePlan } from "../ensemble/ensemble-plan.js";
import type { RunSpec } from "../spec/types.js";
import type { ReportOrder } from "./pass-participant.js";
import type { PipelineControl } from "./pipeline-control.js";

/** Messages from the main thread to an ensemble worker. */
export type ToWorker =
  /** A new run: its plan (arrays allocated, not filled), then, if `sample`, this thread's share of the sampling. */
  | { kind: "setup"; plan: EnsemblePlan; control: PipelineControl; spec: RunSpec; clean: Int32Array; worker: number; sample: boolean }
  /** This thread's share of building the member climate for source `variant` of F2x (plan-setup.ts). */
  | { kind: "climate"; variant: number }
  | { kind: "baseline"; pathway: number }
  | ({ kind: "report" } & ReportOrder)
  /** The run is over: drop its plan (no reply). */
  | { kind: "release" };

/** Messages from an ensemble worker back to the main thread. */
export type FromWorker =
  /** Sent once, unasked, when the thread has loaded the engine. */
  | { kind: "booted" }
  | { kind: "done"; simulateSeconds: number; summariseSeconds: number }
  | { kind: "cancelled" }
  | { kind: "failed"; message: string; stack?: string };
