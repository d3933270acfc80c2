/**
 * The two-phase split at given T and P from starting K-values: successive substitution on
 * ln K_i = ln phi_i(x) - ln phi_i(y) with the Rachford-Rice amounts (rachfordRice.ts), accelerated
 * every fifth step by the dominant-eigenvalue extrapolation of M. L. Michelsen, "The isothermal
 * flash problem. Part II. Phase-split calculation", Fluid Phase Equilib. 9 (1982) 21-40
 * (GDEM with one eigenvalue: lambda = (D_k . D_k) / (D_{k-1} . D_k), ln K += D_k lambda / (1 - lambda),
 * kept only when it lowers the Gibbs energy), then, when substitution is slow (near a critical
 * point), Newton's method on the Gibbs energy in the mole numbers v_i of the y phase
 * (l_i = z_i - v_i, each updated in the phase holding less of i; M. L. Michelsen and J. M.
 * Mollerup, Thermodynamic Models: Fundamentals and Computational Aspects, 2nd ed. 2007, ch. 10):
 *   g_i = ln f_i(y) - ln f_i(x),
 *   H_ij = (1/V)(delta_ij / y_i - 1 + n dln phi_i/dn_j (y)) + (1/L)(delta_ij / x_i - 1 + n dln phi_i/dn_j (x)),
 * in the scaled variables of that chapter (H~ = D H D with D_i = sqrt(V L x_i y_i / z_i), whose ideal
 * part is the identity), with a Levenberg-type shift mu I of H~ when the step does not descend and
 * a backtracking line search on G that keeps 0 < v_i < z_i. Fugacities from state/fugacity.ts in
 * each phase's own root of lowest Gibbs energy.
 *
 * The split returned has converged (max |ln f_i(y) - ln f_i(x)| <= tolerance) or `converged` is
 * false; the caller verifies and decides.
 */
import { R as R_CODATA } from "../../constants.js";
import type { ResidualModel } from "../../eos/types.js";
import { SolverError } from "../../errors.js";
import { solveLinear } from "../../numerics/linearSolve.js";
import { fugacityDerivatives, phaseFugacityAtTP } from "../../state/fugacity.js";
import { solveRachfordRice } from "./rachfordRice.js";

/** A phase while iterating: composition, ln phi in its chosen root, density. */
export interface WorkingPhase {
  x: number[];
  lnPhi: number[];
  densityMolPerM3: number;
  amount: number;
}

/** Options of the two-phase split. */
export interface SplitOptions {
  /** Convergence: max |ln f_i(y) - ln f_i(x)|. */
  tolerance: number;
  /** Successive-substitution steps before Newton may take over (when substitution is slow). */
  newtonAfter: number;
  /** Cap on all iterations (substitution plus Newton). */
  maxIterations: number;
}

/** Outcome of the two-phase split. */
export interface SplitOutcome {
  readonly converged: boolean;
  /** The x phase (amount 1 - beta) and the y phase (amount beta). */
  readonly phases: [WorkingPhase, WorkingPhase];
  readonly error: number;
  readonly iterations: number;
  readonly newtonIterations: number;
  /** Why it stopped when not converged, e.g. "trivial solution" or "negative phase amount". */
  readonly reason?: string;
}

/** sum_i x_i (ln x_i + ln phi_i) over present components: G/RT of one mole of a phase, less ln P. */
export function phaseGibbs(
  x: readonly number[],
  lnPhi: readonly number[],
  present: readonly number[],
): number {
  let g = 0;
  for (const i of present) if (x[i] > 0) g += x[i] * (Math.log(x[i]) + lnPhi[i]);
  return g;
}

/**
 * ln phi_i of the phase at T, P, x in its root of lowest Gibbs energy (state/fugacity.ts), taken
 * consistently at the root's own density: ln f_i = ln(x_i rho R T) + dnA_i, so
 * ln phi_i = dnA_i + ln(rho R T / P) = (dnA_i - ln Z) + ln(P(rho) / P). The two differ by
 * ln(P(rho)/P), the rounding of the density root, which for an incompressible liquid at low
 * pressure reaches 1e-10 (a root good to 1e-14 times a stiffness rho (dP/drho) / P of 1e4); the
 * form at the root's own density is the one the returned states carry, so the split converged
 * with it passes the verification made on those states.
 */
export function phaseLnPhi(
  model: ResidualModel,
  T: number,
  P: number,
  x: readonly number[],
): { lnPhi: number[]; rho: number } {
  const f = phaseFugacityAtTP(model, T, P, x, "stable");
  const Rg = model.gasConstant ?? R_CODATA;
  const shift = Math.log((f.Z * f.densityMolPerM3 * Rg * T) / P);
  const lnPhi = f.lnPhi;
  for (let i = 0; i < lnPhi.length; i++) lnPhi[i] += shift;
  return { lnPhi, rho: f.densityMolPerM3 };
}

/**
 * Divides a composition by its sum, in place, and returns it. Every composition is normalised
 * before its fugacities are taken: the flash formulas leave sums of 1 +- a few eps, and at a stiff
 * liquid density a sum off by 1e-14 moves P(rho) by 1e-10 relative; normalising first keeps the
 * phase's density root, ln phi and the returned state consistent (and a / (a + b) <= 1 exactly, so
 * no mole fraction exceeds one).
 */
export function normalizeComposition(x: number[]): number[] {
  let sum = 0;
  for (const v of x) sum += v;
  for (let i = 0; i < x.length; i++) x[i] /= sum;
  return x;
}

function fug(
  model: ResidualModel,
  T: number,
  P: number,
  x: number[],
): { lnPhi: number[]; rho: number } {
  return phaseLnPhi(model, T, P, x);
}

interface SsState {
  lnK: number[];
  beta: number;
  oneMinusBeta: number;
  x: number[];
  y: number[];
  fx: { lnPhi: number[]; rho: number };
  fy: { lnPhi: number[]; rho: number };
  /** ln phi_x - ln phi_y: the next ln K. */
  next: number[];
  error: number;
  gibbs: number;
}

/** One substitution evaluation at ln K: Rachford-Rice, fugacities, the next ln K. */
function evaluate(
  model: ResidualModel,
  T: number,
  P: number,
  z: readonly number[],
  present: readonly number[],
  lnK: number[],
): SsState {
  const n = z.length;
  const K = new Array<number>(n).fill(1);
  for (const i of present) {
    K[i] = Math.exp(lnK[i]);
    // ln K beyond about +-709 (a very heavy trace far from its boiling point) under- or
    // overflows: a failed step for the callers (they try another start), not bad input
    if (!(K[i] > 0 && K[i] < Infinity)) {
      throw new SolverError(
        "two-phase split",
        `K of component ${i} is ${K[i]} (ln K = ${lnK[i]}), outside the floating-point range`,
      );
    }
  }
  const rr = solveRachfordRice(z, K);
  normalizeComposition(rr.x);
  normalizeComposition(rr.y);
  const fx = fug(model, T, P, rr.x);
  const fy = fug(model, T, P, rr.y);
  const next = new Array<number>(n).fill(0);
  let error = 0;
  for (const i of present) {
    next[i] = fx.lnPhi[i] - fy.lnPhi[i];
    error = Math.max(error, Math.abs(next[i] - lnK[i]));
  }
  const gibbs =
    rr.oneMinusBeta * phaseGibbs(rr.x, fx.lnPhi, present) +
    rr.beta * phaseGibbs(rr.y, fy.lnPhi, present);
  return {
    lnK,
    beta: rr.beta,
    oneMinusBeta: rr.oneMinusBeta,
    x: rr.x,
    y: rr.y,
    fx,
    fy,
    next,
    error,
    gibbs,
  };
}

function isTrivial(s: SsState, present: readonly number[]): boolean {
  let m = 0;
  for (const i of present) m = Math.max(m, Math.abs(s.lnK[i]));
  return m < 1e-4;
}

/**
 * Converges a two-phase split of feed z at T (K), P (Pa) from ln K (y over x).
 * Never throws for non-convergence (returns converged: false with a reason); model errors
 * (no density root) propagate.
 */
export function convergeTwoPhase(
  model: ResidualModel,
  T: number,
  P: number,
  z: readonly number[],
  present: readonly number[],
  lnK0: readonly number[],
  options: SplitOptions,
): SplitOutcome {
  let iterations = 0;
  let s: SsState;
  try {
    s = evaluate(model, T, P, z, present, lnK0.slice());
  } catch (e) {
    if (e instanceof SolverError)
      return fail(undefined, `the starting K-values give no split: ${e.message}`);
    throw e;
  }
  let prevDelta: number[] | undefined;
  let prevError = Infinity;
  let newtonAllowedAt = options.newtonAfter;
  let newtonTotal = 0;
  const n = z.length;
  while (iterations < options.maxIterations) {
    iterations++;
    if (s.error <= options.tolerance && s.beta > 0 && s.oneMinusBeta > 0) return done(s, true);
    if (isTrivial(s, present)) return fail(s, "trivial solution (the two phases became the same)");
    // Newton when substitution is slow: the error fell by less than half in the last step (near a
    // critical point the dominant eigenvalue of the substitution approaches one), or after three
    // times the allowed number of steps anyway
    const slow = s.error > 0.5 * prevError || iterations > 3 * options.newtonAfter;
    prevError = s.error;
    if (iterations > newtonAllowedAt && slow && s.beta > 0 && s.oneMinusBeta > 0) {
      const nt = newton(model, T, P, z, present, s, options, options.maxIterations - iterations);
      iterations += nt.iterations;
      newtonTotal += nt.iterations;
      if (nt.converged) return { ...nt.outcome, iterations, newtonIterations: newtonTotal };
      // Newton could not descend: five more substitution steps from where it ended first
      s = nt.state;
      newtonAllowedAt = iterations + 5;
    }
    const delta = new Array<number>(n).fill(0);
    for (const i of present) delta[i] = s.next[i] - s.lnK[i];
    // dominant-eigenvalue extrapolation every fifth step (Michelsen 1982), kept when it lowers
    // the Gibbs energy below the current split's (substitution itself decreases G)
    let candidate: SsState | undefined;
    if (iterations % 5 === 0 && prevDelta !== undefined && s.beta > 0 && s.oneMinusBeta > 0) {
      let num = 0;
      let den = 0;
      for (const i of present) {
        num += delta[i] * delta[i];
        den += prevDelta[i] * delta[i];
      }
      const lambda = den !== 0 ? num / den : 0;
      if (lambda > 0 && lambda < 1) {
        const jump = new Array<number>(n).fill(0);
        for (const i of present) jump[i] = s.next[i] + (delta[i] * lambda) / (1 - lambda);
        try {
          const accelerated = evaluate(model, T, P, z, present, jump);
          if (accelerated.beta > 0 && accelerated.oneMinusBeta > 0 && accelerated.gibbs < s.gibbs) {
            candidate = accelerated;
          }
        } catch (e) {
          if (!(e instanceof SolverError)) throw e;
        }
      }
    }
    if (candidate === undefined) {
      try {
        candidate = evaluate(model, T, P, z, present, s.next.slice());
      } catch (e) {
        if (e instanceof SolverError) {
          return fail(
            s,
            "the K-values collapsed to one side of 1 (no Rachford-Rice root): the split vanished",
          );
        }
        throw e;
      }
    }
    prevDelta = delta;
    s = candidate;
  }
  return fail(
    s,
    `not converged in ${options.maxIterations} iterations (last max |ln f(y) - ln f(x)| = ${s.error.toExponential(2)})`,
  );

  function done(
    st: SsState,
    converged: boolean,
    reason?: string,
    newtonIterations = 0,
  ): SplitOutcome {
    return {
      converged,
      phases: [
        { x: st.x, lnPhi: st.fx.lnPhi, densityMolPerM3: st.fx.rho, amount: st.oneMinusBeta },
        { x: st.y, lnPhi: st.fy.lnPhi, densityMolPerM3: st.fy.rho, amount: st.beta },
      ],
      error: st.error,
      iterations,
      newtonIterations,
      reason,
    };
  }
  function fail(st: SsState | undefined, reason: string): SplitOutcome {
    if (st === undefined) {
      const empty: WorkingPhase = { x: z.slice(), lnPhi: [], densityMolPerM3: NaN, amount: NaN };
      return {
        converged: false,
        phases: [empty, empty],
        error: Infinity,
        iterations,
        newtonIterations: 0,
        reason,
      };
    }
    return done(st, false, reason, newtonTotal);
  }
}

interface NewtonResult {
  converged: boolean;
  outcome: SplitOutcome;
  state: SsState;
  iterations: number;
}

/** Newton on the Gibbs energy in the y-phase mole numbers (see the header). */
function newton(
  model: ResidualModel,
  T: number,
  P: number,
  z: readonly number[],
  present: readonly number[],
  start: SsState,
  options: SplitOptions,
  budget: number,
): NewtonResult {
  const n = z.length;
  const m = present.length;
  // the mole numbers of the y phase, and the current Gibbs energy
  // the mole numbers of both phases: v_i in y, l_i = z_i - v_i in x. Each component moves in the
  // phase that holds less of it and the other is z_i minus that: a component almost all in one
  // phase (n-octane at 1e-10 in a CO2/H2S liquid beside 0.1 in a hydrocarbon liquid) would
  // otherwise get its small amount as z_i - v_i, good only to ulp(z_i) / l_i ~ 4e-7, and Newton
  // stalled at max |ln f difference| 4.5e-8 (campaign case 7864)
  let v = new Array<number>(n).fill(0);
  let l = new Array<number>(n).fill(0);
  for (const i of present) {
    v[i] = start.beta * start.y[i];
    l[i] = start.oneMinusBeta * start.x[i];
  }
  let cur = phasesFromMoles(v, l);
  let iterations = 0;
  let mu = 0;
  while (iterations < Math.max(1, budget)) {
    iterations++;
    const { V, L, x, y, fx, fy, gibbs } = cur;
    const g = new Array<number>(m);
    let err = 0;
    for (let a = 0; a < m; a++) {
      const i = present[a];
      g[a] = Math.log(y[i]) + fy.lnPhi[i] - Math.log(x[i]) - fx.lnPhi[i];
      err = Math.max(err, Math.abs(g[a]));
    }
    if (err <= options.tolerance) {
      const st = asState(cur, err);
      return { converged: true, outcome: outcomeOf(st, iterations), state: st, iterations };
    }
    const dy = fugacityDerivatives(model, T, fy.rho, y).dLnPhiDn;
    const dx = fugacityDerivatives(model, T, fx.rho, x).dLnPhiDn;
    const D = new Array<number>(m);
    for (let a = 0; a < m; a++) {
      const i = present[a];
      D[a] = Math.sqrt((V * L * x[i] * y[i]) / z[i]);
    }
    const Hs: number[][] = [];
    for (let a = 0; a < m; a++) {
      const i = present[a];
      const row = new Array<number>(m);
      for (let b = 0; b < m; b++) {
        const j = present[b];
        const kron = a === b ? 1 : 0;
        const h = (kron / y[i] - 1 + dy[i][j]) / V + (kron / x[i] - 1 + dx[i][j]) / L;
        row[b] = D[a] * h * D[b];
      }
      Hs.push(row);
    }
    const rhs = g.map((gi, a) => -D[a] * gi);
    let accepted = false;
    // the shift mu rises tenfold from 1e-8 (to 1e4 at most) until the step descends: near a
    // critical point the Hessian is indefinite by about 1e-6, and a shift restarted at 1e-3
    // after each unshifted step gave steps of 1e-7 in ln K, so Newton crept (campaign case 1209)
    for (let attempt = 0; attempt < 13 && !accepted; attempt++) {
      const A = Hs.map((row, a) => row.map((h, b) => (a === b ? h + mu : h)));
      let stepS: number[];
      try {
        stepS = solveLinear(A, rhs);
      } catch {
        mu = Math.max(1e-8, 10 * mu);
        continue;
      }
      const step = stepS.map((s, a) => s * D[a]);
      let slope = 0;
      for (let a = 0; a < m; a++) slope += g[a] * step[a];
      if (!(slope < 0)) {
        mu = Math.max(1e-8, 10 * mu);
        continue;
      }
      // the largest step keeping 0 < v_i < z_i (at most 0.9 of the way to a bound)
      let t = 1;
      for (let a = 0; a < m; a++) {
        const i = present[a];
        if (step[a] < 0) t = Math.min(t, (0.9 * v[i]) / -step[a]);
        else if (step[a] > 0) t = Math.min(t, (0.9 * l[i]) / step[a]);
      }
      for (let back = 0; back < 20; back++) {
        const trial = v.slice();
        const trialL = l.slice();
        for (let a = 0; a < m; a++) {
          const i = present[a];
          if (l[i] < v[i]) {
            trialL[i] = l[i] - t * step[a];
            trial[i] = z[i] - trialL[i];
          } else {
            trial[i] = v[i] + t * step[a];
            trialL[i] = z[i] - trial[i];
          }
        }
        let next: ReturnType<typeof phasesFromMoles>;
        try {
          next = phasesFromMoles(trial, trialL);
        } catch (e) {
          if (e instanceof SolverError) {
            t *= 0.5;
            continue;
          }
          throw e;
        }
        // a step is accepted when it decreases G enough (Armijo), or, near the solution where the
        // decrease of G (~ |g|^2) falls below the rounding of G itself, when it reduces the
        // gradient. Either alone is not enough: near a critical point the max-norm of the
        // gradient need not fall along a good step, and Newton stalled at |g| ~ 3e-7 with the
        // gradient test alone (H2S/n-butane 0.2 K from its critical point, campaign case 600)
        const decreases =
          next.gibbs <= gibbs + 1e-4 * t * slope || (err < 1e-5 && gradientNorm(next) < err);
        if (decreases) {
          v = trial;
          l = trialL;
          cur = next;
          accepted = true;
          mu = mu * 0.1 < 1e-8 ? 0 : mu * 0.1;
          break;
        }
        t *= 0.5;
      }
      if (!accepted) mu = Math.max(1e-8, 10 * mu);
    }
    if (!accepted) break;
  }
  const st = asState(cur, Infinity);
  return { converged: false, outcome: outcomeOf(st, iterations), state: st, iterations };

  function phasesFromMoles(vv: number[], ll: number[]) {
    let V = 0;
    let L = 0;
    for (const i of present) {
      V += vv[i];
      L += ll[i];
    }
    if (!(V > 0 && L > 0)) throw new SolverError("Newton flash step", "a phase amount left (0, 1)");
    const x = new Array<number>(n).fill(0);
    const y = new Array<number>(n).fill(0);
    for (const i of present) {
      y[i] = vv[i] / V;
      x[i] = ll[i] / L;
    }
    normalizeComposition(x);
    normalizeComposition(y);
    const fx = fug(model, T, P, x);
    const fy = fug(model, T, P, y);
    const gibbs = L * phaseGibbs(x, fx.lnPhi, present) + V * phaseGibbs(y, fy.lnPhi, present);
    return { V, L, x, y, fx, fy, gibbs };
  }
  function gradientNorm(c: ReturnType<typeof phasesFromMoles>): number {
    let e = 0;
    for (const i of present) {
      const gi = Math.log(c.y[i]) + c.fy.lnPhi[i] - Math.log(c.x[i]) - c.fx.lnPhi[i];
      e = Math.max(e, Math.abs(gi));
    }
    return e;
  }
  function asState(c: ReturnType<typeof phasesFromMoles>, err: number): SsState {
    const lnK = new Array<number>(n).fill(0);
    const next = new Array<number>(n).fill(0);
    for (const i of present) {
      lnK[i] = Math.log(c.y[i] / c.x[i]);
      next[i] = c.fx.lnPhi[i] - c.fy.lnPhi[i];
    }
    let e = 0;
    for (const i of present) e = Math.max(e, Math.abs(next[i] - lnK[i]));
    return {
      lnK,
      beta: c.V,
      oneMinusBeta: c.L,
      x: c.x,
      y: c.y,
      fx: c.fx,
      fy: c.fy,
      next,
      error: Number.isFinite(err) ? err : e,
      gibbs: c.gibbs,
    };
  }
  function outcomeOf(st: SsState, its: number): SplitOutcome {
    return {
      converged: st.error <= options.tolerance,
      phases: [
        { x: st.x, lnPhi: st.fx.lnPhi, densityMolPerM3: st.fx.rho, amount: st.oneMinusBeta },
        { x: st.y, lnPhi: st.fy.lnPhi, densityMolPerM3: st.fy.rho, amount: st.beta },
      ],
      error: st.error,
      iterations: its,
      newtonIterations: its,
    };
  }
}
