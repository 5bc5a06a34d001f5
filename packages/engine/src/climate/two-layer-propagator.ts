import { type TwoLayerParameters, validateTwoLayerParameters } from "./two-layer-parameters.js";
import { vanLoanPropagatorInto } from "./van-loan-propagator.js";

export type { TwoLayerParameters } from "./two-layer-parameters.js";

/**
 * One-year propagator of the two-layer model: with x = (T, T0) at the start of a year and
 * forcing f(s) = F + ΔF·s over the year (s from 0 to 1),
 *   x(end) = [[a11, a12], [a21, a22]]·x + (b1, b2)·F + (r1, r2)·ΔF,
 * exactly (no time-stepping error).
 */
export interface TwoLayerPropagator {
  a11: number;
  a12: number;
  a21: number;
  a22: number;
  /** Response to forcing held constant over the year: A⁻¹(e^A − I)(1/C, 0). */
  b1: number;
  b2: number;
  /** Extra response to forcing rising linearly from 0 to 1 within the year: A⁻²(e^A − I − A)(1/C, 0). */
  r1: number;
  r2: number;
  /**
   * The year's MEAN state: x̄ = [[m11, m12], [m21, m22]]·x + (r1, r2)·F for forcing F held over
   * the year, with [[m11 m12] [m21 m22]] = ∫₀¹ e^{As} ds = A⁻¹(e^A − I). (The mean of
   * x(s) = e^{As}x + A⁻¹(e^{As} − I)B·F over s in [0, 1] is g1(A)x + A⁻¹(g1(A) − I)B·F, and
   * A⁻¹(g1(A) − I) = A⁻²(e^A − I − A): the r terms.) Observations and assessments report a
   * year's warming as its annual mean.
   */
  m11: number;
  m12: number;
  m21: number;
  m22: number;
}

/** How many numbers twoLayerPropagatorInto writes: a11, a12, a21, a22, b1, b2, r1, r2, m11, m12, m21, m22 in that order. */
export const PROPAGATOR_TERMS = 12;

/**
 * Exact one-year propagator of C dT/dt = F − λT − εγ(T − T0), C0 dT0/dt = γ(T − T0).
 *
 * Method: A = [[−(λ+εγ)/C, εγ/C], [γ/C0, −γ/C0]] has two real negative eigenvalues μs, μf
 * (det A = λγ/(C·C0) > 0, discriminant > 0). For any analytic g, g(A) = α·I + β·A with
 * β = (g(μs) − g(μf))/(μs − μf), α = g(μf) − μf·β (Sylvester). It is applied to
 * g = exp (propagator e^A, with β = e^μf·expm1(Δ)/Δ so no cancellation), g1(μ) = (e^μ − 1)/μ
 * (b = g1(A)·B) and g2(μ) = (e^μ − 1 − μ)/μ² (r = g2(A)·B), B = (1/C, 0); g2 uses its
 * Taylor series for |μ| < 1e-3. μs is computed as det/μf to avoid cancellation. When the
 * eigenvalues nearly coincide (gap < 1e-3 yr⁻¹, where the divided differences would lose
 * digits) the augmented 4×4 matrix exponential of Van Loan (1978) by scaling and squaring is
 * used instead. Stepping a constant forcing reproduces the analytic step response to
 * rounding; a linear ramp is stepped exactly with the r term.
 * Also g1(A) = ∫₀¹ e^{As} ds, which gives the year's MEAN state (TwoLayerPropagator.m11 …).
 * Cost O(1): one exp and three expm1 calls.
 * References: Held et al. (2010), J. Climate 23, 2418–2427; Geoffroy et al. (2013a,b),
 * J. Climate 26, 1841–1857 and 1859–1876; C. F. Van Loan (1978), IEEE Trans. Automat.
 * Control 23(3), 395–404.
 *
 * Example: for C = 7.3, C0 = 106, λ = 1.13, γ = 0.73, ε = 1, one year of F = 1 from rest
 * gives T = b1 = 0.120941 K (the Geoffroy et al. 2013a step solution at t = 1, computed).
 */
export function twoLayerPropagator(p: TwoLayerParameters): TwoLayerPropagator {
  validateTwoLayerParameters(p);
  const terms = new Float64Array(PROPAGATOR_TERMS);
  twoLayerPropagatorInto(p.lambda, p.upperHeatCapacity, p.deepHeatCapacity, p.heatExchange, p.deepEfficacy, terms);
  const [a11, a12, a21, a22, b1, b2, r1, r2, m11, m12, m21, m22] = terms;
  return { a11: a11!, a12: a12!, a21: a21!, a22: a22!, b1: b1!, b2: b2!, r1: r1!, r2: r2!, m11: m11!, m12: m12!, m21: m21!, m22: m22! };
}

/**
 * twoLayerPropagator's terms written into out[0 … 7] (order of PROPAGATOR_TERMS), without
 * checking the parameters (each must be a finite number > 0) and without allocating: the
 * engine builds one propagator per member, so each exponential is taken once and nothing is
 * left for the garbage collector. Same numbers as twoLayerPropagator, bit for bit (it is the
 * same code).
 */
export function twoLayerPropagatorInto(
  lambda: number,
  upperHeatCapacity: number,
  deepHeatCapacity: number,
  heatExchange: number,
  deepEfficacy: number,
  out: Float64Array,
): void {
  // The system matrix A of d(T, T0)/dt = A·(T, T0) + (F/C, 0).
  const a11 = -(lambda + deepEfficacy * heatExchange) / upperHeatCapacity;
  const a12 = (deepEfficacy * heatExchange) / upperHeatCapacity;
  const a21 = heatExchange / deepHeatCapacity;
  const a22 = -heatExchange / deepHeatCapacity;
  const trace = a11 + a22;
  const determinant = a11 * a22 - a12 * a21;
  const gap = Math.sqrt((a11 - a22) ** 2 + 4 * a12 * a21);
  const fast = (trace - gap) / 2;
  const slow = determinant / fast;
  const gapBetween = slow - fast;
  if (!(gapBetween >= 1e-3 * Math.max(1, Math.abs(fast)))) {
    vanLoanPropagatorInto(a11, a12, a21, a22, 1 / upperHeatCapacity, out);
    return;
  }

  // e^A: β = (e^μs − e^μf)/(μs − μf) = e^μf·expm1(Δ)/Δ.
  const expFast = Math.exp(fast);
  const expBeta = (expFast * Math.expm1(gapBetween)) / gapBetween;
  const expAlpha = expFast - fast * expBeta;
  // g1 and g2 at both eigenvalues share one expm1 per eigenvalue; Sylvester's (α, β) with
  // μs − μf = gapBetween.
  const expm1Slow = Math.expm1(slow);
  const expm1Fast = Math.expm1(fast);
  const g1Fast = integratedExp(fast, expm1Fast);
  const g1Beta = (integratedExp(slow, expm1Slow) - g1Fast) / gapBetween;
  const g1Alpha = g1Fast - fast * g1Beta;
  const g2Fast = doublyIntegratedExp(fast, expm1Fast);
  const g2Beta = (doublyIntegratedExp(slow, expm1Slow) - g2Fast) / gapBetween;
  const g2Alpha = g2Fast - fast * g2Beta;
  const inverseC = 1 / upperHeatCapacity;
  out[0] = expAlpha + expBeta * a11;
  out[1] = expBeta * a12;
  out[2] = expBeta * a21;
  out[3] = expAlpha + expBeta * a22;
  // g(A)·(1/C, 0) = (α + β·a11, β·a21)/C.
  out[4] = (g1Alpha + g1Beta * a11) * inverseC;
  out[5] = g1Beta * a21 * inverseC;
  out[6] = (g2Alpha + g2Beta * a11) * inverseC;
  out[7] = g2Beta * a21 * inverseC;
  // g1(A) itself: the year's mean state from the state at its start.
  out[8] = g1Alpha + g1Beta * a11;
  out[9] = g1Beta * a12;
  out[10] = g1Beta * a21;
  out[11] = g1Alpha + g1Beta * a22;
}

/** g1(μ) = ∫₀¹ e^{μs} ds = (e^μ − 1)/μ, given expm1(μ). */
function integratedExp(mu: number, expm1Mu: number): number {
  return mu === 0 ? 1 : expm1Mu / mu;
}

/** g2(μ) = ∫₀¹ s·e^{μ(1−s)} ds = (e^μ − 1 − μ)/μ², given expm1(μ); Taylor series near 0 (error < 1e-19). */
function doublyIntegratedExp(mu: number, expm1Mu: number): number {
  if (Math.abs(mu) < 1e-3) return 1 / 2 + mu * (1 / 6 + mu * (1 / 24 + mu * (1 / 120 + mu * (1 / 720 + mu / 5040))));
  return (expm1Mu - mu) / (mu * mu);
}
