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
import { checkComposition, checkPressure, checkTemperature } from "../../state/checkInputs.js";
import { stateAtTRho } from "../../state/stateAt.js";
import type { FluidBinding, FluidState } from "../../state/types.js";
import { stabilityAtTP, type WilsonConstants } from "../stability.js";
import {
  solveSaturation,
  type SaturationSolution,
  type SaturationSystem,
} from "./saturationSystem.js";
import { singleComponentPoint } from "./singleComponentPoint.js";
import { verifyPoint, type VerifiedPoint } from "./verifyPoint.js";
import { wilsonLnK, wilsonPressure, wilsonTemperature } from "./wilson.js";

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
  start?: { pressurePa?: number; temperatureK?: number; kFactors?: readonly number[] };
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
  readonly start: "wilson" | "stability test" | "given";
  readonly method: string;
  readonly model: ModelInfo;
  readonly warnings: readonly ResultWarning[];
}

const METHOD =
  "Newton on ln K, ln T, ln P (Michelsen, Fluid Phase Equilib. 4 (1980) 1-10) from Wilson K-factors or the tangent-plane test's incipient phase";

/** The model's own component constants (built-in models carry them). */
export function modelConstants(
  binding: FluidBinding,
  given?: readonly WilsonConstants[],
): readonly WilsonConstants[] | undefined {
  if (given !== undefined) return given;
  const c = (binding.model as { components?: readonly WilsonConstants[] }).components;
  return Array.isArray(c) ? c : undefined;
}

/** Checks the feed and builds the system (normalised z, present components). */
export function saturationSystemOf(
  binding: FluidBinding,
  z: readonly number[],
  beta: number,
  input = "z",
): SaturationSystem {
  const n = binding.model.info.componentIds.length;
  checkComposition(z, n, input);
  const present: number[] = [];
  let sum = 0;
  for (let i = 0; i < n; i++) {
    if (z[i] > 0) {
      present.push(i);
      sum += z[i];
    }
  }
  return { model: binding.model, z: z.map((v) => v / sum), present, beta };
}

/** X = (ln K of present components, ln T, ln P) from full-length ln K. */
export function startVector(
  sys: SaturationSystem,
  lnK: readonly number[],
  T: number,
  P: number,
): number[] {
  return [...sys.present.map((i) => lnK[i]), Math.log(T), Math.log(P)];
}

interface Attempt {
  solution: SaturationSolution;
  point: VerifiedPoint;
  start: MixtureSaturationPoint["start"];
}

/** Runs Newton from each start in turn; returns the first verified point, else what happened. */
function firstVerified(
  sys: SaturationSystem,
  starts: Iterable<{ X: number[]; start: MixtureSaturationPoint["start"]; note: string }>,
  specIndex: number,
  specValue: number,
  tolerance: number,
  maxIterations: number,
  trivialLnK: number,
): { attempt?: Attempt; tried: string[] } {
  const tried: string[] = [];
  for (const s of starts) {
    try {
      const solution = solveSaturation(sys, s.X, specIndex, specValue, {
        tolerance: tolerance * 0.1,
        maxIterations,
      });
      const v = verifyPoint(sys, solution, tolerance, trivialLnK);
      if (v.failure === undefined)
        return { attempt: { solution, point: v.point, start: s.start }, tried };
      tried.push(`${s.note}: ${v.failure}`);
    } catch (e) {
      if (!(e instanceof SolverError || e instanceof PhaseUnavailableError)) throw e;
      tried.push(`${s.note}: ${e.message}`);
    }
  }
  return { tried };
}

/** Starting vectors from the tangent-plane test's incipient phase at (T, P) guesses. */
function* stabilityStarts(
  binding: FluidBinding,
  sys: SaturationSystem,
  constants: readonly WilsonConstants[] | undefined,
  guesses: readonly { T: number; P: number }[],
): Generator<{ X: number[]; start: "stability test"; note: string }> {
  for (const g of guesses) {
    let w: readonly number[] | undefined;
    try {
      const test = stabilityAtTP(binding.model, g.T, g.P, sys.z, { constants });
      w = test.incipientComposition;
    } catch (e) {
      if (!(e instanceof PhaseUnavailableError)) throw e;
    }
    if (w === undefined) continue;
    // the incipient phase w is the y phase of a low vapour fraction, the x phase of a high one
    const lnK = sys.z.map((zi, i) =>
      zi > 0 && w[i] > 0 ? (sys.beta <= 0.5 ? Math.log(w[i] / zi) : Math.log(zi / w[i])) : 0,
    );
    yield {
      X: startVector(sys, lnK, g.T, g.P),
      start: "stability test",
      note: `start from the tangent-plane test at T = ${g.T.toPrecision(5)} K, P = ${g.P.toPrecision(5)} Pa`,
    };
  }
}

function checkOptions(options: SaturationPointOptions): {
  beta: number;
  tolerance: number;
  maxIterations: number;
  trivialLnK: number;
} {
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
  start: MixtureSaturationPoint["start"],
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

function pointOrError(
  binding: FluidBinding,
  sys: SaturationSystem,
  found: { attempt?: Attempt; tried: string[] },
  where: string,
): MixtureSaturationPoint {
  if (found.attempt === undefined) {
    throw new PhaseUnavailableError(
      `no saturation point with vapour fraction ${sys.beta} found ${where}: either none exists there (above the cricondentherm at given T, above the cricondenbar at given P, or the feed never splits) or every start failed. Tried: ${found.tried.join("; ") || "no start (Wilson's K-factors do not bracket a saturation point and the tangent-plane test found the feed stable)"}`,
    );
  }
  const a = found.attempt;
  return assemblePoint(binding, sys, a.point, a.solution.iterations, a.start, []);
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
 * @throws InputError for bad T, z or options; PhaseUnavailableError when no verified point is
 *   found (with every start tried and how it ended); OutOfRangeError when a phase cannot be
 *   returned as a full state (e.g. below the range of an ideal-gas cp correlation; the
 *   equilibrium itself does not need it, phaseEnvelope gives T, P and compositions only).
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
  const starts = function* (): Generator<{
    X: number[];
    start: MixtureSaturationPoint["start"];
    note: string;
  }> {
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
  const found = firstVerified(
    sys,
    starts(),
    m,
    Math.log(T),
    o.tolerance,
    o.maxIterations,
    o.trivialLnK,
  );
  return pointOrError(binding, sys, found, `at T = ${T} K`);
}

/** What {@link attemptAtPressure} found: a verified point, or the starts it tried. */
export interface PressureAttempt {
  readonly solution?: SaturationSolution;
  readonly point?: VerifiedPoint;
  readonly start?: MixtureSaturationPoint["start"];
  readonly tried: readonly string[];
}

/**
 * The saturation point of `sys` at P (Pa) from the given start, Wilson's start and the
 * tangent-plane test's starts in turn (no input checks: callers check).
 */
export function attemptAtPressure(
  binding: FluidBinding,
  sys: SaturationSystem,
  pressurePa: number,
  constants: readonly WilsonConstants[] | undefined,
  o: { tolerance: number; maxIterations: number; trivialLnK: number },
  given?: SaturationPointOptions["start"],
): PressureAttempt {
  const P = pressurePa;
  const n = sys.z.length;
  const m = sys.present.length;
  const starts = function* (): Generator<{
    X: number[];
    start: MixtureSaturationPoint["start"];
    note: string;
  }> {
    const Tgiven = given?.temperatureK;
    const kGiven = given?.kFactors;
    let Tw: number | undefined;
    if (constants !== undefined) Tw = wilsonTemperature(constants, sys.z, sys.present, sys.beta, P);
    if (Tgiven !== undefined || kGiven !== undefined) {
      const T0 = requirePositive("options.start.temperatureK", Tgiven ?? Tw ?? 300, "K");
      const lnK = kGiven
        ? kGiven.map(Math.log)
        : constants
          ? wilsonLnK(constants, T0, P)
          : new Array<number>(n).fill(0);
      yield { X: startVector(sys, lnK, T0, P), start: "given", note: "the given start" };
    }
    if (constants !== undefined && Tw !== undefined) {
      yield {
        X: startVector(sys, wilsonLnK(constants, Tw, P), Tw, P),
        start: "wilson",
        note: `Wilson start (T = ${Tw.toPrecision(5)} K)`,
      };
    }
    const T0 = Tw ?? 300;
    const guesses = [1, 0.95, 1.05, 0.9, 1.1, 0.8, 1.2].map((f) => ({ T: T0 * f, P }));
    yield* stabilityStarts(binding, sys, constants, guesses);
  };
  const found = firstVerified(
    sys,
    starts(),
    m + 1,
    Math.log(P),
    o.tolerance,
    o.maxIterations,
    o.trivialLnK,
  );
  return found.attempt === undefined
    ? { tried: found.tried }
    : { ...found.attempt, tried: found.tried };
}

/**
 * The saturation point of a mixture z at pressure P (Pa): its temperature and phases.
 * At a pressure with two points of the same vapour fraction (the retrograde region), the one
 * Newton reaches from the start is returned; give `options.start.temperatureK` for the other.
 * @throws as {@link saturationPointAtTemperature}.
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
  return pointOrError(binding, sys, found, `at P = ${pressurePa} Pa`);
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
