/**
 * Eigenvalues and eigenvectors of a small real symmetric matrix by the cyclic Jacobi method
 * (G. H. Golub & C. F. Van Loan, "Matrix Computations", 4th ed. (2013), algorithms 8.5.1-8.5.3:
 * symmetric Schur decomposition of each 2 x 2 pivot block, cyclic row sweeps). Accurate to a few
 * units of rounding relative to the matrix norm; meant for n up to a few dozen.
 */
import { InputError, SolverError } from "../errors.js";

/** Eigenpairs, ascending by eigenvalue; `vectors[k]` is the unit eigenvector of `values[k]`. */
export interface SymmetricEigenResult {
  readonly values: number[];
  readonly vectors: number[][];
  /** Sweeps used. */
  readonly sweeps: number;
}

/**
 * Eigen-decomposition of the symmetric matrix A (array of rows; only symmetric input makes sense,
 * the lower triangle is mirrored from the upper one). A is not modified.
 * @throws InputError for a non-square matrix or a non-finite entry; SolverError when the
 *   off-diagonal part does not vanish within `maxSweeps` (default 60).
 */
export function symmetricEigen(
  A: readonly (readonly number[])[],
  maxSweeps = 60,
): SymmetricEigenResult {
  const n = A.length;
  if (!(n >= 1) || A.some((row) => row.length !== n || !row.every(Number.isFinite))) {
    throw new InputError({
      input: "A",
      unit: "-",
      validRange: "a square matrix of finite numbers",
      received: `${n} rows`,
    });
  }
  const a = A.map((row, i) => row.map((v, j) => (j >= i ? v : A[j][i])));
  const V: number[][] = [];
  for (let i = 0; i < n; i++) {
    const row = new Array<number>(n).fill(0);
    row[i] = 1;
    V.push(row);
  }
  let norm = 0;
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) norm += a[i][j] * a[i][j];
  norm = Math.sqrt(norm);
  let sweeps = 0;
  for (; sweeps < maxSweeps; sweeps++) {
    let off = 0;
    for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) off += a[i][j] * a[i][j];
    if (Math.sqrt(off) <= 1e-15 * norm || off === 0) break;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        if (a[p][q] === 0) continue;
        // 2 x 2 symmetric Schur decomposition (Golub & Van Loan alg. 8.5.1)
        const tau = (a[q][q] - a[p][p]) / (2 * a[p][q]);
        const t =
          tau >= 0 ? 1 / (tau + Math.sqrt(1 + tau * tau)) : -1 / (-tau + Math.sqrt(1 + tau * tau));
        const c = 1 / Math.sqrt(1 + t * t);
        const s = t * c;
        for (let k = 0; k < n; k++) {
          const akp = a[k][p];
          const akq = a[k][q];
          a[k][p] = c * akp - s * akq;
          a[k][q] = s * akp + c * akq;
        }
        for (let k = 0; k < n; k++) {
          const apk = a[p][k];
          const aqk = a[q][k];
          a[p][k] = c * apk - s * aqk;
          a[q][k] = s * apk + c * aqk;
        }
        for (let k = 0; k < n; k++) {
          const vkp = V[k][p];
          const vkq = V[k][q];
          V[k][p] = c * vkp - s * vkq;
          V[k][q] = s * vkp + c * vkq;
        }
      }
    }
  }
  if (sweeps === maxSweeps) {
    throw new SolverError(
      "cyclic Jacobi eigenvalue method",
      `off-diagonal part did not vanish in ${maxSweeps} sweeps (n = ${n})`,
    );
  }
  const order = Array.from({ length: n }, (_, i) => i).sort((i, j) => a[i][i] - a[j][j]);
  return {
    values: order.map((i) => a[i][i]),
    vectors: order.map((i) => V.map((row) => row[i])),
    sweeps,
  };
}
