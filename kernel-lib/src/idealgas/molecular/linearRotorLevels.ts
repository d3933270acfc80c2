/**
 * Rotational contribution of a linear molecule by an explicit sum over rigid-rotor levels,
 * with nuclear-spin statistics in ortho/para equilibrium.
 *
 *   q_rot = [2 / (sigma (g_even + g_odd))] * sum_J g(J) (2J + 1) exp(-theta_r J(J+1) / T)
 *
 * where g(J) is the nuclear-spin weight of even or odd J (H2: 1 and 3). The sum is the
 * "equilibrium" mixture: ortho and para forms interconvert and share one Boltzmann distribution
 * (McQuarrie, Statistical Mechanics, 2000, ch. 6, section on the rotational partition function of
 * hydrogen, equilibrium case; equation numbers not re-checked). The prefactor
 * divides out the nuclear-spin degeneracy (2I+1)^2, as third-law tables do, so that q_rot tends to
 * the classical T/(sigma theta_r) at high T. For a heteronuclear molecule use weights 1 and 1 with
 * sigma = 1.
 *
 * "Normal" hydrogen (option `spinModifications: "normal"`): ortho and para do not interconvert (a
 * gas cooled without a conversion catalyst keeps its room-temperature 3:1 ratio), so the gas is an
 * ideal mixture of two species with the high-temperature fractions x_even = g_even/(g_even + g_odd)
 * and x_odd = g_odd/(g_even + g_odd), each with its own level sum over even or odd J:
 *   cv = x_e cv_e + x_o cv_o,  h - h0 = x_e (h_e - h0) + x_o (h_o - h0)  (h0: the J = 0 level),
 *   s = x_e s_e + x_o s_o - R (x_e ln x_e + x_o ln x_o) - R ln((g_e + g_o) sigma / 2),
 * where s_e, s_o include their spin weights; at high T s tends to the same classical value as the
 * equilibrium sum, so both share the third-law convention above (McQuarrie 2000, ch. 6, the
 * frozen "normal hydrogen" case). The two differ in cv below about 250 K (by 20 % at 100 K).
 * The levels are E_J = B0 x - D0 x^2 + H0 x^3, x = J(J+1) (ground state with centrifugal distortion
 * when D0, H0 are given; Huber & Herzberg 1979 give them for the diatomics): for H2 the distortion
 * raises cp at 298.15 K by 0.3 % (the rigid levels put J = 4 18 cm^-1 too high). The levels of the
 * excited vibrational states are those of the ground state (no vibration-rotation coupling), which
 * matters only at high T.
 */
import { wavenumberToKelvin } from "./spectroscopicUnits.js";
import { R } from "../../constants.js";
import { levelSumContribution } from "./levelSum.js";
import type { NuclearSpinWeights, ThermoContribution } from "./types.js";

/** Options for the explicit rotational level sum. */
export interface LinearRotorLevelsOptions {
  /** Stop the sum when E_J/(kB T) exceeds this. Default 60 (terms below e^-60 dropped). */
  readonly cutoff?: number;
  /** [D, H], cm^-1: E_J = B x - D x^2 + H x^3, x = J(J+1). Default: rigid rotor. */
  readonly centrifugalDistortionInvCm?: readonly number[];
  /**
   * "equilibrium" (default): even and odd J share one Boltzmann distribution. "normal": the even-J
   * and odd-J species are frozen at their high-temperature fractions (see the header).
   */
  readonly spinModifications?: "equilibrium" | "normal";
}

/**
 * @param rotationalConstantInvCm B0, cm^-1
 * @param symmetryNumber sigma
 * @param weights nuclear-spin weights of even and odd J
 * @param temperatureK temperature, K
 */
export function linearRotorLevelsContribution(
  rotationalConstantInvCm: number,
  symmetryNumber: number,
  weights: NuclearSpinWeights,
  temperatureK: number,
  options: LinearRotorLevelsOptions = {},
): ThermoContribution {
  const cutoff = options.cutoff ?? 60;
  const thetaR = wavenumberToKelvin(rotationalConstantInvCm);
  const [distortionD, distortionH] = options.centrifugalDistortionInvCm ?? [0, 0];
  const thetaD = wavenumberToKelvin(distortionD);
  const thetaH = wavenumberToKelvin(distortionH);
  const theta: number[] = [];
  const g: number[] = [];
  for (let j = 0; ; j++) {
    const x = j * (j + 1);
    const th = x * (thetaR - x * (thetaD - x * thetaH));
    theta.push(th);
    g.push((j % 2 === 0 ? weights.even : weights.odd) * (2 * j + 1));
    if (th / temperatureK > cutoff && j > 2) break;
  }
  const prefactor = 2 / (symmetryNumber * (weights.even + weights.odd));
  if (options.spinModifications !== "normal") {
    return levelSumContribution({ thetaK: theta, degeneracy: g, prefactor }, temperatureK);
  }
  const total = weights.even + weights.odd;
  let cp = 0;
  let h = 0;
  let s = -R * Math.log(1 / prefactor);
  for (const parity of [0, 1]) {
    const x = (parity === 0 ? weights.even : weights.odd) / total;
    const th = theta.filter((_, j) => j % 2 === parity);
    const part = levelSumContribution(
      { thetaK: th, degeneracy: g.filter((_, j) => j % 2 === parity) },
      temperatureK,
    );
    // levelSum measures h from each species' own lowest level; h here is measured from J = 0
    // (s does not depend on where the levels are measured from)
    cp += x * part.cp;
    h += x * (part.enthalpyFrom0K + R * th[0]);
    s += x * (part.entropy - R * Math.log(x));
  }
  return { cp, enthalpyFrom0K: h, entropy: s };
}
