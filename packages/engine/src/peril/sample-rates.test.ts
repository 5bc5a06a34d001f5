import { mean, standardDeviation } from "simple-statistics";
import { describe, expect, it } from "vitest";
import { quantileOf } from "../distributions/index.js";
import { createRandom, deriveSeed } from "../random/create-random.js";
import { sampleRates } from "./sample-rates.js";

describe("sampleRates", () => {
  it("draws Monte Carlo rates from the profile's own stream, seed/peril:<id>", () => {
    const rate = { type: "normal" as const, mean: 0.07, sd: 0.02 };
    const drawn = sampleRates(rate, 3, "run-7", "flood", "monte-carlo");
    const stream = createRandom(deriveSeed("run-7", "peril:flood"));
    for (let i = 0; i < 3; i++) expect(drawn[i]).toBe(quantileOf(rate, stream()));
  });

  it("puts one Latin-hypercube draw in each of the n equal-probability strata (McKay et al. 1979)", () => {
    const n = 257;
    const u = sampleRates({ type: "uniform", min: 0, max: 1 }, n, "s", "wind", "latin-hypercube");
    const strata = Array.from(u, (v) => Math.floor(v * n)).sort((a, b) => a - b);
    expect(strata).toEqual(Array.from({ length: n }, (_, k) => k));
  });

  it("has the distribution's mean and sd within sampling error (simple-statistics)", () => {
    // Normal(0.07, 0.02): standard error of the mean 0.02/sqrt(20000) ≈ 1.4e-4; allow 5 of them.
    const drawn = Array.from(sampleRates({ type: "normal", mean: 0.07, sd: 0.02 }, 20000, "s", "flood", "monte-carlo"));
    expect(Math.abs(mean(drawn) - 0.07)).toBeLessThan(7e-4);
    expect(Math.abs(standardDeviation(drawn) - 0.02)).toBeLessThan(5e-4);
  });

  it("rejects a bad member count, sampling and distribution, naming the field", () => {
    expect(() => sampleRates({ type: "fixed", value: 0.07 }, 0, "s", "f", "monte-carlo")).toThrow(/^members /);
    expect(() => sampleRates({ type: "fixed", value: 0.07 }, 2, "s", "f", "sobol" as "monte-carlo")).toThrow(/^sampling /);
    expect(() => sampleRates({ type: "normal", mean: 0.07, sd: -1 }, 2, "s", "f", "monte-carlo", "perils[0].scaling.rate")).toThrow(
      /^perils\[0\]\.scaling\.rate\.sd/,
    );
  });
});
