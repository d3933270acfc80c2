/**
 * Where the models of this library mean anything, and where a state is refused outright.
 *
 * Refused for every model (OutOfRangeError naming the input), the limits of physical sense for a
 * fluid of molecules:
 * - T below 1 K: every substance but helium is solid there and helium is a quantum fluid; no model
 *   here carries quantum corrections (common practice, no source). It also keeps (RT)^-2 and
 *   a/(RT) of the cubics far from overflow (5e-324 K gave NaN coefficients).
 * - T above 1e4 K: molecules are dissociated and partly ionised (hydrogen is almost fully
 *   dissociated near 5000 K at 1 bar, from memory of the NIST-JANAF tables' equilibrium constants);
 *   the ideal-gas routes stop at 6000 K or below anyway.
 * - P below 1e-20 Pa and a density below 1e-20 mol/m3 (about 6000 molecules per cubic metre):
 *   no fluid in the continuum sense, and it keeps P/(RT) and ln(rho) far from underflow
 *   (5e-324 Pa gave s = Infinity).
 * - P above 1e10 Pa (10 GPa): beyond the highest published range of the reference equations here
 *   (nitrogen, 2.2 GPa; Span et al. 2000), where molecular fluids freeze at ordinary temperatures;
 *   three orders of magnitude above process equipment. A (T, rho) state whose pressure exceeds it is
 *   refused the same way.
 *
 * Warned (ResultWarning "outside-validity", from the model's checkValidity), the stated range of
 * each model family:
 * - cubics (vdW, RK, SRK, PR; eos/cubic): T from 0.3 Tc of the heaviest component present (the
 *   alpha functions were fitted to vapour pressures between about Tr 0.4 and 1: Soave 1972, Peng
 *   and Robinson 1976) to 1500 K, P up to 100 MPa (common practice, no source: the equations are
 *   fitted to vapour pressures and used in gas processing well below that), density below 1/b
 *   (refused: stateAtTRho).
 * - virial (Tsonopoulos B): density below half the critical density (eos/virial).
 * - Lee-Kesler: 0.3 <= Tr <= 4 and Pr <= 10 (Lee and Kesler 1975; eos/leeKesler).
 * - reference equations: their published ranges and extrapolation ranges (eos/multiparameter),
 *   refused beyond the extrapolation range by the reference-state functions.
 * - ideal-gas heat capacities: each correlation's published range (idealgas/), refused beyond it.
 * - the "ideal-gas" model and models from a user's pressure function: no range beyond the limits
 *   above (the ideal gas is the model asked for; a user's function carries its own).
 */
import { OutOfRangeError } from "../errors.js";

/** Lowest temperature any model here is evaluated at, K. */
export const MIN_TEMPERATURE_K = 1;
/** Highest temperature any model here is evaluated at, K. */
export const MAX_TEMPERATURE_K = 1e4;
/** Lowest pressure any model here is evaluated at, Pa. */
export const MIN_PRESSURE_PA = 1e-20;
/** Lowest molar density any model here is evaluated at, mol/m3. */
export const MIN_DENSITY_MOL_PER_M3 = 1e-20;
/** Highest pressure any model here is evaluated at, Pa. */
export const MAX_PRESSURE_PA = 1e10;

/** Refuses T outside [1 K, 1e4 K] (call after the finite-positive check). */
export function refuseUnphysicalTemperature(temperatureK: number, input = "temperatureK"): void {
  if (!(temperatureK >= MIN_TEMPERATURE_K && temperatureK <= MAX_TEMPERATURE_K)) {
    throw new OutOfRangeError({
      input,
      unit: "K",
      validRange: `between ${MIN_TEMPERATURE_K} K and ${MAX_TEMPERATURE_K} K (the limits of physical sense for a molecular fluid: below 1 K quantum effects, above 1e4 K dissociation; see state/physicalLimits.ts)`,
      received: temperatureK,
    });
  }
}

/** Refuses P outside [1e-20 Pa, 1e10 Pa] (call after the finite-positive check). */
export function refuseUnphysicalPressure(pressurePa: number, input = "pressurePa"): void {
  if (!(pressurePa >= MIN_PRESSURE_PA && pressurePa <= MAX_PRESSURE_PA)) {
    throw new OutOfRangeError({
      input,
      unit: "Pa",
      validRange: `between ${MIN_PRESSURE_PA} Pa and ${MAX_PRESSURE_PA} Pa (10 GPa; the limits of physical sense for the fluid models here, see state/physicalLimits.ts)`,
      received: pressurePa,
    });
  }
}

/** Refuses a molar density below 1e-20 mol/m3 (call after the finite-positive check). */
export function refuseUnphysicalDensity(densityMolPerM3: number, input = "densityMolPerM3"): void {
  if (!(densityMolPerM3 >= MIN_DENSITY_MOL_PER_M3)) {
    throw new OutOfRangeError({
      input,
      unit: "mol/m3",
      validRange: `at least ${MIN_DENSITY_MOL_PER_M3} mol/m3 (below it there is no fluid in the continuum sense; see state/physicalLimits.ts)`,
      received: densityMolPerM3,
    });
  }
}
