import { describe, expect, it } from "vitest";
import { cdfFixed, densityFixed, quantileFixed } from "./fixed.js";
import { cdfTriangular, densityTriangular, quantileTriangular } from "./triangular.js";
import { cdfUniform, densityUniform, quantileUniform } from "./uniform.js";

describe("uniform", () => {
  const d = { type: "uniform", min: 2, max: 4 } as const;
  it("has the closed-form quantile, CDF and density of U(2, 4)", () => {
    // Closed form: q(p) = 2 + 2p, F(x) = (x − 2)/2, f = 1/2 [standard].
    expect(quantileUniform(d, 0.25)).toBe(2.5);
    expect(cdfUniform(d, 3.5)).toBe(0.75);
    expect(cdfUniform(d, 1)).toBe(0);
    expect(cdfUniform(d, 5)).toBe(1);
    expect(densityUniform(d, 3)).toBe(0.5);
    expect(densityUniform(d, 4.1)).toBe(0);
  });
});

describe("triangular", () => {
  it("matches the closed form of the symmetric triangle on [0, 2]", () => {
    // F(x) = x²/2 on [0, 1] ⇒ q(1/8) = 1/2, q(1/2) = 1, q(7/8) = 3/2; f(1) = 1 [standard].
    const d = { type: "triangular", min: 0, mode: 1, max: 2 } as const;
    expect(quantileTriangular(d, 0.125)).toBeCloseTo(0.5, 15);
    expect(quantileTriangular(d, 0.5)).toBeCloseTo(1, 15);
    expect(quantileTriangular(d, 0.875)).toBeCloseTo(1.5, 15);
    expect(densityTriangular(d, 1)).toBe(1);
    expect(cdfTriangular(d, 1.5)).toBeCloseTo(0.875, 15);
  });

  it("handles a mode at either end (right triangles)", () => {
    // mode = min: F(x) = 1 − (1 − x)² on [0, 1] ⇒ q(p) = 1 − √(1 − p); f(0) = 2 [standard].
    const left = { type: "triangular", min: 0, mode: 0, max: 1 } as const;
    expect(quantileTriangular(left, 0.75)).toBeCloseTo(0.5, 15);
    expect(densityTriangular(left, 0)).toBe(2);
    expect(cdfTriangular(left, 0.5)).toBeCloseTo(0.75, 15);
    // mode = max: F(x) = x² ⇒ q(p) = √p; f(1) = 2.
    const right = { type: "triangular", min: 0, mode: 1, max: 1 } as const;
    expect(quantileTriangular(right, 0.25)).toBeCloseTo(0.5, 15);
    expect(densityTriangular(right, 1)).toBe(2);
  });

  it("inverts its own CDF for an asymmetric triangle", () => {
    const d = { type: "triangular", min: 1.5, mode: 2.5, max: 6 } as const;
    for (const p of [0.001, 0.1, 0.2857, 0.5, 0.9, 0.999]) expect(cdfTriangular(d, quantileTriangular(d, p))).toBeCloseTo(p, 13);
  });
});

describe("fixed", () => {
  it("returns its value for every p, steps at the value and has no density", () => {
    const d = { type: "fixed", value: 3.93 } as const;
    expect(quantileFixed(d, 0.01)).toBe(3.93);
    expect(quantileFixed(d, 0.99)).toBe(3.93);
    expect(cdfFixed(d, 3.92)).toBe(0);
    expect(cdfFixed(d, 3.93)).toBe(1);
    expect(densityFixed(d, 3.93)).toBe(0);
  });
});
