/**
 * Continuation of one saturation line of fixed vapour fraction beta through the P-T plane:
 * M. L. Michelsen, "Calculation of phase envelopes and critical points for multicomponent
 * mixtures", Fluid Phase Equilibria 4 (1980) 1-10 (sections 3-4).
 *
 * Variables X = (ln K_1..ln K_m, ln T, ln P) (saturationSystem.ts). At each converged point the
 * sensitivity dX/dS (J dX/dS = e_spec) gives the tangent of the line; the next specified variable
 * is the one that changes fastest along it, the next point is predicted along the tangent and
 * corrected by Newton. The step grows when Newton needs few iterations and shrinks when it needs
 * many or fails, and is capped in every variable.
 * At the critical point the ln K vector reverses (all ln K change sign, save those near zero
 * anyway): when the specified variable is a ln K approaching
 * zero, the step jumps symmetrically across it (Michelsen 1980, section 4), and the crossing is
 * located by cubic Hermite interpolation of ln T and ln P in that ln K, using the tangents at the
 * two points. The cricondenbar (d ln P = 0 along the line) and the cricondentherm (d ln T = 0)
 * are bracketed by a sign change of the tangent and located exactly by Brent's method on the
 * condition, each evaluation a converged point. Every point is verified (verifyPoint.ts); by
 * default the feed at every point is also given the tangent-plane test (phase/stability.ts): a
 * negative tangent-plane distance means a third phase (a liquid-liquid split, e.g. with water),
 * the line beyond is not a stable vapour-liquid boundary, and the trace stops saying so.
 */
import { PhaseUnavailableError, SolverError } from "../../errors.js";
import { findRootBrent } from "../../numerics/brent.js";
import { stabilityAtTP, type WilsonConstants } from "../stability.js";
import {
  sensitivity,
  solveSaturation,
  type SaturationSolution,
  type SaturationSystem,
} from "./saturationSystem.js";
import { verifyPoint, type VerifiedPoint } from "./verifyPoint.js";

/** Step control and limits of a trace (all logarithmic steps are in ln units). */
export interface TraceSettings {
  /** The trace ends when the line comes back down to this pressure, Pa. */
  readonly minimumPressurePa: number;
  /** The trace stops (incomplete) above this pressure, Pa. */
  readonly maximumPressurePa: number;
  /** The trace stops (incomplete) below this temperature, K. */
  readonly minimumTemperatureK: number;
  readonly maxPoints: number;
  /** First step in the specified variable. */
  readonly initialStep: number;
  /** Largest step of ln T along the line. */
  readonly maxLnTStep: number;
  /** Largest step of ln P along the line. */
  readonly maxLnPStep: number;
  /** Largest change of any ln K in one step. */
  readonly maxLnKStep: number;
  /** The trace stops when the step has been halved below this. */
  readonly minStep: number;
  /** Half-width of the symmetric jump across the critical point in the specified ln K. */
  readonly criticalJump: number;
  /** Equal-fugacity tolerance of every point. */
  readonly tolerance: number;
  /** Tangent-plane test of the feed at every n-th point (0: never). */
  readonly stabilityStride: number;
  readonly constants?: readonly WilsonConstants[];
}

/** A verified point of a line with its tangent (dX per unit of the specified variable). */
export interface TracedPoint {
  readonly X: readonly number[];
  readonly point: VerifiedPoint;
  /** Tangent along the direction of travel, scaled to max |component| = 1. */
  readonly tangent: readonly number[];
  readonly specIndex: number;
}

/** An extremum or crossing located on the line. */
export interface LineLandmark {
  readonly T: number;
  readonly P: number;
  /** Index of the point after which it lies. */
  readonly after: number;
}

/** The outcome of one trace. */
export interface LineTrace {
  readonly points: TracedPoint[];
  readonly critical: LineLandmark[];
  readonly maxPressure: LineLandmark[];
  readonly maxTemperature: LineLandmark[];
  /** True when the line came back down to the minimum pressure. */
  readonly complete: boolean;
  readonly stoppedBecause?: string;
  /** Notes for the result's warnings (e.g. a landmark that could not be refined). */
  readonly notes: string[];
}

// near the critical point the tangent-plane test's successive substitution is slow and a third
// phase there is not what it looks for: the check is skipped while every |ln K| is below this
const NEAR_CRITICAL_LNK = 0.5;
// iterations per trial of that check: a well-separated third phase (an aqueous liquid) shows a
// negative tangent-plane distance within a few successive substitutions from Wilson's liquid-like
// start; the check is a search for such a phase, not a proof of stability
const STABILITY_ITERATIONS = 12;

function tangentAt(
  sol: SaturationSolution,
  previous: readonly number[] | undefined,
  fallbackSign: number,
): number[] {
  const v = sensitivity(sol);
  let sign = fallbackSign;
  if (previous !== undefined) {
    let dot = 0;
    for (let k = 0; k < v.length; k++) dot += v[k] * previous[k];
    sign = dot >= 0 ? 1 : -1;
  }
  let big = 0;
  for (const a of v) big = Math.max(big, Math.abs(a));
  return v.map((a) => (sign * a) / big);
}

function argMaxAbs(v: readonly number[]): number {
  let k = 0;
  for (let i = 1; i < v.length; i++) if (Math.abs(v[i]) > Math.abs(v[k])) k = i;
  return k;
}

/** Cubic Hermite value at u of f with values f0, f1 and slopes d0, d1 at u0, u1. */
function hermite(
  u: number,
  u0: number,
  u1: number,
  f0: number,
  f1: number,
  d0: number,
  d1: number,
): number {
  const h = u1 - u0;
  const t = (u - u0) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (
    (2 * t3 - 3 * t2 + 1) * f0 +
    (t3 - 2 * t2 + t) * h * d0 +
    (-2 * t3 + 3 * t2) * f1 +
    (t3 - t2) * h * d1
  );
}

function describe(T: number, P: number): string {
  return `T = ${T.toPrecision(6)} K, P = ${P.toPrecision(6)} Pa`;
}

/** Feed (x phase) stability at a point: undefined when stable, else the reason. */
function thirdPhase(
  sys: SaturationSystem,
  p: VerifiedPoint,
  constants: readonly WilsonConstants[] | undefined,
): string | undefined {
  // the x and y phases share one tangent plane (equal fugacities), so testing one tests both
  let test;
  try {
    test = stabilityAtTP(sys.model, p.temperatureK, p.pressurePa, p.x, {
      constants,
      maxIterations: STABILITY_ITERATIONS,
    });
  } catch (e) {
    if (e instanceof PhaseUnavailableError) return undefined;
    throw e;
  }
  if (test.stable) return undefined;
  const w = test.incipientComposition ?? [];
  const ids = sys.model.info.componentIds;
  const named = w
    .map((v, i) => ({ v, id: ids[i] }))
    .filter((e) => e.v > 1e-3)
    .map((e) => `${e.id} ${e.v.toFixed(3)}`)
    .join(", ");
  return `at ${describe(p.temperatureK, p.pressurePa)} the two phases of this line are not stable: a third phase (${named}) has tangent-plane distance ${test.minimumTangentPlaneDistance.toExponential(2)} < 0 (Michelsen's test), so the line beyond is a metastable continuation (a liquid-liquid split interrupts the vapour-liquid boundary)`;
}

/**
 * Traces the line of `sys.beta` from the converged start (specified ln P, at the minimum
 * pressure), upward in pressure first.
 */
export function traceLine(
  sys: SaturationSystem,
  start: SaturationSolution,
  s: TraceSettings,
): LineTrace {
  const m = sys.present.length;
  const iT = m;
  const iP = m + 1;
  const points: TracedPoint[] = [];
  const critical: LineLandmark[] = [];
  const maxPressure: LineLandmark[] = [];
  const maxTemperature: LineLandmark[] = [];
  const notes: string[] = [];
  const lnPmin = Math.log(s.minimumPressurePa);
  const result = (complete: boolean, stoppedBecause?: string): LineTrace => ({
    points,
    critical,
    maxPressure,
    maxTemperature,
    complete,
    stoppedBecause,
    notes,
  });

  const first = verifyPoint(sys, start, s.tolerance, 1e-8);
  if (first.failure !== undefined) {
    return result(false, `the starting point failed verification: ${first.failure}`);
  }
  if (s.stabilityStride > 0) {
    const why = thirdPhase(sys, first.point, s.constants);
    if (why !== undefined) return result(false, `at the starting point: ${why}`);
  }
  points.push({
    X: start.X,
    point: first.point,
    tangent: tangentAt(start, undefined, 1),
    specIndex: start.specIndex,
  });
  let step = s.initialStep;
  let risen = false;

  const solveAt = (
    Xpred: readonly number[],
    k: number,
    value: number,
  ): { sol: SaturationSolution; point: VerifiedPoint } | string => {
    try {
      const sol = solveSaturation(sys, Xpred, k, value, {
        tolerance: s.tolerance * 0.1,
        maxIterations: 12,
        maxLogStep: 2 * Math.max(s.maxLnTStep, s.maxLnPStep),
        maxLnKStep: 2 * s.maxLnKStep,
      });
      const v = verifyPoint(sys, sol, s.tolerance, 1e-8);
      if (v.failure !== undefined) return v.failure;
      return { sol, point: v.point };
    } catch (e) {
      if (e instanceof SolverError || e instanceof PhaseUnavailableError) return e.message;
      throw e;
    }
  };

  while (points.length < s.maxPoints) {
    const cur = points[points.length - 1];
    const t = cur.tangent;
    const k = argMaxAbs(t);
    const X = cur.X;
    const dirK = Math.sign(t[k]);
    // step in X_k along the travel direction, capped so no variable moves too far
    let d = step;
    for (let j = 0; j < m; j++)
      d = Math.min(d, s.maxLnKStep / Math.max(Math.abs(t[j] / t[k]), 1e-12));
    d = Math.min(d, s.maxLnTStep / Math.max(Math.abs(t[iT] / t[k]), 1e-12));
    d = Math.min(d, s.maxLnPStep / Math.max(Math.abs(t[iP] / t[k]), 1e-12));
    let target = X[k] + dirK * d;
    let jumped = false;
    if (k < m) {
      // approaching the critical point: cross ln K_k = 0 by a symmetric jump
      const u = X[k];
      if (Math.sign(target) !== Math.sign(u) || Math.abs(target) < s.criticalJump) {
        if (Math.abs(u) <= 2 * s.criticalJump) {
          target = -u;
          jumped = true;
        } else {
          target = Math.sign(u) * s.criticalJump;
        }
      }
    }
    // the end: back down at the minimum pressure
    let ending = false;
    const predictedLnP = X[iP] + (t[iP] / t[k]) * (target - X[k]);
    if (risen && t[iP] < 0 && predictedLnP <= lnPmin) ending = true;
    let attempt: { sol: SaturationSolution; point: VerifiedPoint } | string;
    let Xpred: number[];
    if (ending) {
      const frac = (lnPmin - X[iP]) / t[iP];
      Xpred = X.map((v, j) => v + t[j] * frac);
      attempt = solveAt(Xpred, iP, lnPmin);
    } else {
      Xpred = predict(points, k, target);
      attempt = solveAt(Xpred, k, target);
    }
    if (typeof attempt === "string") {
      step *= 0.5;
      if (step < s.minStep) {
        return result(
          false,
          `the continuation could not get past ${describe(cur.point.temperatureK, cur.point.pressurePa)} (step halved below ${s.minStep}): ${attempt}`,
        );
      }
      continue;
    }
    const { sol, point } = attempt;
    const move = sol.X.map((v, j) => v - X[j]);
    const tangent = tangentAt(sol, move, 1);
    // a point that went backwards along the line (Newton fell onto another branch) is refused
    let forward = 0;
    for (let j = 0; j < move.length; j++) forward += move[j] * t[j];
    if (!(forward > 0)) {
      step *= 0.5;
      if (step < s.minStep) {
        return result(
          false,
          `the continuation turned back at ${describe(cur.point.temperatureK, cur.point.pressurePa)} (step halved below ${s.minStep})`,
        );
      }
      continue;
    }
    if (
      s.stabilityStride > 0 &&
      points.length % s.stabilityStride === 0 &&
      point.maxLnK > NEAR_CRITICAL_LNK
    ) {
      const why = thirdPhase(sys, point, s.constants);
      if (why !== undefined) return result(false, why);
    }
    const next: TracedPoint = { X: sol.X, point, tangent, specIndex: sol.specIndex };
    const after = points.length - 1;
    points.push(next);
    if (point.pressurePa > 1.5 * s.minimumPressurePa) risen = true;
    // landmarks between cur and next
    const crossing = criticalCrossing(cur, next, m);
    if (crossing !== undefined) critical.push({ ...crossing, after });
    if (cur.tangent[iP] > 0 && tangent[iP] <= 0) {
      const lm = refineExtremum(sys, s, cur, next, iP, solveAt);
      if (typeof lm === "string") notes.push(lm);
      else maxPressure.push({ ...lm, after });
    }
    if (cur.tangent[iT] > 0 && tangent[iT] <= 0) {
      const lm = refineExtremum(sys, s, cur, next, iT, solveAt);
      if (typeof lm === "string") notes.push(lm);
      else maxTemperature.push({ ...lm, after });
    }
    if (ending) return result(true);
    if (point.pressurePa > s.maximumPressurePa) {
      return result(
        false,
        `the line rose above the maximum pressure ${s.maximumPressurePa} Pa at ${describe(point.temperatureK, point.pressurePa)} without turning (no cricondenbar below it: a liquid-liquid or gas-gas boundary, or raise options.maximumPressurePa)`,
      );
    }
    if (point.temperatureK < s.minimumTemperatureK) {
      return result(
        false,
        `the line fell below the minimum temperature ${s.minimumTemperatureK} K at ${describe(point.temperatureK, point.pressurePa)}`,
      );
    }
    // step control: aim at about four Newton iterations
    const its = sol.iterations;
    if (!jumped) step = its <= 3 ? Math.min(step * 1.6, 1) : its >= 6 ? step * 0.6 : step;
  }
  return result(false, `the maximum number of points (${s.maxPoints}) was reached`);
}

/**
 * X at X_k = target: cubic Hermite extrapolation through the last two points and their tangents
 * (Michelsen 1980, section 3) when X_k is monotonic between them, else linear along the tangent.
 */
function predict(points: readonly TracedPoint[], k: number, target: number): number[] {
  const b = points[points.length - 1];
  const tb = b.tangent;
  const linear = (): number[] => b.X.map((v, j) => v + (tb[j] / tb[k]) * (target - b.X[k]));
  if (points.length < 2) return linear();
  const a = points[points.length - 2];
  const ta = a.tangent;
  const span = b.X[k] - a.X[k];
  if (!(ta[k] * tb[k] > 0 && span * tb[k] > 0 && Math.abs(target - b.X[k]) < 3 * Math.abs(span))) {
    return linear();
  }
  return b.X.map((v, j) =>
    hermite(target, a.X[k], b.X[k], a.X[j], v, ta[j] / ta[k], tb[j] / tb[k]),
  );
}

/** The critical point between two points whose ln K all changed sign (undefined otherwise). */
function criticalCrossing(
  a: TracedPoint,
  b: TracedPoint,
  m: number,
): { T: number; P: number } | undefined {
  // the K-factor vector reverses: its largest component changes sign and the vectors point in
  // opposite directions (a component whose K is near 1 anyway, e.g. CO2 in a rich gas, may keep
  // its sign across the critical point)
  let p = 0;
  for (let j = 1; j < m; j++) if (Math.abs(a.X[j]) > Math.abs(a.X[p])) p = j;
  if (!(a.X[p] * b.X[p] < 0)) return undefined;
  let dot = 0;
  for (let j = 0; j < m; j++) dot += a.X[j] * b.X[j];
  if (!(dot < 0)) return undefined;
  const u0 = a.X[p];
  const u1 = b.X[p];
  const lnT = hermite(
    0,
    u0,
    u1,
    a.X[m],
    b.X[m],
    a.tangent[m] / a.tangent[p],
    b.tangent[m] / b.tangent[p],
  );
  const lnP = hermite(
    0,
    u0,
    u1,
    a.X[m + 1],
    b.X[m + 1],
    a.tangent[m + 1] / a.tangent[p],
    b.tangent[m + 1] / b.tangent[p],
  );
  return { T: Math.exp(lnT), P: Math.exp(lnP) };
}

/**
 * The point between a and b where the tangent's component `which` (ln T or ln P) is zero, by
 * Brent's method on that component in the variable that changes most between a and b.
 */
function refineExtremum(
  sys: SaturationSystem,
  s: TraceSettings,
  a: TracedPoint,
  b: TracedPoint,
  which: number,
  solveAt: (
    X: readonly number[],
    k: number,
    v: number,
  ) => { sol: SaturationSolution; point: VerifiedPoint } | string,
): { T: number; P: number } | string {
  let k = which === 0 ? 1 : 0;
  for (let j = 0; j < a.X.length; j++) {
    if (j === which) continue;
    if (Math.abs(b.X[j] - a.X[j]) > Math.abs(b.X[k] - a.X[k])) k = j;
  }
  const Sa = a.X[k];
  const Sb = b.X[k];
  const label = which === sys.present.length ? "cricondentherm" : "cricondenbar";
  let last: VerifiedPoint | undefined;
  const g = (S: number): number => {
    const f = (S - Sa) / (Sb - Sa);
    const Xi = a.X.map((v, j) => v + f * (b.X[j] - v));
    const r = solveAt(Xi, k, S);
    if (typeof r === "string") throw new SolverError(`${label} refinement`, r);
    last = r.point;
    const v = sensitivity(r.sol);
    return v[which] / v[k];
  };
  try {
    const ga = a.tangent[which] / a.tangent[k];
    const gb = b.tangent[which] / b.tangent[k];
    if (!(ga * gb <= 0)) return `${label}: no sign change to refine between two points`;
    const root = findRootBrent(g, Sa, Sb, { tolerance: 1e-11, maxIterations: 60 });
    g(root.value);
    if (last === undefined) return `${label}: refinement produced no point`;
    return { T: last.temperatureK, P: last.pressurePa };
  } catch (e) {
    if (e instanceof SolverError || e instanceof PhaseUnavailableError) {
      return `${label} could not be refined between ${describe(a.point.temperatureK, a.point.pressurePa)} and ${describe(b.point.temperatureK, b.point.pressurePa)}: ${e.message}`;
    }
    throw e;
  }
}
