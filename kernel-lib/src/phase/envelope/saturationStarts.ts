/**
 * Starts of the saturation-point Newton runs and the first verified point among them: Wilson's
 * K-factors (wilson.ts), the caller's own start, and the incipient phase of Michelsen's
 * tangent-plane test (phase/stability.ts) at (T, P) guesses around the Wilson estimate. Shared by
 * the point functions (saturationPoint.ts) and the envelope's starting points (phaseEnvelope.ts).
 */
import { PhaseUnavailableError, SolverError } from "../../errors.js";
import { checkComposition } from "../../state/checkInputs.js";
import type { FluidBinding } from "../../state/types.js";
import { requirePositive } from "../../validate.js";
import { stabilityAtTP, type WilsonConstants } from "../stability.js";
import {
  solveSaturation,
  type SaturationSolution,
  type SaturationSystem,
} from "./saturationSystem.js";
import { verifyPoint, type VerifiedPoint } from "./verifyPoint.js";
import { wilsonLnK, wilsonTemperature } from "./wilson.js";

/** Where a converged Newton run started. */
export type StartKind = "wilson" | "stability test" | "given" | "envelope";

/** A caller's own start: the unknown (P at given T, T at given P; SI) and/or K-factors y/x. */
export interface SaturationStart {
  pressurePa?: number;
  temperatureK?: number;
  kFactors?: readonly number[];
}

/** A candidate starting vector and what it is, for the record of what was tried. */
export interface StartCandidate {
  X: number[];
  start: StartKind;
  note: string;
}

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

export interface Attempt {
  solution: SaturationSolution;
  point: VerifiedPoint;
  start: StartKind;
}

/** Runs Newton from each start in turn; returns the first verified point, else what happened. */
export function firstVerified(
  sys: SaturationSystem,
  starts: Iterable<StartCandidate>,
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
export function* stabilityStarts(
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

/** What {@link attemptAtPressure} found: a verified point, or the starts it tried. */
export interface PressureAttempt {
  readonly solution?: SaturationSolution;
  readonly point?: VerifiedPoint;
  readonly start?: StartKind;
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
  given?: SaturationStart,
): PressureAttempt {
  const P = pressurePa;
  const n = sys.z.length;
  const m = sys.present.length;
  const starts = function* (): Generator<{
    X: number[];
    start: StartKind;
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
