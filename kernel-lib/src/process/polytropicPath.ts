/**
 * Exact integration of the polytropic path of a compressor or expander on the real fluid.
 *
 * The polytropic efficiency eta_p is defined along the path by dh = v dP / eta_p (compression)
 * or dh = eta_p v dP (expansion) (A. Stodola, Steam and Gas Turbines, 1927; J. M. Schultz, "The
 * polytropic analysis of centrifugal compressors", J. Eng. Power 84 (1962) 69-82, eq. 1); with
 * k = dh / (v dP), the path is an ordinary differential equation in ln P.
 *
 * Single-phase route (the default while the fluid is one phase): with dh = cp dT + v (1 - T alpha)
 * dP (alpha the volume expansivity), the path is
 *     d ln T / d ln P = P v (k - 1 + T alpha) / (cp T),
 * integrated by the classical fourth-order Runge-Kutta method on a uniform grid in ln P with
 * step doubling (N = 2, 4, 8, ... steps): the error of the finer solution is estimated by
 * Richardson's rule |y_2N - y_N| / (2^4 - 1) and converted to a relative error of the enthalpy
 * change, |dT| cp / |h_out - h_in|; the step count doubles until that meets the tolerance. For an
 * ideal gas with constant cp the right side is constant and the closed form T2/T1 =
 * (P2/P1)^(R k / cp) is reproduced to round-off.
 *
 * Equilibrium route (the inlet or a state on the path has more than one phase): the same ODE in
 * the form dh / d ln P = k P v(P, h), with v the overall molar volume of the verified (P, h)
 * flash, and the same step doubling on h.
 *
 * Every returned node is a flash: the ends with the full stability tests, the interior nodes of
 * the single-phase route with the Wilson-started test only (FlashOptions.extraTrials "none",
 * stated in the method). A node with more than one phase sends the integration to the
 * equilibrium route. The polytropic head is found twice: (h_out - h_in) / k from the end states,
 * and the integral of v dP along the path, integrated as a second component of the same
 * Runge-Kutta system (its Richardson estimate is held to the same tolerance); the two must agree.
 */
import { R as R_CODATA } from "../constants.js";
import { InputError, SolverError } from "../errors.js";
import type { Fluid } from "../fluid/defineFluid.js";
import { overallProperty, type StateFlashOptions } from "../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../phase/flash/types.js";

/** Options of the exact polytropic path. */
export interface PolytropicPathOptions {
  /**
   * Largest estimated relative error of the enthalpy change h_out - h_in and of the head
   * (Richardson estimates of the step-doubled Runge-Kutta solution). Default 1e-9.
   */
  tolerance?: number;
  /** First number of Runge-Kutta steps (even). Default 2. */
  initialSteps?: number;
  /** Most steps before a SolverError. Default 4096. */
  maxSteps?: number;
  /** States returned on the path, ends included (at most the steps + 1). Default 9. */
  pathPoints?: number;
  /** Options of the flashes. */
  flash?: StateFlashOptions;
}

/** The integrated path. */
export interface PolytropicPath {
  /** The inlet, the interior nodes and the outlet (full flash at the end). */
  readonly path: readonly Equilibrium[];
  readonly outlet: Equilibrium;
  /** "single-phase" (T form) or "equilibrium" (h form with (P, h) flashes). */
  readonly route: "single-phase" | "equilibrium";
  /** Runge-Kutta steps of the accepted solution. */
  readonly steps: number;
  /** Estimated relative error of the enthalpy change. */
  readonly errorEstimate: number;
  readonly tolerance: number;
  /** h_out - h_in, J/mol (from the end states). */
  readonly enthalpyChangeJPerMol: number;
  /** Integral of v dP along the path (a second component of the Runge-Kutta system), J/mol. */
  readonly headByQuadratureJPerMol: number;
  /** |(h_out - h_in) / k - integral v dP| / |integral v dP|. */
  readonly headConsistency: number;
  /** True when a node had more than one phase (the path crosses the two-phase region). */
  readonly crossedTwoPhase: boolean;
  /** Single-phase states (or flashes, on the equilibrium route) evaluated. */
  readonly evaluations: number;
  /** What was done, one sentence. */
  readonly method: string;
}

interface Solution {
  y: number;
  /** The integral of v dP = integral of P v d ln P, integrated beside y by the same steps. */
  head: number;
  /** ln P and y at every grid node. */
  lnP: Float64Array;
  ys: Float64Array;
}

/**
 * Classical RK4 on a uniform grid in ln P; the head (integral of P v d ln P) is integrated as a
 * second component of the same system, with the same stages.
 */
function rk4(
  f: (lnP: number, y: number) => { slope: number; pv: number },
  lnP1: number,
  lnP2: number,
  y1: number,
  n: number,
): Solution {
  const h = (lnP2 - lnP1) / n;
  const lnP = new Float64Array(n + 1);
  const ys = new Float64Array(n + 1);
  let y = y1;
  let head = 0;
  for (let i = 0; i < n; i++) {
    const x = lnP1 + i * h;
    lnP[i] = x;
    ys[i] = y;
    const a = f(x, y);
    const b = f(x + h / 2, y + (h / 2) * a.slope);
    const c = f(x + h / 2, y + (h / 2) * b.slope);
    const d = f(x + h, y + h * c.slope);
    y += (h / 6) * (a.slope + 2 * b.slope + 2 * c.slope + d.slope);
    head += (h / 6) * (a.pv + 2 * b.pv + 2 * c.pv + d.pv);
  }
  lnP[n] = lnP2;
  ys[n] = y;
  return { y, head, lnP, ys };
}

/** Richardson error estimate of the head of the finer solution, relative. */
function headError(fine: Solution, coarse: Solution): number {
  return Math.abs(fine.head - coarse.head) / 15 / Math.max(Math.abs(fine.head), 1e-300);
}

/** Indices of up to m nodes of an n-step grid, ends included. */
function thin(n: number, m: number): number[] {
  const count = Math.min(m, n + 1);
  const out: number[] = [];
  for (let i = 0; i < count; i++) out.push(Math.round((i * n) / (count - 1)));
  return [...new Set(out)];
}

/**
 * Integrates the polytropic path from an inlet equilibrium to pressure P2.
 *
 * @param k - dh / (v dP) along the path: 1/eta_p for compression, eta_p for expansion, 1 for
 *   the isentrope.
 * @throws InputError for bad options; SolverError when the step count exceeds maxSteps or a
 *   check fails.
 */
export function integratePolytropicPath(
  fluid: Fluid,
  z: readonly number[],
  inlet: Equilibrium,
  P2: number,
  k: number,
  options: PolytropicPathOptions = {},
): PolytropicPath {
  const tol = options.tolerance ?? 1e-9;
  if (!(tol > 0 && tol < 0.1)) {
    throw new InputError({
      input: "polytropic.tolerance",
      unit: "-",
      validRange: "between 0 and 0.1",
      received: tol,
    });
  }
  const n0 = options.initialSteps ?? 2;
  if (!(Number.isInteger(n0) && n0 >= 2 && n0 % 2 === 0)) {
    throw new InputError({
      input: "polytropic.initialSteps",
      unit: "-",
      validRange: "an even integer >= 2",
      received: n0,
    });
  }
  const maxSteps = options.maxSteps ?? 4096;
  if (!(Number.isInteger(maxSteps) && maxSteps >= n0)) {
    throw new InputError({
      input: "polytropic.maxSteps",
      unit: "-",
      validRange: `an integer >= initialSteps (${n0})`,
      received: maxSteps,
    });
  }
  const pathPoints = options.pathPoints ?? 9;
  if (!(Number.isInteger(pathPoints) && pathPoints >= 2)) {
    throw new InputError({
      input: "polytropic.pathPoints",
      unit: "-",
      validRange: "an integer >= 2",
      received: pathPoints,
    });
  }
  const P1 = inlet.pressurePa;
  const lnP1 = Math.log(P1);
  const lnP2 = Math.log(P2);
  const h1 = overallProperty(inlet, "h");
  if (inlet.phases.length === 1) {
    const single = singlePhaseRoute(
      fluid,
      z,
      inlet,
      P2,
      k,
      tol,
      n0,
      maxSteps,
      pathPoints,
      options.flash,
    );
    if (single !== undefined) return single;
  }
  return equilibriumRoute(
    fluid,
    z,
    inlet,
    h1,
    lnP1,
    lnP2,
    k,
    tol,
    n0,
    maxSteps,
    pathPoints,
    options.flash,
  );
}

function singlePhaseRoute(
  fluid: Fluid,
  z: readonly number[],
  inlet: Equilibrium,
  P2: number,
  k: number,
  tol: number,
  n0: number,
  maxSteps: number,
  pathPoints: number,
  flash: StateFlashOptions | undefined,
): PolytropicPath | undefined {
  const P1 = inlet.pressurePa;
  const lnP1 = Math.log(P1);
  const lnP2 = Math.log(P2);
  const h1 = overallProperty(inlet, "h");
  let evaluations = 0;
  const f = (lnP: number, lnT: number): { slope: number; pv: number } => {
    evaluations++;
    const P = Math.exp(lnP);
    const T = Math.exp(lnT);
    const s = fluid.stateAtTP(T, P, z);
    const pv = P / s.densityMolPerM3;
    return { slope: (pv * (k - 1 + T * s.thermalExpansionPerK)) / (s.molar.cp * T), pv };
  };
  let n = n0;
  let coarse = rk4(f, lnP1, lnP2, Math.log(inlet.temperatureK), n);
  for (;;) {
    if (2 * n > maxSteps) {
      throw new SolverError(
        "exact polytropic path (RK4 with step doubling)",
        `the error estimate did not meet ${tol} within ${maxSteps} steps from ${inlet.temperatureK} K, ${P1} Pa to ${P2} Pa`,
      );
    }
    n *= 2;
    const fine = rk4(f, lnP1, lnP2, Math.log(inlet.temperatureK), n);
    const T2 = Math.exp(fine.y);
    const dT = (T2 * Math.abs(fine.y - coarse.y)) / 15;
    const end = fluid.stateAtTP(T2, P2, z);
    const dh = end.molar.h - h1;
    const R = fluid.model.gasConstant ?? R_CODATA;
    // relative to the enthalpy change, floored at R T * 1e-6 (a near-zero pressure ratio)
    const err = Math.max(
      (dT * end.molar.cp) / Math.max(Math.abs(dh), 1e-6 * R * T2),
      headError(fine, coarse),
    );
    if (err <= tol) {
      // the nodes as flashes: the ends with full stability tests, interior Wilson-started
      const idx = thin(n, pathPoints);
      const path: Equilibrium[] = [inlet];
      for (const i of idx.slice(1, -1)) {
        const eq = fluid.flashTP(Math.exp(fine.ys[i]), Math.exp(fine.lnP[i]), z, {
          ...flash,
          extraTrials: "none",
        });
        if (eq.phases.length > 1) return undefined;
        path.push(eq);
      }
      const outlet = fluid.flashTP(T2, P2, z, flash);
      if (outlet.phases.length > 1) return undefined;
      path.push(outlet);
      const dhOut = overallProperty(outlet, "h") - h1;
      const head = fine.head;
      const consistency = Math.abs(dhOut / k - head) / Math.max(Math.abs(head), 1e-300);
      checkConsistency(consistency, tol);
      return {
        path,
        outlet,
        route: "single-phase",
        steps: n,
        errorEstimate: err,
        tolerance: tol,
        enthalpyChangeJPerMol: dhOut,
        headByQuadratureJPerMol: head,
        headConsistency: consistency,
        crossedTwoPhase: false,
        evaluations,
        method: `d ln T / d ln P = P v (k - 1 + T alpha) / (cp T) with k = ${k.toPrecision(6)}, classical Runge-Kutta on ${n} steps uniform in ln P (step doubling from ${n0}, Richardson error estimate ${err.toExponential(2)} of the enthalpy change, tolerance ${tol}); every state one phase (ends: full tangent-plane tests; ${idx.length - 2} interior nodes: Wilson-started tests)`,
      };
    }
    coarse = fine;
  }
}

function checkConsistency(consistency: number, tol: number): void {
  // both are held to the tolerance by their error estimates; a gap of many times the tolerance
  // means the path and its end states disagree
  if (!(consistency <= Math.max(1e-6, 1e3 * tol))) {
    throw new SolverError(
      "exact polytropic path: head check",
      `(h_out - h_in) / k and the integral of v dP along the path differ by ${consistency.toExponential(3)} relative`,
    );
  }
}

function equilibriumRoute(
  fluid: Fluid,
  z: readonly number[],
  inlet: Equilibrium,
  h1: number,
  lnP1: number,
  lnP2: number,
  k: number,
  tol: number,
  n0: number,
  maxSteps: number,
  pathPoints: number,
  flash: StateFlashOptions | undefined,
): PolytropicPath {
  let evaluations = 0;
  const R = fluid.model.gasConstant ?? R_CODATA;
  const f = (lnP: number, h: number): { slope: number; pv: number } => {
    evaluations++;
    const P = Math.exp(lnP);
    const eq = lnP === lnP1 && h === h1 ? inlet : fluid.flashPH(P, h, z, flash);
    const pv = P * overallProperty(eq, "v");
    return { slope: k * pv, pv };
  };
  let n = n0;
  let coarse = rk4(f, lnP1, lnP2, h1, n);
  for (;;) {
    if (2 * n > maxSteps) {
      throw new SolverError(
        "exact polytropic path through two phases (RK4 on h with (P, h) flashes, step doubling)",
        `the error estimate did not meet ${tol} within ${maxSteps} steps from ${inlet.temperatureK} K, ${inlet.pressurePa} Pa to ${Math.exp(lnP2)} Pa`,
      );
    }
    n *= 2;
    const fine = rk4(f, lnP1, lnP2, h1, n);
    const err = Math.max(
      Math.abs(fine.y - coarse.y) /
        15 /
        Math.max(Math.abs(fine.y - h1), 1e-6 * R * inlet.temperatureK),
      headError(fine, coarse),
    );
    if (err <= tol) {
      const idx = thin(n, pathPoints);
      const path: Equilibrium[] = [inlet];
      for (const i of idx.slice(1))
        path.push(fluid.flashPH(Math.exp(fine.lnP[i]), fine.ys[i], z, flash));
      const outlet = path[path.length - 1];
      const dh = overallProperty(outlet, "h") - h1;
      const head = fine.head;
      const consistency = Math.abs(dh / k - head) / Math.max(Math.abs(head), 1e-300);
      checkConsistency(consistency, tol);
      return {
        path,
        outlet,
        route: "equilibrium",
        steps: n,
        errorEstimate: err,
        tolerance: tol,
        enthalpyChangeJPerMol: dh,
        headByQuadratureJPerMol: head,
        headConsistency: consistency,
        crossedTwoPhase: true,
        evaluations,
        method: `dh / d ln P = k P v(P, h) with k = ${k.toPrecision(6)} and v from the (P, h) flash (the path has more than one phase), classical Runge-Kutta on ${n} steps uniform in ln P (step doubling from ${n0}, Richardson error estimate ${err.toExponential(2)} of the enthalpy change, tolerance ${tol})`,
      };
    }
    coarse = fine;
  }
}
