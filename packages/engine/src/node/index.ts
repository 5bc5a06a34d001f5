/** Node-only entry of the engine: the worker-thread runner. */
export { runEnsembleParallel, PARALLEL_MIN_MEMBERS, type ParallelRunOptions } from "./run-ensemble-parallel.js";
export { startEngineThreads } from "./engine-thread-pool.js";
export type { StageTimes } from "../ensemble/run-ensemble.js";
