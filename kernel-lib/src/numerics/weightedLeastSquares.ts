/**
 * Weighted linear least squares by Householder QR of the weighted, column-equilibrated design
 * matrix (Golub & Van Loan, Matrix Computations, 4th ed., 2013, §5.2.1 Householder QR and §5.3.3
 * the QR solution of the full-rank LS problem). The coefficient covariance is (R^T R)^-1 in the
 * weighted metric; its condition number comes from the singular values of R, computed by one-sided
 * Jacobi rotations (Hestenes 1958; Golub & Van Loan §8.6.3; Demmel & Veselic, SIAM J. Matrix Anal.
 * Appl. 13 (1992) 1204, for its relative accuracy).
 */
import { InputError, SolverError } from "../errors.js";
import { extent } from "./extent.js";
import { singularValues } from "./singularValues.js";

export interface WeightedLeastSquaresOptions {
  /**
   * Relative threshold under which a column is treated as dependent (smallest singular value of
   * the equilibrated design divided by the largest). Default 1e-13 (a few hundred machine epsilons
   * times the problem size would do; this leaves room for badly scaled virial columns).
   */
  rankTolerance?: number;
}

export interface WeightedLeastSquaresResult {
  /** Fitted coefficients, one per design column. */
  coefficients: number[];
  /** Covariance of the coefficients assuming the given standard deviations are right (not scaled by chi2). */
  covariance: number[][];
  /** y - A c, in the units of y. */
  residuals: number[];
  /** Residuals divided by their standard deviations. */
  normalizedResiduals: number[];
  /** Sum of squared normalized residuals. */
  chiSquare: number;
  /** Observations minus coefficients. */
  degreesOfFreedom: number;
  /** 2-norm condition number of the column-equilibrated weighted design matrix. */
  conditionNumber: number;
}

/**
 * Minimises sum ((y_i - sum_j A_ij c_j) / sigma_i)^2.
 * @param design m rows of n basis-function values (m >= n).
 * @param y m observations.
 * @param sigma m standard deviations (> 0), in the units of y.
 */
export function weightedLeastSquares(
  design: readonly (readonly number[])[],
  y: readonly number[],
  sigma: readonly number[],
  options: WeightedLeastSquaresOptions = {},
): WeightedLeastSquaresResult {
  const m = design.length;
  const n = design[0]?.length ?? 0;
  const columns = Array.from({ length: n }, () => new Float64Array(m));
  for (let i = 0; i < m; i++) {
    const row = design[i];
    if (row.length !== n)
      throw new InputError({
        input: `design[${i}]`,
        unit: "-",
        validRange: `${n} columns`,
        received: row.length,
      });
    for (let j = 0; j < n; j++) columns[j][i] = row[j];
  }
  return weightedLeastSquaresColumns(columns, y, sigma, options);
}

/**
 * {@link weightedLeastSquares} with the design given by columns (n columns of m values each), for
 * fits that choose among subsets of one large set of basis columns without copying rows.
 */
export function weightedLeastSquaresColumns(
  columns: readonly ArrayLike<number>[],
  y: ArrayLike<number>,
  sigma: ArrayLike<number>,
  options: WeightedLeastSquaresOptions = {},
): WeightedLeastSquaresResult {
  const rankTolerance = options.rankTolerance ?? 1e-13;
  const n = columns.length;
  const m = columns[0]?.length ?? 0;
  if (!(n >= 1 && m >= n)) {
    throw new InputError({
      input: "design",
      unit: "-",
      validRange: "at least as many observations as coefficients (and >= 1 coefficient)",
      received: `${m} observations, ${n} coefficients`,
    });
  }
  if (y.length !== m || sigma.length !== m || columns.some((c) => c.length !== m)) {
    throw new InputError({
      input: "y, sigma, design columns",
      unit: "-",
      validRange: `length ${m}`,
      received: `${y.length}, ${sigma.length}, ${columns.map((c) => c.length).join(" ")}`,
    });
  }
  const { a, b, colScale } = weightAndFactor(columns, y, sigma, m, n);
  const R: number[][] = [];
  for (let i = 0; i < n; i++)
    R.push(Array.from({ length: n }, (_, j) => (j < i ? 0 : a[j * m + i])));
  const sv = singularValues(R);
  const { min: smin, max: smax } = extent(sv);
  if (!(smin > rankTolerance * smax)) {
    throw new SolverError(
      "weighted least squares (Householder QR)",
      `the design is rank-deficient or nearly so: singular-value ratio ${(smin / smax).toExponential(2)} <= ${rankTolerance}; ` +
        "too few distinct points for the number of coefficients, or columns that repeat each other; lower the order",
    );
  }
  // Back substitution R z = Q^T b, then c_j = z_j / colScale_j.
  const z = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i];
    for (let j = i + 1; j < n; j++) s -= R[i][j] * z[j];
    z[i] = s / R[i][i];
  }
  const coefficients = z.map((zi, j) => zi / colScale[j]);
  // Rinv (upper triangular), covariance = D^-1 Rinv Rinv^T D^-1.
  const Rinv: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let j = 0; j < n; j++) {
    Rinv[j][j] = 1 / R[j][j];
    for (let i = j - 1; i >= 0; i--) {
      let s = 0;
      for (let k = i + 1; k <= j; k++) s += R[i][k] * Rinv[k][j];
      Rinv[i][j] = -s / R[i][i];
    }
  }
  const covariance: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let s = 0;
      for (let k = Math.max(i, j); k < n; k++) s += Rinv[i][k] * Rinv[j][k];
      covariance[i][j] = s / (colScale[i] * colScale[j]);
    }
  }
  const residuals: number[] = [];
  const normalizedResiduals: number[] = [];
  let chiSquare = 0;
  for (let i = 0; i < m; i++) {
    let fit = 0;
    for (let j = 0; j < n; j++) fit += columns[j][i] * coefficients[j];
    const r = y[i] - fit;
    residuals.push(r);
    const nr = r / sigma[i];
    normalizedResiduals.push(nr);
    chiSquare += nr * nr;
  }
  return {
    coefficients,
    covariance,
    residuals,
    normalizedResiduals,
    chiSquare,
    degreesOfFreedom: m - n,
    conditionNumber: smax / smin,
  };
}

/**
 * The weighted design (row i divided by sigma_i) by columns, scaled to unit column norms, reduced
 * in place by Householder QR (Golub & Van Loan Alg. 5.2.1) with the same reflections applied to
 * the weighted observations: on return the upper triangle of `a` holds R (of the scaled design),
 * b[0..n) holds Q^T b and b[n..m) the residual's components.
 */
function weightAndFactor(
  columns: readonly ArrayLike<number>[],
  y: ArrayLike<number>,
  sigma: ArrayLike<number>,
  m: number,
  n: number,
): { a: Float64Array; b: Float64Array; colScale: number[] } {
  // Weighted design (row i divided by sigma_i), stored by columns, then columns scaled to unit
  // 2-norm.
  const a = new Float64Array(m * n); // a[j * m + i]
  const b = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const s = sigma[i];
    if (!(s > 0 && s < Infinity)) {
      throw new InputError({
        input: `sigma[${i}]`,
        unit: "-",
        validRange: "a finite number > 0",
        received: s,
      });
    }
    for (let j = 0; j < n; j++) a[j * m + i] = columns[j][i] / s;
    b[i] = y[i] / s;
  }
  const colScale: number[] = [];
  for (let j = 0; j < n; j++) {
    const norm = norm2(a, j * m, (j + 1) * m);
    if (!(norm > 0 && norm < Infinity)) {
      throw new SolverError("weighted least squares", `design column ${j} is zero or not finite`);
    }
    colScale.push(norm);
    for (let i = 0; i < m; i++) a[j * m + i] /= norm;
  }
  const v = new Float64Array(m);
  for (let k = 0; k < n; k++) {
    const col = k * m;
    let alpha = norm2(a, col + k, col + m);
    if (alpha === 0) continue;
    if (a[col + k] > 0) alpha = -alpha;
    for (let i = k; i < m; i++) v[i] = a[col + i];
    v[k] -= alpha;
    let vnorm2 = 0;
    for (let i = k; i < m; i++) vnorm2 += v[i] * v[i];
    if (vnorm2 === 0) continue;
    for (let j = k; j < n; j++) {
      const cj = j * m;
      let dot = 0;
      for (let i = k; i < m; i++) dot += v[i] * a[cj + i];
      const f = (2 * dot) / vnorm2;
      for (let i = k; i < m; i++) a[cj + i] -= f * v[i];
    }
    let dot = 0;
    for (let i = k; i < m; i++) dot += v[i] * b[i];
    const f = (2 * dot) / vnorm2;
    for (let i = k; i < m; i++) b[i] -= f * v[i];
  }
  return { a, b, colScale };
}

/**
 * A weighted least-squares problem reduced by one QR factorisation, for comparing fits on subsets
 * of its columns: with X_w = Q R (m x n, Q orthonormal), the residual of a fit on any subset S of
 * the columns is ||Q^T b - R[:, S] c||^2 + ||b - Q Q^T b||^2, an n-row problem
 * (Golub & Van Loan, 4th ed., §5.3 and §6.1 for the subset/downdating view).
 */
export interface ReducedLeastSquares {
  /** Columns of R (n values each, the upper triangle of the weighted, unscaled design's R). */
  columns: Float64Array[];
  /** Q^T b, n values (unit weights in the reduced problem). */
  qtb: Float64Array;
  /** ||b - Q Q^T b||^2: the part of chi-square no subset can fit. */
  residualSquare: number;
}

/** Reduces the problem of {@link weightedLeastSquaresColumns} to n rows (see ReducedLeastSquares). */
export function reduceLeastSquares(
  columns: readonly ArrayLike<number>[],
  y: ArrayLike<number>,
  sigma: ArrayLike<number>,
): ReducedLeastSquares {
  const n = columns.length;
  const m = columns[0]?.length ?? 0;
  if (!(n >= 1 && m >= n) || y.length !== m || sigma.length !== m) {
    throw new InputError({
      input: "design, y, sigma",
      unit: "-",
      validRange: "as many y and sigma as rows, at least as many rows as columns",
      received: `${m} rows, ${n} columns, ${y.length} y, ${sigma.length} sigma`,
    });
  }
  const { a, b, colScale } = weightAndFactor(columns, y, sigma, m, n);
  const R = Array.from({ length: n }, (_, j) => {
    const col = new Float64Array(n);
    for (let i = 0; i <= j; i++) col[i] = a[j * m + i] * colScale[j];
    return col;
  });
  let residualSquare = 0;
  for (let i = n; i < m; i++) residualSquare += b[i] * b[i];
  return { columns: R, qtb: b.slice(0, n), residualSquare };
}

/**
 * 2-norm of x[from..to) without overflow or underflow: scaled by the largest magnitude (the
 * idea of the reference BLAS dnrm2; Blue, ACM Trans. Math. Softw. 4 (1978) 15).
 */
function norm2(x: Float64Array, from: number, to: number): number {
  let scale = 0;
  for (let i = from; i < to; i++) {
    const v = Math.abs(x[i]);
    if (v > scale) scale = v;
    else if (!(v <= scale)) return Number.NaN;
  }
  if (scale === 0 || scale === Infinity) return scale;
  let sum = 0;
  for (let i = from; i < to; i++) {
    const v = x[i] / scale;
    sum += v * v;
  }
  return scale * Math.sqrt(sum);
}
