/**
 * First-order variance-based sensitivity index (the Sobol main effect)
 * S = Var(E[Y | X]) / Var(Y), estimated from the sample itself ("given data"): no extra
 * model runs, so it can be read off any ensemble, weighted or not.
 *
 * Method: partition the members into M classes of equal weight along the input's order
 * (members sorted by X; Plischke, Borgonovo & Smith 2013, "Global sensitivity measures from
 * given data", European Journal of Operational Research 226(3), 536–550 — from memory), take
 * the (weighted) mean of Y in each class as E[Y | X in class], and their weighted variance
 * as the estimate of Var(E[Y | X]). That between-class variance also holds the noise of the
 * class means (one-way analysis of variance: E[between] = Var(E[Y|X]) + Σ_c W_c·v_c/n_c with
 * v_c the within-class variance and n_c the class's effective size), which is subtracted so
 * an input Y does not depend on gets ≈ 0 rather than ≈ M/n. The result is clipped to [0, 1].
 * M = ⌊√n_eff⌋ (at least 2): classes narrow enough that E[Y | X] varies little within one,
 * each with enough members for its mean.
 * Weights (importance weights of a constraint) make every mean and variance weighted and
 * the classes of equal weight; n_eff is then Kish's (Σw)²/Σw². Members of zero weight count
 * for nothing. Cost O(n) given the order.
 *
 * Example: Y = 2·X1 + X2 with X1, X2 independent standard normal gives S1 ≈ 4/5, S2 ≈ 1/5.
 */
export function firstOrderIndex(
  order: ArrayLike<number>,
  y: ArrayLike<number>,
  weights: ArrayLike<number> | null,
  totalWeight: number,
  effectiveMembers: number,
): number {
  const n = order.length;
  if (n < 3) return 0;
  const classes = Math.max(2, Math.floor(Math.sqrt(effectiveMembers)));
  // Y centred on its (weighted) mean first, so the class sums of squares do not cancel.
  let centre = 0;
  for (let k = 0; k < n; k++) centre += (weights ? weights[k]! : 1) * y[k]!;
  centre /= totalWeight;
  // Per class: Σw, Σw², Σw·y, Σw·y² (y centred).
  const sw = new Float64Array(classes);
  const sww = new Float64Array(classes);
  const swy = new Float64Array(classes);
  const swyy = new Float64Array(classes);
  let before = 0;
  for (let k = 0; k < n; k++) {
    const m = order[k]!;
    const w = weights ? weights[m]! : 1;
    if (w === 0) continue;
    // The class of the member's middle of weight: classes of equal weight mass.
    const c = Math.min(classes - 1, Math.floor((classes * (before + w / 2)) / totalWeight));
    before += w;
    const v = y[m]! - centre;
    sw[c]! += w;
    sww[c]! += w * w;
    swy[c]! += w * v;
    swyy[c]! += w * v * v;
  }
  let total = 0;
  let mean = 0;
  for (let c = 0; c < classes; c++) {
    total += sw[c]!;
    mean += swy[c]!;
  }
  if (!(total > 0)) return 0;
  mean /= total;
  let between = 0;
  let within = 0;
  let noise = 0;
  for (let c = 0; c < classes; c++) {
    const w = sw[c]!;
    if (!(w > 0)) continue;
    const classMean = swy[c]! / w;
    const classVariance = Math.max(0, swyy[c]! / w - classMean * classMean);
    const share = w / total;
    between += share * (classMean - mean) ** 2;
    within += share * classVariance;
    // Variance of a weighted class mean: the unbiased within-class variance v_c·n_c/(n_c − 1)
    // over n_c = (Σw)²/Σw²; a class of one member carries no estimate of it.
    const effective = (w * w) / sww[c]!;
    if (effective > 1) noise += (share * classVariance) / (effective - 1);
  }
  const variance = between + within;
  if (!(variance > 0)) return 0;
  return Math.min(1, Math.max(0, (between - noise) / variance));
}
