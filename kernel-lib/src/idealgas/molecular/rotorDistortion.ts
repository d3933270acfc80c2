/**
 * First-order centrifugal-distortion correction of the classical rotation of a nonlinear molecule,
 * from Watson's A-reduced quartic constants (Watson, in Vibrational Spectra and Structure, vol. 6,
 * Durig ed., 1977; I^r representation: z = a, x = b, y = c):
 *   H_d = -Delta_J J^4 - Delta_JK J^2 J_z^2 - Delta_K J_z^4 - 2 delta_J J^2 (J_x^2 - J_y^2)
 *         - delta_K [J_z^2 (J_x^2 - J_y^2) + (J_x^2 - J_y^2) J_z^2].
 * In the classical limit J_a, J_b, J_c are independent Gaussian variables of variance
 * kB T / (2 A), kB T / (2 B), kB T / (2 C) (A, B, C as energies), so the first-order shift of the
 * free energy, <H_d> = -kappa (kB T)^2, gives
 *   h - h0 = +kappa (kB T)^2,   s = 2 kappa kB^2 T,   cv = 2 kappa kB^2 T   (per molecule),
 * with kappa = <sum of the quartic terms> / (kB T)^2 from the Gaussian moments <x^2> = v,
 * <x^4> = 3 v^2. (The standard first-order perturbation of a classical partition function; the
 * size, about 0.4 % of cp for water at 298 K, is what separates the rigid rotor from the
 * NIST-JANAF water table there.) Valid while the correction is small (it grows linearly with T:
 * for water 1.5 % of R at 298 K, 7 % at 1500 K).
 */
import { R } from "../../constants.js";
import { wavenumberToKelvin } from "./spectroscopicUnits.js";
import type { ThermoContribution, WatsonQuarticConstants } from "./types.js";

/**
 * The coefficient c (1/K) of the correction: h/R = c T^2, s/R = cv/R = 2 c T. In kelvin units
 * (theta_X = h c X / kB), <J_a^2> = T / (2 theta_A) etc., so <quartic terms>/kB = c T^2.
 */
export function distortionCoefficient(
  rotationalConstantsInvCm: readonly number[],
  d: WatsonQuarticConstants,
): number {
  const [a, b, c] = rotationalConstantsInvCm.map(wavenumberToKelvin);
  // variances per (kB T)^2 in kelvin units: <J_a^2> = T / (2 theta_A), ...
  const va = 1 / (2 * a);
  const vb = 1 / (2 * b);
  const vc = 1 / (2 * c);
  const ja4 = 3 * va * va;
  const jb4 = 3 * vb * vb;
  const jc4 = 3 * vc * vc;
  const j4 = ja4 + jb4 + jc4 + 2 * (va * vb + va * vc + vb * vc);
  const j2ja2 = ja4 + va * vb + va * vc;
  const j2bc = jb4 + va * vb + vb * vc - (jc4 + va * vc + vb * vc);
  const ja2bc = va * vb - va * vc;
  const k = wavenumberToKelvin;
  return (
    k(d.deltaJInvCm) * j4 +
    k(d.deltaJKInvCm) * j2ja2 +
    k(d.deltaKInvCm) * ja4 +
    2 * k(d.smallDeltaJInvCm) * j2bc +
    2 * k(d.smallDeltaKInvCm) * ja2bc
  );
}

/** The correction at temperature T (K); add it to the classical rotor's contribution. */
export function rotorDistortionContribution(
  coefficient: number,
  temperatureK: number,
): ThermoContribution {
  const t = temperatureK;
  return {
    cp: 2 * coefficient * t * R,
    enthalpyFrom0K: coefficient * t * t * R,
    entropy: 2 * coefficient * t * R,
  };
}
