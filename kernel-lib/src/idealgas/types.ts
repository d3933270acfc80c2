/**
 * The ideal-gas contract. Two routes implement it: heat-capacity correlations
 * (idealgas/correlation*.ts) and statistical mechanics from molecular constants
 * (idealgas/molecular/). Reference-quality fluids (eos/multiparameter) implement it from their
 * own ideal Helmholtz part. The engine adds residual (departure) parts to these.
 *
 * All values SI molar: K, Pa, J/mol, J/(mol K).
 */
import type { ResultWarning } from "../errors.js";

/** Standard-state pressure of the tables (1 bar), Pa. */
export const STANDARD_PRESSURE_PA = 1e5;
/** Standard temperature of formation data, K. */
export const STANDARD_TEMPERATURE_K = 298.15;

/** Ideal-gas properties of one pure component as functions of temperature only. */
export interface IdealGasPure {
  /** Component id in the component table (e.g. "methane"). */
  readonly componentId: string;
  /** The route and method, e.g. "heat-capacity correlation" or "statistical mechanics (RRHO + hindered rotor)". */
  readonly method: string;
  /** Citation of the data behind it. */
  readonly source: string;
  /** Temperature range in which the method is valid, K. */
  readonly validTemperatureK: { readonly min: number; readonly max: number };
  /** Isobaric heat capacity cp°(T), J/(mol K). */
  cp(temperatureK: number): number;
  /** Sensible enthalpy h°(T) - h°(298.15 K), J/mol. */
  enthalpyFrom298(temperatureK: number): number;
  /** Absolute (third-law) entropy s°(T) at the standard pressure of 1 bar, J/(mol K). */
  entropyStandard(temperatureK: number): number;
}

/** Which zero of enthalpy and entropy a result is measured from. */
export type ReferenceState =
  | {
      /** Ideal-gas elements at 298.15 K and 1 bar: h = enthalpy of formation, s = third-law entropy. */
      readonly kind: "formation";
    }
  | {
      /** h = 0 and s = 0 for the ideal gas at the given temperature and pressure. */
      readonly kind: "zero-at";
      readonly temperatureK: number;
      readonly pressurePa: number;
    }
  | {
      /** A fluid-specific convention of a published equation (e.g. IAPWS-95: u = s = 0, saturated liquid at the triple point). */
      readonly kind: "fluid-convention";
      readonly description: string;
    }
  | SaturatedLiquidReference;

/**
 * A convention of the trade: h and s of each pure component's saturated liquid fixed at a stated
 * temperature (fluid/saturatedLiquidReference.ts applies it with the fluid's own model):
 * - at "0 degC": h = 200 kJ/kg and s = 1 kJ/(kg K) (refrigeration practice);
 * - at "-40 degC": h = 0 and s = 0;
 * - at "normal-boiling-point" (101.325 kPa): h = 0 and s = 0;
 * - at a temperature in K, with the h and s you give (default 0).
 * Common practice of refrigeration and gas-processing property charts; no single source.
 */
export interface SaturatedLiquidReference {
  readonly kind: "saturated-liquid";
  readonly at: "0 degC" | "-40 degC" | "normal-boiling-point" | number;
  /** h of the saturated liquid there, J/kg. Default: 200e3 at "0 degC", else 0. */
  readonly hJPerKg?: number;
  /** s of the saturated liquid there, J/(kg K). Default: 1e3 at "0 degC", else 0. */
  readonly sJPerKgK?: number;
}

/** Molar ideal-gas properties of a mixture at (T, P, x), in the stated reference state. */
export interface IdealGasProperties {
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** J/mol */
  readonly h: number;
  /** J/(mol K), including the ideal entropy of mixing and the -R ln(P/P°) term. */
  readonly s: number;
  /** J/mol */
  readonly u: number;
  /** Helmholtz energy, J/mol */
  readonly a: number;
  /** Gibbs energy, J/mol */
  readonly g: number;
  /** J/(mol K) */
  readonly cp: number;
  /** J/(mol K) */
  readonly cv: number;
  readonly referenceState: ReferenceState;
  /** Warnings, e.g. a temperature slightly outside a correlation's range. */
  readonly warnings: readonly ResultWarning[];
}

/** An ideal-gas mixture model: one IdealGasPure per component, plus a reference state. */
export interface IdealGasMixture {
  readonly components: readonly IdealGasPure[];
  readonly referenceState: ReferenceState;
  /** Properties at temperature T (K), pressure P (Pa) and mole fractions x (sum 1). */
  at(temperatureK: number, pressurePa: number, x: readonly number[]): IdealGasProperties;
}
