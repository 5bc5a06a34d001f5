import { sampleRankCorrelation } from "simple-statistics";
import { describe, expect, it } from "vitest";
import { quantilesOf } from "../distributions/index.js";
import { createRandom } from "../random/create-random.js";
import { latinHypercube } from "../sampling/latin-hypercube.js";
import { firstOrderIndex } from "./first-order-index.js";
import { kishEffectiveSize } from "./kish.js";
import { sortOrder } from "./sort-order.js";
import { weightedCorrelation, weightedMidRanks } from "./weighted-spearman.js";

function columns(n: number, dims: number, seed: string, law: Parameters<typeof quantilesOf>[0]): Float64Array[] {
  return latinHypercube(n, dims, createRandom(seed)).map((u) => quantilesOf(law, u, "x"));
}

const share = (x: Float64Array, y: Float64Array, weights: Float64Array | null = null) => {
  const total = weights ? weights.reduce((a, b) => a + b, 0) : x.length;
  const effective = weights ? kishEffectiveSize(weights) : x.length;
  return firstOrderIndex(sortOrder(x), y, weights, total, effective);
};

// Ensembles of thousands of members: a generous timeout for a busy shared machine.
describe("firstOrderIndex (Sobol main effect from given data)", { timeout: 60_000 }, () => {
  it("a linear model of independent inputs: S_i = a_i² Var(X_i) / Σ_j a_j² Var(X_j) (closed form)", () => {
    // Y = 3·X1 + 2·X2 + 1·X3 + 0·X4 with X ~ Normal(0, sd_i): S = (9·1, 4·2.25, 1·4, 0)/22 (sd 1, 1.5, 2, 1).
    const n = 20_000;
    const sds = [1, 1.5, 2, 1];
    const a = [3, 2, 1, 0];
    const x = latinHypercube(n, 4, createRandom("linear-shares")).map((u, i) => quantilesOf({ type: "normal", mean: 0, sd: sds[i]! }, u, "x"));
    const y = new Float64Array(n);
    for (let m = 0; m < n; m++) y[m] = a.reduce((s, ai, i) => s + ai * x[i]![m]!, 0);
    const total = a.reduce((s, ai, i) => s + ai * ai * sds[i]! * sds[i]!, 0);
    const estimates = x.map((column) => share(column, y));
    a.forEach((ai, i) => expect(Math.abs(estimates[i]! - (ai * ai * sds[i]! * sds[i]!) / total)).toBeLessThan(0.01));
    expect(estimates.reduce((s, v) => s + v, 0)).toBeLessThan(1.01);
  });

  it("the Ishigami function gives the published indices S1 = 0.3139, S2 = 0.4424, S3 = 0", () => {
    // Ishigami & Homma (1990): f = sin x1 + 7 sin² x2 + 0.1 x3⁴ sin x1, x_i ~ U(−π, π).
    // First-order indices as published (e.g. Saltelli et al. 2008, Global Sensitivity Analysis:
    // The Primer, Wiley; from memory): 0.3139, 0.4424, 0.
    const n = 40_000;
    const [x1, x2, x3] = columns(n, 3, "ishigami", { type: "uniform", min: -Math.PI, max: Math.PI }) as [Float64Array, Float64Array, Float64Array];
    const y = new Float64Array(n);
    for (let m = 0; m < n; m++) y[m] = Math.sin(x1[m]!) + 7 * Math.sin(x2[m]!) ** 2 + 0.1 * x3[m]! ** 4 * Math.sin(x1[m]!);
    expect(Math.abs(share(x1, y) - 0.3139)).toBeLessThan(0.015);
    expect(Math.abs(share(x2, y) - 0.4424)).toBeLessThan(0.015);
    expect(share(x3, y)).toBeLessThan(0.01);
  });

  it("under importance weights on X1, its share follows the weighted (posterior) variance (closed form)", () => {
    // X1, X2 ~ Normal(0, 1), Y = X1 + X2, weights exp(−x1²/(2·0.5²)): the weighted X1 is Normal(0, s²)
    // with s² = 0.25/(1 + 0.25) = 0.2 (product of Gaussians), so S1 = 0.2/1.2 and S2 = 1/1.2.
    const n = 40_000;
    const [x1, x2] = columns(n, 2, "weighted-shares", { type: "normal", mean: 0, sd: 1 }) as [Float64Array, Float64Array];
    const y = new Float64Array(n);
    const w = new Float64Array(n);
    for (let m = 0; m < n; m++) {
      y[m] = x1[m]! + x2[m]!;
      w[m] = Math.exp(-(x1[m]! ** 2) / (2 * 0.25));
    }
    expect(Math.abs(share(x1, y, w) - 0.2 / 1.2)).toBeLessThan(0.015);
    expect(Math.abs(share(x2, y, w) - 1 / 1.2)).toBeLessThan(0.015);
    // Unweighted: 1/2 each.
    expect(Math.abs(share(x1, y) - 0.5)).toBeLessThan(0.015);
  });

  it("an input Y ignores gets ~0 (the noise of the class means is removed), never below 0", () => {
    const n = 5_000;
    const [x, noise] = columns(n, 2, "null-share", { type: "normal", mean: 0, sd: 1 }) as [Float64Array, Float64Array];
    const value = share(x, noise);
    expect(value).toBeGreaterThanOrEqual(0);
    expect(value).toBeLessThan(0.01);
  });
});

describe("weighted Spearman", () => {
  it("with whole-number weights equals Spearman of the data with each member repeated (simple-statistics)", () => {
    const x = Float64Array.from([0.3, 1.2, -0.4, 2.2, 0.9, 0.9, 1.7]);
    const y = Float64Array.from([1.1, 0.2, -0.3, 2.5, 0.8, 1.9, 0.1]);
    const w = Float64Array.from([1, 3, 2, 1, 4, 1, 2]);
    const total = w.reduce((a, b) => a + b, 0);
    const rx = weightedMidRanks(x, sortOrder(x), w, total);
    const ry = weightedMidRanks(y, sortOrder(y), w, total);
    const repeatedX: number[] = [];
    const repeatedY: number[] = [];
    w.forEach((k, m) => {
      for (let r = 0; r < k; r++) {
        repeatedX.push(x[m]!);
        repeatedY.push(y[m]!);
      }
    });
    // Reference: simple-statistics sampleRankCorrelation (mid-ranks for ties) on the repeated data.
    expect(weightedCorrelation(rx, ry, w, total)).toBeCloseTo(sampleRankCorrelation(repeatedX, repeatedY), 12);
    // Unweighted it is Spearman's coefficient itself.
    expect(weightedCorrelation(weightedMidRanks(x, sortOrder(x), null, 7), weightedMidRanks(y, sortOrder(y), null, 7), null, 7)).toBeCloseTo(
      sampleRankCorrelation(Array.from(x), Array.from(y)),
      12,
    );
  });
});
