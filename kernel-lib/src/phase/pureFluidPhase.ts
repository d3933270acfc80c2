/**
 * The phase of a pure fluid at given (T, P), from the model's own critical point and saturation
 * curve: "supercritical" when T >= T_c and P >= P_c; "liquid" when P is above the saturation
 * pressure (or T < T_c and P >= P_c); "vapor" when below it (or T >= T_c and P < P_c). On the
 * saturation line itself a pure fluid's state is not fixed by (T, P) (liquid and vapour coexist in
 * any proportion): such a request is refused with a PhaseUnavailableError that says what to give
 * instead. The labels are those of state/types.ts.
 */
import { PhaseUnavailableError, type ResultWarning } from "../errors.js";
import type { ResidualModel } from "../eos/types.js";
import { stateAtTP } from "../state/stateAt.js";
import type { FluidBinding, FluidState, PhaseLabel } from "../state/types.js";
import { requirePositive } from "../validate.js";
import { locateCriticalPoint, type CriticalPointResult } from "./criticalPoint.js";
import { requirePure } from "./pureFluid.js";
import { saturationAtTemperature } from "./saturation.js";

/** Options of {@link pureFluidPhaseAt}. */
export interface PhaseAtOptions {
  /**
   * Relative band around the saturation pressure treated as "on the saturation line" and refused.
   * Default 1e-9 (the saturation pressure itself is solved to about 1e-12).
   */
  saturationBand?: number;
  /** Critical-point guess for models that offer none (K, mol/m3); see SaturationOptions. */
  criticalGuess?: { temperatureK: number; densityMolPerM3: number };
}

/** The phase at (T, P) and why. */
export interface PurePhaseResult {
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly phase: PhaseLabel;
  /** Saturation pressure at T (Pa) when T is below the critical temperature. */
  readonly saturationPressurePa?: number;
  readonly critical: CriticalPointResult;
  /** The rule applied, in words. */
  readonly reason: string;
  /** Warnings of the saturation state consulted (e.g. below the triple point). */
  readonly warnings: readonly ResultWarning[];
}

/**
 * Liquid, vapour or supercritical at (T, P) for a pure-fluid model.
 *
 * @example
 * ```ts
 * pureFluidPhaseAt(referenceFluid("water"), 373.15, 2e5).phase; // "liquid"
 * ```
 * @throws PhaseUnavailableError when P is the saturation pressure at T (two phases coexist).
 * @throws InputError for bad T or P, or a mixture model.
 */
export function pureFluidPhaseAt(
  model: ResidualModel,
  temperatureK: number,
  pressurePa: number,
  options: PhaseAtOptions = {},
): PurePhaseResult {
  requirePure(model, "the phase at (T, P)");
  requirePositive("temperatureK", temperatureK, "K");
  requirePositive("pressurePa", pressurePa, "Pa");
  const band = options.saturationBand ?? 1e-9;
  requirePositive("options.saturationBand", band, "-");
  const critical = locateCriticalPoint(model, { guess: options.criticalGuess });
  const T = temperatureK;
  const P = pressurePa;
  const base = { temperatureK: T, pressurePa: P, critical, warnings: [] as ResultWarning[] };
  if (T >= critical.temperatureK) {
    return P >= critical.pressurePa
      ? { ...base, phase: "supercritical", reason: "T >= Tc and P >= Pc" }
      : { ...base, phase: "vapor", reason: "T >= Tc and P < Pc (gas)" };
  }
  const sat = saturationAtTemperature(model, T);
  const psat = sat.pressurePa;
  if (Math.abs(P / psat - 1) <= band) {
    throw new PhaseUnavailableError(
      `T = ${T} K, P = ${P} Pa lies on the saturation line of ${model.info.name} (saturation pressure ${psat} Pa at ${T} K): liquid and vapour coexist there in any proportion, so (T, P) does not fix the state of a pure fluid; give a quality (stateAtTemperatureQuality), or (P, h) or (P, s), or ask for the saturated liquid or vapour`,
    );
  }
  base.warnings.push(...sat.warnings);
  return P > psat
    ? {
        ...base,
        phase: "liquid",
        saturationPressurePa: psat,
        reason: "T < Tc and P above the saturation pressure",
      }
    : {
        ...base,
        phase: "vapor",
        saturationPressurePa: psat,
        reason: "T < Tc and P below the saturation pressure",
      };
}

/**
 * The state of a pure fluid at (T, P) in the phase the saturation curve implies (never a
 * metastable root), through the engine's stateAtTP; refused on the saturation line.
 *
 * @throws PhaseUnavailableError on the saturation line (see {@link pureFluidPhaseAt}).
 */
export function pureFluidStateTP(
  binding: FluidBinding,
  temperatureK: number,
  pressurePa: number,
  options: PhaseAtOptions = {},
): FluidState {
  const phase = pureFluidPhaseAt(binding.model, temperatureK, pressurePa, options);
  const request = phase.phase === "supercritical" ? "stable" : phase.phase;
  return stateAtTP(binding, temperatureK, pressurePa, [1], { phase: request });
}
