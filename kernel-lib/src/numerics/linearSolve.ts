/**
 * Dense linear solve A x = b by Gaussian elimination with partial (row) pivoting.
 *
 * Source: G. H. Golub & C. F. Van Loan, "Matrix Computations", 4th ed. (2013), algorithm 3.4.1
 * (Gaussian elimination with partial pivoting) followed by back substitution (algorithm 3.1.2).
 * Meant for the small systems of Newton's method (n up to a few dozen); O(n^3).
 */
import { InputError, SolverError } from "../errors.js";

/**
 * Solves A x = b. A is n x n (array of rows), b has length n; neither is modified.
 *
 * A pivot is treated as zero (singular matrix) when |pivot| <= n eps max|A_ij|, a backward-error
 * criterion: such a matrix is singular within rounding of its entries.
 *
 * @example
 * ```ts
 * solveLinear([[2, 1], [1, 3]], [3, 5]); // [0.8, 1.4]
 * ```
 * @throws InputError if the shapes do not match or an entry is NaN or infinite.
 * @throws SolverError if A is singular (names the column where elimination found no pivot).
 */
export function solveLinear(A: readonly (readonly number[])[], b: readonly number[]): number[] {
  const n = b.length;
  if (!(n >= 1) || A.length !== n) {
    throw new InputError({
      input: "A",
      unit: "-",
      validRange: `a square matrix with as many rows as b has entries (${n})`,
      received: `${A.length} rows`,
    });
  }
  const M: number[][] = new Array(n);
  const x = b.slice();
  let scale = 0;
  for (let i = 0; i < n; i++) {
    const row = A[i];
    if (!row || row.length !== n) {
      throw new InputError({
        input: `A[${i}]`,
        unit: "-",
        validRange: `a row of ${n} numbers`,
        received: row ? `${row.length} entries` : row,
      });
    }
    for (let j = 0; j < n; j++) {
      if (!Number.isFinite(row[j])) {
        throw new InputError({
          input: `A[${i}][${j}]`,
          unit: "-",
          validRange: "a finite number",
          received: row[j],
        });
      }
      scale = Math.max(scale, Math.abs(row[j]));
    }
    if (!Number.isFinite(x[i])) {
      throw new InputError({
        input: `b[${i}]`,
        unit: "-",
        validRange: "a finite number",
        received: x[i],
      });
    }
    M[i] = row.slice();
  }
  const threshold = n * Number.EPSILON * scale;
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(M[i][k]) > Math.abs(M[p][k])) p = i;
    if (!(Math.abs(M[p][k]) > threshold)) {
      throw new SolverError(
        "Gaussian elimination",
        `the ${n}x${n} matrix is singular: no pivot larger than ${threshold} in column ${k} ` +
          `(largest remaining |entry| ${Math.abs(M[p][k])}, largest |A_ij| ${scale})`,
      );
    }
    if (p !== k) {
      const tmpRow = M[k];
      M[k] = M[p];
      M[p] = tmpRow;
      const tmp = x[k];
      x[k] = x[p];
      x[p] = tmp;
    }
    const pivotRow = M[k];
    const pivot = pivotRow[k];
    for (let i = k + 1; i < n; i++) {
      const row = M[i];
      const factor = row[k] / pivot;
      if (factor === 0) continue;
      for (let j = k + 1; j < n; j++) row[j] -= factor * pivotRow[j];
      x[i] -= factor * x[k];
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    const row = M[i];
    let sum = x[i];
    for (let j = i + 1; j < n; j++) sum -= row[j] * x[j];
    x[i] = sum / row[i];
  }
  return x;
}
