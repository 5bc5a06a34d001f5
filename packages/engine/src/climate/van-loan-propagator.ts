/**
 * One-year propagator terms (a11, a12, a21, a22, b1, b2, r1, r2, m11, m12, m21, m22) written
 * into out[0 … 11],
 * for the case twoLayerPropagatorInto cannot take: eigenvalues of A so close that the
 * divided differences of Sylvester's formula would lose digits.
 *
 * Method: Van Loan's block exponential. exp of M = [[A, B, 0, e2], [0, 0, 1, 0], [0, 0, 0, 0],
 * [0, 0, 0, 0]] (5×5) with B = (1/C, 0), e2 = (0, 1) holds e^A, then b = ∫₀¹ e^{A(1−s)}B ds,
 * r = ∫₀¹ e^{A(1−s)}B·s ds and ∫₀¹ e^{As} ds·e2 in its last three columns; ∫₀¹ e^{As} ds·e1
 * is C·b (the mean-state matrix g1(A), two-layer-propagator.ts). Scaling and squaring with an order-18 Taylor polynomial (norm ≤ 1/2 after
 * scaling: error < 1e-22). Cost O(1), a few hundred flops; it allocates, which is fine for a
 * path taken by almost no member.
 * Reference: C. F. Van Loan (1978), IEEE Trans. Automat. Control 23(3), 395–404.
 */
export function vanLoanPropagatorInto(
  a11: number,
  a12: number,
  a21: number,
  a22: number,
  inverseC: number,
  out: Float64Array,
): void {
  const m = [
    [a11, a12, inverseC, 0, 0],
    [a21, a22, 0, 0, 1],
    [0, 0, 0, 1, 0],
    [0, 0, 0, 0, 0],
    [0, 0, 0, 0, 0],
  ];
  const norm = Math.max(...INDEXES.map((j) => m.reduce((sum, row) => sum + Math.abs(row[j]!), 0)));
  // A matrix that overflowed has no exponential to scale: without this the squaring count
  // would be infinite. Non-finite terms make the caller refuse the member.
  if (!Number.isFinite(norm)) {
    out.fill(NaN, 0, 12);
    return;
  }
  const squarings = Math.max(0, Math.ceil(Math.log2(norm / 0.5)));
  const scale = 2 ** -squarings;
  const scaled = m.map((row) => row.map((v) => v * scale));
  let term = identity();
  let result = identity();
  for (let k = 1; k <= 18; k++) {
    term = multiply(term, scaled).map((row) => row.map((v) => v / k));
    result = result.map((row, i) => row.map((v, j) => v + term[i]![j]!));
  }
  for (let s = 0; s < squarings; s++) result = multiply(result, result);
  const at = (i: number, j: number) => result[i]![j]!;
  out[0] = at(0, 0);
  out[1] = at(0, 1);
  out[2] = at(1, 0);
  out[3] = at(1, 1);
  out[4] = at(0, 2);
  out[5] = at(1, 2);
  out[6] = at(0, 3);
  out[7] = at(1, 3);
  const c = 1 / inverseC;
  out[8] = c * at(0, 2);
  out[9] = at(0, 4);
  out[10] = c * at(1, 2);
  out[11] = at(1, 4);
}

const INDEXES = [0, 1, 2, 3, 4];

function identity(): number[][] {
  return INDEXES.map((i) => INDEXES.map((j) => (i === j ? 1 : 0)));
}

function multiply(x: number[][], y: number[][]): number[][] {
  return x.map((row) => INDEXES.map((j) => row.reduce((sum, v, k) => sum + v * y[k]![j]!, 0)));
}
