/**
 * Temperature at given (P, h) and (P, s) in one phase: what a valve (isenthalpic) and a compressor
 * or turbine (isentropic) step needs. Method: the residual f(T) = h(T, P) - h_target (or s) is
 * monotonic in T within a phase (cp > 0); a bracket is found by stepping geometrically away from a
 * starting temperature in the direction the sign of f demands, then Brent's method
 * (numerics/brent.ts; Brent 1973, ch. 4) locates the root. A jump of h or s across the bracket
 * (the root sits on a phase change of the "stable" branch, i.e. inside the two-phase region) is
 * detected from the final residual and refused with a SolverError saying so.
 */
import { InputError, IsochorError, SolverError } from "../errors.js";
import { findRootBrent } from "../numerics/brent.js";
import { requireFinite } from "../validate.js";
import { checkComposition, checkPressure } from "./checkInputs.js";
import { stateAtTP } from "./stateAt.js";
import type { FluidBinding, FluidState, PhaseRequest } from "./types.js";

/** Options of {@link temperatureAtPH} and {@link temperatureAtPS}. */
export interface InversionOptions {
  /** Phase to stay in: "stable" (default), "liquid" or "vapor". */
  phase?: PhaseRequest;
  /** Starting temperature of the bracket search, K. Default 300. */
  initialGuessK?: number;
  /** Lowest temperature tried, K. Default 20. */
  minTemperatureK?: number;
  /** Highest temperature tried, K. Default 3000. */
  maxTemperatureK?: number;
  /** Absolute tolerance on T, K. Default 1e-9. */
  toleranceK?: number;
  /** Maximum Brent iterations. Default 100. */
  maxIterations?: number;
}

/** Result of an inversion: the temperature, the state there, and how the solver did. */
export interface InversionResult {
  /** K */
  readonly temperatureK: number;
  readonly state: FluidState;
  /** Final residual in the target's unit (J/mol or J/(mol K)). */
  readonly residual: number;
  /** Bound of |T - root|, K. */
  readonly errorEstimate: number;
  /** Brent iterations plus bracket-search evaluations. */
  readonly iterations: number;
}

function invert(
  binding: FluidBinding,
  pressurePa: number,
  target: number,
  x: readonly number[],
  options: InversionOptions,
  property: "h" | "s",
): InversionResult {
  const name = property === "h" ? "enthalpyJPerMol" : "entropyJPerMolK";
  const unit = property === "h" ? "J/mol" : "J/(mol K)";
  checkPressure(pressurePa);
  requireFinite(name, target, unit);
  checkComposition(x, binding.model.info.componentIds.length);
  const phase = options.phase ?? "stable";
  const tMin = options.minTemperatureK ?? 20;
  const tMax = options.maxTemperatureK ?? 3000;
  const guess = options.initialGuessK ?? 300;
  if (!(tMin > 0 && tMax > tMin && guess >= tMin && guess <= tMax)) {
    throw new InputError({
      input: "minTemperatureK, initialGuessK, maxTemperatureK",
      unit: "K",
      validRange: "0 < min <= guess <= max",
      received: [tMin, guess, tMax],
    });
  }
  let evaluations = 0;
  const f = (T: number): number => {
    evaluations++;
    return stateAtTP(binding, T, pressurePa, x, { phase }).molar[property] - target;
  };
  const tried: string[] = [];
  const safe = (T: number): number => {
    try {
      const v = f(T);
      tried.push(`T = ${T.toPrecision(6)} K: residual ${v.toPrecision(4)} ${unit}`);
      return v;
    } catch (e) {
      if (e instanceof IsochorError) {
        tried.push(`T = ${T.toPrecision(6)} K: ${e.code}`);
        return NaN;
      }
      throw e;
    }
  };
  let a = guess;
  let fa = safe(a);
  if (!Number.isFinite(fa)) {
    throw new SolverError(
      `temperature at given (P, ${property})`,
      `no ${phase} state at the starting temperature ${guess} K and P = ${pressurePa} Pa (${tried.join("; ")}); give initialGuessK inside the phase`,
    );
  }
  // h and s rise with T: step up when below the target, down when above, with steps growing from
  // 2 % (doubling each time); a refused temperature (outside a correlation's range, no such phase)
  // shrinks the step instead, so the search stops at the edge of what can be evaluated
  const up = fa < 0;
  let b = a;
  let fb = fa;
  let step = 0.02;
  for (let k = 0; k < 80 && step > 1e-6; k++) {
    const next = up ? Math.min(b * (1 + step), tMax) : Math.max(b / (1 + step), tMin);
    if (next === b) break;
    const fn = safe(next);
    if (!Number.isFinite(fn)) {
      step /= 4;
      continue;
    }
    a = b;
    fa = fb;
    b = next;
    fb = fn;
    if (fa < 0 !== fb < 0 || fb === 0) break;
    step = Math.min(step * 2, 1);
  }
  if (!(fa < 0 !== fb < 0 || fb === 0)) {
    throw new SolverError(
      `temperature at given (P, ${property})`,
      `no bracket of ${property} = ${target} ${unit} at P = ${pressurePa} Pa in the ${phase} phase between ${tMin} K and ${tMax} K; tried ${tried.join("; ")}`,
    );
  }
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  const root = findRootBrent(f, lo, hi, {
    tolerance: options.toleranceK ?? 1e-9,
    maxIterations: options.maxIterations ?? 100,
  });
  const state = stateAtTP(binding, root.value, pressurePa, x, { phase });
  const residual = state.molar[property] - target;
  // a root of a smooth f has a tiny residual; a jump (phase change inside the bracket) does not
  const scale =
    Math.abs(state.molar.cp) *
    Math.max(root.errorEstimate, 1e-6) *
    (property === "h" ? 1 : 1 / root.value);
  if (!(Math.abs(residual) <= Math.max(scale * 100, 1e-6 * Math.max(1, Math.abs(target))))) {
    throw new SolverError(
      `temperature at given (P, ${property})`,
      `${property} jumps at T = ${root.value.toPrecision(8)} K, P = ${pressurePa} Pa (residual ${residual.toPrecision(4)} ${unit} after ${root.iterations} Brent iterations): the target lies between two phases, i.e. inside the two-phase region; a single-phase temperature does not exist (use the saturation and flash routines)`,
    );
  }
  return {
    temperatureK: root.value,
    state,
    residual,
    errorEstimate: root.errorEstimate,
    iterations: root.iterations + evaluations,
  };
}

/**
 * Temperature (K) where the molar enthalpy at pressure P equals `enthalpyJPerMol`, in one phase.
 * For a valve: h_out = h_in at the outlet pressure.
 *
 * @throws SolverError when no single-phase temperature exists (says what was tried).
 */
export function temperatureAtPH(
  binding: FluidBinding,
  pressurePa: number,
  enthalpyJPerMol: number,
  x: readonly number[],
  options: InversionOptions = {},
): InversionResult {
  return invert(binding, pressurePa, enthalpyJPerMol, x, options, "h");
}

/**
 * Temperature (K) where the molar entropy at pressure P equals `entropyJPerMolK`, in one phase.
 * For an isentropic compressor or expander step.
 *
 * @throws SolverError when no single-phase temperature exists (says what was tried).
 */
export function temperatureAtPS(
  binding: FluidBinding,
  pressurePa: number,
  entropyJPerMolK: number,
  x: readonly number[],
  options: InversionOptions = {},
): InversionResult {
  return invert(binding, pressurePa, entropyJPerMolK, x, options, "s");
}
