import type { EnsemblePlan } from "../ensemble/ensemble-plan.js";
import type { ReportOrder } from "./pass-participant.js";
import type { PipelineControl } from "./pipeline-control.js";

/** Messages from the main thread to an ensemble worker. */
export type ToWorker =
  | { kind: "plan"; plan: EnsemblePlan; control: PipelineControl; worker: number }
  | { kind: "baseline"; pathway: number }
  | ({ kind: "report" } & ReportOrder)
  | { kind: "stop" };

/** Messages from an ensemble worker back to the main thread. */
export type FromWorker =
  | { kind: "ready" }
  | { kind: "done"; simulateSeconds: number; summariseSeconds: number }
  | { kind: "cancelled" }
  | { kind: "failed"; message: string; stack?: string };
