/**
 * Temperature at given (P, h) and (P, s) in one phase: what a valve (isenthalpic) and a compressor
 * or turbine (isentropic) step needs. Method: the residual f(T) = h(T, P) - h_target (or s) is
 * monotonic in T within a phase (cp > 0); the search window is the requested temperature range
 * cut to where the fluid's ideal-gas part can be evaluated (the heat-capacity ranges of the
 * components present, with the ideal-gas layer's extrapolation margin, and the physical limits of
 * state/physicalLimits.ts); the start is the given guess, else 300 K when inside the window, else
 * its geometric middle, and when the phase does not exist there the first temperature of a
 * geometric grid over the window (nearest first) where it does; a bracket is found by stepping
 * geometrically away from the start in the direction the sign of f demands, then Brent's method
 * (numerics/brent.ts; Brent 1973, ch. 4) locates the root. A jump of h or s across the bracket
 * (the root sits on a phase change of the "stable" branch, i.e. inside the two-phase region) is
 * detected from the final residual and refused with a SolverError saying so.
 *
 * A mixture's root can also lie inside the two-phase region with no jump at all (the single-phase
 * branch continues through the dome, e.g. a natural gas let down across its dew line). This layer
 * cannot run the tangent-plane test (phase/ sits above it), so a mixture result carries a
 * "model-limitation" warning saying that its phase split was not tested; a Fluid's
 * temperatureAtPH/PS (fluid/defineFluid.ts) replaces it with the test's verdict.
 */
import { InputError, IsochorError, SolverError } from "../errors.js";
import { findRootBrent } from "../numerics/brent.js";
import { requireFinite } from "../validate.js";
import { checkComposition, checkPressure } from "./checkInputs.js";
import { DEFAULT_EXTRAPOLATION_MARGIN } from "../idealgas/temperatureRange.js";
import { outOfRangeAdvice } from "../idealgas/messages.js";
import type { IdealGasPure } from "../idealgas/types.js";
import { MAX_TEMPERATURE_K, MIN_TEMPERATURE_K } from "./physicalLimits.js";
import { stateAtTP } from "./stateAt.js";
import type { FluidBinding, FluidState, PhaseRequest } from "./types.js";

/** The warning of a mixture result whose phase split was not tested (see the header). */
export const PHASE_SPLIT_NOT_TESTED =
  "mixture: this single-phase inversion did not test whether the mixture splits into phases at the result (the state layer has no stability test); fluid.temperatureAtPH / temperatureAtPS test it, and flashPH / flashPS give the phases and their amounts";

/** Options of {@link temperatureAtPH} and {@link temperatureAtPS}. */
export interface InversionOptions {
  /** Phase to stay in: "stable" (default), "liquid" or "vapor". */
  phase?: PhaseRequest;
  /**
   * Starting temperature of the bracket search, K. Default 300 K, or the geometric middle of the
   * search window when 300 K lies outside it.
   */
  initialGuessK?: number;
  /**
   * Lowest temperature tried, K. Default: the lowest temperature the fluid can be evaluated at
   * (the ideal-gas heat-capacity ranges of the components present with their extrapolation
   * margin, and the physical limits); the search never goes below that, whatever is given.
   */
  minTemperatureK?: number;
  /** Highest temperature tried, K. Default: the highest the fluid can be evaluated at (likewise). */
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
  options = options ?? {};
  const phase = options.phase ?? "stable";
  const tMin = options.minTemperatureK ?? MIN_TEMPERATURE_K;
  const tMax = options.maxTemperatureK ?? MAX_TEMPERATURE_K;
  const guess = options.initialGuessK ?? Math.min(Math.max(300, tMin), tMax);
  if (!(tMin > 0 && tMax > tMin && guess >= tMin && guess <= tMax)) {
    throw new InputError({
      input: "minTemperatureK, initialGuessK, maxTemperatureK",
      unit: "K",
      validRange: "0 < min <= guess <= max",
      received: [tMin, guess, tMax],
    });
  }
  // the window where the fluid can be evaluated at all: the ideal-gas ranges of the components
  // present (with the extrapolation margin) and the physical limits
  const ig = idealGasWindow(binding, x);
  const lo = Math.max(tMin, ig.min);
  const hi = Math.min(tMax, ig.max);
  if (!(lo < hi)) {
    const limiter = tMax <= ig.min ? ig.lowLimiter : tMin >= ig.max ? ig.highLimiter : undefined;
    const stop = limiter ? `; ${rangeStop(limiter, tMax <= ig.min ? tMax : tMin)}` : "";
    throw new SolverError(
      `temperature at given (P, ${property})`,
      `the requested temperatures ${tMin} K to ${tMax} K lie outside the range where the fluid can be evaluated (${ig.min} K to ${ig.max} K: ${ig.basis})${stop}`,
    );
  }
  const start = Math.min(
    hi,
    Math.max(lo, options.initialGuessK ?? (300 >= lo && 300 <= hi ? 300 : Math.sqrt(lo * hi))),
  );
  let evaluations = 0;
  let lastCp = NaN;
  const f = (T: number): number => {
    evaluations++;
    const molar = stateAtTP(binding, T, pressurePa, x, { phase }).molar;
    lastCp = molar.cp;
    return molar[property] - target;
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
  let a = start;
  let fa = safe(a);
  if (!Number.isFinite(fa)) {
    // the phase does not exist at the start (or the model cannot be evaluated there): the first
    // temperature of a geometric grid over the window, nearest to the start first, where it does
    const grid: number[] = [];
    for (let i = 0; i <= 24; i++) grid.push(lo * Math.pow(hi / lo, i / 24));
    grid.sort((p, q) => Math.abs(Math.log(p / start)) - Math.abs(Math.log(q / start)));
    for (const T of grid) {
      const v = safe(T);
      if (Number.isFinite(v)) {
        a = T;
        fa = v;
        break;
      }
    }
  }
  if (!Number.isFinite(fa)) {
    throw new SolverError(
      `temperature at given (P, ${property})`,
      `no ${phase} state at P = ${pressurePa} Pa anywhere between ${lo} K and ${hi} K (${ig.basis}); tried ${tried.join("; ")}`,
    );
  }
  // h and s rise with T: step up when below the target, down when above, with steps growing from
  // 2 % (doubling each time); a refused temperature (outside a correlation's range, no such phase)
  // shrinks the step instead, so the search stops at the edge of what can be evaluated
  const up = fa < 0;
  let b = a;
  let fb = fa;
  let cpB = lastCp;
  let step = 0.02;
  for (let k = 0; k < 80 && step > 1e-6; k++) {
    const next = up ? Math.min(b * (1 + step), hi) : Math.max(b / (1 + step), lo);
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
    cpB = lastCp;
    if (fa < 0 !== fb < 0 || fb === 0) break;
    step = Math.min(step * 2, 1);
  }
  if (!(fa < 0 !== fb < 0 || fb === 0)) {
    // when the search ended at the edge of a component's heat-capacity range (with its margin),
    // say whose range it was and what to do, with the temperature the target roughly needs
    // (one Newton step from the last state: dh = cp dT, ds = cp dT / T)
    const needed =
      property === "h" ? b - fb / cpB : b * Math.exp(-fb / (Number.isFinite(cpB) ? cpB : NaN));
    const atLow = !up && lo === ig.min && b <= lo * 1.001 ? ig.lowLimiter : undefined;
    const atHigh = up && hi === ig.max && b >= hi / 1.001 ? ig.highLimiter : undefined;
    const limiter = atLow ?? atHigh;
    if (limiter) {
      const estimate = Number.isFinite(needed) && needed > 0 ? needed : up ? hi * 1.05 : lo * 0.95;
      throw new SolverError(
        `temperature at given (P, ${property})`,
        `${property} = ${target} ${unit} at P = ${pressurePa} Pa needs a temperature ${up ? "above" : "below"} ${b.toPrecision(6)} K (about ${estimate.toPrecision(4)} K), ${rangeStop(limiter, estimate)}; tried ${tried.slice(-4).join("; ")}`,
      );
    }
    const edge = up
      ? `the target is above ${property} at ${b.toPrecision(6)} K, the highest temperature reached (window ${lo} K to ${hi} K: ${ig.basis}, maxTemperatureK ${tMax} K, or where the ${phase} phase ends)`
      : `the target is below ${property} at ${b.toPrecision(6)} K, the lowest temperature reached (window ${lo} K to ${hi} K: ${ig.basis}, minTemperatureK ${tMin} K, or where the ${phase} phase ends)`;
    throw new SolverError(
      `temperature at given (P, ${property})`,
      `no bracket of ${property} = ${target} ${unit} at P = ${pressurePa} Pa in the ${phase} phase: ${edge}; tried ${tried.join("; ")}`,
    );
  }
  const left = Math.min(a, b);
  const right = Math.max(a, b);
  const root = findRootBrent(f, left, right, {
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
  let present = 0;
  for (const v of x) if (v > 0) present++;
  return {
    temperatureK: root.value,
    state:
      present < 2
        ? state
        : {
            ...state,
            warnings: state.warnings.concat({
              code: "model-limitation",
              message: PHASE_SPLIT_NOT_TESTED,
            }),
          },
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

/**
 * Where the ideal-gas part of the fluid can be evaluated: the intersection of the heat-capacity
 * ranges of the components present, widened by the ideal-gas layer's extrapolation margin
 * (idealgas/temperatureRange.ts), within the physical limits (state/physicalLimits.ts).
 */
function idealGasWindow(
  binding: FluidBinding,
  x: readonly number[],
): {
  min: number;
  max: number;
  basis: string;
  lowLimiter?: IdealGasPure;
  highLimiter?: IdealGasPure;
} {
  let min = MIN_TEMPERATURE_K;
  let max = MAX_TEMPERATURE_K;
  let lowLimiter: IdealGasPure | undefined;
  let highLimiter: IdealGasPure | undefined;
  const parts: string[] = [];
  const pures = binding.idealGas.components;
  for (let i = 0; i < pures.length; i++) {
    const range = pures[i].validTemperatureK;
    if (!(x[i] > 0) || !range) continue;
    const m = pures[i].extrapolationMargin;
    const margin = m !== undefined && m >= 0 && m < 1 ? m : DEFAULT_EXTRAPOLATION_MARGIN;
    const low = range.min * (1 - margin);
    const high = range.max * (1 + margin);
    if (low > min) {
      min = low;
      lowLimiter = pures[i];
    }
    if (high < max) {
      max = high;
      highLimiter = pures[i];
    }
    parts.push(
      `${pures[i].componentId} ${range.min}-${range.max} K` +
        (margin !== DEFAULT_EXTRAPOLATION_MARGIN ? ` (margin ${margin})` : ""),
    );
  }
  const basis =
    parts.length > 0
      ? `ideal-gas heat-capacity ranges ${parts.join(", ")} with a ${DEFAULT_EXTRAPOLATION_MARGIN * 100} % extrapolation margin`
      : "the physical limits of state/physicalLimits.ts";
  return { min, max, basis, lowLimiter, highLimiter };
}

/**
 * "stopped by the ideal-gas heat-capacity range of <component> (...)" and what to do about it
 * (idealgas/messages.ts, outOfRangeAdvice), for a temperature the target needs.
 */
function rangeStop(pure: IdealGasPure, temperatureK: number): string {
  const r = pure.validTemperatureK;
  const m = pure.extrapolationMargin;
  const margin = m !== undefined && m >= 0 && m < 1 ? m : DEFAULT_EXTRAPOLATION_MARGIN;
  return (
    `stopped by the ideal-gas heat-capacity range of ${pure.componentId} (${pure.method}: ` +
    `${r.min} K to ${r.max} K, usable ${round2(r.min * (1 - margin))}-${round2(r.max * (1 + margin))} K ` +
    `with the ${margin * 100} % extrapolation margin). ` +
    outOfRangeAdvice(pure.componentId, pure.method, r, Number(temperatureK.toFixed(1))) +
    " (for a fluid: defineFluid({ ..., idealGas: idealGasMixture([...pures], options) }))"
  );
}

function round2(v: number): number {
  return Math.round(v * 100) / 100;
}
