/**
 * The ideal-gas part phi_0 of a reference equation, offered two ways:
 *
 * 1. {@link referenceIdealGasPure}: the library's IdealGasPure contract (cp(T), h(T) - h(298.15 K),
 *    third-law entropy at 1 bar), so a reference fluid's ideal gas can join any mixture and any
 *    reference state ("formation", "zero-at"). Its entropy is anchored to a tabulated third-law
 *    value at 298.15 K (source in the fluid's data file); its temperature dependence is phi_0's.
 * 2. {@link referenceIdealGasMixture}: a one-component IdealGasMixture in the publication's own
 *    reference state ("fluid-convention", e.g. IAPWS-95: u = s = 0 for the saturated liquid at the
 *    triple point), so the engine's states reproduce the published tables exactly.
 *
 * From phi_0(tau, delta) with reduced derivatives (X_T = tau dX/dtau):
 *   h0 / RT = 1 + phi0_T,  u0 / RT = phi0_T,  s0 / R = phi0_T - phi0,
 *   cv0 / R = -phi0_TT,    cp0 / R = 1 - phi0_TT
 * (W. Wagner and A. Pruss, J. Phys. Chem. Ref. Data 31, 387 (2002), Table 6.3 with phi_r = 0).
 */
import { requirePositive } from "../../validate.js";
import { checkMoleFractions } from "../../components/composition.js";
import type { ResultWarning } from "../../errors.js";
import {
  STANDARD_PRESSURE_PA,
  STANDARD_TEMPERATURE_K,
  type IdealGasMixture,
  type IdealGasProperties,
  type IdealGasPure,
} from "../../idealgas/types.js";
import type { ReferenceFluid } from "./referenceFluid.js";
import { emptyReducedHelmholtz } from "./residualPart.js";

/** Ideal-gas h, s, cp, cv of a reference fluid at (T, P) in its own reference state. */
function idealAt(
  fluid: ReferenceFluid,
  temperatureK: number,
  pressurePa: number,
): { h: number; s: number; u: number; a: number; g: number; cp: number; cv: number } {
  const R = fluid.gasConstant;
  const tau = fluid.reducing.temperatureK / temperatureK;
  const delta = pressurePa / (R * temperatureK) / fluid.reducing.densityMolPerM3;
  const o = fluid.idealReduced(tau, delta, emptyReducedHelmholtz());
  const RT = R * temperatureK;
  return {
    h: RT * (1 + o.fT),
    u: RT * o.fT,
    s: R * (o.fT - o.f),
    a: RT * o.f,
    g: RT * (o.f + 1),
    cp: R * (1 - o.fTT),
    cv: -R * o.fTT,
  };
}

/**
 * The reference fluid's ideal part as an {@link IdealGasPure} (third-law entropy basis).
 *
 * @example
 * ```ts
 * referenceIdealGasPure(referenceFluid("water")).cp(298.15); // ~33.58 J/(mol K)
 * ```
 */
export function referenceIdealGasPure(fluid: ReferenceFluid): IdealGasPure {
  const v = fluid.data.validity;
  const s298 = idealAt(fluid, STANDARD_TEMPERATURE_K, STANDARD_PRESSURE_PA).s;
  const h298 = idealAt(fluid, STANDARD_TEMPERATURE_K, STANDARD_PRESSURE_PA).h;
  const anchor = fluid.data.thirdLawEntropyJPerMolK;
  return {
    componentId: fluid.data.id,
    method: `ideal part phi_0 of ${fluid.data.name}`,
    source: `${fluid.data.citations.equation} Entropy anchored at 298.15 K: ${fluid.data.citations.thirdLawEntropy}`,
    validTemperatureK: { min: v.temperatureK.min, max: v.temperatureK.max },
    cp: (T: number) =>
      idealAt(fluid, requirePositive("temperatureK", T, "K"), STANDARD_PRESSURE_PA).cp,
    enthalpyFrom298: (T: number) =>
      idealAt(fluid, requirePositive("temperatureK", T, "K"), STANDARD_PRESSURE_PA).h - h298,
    entropyStandard: (T: number) =>
      idealAt(fluid, requirePositive("temperatureK", T, "K"), STANDARD_PRESSURE_PA).s -
      s298 +
      anchor,
  };
}

/**
 * A one-component ideal-gas "mixture" in the reference fluid's published reference state, for the
 * engine's state functions (see {@link referenceFluidBinding}).
 */
export function referenceIdealGasMixture(fluid: ReferenceFluid): IdealGasMixture {
  const pure = referenceIdealGasPure(fluid);
  const none: readonly ResultWarning[] = [];
  return {
    components: [pure],
    referenceState: fluid.referenceState,
    at(temperatureK: number, pressurePa: number, x: readonly number[]): IdealGasProperties {
      requirePositive("temperatureK", temperatureK, "K");
      requirePositive("pressurePa", pressurePa, "Pa");
      // Fast path for the one valid composition; anything else gets the full check (and its error).
      if (!(x.length === 1 && x[0] === 1)) checkMoleFractions(x, 1, { input: "x" });
      return {
        temperatureK,
        pressurePa,
        ...idealAt(fluid, temperatureK, pressurePa),
        referenceState: fluid.referenceState,
        warnings: none,
      };
    },
  };
}
