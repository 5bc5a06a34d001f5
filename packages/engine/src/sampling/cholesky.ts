/**
 * Lower-triangular Cholesky factor L of a symmetric positive-definite matrix A = L·Lᵀ.
 *
 * Method: Cholesky–Banachiewicz, row by row; only the lower triangle of A is read. A pivot
 * that is not clearly positive (≤ 1e-12 of its diagonal entry, or NaN) means the matrix is
 * not positive definite, e.g. rank correlations that contradict each other.
 * Cost O(d³/6) for a d×d matrix.
 * Reference: Golub & Van Loan, Matrix Computations (4th ed.), Algorithm 4.2.1.
 *
 * Example: `choleskyFactor([[4, 2], [2, 3]])` → [[2, 0], [1, 1.4142135623730951]].
 */
export function choleskyFactor(matrix: number[][]): number[][] {
  const d = matrix.length;
  if (d === 0) throw new RangeError("matrix must not be empty");
  const lower: number[][] = [];
  for (let i = 0; i < d; i++) {
    const row = matrix[i];
    if (!Array.isArray(row) || row.length !== d) throw new RangeError(`matrix[${i}] must have ${d} entries`);
    const factorRow = new Array<number>(d).fill(0);
    for (let j = 0; j <= i; j++) {
      const entry = row[j]!;
      if (!Number.isFinite(entry)) throw new RangeError(`matrix[${i}][${j}] must be a finite number`);
      let sum = entry;
      const rowJ = lower[j] ?? factorRow;
      for (let k = 0; k < j; k++) sum -= factorRow[k]! * rowJ[k]!;
      if (i === j) {
        if (!(sum > 1e-12 * Math.abs(entry))) throw new RangeError("correlation matrix is not positive definite");
        factorRow[i] = Math.sqrt(sum);
      } else {
        factorRow[j] = sum / rowJ[j]!;
      }
    }
    lower.push(factorRow);
  }
  return lower;
}
