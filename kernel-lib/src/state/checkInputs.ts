/** Input checks shared by every state entry point (T, P, rho, x), so each error reads the same. */
import { requirePositive } from "../validate.js";
import { checkMoleFractions } from "../components/composition.js";
import {
  refuseUnphysicalDensity,
  refuseUnphysicalPressure,
  refuseUnphysicalTemperature,
} from "./physicalLimits.js";

/** Requires T > 0 (finite), K, within the limits of physical sense (state/physicalLimits.ts). */
export function checkTemperature(temperatureK: number, input = "temperatureK"): void {
  requirePositive(input, temperatureK, "K");
  refuseUnphysicalTemperature(temperatureK, input);
}

/** Requires P > 0 (finite), Pa, within the limits of physical sense (state/physicalLimits.ts). */
export function checkPressure(pressurePa: number, input = "pressurePa"): void {
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
  checkMoleFractions(x, componentCount, input === "x" ? DEFAULT_INPUT : { input });
}

// the options of the usual call, allocated once (this check runs on every state)
const DEFAULT_INPUT = Object.freeze({ input: "x" });
