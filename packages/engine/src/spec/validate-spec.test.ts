import { describe, expect, it } from "vitest";
import { runEnsemble } from "../ensemble/run-ensemble.js";
import { baseSpec, rampPathway } from "../ensemble/test-support/specs.js";
import { MAX_MEMBERS } from "./limits.js";
import { SpecError } from "./spec-error.js";
import type { RunSpec } from "./types.js";

/** Runs a spec expected to be refused; returns the SpecError. */
function refusal(spec: RunSpec): SpecError {
  try {
    runEnsemble(spec);
  } catch (error) {
    if (error instanceof SpecError) return error;
    throw error;
  }
  throw new Error("spec was accepted");
}

const model = baseSpec().model;

describe("bad input is refused with a message naming the field", () => {
  it("distribution parameters", () => {
    const e = refusal(baseSpec({ model: { ...model, climate: { ...model.climate, ecs: { type: "normal", mean: 3, sd: -1 } } } }));
    expect(e.message).toBe("model.climate.ecs.sd must be > 0");
    expect(e.field).toBe("model.climate.ecs.sd");
  });

  it("series lengths", () => {
    const second = rampPathway("second");
    const short = { ...second, agents: { ...second.agents, co2: { ppm: Array.from({ length: 300 }, () => 300) } } };
    expect(refusal(baseSpec({ pathways: [rampPathway(), short] })).message).toBe(
      "pathways[1].agents.co2.ppm has 300 values, expected 351",
    );
  });

  it("baseline outside the pathway years", () => {
    expect(refusal(baseSpec({ baseline: [1700, 1720] })).message).toBe(
      "baseline 1700–1720 lies outside the pathway years 1750–2100 (pathways[0])",
    );
  });

  it("unknown agents, in a pathway and in the model", () => {
    const pathway = { ...rampPathway(), agents: { ...rampPathway().agents, dust: { erf: new Array(351).fill(0) } } };
    expect(refusal(baseSpec({ pathways: [pathway as never] })).message).toMatch(/^pathways\[0\]\.agents\.dust is not a forcing agent/);
    const agents = { ...model.agents, soot: { scale: { type: "fixed", value: 1 } } };
    expect(refusal(baseSpec({ model: { ...model, agents: agents as never } })).message).toMatch(/^model\.agents\.soot is not a forcing agent/);
  });

  it("members below 1 or above the documented limit", () => {
    expect(refusal(baseSpec({ members: 0 })).message).toBe("members must be at least 1");
    expect(refusal(baseSpec({ members: MAX_MEMBERS + 1 })).message).toBe(`members must be at most ${MAX_MEMBERS}`);
    expect(refusal(baseSpec({ members: 2.5 })).message).toBe("members must be a whole number");
  });

  it("negative or zero concentrations", () => {
    const ppm = Array.from({ length: 351 }, (_, t) => 280 + t);
    ppm[12] = -3;
    const pathway = { ...rampPathway(), agents: { co2: { ppm } } };
    expect(refusal(baseSpec({ pathways: [pathway] })).message).toBe(
      "pathways[0].agents.co2.ppm[12] must not be negative (a concentration)",
    );
    ppm[12] = 0;
    expect(refusal(baseSpec({ pathways: [pathway] })).field).toBe("pathways[0].agents.co2.ppm[12]");
  });

  it("a rank correlation matrix that is not positive definite", () => {
    const correlations = [
      { between: ["ecs", "f2x"] as [string, string], rank: 0.9 },
      { between: ["ecs", "aerosol-cloud"] as [string, string], rank: 0.9 },
      { between: ["f2x", "aerosol-cloud"] as [string, string], rank: -0.9 },
    ];
    const e = refusal(baseSpec({ model: { ...model, correlations } }));
    expect(e.field).toBe("model.correlations");
    expect(e.message).toMatch(/not positive definite/);
  });

  it("correlations naming unknown or fixed inputs", () => {
    const unknown = [{ between: ["ecs", "albedo"] as [string, string], rank: 0.3 }];
    expect(refusal(baseSpec({ model: { ...model, correlations: unknown } })).message).toMatch(
      /^model\.correlations\[0\]\.between\[1\] "albedo" is not an input/,
    );
    const fixedOne = [{ between: ["ecs", "solar"] as [string, string], rank: 0.3 }];
    expect(refusal(baseSpec({ model: { ...model, correlations: fixedOne } })).message).toMatch(/"solar" is fixed in this model/);
  });

  it("sampled values that are not physical, naming the member", () => {
    const climate = { ...model.climate, upperHeatCapacity: { type: "normal" as const, mean: 1, sd: 3 } };
    expect(refusal(baseSpec({ members: 200, model: { ...model, climate } })).message).toMatch(
      /^model\.climate\.upperHeatCapacity sampled a non-positive value at member \d+ \(.*\): use a truncated or lognormal distribution$/,
    );
  });

  it("a climate whose one-year response overflows, naming the member (not an endless computation)", () => {
    // λ = F2x/ECS = 4e290 over C = 1e-25 W yr m⁻² K⁻¹: the system matrix is not finite.
    const climate = { ...model.climate, ecs: { type: "fixed" as const, value: 3.93 / 4e290 }, f2x: { type: "fixed" as const, value: 3.93 }, upperHeatCapacity: { type: "fixed" as const, value: 1e-25 } };
    expect(refusal(baseSpec({ members: 20, model: { ...model, climate } })).message).toMatch(
      /^model\.climate gives member 1 a climate whose one-year response is not finite/,
    );
  });

  it("horizons and the constraint window outside the pathway years", () => {
    expect(refusal(baseSpec({ horizons: [2200] })).message).toBe(
      "horizons[0] 2200 lies outside the pathway years 1750–2100 (pathways[0])",
    );
    const constraint = { from: 2090, to: 2120, observed: 1, sd: 0.1, internalVariability: 0.21 };
    expect(refusal(baseSpec({ model: { ...model, constraint } })).field).toBe("model.constraint");
    const negative = { from: 2011, to: 2020, observed: 1, sd: 0.1, internalVariability: -0.1 };
    expect(refusal(baseSpec({ model: { ...model, constraint: negative } })).message).toBe(
      "model.constraint.internalVariability must be a finite number ≥ 0",
    );
  });
});
