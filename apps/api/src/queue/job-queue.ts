import type { Transaction } from "sequelize";

/**
 * The queue interface the runs service and the workers use. The table (sql-job-queue.ts) is
 * the durable record in both queue modes: QUEUE=sqlite workers poll it with `claimNext`;
 * QUEUE=bullmq carries each job's id over Redis (bullmq-transport.ts) and the worker that
 * receives it takes the row with `claim` — the same guarded update. See apps/api/QUEUE.md.
 */
export interface ClaimedJob {
  id: string;
  type: string;
  payload: unknown;
  attempts: number;
  maxAttempts: number;
  lockedBy: string;
}

export interface AbandonedFilter {
  heartbeatBefore?: Date;
  lockedByDeadProcess?: (lockedBy: string) => boolean;
}

export interface JobQueue {
  /** Adds a job inside the caller's transaction, so it exists only if the caller's rows do. */
  enqueue(type: string, payload: unknown, transaction: Transaction, options?: { maxAttempts?: number }): Promise<string>;
  /** Takes the oldest queued job of these types for `workerId`, or null when none is left. */
  claimNext(workerId: string, types: readonly string[]): Promise<ClaimedJob | null>;
  /** Takes this one job if it is still queued (a BullMQ delivery); null when someone else has it or it ended. */
  claim(jobId: string, workerId: string): Promise<ClaimedJob | null>;
  /** Records progress and a heartbeat; tells the worker whether cancellation was asked for. */
  heartbeat(jobId: string, workerId: string, progress: number): Promise<{ cancelRequested: boolean; stillOwned: boolean }>;
  /** Marks the job finished ("succeeded" or "cancelled") inside the transaction that stores its outcome. */
  finish(jobId: string, workerId: string, status: "succeeded" | "cancelled" | "failed", transaction: Transaction, error?: string): Promise<boolean>;
  /**
   * Gives a job back after a crash: queued again while attempts remain, else failed (cancelled
   * when cancellation had been asked for). Returns the new status, or null if not owned.
   */
  release(
    jobId: string,
    workerId: string,
    reason: string,
    options?: { refundAttempt?: boolean },
  ): Promise<"queued" | "failed" | "cancelled" | null>;
  /**
   * Asks for cancellation; a queued job is cancelled at once (returns "cancelled"), a running one
   * when its worker next checks ("requested"). Asking again changes nothing: "already" when
   * cancellation was asked for before (or the job ended cancelled), "finished" when it ended otherwise.
   */
  requestCancel(jobId: string, transaction?: Transaction): Promise<"cancelled" | "requested" | "already" | "finished">;
  /**
   * Jobs left running by a dead worker go back to the queue (or fail when out of attempts).
   * With no filter every running job counts as abandoned (one process: on its start-up nothing
   * can still be running). With several processes a job is abandoned when its heartbeat is older
   * than `heartbeatBefore` or its `locked_by` names a process known to be dead.
   */
  requeueAbandoned(filter?: AbandonedFilter): Promise<Array<{ id: string; status: "queued" | "failed" }>>;
}
