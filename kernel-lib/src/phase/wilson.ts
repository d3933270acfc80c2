/**
 * Wilson's estimate of the vapour pressure and of K-factors from critical constants (G. M. Wilson,
 * "A modified Redlich-Kwong equation of state, application to general physical data
 * calculations", AIChE 65th National Meeting, Cleveland, 1968; as used in M. L. Michelsen and
 * J. M. Mollerup, Thermodynamic Models, 2nd ed. (2007), ch. 9 and 10):
 *   ln(P_sat / Pc) = 5.373 (1 + omega) (1 - Tc / T),   K = (Pc / P) exp(5.373 (1 + omega) (1 - Tc / T)).
 * The starting values of the saturation solver, the stability test and (to come) the flash and
 * envelopes. The constant is written only here (tests/unit/architecture/onePlace.test.ts).
 */

/** ln(P_sat / Pc) at T (K) for critical temperature Tc (K) and acentric factor omega. */
export function wilsonLnReducedVaporPressure(
  temperatureK: number,
  criticalTemperatureK: number,
  acentricFactor: number,
): number {
  return 5.373 * (1 + acentricFactor) * (1 - criticalTemperatureK / temperatureK);
}

/** Wilson's K-factor y/x of a component at T (K) and P (Pa), from Tc (K), Pc (Pa) and omega. */
export function wilsonK(
  temperatureK: number,
  pressurePa: number,
  criticalTemperatureK: number,
  criticalPressurePa: number,
  acentricFactor: number,
): number {
  return (
    (criticalPressurePa / pressurePa) *
    Math.exp(wilsonLnReducedVaporPressure(temperatureK, criticalTemperatureK, acentricFactor))
  );
}
