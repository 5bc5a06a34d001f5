import { describe, expect, it } from "vitest";
import { runEnsemble } from "../ensemble/run-ensemble.js";
import { baseSpec, rampPathway } from "../ensemble/test-support/specs.js";
import { runEnsembleParallel } from "./run-ensemble-parallel.js";
import { SETUP_SHARE } from "../ensemble/progress-share.js";

describe("runEnsembleParallel", () => {
  it("reports set-up progress (sampling) before any year is simulated, then moves on from set-up's share", async () => {
    const fractions: number[] = [];
    await runEnsembleParallel(baseSpec({ members: 4_000 }), { threads: 2, onProgress: (f) => fractions.push(f) });
    expect(fractions[0]).toBeGreaterThan(0);
    expect(fractions[0]).toBeLessThanOrEqual(SETUP_SHARE);
    expect(fractions.filter((f) => f <= SETUP_SHARE).length).toBeGreaterThanOrEqual(3);
    expect(fractions.at(-1)).toBe(1);
    expect(fractions.every((f, i) => i === 0 || f >= fractions[i - 1]!)).toBe(true);
  });

  it("gives results bit-identical to one thread, with and without a constraint, peril lens included", async () => {
    // Two pathways, a constraint (weighted summaries), a peril profile per pathway's horizons
    // and an odd member count split over 2 and 3 threads.
    const spec = baseSpec({
      members: 2_001,
      // "b" gives CO2 in ppm: its members step with a second set of propagators (λ from the
      // expression's doubled-CO2 forcing), "a" with the sampled f2x's.
      pathways: [
        rampPathway("a"),
        { ...rampPathway("b", 1800, 301), agents: { ...rampPathway("b", 1800, 301).agents, co2: { ppm: Array.from({ length: 301 }, (_, t) => 280 + 300 * (t / 300) ** 2) } } },
      ],
      perils: [
        {
          id: "flood",
          name: "Flood",
          peril: "flood-heavy-rainfall",
          region: "Test Region",
          metric: "frequency",
          baselineWarming: 1.1,
          scaling: { kind: "per-kelvin", rate: { type: "normal", mean: 0.07, sd: 0.01 } },
        },
      ],
      model: {
        ...baseSpec().model,
        agents: { ...baseSpec().model.agents, co2: { scale: { type: "normal", mean: 1, sd: 0.1 } } },
        constraint: { from: 2011, to: 2020, observed: 1.0, sd: 0.1, internalVariability: 0.21 },
      },
    });
    const single = runEnsemble(spec);
    const two = await runEnsembleParallel(spec, { threads: 2 });
    expect(two).toEqual(single);
    expect(two.resultHash).toBe(single.resultHash);
    expect(two.perils!.pathways).toHaveLength(2);
    const unconstrained = { ...spec, model: { ...spec.model, constraint: null } };
    const three = await runEnsembleParallel(unconstrained, { threads: 3 });
    expect(three.resultHash).toBe(runEnsemble(unconstrained).resultHash);
  }, 60_000);

  it("gives one thread's numbers whatever ran before it on the same threads and memory", async () => {
    // A bigger run with a constraint leaves its values in the memory the next run reuses
    // (kernel-memory.ts); the first run's result must not change either.
    const spec = baseSpec({ members: 6_001, thresholds: [1.5, 2], horizons: [2100] });
    const other = baseSpec({ seed: "other", members: 9_000, model: { ...baseSpec().model, constraint: { from: 2011, to: 2020, observed: 1.0, sd: 0.1, internalVariability: 0.21 } } });
    const first = await runEnsembleParallel(spec, { threads: 2 });
    const text = JSON.stringify(first);
    await runEnsembleParallel(other, { threads: 2 });
    const again = await runEnsembleParallel(spec, { threads: 2 });
    expect(again.resultHash).toBe(runEnsemble(spec).resultHash);
    expect(again).toEqual(first);
    expect(JSON.stringify(first)).toBe(text);
  }, 60_000);

  it("is bit-identical to one thread when threads and member blocks split members differently", async () => {
    // 5,001 members: one thread runs member blocks of 2,048, 2,048 and 905; two threads run
    // 2,500 + 2,501 members, each as a block of 2,048 and a short one.
    const spec = baseSpec({ members: 5_001, sampling: "monte-carlo", horizons: [2100] });
    const single = runEnsemble(spec);
    expect((await runEnsembleParallel(spec, { threads: 2 })).resultHash).toBe(single.resultHash);
  }, 60_000);

  it("rejects a bad spec with the SpecError and honours an aborted signal", async () => {
    await expect(runEnsembleParallel(baseSpec({ members: 0 }), { threads: 2 })).rejects.toThrow("members must be at least 1");
    const controller = new AbortController();
    controller.abort();
    await expect(runEnsembleParallel(baseSpec({ members: 3000 }), { threads: 2, signal: controller.signal })).rejects.toThrow(/cancelled/);
  }, 60_000);
});
