/**
 * The shape of a reference-fluid data file (eos/multiparameter/data/*.json): coefficients of a
 * multiparameter Helmholtz equation, its reducing and fixed points, validity range, ancillary
 * equations for saturation starting values, and full citations. The format is isochor's own.
 */
import { InputError } from "../../errors.js";
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

/**
 * Checks a reference-fluid data record before it is compiled, so a malformed file (or a user's own
 * fluid passed to buildReferenceFluid) fails with the path of the bad field instead of producing
 * NaN. Checks presence, finiteness and sign of every number the equation uses; not the physics.
 *
 * @throws InputError naming the field (e.g. "data.residual.polynomialExponential[3].d"), its range and the value.
 */
export function checkReferenceFluidData(data: ReferenceFluidData): void {
  const fail = (input: string, validRange: string, received: unknown): never => {
    throw new InputError({ input: `data.${input}`, unit: "-", validRange, received });
  };
  const finite = (path: string, v: unknown): void => {
    if (!(typeof v === "number" && Number.isFinite(v))) fail(path, "a finite number", v);
  };
  const positive = (path: string, v: unknown): void => {
    if (!(typeof v === "number" && v > 0 && v < Infinity)) fail(path, "a finite number > 0", v);
  };
  const list = (path: string, v: unknown): readonly Record<string, unknown>[] => {
    if (!Array.isArray(v)) fail(path, "an array", v);
    return v as readonly Record<string, unknown>[];
  };
  if (!data || typeof data !== "object") fail("", "a reference-fluid data object", data);
  if (!(typeof data.id === "string" && /^[a-z0-9]+(-[a-z0-9]+)*$/.test(data.id))) {
    fail("id", "a lower-case hyphenated component id", data.id);
  }
  positive("molarMassKgPerMol", data.molarMassKgPerMol);
  if (data.gasConstantJPerMolK === undefined && data.specificGasConstantJPerKgK === undefined) {
    fail("gasConstantJPerMolK", "given (or specificGasConstantJPerKgK)", undefined);
  }
  if (data.gasConstantJPerMolK !== undefined)
    positive("gasConstantJPerMolK", data.gasConstantJPerMolK);
  if (data.specificGasConstantJPerKgK !== undefined) {
    positive("specificGasConstantJPerKgK", data.specificGasConstantJPerKgK);
  }
  positive("reducing.temperatureK", data.reducing?.temperatureK);
  positive("reducing.densityKgPerM3", data.reducing?.densityKgPerM3);
  positive("critical.temperatureK", data.critical?.temperatureK);
  positive("critical.densityKgPerM3", data.critical?.densityKgPerM3);
  positive("critical.pressurePa", data.critical?.pressurePa);
  positive("triple.temperatureK", data.triple?.temperatureK);
  positive("triple.pressurePa", data.triple?.pressurePa);
  for (const r of ["validity", "validity.extrapolation"] as const) {
    const range = r === "validity" ? data.validity : data.validity?.extrapolation;
    positive(`${r}.temperatureK.min`, range?.temperatureK?.min);
    positive(`${r}.temperatureK.max`, range?.temperatureK?.max);
    positive(`${r}.pressurePa.max`, range?.pressurePa?.max);
  }
  finite("ideal.c0", data.ideal?.c0);
  finite("ideal.c1", data.ideal?.c1);
  finite("ideal.lnTau", data.ideal?.lnTau);
  list("ideal.tauPowers", data.ideal?.tauPowers).forEach((t, i) => {
    finite(`ideal.tauPowers[${i}].n`, t.n);
    finite(`ideal.tauPowers[${i}].t`, t.t);
  });
  list("ideal.vibrational", data.ideal?.vibrational).forEach((t, i) => {
    finite(`ideal.vibrational[${i}].n`, t.n);
    positive(`ideal.vibrational[${i}].gamma`, t.gamma);
  });
  const integer = (path: string, v: unknown): void => {
    if (!(typeof v === "number" && Number.isInteger(v) && v >= 0 && v <= 32)) {
      fail(path, "an integer from 0 to 32", v);
    }
  };
  list("residual.polynomialExponential", data.residual?.polynomialExponential).forEach((t, i) => {
    finite(`residual.polynomialExponential[${i}].n`, t.n);
    integer(`residual.polynomialExponential[${i}].d`, t.d);
    finite(`residual.polynomialExponential[${i}].t`, t.t);
    integer(`residual.polynomialExponential[${i}].c`, t.c);
  });
  list("residual.gaussianBell", data.residual?.gaussianBell).forEach((t, i) => {
    for (const k of ["n", "t", "alpha", "beta", "gamma", "epsilon"]) {
      finite(`residual.gaussianBell[${i}].${k}`, t[k]);
    }
    integer(`residual.gaussianBell[${i}].d`, t.d);
  });
  list("residual.nearCritical", data.residual?.nearCritical).forEach((t, i) => {
    finite(`residual.nearCritical[${i}].n`, t.n);
    for (const k of ["a", "b", "beta", "A", "B", "C", "D"]) {
      positive(`residual.nearCritical[${i}].${k}`, t[k]);
    }
  });
  const anc = data.ancillaries;
  positive("ancillaries.reducingTemperatureK", anc?.reducingTemperatureK);
  for (const k of ["pressure", "liquidDensity", "vaporDensity"] as const) {
    const a = anc?.[k];
    if (!a || !["ln-ratio-times-Tc-over-T", "ln-ratio", "ratio-minus-one"].includes(a.form)) {
      fail(
        `ancillaries.${k}.form`,
        '"ln-ratio-times-Tc-over-T", "ln-ratio" or "ratio-minus-one"',
        a?.form,
      );
    }
    positive(`ancillaries.${k}.reducingValue`, a.reducingValue);
    list(`ancillaries.${k}.terms`, a.terms).forEach((t, i) => {
      finite(`ancillaries.${k}.terms[${i}].n`, t.n);
      finite(`ancillaries.${k}.terms[${i}].t`, t.t);
    });
  }
  positive("thirdLawEntropyJPerMolK", data.thirdLawEntropyJPerMolK);
}
