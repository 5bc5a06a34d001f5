import { systemMatrix, type TwoLayerParameters, validateTwoLayerParameters } from "./two-layer-parameters.js";

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
}

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
 * Cost O(1): a few exp/expm1 calls.
 * References: Held et al. (2010), J. Climate 23, 2418–2427; Geoffroy et al. (2013a,b),
 * J. Climate 26, 1841–1857 and 1859–1876; C. F. Van Loan (1978), IEEE Trans. Automat.
 * Control 23(3), 395–404; CHECKS.md §5.2.
 *
 * Example: for C = 7.3, C0 = 106, λ = 1.13, γ = 0.73, ε = 1, one year of F = 1 from rest
 * gives T = b1 = 0.120941 K (CHECKS.md §5.3, t = 1).
 */
export function twoLayerPropagator(p: TwoLayerParameters): TwoLayerPropagator {
  validateTwoLayerParameters(p);
  const A = systemMatrix(p);
  const trace = A.a11 + A.a22;
  const determinant = A.a11 * A.a22 - A.a12 * A.a21;
  const gap = Math.sqrt((A.a11 - A.a22) ** 2 + 4 * A.a12 * A.a21);
  const fast = (trace - gap) / 2;
  const slow = determinant / fast;
  const gapBetween = slow - fast;
  if (!(gapBetween >= 1e-3 * Math.max(1, Math.abs(fast)))) return augmentedPropagator(A, 1 / p.upperHeatCapacity);

  // e^A: β = (e^μs − e^μf)/(μs − μf) = e^μf·expm1(Δ)/Δ.
  const expBeta = (Math.exp(fast) * Math.expm1(gapBetween)) / gapBetween;
  const expAlpha = Math.exp(fast) - fast * expBeta;
  const [g1Alpha, g1Beta] = sylvester(integratedExp, slow, fast);
  const [g2Alpha, g2Beta] = sylvester(doublyIntegratedExp, slow, fast);
  const inverseC = 1 / p.upperHeatCapacity;
  return {
    a11: expAlpha + expBeta * A.a11,
    a12: expBeta * A.a12,
    a21: expBeta * A.a21,
    a22: expAlpha + expBeta * A.a22,
    // g(A)·(1/C, 0) = (α + β·a11, β·a21)/C.
    b1: (g1Alpha + g1Beta * A.a11) * inverseC,
    b2: g1Beta * A.a21 * inverseC,
    r1: (g2Alpha + g2Beta * A.a11) * inverseC,
    r2: g2Beta * A.a21 * inverseC,
  };
}

/** (α, β) with g(A) = α·I + β·A for eigenvalues μ1 ≠ μ2. */
function sylvester(g: (mu: number) => number, mu1: number, mu2: number): [number, number] {
  const beta = (g(mu1) - g(mu2)) / (mu1 - mu2);
  return [g(mu2) - mu2 * beta, beta];
}

/** g1(μ) = ∫₀¹ e^{μs} ds = (e^μ − 1)/μ. */
function integratedExp(mu: number): number {
  return mu === 0 ? 1 : Math.expm1(mu) / mu;
}

/** g2(μ) = ∫₀¹ s·e^{μ(1−s)} ds = (e^μ − 1 − μ)/μ²; Taylor series near 0 (error < 1e-19). */
function doublyIntegratedExp(mu: number): number {
  if (Math.abs(mu) < 1e-3) return 1 / 2 + mu * (1 / 6 + mu * (1 / 24 + mu * (1 / 120 + mu * (1 / 720 + mu / 5040))));
  return (Math.expm1(mu) - mu) / (mu * mu);
}

/**
 * Van Loan's block exponential: exp of M = [[A, B, 0], [0, 0, 1], [0, 0, 0]] holds e^A, then
 * b = ∫₀¹ e^{A(1−s)}B ds and r = ∫₀¹ e^{A(1−s)}B·s ds in its last two columns. Scaling and
 * squaring with an order-18 Taylor polynomial (norm ≤ 1/2 after scaling: error < 1e-22).
 */
function augmentedPropagator(A: { a11: number; a12: number; a21: number; a22: number }, inverseC: number): TwoLayerPropagator {
  const m = [
    [A.a11, A.a12, inverseC, 0],
    [A.a21, A.a22, 0, 0],
    [0, 0, 0, 1],
    [0, 0, 0, 0],
  ];
  const norm = Math.max(...[0, 1, 2, 3].map((j) => m.reduce((sum, row) => sum + Math.abs(row[j]!), 0)));
  const squarings = Math.max(0, Math.ceil(Math.log2(norm / 0.5)));
  const scale = 2 ** -squarings;
  const scaled = m.map((row) => row.map((v) => v * scale));
  let term = identity4();
  let result = identity4();
  for (let k = 1; k <= 18; k++) {
    term = multiply4(term, scaled).map((row) => row.map((v) => v / k));
    result = result.map((row, i) => row.map((v, j) => v + term[i]![j]!));
  }
  for (let s = 0; s < squarings; s++) result = multiply4(result, result);
  const at = (i: number, j: number) => result[i]![j]!;
  return { a11: at(0, 0), a12: at(0, 1), a21: at(1, 0), a22: at(1, 1), b1: at(0, 2), b2: at(1, 2), r1: at(0, 3), r2: at(1, 3) };
}

function identity4(): number[][] {
  return [0, 1, 2, 3].map((i) => [0, 1, 2, 3].map((j) => (i === j ? 1 : 0)));
}

function multiply4(x: number[][], y: number[][]): number[][] {
  return x.map((row) => [0, 1, 2, 3].map((j) => row.reduce((sum, v, k) => sum + v * y[k]![j]!, 0)));
}
