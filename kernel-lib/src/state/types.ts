/**
 * The shapes of the state layer: what a fluid binds (model, ideal gas, molar masses) and what a
 * state carries. All values SI molar unless the group says "mass".
 */
import type { ResultWarning } from "../errors.js";
import type { ModelInfo } from "../eos/types.js";
import type { IdealGasMixture, ReferenceState } from "../idealgas/types.js";
import type { ResidualModel } from "../eos/types.js";

/** What the state functions need: the residual model, the ideal-gas part, and molar masses. */
export interface FluidBinding {
  readonly model: ResidualModel;
  readonly idealGas: IdealGasMixture;
  /** kg/mol, one per component, in the model's component order. */
  readonly molarMassesKgPerMol: readonly number[];
  /** How the model's residual part is obtained (labels results). Default "closed-form". */
  readonly departureMethod?: DepartureMethod;
}

/** Phase label of a state. For mixtures the rule is stated in state/phaseLabel.ts. */
export type PhaseLabel = "vapor" | "liquid" | "supercritical";

/** Which phase to return at (T, P). "stable": the root of lowest Gibbs energy. */
export type PhaseRequest = "stable" | "liquid" | "vapor";

/** h, s, u, a, g (and optionally cp, cv) in one basis. */
export interface EnergySet {
  /** Enthalpy: J/mol (molar) or J/kg (mass). */
  readonly h: number;
  /** Entropy: J/(mol K) or J/(kg K). */
  readonly s: number;
  /** Internal energy: J/mol or J/kg. */
  readonly u: number;
  /** Helmholtz energy: J/mol or J/kg. */
  readonly a: number;
  /** Gibbs energy: J/mol or J/kg. */
  readonly g: number;
}

/** Energies with heat capacities. */
export interface PropertySet extends EnergySet {
  /** Isobaric heat capacity: J/(mol K) or J/(kg K). */
  readonly cp: number;
  /** Isochoric heat capacity: J/(mol K) or J/(kg K). */
  readonly cv: number;
}

/** How the residual part was obtained. */
export type DepartureMethod = "closed-form" | "numeric";

/** A fluid state with every property the engine offers. */
export interface FluidState {
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly densityMolPerM3: number;
  readonly densityKgPerM3: number;
  /** Mole fractions (a copy). */
  readonly x: readonly number[];
  /** Compressibility factor P / (rho R T). */
  readonly Z: number;
  readonly phase: PhaseLabel;
  /** Absolute molar properties in `referenceState`: J/mol, J/(mol K). */
  readonly molar: PropertySet;
  /** Absolute specific (per mass) properties: J/kg, J/(kg K). */
  readonly mass: PropertySet;
  /**
   * Residual (departure) properties relative to the ideal gas at the same T and P (the
   * engineering departure function), J/mol and J/(mol K). cp and cv are the real minus ideal-gas values.
   */
  readonly residual: PropertySet;
  /** Residual properties relative to the ideal gas at the same T and density ("TV"), J/mol. */
  readonly residualTV: EnergySet;
  /** ln of the fugacity coefficient of each component. */
  readonly lnPhi: readonly number[];
  /** Speed of sound, m/s (NaN only for a mechanically unstable state, with a warning). */
  readonly speedOfSoundMPerS: number;
  /** Joule-Thomson coefficient (dT/dP)_h, K/Pa. */
  readonly jouleThomsonKPerPa: number;
  /** Isothermal compressibility -(1/v)(dv/dP)_T, 1/Pa. */
  readonly isothermalCompressibilityPerPa: number;
  /** Volume expansivity (1/v)(dv/dT)_P, 1/K. */
  readonly thermalExpansionPerK: number;
  /** Isentropic exponent -(v/P)(dP/dv)_s, dimensionless. */
  readonly isentropicExponent: number;
  /** (dP/dT) at constant density, Pa/K. */
  readonly dPdTPaPerK: number;
  /** (dP/drho) at constant temperature, Pa m3/mol. */
  readonly dPdRhoPaM3PerMol: number;
  /** Molar mass of the mixture, kg/mol. */
  readonly molarMassKgPerMol: number;
  readonly model: ModelInfo;
  readonly referenceState: ReferenceState;
  readonly departureMethod: DepartureMethod;
  readonly warnings: readonly ResultWarning[];
}
