/**
 * The equations of a mixture saturation point with vapour fraction beta, in the variables
 * X = (ln K_1 .. ln K_m, ln T, ln P) of M. L. Michelsen, "Calculation of phase envelopes and
 * critical points for multicomponent mixtures", Fluid Phase Equilibria 4 (1980) 1-10, eqs. 1-4:
 *   F_i     = ln K_i + ln phi_i(T, P, y) - ln phi_i(T, P, x) = 0,   i = 1..m
 *   F_{m+1} = sum_i (y_i - x_i) = 0
 *   F_{m+2} = X_s - S = 0                                           (the specification)
 * with x_i = z_i / (1 - beta + beta K_i), y_i = K_i x_i (beta = 0: bubble point, x = z; beta = 1:
 * dew point, y = z). ln phi is homogeneous of degree zero in the mole numbers, so it is taken at
 * the normalised compositions and its mole-number derivatives are n (d ln phi_i / dn_j) / sum.
 * Only components present in the feed are variables (absent ones have no K-factor).
 *
 * Each phase is taken in its root of lowest Gibbs energy (state/fugacity.ts, "stable"), ln phi and
 * its T, P and composition derivatives from `fugacityDerivatives`; Newton's method with the
 * analytical Jacobian (Michelsen 1980, eqs. 5-8) and a step limit on ln T and ln P.
 */
import { PhaseUnavailableError, SolverError } from "../../errors.js";
import type { ResidualModel } from "../../eos/types.js";
import { solveLinear } from "../../numerics/linearSolve.js";
import { fugacityDerivatives, phaseFugacityAtTP } from "../../state/fugacity.js";

/** A mixture and the vapour fraction of the saturation line being solved. */
export interface SaturationSystem {
  readonly model: ResidualModel;
  /** Feed mole fractions, model order (normalised). */
  readonly z: readonly number[];
  /** Indices of the components present in the feed (the K-factor variables). */
  readonly present: readonly number[];
  /** Vapour fraction of the phase called y (0: bubble, 1: dew). */
  readonly beta: number;
}

/** The two phases at one X. */
export interface SaturationEvaluation {
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Normalised compositions of the x (beta = 0: feed) and y phases, model order. */
  readonly x: number[];
  readonly y: number[];
  readonly densityX: number;
  readonly densityY: number;
  readonly lnPhiX: number[];
  readonly lnPhiY: number[];
  /** Residuals F_1..F_{m+1} (without the specification). */
  readonly F: number[];
  /** Jacobian rows 1..m+1, each with m + 2 columns. */
  readonly J: number[][];
}

/** Phase compositions (normalised, model order) at X. */
function compositions(
  sys: SaturationSystem,
  X: readonly number[],
): { x: number[]; y: number[]; sx: number; sy: number; dx: number[]; dy: number[] } {
  const n = sys.z.length;
  const m = sys.present.length;
  const x = new Array<number>(n).fill(0);
  const y = new Array<number>(n).fill(0);
  const dx = new Array<number>(m);
  const dy = new Array<number>(m);
  let sx = 0;
  let sy = 0;
  const b = sys.beta;
  for (let p = 0; p < m; p++) {
    const i = sys.present[p];
    const K = Math.exp(X[p]);
    const t = 1 - b + b * K;
    x[i] = sys.z[i] / t;
    y[i] = K * x[i];
    // d x_i / d ln K_i and d y_i / d ln K_i
    dx[p] = (-x[i] * b * K) / t;
    dy[p] = (y[i] * (1 - b)) / t;
    sx += x[i];
    sy += y[i];
  }
  return { x, y, sx, sy, dx, dy };
}

/**
 * Residuals and Jacobian at X (see the header).
 * @throws PhaseUnavailableError when a phase has no mechanically stable root at (T, P).
 */
export function evaluateSaturation(
  sys: SaturationSystem,
  X: readonly number[],
): SaturationEvaluation {
  const m = sys.present.length;
  const T = Math.exp(X[m]);
  const P = Math.exp(X[m + 1]);
  if (!(T > 0 && T < Infinity && P > 0 && P < Infinity)) {
    throw new PhaseUnavailableError(
      `saturation iterate left the range of T and P (T = ${T} K, P = ${P} Pa)`,
    );
  }
  const c = compositions(sys, X);
  const xn = c.x.map((v) => v / c.sx);
  const yn = c.y.map((v) => v / c.sy);
  const fx = phaseFugacityAtTP(sys.model, T, P, xn, "stable");
  const fy = phaseFugacityAtTP(sys.model, T, P, yn, "stable");
  const dX = fugacityDerivatives(sys.model, T, fx.densityMolPerM3, xn);
  const dY = fugacityDerivatives(sys.model, T, fy.densityMolPerM3, yn);
  const F = new Array<number>(m + 1);
  const J: number[][] = [];
  let sum = 0;
  const lastRow = new Array<number>(m + 2).fill(0);
  for (let p = 0; p < m; p++) {
    const i = sys.present[p];
    F[p] = X[p] + fy.lnPhi[i] - fx.lnPhi[i];
    const row = new Array<number>(m + 2);
    for (let q = 0; q < m; q++) {
      const j = sys.present[q];
      row[q] =
        (p === q ? 1 : 0) +
        (dY.dLnPhiDn[i][j] * c.dy[q]) / c.sy -
        (dX.dLnPhiDn[i][j] * c.dx[q]) / c.sx;
    }
    row[m] = T * (dY.dLnPhiDT[i] - dX.dLnPhiDT[i]);
    row[m + 1] = P * (dY.dLnPhiDP[i] - dX.dLnPhiDP[i]);
    J.push(row);
    sum += c.y[i] - c.x[i];
    lastRow[p] = c.dy[p] - c.dx[p];
  }
  F[m] = sum;
  J.push(lastRow);
  return {
    temperatureK: T,
    pressurePa: P,
    x: xn,
    y: yn,
    densityX: fx.densityMolPerM3,
    densityY: fy.densityMolPerM3,
    lnPhiX: fx.lnPhi,
    lnPhiY: fy.lnPhi,
    F,
    J,
  };
}

/** Options of {@link solveSaturation}. */
export interface SaturationNewtonOptions {
  /** Convergence: max |F_i| (ln-fugacity differences and the composition sum). Default 1e-10. */
  tolerance?: number;
  /** Newton iterations. Default 30. */
  maxIterations?: number;
  /** Largest change of ln T or ln P in one step. Default 0.2. */
  maxLogStep?: number;
  /** Largest change of any ln K in one step. Default 1.5. */
  maxLnKStep?: number;
}

/** A converged saturation point in X. */
export interface SaturationSolution {
  readonly X: number[];
  readonly evaluation: SaturationEvaluation;
  /** The full (m + 2) x (m + 2) Jacobian at the solution, specification row last. */
  readonly jacobian: number[][];
  readonly specIndex: number;
  readonly iterations: number;
  /** max |F_i| at the solution. */
  readonly residual: number;
}

function maxAbs(v: readonly number[]): number {
  let r = 0;
  for (const a of v) r = Math.max(r, Math.abs(a));
  return r;
}

/**
 * Newton's method on the saturation equations with X[specIndex] fixed at `specValue`, from X0.
 * @throws SolverError when it does not converge (says where it stopped); PhaseUnavailableError
 *   when an iterate has no stable root and halving the step does not help.
 */
export function solveSaturation(
  sys: SaturationSystem,
  X0: readonly number[],
  specIndex: number,
  specValue: number,
  options: SaturationNewtonOptions = {},
): SaturationSolution {
  const tol = options.tolerance ?? 1e-10;
  const maxIt = options.maxIterations ?? 30;
  const maxLog = options.maxLogStep ?? 0.2;
  const maxLnK = options.maxLnKStep ?? 1.5;
  const m = sys.present.length;
  const X = X0.slice();
  X[specIndex] = specValue;
  let ev = evaluateSaturation(sys, X);
  let last = Infinity;
  for (let it = 0; it <= maxIt; it++) {
    const spec = new Array<number>(m + 2).fill(0);
    spec[specIndex] = 1;
    const J = [...ev.J, spec];
    const res = maxAbs(ev.F);
    if (res <= tol) {
      return { X, evaluation: ev, jacobian: J, specIndex, iterations: it, residual: res };
    }
    if (it === maxIt) break;
    const rhs = [...ev.F.map((f) => -f), 0];
    let step: number[];
    try {
      step = solveLinear(J, rhs);
    } catch {
      throw new SolverError(
        "Newton's method on the saturation equations (Michelsen 1980)",
        `singular Jacobian at T = ${ev.temperatureK.toPrecision(6)} K, P = ${ev.pressurePa.toPrecision(6)} Pa after ${it} iterations (max |F| = ${res.toExponential(2)})`,
      );
    }
    let scale = 1;
    for (let k = 0; k < m; k++)
      scale = Math.min(scale, maxLnK / Math.max(Math.abs(step[k]), 1e-300));
    scale = Math.min(scale, maxLog / Math.max(Math.abs(step[m]), 1e-300));
    scale = Math.min(scale, maxLog / Math.max(Math.abs(step[m + 1]), 1e-300));
    // halve the step while an iterate has no stable root
    let accepted = false;
    for (let h = 0; h < 8 && !accepted; h++) {
      const trial = X.map((v, k) => v + scale * step[k]);
      try {
        ev = evaluateSaturation(sys, trial);
        for (let k = 0; k < X.length; k++) X[k] = trial[k];
        accepted = true;
      } catch (e) {
        if (!(e instanceof PhaseUnavailableError)) throw e;
        scale *= 0.5;
      }
    }
    if (!accepted) {
      throw new PhaseUnavailableError(
        `saturation Newton step from T = ${ev.temperatureK.toPrecision(6)} K, P = ${ev.pressurePa.toPrecision(6)} Pa reached states without a stable density root, even halved 8 times`,
      );
    }
    last = res;
  }
  throw new SolverError(
    "Newton's method on the saturation equations (Michelsen 1980)",
    `no convergence in ${maxIt} iterations; last iterate T = ${ev.temperatureK.toPrecision(6)} K, P = ${ev.pressurePa.toPrecision(6)} Pa, max |F| = ${maxAbs(ev.F).toExponential(2)} (previous ${last.toExponential(2)})`,
  );
}

/** d X / d S along the line at a solution: J v = e_spec (the derivative of the specification). */
export function sensitivity(solution: SaturationSolution): number[] {
  const n = solution.jacobian.length;
  const rhs = new Array<number>(n).fill(0);
  rhs[n - 1] = 1;
  return solveLinear(solution.jacobian, rhs);
}
