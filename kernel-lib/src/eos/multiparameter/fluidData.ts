/**
 * The shape of a reference-fluid data file (eos/multiparameter/data/*.json): coefficients of a
 * multiparameter Helmholtz equation, its reducing and fixed points, validity range, ancillary
 * equations for saturation starting values, and full citations. The format is isochor's own.
 */
import type { IdealPartData } from "./idealPart.js";
import type { ResidualPartData } from "./residualPart.js";

/** One ancillary term n theta^t with theta = 1 - T/T_red. */
export interface AncillaryTermData {
  readonly n: number;
  readonly t: number;
}

/**
 * An ancillary equation for a saturation property y:
 * - "ln-ratio-times-Tc-over-T": ln(y / y_red) = (T_red / T) sum n theta^t
 * - "ln-ratio":                 ln(y / y_red) = sum n theta^t
 * - "ratio-minus-one":          y / y_red = 1 + sum n theta^t
 */
export interface AncillaryData {
  readonly form: "ln-ratio-times-Tc-over-T" | "ln-ratio" | "ratio-minus-one";
  /** y_red: Pa for pressure; for densities in the unit given by `unit`. */
  readonly reducingValue: number;
  /** "kg/m3" or "mol/m3" for densities; absent for pressure (Pa). */
  readonly unit?: "kg/m3" | "mol/m3";
  readonly terms: readonly AncillaryTermData[];
}

/** A temperature/pressure box. */
export interface RangeData {
  readonly temperatureK: { readonly min: number; readonly max: number };
  readonly pressurePa: { readonly max: number };
}

/** A reference-fluid data file. */
export interface ReferenceFluidData {
  /** Component id in the component table, lower-case hyphenated ("carbon-dioxide"). */
  readonly id: string;
  readonly name: string;
  /**
   * "reference": verified against the publication's printed tables (see `provenance`);
   * "unverified": coefficients not checked to the printed digits; never exported as reference.
   */
  readonly status: "reference" | "unverified";
  readonly citations: Readonly<Record<string, string>>;
  /** How the coefficients were obtained and checked. */
  readonly provenance: string;
  readonly molarMassKgPerMol: number;
  /** Published gas constant: one of the two is given. */
  readonly specificGasConstantJPerKgK?: number;
  readonly gasConstantJPerMolK?: number;
  readonly reducing: { readonly temperatureK: number; readonly densityKgPerM3: number };
  readonly critical: {
    readonly temperatureK: number;
    readonly densityKgPerM3: number;
    readonly pressurePa: number;
  };
  readonly triple: {
    readonly temperatureK: number;
    readonly pressurePa: number;
    readonly liquidDensityKgPerM3?: number;
    readonly vaporDensityKgPerM3?: number;
  };
  readonly referenceState: string;
  readonly validity: RangeData & { readonly extrapolation: RangeData; readonly note: string };
  readonly ideal: IdealPartData;
  readonly residual: ResidualPartData;
  readonly ancillaries: {
    readonly reducingTemperatureK: number;
    readonly pressure: AncillaryData;
    readonly liquidDensity: AncillaryData;
    readonly vaporDensity: AncillaryData;
  };
  /** Third-law entropy of the ideal gas at 298.15 K and 1 bar, J/(mol K) (source in citations). */
  readonly thirdLawEntropyJPerMolK: number;
}
