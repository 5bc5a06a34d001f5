import type { Transaction } from "sequelize";

/**
 * The queue interface the runs service and the workers use. The SQLite table implementation
 * (sql-job-queue.ts) serves one machine; a distributed queue can implement the same methods.
 */
export interface ClaimedJob {
  id: string;
  type: string;
  payload: unknown;
  attempts: number;
  maxAttempts: number;
  lockedBy: string;
}

export interface JobQueue {
  /** Adds a job inside the caller's transaction, so it exists only if the caller's rows do. */
  enqueue(type: string, payload: unknown, transaction: Transaction, options?: { maxAttempts?: number }): Promise<string>;
  /** Takes the oldest queued job of these types for `workerId`, or null when none is left. */
  claimNext(workerId: string, types: readonly string[]): Promise<ClaimedJob | null>;
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
  /** Asks for cancellation; a queued job is cancelled at once (returns "cancelled"), a running one when its worker next checks. */
  requestCancel(jobId: string, transaction?: Transaction): Promise<"cancelled" | "requested" | "finished">;
  /** On start-up: jobs left running by a dead process go back to the queue (or fail when out of attempts). */
  requeueAbandoned(olderThan?: Date): Promise<Array<{ id: string; status: "queued" | "failed" }>>;
}
