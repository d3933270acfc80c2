/**
 * Reference states of the ideal gas: which zero enthalpy and entropy are measured from.
 *
 * - "formation": the elements in their standard reference states at 298.15 K and 1 bar have h = 0
 *   and s = their third-law entropies. Then a component's ideal-gas enthalpy is
 *   h(T) = Hf(298.15 K) + [h(T) - h(298.15 K)] and its entropy the absolute (third-law) entropy,
 *   s(T, P) = s°(T) - R ln(P / 1 bar). Needs Hf and s°(298.15 K) of every component.
 * - "zero-at" (T0, P0): each pure ideal gas has h = 0 and s = 0 at T0 and P0:
 *   h(T) = h(T) - h(T0), s(T, P) = s°(T) - s°(T0) - R ln(P / P0). Needs no formation data, so it
 *   works for petroleum pseudo-components. (A mixture at T0, P0 still has the entropy of mixing.)
 *
 * Every IdealGasProperties result carries the ReferenceState it was computed in.
 */
import { InputError } from "../errors.js";
import { requirePositive } from "../validate.js";
import { getComponent } from "../components/getComponent.js";
import type { Component } from "../components/types.js";
import {
  STANDARD_PRESSURE_PA,
  type IdealGasPure,
  type ReferenceState,
  type SaturatedLiquidReference,
} from "./types.js";

/** The formation basis (elements at 298.15 K and 1 bar). */
export function formationReferenceState(): ReferenceState {
  return FORMATION;
}
const FORMATION: ReferenceState = Object.freeze({ kind: "formation" });

/**
 * h = 0 and s = 0 for each pure ideal gas at temperatureK (K) and pressurePa (Pa).
 * @example zeroAtReferenceState(273.15, 101325)
 */
export function zeroAtReferenceState(temperatureK: number, pressurePa: number): ReferenceState {
  requirePositive("referenceState.temperatureK", temperatureK, "K");
  requirePositive("referenceState.pressurePa", pressurePa, "Pa");
  return Object.freeze({ kind: "zero-at", temperatureK, pressurePa });
}

/** One line describing a reference state, for tables and records. */
export function describeReferenceState(reference: ReferenceState): string {
  switch (reference.kind) {
    case "formation":
      return "formation basis: elements in their standard states at 298.15 K and 1 bar (h = enthalpy of formation, s = third-law entropy)";
    case "zero-at":
      return `h = 0 and s = 0 for each pure ideal gas at ${reference.temperatureK} K and ${reference.pressurePa} Pa`;
    case "fluid-convention":
      return `fluid convention: ${reference.description}`;
    case "saturated-liquid":
      return describeSaturatedLiquidReference(reference);
  }
}

/** The saturated-liquid convention in words, e.g. "saturated liquid at 273.15 K: h = 200 kJ/kg, s = 1 kJ/(kg K)". */
export function describeSaturatedLiquidReference(reference: SaturatedLiquidReference): string {
  const { temperatureText, hJPerKg, sJPerKgK } = saturatedLiquidTargets(reference);
  return `saturated liquid of each component at ${temperatureText}: h = ${hJPerKg / 1000} kJ/kg, s = ${sJPerKgK / 1000} kJ/(kg K)`;
}

/** The temperature (K, or undefined for the normal boiling point) and the h, s values of a convention. */
export function saturatedLiquidTargets(reference: SaturatedLiquidReference): {
  temperatureK: number | undefined;
  temperatureText: string;
  hJPerKg: number;
  sJPerKgK: number;
} {
  const at = reference.at;
  const zeroCelsius = at === "0 degC";
  const hJPerKg = reference.hJPerKg ?? (zeroCelsius ? 200e3 : 0);
  const sJPerKgK = reference.sJPerKgK ?? (zeroCelsius ? 1e3 : 0);
  if (!Number.isFinite(hJPerKg) || !Number.isFinite(sJPerKgK)) {
    throw new InputError({
      input: "referenceState.hJPerKg, referenceState.sJPerKgK",
      unit: "J/kg, J/(kg K)",
      validRange: "finite numbers",
      received: [reference.hJPerKg, reference.sJPerKgK],
    });
  }
  if (at === "0 degC")
    return { temperatureK: 273.15, temperatureText: "0 degC (273.15 K)", hJPerKg, sJPerKgK };
  if (at === "-40 degC")
    return { temperatureK: 233.15, temperatureText: "-40 degC (233.15 K)", hJPerKg, sJPerKgK };
  if (at === "normal-boiling-point") {
    return {
      temperatureK: undefined,
      temperatureText: "its normal boiling point (101.325 kPa)",
      hJPerKg,
      sJPerKgK,
    };
  }
  if (typeof at === "number" && at > 0 && Number.isFinite(at)) {
    return { temperatureK: at, temperatureText: `${at} K`, hJPerKg, sJPerKgK };
  }
  throw new InputError({
    input: "referenceState.at",
    unit: "K",
    validRange: '"0 degC", "-40 degC", "normal-boiling-point" or a temperature > 0 K',
    received: at,
  });
}

/** A pure component's ideal-gas h and s at its reference pressure, in a reference state. */
export interface PureReferenceValues {
  /** J/mol */
  readonly h: number;
  /** Entropy at `pressurePa`, J/(mol K). */
  readonly s: number;
  /** The pressure at which `s` holds (1 bar or the zero-at pressure), Pa. */
  readonly pressurePa: number;
}

/**
 * Ideal-gas h(T) and s(T, P_ref) of a pure component in a reference state. `component` supplies the
 * enthalpy of formation for the formation basis; when absent it is taken from the pure itself (a
 * correlation route pure carries its component) or looked up by componentId in the table.
 */
export function pureReferenceValues(
  pure: IdealGasPure,
  temperatureK: number,
  reference: ReferenceState,
  component?: Component,
): PureReferenceValues {
  switch (reference.kind) {
    case "formation": {
      const hf = formationComponent(pure, component).enthalpyOfFormationJPerMol;
      if (!Number.isFinite(hf)) {
        throw new InputError({
          input: `enthalpy of formation of ${pure.componentId}`,
          unit: "J/mol",
          validRange: "known (needed by the formation reference state)",
          received: hf,
          hint: 'Use a "zero-at" reference state for components without formation data',
        });
      }
      return {
        h: hf + pure.enthalpyFrom298(temperatureK),
        s: pure.entropyStandard(temperatureK),
        pressurePa: STANDARD_PRESSURE_PA,
      };
    }
    case "zero-at": {
      const t0 = reference.temperatureK;
      return {
        h: pure.enthalpyFrom298(temperatureK) - pure.enthalpyFrom298(t0),
        s: sensibleEntropy(pure, temperatureK) - sensibleEntropy(pure, t0),
        pressurePa: reference.pressurePa,
      };
    }
    case "fluid-convention":
    case "saturated-liquid":
      throw new InputError({
        input: "referenceState.kind",
        unit: "-",
        validRange: '"formation" or "zero-at" for an ideal-gas mixture',
        received: reference.kind,
        hint: "Fluid conventions belong to the reference equation that defines them, saturated-liquid conventions to a fluid (defineFluid)",
      });
  }
}

/** s°(T) - s°(298.15 K), J/(mol K), without needing the absolute entropy when the pure offers it. */
function sensibleEntropy(pure: IdealGasPure, temperatureK: number): number {
  const withSensible = pure as IdealGasPure & { entropyFrom298?: (t: number) => number };
  if (typeof withSensible.entropyFrom298 === "function")
    return withSensible.entropyFrom298(temperatureK);
  return pure.entropyStandard(temperatureK);
}

function formationComponent(pure: IdealGasPure, component?: Component): Component {
  if (component) return component;
  const carried = (pure as IdealGasPure & { component?: Component }).component;
  if (carried) return carried;
  return getComponent(pure.componentId);
}
