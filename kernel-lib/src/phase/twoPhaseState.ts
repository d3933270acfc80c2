/**
 * States of a pure fluid inside (and across) the vapour-liquid dome: at (T, quality),
 * (P, quality), and at (P, h) and (P, s), where the target may fall on either single-phase side or
 * between the saturated liquid and vapour. Inside the dome the mixture is a lever-rule average of
 * the saturated phases (quality q = vapour mole fraction of the total):
 *   v = (1 - q) v_L + q v_V,   h = (1 - q) h_L + q h_V,   likewise u and s;
 *   a = u - T s,  g = h - T s (= g_L = g_V).
 * The saturated phases come from phase/saturation.ts and their properties from the engine's
 * state functions (state/stateAt.ts); single-phase (P, h) and (P, s) from state/inversions.ts.
 */
import {
  InputError,
  OutOfRangeError,
  PhaseUnavailableError,
  type ResultWarning,
} from "../errors.js";
import type { ModelInfo } from "../eos/types.js";
import type { ReferenceState } from "../idealgas/types.js";
import { stateAtTRho } from "../state/stateAt.js";
import { temperatureAtPH, temperatureAtPS } from "../state/inversions.js";
import { MAX_TEMPERATURE_K, MIN_TEMPERATURE_K } from "../state/physicalLimits.js";
import type { FluidBinding, FluidState } from "../state/types.js";
import { requireFinite, requirePositive } from "../validate.js";
import { locateCriticalPoint } from "./criticalPoint.js";
import { requirePure } from "./pureFluid.js";
import {
  saturationAtPressure,
  saturationAtTemperature,
  type SaturationOptions,
  type SaturationResult,
} from "./saturation.js";

/** Mixture energies in one basis (J/mol and J/(mol K), or J/kg and J/(kg K)). */
export interface TwoPhaseEnergies {
  readonly h: number;
  readonly s: number;
  readonly u: number;
  readonly a: number;
  readonly g: number;
}

/** A saturated two-phase (or saturated single-phase, q = 0 or 1) state of a pure fluid. */
export interface TwoPhaseState {
  readonly kind: "two-phase";
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Vapour fraction of the total amount (molar = mass quality for a pure fluid), 0..1. */
  readonly quality: number;
  /** Overall molar density, mol/m3. */
  readonly densityMolPerM3: number;
  /** Overall mass density, kg/m3. */
  readonly densityKgPerM3: number;
  readonly molar: TwoPhaseEnergies;
  readonly mass: TwoPhaseEnergies;
  /** The saturated liquid, with every property the engine offers. */
  readonly liquid: FluidState;
  /** The saturated vapour. */
  readonly vapor: FluidState;
  readonly saturation: SaturationResult;
  readonly model: ModelInfo;
  readonly referenceState: ReferenceState;
  readonly warnings: readonly ResultWarning[];
}

/** A single-phase state found by an inversion, tagged for discrimination. */
export interface SinglePhaseResult {
  readonly kind: "single-phase";
  readonly state: FluidState;
  /** Quality is not defined for a single phase above the dome or outside it. */
  readonly quality?: undefined;
}

/** Result of the (P, h) and (P, s) state functions. */
export type PureFluidStateResult = TwoPhaseState | SinglePhaseResult;

function requireQuality(quality: number): void {
  if (!(quality >= 0 && quality <= 1)) {
    throw new InputError({
      input: "quality",
      unit: "- (vapour fraction)",
      validRange: "between 0 and 1",
      received: quality,
    });
  }
}

function mix(binding: FluidBinding, sat: SaturationResult, quality: number): TwoPhaseState {
  const T = sat.temperatureK;
  const L = stateAtTRho(binding, T, sat.liquidDensityMolPerM3, [1]);
  const V = stateAtTRho(binding, T, sat.vaporDensityMolPerM3, [1]);
  const q = quality;
  const lever = (l: number, v: number): number => (1 - q) * l + q * v;
  const h = lever(L.molar.h, V.molar.h);
  const s = lever(L.molar.s, V.molar.s);
  const u = lever(L.molar.u, V.molar.u);
  const volume = lever(1 / L.densityMolPerM3, 1 / V.densityMolPerM3);
  const M = L.molarMassKgPerMol;
  const molar = { h, s, u, a: u - T * s, g: h - T * s };
  const warnings: ResultWarning[] = [...sat.warnings];
  for (const w of [...L.warnings, ...V.warnings]) {
    if (!warnings.some((x) => x.message === w.message)) warnings.push(w);
  }
  return {
    kind: "two-phase",
    temperatureK: T,
    pressurePa: sat.pressurePa,
    quality: q,
    densityMolPerM3: 1 / volume,
    densityKgPerM3: M / volume,
    molar,
    mass: { h: h / M, s: s / M, u: u / M, a: molar.a / M, g: molar.g / M },
    liquid: L,
    vapor: V,
    saturation: sat,
    model: binding.model.info,
    referenceState: L.referenceState,
    warnings,
  };
}

/**
 * The pure fluid at temperature T (K) and quality q (vapour fraction, 0 = saturated liquid,
 * 1 = saturated vapour).
 *
 * @example
 * ```ts
 * const wet = stateAtTemperatureQuality(referenceFluidBinding(referenceFluid("water")), 450, 0.3);
 * wet.pressurePa; // 932203.56 Pa, wet.mass.h = 0.7 h' + 0.3 h''
 * ```
 * @throws InputError for bad T or q; PhaseUnavailableError at or above T_c.
 * @deprecated Use `fluid.state({ T, vaporFraction })` (fluid/phaseState.ts): the same saturated phases in
 * `phases[]`, one PhaseState for pure fluids and mixtures. For a reference equation bind it with
 * `defineFluid({ components: [id], model: referenceFluid(id) })`.
 */
export function stateAtTemperatureQuality(
  binding: FluidBinding,
  temperatureK: number,
  quality: number,
  options: SaturationOptions = {},
): TwoPhaseState {
  requirePure(binding.model, "a state at given quality");
  requireQuality(quality);
  return mix(binding, saturationAtTemperature(binding.model, temperatureK, options), quality);
}

/**
 * The pure fluid at pressure P (Pa) and quality q.
 *
 * @throws InputError for bad P or q; PhaseUnavailableError at or above P_c.
 * @deprecated Use `fluid.state({ P, vaporFraction })` (fluid/phaseState.ts): the same saturated phases in
 * `phases[]`, one PhaseState for pure fluids and mixtures. For a reference equation bind it with
 * `defineFluid({ components: [id], model: referenceFluid(id) })`.
 */
export function stateAtPressureQuality(
  binding: FluidBinding,
  pressurePa: number,
  quality: number,
  options: SaturationOptions = {},
): TwoPhaseState {
  requirePure(binding.model, "a state at given quality");
  requireQuality(quality);
  return mix(binding, saturationAtPressure(binding.model, pressurePa, options), quality);
}

/**
 * The pure fluid at temperature T (K) and overall molar density rho (mol/m3), e.g. a closed
 * vessel: two-phase with its quality when rho lies between the saturated vapour and liquid
 * densities (q from v = (1 - q) v_L + q v_V), else the single-phase state at (T, rho).
 *
 * @throws InputError for bad T or rho.
 * @deprecated Use `fluid.state({ T, rho })` (fluid/phaseState.ts): the same saturated phases in
 * `phases[]`, one PhaseState for pure fluids and mixtures. For a reference equation bind it with
 * `defineFluid({ components: [id], model: referenceFluid(id) })`.
 */
export function stateAtTemperatureDensity(
  binding: FluidBinding,
  temperatureK: number,
  densityMolPerM3: number,
  options: SaturationOptions = {},
): PureFluidStateResult {
  requirePure(binding.model, "a state at given (T, rho)");
  requirePositive("temperatureK", temperatureK, "K");
  requirePositive("densityMolPerM3", densityMolPerM3, "mol/m3");
  const critical = locateCriticalPoint(binding.model, { guess: options.criticalGuess });
  if (temperatureK < critical.temperatureK) {
    const sat = saturationAtTemperature(binding.model, temperatureK, options);
    const rhoL = sat.liquidDensityMolPerM3;
    const rhoV = sat.vaporDensityMolPerM3;
    if (densityMolPerM3 > rhoV && densityMolPerM3 < rhoL) {
      const q = (1 / densityMolPerM3 - 1 / rhoL) / (1 / rhoV - 1 / rhoL);
      return mix(binding, sat, q);
    }
  }
  return { kind: "single-phase", state: stateAtTRho(binding, temperatureK, densityMolPerM3, [1]) };
}

/** Options of {@link stateAtPressureEnthalpy} and {@link stateAtPressureEntropy}. */
export interface DomeInversionOptions extends SaturationOptions {
  /** Initial guess for a supercritical-pressure inversion, K. Default the critical temperature. */
  initialGuessK?: number;
  /**
   * Lowest temperature searched on the liquid side, K. Default 1 (the search is cut to where the
   * fluid can be evaluated: see state/inversions.ts).
   */
  minTemperatureK?: number;
  /** Highest temperature searched on the vapour side, K. Default 1e4 (likewise cut). */
  maxTemperatureK?: number;
}

function acrossDome(
  binding: FluidBinding,
  pressurePa: number,
  target: number,
  property: "h" | "s",
  options: DomeInversionOptions,
): PureFluidStateResult {
  requirePure(binding.model, `a state at given (P, ${property})`);
  requirePositive("pressurePa", pressurePa, "Pa");
  requireFinite(
    property === "h" ? "enthalpyJPerMol" : "entropyJPerMolK",
    target,
    property === "h" ? "J/mol" : "J/(mol K)",
  );
  const invert = property === "h" ? temperatureAtPH : temperatureAtPS;
  const critical = locateCriticalPoint(binding.model, { guess: options.criticalGuess });
  const tMin = options.minTemperatureK ?? MIN_TEMPERATURE_K;
  const tMax = options.maxTemperatureK ?? MAX_TEMPERATURE_K;
  if (!(pressurePa < critical.pressurePa)) {
    const r = invert(binding, pressurePa, target, [1], {
      phase: "stable",
      initialGuessK: options.initialGuessK ?? critical.temperatureK,
      minTemperatureK: tMin,
      maxTemperatureK: tMax,
    });
    return { kind: "single-phase", state: r.state };
  }
  const triple = binding.model.triple;
  let sat: SaturationResult;
  try {
    sat = saturationAtPressure(binding.model, pressurePa, options);
  } catch (e) {
    if (!(e instanceof PhaseUnavailableError && triple && pressurePa < triple.pressurePa)) throw e;
    // Below the triple-point pressure there is no vapour-liquid dome to cross (only the
    // sublimation line, below which the fluid is solid, outside every model here): a fluid state
    // at this pressure is vapour.
    const r = invert(binding, pressurePa, target, [1], {
      phase: "vapor",
      minTemperatureK: tMin,
      maxTemperatureK: tMax,
    });
    return { kind: "single-phase", state: r.state };
  }
  const Tsat = sat.temperatureK;
  let L: FluidState;
  let V: FluidState;
  try {
    L = stateAtTRho(binding, Tsat, sat.liquidDensityMolPerM3, [1]);
    V = stateAtTRho(binding, Tsat, sat.vaporDensityMolPerM3, [1]);
  } catch (e) {
    if (!(e instanceof OutOfRangeError)) throw e;
    // The saturated phases cannot be evaluated (e.g. the ideal-gas cp range of hydrogen starts
    // far above its 31 K saturation temperature at 1 MPa): every state that can be evaluated at
    // this pressure lies above Tsat, i.e. is vapour; the inversion names why when none matches.
    const r = invert(binding, pressurePa, target, [1], {
      phase: "vapor",
      minTemperatureK: Math.min(Tsat * (1 + 1e-9), tMax),
      maxTemperatureK: Math.max(tMax, Tsat * (1 + 2e-9)),
    });
    return { kind: "single-phase", state: r.state };
  }
  const yL = L.molar[property];
  const yV = V.molar[property];
  if (target >= yL && target <= yV) {
    return mix(binding, sat, (target - yL) / (yV - yL));
  }
  // Start the single-phase inversion at twice the temperature offset that the saturated phase's
  // cp predicts (dT = dh / cp, or T ds / cp), so the first bracket step lands on the saturation
  // temperature and brackets the root without leaving the models' temperature ranges.
  const offset = (phase: FluidState): number => {
    const dy = Math.abs(target - phase.molar[property]);
    const dT = property === "h" ? dy / phase.molar.cp : (Tsat * dy) / phase.molar.cp;
    return Number.isFinite(dT) && dT > 0 ? 2 * dT : 0.1 * Tsat;
  };
  const below = Tsat * (1 - 1e-9);
  const above = Tsat * (1 + 1e-9);
  if (target < yL) {
    const lo = Math.min(tMin, below);
    const r = invert(binding, pressurePa, target, [1], {
      phase: "liquid",
      initialGuessK: Math.min(below, Math.max(lo, Tsat - offset(L))),
      minTemperatureK: lo,
      maxTemperatureK: below,
    });
    return { kind: "single-phase", state: r.state };
  }
  const hi = Math.max(tMax, above);
  const r = invert(binding, pressurePa, target, [1], {
    phase: "vapor",
    initialGuessK: Math.max(above, Math.min(hi, Tsat + offset(V))),
    minTemperatureK: above,
    maxTemperatureK: hi,
  });
  return { kind: "single-phase", state: r.state };
}

/**
 * The pure fluid at pressure P (Pa) and molar enthalpy h (J/mol, in the binding's reference
 * state): two-phase with its quality when h lies between the saturated liquid and vapour, else
 * the single-phase state (e.g. the outlet of a throttling valve).
 *
 * @throws InputError for bad P or h; SolverError when no state is found (says what was tried).
 * @deprecated Use `fluid.state({ P, h })` (fluid/phaseState.ts): the same saturated phases in
 * `phases[]`, one PhaseState for pure fluids and mixtures. For a reference equation bind it with
 * `defineFluid({ components: [id], model: referenceFluid(id) })`.
 */
export function stateAtPressureEnthalpy(
  binding: FluidBinding,
  pressurePa: number,
  enthalpyJPerMol: number,
  options: DomeInversionOptions = {},
): PureFluidStateResult {
  return acrossDome(binding, pressurePa, enthalpyJPerMol, "h", options);
}

/**
 * The pure fluid at pressure P (Pa) and molar entropy s (J/(mol K)): two-phase with its quality
 * when s lies between the saturated liquid and vapour, else single-phase (e.g. an isentropic
 * expansion into the dome).
 * @deprecated Use `fluid.state({ P, s })` (fluid/phaseState.ts): the same saturated phases in
 * `phases[]`, one PhaseState for pure fluids and mixtures. For a reference equation bind it with
 * `defineFluid({ components: [id], model: referenceFluid(id) })`.
 */
export function stateAtPressureEntropy(
  binding: FluidBinding,
  pressurePa: number,
  entropyJPerMolK: number,
  options: DomeInversionOptions = {},
): PureFluidStateResult {
  return acrossDome(binding, pressurePa, entropyJPerMolK, "s", options);
}
