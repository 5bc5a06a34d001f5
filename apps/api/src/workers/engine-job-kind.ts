import type { RunSpec } from "@plumeline/contracts";
import type { ResultDocument } from "../modules/results/result-document.js";
import type { JobModel } from "../queue/job.model.js";
import type { EngineJobKind } from "../queue/engine-job-protocol.js";
import type { EngineOutcome } from "./engine-thread-client.js";

/** Who holds a job row while a BullMQ worker runs it: the API records events on its behalf. */
export const BULLMQ_HOLDER = "bullmq";

/**
 * What the API does with one type of engine job when QUEUE=bullmq: where its spec comes from
 * and how its start, progress, return to the queue and outcome are recorded. Every write is
 * guarded (the run's state, the job row held by BULLMQ_HOLDER), so an event seen twice — by
 * two API processes, or by an event and the reconcile sweep — changes nothing the second time.
 */
export interface EngineJobKindHandler {
  kind: EngineJobKind;
  specOf(row: JobModel): Promise<RunSpec>;
  started(row: JobModel): Promise<void>;
  progressed(row: JobModel, fraction: number): Promise<void>;
  /** BullMQ gave the job back to its queue (its worker stopped answering); the row is queued again. */
  requeued(row: JobModel, reason: string): Promise<void>;
  /** Records the outcome; throws OutcomeDiscarded when the row was no longer held (nothing written). */
  finished(row: JobModel, outcome: EngineOutcome, compressed?: ResultDocument): Promise<void>;
}
