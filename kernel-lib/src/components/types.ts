/**
 * The component record: everything the ideal-gas and equation-of-state layers need to know about
 * one pure substance. SI units throughout, with the unit in every field name.
 *
 * Table components come from components/data/components.json (with citations); users build their
 * own with `defineComponent`, and petroleum pseudo-components come from petroleum/.
 */
import type { ResultWarning } from "../errors.js";

/**
 * Polynomial ideal-gas heat capacity, cp°/R = a0 + a1 T + a2 T^2 + a3 T^3 + a4 T^4 (T in K), the
 * form of Poling, Prausnitz & O'Connell (2001), The Properties of Gases and Liquids, 5th ed., App. A.
 * Any number of coefficients (ascending powers) is accepted.
 */
export interface PolynomialCp {
  readonly form: "polynomial";
  /**
   * One or more contiguous temperature segments, ascending, each with its own coefficients
   * (two segments joined at 1000 K is the layout of the NASA 7-coefficient polynomials, McBride,
   * Gordon & Reno 1993, NASA TM-4513).
   */
  readonly segments: readonly PolynomialCpSegment[];
  /** Lowest temperature of the fit (first segment's start), K. */
  readonly minTemperatureK: number;
  /** Highest temperature of the fit (last segment's end), K. */
  readonly maxTemperatureK: number;
}

/** One temperature segment of a polynomial cp°/R. */
export interface PolynomialCpSegment {
  /** K */
  readonly minTemperatureK: number;
  /** K */
  readonly maxTemperatureK: number;
  /** a_k in ascending powers of T; cp°/R = sum a_k T^k, T in K (dimensionless cp°/R). */
  readonly coefficients: readonly number[];
}

/**
 * Hyperbolic ideal-gas heat capacity of Aly & Lee (1981), Fluid Phase Equilibria 6, 169-179
 * (the DIPPR equation 107 form):
 *   cp° = A + B [(C/T) / sinh(C/T)]^2 + D [(E/T) / cosh(E/T)]^2
 * with A, B, D in J/(mol K) and C, E in K.
 */
export interface AlyLeeCp {
  readonly form: "aly-lee";
  /** J/(mol K) */
  readonly aJPerMolK: number;
  /** J/(mol K) */
  readonly bJPerMolK: number;
  /** K */
  readonly cK: number;
  /** J/(mol K) */
  readonly dJPerMolK: number;
  /** K */
  readonly eK: number;
  readonly minTemperatureK: number;
  readonly maxTemperatureK: number;
}

/** An ideal-gas heat-capacity correlation with its temperature range. */
export type CpCorrelation = PolynomialCp | AlyLeeCp;

/** Where each group of values came from (full citation text). */
export interface ComponentSources {
  /** Molar mass, critical constants, acentric factor. */
  readonly critical: string;
  /** Normal boiling point. */
  readonly boilingPoint: string;
  /** Enthalpy and Gibbs energy of formation. */
  readonly formation: string;
  /** Absolute entropy at 298.15 K and 1 bar. */
  readonly entropy: string;
  /** Ideal-gas heat-capacity correlation. */
  readonly heatCapacity: string;
}

/** How the record was made. */
export type ComponentOrigin = "table" | "user" | "petroleum-pseudo-component";

/** One pure component. All values SI. */
export interface Component {
  /** Stable id, lower-case with hyphens, e.g. "n-butane", "hydrogen-sulfide". */
  readonly id: string;
  /** Display name, e.g. "n-Butane". */
  readonly name: string;
  /** Molecular formula in Hill order, e.g. "C4H10"; "" for a pseudo-component. */
  readonly formula: string;
  /** CAS registry number, e.g. "106-97-8"; "" when none. */
  readonly casNumber: string;
  /** Other names accepted by `getComponent`. */
  readonly synonyms: readonly string[];
  /** kg/mol */
  readonly molarMassKgPerMol: number;
  /** K */
  readonly criticalTemperatureK: number;
  /** Pa */
  readonly criticalPressurePa: number;
  /** m3/mol; NaN when unknown (e.g. some pseudo-components). */
  readonly criticalVolumeM3PerMol: number;
  /** Critical compressibility factor Zc = Pc Vc / (R Tc); NaN when Vc is unknown. */
  readonly criticalCompressibility: number;
  /** Pitzer acentric factor, dimensionless. */
  readonly acentricFactor: number;
  /** Normal boiling point (at 101.325 kPa), K; NaN for supercritical-only gases without one. */
  readonly normalBoilingPointK: number;
  /**
   * Ideal-gas enthalpy of formation at 298.15 K from the elements in their standard states, J/mol.
   * NaN when unknown (pseudo-components); the formation reference state is then refused.
   */
  readonly enthalpyOfFormationJPerMol: number;
  /** Ideal-gas Gibbs energy of formation at 298.15 K and 1 bar, J/mol; NaN when unknown. */
  readonly gibbsEnergyOfFormationJPerMol: number;
  /** Ideal-gas absolute (third-law) entropy at 298.15 K and 1 bar, J/(mol K); NaN when unknown. */
  readonly absoluteEntropyJPerMolK: number;
  /** Ideal-gas heat capacity correlation. */
  readonly idealGasCp: CpCorrelation;
  /** Where each value came from. */
  readonly sources: ComponentSources;
  readonly origin: ComponentOrigin;
  /** Warnings attached at creation (e.g. a pseudo-component estimated outside a correlation's range). */
  readonly warnings: readonly ResultWarning[];
}
