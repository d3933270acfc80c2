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
 * 313-325, who use the same convexity), scaled by the diagonal of the Hessian; an accepted full
 * step is stretched (doubling) in the phases it at least doubles while Q keeps falling, for trace
 * phases re-entering from zero.
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
  /**
   * Backtracking line search on Q along `step` from beta, the step first cut to keep beta >= 0;
   * fills `trial` and returns Q there, or undefined when no step decreases Q (or, below Q's
   * rounding, the largest free gradient).
   */
  const lineSearch = (
    step: readonly number[],
    trial: number[],
    gNow: readonly number[],
    gmaxNow: number,
    qNow: number,
  ): number | undefined => {
    let tMax = 1;
    for (let k = 0; k < np; k++) if (step[k] < 0) tMax = Math.min(tMax, -beta[k] / step[k]);
    if (!(tMax > 0)) return undefined;
    let t = tMax;
    let slope = 0;
    for (let k = 0; k < np; k++) slope += gNow[k] * step[k];
    for (let back = 0; back < 60; back++) {
      for (let k = 0; k < np; k++) trial[k] = Math.max(0, beta[k] + t * step[k]);
      if (t === tMax)
        for (let k = 0; k < np; k++) if (step[k] < 0 && -beta[k] / step[k] === tMax) trial[k] = 0;
      const qt = evalQ(trial);
      // near the minimum the decrease of Q (~ |g|^2 / H) is below its rounding: there a step is
      // accepted when it reduces the largest free gradient instead. "Near" is judged by the
      // predicted decrease as well as by the gradient: with a trace phase (e.g. 1e-5 mol of
      // water) H is large and Q stops resolving its decrease while |g| is still about 1e-6
      const belowRounding = gmaxNow < 1e-6 || -t * slope < 1e-12 * Math.max(1, Math.abs(qNow));
      const better = belowRounding ? gradientMax(trial) < gmaxNow : qt <= qNow + 1e-4 * t * slope;
      if (better && t === 1 && !belowRounding) return expand(step, trial, qt);
      if (better) return qt;
      t *= 0.5;
    }
    return undefined;
  };
  /**
   * A full step accepted, longer steps along it while they keep lowering Q (doubling t, inside
   * the bounds). A phase that re-enters from zero where a trace component has a huge K (e.g.
   * heptane at 1e-8 in water, K = 1e39) sees Q ~ beta_k - z_i ln(beta_k K_ki): there Newton only
   * doubles beta_k per step and would need a hundred steps to climb from 1e-40 to 1e-11.
   */
  const expand = (step: readonly number[], trial: number[], qTrial: number): number => {
    const longer = new Array<number>(np);
    let q = qTrial;
    for (let t = 2; t < 2 ** 200; t *= 2) {
      let inside = true;
      for (let k = 0; k < np; k++) {
        // only the phases the step at least doubles are stretched; the others keep the full step
        longer[k] = beta[k] + (step[k] >= beta[k] ? t : 1) * step[k];
        if (!(longer[k] >= 0)) inside = false;
      }
      if (!inside) break;
      const ql = evalQ(longer);
      if (!(ql < q)) break;
      q = ql;
      for (let k = 0; k < np; k++) trial[k] = longer[k];
    }
    return q;
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
      // as z_i (K_ki / E_i)(K_li / E_i): K of a heavy component between phases far apart in
      // composition reaches 1e165 at 107 K, and K_ki K_li or E_i^2 would overflow (an infinite
      // E_i^2 dropped that component from the Hessian)
      for (let k = 0; k < np; k++) {
        const a = K[k][i] / E[i];
        for (let l = k; l < np; l++) H[k][l] += z[i] * a * (K[l][i] / E[i]);
      }
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
    // Newton step on the free phases, with the Hessian scaled by its diagonal. A phase at its
    // bound (beta = 0, dQ/dbeta < 0) whose Newton step still points below zero would leave no
    // room to move (largest feasible step 0): it is held at zero for this step and the step
    // recomputed for the others (the usual active-set rule; it is freed again next iteration).
    const freeAll = free.slice();
    let newton = newtonStep(H, g, free, np);
    for (let drop = 0; drop < np; drop++) {
      const held = free.filter((k) => beta[k] <= 0 && newton[k] < 0);
      if (held.length === 0 || held.length === free.length) break;
      const kept = free.filter((k) => !held.includes(k));
      free.length = 0;
      free.push(...kept);
      newton = newtonStep(H, g, free, np);
    }
    // the projected gradient step, scaled by the Hessian's diagonal, is the fallback: it is a
    // descent direction whenever a free gradient is non-zero
    const gradientStep = new Array<number>(np).fill(0);
    for (const k of freeAll) if (beta[k] > 0 || g[k] < 0) gradientStep[k] = -g[k] / H[k][k];
    let accepted = false;
    const trial = new Array<number>(np);
    for (const step of [newton, gradientStep]) {
      const outcome = lineSearch(step, trial, g, gmax, q);
      if (outcome !== undefined) {
        q = outcome;
        accepted = true;
        break;
      }
    }
    if (!accepted) break; // no decrease possible at this precision: converged to rounding
    for (let k = 0; k < np; k++) beta[k] = trial[k];
  }
  if (!(gmax <= Math.max(tol, 1e-10))) {
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

/**
 * The Newton step of Q on the `free` phases (zero elsewhere), solved with the Hessian scaled by
 * its diagonal (a 1e-14 ridge keeps nearly equal K rows solvable); scaled steepest descent when
 * the system is singular.
 */
function newtonStep(
  H: readonly (readonly number[])[],
  g: readonly number[],
  free: readonly number[],
  np: number,
): number[] {
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
  return step;
}
