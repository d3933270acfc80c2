/**
 * Cholesky factor L (lower triangular, A = L L^T) of a symmetric positive semi-definite matrix,
 * column by column (Golub & Van Loan, Matrix Computations, 4th ed., 2013, Alg. 4.2.1, the gaxpy
 * Cholesky), applied to the matrix scaled to unit diagonal (D^-1/2 A D^-1/2, so that a covariance
 * of coefficients of very different sizes loses no column to the pivot test) and scaled back.
 * Rounding can leave a pivot of a singular covariance a little below zero: a scaled pivot at or
 * below `tolerance` gives a zero column instead of a failure; a clearly negative one is refused.
 */
import { InputError } from "../errors.js";

/**
 * @param matrix symmetric, by rows (only the lower triangle and the diagonal are read)
 * @param tolerance pivot of the unit-diagonal matrix below which a column is taken as zero.
 *   Default 1e-12.
 * @returns L by rows
 */
export function choleskySemidefinite(
  matrix: readonly (readonly number[])[],
  tolerance = 1e-12,
): number[][] {
  const n = matrix.length;
  const d = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const v = matrix[i][i];
    if (!(v >= 0 && v < Infinity)) {
      throw new InputError({
        input: `matrix[${i}][${i}]`,
        unit: "-",
        validRange: "a finite diagonal element >= 0 (a positive semi-definite matrix)",
        received: v,
      });
    }
    d[i] = Math.sqrt(v);
  }
  const L = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let j = 0; j < n; j++) {
    if (d[j] === 0) continue;
    let pivot = 1;
    for (let k = 0; k < j; k++) pivot -= L[j][k] * L[j][k];
    if (pivot <= tolerance) {
      if (!(pivot >= -1e3 * tolerance)) {
        throw new InputError({
          input: `matrix (pivot ${j})`,
          unit: "-",
          validRange: "a symmetric positive semi-definite matrix",
          received: pivot,
        });
      }
      continue; // a zero column
    }
    const root = Math.sqrt(pivot);
    L[j][j] = root;
    for (let i = j + 1; i < n; i++) {
      if (d[i] === 0) continue;
      let s = matrix[i][j] / (d[i] * d[j]);
      for (let k = 0; k < j; k++) s -= L[i][k] * L[j][k];
      L[i][j] = s / root;
    }
  }
  for (let i = 0; i < n; i++) for (let j = 0; j <= i; j++) L[i][j] *= d[i];
  return L;
}
