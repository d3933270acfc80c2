/**
 * Eigenvalues of a real symmetric tridiagonal matrix by the QL algorithm with implicit shifts.
 *
 * Algorithm: Bowdler, Martin, Reinsch & Wilkinson, "The QR and QL algorithms for symmetric
 * matrices", Numer. Math. 11 (1968) 293-306 (procedure tql1); as presented in Press, Teukolsky,
 * Vetterling & Flannery, Numerical Recipes, 3rd ed. (2007), sec. 11.4 (routine tqli), eigenvalues
 * only. An off-diagonal element is treated as zero when |e_m| <= eps (|d_m| + |d_m+1|).
 */
import { InputError, SolverError } from "../errors.js";

/** Options of the tridiagonal eigenvalue solver. */
export interface TridiagonalEigenOptions {
  /** Maximum QL sweeps per eigenvalue. Default 60. */
  readonly maxIterationsPerEigenvalue?: number;
}

/** Result: eigenvalues in ascending order, and how the solver did. */
export interface TridiagonalEigenResult {
  /** Eigenvalues, ascending. */
  readonly values: Float64Array;
  /** Total QL sweeps used. */
  readonly iterations: number;
}

/**
 * Eigenvalues of the symmetric tridiagonal matrix with diagonal `diagonal` (length n) and
 * off-diagonal `offDiagonal` (length n - 1, element i couples rows i and i+1).
 */
export function tridiagonalEigenvalues(
  diagonal: ArrayLike<number>,
  offDiagonal: ArrayLike<number>,
  options: TridiagonalEigenOptions = {},
): TridiagonalEigenResult {
  const n = diagonal.length;
  const maxIter = options.maxIterationsPerEigenvalue ?? 60;
  if (n === 0) return { values: new Float64Array(0), iterations: 0 };
  if (offDiagonal.length !== n - 1) {
    throw new InputError({
      input: "offDiagonal.length",
      unit: "-",
      validRange: `diagonal.length - 1 = ${n - 1}`,
      received: offDiagonal.length,
    });
  }
  const d = Float64Array.from(diagonal);
  const e = new Float64Array(n);
  for (let i = 0; i < n - 1; i++) e[i] = offDiagonal[i];
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(d[i]) || !Number.isFinite(e[i])) {
      throw new InputError({
        input: `matrix element ${i}`,
        unit: "-",
        validRange: "a finite number",
        received: Number.isFinite(d[i]) ? e[i] : d[i],
      });
    }
  }
  const eps = Number.EPSILON;
  let total = 0;
  for (let l = 0; l < n; l++) {
    let iter = 0;
    let m: number;
    do {
      for (m = l; m < n - 1; m++) {
        const dd = Math.abs(d[m]) + Math.abs(d[m + 1]);
        if (Math.abs(e[m]) <= eps * dd) break;
      }
      if (m !== l) {
        if (iter++ >= maxIter) {
          throw new SolverError(
            "implicit QL (tridiagonal eigenvalues)",
            `eigenvalue ${l} of ${n} did not converge in ${maxIter} sweeps; last off-diagonal ${e[l]}`,
          );
        }
        total++;
        let g = (d[l + 1] - d[l]) / (2 * e[l]);
        let r = Math.hypot(g, 1);
        g = d[m] - d[l] + e[l] / (g + (g >= 0 ? Math.abs(r) : -Math.abs(r)));
        let s = 1;
        let c = 1;
        let p = 0;
        let i: number;
        let underflow = false;
        for (i = m - 1; i >= l; i--) {
          const f = s * e[i];
          const b = c * e[i];
          r = Math.hypot(f, g);
          e[i + 1] = r;
          if (r === 0) {
            d[i + 1] -= p;
            e[m] = 0;
            underflow = true;
            break;
          }
          s = f / r;
          c = g / r;
          g = d[i + 1] - p;
          r = (d[i] - g) * s + 2 * c * b;
          p = s * r;
          d[i + 1] = g + p;
          g = c * r - b;
        }
        if (underflow) continue;
        d[l] -= p;
        e[l] = g;
        e[m] = 0;
      }
    } while (m !== l);
  }
  d.sort();
  return { values: d, iterations: total };
}
