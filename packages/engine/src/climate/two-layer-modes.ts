import { type TwoLayerParameters, validateTwoLayerParameters } from "./two-layer-parameters.js";

/** Mode decomposition of the two-layer model (Geoffroy et al. 2013a,b). */
export interface TwoLayerModes {
  /** Fast time scale τ_f (years). */
  tauFast: number;
  /** Slow time scale τ_s (years). */
  tauSlow: number;
  /** Fast- and slow-mode amplitudes of the upper-layer step response; aFast + aSlow = 1. */
  aFast: number;
  aSlow: number;
  /** Deep-to-upper ratios of each mode. */
  phiFast: number;
  phiSlow: number;
  b: number;
  bStar: number;
  delta: number;
}

/**
 * Time scales, amplitudes and mode shapes of the two-layer model.
 *
 * Method (Geoffroy et al. 2013a Part I, analytical solution; ε as in Part II, 2013b):
 * b = (λ+εγ)/C + γ/C0, b* = (λ+εγ)/C − γ/C0, δ = b² − 4λγ/(C·C0),
 * τ_f = C·C0/(2λγ)·(b − √δ), τ_s = C·C0/(2λγ)·(b + √δ),
 * φ_f = C/(2εγ)·(b* − √δ), φ_s = C/(2εγ)·(b* + √δ),
 * a_f = φ_s·τ_f·λ/(C(φ_s − φ_f)), a_s = −φ_f·τ_s·λ/(C(φ_s − φ_f)).
 * The differences b − √δ and b* − √δ (or b* + √δ when b* < 0) are evaluated in their
 * rationalised forms, τ_f = 2/(b + √δ) and φ = −2γ/(C0·(b* ± √δ)), which are equal
 * algebraically and keep full precision when γ is small. Cost O(1).
 * Reference: Geoffroy et al. (2013a), J. Climate 26, 1841–1857; (2013b) 1859–1876.
 *
 * Example: C = 7.3, C0 = 106, λ = 1.13, γ = 0.73, ε = 1 → τ_f = 3.883 yr, τ_s = 241.59 yr,
 * a_f = 0.59453 (computed from the closed form with these illustrative inputs).
 */
export function twoLayerModes(p: TwoLayerParameters): TwoLayerModes {
  validateTwoLayerParameters(p);
  const { lambda, upperHeatCapacity: c, deepHeatCapacity: c0, heatExchange: gamma, deepEfficacy: epsilon } = p;
  const b = (lambda + epsilon * gamma) / c + gamma / c0;
  const bStar = (lambda + epsilon * gamma) / c - gamma / c0;
  const delta = b * b - (4 * lambda * gamma) / (c * c0);
  const root = Math.sqrt(delta);
  const tauFast = 2 / (b + root);
  const tauSlow = ((c * c0) / (2 * lambda * gamma)) * (b + root);
  // (b* − √δ)(b* + √δ) = b*² − δ = −4εγ²/(C·C0): use whichever factor does not cancel.
  let phiFast: number;
  let phiSlow: number;
  if (bStar >= 0) {
    phiSlow = (c / (2 * epsilon * gamma)) * (bStar + root);
    phiFast = (-2 * gamma) / (c0 * (bStar + root));
  } else {
    phiFast = (c / (2 * epsilon * gamma)) * (bStar - root);
    phiSlow = (-2 * gamma) / (c0 * (bStar - root));
  }
  const aFast = (phiSlow * tauFast * lambda) / (c * (phiSlow - phiFast));
  const aSlow = (-phiFast * tauSlow * lambda) / (c * (phiSlow - phiFast));
  return { tauFast, tauSlow, aFast, aSlow, phiFast, phiSlow, b, bStar, delta };
}

/**
 * Closed-form response to a step forcing F switched on at t = 0 (from equilibrium at 0):
 * T(t) = (F/λ)[1 − a_f e^(−t/τ_f) − a_s e^(−t/τ_s)],
 * T0(t) = (F/λ)[1 − a_f φ_f e^(−t/τ_f) − a_s φ_s e^(−t/τ_s)].
 * Cost O(1). Reference: Geoffroy et al. (2013a), step-forcing solution. The independent check of
 * twoLayerPropagator.
 *
 * Example: C = 7.3, C0 = 106, λ = 1.13, γ = 0.73, ε = 1, F = 1, t = 10 →
 * { upper: 0.500631, deep: 0.023114 } (computed from the closed form).
 */
export function stepResponse(p: TwoLayerParameters, forcing: number, t: number): { upper: number; deep: number } {
  requireTime(t);
  if (!Number.isFinite(forcing)) throw new RangeError("forcing must be a finite number");
  const m = twoLayerModes(p);
  const fast = Math.exp(-t / m.tauFast);
  const slow = Math.exp(-t / m.tauSlow);
  const equilibrium = forcing / p.lambda;
  return {
    upper: equilibrium * (1 - m.aFast * fast - m.aSlow * slow),
    deep: equilibrium * (1 - m.aFast * m.phiFast * fast - m.aSlow * m.phiSlow * slow),
  };
}

/**
 * Closed-form response to a forcing rising linearly, F(t) = slope·t, from equilibrium at 0
 * (the time integral of the step response):
 * T(t) = (κ/λ)[t − a_f τ_f (1 − e^(−t/τ_f)) − a_s τ_s (1 − e^(−t/τ_s))],
 * T0(t) = (κ/λ)[t − a_f φ_f τ_f (1 − e^(−t/τ_f)) − a_s φ_s τ_s (1 − e^(−t/τ_s))].
 * Cost O(1). Reference: Geoffroy et al. (2013a) linear-forcing solution.
 *
 * Example: 1 %/yr CO2 with F2x = 3.71 (slope 3.71·ln 1.01/ln 2) and the illustrative inputs
 * above (C = 7.3, C0 = 106, λ = 1.13, γ = 0.73) gives T(70) = 2.0290 K, the model's TCR.
 */
export function rampResponse(p: TwoLayerParameters, slope: number, t: number): { upper: number; deep: number } {
  requireTime(t);
  if (!Number.isFinite(slope)) throw new RangeError("slope must be a finite number");
  const m = twoLayerModes(p);
  // τ(1 − e^(−t/τ)) with expm1 so a very long τ keeps its precision (→ t).
  const fastLag = -m.tauFast * Math.expm1(-t / m.tauFast);
  const slowLag = -m.tauSlow * Math.expm1(-t / m.tauSlow);
  const rate = slope / p.lambda;
  return {
    upper: rate * (t - m.aFast * fastLag - m.aSlow * slowLag),
    deep: rate * (t - m.aFast * m.phiFast * fastLag - m.aSlow * m.phiSlow * slowLag),
  };
}

function requireTime(t: number): void {
  if (typeof t !== "number" || !Number.isFinite(t) || t < 0) throw new RangeError("t must be a finite number ≥ 0");
}
