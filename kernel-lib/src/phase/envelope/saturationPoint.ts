/**
 * Bubble points, dew points and points of any vapour fraction beta of a mixture at given T or at
 * given P: Newton's method on (ln K, ln T, ln P) with the specification ln T or ln P fixed
 * (M. L. Michelsen, Fluid Phase Equilibria 4 (1980) 1-10; equations in saturationSystem.ts),
 * started from Wilson's K-factors (wilson.ts); when that start fails or falls into the trivial
 * solution, from the incipient phase of Michelsen's tangent-plane test (phase/stability.ts) at
 * the Wilson estimate and at points around it. Every result is verified (verifyPoint.ts) and
 * carries both phases as full states; otherwise a typed error says what was tried.
 */
import {
  InputError,
  PhaseUnavailableError,
  SolverError,
  type ResultWarning,
} from "../../errors.js";
import type { ModelInfo } from "../../eos/types.js";
import { requireCount, requireInRange, requirePositive } from "../../validate.js";
import { checkPressure, checkTemperature } from "../../state/checkInputs.js";
import { stateAtTRho } from "../../state/stateAt.js";
import type { FluidBinding, FluidState } from "../../state/types.js";
import { stabilityAtTP, type WilsonConstants } from "../stability.js";
import type { SaturationSystem } from "./saturationSystem.js";
import { singleComponentPoint } from "./singleComponentPoint.js";
import type { VerifiedPoint } from "./verifyPoint.js";
import { wilsonLnK, wilsonPressure } from "./wilson.js";
import { phaseEnvelope, type PhaseEnvelope } from "./phaseEnvelope.js";
import {
  attemptAtPressure,
  firstVerified,
  modelConstants,
  saturationSystemOf,
  stabilityStarts,
  startVector,
  type Attempt,
  type SaturationStart,
  type StartCandidate,
  type StartKind,
} from "./saturationStarts.js";

/** Options of {@link saturationPointAtTemperature} and {@link saturationPointAtPressure}. */
export interface SaturationPointOptions {
  /**
   * Vapour fraction beta of the line, mol/mol: 0 a bubble point (the feed is all liquid),
   * 1 a dew point (the feed is all vapour), between them a point of that quality. Default 0.
   */
  vaporFraction?: number;
  /** Largest ln-fugacity difference accepted in the result. Default 1e-10. */
  tolerance?: number;
  /** Newton iterations per start. Default 40. */
  maxIterations?: number;
  /**
   * A solution whose every |ln K| is at most this is the trivial one (both phases the feed) and
   * is refused. Default 1e-4.
   */
  trivialLnK?: number;
  /** Critical constants for Wilson's K-factors; default the model's own components. */
  constants?: readonly WilsonConstants[];
  /** Your own start: the unknown (P at given T, T at given P; SI) and/or K-factors y/x. */
  start?: SaturationStart;
}

/** Kind of a saturation point, from the phases found (not from the request). */
export type SaturationKind = "bubble" | "dew" | "two-phase";

/** A verified mixture saturation point. */
export interface MixtureSaturationPoint {
  /**
   * "bubble": the feed is the liquid and an incipient vapour appears; "dew": the feed is the
   * vapour and an incipient liquid appears; "two-phase": 0 < vapour fraction < 1.
   */
  readonly kind: SaturationKind;
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Vapour fraction of the lighter phase, mol/mol. */
  readonly vaporFraction: number;
  /** Feed mole fractions. */
  readonly z: readonly number[];
  /** Composition of the incipient phase (bubble or dew points only). */
  readonly incipient?: readonly number[];
  /** The lighter phase as a full state. */
  readonly vapor: FluidState;
  /** The denser phase as a full state. */
  readonly liquid: FluidState;
  /** max_i |ln f_i(vapour) - ln f_i(liquid)|, recomputed at the result. */
  readonly fugacityResidual: number;
  readonly iterations: number;
  /** Where the converged Newton run started. */
  readonly start: StartKind;
  readonly method: string;
  readonly model: ModelInfo;
  readonly warnings: readonly ResultWarning[];
}

const METHOD =
  "Newton on ln K, ln T, ln P (Michelsen, Fluid Phase Equilib. 4 (1980) 1-10) from Wilson K-factors or the tangent-plane test's incipient phase";

function checkOptions(options: SaturationPointOptions): CheckedOptions {
  return {
    beta: requireInRange("options.vaporFraction", options.vaporFraction ?? 0, "mol/mol", 0, 1),
    tolerance: requirePositive("options.tolerance", options.tolerance ?? 1e-10, "-"),
    maxIterations: requireCount("options.maxIterations", options.maxIterations ?? 40),
    trivialLnK: requirePositive("options.trivialLnK", options.trivialLnK ?? 1e-4, "-"),
  };
}

function checkStartK(k: readonly number[] | undefined, n: number): void {
  if (k === undefined) return;
  if (!(Array.isArray(k) && k.length === n && k.every((v) => v > 0 && v < Infinity))) {
    throw new InputError({
      input: "options.start.kFactors",
      unit: "-",
      validRange: `${n} finite positive K-factors`,
      received: k,
    });
  }
}

/** Builds the public result from a verified point. */
export function assemblePoint(
  binding: FluidBinding,
  sys: SaturationSystem,
  point: VerifiedPoint,
  iterations: number,
  start: StartKind,
  warnings: readonly ResultWarning[],
): MixtureSaturationPoint {
  const T = point.temperatureK;
  const yLighter = point.densityY < point.densityX;
  const stateX = stateAtTRho(binding, T, point.densityX, point.x);
  const stateY = stateAtTRho(binding, T, point.densityY, point.y);
  const beta = sys.beta;
  let kind: SaturationKind = "two-phase";
  let incipient: readonly number[] | undefined;
  if (beta === 0) {
    kind = yLighter ? "bubble" : "dew";
    incipient = point.y;
  } else if (beta === 1) {
    kind = yLighter ? "dew" : "bubble";
    incipient = point.x;
  }
  return {
    kind,
    temperatureK: T,
    pressurePa: point.pressurePa,
    vaporFraction: yLighter ? beta : 1 - beta,
    z: sys.z.slice(),
    incipient,
    vapor: yLighter ? stateY : stateX,
    liquid: yLighter ? stateX : stateY,
    fugacityResidual: point.fugacityResidual,
    iterations,
    start,
    method: METHOD,
    model: binding.model.info,
    warnings,
  };
}

/** Options after their checks. */
interface CheckedOptions {
  beta: number;
  tolerance: number;
  maxIterations: number;
  trivialLnK: number;
}

/**
 * The envelope of z (without its own checks) and the starts it offers at T or P: the envelope's
 * neighbouring points of the requested kind that bracket the given value, interpolated in ln P
 * (or ln T) and in the incipient composition. Only for bubble and dew points.
 */
function envelopeStarts(
  binding: FluidBinding,
  sys: SaturationSystem,
  given: { T: number } | { P: number },
  constants: readonly WilsonConstants[] | undefined,
): { envelope?: PhaseEnvelope; starts: StartCandidate[]; otherKindHere: boolean } {
  if (sys.beta !== 0 && sys.beta !== 1) return { starts: [], otherKindHere: false };
  let envelope: PhaseEnvelope;
  try {
    envelope = phaseEnvelope(binding, sys.z, {
      stabilityStride: 0,
      checkCritical: false,
      constants,
    });
  } catch (e) {
    if (e instanceof SolverError || e instanceof PhaseUnavailableError) {
      return { starts: [], otherKindHere: false };
    }
    throw e;
  }
  const starts: StartCandidate[] = [];
  let otherKindHere = false;
  const wanted = sys.beta === 0 ? "bubble" : "dew";
  const pts = envelope.points;
  const atT = "T" in given;
  const v = atT ? given.T : given.P;
  for (let k = 1; k < pts.length; k++) {
    const a = pts[k - 1];
    const b = pts[k];
    if (a.segment !== b.segment || a.kind !== b.kind) continue;
    const va = atT ? a.T : a.P;
    const vb = atT ? b.T : b.P;
    if (!((va - v) * (vb - v) <= 0 && va !== vb)) continue;
    if (a.kind !== wanted) {
      otherKindHere = true;
      continue;
    }
    const f = Math.log(v / va) / Math.log(vb / va);
    const T = atT ? v : Math.exp(Math.log(a.T) + f * Math.log(b.T / a.T));
    const P = atT ? Math.exp(Math.log(a.P) + f * Math.log(b.P / a.P)) : v;
    const w = a.incipient.map((wa, i) => wa + f * (b.incipient[i] - wa));
    // the incipient phase is y of a bubble-point system (beta 0), x of a dew-point one (beta 1)
    const lnK = sys.z.map((zi, i) =>
      zi > 0 && w[i] > 0 ? (sys.beta === 0 ? Math.log(w[i] / zi) : Math.log(zi / w[i])) : 0,
    );
    starts.push({
      X: startVector(sys, lnK, T, P),
      start: "envelope",
      note: `start from the phase envelope (${a.kind} line near T = ${T.toPrecision(5)} K, P = ${P.toPrecision(5)} Pa)`,
    });
  }
  return { envelope, starts, otherKindHere };
}

/** The verified point, or a PhaseUnavailableError that says why there is none. */
function pointOrError(
  binding: FluidBinding,
  sys: SaturationSystem,
  found: { attempt?: Attempt; tried: string[] },
  given: { T: number } | { P: number },
  constants: readonly WilsonConstants[] | undefined,
  o: CheckedOptions,
): MixtureSaturationPoint {
  const atT = "T" in given;
  const where = atT ? `at T = ${given.T} K` : `at P = ${given.P} Pa`;
  let attempt = found.attempt;
  let envelope: PhaseEnvelope | undefined;
  let otherKindHere = false;
  if (attempt === undefined) {
    // last resort: the envelope itself, which also tells whether a point can exist here
    const e = envelopeStarts(binding, sys, given, constants);
    envelope = e.envelope;
    otherKindHere = e.otherKindHere;
    const more = firstVerified(
      sys,
      e.starts,
      sys.present.length + (atT ? 0 : 1),
      Math.log(atT ? given.T : given.P),
      o.tolerance,
      o.maxIterations,
      o.trivialLnK,
    );
    attempt = more.attempt;
    found.tried.push(...more.tried);
  }
  if (attempt === undefined) {
    let why = "";
    if (envelope?.complete) {
      const kind = sys.beta === 0 ? "bubble" : "dew";
      const top = atT ? envelope.cricondentherm : envelope.cricondenbar;
      if (top && atT && given.T > top.T) {
        why = `: ${given.T} K is above the cricondentherm of this mixture (${top.T.toPrecision(6)} K at ${top.P.toPrecision(6)} Pa), so no saturation point exists at this temperature`;
      } else if (top && !atT && given.P > top.P) {
        why = `: ${given.P} Pa is above the cricondenbar of this mixture (${top.P.toPrecision(6)} Pa at ${top.T.toPrecision(6)} K), so no saturation point exists at this pressure`;
      } else if (otherKindHere) {
        const other = kind === "bubble" ? "dew" : "bubble";
        why = `: the mixture's envelope has only ${other} points ${where} (e.g. between the critical point and the cricondentherm a gas has dew points, no bubble point)`;
      }
    }
    throw new PhaseUnavailableError(
      `no saturation point with vapour fraction ${sys.beta} found ${where}${why}. Tried: ${found.tried.join("; ") || "no start (Wilson's K-factors do not bracket a saturation point and the tangent-plane test found the feed stable)"}`,
    );
  }
  return assemblePoint(
    binding,
    sys,
    attempt.point,
    attempt.solution.iterations,
    attempt.start,
    thirdPhaseWarnings(sys, attempt.point, constants),
  );
}

/**
 * A warning when the two phases are not the stable ones: a third phase (e.g. water, a second
 * liquid) has a negative tangent-plane distance at the point (both phases share one tangent
 * plane, so testing one tests both).
 */
function thirdPhaseWarnings(
  sys: SaturationSystem,
  p: VerifiedPoint,
  constants: readonly WilsonConstants[] | undefined,
): ResultWarning[] {
  let test;
  try {
    test = stabilityAtTP(sys.model, p.temperatureK, p.pressurePa, p.x, { constants });
  } catch (e) {
    if (e instanceof PhaseUnavailableError) return [];
    throw e;
  }
  if (test.stable) return [];
  const ids = sys.model.info.componentIds;
  const w = (test.incipientComposition ?? [])
    .map((v, i) => ({ v, id: ids[i] }))
    .filter((e) => e.v > 1e-3)
    .map((e) => `${e.id} ${e.v.toFixed(3)}`)
    .join(", ");
  return [
    {
      code: "phase-split",
      message: `saturation point at T = ${p.temperatureK.toPrecision(6)} K, P = ${p.pressurePa.toPrecision(6)} Pa: a third phase (${w}) has a negative tangent-plane distance (${test.minimumTangentPlaneDistance.toExponential(2)}), so this two-phase point is metastable (a liquid-liquid split, e.g. water)`,
    },
  ];
}

/**
 * The saturation point of a mixture z at temperature T (K): its pressure and phases.
 *
 * @example
 * ```ts
 * const p = saturationPointAtTemperature(fluid, 300, [0.5, 0.5]); // bubble point
 * p.pressurePa; p.incipient; // the first bubble's composition
 * saturationPointAtTemperature(fluid, 300, [0.5, 0.5], { vaporFraction: 1 }); // dew point
 * ```
 * At a temperature with two points of the same kind (the retrograde region of a gas: an upper
 * and a lower dew point), the one Newton reaches from the start is returned; give
 * `options.start.pressurePa` for the other.
 * @throws InputError for bad T, z or options; PhaseUnavailableError when no verified point is
 *   found (with every start tried and how it ended, and, for bubble and dew points, whether T
 *   lies above the cricondentherm); OutOfRangeError when a phase cannot be returned as a full
 *   state (e.g. below the range of an ideal-gas cp correlation; the equilibrium itself does not
 *   need it, phaseEnvelope gives T, P and compositions only).
 */
export function saturationPointAtTemperature(
  binding: FluidBinding,
  temperatureK: number,
  z: readonly number[],
  options: SaturationPointOptions = {},
): MixtureSaturationPoint {
  checkTemperature(temperatureK);
  const o = checkOptions(options);
  const sys = saturationSystemOf(binding, z, o.beta);
  const n = sys.z.length;
  checkStartK(options.start?.kFactors, n);
  const constants = modelConstants(binding, options.constants);
  const T = temperatureK;
  const m = sys.present.length;
  if (m < 2) {
    const one = singleComponentPoint(
      sys,
      { temperatureK: T },
      constants,
      o.tolerance,
      o.maxIterations,
    );
    return assemblePoint(binding, sys, one.point, one.iterations, "wilson", []);
  }
  const starts = function* (): Generator<StartCandidate> {
    const Pgiven = options.start?.pressurePa;
    const kGiven = options.start?.kFactors;
    let Pw: number | undefined;
    if (constants !== undefined) Pw = wilsonPressure(constants, sys.z, sys.present, sys.beta, T);
    if (Pgiven !== undefined || kGiven !== undefined) {
      const P0 = requirePositive("options.start.pressurePa", Pgiven ?? Pw ?? 1e5, "Pa");
      const lnK = kGiven
        ? kGiven.map(Math.log)
        : constants
          ? wilsonLnK(constants, T, P0)
          : new Array<number>(n).fill(0);
      yield { X: startVector(sys, lnK, T, P0), start: "given", note: "the given start" };
    }
    if (constants !== undefined && Pw !== undefined) {
      yield {
        X: startVector(sys, wilsonLnK(constants, T, Pw), T, Pw),
        start: "wilson",
        note: `Wilson start (P = ${Pw.toPrecision(5)} Pa)`,
      };
    }
    const P0 = Pw ?? 1e5;
    const guesses = [1, 0.8, 1.25, 0.6, 1.6, 0.4, 2.5].map((f) => ({ T, P: P0 * f }));
    yield* stabilityStarts(binding, sys, constants, guesses);
  };
  const found = firstVerified(
    sys,
    starts(),
    m,
    Math.log(T),
    o.tolerance,
    o.maxIterations,
    o.trivialLnK,
  );
  return pointOrError(binding, sys, found, { T }, constants, o);
}

/**
 * The saturation point of a mixture z at pressure P (Pa): its temperature and phases.
 * At a pressure with two points of the same vapour fraction (the retrograde region), the one
 * Newton reaches from the start is returned; give `options.start.temperatureK` for the other.
 * @throws as {@link saturationPointAtTemperature} (above the cricondenbar for P).
 */
export function saturationPointAtPressure(
  binding: FluidBinding,
  pressurePa: number,
  z: readonly number[],
  options: SaturationPointOptions = {},
): MixtureSaturationPoint {
  checkPressure(pressurePa);
  const o = checkOptions(options);
  const sys = saturationSystemOf(binding, z, o.beta);
  checkStartK(options.start?.kFactors, sys.z.length);
  const constants = modelConstants(binding, options.constants);
  if (sys.present.length < 2) {
    const one = singleComponentPoint(sys, { pressurePa }, constants, o.tolerance, o.maxIterations);
    return assemblePoint(binding, sys, one.point, one.iterations, "wilson", []);
  }
  const a = attemptAtPressure(binding, sys, pressurePa, constants, o, options.start);
  const found =
    a.solution && a.point && a.start
      ? { attempt: { solution: a.solution, point: a.point, start: a.start }, tried: [...a.tried] }
      : { tried: [...a.tried] };
  return pointOrError(binding, sys, found, { P: pressurePa }, constants, o);
}

/** Refuses a point of the wrong kind (a bubble-point request that found a dew point, ...). */
export function requireKind(
  point: MixtureSaturationPoint,
  kind: "bubble" | "dew",
  where: string,
): MixtureSaturationPoint {
  if (point.kind !== kind) {
    throw new PhaseUnavailableError(
      `no ${kind} point ${where}: the point found there (T = ${point.temperatureK.toPrecision(6)} K, P = ${point.pressurePa.toPrecision(6)} Pa) is a ${point.kind} point (the incipient phase is ${point.kind === "dew" ? "denser" : "lighter"} than the feed); ask for a ${point.kind} point, or trace the envelope`,
    );
  }
  return point;
}
