/**
 * The atmospheric pressure used to turn gauge pressures (barg, psig, kPa(g)) into absolute ones.
 *
 * Precedence: an explicit `atmosphericPressurePa` option of a call always wins; otherwise the
 * notebook-wide default set here; otherwise the standard atmosphere, 101325 Pa (exact, NIST
 * SP 811 2008 App. B.8). The default is the one piece of mutable module state in units/: set it
 * in a notebook's first cell (a plant at altitude), and read it back with
 * {@link getDefaultAtmosphericPressure} in any result that depends on it.
 */
import { InputError } from "../errors.js";
import { ATMOSPHERE_PA } from "./unitTable.js";

let defaultAtmosphericPressurePa = ATMOSPHERE_PA;

/** Checks an atmospheric pressure: finite, between 10 kPa and 200 kPa (any inhabited site). */
export function checkAtmosphericPressure(pressurePa: number, input: string): number {
  if (!(pressurePa >= 1e4 && pressurePa <= 2e5)) {
    throw new InputError({
      input,
      unit: "Pa",
      validRange: "between 10000 and 200000 (an ambient pressure)",
      received: pressurePa,
      hint: "give the local barometric pressure in Pa, e.g. 101325",
    });
  }
  return pressurePa;
}

/**
 * Sets the default atmospheric pressure for gauge units, in Pa. Returns the previous default,
 * so a cell can restore it.
 *
 * @example
 * ```ts
 * setDefaultAtmosphericPressure(95_000); // Corvid Point Refinery's upland tank farm
 * toSI(10, "barg"); // 1_095_000 Pa
 * ```
 */
export function setDefaultAtmosphericPressure(pressurePa: number): number {
  checkAtmosphericPressure(pressurePa, "atmospheric pressure");
  const previous = defaultAtmosphericPressurePa;
  defaultAtmosphericPressurePa = pressurePa;
  return previous;
}

/** The current default atmospheric pressure for gauge units, in Pa (initially 101325). */
export function getDefaultAtmosphericPressure(): number {
  return defaultAtmosphericPressurePa;
}

/** Restores the default atmospheric pressure to the standard atmosphere, 101325 Pa. */
export function resetDefaultAtmosphericPressure(): void {
  defaultAtmosphericPressurePa = ATMOSPHERE_PA;
}
