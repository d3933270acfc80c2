/**
 * Electronic contribution from a list of levels (term value and degeneracy).
 *
 *   q_el = sum_i g_i exp(-theta_i / T),  theta_i = h c T_i / kB
 * McQuarrie, Statistical Mechanics (2000), ch. 5 and 6. Only the listed levels are
 * included; for the molecules shipped here the next levels lie far above kB T at 3000 K, except
 * where the data notes say otherwise.
 */
import { wavenumberToKelvin } from "./spectroscopicUnits.js";
import { levelSumContribution } from "./levelSum.js";
import type { ElectronicLevel, ThermoContribution } from "./types.js";

/** Electronic contribution of `levels` at temperature T (K). */
export function electronicContribution(
  levels: readonly ElectronicLevel[],
  temperatureK: number,
): ThermoContribution {
  return levelSumContribution(
    {
      thetaK: levels.map((l) => wavenumberToKelvin(l.energyInvCm)),
      degeneracy: levels.map((l) => l.degeneracy),
    },
    temperatureK,
  );
}
