import { EventEmitter } from "node:events";

/**
 * In-process nudge: the runs service emits "enqueued" after committing a job so idle workers
 * in this process wake at once instead of at their next poll. Workers in other processes
 * still find the job by polling; the table stays the source of truth.
 */
export const jobSignal = new EventEmitter();
jobSignal.setMaxListeners(100);
