/**
 * The saturated-liquid reference states of the trade (idealgas/types.ts SaturatedLiquidReference):
 * the fluid is first bound in an auxiliary basis (h = s = 0 for each pure ideal gas at 298.15 K
 * and 1 bar), then each component's ideal-gas h and s are shifted by constants so that its own
 * saturated liquid (the fluid's model, component alone) has the stated h and s at the stated
 * temperature. Shifts are per component and linear in the mole fractions, so every difference
 * between states (duties, heads, latent heats, Gibbs energies of phase splits at one feed) is the
 * same as in any other basis; only the zero moves.
 */
import { InputError } from "../errors.js";
import type { Component } from "../components/types.js";
import type { IdealGasMixture, SaturatedLiquidReference } from "../idealgas/types.js";
import { shiftedIdealGas } from "../idealgas/shiftedMixture.js";
import { saturatedLiquidTargets } from "../idealgas/referenceState.js";
import { componentCritical, componentSaturation } from "../phase/flash/pureComponent.js";
import { stateAtTRho } from "../state/stateAt.js";
import type { FluidBinding } from "../state/types.js";

/** Normal boiling point pressure, Pa (1 atm). */
const NORMAL_PRESSURE_PA = 101325;

/**
 * The ideal-gas mixture of `binding` (any basis) shifted to the saturated-liquid convention.
 * @throws InputError naming the component when the convention's temperature is at or above its
 *   critical temperature in this model (no saturated liquid there).
 */
export function shiftToSaturatedLiquid(
  binding: FluidBinding,
  components: readonly Component[],
  reference: SaturatedLiquidReference,
): IdealGasMixture {
  const targets = saturatedLiquidTargets(reference);
  const n = components.length;
  const dh = new Float64Array(n);
  const ds = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const critical = componentCritical(binding, k);
    let T = targets.temperatureK;
    if (T === undefined) {
      if (!(critical.pressurePa > NORMAL_PRESSURE_PA)) {
        throw new InputError({
          input: "referenceState.at",
          unit: "-",
          validRange: `a temperature: ${components[k].name} has no normal boiling point in this model (critical pressure ${critical.pressurePa} Pa)`,
          received: reference.at,
        });
      }
      T = componentSaturation(binding, k, { pressurePa: NORMAL_PRESSURE_PA }).temperatureK;
    }
    if (!(T < critical.temperatureK)) {
      throw new InputError({
        input: "referenceState.at",
        unit: "K",
        validRange: `below the critical temperature of ${components[k].name} in this model (${critical.temperatureK.toFixed(2)} K), where it has a saturated liquid`,
        received: T,
        hint: 'For components above their critical temperature use at: "normal-boiling-point", or a "zero-at" or "formation" reference state',
      });
    }
    const sat = componentSaturation(binding, k, { temperatureK: T });
    const e = components.map((_, i) => (i === k ? 1 : 0));
    const liquid = stateAtTRho(binding, T, sat.liquidDensityMolPerM3, e);
    const M = components[k].molarMassKgPerMol;
    dh[k] = targets.hJPerKg * M - liquid.molar.h;
    ds[k] = targets.sJPerKgK * M - liquid.molar.s;
  }
  return shiftedIdealGas(binding.idealGas, dh, ds, reference);
}
