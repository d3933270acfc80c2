/**
 * Ideal-gas properties of one pure component from its heat-capacity correlation (the correlation
 * route of the IdealGasPure contract). cp is evaluated directly; the sensible enthalpy and entropy
 * are the closed-form integrals of cp and cp/T from 298.15 K (idealgas/cpCorrelation.ts), added to
 * the component's third-law entropy at 298.15 K and 1 bar.
 *
 * Temperatures outside the correlation's range but within the extrapolation margin (10 % of the
 * limit by default) are computed by extrapolating the correlation; beyond it they are refused with
 * OutOfRangeError (see temperatureRange.ts). The mixture (`idealGasMixture`) attaches the warnings.
 */
import { InputError } from "../errors.js";
import type { Component } from "../components/types.js";
import { resolveComponent } from "../components/getComponent.js";
import {
  compileCorrelation,
  correlationCp,
  correlationCpIntegral,
  correlationCpOverTIntegral,
} from "./cpCorrelation.js";
import { checkTemperatureRange, type TemperatureRangeOptions } from "./temperatureRange.js";
import { STANDARD_TEMPERATURE_K, type IdealGasPure } from "./types.js";
import { registerUncheckedPure, type UncheckedPure } from "./uncheckedPure.js";

/** An IdealGasPure built from a Component's cp correlation; keeps the component for its formation data. */
export interface CorrelationIdealGas extends IdealGasPure {
  /** The component whose correlation and formation data are used. */
  readonly component: Component;
  /** Sensible entropy s°(T) - s°(298.15 K) at constant pressure, J/(mol K); needs no absolute entropy. */
  entropyFrom298(temperatureK: number): number;
}

/**
 * Ideal-gas model of a component from its heat-capacity correlation. Takes a Component or a name
 * for `getComponent` (id, formula, CAS number or synonym).
 *
 * @param options.extrapolationMargin allowed extrapolation beyond the correlation's range as a
 *   fraction of the limit (default 0.1); further out every method throws OutOfRangeError.
 * @example idealGasFromCorrelation(getComponent("methane")).cp(500) // ~ 46.5 J/(mol K)
 */
export function idealGasFromCorrelation(
  componentOrName: Component | string,
  options: TemperatureRangeOptions = {},
): CorrelationIdealGas {
  const component = resolveComponent(componentOrName);
  const correlation = component.idealGasCp;
  const formName =
    correlation.form === "polynomial" ? "polynomial cp correlation" : "Aly-Lee cp correlation";
  const method = `heat-capacity correlation (${formName}: ${shortSource(component.sources.heatCapacity)})`;
  const range = { min: correlation.minTemperatureK, max: correlation.maxTemperatureK };
  const check = (t: number) => {
    // inside the range with a valid margin there is nothing to report: skip the general check
    const margin = options.extrapolationMargin;
    if (
      t > 0 &&
      t >= range.min &&
      t <= range.max &&
      (margin === undefined || (margin >= 0 && margin < 1))
    )
      return;
    checkTemperatureRange(component.id, method, range, t, options);
  };
  const compiled = compileCorrelation(correlation);
  const unchecked: UncheckedPure = {
    evaluate: compiled.evaluate,
    evaluateWithLog: compiled.evaluateWithLog,
    absoluteEntropy298: component.absoluteEntropyJPerMolK,
  };
  const pure: CorrelationIdealGas = Object.freeze({
    componentId: component.id,
    method,
    source: component.sources.heatCapacity,
    validTemperatureK: Object.freeze(range),
    ...(options.extrapolationMargin !== undefined
      ? { extrapolationMargin: options.extrapolationMargin }
      : {}),
    component,
    cp(temperatureK: number): number {
      check(temperatureK);
      return correlationCp(correlation, temperatureK);
    },
    enthalpyFrom298(temperatureK: number): number {
      check(temperatureK);
      return correlationCpIntegral(correlation, STANDARD_TEMPERATURE_K, temperatureK);
    },
    entropyFrom298(temperatureK: number): number {
      check(temperatureK);
      return correlationCpOverTIntegral(correlation, STANDARD_TEMPERATURE_K, temperatureK);
    },
    entropyStandard(temperatureK: number): number {
      check(temperatureK);
      const s298 = component.absoluteEntropyJPerMolK;
      if (!Number.isFinite(s298)) {
        throw new InputError({
          input: `absolute entropy of ${component.id}`,
          unit: "J/(mol K)",
          validRange: "known (set absoluteEntropyJPerMolK)",
          received: s298,
          hint: 'Use a "zero-at" reference state, which needs only entropy differences',
        });
      }
      return s298 + correlationCpOverTIntegral(correlation, STANDARD_TEMPERATURE_K, temperatureK);
    },
  });
  // with an invalid margin every public method throws; leave such a pure to the general path
  const margin = options.extrapolationMargin;
  if (margin === undefined || (margin >= 0 && margin < 1)) registerUncheckedPure(pure, unchecked);
  return pure;
}

/**
 * The citation up to its first ":" or ";" (author, year, table), at most 140 characters, so a
 * method name says which correlation it is without the whole provenance note.
 */
function shortSource(source: string): string {
  const cut = source.search(/[:;]/);
  const head = (cut > 0 ? source.slice(0, cut) : source).trim();
  return head.length > 140 ? `${head.slice(0, 139)}…` : head;
}
