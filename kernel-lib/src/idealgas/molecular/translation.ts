/**
 * Translational contribution of an ideal gas (Sackur-Tetrode equation).
 *
 *   s/R = ln[ (2 pi m kB T / h^2)^(3/2) kB T / p ] + 5/2,   h - h0 = 5/2 R T,   cp = 5/2 R
 *
 * McQuarrie, Statistical Mechanics (2000), ch. 5; Hill, An Introduction to Statistical
 * Thermodynamics (1960), ch. 4. Here p = 1 bar (the standard pressure of the tables), and the
 * pV = RT term is included in h and cp so that the other contributions are pure internal ones.
 */
import { AVOGADRO, BOLTZMANN, PLANCK, R } from "../../constants.js";
import { STANDARD_PRESSURE_PA } from "../types.js";
import type { ThermoContribution } from "./types.js";

/**
 * Translational cp, h - h(0 K) and s at 1 bar.
 * @param molarMassKgPerMol molar mass, kg/mol (caller validates > 0)
 * @param temperatureK temperature, K (caller validates > 0)
 */
export function translationalContribution(
  molarMassKgPerMol: number,
  temperatureK: number,
): ThermoContribution {
  const massKg = molarMassKgPerMol / AVOGADRO;
  const kT = BOLTZMANN * temperatureK;
  const lambdaTerm = Math.pow((2 * Math.PI * massKg * kT) / (PLANCK * PLANCK), 1.5);
  const entropy = R * (Math.log((lambdaTerm * kT) / STANDARD_PRESSURE_PA) + 2.5);
  return { cp: 2.5 * R, enthalpyFrom0K: 2.5 * R * temperatureK, entropy };
}
