/**
 * Rotational contribution of a nonlinear molecule (asymmetric, symmetric or spherical top),
 * classical (high-temperature) rigid rotor.
 *
 *   q_rot = (sqrt(pi) / sigma) * sqrt( T^3 / (theta_A theta_B theta_C) ),  theta_X = h c X / kB
 *   (h - h0) = 3/2 R T,  cv = 3/2 R,  s/R = ln q_rot + 3/2
 *
 * McQuarrie, Statistical Mechanics (2000), ch. 8; Hill, An Introduction to Statistical
 * Thermodynamics (1960), ch. 9. Symmetric tops
 * (two equal constants) and spherical tops (three equal) are the same formula.
 *
 * The classical limit is used. It is adequate once T is several times the largest rotational
 * temperature (H2O: theta_A = 40 K; NH3: 14 K; CH4: 7.5 K); the first quantum correction
 * (q multiplied by 1 + O(theta/T)) cancels to first order in s and cv, so at 298 K the error in
 * s for water is a few hundredths of a J/(mol K). Below about 5 theta_max it is not used (see the
 * valid range set in idealGasFromMolecule.ts).
 */
import { R } from "../../constants.js";
import { wavenumberToKelvin } from "./spectroscopicUnits.js";
import type { ThermoContribution } from "./types.js";

/**
 * @param constantsInvCm [A, B, C] rotational constants, cm^-1 (validated by caller)
 * @param symmetryNumber external rotational symmetry number sigma
 * @param temperatureK temperature, K
 */
export function nonlinearRotorContribution(
  constantsInvCm: readonly number[],
  symmetryNumber: number,
  temperatureK: number,
): ThermoContribution {
  const [a, b, c] = constantsInvCm.map(wavenumberToKelvin);
  const q = (Math.sqrt(Math.PI) / symmetryNumber) * Math.sqrt(temperatureK ** 3 / (a * b * c));
  return {
    cp: 1.5 * R,
    enthalpyFrom0K: 1.5 * R * temperatureK,
    entropy: R * (Math.log(q) + 1.5),
  };
}
