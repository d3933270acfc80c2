/**
 * Ideal-gas mixture: molar properties at (T, P, x) from one IdealGasPure per component (any route:
 * heat-capacity correlations or statistical mechanics), in an explicit reference state:
 *   h  = sum x_i h_i(T)
 *   s  = sum x_i s_i(T, P_ref) - R ln(P / P_ref) - R sum x_i ln x_i   (ideal entropy of mixing)
 *   u  = h - R T,  g = h - T s,  a = u - T s,  cp = sum x_i cp_i,  cv = cp - R
 * (e.g. Smith, Van Ness & Abbott, Introduction to Chemical Engineering Thermodynamics, 7th ed.,
 * ch. 10, ideal-gas mixture model). Components with x_i = 0 contribute nothing (0 ln 0 = 0) and are
 * not evaluated, so a zero entry never triggers a range error. Warnings a component carries (e.g. a
 * group-contribution cp, or a pseudo-component estimated outside its correlation's range) are passed
 * on to every result in which that component is present.
 */
import { R } from "../constants.js";
import { InputError, type ResultWarning } from "../errors.js";
import { checkMoleFractions } from "../components/composition.js";
import type { Component } from "../components/types.js";
import { requirePositive } from "../validate.js";
import { pushUnique } from "./messages.js";
import { formationReferenceState, pureReferenceValues } from "./referenceState.js";
import { checkTemperatureRange, type TemperatureRangeOptions } from "./temperatureRange.js";
import type { IdealGasMixture, IdealGasProperties, IdealGasPure, ReferenceState } from "./types.js";

/** Options for `idealGasMixture`. */
export interface IdealGasMixtureOptions extends TemperatureRangeOptions {
  /** Zero of h and s. Default: the formation basis ({ kind: "formation" }). */
  referenceState?: ReferenceState;
  /**
   * Components in the same order as the pures, supplying enthalpies of formation for the formation
   * basis. Default: the component a correlation pure carries, else a table lookup by componentId.
   */
  components?: readonly Component[];
}

/**
 * Builds an ideal-gas mixture model.
 * @example
 * const gas = idealGasMixture(["methane", "ethane"].map((n) => idealGasFromCorrelation(getComponent(n))));
 * gas.at(400, 2e6, [0.9, 0.1]).h // J/mol, formation basis
 */
export function idealGasMixture(
  pures: readonly IdealGasPure[],
  options: IdealGasMixtureOptions = {},
): IdealGasMixture {
  if (!(Array.isArray(pures) && pures.length > 0)) {
    throw new InputError({
      input: "pures",
      unit: "-",
      validRange: "a non-empty array of IdealGasPure",
      received: pures,
    });
  }
  pures.forEach((p, i) => {
    if (!(
      p &&
      typeof p.cp === "function" &&
      typeof p.enthalpyFrom298 === "function" &&
      typeof p.entropyStandard === "function"
    )) {
      throw new InputError({
        input: `pures[${i}]`,
        unit: "-",
        validRange: "an IdealGasPure",
        received: p,
      });
    }
  });
  const components = options.components;
  if (components !== undefined && components.length !== pures.length) {
    throw new InputError({
      input: "components.length",
      unit: "-",
      validRange: `${pures.length} (one per pure)`,
      received: components.length,
    });
  }
  const referenceState = options.referenceState ?? formationReferenceState();
  if (referenceState.kind === "zero-at") {
    requirePositive("referenceState.temperatureK", referenceState.temperatureK, "K");
    requirePositive("referenceState.pressurePa", referenceState.pressurePa, "Pa");
  }
  const list = Object.freeze([...pures]);

  function at(temperatureK: number, pressurePa: number, x: readonly number[]): IdealGasProperties {
    requirePositive("temperatureK", temperatureK, "K");
    requirePositive("pressurePa", pressurePa, "Pa");
    checkMoleFractions(x, list.length);
    const warnings: ResultWarning[] = [];
    let h = 0;
    let s = 0;
    let cp = 0;
    for (let i = 0; i < list.length; i++) {
      if (x[i] === 0) continue;
      const pure = list[i];
      for (const w of checkTemperatureRange(
        pure.componentId,
        pure.method,
        pure.validTemperatureK,
        temperatureK,
        options,
      )) {
        pushUnique(warnings, w);
      }
      if (referenceState.kind === "zero-at") {
        for (const w of checkTemperatureRange(
          pure.componentId,
          pure.method,
          pure.validTemperatureK,
          referenceState.temperatureK,
          options,
        )) {
          pushUnique(warnings, w);
        }
      }
      const carried =
        components?.[i] ?? (pure as IdealGasPure & { component?: Component }).component;
      for (const w of carried?.warnings ?? []) pushUnique(warnings, w);
      const ref = pureReferenceValues(pure, temperatureK, referenceState, components?.[i]);
      h += x[i] * ref.h;
      s += x[i] * (ref.s - R * Math.log(pressurePa / ref.pressurePa) - R * Math.log(x[i]));
      cp += x[i] * pure.cp(temperatureK);
    }
    const u = h - R * temperatureK;
    return Object.freeze({
      temperatureK,
      pressurePa,
      h,
      s,
      u,
      a: u - temperatureK * s,
      g: h - temperatureK * s,
      cp,
      cv: cp - R,
      referenceState,
      warnings: Object.freeze(warnings),
    });
  }

  return Object.freeze({ components: list, referenceState, at });
}
