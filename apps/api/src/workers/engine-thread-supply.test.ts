import type { RunSpec } from "@plumeline/contracts";
import { runEnsemble } from "@plumeline/engine";
import { afterEach, describe, expect, it } from "vitest";
import type { EngineOutcome } from "./engine-thread-client.js";
import { EngineThreadSupply } from "./engine-thread-supply.js";

/** A small one-pathway spec: a CO2 forcing ramp 1850-2100, uncertain ECS and F2x. */
function spec(members: number, seed: string): RunSpec {
  const years = 251;
  return {
    seed,
    members,
    sampling: "latin-hypercube",
    baseline: [1850, 1900],
    percentiles: [5, 50, 95],
    thresholds: [1.5, 2],
    horizons: [2050, 2100],
    pathways: [{ id: "ramp", name: "Ramp", startYear: 1850, agents: { co2: { erf: Array.from({ length: years }, (_, t) => (4 * t) / (years - 1)) } } }],
    model: {
      climate: {
        ecs: { type: "lognormal", median: 3, logSd: 0.3 },
        f2x: { type: "normal", mean: 3.93, sd: 0.24 },
        upperHeatCapacity: { type: "fixed", value: 8 },
        deepHeatCapacity: { type: "fixed", value: 100 },
        heatExchange: { type: "fixed", value: 0.7 },
        deepEfficacy: { type: "fixed", value: 1.2 },
      },
      agents: {},
      correlations: [],
      constraint: null,
      forcingExpression: "ar6",
    },
  };
}

const hashOf = (outcome: EngineOutcome) => (outcome.kind === "done" ? outcome.result.resultHash : outcome.kind);

async function waitFor(check: () => boolean, ms = 10_000): Promise<void> {
  const end = Date.now() + ms;
  while (!check()) {
    if (Date.now() > end) throw new Error("timed out waiting");
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

let supply: EngineThreadSupply | null = null;
afterEach(async () => {
  await supply?.stop();
  supply = null;
});

describe("EngineThreadSupply", () => {
  it("keeps one thread ready and runs on it, with the engine's own result", async () => {
    supply = new EngineThreadSupply("supply-test");
    supply.prestart();
    expect(supply.size).toBe(1);
    const runner = supply.runner();
    const a = spec(400, "supply-a");
    expect(hashOf(await runner.run(a))).toBe(runEnsemble(a).resultHash);
    expect(hashOf(await runner.run(spec(300, "supply-b")))).toBe(runEnsemble(spec(300, "supply-b")).resultHash);
    expect(supply.threadsStarted).toBe(1);
    expect(supply.size).toBe(1);
  });

  it("starts a second thread only while two runs go at once, and ends it after", async () => {
    supply = new EngineThreadSupply("supply-test");
    supply.prestart();
    const [one, two] = [supply.runner(), supply.runner()];
    const running = Promise.all([one.run(spec(400, "together-1")), two.run(spec(400, "together-2"))]);
    expect(supply.size).toBe(2);
    const [first, second] = await running;
    expect(hashOf(first)).toBe(runEnsemble(spec(400, "together-1")).resultHash);
    expect(hashOf(second)).toBe(runEnsemble(spec(400, "together-2")).resultHash);
    expect(supply.threadsStarted).toBe(2);
    await waitFor(() => supply!.size === 1);
  });

  it("replaces the thread after a run at or above the size limit, so its memory goes with it", async () => {
    supply = new EngineThreadSupply("supply-test", { replaceAfterMembers: 500 });
    supply.prestart();
    const runner = supply.runner();
    await runner.run(spec(499, "below-limit"));
    expect(supply.threadsStarted).toBe(1);
    await runner.run(spec(500, "at-limit"));
    expect(supply.threadsStarted).toBe(2);
    await waitFor(() => supply!.size === 1);
    const next = spec(300, "after-replacement");
    expect(hashOf(await runner.run(next))).toBe(runEnsemble(next).resultHash);
  });

  it("passes a cancel on to the thread running the slot's run", async () => {
    supply = new EngineThreadSupply("supply-test");
    supply.prestart();
    const runner = supply.runner();
    let cancelled = false;
    const outcome = await runner.run(spec(200_000, "to-cancel"), () => {
      if (cancelled) return;
      cancelled = true;
      runner.cancel();
    });
    expect(outcome.kind).toBe("cancelled");
  });
});
