/**
 * Damped Newton's method for small nonlinear systems F(x) = 0.
 *
 * Source: J. E. Dennis & R. B. Schnabel, "Numerical Methods for Unconstrained Optimization and
 * Nonlinear Equations", Prentice-Hall (1983): Newton step from the linear system J dx = -F
 * (ch. 5), globalised by a backtracking line search on f = ||F||^2 / 2 with the sufficient
 * decrease (Armijo) condition f(x + lambda dx) <= f(x) + alpha lambda grad f . dx, alpha = 1e-4,
 * and safeguarded quadratic/cubic backtracking with lambda reduced by a factor in [0.1, 0.5]
 * (algorithm A6.3.1); forward-difference Jacobian with step sqrt(eps) max(|x_j|, typx_j)
 * (algorithm A5.4.1). The linear step uses {@link solveLinear} (Gaussian elimination with partial
 * pivoting).
 */
import { InputError, SolverError } from "../errors.js";
import { requireCount } from "../validate.js";
import { solveLinear } from "./linearSolve.js";

/** Options of {@link solveNewtonSystem}. */
export interface NewtonOptions {
  /** Analytic Jacobian J[i][j] = dF_i/dx_j; default: forward differences (n extra evaluations). */
  jacobian?: (x: number[]) => number[][];
  /**
   * Convergence tolerance on the residual: stop when ||F(x)||_2 <= tolerance, in the units of F.
   * Default 1e-10. Scale F so that this is meaningful (e.g. relative residuals).
   */
  tolerance?: number;
  /** Maximum Newton iterations (each one Jacobian and one linear solve). Default 50. */
  maxIterations?: number;
  /**
   * Typical magnitude of each x_j (or one number for all), used for the finite-difference step.
   * Default 1.
   */
  typicalX?: number | number[];
}

/** Result of {@link solveNewtonSystem}. */
export interface NewtonResult {
  /** The solution x. */
  value: number[];
  /** ||F(value)||_2, in the units of F. */
  residualNorm: number;
  /** Newton iterations used. */
  iterations: number;
}

const METHOD = "damped Newton (Dennis & Schnabel 1983)";

/**
 * Solves F(x) = 0 for x in R^n starting from x0.
 *
 * @example
 * ```ts
 * // x^2 + y^2 = 4, x y = 1
 * solveNewtonSystem(([x, y]) => [x * x + y * y - 4, x * y - 1], [2, 0.5]).value;
 * // ≈ [1.93185165, 0.51763809] (exact: x = sqrt(2 + sqrt 3), y = 1 / x)
 * ```
 * @throws InputError if x0 or an option is invalid, or F returns the wrong length.
 * @throws SolverError if the Jacobian is singular, F is not finite, the line search cannot
 *   reduce ||F||, or the iterations run out; the message gives the start, the iterations used
 *   and the last residual.
 */
export function solveNewtonSystem(
  F: (x: number[]) => number[],
  x0: number[],
  options: NewtonOptions = {},
): NewtonResult {
  const n = x0.length;
  if (!(n >= 1)) {
    throw new InputError({ input: "x0", unit: "-", validRange: "a non-empty array", received: x0 });
  }
  x0.forEach((v, j) => {
    if (!Number.isFinite(v)) {
      throw new InputError({
        input: `x0[${j}]`,
        unit: "-",
        validRange: "a finite number",
        received: v,
      });
    }
  });
  const tolerance = options.tolerance ?? 1e-10;
  if (!(tolerance > 0 && tolerance < Infinity)) {
    throw new InputError({
      input: "options.tolerance",
      unit: "units of F",
      validRange: "a finite number > 0",
      received: tolerance,
    });
  }
  const maxIterations = options.maxIterations ?? 50;
  requireCount("options.maxIterations", maxIterations);
  const typx = options.typicalX ?? 1;
  const typical = (j: number): number => Math.abs(typeof typx === "number" ? typx : (typx[j] ?? 1));

  const start = `[${x0.join(", ")}]`;
  const fail = (what: string, iterations: number, residual: number): never => {
    throw new SolverError(
      METHOD,
      `${what}; started from x0 = ${start}, ${iterations} iteration(s), last ||F|| = ${residual}`,
    );
  };
  const evaluate = (x: number[], iterations: number, residual: number): number[] => {
    const Fx = F(x);
    if (!Array.isArray(Fx) || Fx.length !== n) {
      throw new InputError({
        input: "F(x)",
        unit: "-",
        validRange: `an array of ${n} numbers (as many equations as unknowns)`,
        received: Array.isArray(Fx) ? `${Fx.length} entries` : Fx,
      });
    }
    if (!Fx.every(Number.isFinite)) {
      fail(`F returned a non-finite value at x = [${x.join(", ")}]`, iterations, residual);
    }
    return Fx;
  };
  const norm = (v: number[]): number => Math.hypot(...v);

  let x = x0.slice();
  let Fx = evaluate(x, 0, NaN);
  let fnorm = norm(Fx);
  for (let iteration = 0; ; iteration++) {
    if (fnorm <= tolerance) return { value: x, residualNorm: fnorm, iterations: iteration };
    if (iteration >= maxIterations) {
      fail(
        `no convergence to ||F|| <= ${tolerance} in ${maxIterations} iterations`,
        iteration,
        fnorm,
      );
    }
    const J = options.jacobian ? options.jacobian(x.slice()) : finiteDifferenceJacobian(x, Fx);
    let dx: number[];
    try {
      dx = solveLinear(
        J,
        Fx.map((v) => -v),
      );
    } catch (err) {
      if (err instanceof SolverError || err instanceof InputError) {
        return fail(
          `singular or invalid Jacobian at x = [${x.join(", ")}] (${err.message})`,
          iteration,
          fnorm,
        );
      }
      throw err;
    }
    // Line search on f = ||F||^2 / 2; the Newton direction gives grad f . dx = -||F||^2.
    const f0 = 0.5 * fnorm * fnorm;
    const slope = -fnorm * fnorm;
    let lambda = 1;
    let prevLambda = 1;
    let prevF = 0;
    let accepted = false;
    let xNew = x;
    let FNew = Fx;
    for (let backtrack = 0; backtrack < 40; backtrack++) {
      xNew = x.map((v, j) => v + lambda * dx[j]);
      const trial = F(xNew);
      const finite = Array.isArray(trial) && trial.length === n && trial.every(Number.isFinite);
      const fNew = finite ? 0.5 * norm(trial) ** 2 : Infinity;
      if (finite && fNew <= f0 + 1e-4 * lambda * slope) {
        FNew = trial;
        accepted = true;
        break;
      }
      // Next lambda (A6.3.1): quadratic model first, cubic afterwards, kept in [0.1, 0.5] lambda.
      let next: number;
      if (!Number.isFinite(fNew)) {
        next = 0.1 * lambda;
      } else if (backtrack === 0) {
        next = -slope / (2 * (fNew - f0 - slope));
      } else {
        const r1 = fNew - f0 - lambda * slope;
        const r2 = prevF - f0 - prevLambda * slope;
        const a = (r1 / (lambda * lambda) - r2 / (prevLambda * prevLambda)) / (lambda - prevLambda);
        const b =
          ((-prevLambda * r1) / (lambda * lambda) + (lambda * r2) / (prevLambda * prevLambda)) /
          (lambda - prevLambda);
        if (a === 0) next = -slope / (2 * b);
        else {
          const disc = b * b - 3 * a * slope;
          next =
            disc < 0
              ? 0.5 * lambda
              : b <= 0
                ? (-b + Math.sqrt(disc)) / (3 * a)
                : -slope / (b + Math.sqrt(disc));
        }
      }
      prevLambda = lambda;
      prevF = fNew;
      lambda = Math.min(
        0.5 * lambda,
        Math.max(0.1 * lambda, Number.isFinite(next) ? next : 0.5 * lambda),
      );
    }
    if (!accepted) {
      fail(
        `the line search could not reduce ||F|| along the Newton direction from x = [${x.join(", ")}] ` +
          `(a local minimum of ||F|| that is not a root, or a badly scaled F)`,
        iteration,
        fnorm,
      );
    }
    x = xNew;
    Fx = FNew;
    fnorm = norm(Fx);
  }

  /** Forward differences, Dennis & Schnabel algorithm A5.4.1. */
  function finiteDifferenceJacobian(x: number[], Fx: number[]): number[][] {
    const J: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
    const root = Math.sqrt(Number.EPSILON);
    for (let j = 0; j < n; j++) {
      const xj = x[j];
      let h = root * Math.max(Math.abs(xj), typical(j) || 1) * (xj < 0 ? -1 : 1);
      const shifted = x.slice();
      shifted[j] = xj + h;
      h = shifted[j] - xj; // make h exactly representable
      const Fh = F(shifted);
      if (!Array.isArray(Fh) || Fh.length !== n || !Fh.every(Number.isFinite)) {
        fail(
          `F is not finite at the finite-difference point x[${j}] + ${h} near x = [${x.join(", ")}]`,
          0,
          norm(Fx),
        );
      }
      for (let i = 0; i < n; i++) J[i][j] = (Fh[i] - Fx[i]) / h;
    }
    return J;
  }
}
