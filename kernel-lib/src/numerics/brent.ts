/**
 * Bracketed scalar root finding by Brent's method: inverse quadratic interpolation and secant
 * steps, safeguarded by bisection so the bracket always shrinks and convergence is guaranteed.
 *
 * Source: R. P. Brent, "Algorithms for Minimization without Derivatives", Prentice-Hall (1973),
 * chapter 4, the procedure `zero` (section 4.6). The stopping test is Brent's: stop when the half
 * width m of the bracket [b, c] satisfies |m| <= tol = 2 eps |b| + tolerance / 2, or f(b) = 0.
 */
import { InputError, SolverError } from "../errors.js";
import { requireCount } from "../validate.js";

/** Options of {@link findRootBrent}. */
export interface BrentOptions {
  /**
   * Absolute tolerance on x, in the units of x. Default 0: the root is located to about
   * 4 eps |x| (full double precision), which Brent's method reaches in a few dozen evaluations.
   */
  tolerance?: number;
  /** Maximum number of iterations (function evaluations after the two end points). Default 200. */
  maxIterations?: number;
}

/** Result of a scalar root search. */
export interface RootResult {
  /** The root found, in the units of x. */
  value: number;
  /** f(value), in the units of f. */
  residual: number;
  /** Iterations used (one function evaluation each). */
  iterations: number;
  /**
   * Bound on |value - root|, units of x: half the width of the final bracket, which still
   * contains a sign change of f (0 when f(value) is exactly 0).
   */
  errorEstimate: number;
}

const EPS = Number.EPSILON;

/**
 * Finds x in [lo, hi] with f(x) = 0, given that f(lo) and f(hi) have opposite signs (or one is 0).
 *
 * @example
 * ```ts
 * findRootBrent((x) => x * x - 2, 0, 2).value; // ≈ 1.41421356237310 (sqrt 2, to within 4 eps)
 * ```
 * @throws InputError if lo or hi is not finite, or an option is invalid.
 * @throws SolverError if f(lo) and f(hi) have the same sign, f returns NaN or an infinite value,
 *   or the iterations run out; the message names the bracket and the f values.
 */
export function findRootBrent(
  f: (x: number) => number,
  lo: number,
  hi: number,
  options: BrentOptions = {},
): RootResult {
  const method = "Brent root finding";
  if (!Number.isFinite(lo)) {
    throw new InputError({ input: "lo", unit: "units of x", validRange: "finite", received: lo });
  }
  if (!Number.isFinite(hi)) {
    throw new InputError({ input: "hi", unit: "units of x", validRange: "finite", received: hi });
  }
  const t = options.tolerance ?? 0;
  if (!(t >= 0 && t < Infinity)) {
    throw new InputError({
      input: "options.tolerance",
      unit: "units of x",
      validRange: "a finite number >= 0",
      received: t,
    });
  }
  const maxIterations = options.maxIterations ?? 200;
  requireCount("options.maxIterations", maxIterations);

  const evaluate = (x: number): number => {
    const y = f(x);
    if (!(typeof y === "number" && Number.isFinite(y))) {
      throw new SolverError(
        method,
        `f(${x}) returned ${String(y)} inside the bracket [${lo}, ${hi}]; f must be finite there`,
      );
    }
    return y;
  };

  let a = lo;
  let b = hi;
  let fa = evaluate(a);
  let fb = evaluate(b);
  const fLo = fa;
  const fHi = fb;
  if (fa === 0) return { value: a, residual: 0, iterations: 0, errorEstimate: 0 };
  if (fb === 0) return { value: b, residual: 0, iterations: 0, errorEstimate: 0 };
  if (fa > 0 === fb > 0) {
    throw new SolverError(
      method,
      `the bracket [${lo}, ${hi}] does not straddle a root: f(${lo}) = ${fa} and f(${hi}) = ${fb} ` +
        `have the same sign`,
    );
  }

  // Brent's zero, section 4.6: b is the best estimate, c the opposite end of the bracket,
  // a the previous b.
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    if (fb > 0 === fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * EPS * Math.abs(b) + 0.5 * t;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) {
      return {
        value: b,
        residual: fb,
        iterations: iteration - 1,
        errorEstimate: fb === 0 ? 0 : Math.abs(m),
      };
    }
    if (Math.abs(e) < tol || Math.abs(fa) <= Math.abs(fb)) {
      d = m; // bisection
      e = m;
    } else {
      let s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s; // secant (linear interpolation)
        q = 1 - s;
      } else {
        q = fa / fc; // inverse quadratic interpolation
        const r = fb / fc;
        p = s * (2 * m * q * (q - r) - (b - a) * (r - 1));
        q = (q - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      s = e;
      e = d;
      if (2 * p < 3 * m * q - Math.abs(tol * q) && p < Math.abs(0.5 * s * q)) {
        d = p / q; // accept interpolation
      } else {
        d = m;
        e = m;
      }
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = evaluate(b);
  }
  throw new SolverError(
    method,
    `no convergence in ${maxIterations} iterations on the bracket [${lo}, ${hi}] ` +
      `(f(${lo}) = ${fLo}, f(${hi}) = ${fHi}); last estimate x = ${b} with f = ${fb}, ` +
      `remaining bracket [${Math.min(b, c)}, ${Math.max(b, c)}], tolerance ${t}`,
  );
}
