import type { StageTimes } from "../ensemble/run-ensemble.js";
import { startEngineThreads } from "../node/engine-thread-pool.js";
import { runEnsembleParallel } from "../node/run-ensemble-parallel.js";
import { w1Spec } from "./w1-spec.js";

/** One W1 line, with the fields and meaning of bench-reference/README.md. */
export interface W1Line {
  impl: "plumeline-ts" | "plumeline-ts-full" | "plumeline-ts-cold" | "plumeline-ts-full-cold";
  members: number;
  years: number;
  total_s: number;
  sample_s: number;
  simulate_s: number;
  summarize_s: number;
  member_years_per_s: number;
  check: number;
  /** With debug only: CPU seconds of the whole process (all threads) from spec to result. */
  cpu_s?: number;
}

/**
 * What a bench run summarises per year. "w1": exactly W1's outputs — temperature percentiles
 * and the share above 1.5 K (the engine also gives the temperature mean, which costs nothing
 * extra: the selector sums while it counts); the runner's `summaries` option switches the
 * forcing and imbalance series off. "full": everything a product run summarises (forcing
 * and imbalance percentiles and means too), i.e. about 3× W1's summarising work.
 */
export type BenchScope = "w1" | "full";

export interface W1Options {
  /** Computing threads (default: the runner's own choice, all cores at this size). */
  threads?: number;
  scope?: BenchScope;
  /** Adds cpu_s to the line. */
  debug?: boolean;
  /** The run's seed (default "w1"). */
  seed?: string;
  /**
   * Time a fresh process's first run: the helper threads start inside the timing and no code
   * has run before. By default the bench times a long-lived process's run (the API server's,
   * a queue worker's, after their first): the helpers are started and one untimed W1 run of
   * the same size and scope (seed "<seed>-warm-up", so nothing of it can be reused but code
   * and memory) goes before the clock, so V8 has optimised the code on every thread and the
   * run reuses the last run's kernel memory (kernels/kernel-memory.ts) as a server's does.
   */
  cold?: boolean;
}

/**
 * Times W1 through the engine's ordinary entry (runEnsembleParallel: sampling, both passes,
 * streaming summaries, result assembly and hashing), from spec to finished result.
 * check = Σ over years of the five temperature percentiles plus the share above 1.5 K.
 */
export async function runW1(members: number, options: W1Options = {}): Promise<W1Line> {
  const { threads, scope = "w1", debug = false, seed = "w1", cold = false } = options;
  const summaries = scope === "full" ? {} : { forcing: false, imbalance: false };
  const run = { ...(threads ? { threads } : {}), summaries };
  if (!cold) {
    if (threads !== 1) await startEngineThreads(threads);
    await runEnsembleParallel(w1Spec(members, `${seed}-warm-up`), run);
  }
  const spec = w1Spec(members, seed);
  const times: StageTimes = { sample: 0, simulate: 0, summarise: 0, finish: 0 };
  const cpuStart = process.cpuUsage();
  const start = performance.now();
  const result = await runEnsembleParallel(spec, { ...run, stageTimes: times });
  const total = (performance.now() - start) / 1000;
  const cpu = process.cpuUsage(cpuStart);
  const pathway = result.pathways[0]!;
  let check = 0;
  for (const key of ["p5", "p17", "p50", "p83", "p95"]) for (const v of pathway.temperature[key]!) check += v;
  for (const v of pathway.exceedance["1.5"]!) check += v;
  const round = (x: number) => Math.round(x * 1e4) / 1e4;
  return {
    impl: `${scope === "full" ? "plumeline-ts-full" : "plumeline-ts"}${cold ? "-cold" : ""}`,
    members,
    years: pathway.years.length,
    total_s: round(total),
    sample_s: round(times.sample),
    simulate_s: round(times.simulate),
    summarize_s: round(times.summarise + times.finish),
    member_years_per_s: Number(((members * pathway.years.length) / total).toPrecision(4)),
    check: round(check),
    ...(debug ? { cpu_s: round((cpu.user + cpu.system) / 1e6) } : {}),
  };
}
