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
  const rankTolerance = options.rankTolerance ?? 1e-13;
  const m = design.length;
  const n = design[0]?.length ?? 0;
  if (!(n >= 1 && m >= n)) {
    throw new InputError({
      input: "design",
      unit: "-",
      validRange: "at least as many observations as coefficients (and >= 1 coefficient)",
      received: `${m} observations, ${n} coefficients`,
    });
  }
  if (y.length !== m || sigma.length !== m) {
    throw new InputError({
      input: "y, sigma",
      unit: "-",
      validRange: `length ${m}`,
      received: `${y.length}, ${sigma.length}`,
    });
  }
  // Weighted design (row i divided by sigma_i), then columns scaled to unit 2-norm.
  const a: number[][] = [];
  const b: number[] = [];
  for (let i = 0; i < m; i++) {
    const s = sigma[i] as number;
    if (!(s > 0 && s < Infinity)) {
      throw new InputError({
        input: `sigma[${i}]`,
        unit: "-",
        validRange: "a finite number > 0",
        received: s,
      });
    }
    const row = design[i] as readonly number[];
    if (row.length !== n)
      throw new InputError({
        input: `design[${i}]`,
        unit: "-",
        validRange: `${n} columns`,
        received: row.length,
      });
    a.push(row.map((v) => v / s));
    b.push((y[i] as number) / s);
  }
  const colScale: number[] = [];
  for (let j = 0; j < n; j++) {
    let norm = 0;
    for (let i = 0; i < m; i++) norm = Math.hypot(norm, (a[i] as number[])[j] as number);
    if (!(norm > 0 && norm < Infinity)) {
      throw new SolverError("weighted least squares", `design column ${j} is zero or not finite`);
    }
    colScale.push(norm);
    for (let i = 0; i < m; i++) (a[i] as number[])[j] = ((a[i] as number[])[j] as number) / norm;
  }
  // Householder QR, applied to b as we go (Golub & Van Loan Alg. 5.2.1).
  for (let k = 0; k < n; k++) {
    let alpha = 0;
    for (let i = k; i < m; i++) alpha = Math.hypot(alpha, (a[i] as number[])[k] as number);
    if (alpha === 0) continue;
    const akk = (a[k] as number[])[k] as number;
    if (akk > 0) alpha = -alpha;
    const v: number[] = new Array(m - k);
    for (let i = k; i < m; i++) v[i - k] = (a[i] as number[])[k] as number;
    v[0] = (v[0] as number) - alpha;
    let vnorm2 = 0;
    for (const vi of v) vnorm2 += vi * vi;
    if (vnorm2 === 0) continue;
    for (let j = k; j < n; j++) {
      let dot = 0;
      for (let i = k; i < m; i++) dot += (v[i - k] as number) * ((a[i] as number[])[j] as number);
      const f = (2 * dot) / vnorm2;
      for (let i = k; i < m; i++)
        (a[i] as number[])[j] = ((a[i] as number[])[j] as number) - f * (v[i - k] as number);
    }
    let dot = 0;
    for (let i = k; i < m; i++) dot += (v[i - k] as number) * (b[i] as number);
    const f = (2 * dot) / vnorm2;
    for (let i = k; i < m; i++) b[i] = (b[i] as number) - f * (v[i - k] as number);
  }
  const R: number[][] = [];
  for (let i = 0; i < n; i++)
    R.push(Array.from({ length: n }, (_, j) => (j < i ? 0 : ((a[i] as number[])[j] as number))));
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
    let s = b[i] as number;
    for (let j = i + 1; j < n; j++) s -= ((R[i] as number[])[j] as number) * (z[j] as number);
    z[i] = s / ((R[i] as number[])[i] as number);
  }
  const coefficients = z.map((zi, j) => zi / (colScale[j] as number));
  // Rinv (upper triangular), covariance = D^-1 Rinv Rinv^T D^-1.
  const Rinv: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let j = 0; j < n; j++) {
    (Rinv[j] as number[])[j] = 1 / ((R[j] as number[])[j] as number);
    for (let i = j - 1; i >= 0; i--) {
      let s = 0;
      for (let k = i + 1; k <= j; k++)
        s += ((R[i] as number[])[k] as number) * ((Rinv[k] as number[])[j] as number);
      (Rinv[i] as number[])[j] = -s / ((R[i] as number[])[i] as number);
    }
  }
  const covariance: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let s = 0;
      for (let k = Math.max(i, j); k < n; k++)
        s += ((Rinv[i] as number[])[k] as number) * ((Rinv[j] as number[])[k] as number);
      (covariance[i] as number[])[j] = s / ((colScale[i] as number) * (colScale[j] as number));
    }
  }
  const residuals: number[] = [];
  const normalizedResiduals: number[] = [];
  let chiSquare = 0;
  for (let i = 0; i < m; i++) {
    const row = design[i] as readonly number[];
    let fit = 0;
    for (let j = 0; j < n; j++) fit += (row[j] as number) * (coefficients[j] as number);
    const r = (y[i] as number) - fit;
    residuals.push(r);
    const nr = r / (sigma[i] as number);
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
