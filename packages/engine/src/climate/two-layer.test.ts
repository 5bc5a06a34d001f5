import { describe, expect, it } from "vitest";
import { stepYears } from "./test-support/stepping.js";
import { rampResponse, stepResponse, twoLayerModes } from "./two-layer-modes.js";
import type { TwoLayerParameters } from "./two-layer-parameters.js";
import { twoLayerPropagator } from "./two-layer-propagator.js";

// Illustrative CMIP5-mean-like inputs (the multi-model means of Geoffroy et al. 2013a, Part I,
// from memory, not checked against its tables); the check values below are computed from the
// closed-form solution of Geoffroy et al. 2013a with these inputs (analytic = numeric to 6 d.p.).
const CMIP5_LIKE: TwoLayerParameters = { lambda: 1.13, upperHeatCapacity: 7.3, deepHeatCapacity: 106, heatExchange: 0.73, deepEfficacy: 1 };
const TIMES = [1, 5, 10, 20, 50, 100, 150, 300, 1000];

describe("two-layer step response (Geoffroy et al. 2013a closed form)", () => {
  // Computed from the closed form (analytic = numeric to 6 d.p.): step F = 1 W m⁻².
  const upperTable = [0.120941, 0.388321, 0.500631, 0.551592, 0.593213, 0.647756, 0.6921, 0.781303, 0.879238];
  const deepTable = [0.000433, 0.007956, 0.023114, 0.057088, 0.15369, 0.290401, 0.401554, 0.625144, 0.870624];

  it("stepping the propagator 1000 years reproduces T and T0 to 1e-6 K", () => {
    const run = stepYears(twoLayerPropagator(CMIP5_LIKE), () => 1, 1000);
    TIMES.forEach((t, i) => {
      expect(Math.abs(run.upper[t]! - upperTable[i]!)).toBeLessThan(1e-6);
      expect(Math.abs(run.deep[t]! - deepTable[i]!)).toBeLessThan(1e-6);
    });
  });

  it("the closed form reproduces the same table, and agrees with stepping to rounding (1e-12 K)", () => {
    const run = stepYears(twoLayerPropagator(CMIP5_LIKE), () => 1, 1000);
    TIMES.forEach((t, i) => {
      const closed = stepResponse(CMIP5_LIKE, 1, t);
      expect(Math.abs(closed.upper - upperTable[i]!)).toBeLessThan(1e-6);
      expect(Math.abs(closed.deep - deepTable[i]!)).toBeLessThan(1e-6);
      expect(Math.abs(run.upper[t]! - closed.upper)).toBeLessThan(1e-12);
      expect(Math.abs(run.deep[t]! - closed.deep)).toBeLessThan(1e-12);
    });
  });

  it("tends to the equilibrium F/λ (ECS = F2x/λ: 3.0531 K for F2x = 3.45, computed)", () => {
    const run = stepYears(twoLayerPropagator(CMIP5_LIKE), () => 3.45, 10_000);
    expect(run.upper[10_000]).toBeCloseTo(3.0531, 4);
    expect(run.deep[10_000]).toBeCloseTo(3.45 / 1.13, 10);
  });

  it("with deep-ocean efficacy ε = 1.28 gives T(10, 100, 1000) = 0.461599, 0.601675, 0.875069 K", () => {
    // Efficacy case, computed from the closed form; ε = 1.28 is illustrative (the Part II mean of
    // Geoffroy et al. 2013b, from memory).
    const withEfficacy = { ...CMIP5_LIKE, deepEfficacy: 1.28 };
    const run = stepYears(twoLayerPropagator(withEfficacy), () => 1, 1000);
    const expected: Array<[number, number]> = [
      [10, 0.461599],
      [100, 0.601675],
      [1000, 0.875069],
    ];
    for (const [t, value] of expected) {
      expect(Math.abs(run.upper[t]! - value)).toBeLessThan(1e-6);
      expect(Math.abs(stepResponse(withEfficacy, 1, t).upper - value)).toBeLessThan(1e-6);
      expect(Math.abs(stepResponse(withEfficacy, 1, t).deep - run.deep[t]!)).toBeLessThan(1e-12);
    }
  });
});

describe("twoLayerModes (Geoffroy et al. 2013a mode formulas, computed)", () => {
  it("gives b, b*, δ, τ, φ and a for the CMIP5-like inputs", () => {
    const m = twoLayerModes(CMIP5_LIKE);
    // Computed from the closed form: 0.261681, 0.247908, 0.064213; 3.883, 241.59 yr;
    // −0.027475, 2.50655; 0.59453, 0.40547.
    expect(m.b).toBeCloseTo(0.261681, 6);
    expect(m.bStar).toBeCloseTo(0.247908, 6);
    expect(m.delta).toBeCloseTo(0.064213, 6);
    expect(m.tauFast).toBeCloseTo(3.883, 3);
    expect(m.tauSlow).toBeCloseTo(241.59, 2);
    expect(m.phiFast).toBeCloseTo(-0.027475, 6);
    expect(m.phiSlow).toBeCloseTo(2.50655, 5);
    expect(m.aFast).toBeCloseTo(0.59453, 5);
    expect(m.aSlow).toBeCloseTo(0.40547, 5);
    expect(m.aFast + m.aSlow).toBeCloseTo(1, 14);
  });

  it("gives the ε = 1.28 and the λ = 1.31 (AR6-consistent) variants", () => {
    // Computed from the closed form: ε = 1.28 → τ_f 3.497, τ_s 268.24, a_f 0.53527, a_s 0.46473,
    // φ_f −0.024678, φ_s 2.18021; λ = 1.31 → τ_f 3.547, τ_s 228.15, a_f 0.6307.
    const efficacy = twoLayerModes({ ...CMIP5_LIKE, deepEfficacy: 1.28 });
    expect(efficacy.tauFast).toBeCloseTo(3.497, 3);
    expect(efficacy.tauSlow).toBeCloseTo(268.24, 2);
    expect(efficacy.aFast).toBeCloseTo(0.53527, 5);
    expect(efficacy.aSlow).toBeCloseTo(0.46473, 5);
    expect(efficacy.phiFast).toBeCloseTo(-0.024678, 6);
    expect(efficacy.phiSlow).toBeCloseTo(2.18021, 5);
    const ar6 = twoLayerModes({ ...CMIP5_LIKE, lambda: 1.31 });
    expect(ar6.tauFast).toBeCloseTo(3.547, 3);
    expect(ar6.tauSlow).toBeCloseTo(228.15, 2);
    expect(ar6.aFast).toBeCloseTo(0.6307, 4);
  });
});

describe("linear forcing: TCR of a 1 %/yr CO2 increase (Geoffroy et al. 2013a linear-forcing solution)", () => {
  // F(t) = F2x·t·ln 1.01/ln 2 is linear in t; TCR := T(70) (IPCC AR6 WGI Ch. 7, Section 7.5: "at year 70").
  const cases: Array<[number, number, number, number]> = [
    // F2x, TCR = T(70), T(69.66), ECS — computed from the closed form.
    [3.45, 1.8868, 1.8765, 3.0531],
    [3.71, 2.029, 2.0179, 3.2832],
    [3.93, 2.1493, 2.1375, 3.4779],
  ];
  it.each(cases)("F2x = %f: stepping with the ramp term gives TCR = %f K", (f2x, tcr, atDoubling, ecs) => {
    const slope = (f2x * Math.log(1.01)) / Math.LN2;
    const run = stepYears(twoLayerPropagator(CMIP5_LIKE), (year) => slope * year, 70);
    expect(Math.abs(run.upper[70]! - tcr)).toBeLessThan(5e-5);
    const closed = rampResponse(CMIP5_LIKE, slope, 70);
    expect(Math.abs(run.upper[70]! - closed.upper)).toBeLessThan(1e-12);
    expect(Math.abs(run.deep[70]! - closed.deep)).toBeLessThan(1e-12);
    expect(Math.abs(rampResponse(CMIP5_LIKE, slope, Math.log(2) / Math.log(1.01)).upper - atDoubling)).toBeLessThan(5e-5);
    expect(f2x / CMIP5_LIKE.lambda).toBeCloseTo(ecs, 4);
  });

  it("gives TCR(70) = 1.960 K for the AR6-consistent λ = 1.31 with F2x = 3.93", () => {
    const slope = (3.93 * Math.log(1.01)) / Math.LN2;
    const run = stepYears(twoLayerPropagator({ ...CMIP5_LIKE, lambda: 1.31 }), (year) => slope * year, 70);
    expect(run.upper[70]).toBeCloseTo(1.96, 3);
  });

  it("without the ramp term (forcing held at the start-of-year value) lags the exact answer", () => {
    // Shows the r term matters: a piecewise-constant forcing trails the ramp by about half a year.
    const slope = (3.71 * Math.log(1.01)) / Math.LN2;
    const p = twoLayerPropagator(CMIP5_LIKE);
    const constantOnly = stepYears({ ...p, r1: 0, r2: 0 }, (year) => slope * year, 70);
    expect(2.029 - constantOnly.upper[70]!).toBeGreaterThan(0.005);
  });
});

describe("one-box limit (closed form of C dT/dt = F − λT)", () => {
  // One-box model, standard closed form, values computed: C = 8, λ = 1.13 (τ = 7.0796 yr); the two-layer model
  // tends to the one-box model as C0 → ∞ with γ → 0. Here γ = 1e-9, C0 = 1e9: the coupling
  // changes T by less than γ·t/λ ≈ 5e-8 K over 50 years, so compare to 1e-6 K.
  const oneBox: TwoLayerParameters = { lambda: 1.13, upperHeatCapacity: 8, deepHeatCapacity: 1e9, heatExchange: 1e-9, deepEfficacy: 1 };
  const table: Array<[number, number, number]> = [
    [1, 0.116573, 0.002983],
    [5, 0.448238, 0.062571],
    [10, 0.669439, 0.205508],
    [50, 0.884198, 1.899399],
  ];
  it("matches the one-box step and ramp (κ = 0.05 W m⁻² yr⁻¹) table", () => {
    const p = twoLayerPropagator(oneBox);
    const step = stepYears(p, () => 1, 50);
    const ramp = stepYears(p, (year) => 0.05 * year, 50);
    for (const [t, stepValue, rampValue] of table) {
      expect(Math.abs(step.upper[t]! - stepValue)).toBeLessThan(1e-6);
      expect(Math.abs(ramp.upper[t]! - rampValue)).toBeLessThan(1e-6);
      // One-box closed forms themselves (standard): (F/λ)(1 − e^(−t/τ)), (κ/λ)[t − τ(1 − e^(−t/τ))].
      const tau = 8 / 1.13;
      expect(Math.abs((1 / 1.13) * -Math.expm1(-t / tau) - stepValue)).toBeLessThan(1e-6);
      expect(Math.abs((0.05 / 1.13) * (t + tau * Math.expm1(-t / tau)) - rampValue)).toBeLessThan(1e-6);
    }
    expect(step.deep[50]!).toBeLessThan(1e-15);
  });
});

describe("twoLayerPropagator against an independent fine-step integration", () => {
  /** Classical fourth-order Runge–Kutta over one year, 20,000 sub-steps, forcing F + ΔF·s. */
  function rungeKuttaYear(p: TwoLayerParameters, start: [number, number], forcing: number, rise: number, steps = 20_000): [number, number] {
    const { lambda, upperHeatCapacity: c, deepHeatCapacity: c0, heatExchange: g, deepEfficacy: e } = p;
    const rate = (s: number, t: number, t0: number): [number, number] => [
      (forcing + rise * s - lambda * t - e * g * (t - t0)) / c,
      (g * (t - t0)) / c0,
    ];
    const h = 1 / steps;
    let [t, t0] = start;
    for (let i = 0; i < steps; i++) {
      const s = i * h;
      const k1 = rate(s, t, t0);
      const k2 = rate(s + h / 2, t + (h / 2) * k1[0], t0 + (h / 2) * k1[1]);
      const k3 = rate(s + h / 2, t + (h / 2) * k2[0], t0 + (h / 2) * k2[1]);
      const k4 = rate(s + h, t + h * k3[0], t0 + h * k3[1]);
      t += (h / 6) * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0]);
      t0 += (h / 6) * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1]);
    }
    return [t, t0];
  }

  const cases: TwoLayerParameters[] = [
    CMIP5_LIKE,
    { lambda: 0.6, upperHeatCapacity: 3, deepHeatCapacity: 40, heatExchange: 1.2, deepEfficacy: 1.5 },
    // Near-coincident eigenvalues (a11 ≈ a22, weak coupling): exercises the Van Loan path.
    { lambda: 1.13, upperHeatCapacity: 8, deepHeatCapacity: 7.0796e-7, heatExchange: 1e-7, deepEfficacy: 1 },
  ];
  it.each(cases)("matches RK4 for a state, a constant forcing and a ramp: %o", (p) => {
    const propagator = twoLayerPropagator(p);
    const start: [number, number] = [0.8, 0.3];
    const [t, t0] = rungeKuttaYear(p, start, 2.5, 0.7);
    const stepped = [
      propagator.a11 * start[0] + propagator.a12 * start[1] + propagator.b1 * 2.5 + propagator.r1 * 0.7,
      propagator.a21 * start[0] + propagator.a22 * start[1] + propagator.b2 * 2.5 + propagator.r2 * 0.7,
    ];
    expect(Math.abs(stepped[0]! - t)).toBeLessThan(1e-11);
    expect(Math.abs(stepped[1]! - t0)).toBeLessThan(1e-11);
  });

  it.each(cases)("gives the year's mean state (Simpson's rule over the RK4 path) for a constant forcing: %o", (p) => {
    // Mean over the year of T and T0 from the states at 200 equal sub-intervals, each stepped
    // by RK4 (a sub-interval of 1/200 yr is the same system with capacities × 200), combined
    // by composite Simpson's rule (error O(h⁴), ~1e-12 here).
    const propagator = twoLayerPropagator(p);
    const start: [number, number] = [0.8, 0.3];
    const pieces = 200;
    const sub = { ...p, upperHeatCapacity: p.upperHeatCapacity * pieces, deepHeatCapacity: p.deepHeatCapacity * pieces };
    let state = start;
    let sums: [number, number] = [start[0], start[1]];
    for (let i = 1; i <= pieces; i++) {
      state = rungeKuttaYear(sub, state, 2.5, 0, 100);
      const w = i === pieces ? 1 : i % 2 === 1 ? 4 : 2;
      sums = [sums[0] + w * state[0], sums[1] + w * state[1]];
    }
    const mean = [sums[0] / (3 * pieces), sums[1] / (3 * pieces)];
    expect(Math.abs(propagator.m11 * start[0] + propagator.m12 * start[1] + propagator.r1 * 2.5 - mean[0]!)).toBeLessThan(1e-10);
    expect(Math.abs(propagator.m21 * start[0] + propagator.m22 * start[1] + propagator.r2 * 2.5 - mean[1]!)).toBeLessThan(1e-10);
  });
});

describe("parameter checks", () => {
  it("names the parameter that is not positive or not finite", () => {
    expect(() => twoLayerPropagator({ ...CMIP5_LIKE, heatExchange: 0 })).toThrow(new RangeError("heatExchange must be > 0"));
    expect(() => twoLayerPropagator({ ...CMIP5_LIKE, lambda: -1.13 })).toThrow("lambda must be > 0");
    expect(() => twoLayerPropagator({ ...CMIP5_LIKE, deepHeatCapacity: Infinity })).toThrow("deepHeatCapacity must be a finite number");
    expect(() => twoLayerModes({ ...CMIP5_LIKE, upperHeatCapacity: Number.NaN })).toThrow("upperHeatCapacity must be a finite number");
    expect(() => twoLayerModes({ ...CMIP5_LIKE, deepEfficacy: 0 })).toThrow("deepEfficacy must be > 0");
    expect(() => stepResponse(CMIP5_LIKE, 1, -1)).toThrow("t must be a finite number ≥ 0");
  });
});

describe("extreme but valid parameters", () => {
  it("give non-finite terms at once (never an endless scaling loop) when the system matrix overflows", () => {
    // λ/C = 4e290 / 1e-25 overflows to Infinity: the matrix has no exponential to compute.
    const p = twoLayerPropagator({ ...CMIP5_LIKE, lambda: 4e290, upperHeatCapacity: 1e-25 });
    expect(Number.isFinite(p.a11) && Number.isFinite(p.b1)).toBe(false);
  });
});
