/**
 * Phase amounts of a multiphase split at fixed K-values (the multiphase Rachford-Rice problem) by
 * minimising the convex function of M. L. Michelsen, "Calculation of multiphase equilibrium",
 * Comput. Chem. Eng. 18 (1994) 545-550:
 *   Q(beta) = sum_k beta_k - sum_i z_i ln E_i,   E_i = sum_k beta_k K_ki,   beta_k >= 0,
 * with K_ki = x_ki / x_ri relative to any reference phase r (the K of the reference is 1).
 * dQ/dbeta_k = 1 - sum_i z_i K_ki / E_i, d2Q/dbeta_k dbeta_l = sum_i z_i K_ki K_li / E_i^2 (positive
 * semi-definite, so Q is convex and its minimum on beta >= 0 is unique when the K rows are
 * independent). At the minimum x_ki = z_i K_ki / E_i sums to one in every present phase and
 * sum_k beta_k = 1; a phase whose bound beta_k = 0 stays active with dQ/dbeta_k >= 0 is absent
 * (its composition would not sum to one). Newton's method with an active set on the bounds and a
 * backtracking line search on Q (as in R. Okuno, R. T. Johns and K. Sepehrnoori, SPE J. 15 (2010)
 * 313-325, who use the same convexity), scaled by the diagonal of the Hessian.
 */
import { SolverError } from "../../errors.js";
import { solveLinear } from "../../numerics/linearSolve.js";

/** Options of {@link solveMultiphaseSplit}. */
export interface MultiphaseSplitOptions {
  /** Convergence: max |dQ/dbeta_k| over free phases (and >= minus this at the bounds). Default 1e-12. */
  tolerance?: number;
  /** Newton iterations. Default 100. */
  maxIterations?: number;
  /** Starting amounts (>= 0); default equal amounts. */
  start?: readonly number[];
}

/** The amounts and compositions of the phases. */
export interface MultiphaseSplit {
  /** Amount of each phase per mole of feed (0 for an absent phase). */
  readonly beta: number[];
  /** x[k][i]: composition of phase k (that of an absent phase is its trial composition, normalised). */
  readonly x: number[][];
  /** max |dQ/dbeta_k| over present phases at the end. */
  readonly gradient: number;
  readonly iterations: number;
}

const METHOD = "multiphase split by minimisation of Michelsen's Q function (Newton, active set)";

/**
 * @param z - feed mole fractions (components with z_i = 0 are ignored).
 * @param K - K[k][i] = x_ki / x_ri relative to one reference phase (any positive scaling per phase
 *   row is allowed only for the reference row being all ones).
 */
export function solveMultiphaseSplit(
  z: readonly number[],
  K: readonly (readonly number[])[],
  options: MultiphaseSplitOptions = {},
): MultiphaseSplit {
  const np = K.length;
  const n = z.length;
  const tol = options.tolerance ?? 1e-12;
  const maxIterations = options.maxIterations ?? 100;
  const beta = options.start
    ? options.start.map((b) => Math.max(b, 0))
    : new Array<number>(np).fill(1 / np);
  if (!beta.some((b) => b > 0)) beta.fill(1 / np);
  const E = new Array<number>(n).fill(0);
  const evalQ = (b: readonly number[]): number => {
    let q = 0;
    for (let k = 0; k < np; k++) q += b[k];
    for (let i = 0; i < n; i++) {
      if (z[i] === 0) continue;
      let e = 0;
      for (let k = 0; k < np; k++) e += b[k] * K[k][i];
      if (!(e > 0)) return Infinity;
      q -= z[i] * Math.log(e);
    }
    return q;
  };
  let q = evalQ(beta);
  const gradientMax = (b: readonly number[]): number => {
    let worst = 0;
    for (let k = 0; k < np; k++) {
      let s = 1;
      for (let i = 0; i < n; i++) {
        if (z[i] === 0) continue;
        let e = 0;
        for (let l = 0; l < np; l++) e += b[l] * K[l][i];
        s -= (z[i] * K[k][i]) / e;
      }
      if (b[k] <= 0 && s >= 0) continue;
      worst = Math.max(worst, Math.abs(s));
    }
    return worst;
  };
  let iterations = 0;
  let gmax = Infinity;
  const g = new Array<number>(np).fill(0);
  for (; iterations < maxIterations; iterations++) {
    for (let i = 0; i < n; i++) {
      let e = 0;
      for (let k = 0; k < np; k++) e += beta[k] * K[k][i];
      E[i] = e;
    }
    const H: number[][] = [];
    for (let k = 0; k < np; k++) H.push(new Array<number>(np).fill(0));
    for (let k = 0; k < np; k++) {
      let s = 1;
      for (let i = 0; i < n; i++) if (z[i] !== 0) s -= (z[i] * K[k][i]) / E[i];
      g[k] = s;
    }
    for (let i = 0; i < n; i++) {
      if (z[i] === 0) continue;
      const w = z[i] / (E[i] * E[i]);
      for (let k = 0; k < np; k++) for (let l = k; l < np; l++) H[k][l] += w * K[k][i] * K[l][i];
    }
    for (let k = 0; k < np; k++) for (let l = 0; l < k; l++) H[k][l] = H[l][k];
    // active set: a phase at its bound with a non-negative gradient stays at zero
    const free: number[] = [];
    gmax = 0;
    for (let k = 0; k < np; k++) {
      if (beta[k] <= 0 && g[k] >= 0) continue;
      free.push(k);
      gmax = Math.max(gmax, Math.abs(g[k]));
    }
    if (gmax <= tol) break;
    // Newton step on the free phases, with the Hessian scaled by its diagonal
    const m = free.length;
    const A: number[][] = [];
    const rhs = new Array<number>(m);
    for (let a = 0; a < m; a++) {
      const row = new Array<number>(m);
      for (let b = 0; b < m; b++) {
        row[b] = H[free[a]][free[b]] / Math.sqrt(H[free[a]][free[a]] * H[free[b]][free[b]]);
      }
      row[a] += 1e-14;
      A.push(row);
      rhs[a] = -g[free[a]] / Math.sqrt(H[free[a]][free[a]]);
    }
    let stepScaled: number[];
    try {
      stepScaled = solveLinear(A, rhs);
    } catch {
      stepScaled = rhs.slice(); // steepest descent in the scaled variables
    }
    const step = new Array<number>(np).fill(0);
    for (let a = 0; a < m; a++) step[free[a]] = stepScaled[a] / Math.sqrt(H[free[a]][free[a]]);
    // largest step keeping beta >= 0
    let tMax = 1;
    for (let k = 0; k < np; k++) if (step[k] < 0) tMax = Math.min(tMax, -beta[k] / step[k]);
    let t = tMax;
    const trial = new Array<number>(np);
    let accepted = false;
    let slope = 0;
    for (let k = 0; k < np; k++) slope += g[k] * step[k];
    for (let back = 0; back < 60; back++) {
      for (let k = 0; k < np; k++) trial[k] = Math.max(0, beta[k] + t * step[k]);
      if (t === tMax)
        for (let k = 0; k < np; k++) if (step[k] < 0 && -beta[k] / step[k] === tMax) trial[k] = 0;
      const qt = evalQ(trial);
      // near the minimum the decrease of Q (~ |g|^2 / H) is below its rounding: there a step is
      // accepted when it reduces the largest free gradient instead. "Near" is judged by the
      // predicted decrease as well as by the gradient: with a trace phase (e.g. 1e-5 mol of
      // water) H is large and Q stops resolving its decrease while |g| is still about 1e-6
      const belowRounding = gmax < 1e-6 || -t * slope < 1e-12 * Math.max(1, Math.abs(q));
      const better = belowRounding ? gradientMax(trial) < gmax : qt <= q + 1e-4 * t * slope;
      if (better) {
        q = qt;
        accepted = true;
        break;
      }
      t *= 0.5;
    }
    if (!accepted) break; // no decrease possible at this precision: converged to rounding
    for (let k = 0; k < np; k++) beta[k] = trial[k];
  }
  if (gmax > Math.max(tol, 1e-10)) {
    throw new SolverError(
      METHOD,
      `after ${iterations} Newton iterations the largest gradient is ${gmax.toExponential(2)} (tolerance ${tol}); amounts [${beta.join(", ")}]`,
    );
  }
  const x: number[][] = [];
  for (let k = 0; k < np; k++) {
    const row = new Array<number>(n).fill(0);
    let s = 0;
    for (let i = 0; i < n; i++) {
      if (z[i] === 0) continue;
      let e = 0;
      for (let l = 0; l < np; l++) e += beta[l] * K[l][i];
      row[i] = (z[i] * K[k][i]) / e;
      s += row[i];
    }
    if (beta[k] === 0 && s > 0) for (let i = 0; i < n; i++) row[i] /= s;
    x.push(row);
  }
  return { beta, x, gradient: gmax, iterations };
}
