/**
 * Minimum of a function of one variable on an interval without derivatives: Brent's method
 * (golden-section search combined with successive parabolic interpolation).
 *
 * Source: R. P. Brent, "Algorithms for Minimization without Derivatives", Prentice-Hall (1973),
 * chapter 5, the procedure `localmin` (section 5.8). For a unimodal f the result is the minimum
 * to within 2 tol, tol = sqrt(eps) |x| + tolerance / 3 (Brent's test with eps = machine epsilon).
 */
import { InputError, SolverError } from "../errors.js";

/** Options of {@link minimizeBrent}. */
export interface MinimizeOptions {
  /** Absolute tolerance on x, in the units of x. Default 1e-10 times the interval's width. */
  tolerance?: number;
  /** Maximum number of function evaluations. Default 200. */
  maxIterations?: number;
}

/** Result of {@link minimizeBrent}. */
export interface MinimizeResult {
  /** Where the minimum is, units of x. */
  value: number;
  /** f(value). */
  minimum: number;
  /** Function evaluations used. */
  iterations: number;
  /** Bound of |value - true minimiser| for a unimodal f, units of x. */
  errorEstimate: number;
}

const GOLDEN = (3 - Math.sqrt(5)) / 2;
const SQRT_EPS = Math.sqrt(Number.EPSILON);

/**
 * Minimises f on [lo, hi] (for a maximum, minimise -f).
 *
 * @example
 * ```ts
 * minimizeBrent((x) => (x - 2) ** 2, 0, 5).value; // ≈ 2
 * ```
 * @throws InputError for a bad interval or option; SolverError when f returns NaN or the
 *   evaluations run out.
 */
export function minimizeBrent(
  f: (x: number) => number,
  lo: number,
  hi: number,
  options: MinimizeOptions = {},
): MinimizeResult {
  const method = "Brent minimisation";
  if (!(Number.isFinite(lo) && Number.isFinite(hi) && hi > lo)) {
    throw new InputError({
      input: "lo, hi",
      unit: "units of x",
      validRange: "finite with lo < hi",
      received: [lo, hi],
    });
  }
  const t = options.tolerance ?? 1e-10 * (hi - lo);
  if (!(t > 0)) {
    throw new InputError({
      input: "options.tolerance",
      unit: "units of x",
      validRange: "> 0",
      received: t,
    });
  }
  const maxIt = options.maxIterations ?? 200;
  let evaluations = 0;
  const fe = (x: number): number => {
    evaluations++;
    const v = f(x);
    if (Number.isNaN(v)) throw new SolverError(method, `f(${x}) is NaN on [${lo}, ${hi}]`);
    return v;
  };
  let a = lo;
  let b = hi;
  let x = a + GOLDEN * (b - a);
  let w = x;
  let v = x;
  let fx = fe(x);
  let fw = fx;
  let fv = fx;
  let d = 0;
  let e = 0;
  for (;;) {
    const m = 0.5 * (a + b);
    const tol = SQRT_EPS * Math.abs(x) + t / 3;
    const t2 = 2 * tol;
    if (Math.abs(x - m) <= t2 - 0.5 * (b - a)) {
      return { value: x, minimum: fx, iterations: evaluations, errorEstimate: t2 };
    }
    if (evaluations >= maxIt) {
      throw new SolverError(
        method,
        `${maxIt} evaluations used; the bracket is [${a}, ${b}] with best x = ${x}, f = ${fx}`,
      );
    }
    let p = 0;
    let q = 0;
    let r = 0;
    if (Math.abs(e) > tol) {
      r = (x - w) * (fx - fv);
      q = (x - v) * (fx - fw);
      p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
      r = e;
      e = d;
    }
    if (Math.abs(p) < Math.abs(0.5 * q * r) && p > q * (a - x) && p < q * (b - x)) {
      d = p / q;
      const u = x + d;
      if (u - a < t2 || b - u < t2) d = x < m ? tol : -tol;
    } else {
      e = (x < m ? b : a) - x;
      d = GOLDEN * e;
    }
    const u = x + (Math.abs(d) >= tol ? d : d > 0 ? tol : -tol);
    const fu = fe(u);
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
}
