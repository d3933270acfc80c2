/**
 * The shapes of the transport layer: what a transport calculation needs from a fluid and what it
 * returns. SI throughout: Pa s, W/(m K), K, mol/m3.
 */
import type { Component } from "../components/types.js";
import type { ResultWarning } from "../errors.js";
import type { FluidBinding, PhaseLabel } from "../state/types.js";

/**
 * What the transport functions need: a fluid binding (model, ideal gas, molar masses) and,
 * optionally, its component records. A fluid from `defineFluid` is one; a reference-fluid binding
 * (state/referenceStates.ts) is one too, and its components are then looked up by the model's
 * component ids.
 */
export type TransportFluid = FluidBinding & { readonly components?: readonly Component[] };

/**
 * Which method gave the numbers:
 * - "chung-1988": Chung, Ajlan, Lee and Starling (1988), gases and dense fluids, every component;
 * - "iapws-2008-2011": pure water with the IAPWS-95 equation: IAPWS 2008 viscosity and IAPWS
 *   2011 thermal conductivity, both the forms for general and scientific use (with their critical
 *   enhancements, from the bound IAPWS-95 equation).
 */
export type TransportMethod = "chung-1988" | "iapws-2008-2011";

/** Viscosity and thermal conductivity of one phase at (T, rho, x). */
export interface TransportProperties {
  /** K */
  readonly temperatureK: number;
  /** mol/m3 */
  readonly densityMolPerM3: number;
  /** Mole fractions (a copy). */
  readonly x: readonly number[];
  /** Dynamic (shear) viscosity, Pa s. */
  readonly viscosityPaS: number;
  /** Thermal conductivity, W/(m K). */
  readonly thermalConductivityWPerMK: number;
  readonly method: TransportMethod;
  /** The publications of the method, in full. */
  readonly citation: string;
  /** Accuracy notes, ranges left, parameters defaulted (e.g. a dipole moment taken as zero). */
  readonly warnings: readonly ResultWarning[];
}

/** Transport properties of a computed state: with its pressure and phase label. */
export interface TransportOfState extends TransportProperties {
  /** Pa */
  readonly pressurePa: number;
  /** The phase label of the state the properties belong to. */
  readonly phase: PhaseLabel;
}

/** Options of the transport functions. */
export interface TransportOptions {
  /**
   * "auto" (default): IAPWS for pure water bound to the IAPWS-95 equation, Chung otherwise.
   * "chung-1988": Chung for every fluid (e.g. to compare with the IAPWS values).
   */
  method?: "auto" | "chung-1988";
}
