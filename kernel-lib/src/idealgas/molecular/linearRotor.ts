/**
 * Rotational contribution of a linear molecule, classical (high-temperature) rigid rotor.
 *
 *   q_rot = T / (sigma theta_r),  theta_r = h c B / kB
 *   (h - h0) = R T,  cv = R,  s/R = ln q_rot + 1
 *
 * McQuarrie, Statistical Mechanics (2000), ch. 6 (rotational partition function, symmetry number).
 *
 * The classical limit is used: it is good to about (theta_r/T)^2/45 in cv and better in s once
 * T >> theta_r. It fails at low T for molecules with a large rotational constant, H2 above all
 * (theta_r = 85 K: at 100 K the classical cv is off by tens of percent, and ortho/para nuclear spin
 * statistics matter). Use `linearRotorLevels.ts` (explicit level sum) for such molecules.
 */
import { R } from "../../constants.js";
import { wavenumberToKelvin } from "./spectroscopicUnits.js";
import type { ThermoContribution } from "./types.js";

/**
 * @param rotationalConstantInvCm ground-state rotational constant B, cm^-1 (validated by caller)
 * @param symmetryNumber sigma (1 heteronuclear, 2 homonuclear/centrosymmetric)
 * @param temperatureK temperature, K
 */
export function linearRotorContribution(
  rotationalConstantInvCm: number,
  symmetryNumber: number,
  temperatureK: number,
): ThermoContribution {
  const thetaR = wavenumberToKelvin(rotationalConstantInvCm);
  const q = temperatureK / (symmetryNumber * thetaR);
  return { cp: R, enthalpyFrom0K: R * temperatureK, entropy: R * (Math.log(q) + 1) };
}
