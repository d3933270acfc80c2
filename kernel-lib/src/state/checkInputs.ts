/** Input checks shared by every state entry point (T, P, rho, x), so each error reads the same. */
import { requirePositive } from "../validate.js";
import { checkMoleFractions } from "../components/composition.js";
import {
  MAX_PRESSURE_PA,
  MAX_TEMPERATURE_K,
  MIN_PRESSURE_PA,
  MIN_TEMPERATURE_K,
  refuseUnphysicalDensity,
  refuseUnphysicalPressure,
  refuseUnphysicalTemperature,
} from "./physicalLimits.js";

// Each check first asks the one condition that passes every valid input (small enough for the
// engine to inline into the state paths) and only otherwise runs the checks that throw; a value
// that fails the condition fails one of them (the range implies finite and positive).

/** Requires T > 0 (finite), K, within the limits of physical sense (state/physicalLimits.ts). */
export function checkTemperature(temperatureK: number, input = "temperatureK"): void {
  if (
    typeof temperatureK === "number" &&
    temperatureK >= MIN_TEMPERATURE_K &&
    temperatureK <= MAX_TEMPERATURE_K
  ) {
    return;
  }
  requirePositive(input, temperatureK, "K");
  refuseUnphysicalTemperature(temperatureK, input);
}

/** Requires P > 0 (finite), Pa, within the limits of physical sense (state/physicalLimits.ts). */
export function checkPressure(pressurePa: number, input = "pressurePa"): void {
  if (
    typeof pressurePa === "number" &&
    pressurePa >= MIN_PRESSURE_PA &&
    pressurePa <= MAX_PRESSURE_PA
  ) {
    return;
  }
  requirePositive(input, pressurePa, "Pa");
  refuseUnphysicalPressure(pressurePa, input);
}

/** Requires rho > 0 (finite), mol/m3. */
export function checkDensity(densityMolPerM3: number, input = "densityMolPerM3"): void {
  requirePositive(input, densityMolPerM3, "mol/m3");
  refuseUnphysicalDensity(densityMolPerM3, input);
}

/** Mole fractions: one per component, each in [0, 1], summing to 1 within 1e-9. */
export function checkComposition(x: readonly number[], componentCount: number, input = "x"): void {
  if (acceptedComposition(x, componentCount)) return;
  checkMoleFractions(x, componentCount, input === "x" ? DEFAULT_INPUT : { input });
}

// the options of the usual call, allocated once (this check runs on every state)
const DEFAULT_INPUT = Object.freeze({ input: "x" });

/**
 * checkMoleFractions' acceptance with its default tolerance (1e-9), without the messages: an
 * array of `componentCount` numbers in [0, 1] summing to 1 within 1e-9.
 */
function acceptedComposition(x: readonly number[], componentCount: number): boolean {
  if (!Array.isArray(x) || x.length !== componentCount) return false;
  let sum = 0;
  for (let i = 0; i < x.length; i++) {
    const xi = x[i];
    if (!(typeof xi === "number" && xi >= 0 && xi <= 1)) return false;
    sum += xi;
  }
  return Math.abs(sum - 1) <= 1e-9;
}
