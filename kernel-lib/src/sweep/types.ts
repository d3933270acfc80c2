/**
 * The shapes of a sweep: many states of one fluid at once, from arrays or ranges of a
 * specification pair, written into typed arrays (one Float64Array per wanted property, a phase
 * count and kind per point, an error code per point). No per-point objects leave a sweep.
 */
import type { ModelInfo } from "../eos/types.js";
import type { ReferenceState } from "../idealgas/types.js";
import type { ResultWarning } from "../errors.js";
import type { FlashOptions } from "../phase/flash/flashTP.js";
import type { StateFlashOptions } from "../phase/flash/stateFunctionFlash.js";

/**
 * The specification pair of every point: "TP" (K, Pa), "TRho" (K, mol/m3), "PH" (Pa, J/mol or
 * J/kg with basis "mass"), "PS" (Pa, J/(mol K) or J/(kg K)). The first variable is the outer
 * (row) axis of a grid.
 */
export type SweepSpecification = "TP" | "TRho" | "PH" | "PS";

/**
 * Properties a sweep can write (units in {@link SWEEP_UNITS}; energies per mol, or per kg with
 * basis "mass"): T, P; rho (mol/m3), rhoMass (kg/m3), Z; absolute h, s, u, a, g, cp, cv in the
 * fluid's reference state; w (speed of sound, m/s), jt (Joule-Thomson, K/Pa), kappaT (1/Pa),
 * beta (1/K); departures at the same T and P: hRes, sRes, uRes, aRes, gRes, cpRes, cvRes;
 * quality (vapour mole fraction: 1 for one vapour phase, 0 for one liquid, NaN supercritical).
 * Properties of one phase (cp, cv, w, jt, kappaT, beta, cpRes, cvRes) are NaN at split points.
 */
export type SweepProperty =
  | "T"
  | "P"
  | "rho"
  | "rhoMass"
  | "Z"
  | "h"
  | "s"
  | "u"
  | "a"
  | "g"
  | "cp"
  | "cv"
  | "w"
  | "jt"
  | "kappaT"
  | "beta"
  | "hRes"
  | "sRes"
  | "uRes"
  | "aRes"
  | "gRes"
  | "cpRes"
  | "cvRes"
  | "quality";

/** Every sweep property, in a fixed order (the column order of tables). */
export const SWEEP_PROPERTIES: readonly SweepProperty[] = [
  "T",
  "P",
  "rho",
  "rhoMass",
  "Z",
  "h",
  "s",
  "u",
  "a",
  "g",
  "cp",
  "cv",
  "w",
  "jt",
  "kappaT",
  "beta",
  "hRes",
  "sRes",
  "uRes",
  "aRes",
  "gRes",
  "cpRes",
  "cvRes",
  "quality",
];

/** Units of each property, molar basis. */
export const SWEEP_UNITS: Readonly<Record<SweepProperty, string>> = {
  T: "K",
  P: "Pa",
  rho: "mol/m3",
  rhoMass: "kg/m3",
  Z: "-",
  h: "J/mol",
  s: "J/(mol K)",
  u: "J/mol",
  a: "J/mol",
  g: "J/mol",
  cp: "J/(mol K)",
  cv: "J/(mol K)",
  w: "m/s",
  jt: "K/Pa",
  kappaT: "1/Pa",
  beta: "1/K",
  hRes: "J/mol",
  sRes: "J/(mol K)",
  uRes: "J/mol",
  aRes: "J/mol",
  gRes: "J/mol",
  cpRes: "J/(mol K)",
  cvRes: "J/(mol K)",
  quality: "mol/mol",
};

/** Properties given per mol (or per kg with basis "mass"). */
export const PER_AMOUNT: ReadonlySet<SweepProperty> = new Set<SweepProperty>([
  "h",
  "s",
  "u",
  "a",
  "g",
  "cp",
  "cv",
  "hRes",
  "sRes",
  "uRes",
  "aRes",
  "gRes",
  "cpRes",
  "cvRes",
]);

/** The unit of a property in a basis. */
export function sweepUnit(property: SweepProperty, basis: "molar" | "mass"): string {
  const u = SWEEP_UNITS[property];
  return basis === "mass" && PER_AMOUNT.has(property) ? u.replace("mol", "kg") : u;
}

/**
 * A range of values: `count` points from `from` to `to` inclusive, evenly spaced ("linear",
 * default) or evenly spaced in the logarithm ("log", both ends positive).
 */
export interface SweepRange {
  readonly from: number;
  readonly to: number;
  readonly count: number;
  readonly spacing?: "linear" | "log";
}

/** Values of one axis: a list, a typed array or a range. */
export type SweepAxis = readonly number[] | Float64Array | SweepRange;

/**
 * How mixture points are tested for a phase split at (T, P) and (T, rho):
 *  - "flash" (default): every (T, P) point goes through the fluid's flashTP (stability tests and
 *    the verification of phase/flash/); a split point gets the overall properties of its phases.
 *  - "stability": one tangent-plane test per point (Wilson starts only, cheaper); a stable point
 *    is evaluated as one phase, a split point is flashed.
 *  - "none": no test; points are evaluated as one phase and the result's warnings say so (the
 *    caller knows the region is one phase, e.g. above the cricondentherm).
 * (T, rho) mixture points found unstable are flagged (code "two-phase-not-flashed"): no
 * (T, V) flash exists yet. Pure fluids need no test: their (T, P) state is the stable root, and
 * their (T, rho) points inside the dome are split by the lever rule (phase/twoPhaseState.ts).
 * (P, h) and (P, s) points always go through the fluid's flashPH / flashPS.
 */
export type SweepPhaseCheck = "flash" | "stability" | "none";

/** What a sweep computes. */
export interface SweepRequest {
  /** The specification pair (see {@link SweepSpecification}). */
  readonly specification: SweepSpecification;
  /** Values of the first variable (T for "TP" and "TRho", P for "PH" and "PS"). */
  readonly first: SweepAxis;
  /** Values of the second variable (P, rho, h or s). */
  readonly second: SweepAxis;
  /**
   * "grid" (default): every pair of the two axes, first-major (point i * n2 + j has first[i],
   * second[j]); "pairs": point k is (first[k], second[k]), both of one length.
   */
  readonly layout?: "grid" | "pairs";
  /** Properties to write. */
  readonly properties: readonly SweepProperty[];
  /** Mole fractions (omit for a pure fluid). */
  readonly x?: readonly number[];
  /** "molar" (default) or "mass": the basis of energies, entropies and heat capacities (and of h, s given for "PH", "PS"). */
  readonly basis?: "molar" | "mass";
  /** Mixtures: how points are tested for a split. Default "flash". */
  readonly phaseCheck?: SweepPhaseCheck;
  /** Options of the flashes (tolerances, stability trials). */
  readonly flash?: FlashOptions;
  /** Options of the (P, h) and (P, s) flashes. */
  readonly stateFlash?: StateFlashOptions;
  /**
   * "exact" (default): every point equals the single state (stateAtTP) to the last bit. "fast":
   * (T, P) points of a cubic with one real Z root take a Newton root started from the previous
   * point of the row (verified: one real root by the discriminant, converged, residual at
   * rounding level) and one logarithm ln(Z - B) for ln(1 - b rho) + ln Z; the results differ from
   * the single state by rounding, at most 1e-10 relative (floor: R T for energies, R for entropies,
   * 1 for Z; see DEVELOPERS.md "Sweep benchmarks"). Other points and models take the exact route.
   * The start depends on the points before in the row, so sweepOnWorkers hands out whole rows
   * of such a grid and its results equal the one-thread run to the last bit.
   */
  readonly precision?: "exact" | "fast";
}

/**
 * Per-point error codes (the side array): 0 none; the others leave the point's properties NaN
 * and say why in {@link SweepResult.errors} (the first messages).
 */
export const SWEEP_ERROR_CODES = {
  none: 0,
  /** An input of the point is outside its valid range (e.g. T <= 0, P above the model's limit). */
  "bad-input": 1,
  /** The model has no (requested) density root there. */
  "no-phase": 2,
  /** An iteration (flash, inversion, saturation) failed; its message says what was tried. */
  "solver-failed": 3,
  /** A mixture (T, rho) point that is not stable as one phase: flagged, not flashed. */
  "two-phase-not-flashed": 4,
  /** Anything else (the message names it). */
  other: 5,
} as const;

/** Name of an error code. */
export type SweepErrorName = keyof typeof SWEEP_ERROR_CODES;

/**
 * Phase-kind codes per point: 0 none (error), 1 vapour, 2 liquid, 3 supercritical, 4 vapour +
 * liquid, 5 two liquids, 6 vapour + two liquids. The phase count array holds 0 to 3.
 */
export const SWEEP_PHASE_KINDS = {
  none: 0,
  vapor: 1,
  liquid: 2,
  supercritical: 3,
  "vapor-liquid": 4,
  "liquid-liquid": 5,
  "vapor-liquid-liquid": 6,
} as const;

/** Name of a phase-kind code. */
export type SweepPhaseKindName = keyof typeof SWEEP_PHASE_KINDS;

/** One point's failure (the first {@link MAX_ERROR_MESSAGES} are kept). */
export interface SweepPointError {
  readonly index: number;
  readonly code: SweepErrorName;
  readonly message: string;
}

/** Messages kept per sweep; the codes of every point are in `errorCode`. */
export const MAX_ERROR_MESSAGES = 100;

/** The output of a sweep. */
export interface SweepResult {
  readonly specification: SweepSpecification;
  readonly layout: "grid" | "pairs";
  /** Number of points. */
  readonly count: number;
  /** Grid shape [first, second] (pairs: [count, 1]). */
  readonly shape: readonly [number, number];
  /** The axis values (a grid's two axes; for pairs, both point lists). */
  readonly firstAxis: Float64Array;
  readonly secondAxis: Float64Array;
  /** One array per requested property, `count` long, NaN at failed points. */
  readonly values: Partial<Record<SweepProperty, Float64Array>>;
  /** Unit of each requested property in the basis of the sweep. */
  readonly units: Partial<Record<SweepProperty, string>>;
  readonly basis: "molar" | "mass";
  /** Phases present per point (0 at failed points). */
  readonly phaseCount: Uint8Array;
  /** {@link SWEEP_PHASE_KINDS} code per point. */
  readonly phaseKind: Uint8Array;
  /** {@link SWEEP_ERROR_CODES} code per point. */
  readonly errorCode: Uint8Array;
  /** The first failures with their messages. */
  readonly errors: readonly SweepPointError[];
  /** Points that failed. */
  readonly failed: number;
  /** Which path served the points: "lean" (allocation-free cubic), "state" or "flash". */
  readonly path: string;
  readonly model: ModelInfo;
  readonly componentIds: readonly string[];
  readonly x: readonly number[];
  readonly referenceState: ReferenceState;
  /** Sweep-wide warnings (e.g. points not tested for a split). */
  readonly warnings: readonly ResultWarning[];
}
