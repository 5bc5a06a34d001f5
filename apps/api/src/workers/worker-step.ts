import type { AppContext } from "../context.js";

/**
 * What every job kind's worker step shares (run and replay alike), in a file of its own so the
 * two steps can use it without importing each other.
 */
export type WorkerContext = Pick<AppContext, "models" | "sequelize" | "mailer" | "config">;

export interface StepOptions {
  /** Least time between two progress writes to the database (the engine reports far more often). */
  progressWriteMs?: number;
  /** True while the server shuts down: a job interrupted then gets its attempt back. */
  isStopping?: () => boolean;
}

export type StepOutcome = "idle" | "succeeded" | "failed" | "cancelled" | "requeued";

/** The job was no longer held by the one reporting its outcome: nothing was written (a result is never stored twice). */
export class OutcomeDiscarded extends Error {
  override name = "OutcomeDiscarded";
}
