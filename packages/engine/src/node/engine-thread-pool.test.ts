import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { runEnsemble } from "../ensemble/run-ensemble.js";
import { baseSpec, rampPathway } from "../ensemble/test-support/specs.js";
import { startEngineThreads } from "./engine-thread-pool.js";
import { runEnsembleParallel } from "./run-ensemble-parallel.js";

/*
 * Helper threads kept between runs must never carry anything from one run into the next:
 * each run's result must equal the one-thread runner's, whatever ran on the same threads
 * before (a different spec, a refused spec, a cancelled run).
 */
describe("engine threads kept between runs", () => {
  it("give every run the one-thread result, after a refused and a cancelled run on the same threads", async () => {
    await startEngineThreads(3);
    const a = baseSpec({ members: 3_001, sampling: "monte-carlo" });
    const b = baseSpec({ members: 2_500, seed: "another", pathways: [rampPathway("b", 1800, 301)] });
    expect((await runEnsembleParallel(a, { threads: 3 })).resultHash).toBe(runEnsemble(a).resultHash);
    // Refused during set-up (a normal heat capacity samples negative values): the same words as one thread.
    const refused = baseSpec({
      members: 4_000,
      model: { ...baseSpec().model, climate: { ...baseSpec().model.climate, upperHeatCapacity: { type: "normal", mean: 1, sd: 2 } } },
    });
    const oneThreadRefusal = (() => {
      try {
        runEnsemble(refused);
      } catch (error) {
        return (error as Error).message;
      }
      return "accepted";
    })();
    expect(oneThreadRefusal).toMatch(/^model\.climate\.upperHeatCapacity sampled a non-positive value at member \d+/);
    await expect(runEnsembleParallel(refused, { threads: 3 })).rejects.toThrow(oneThreadRefusal);
    const controller = new AbortController();
    const cancelled = runEnsembleParallel(baseSpec({ members: 200_000 }), { threads: 3, signal: controller.signal });
    setTimeout(() => controller.abort(), 50);
    await expect(cancelled).rejects.toThrow(/cancelled/);
    expect((await runEnsembleParallel(b, { threads: 3 })).resultHash).toBe(runEnsemble(b).resultHash);
    expect((await runEnsembleParallel(a, { threads: 2 })).resultHash).toBe(runEnsemble(a).resultHash);
  }, 120_000);

  it("never keep a process alive once it has nothing else to do", () => {
    // A process that starts the threads and ends must exit by itself, promptly.
    const pool = fileURLToPath(new URL("./engine-thread-pool.ts", import.meta.url));
    const script = `const { startEngineThreads } = await import(${JSON.stringify(pool)}); await startEngineThreads(3); console.log("started");`;
    const child = spawnSync(process.execPath, ["--import", "tsx", "--input-type=module", "-e", script], {
      encoding: "utf8",
      timeout: 30_000,
    });
    expect(child.error).toBeUndefined();
    expect(child.stdout.trim()).toBe("started");
    expect(child.status).toBe(0);
  }, 60_000);
});
