/**
 * Builds a validated Component from user-supplied constants (a notebook cell), and is the one
 * builder the table loader and the petroleum characterisation use too, so every Component in the
 * library passed the same checks.
 */
import { R } from "../constants.js";
import { InputError, type ResultWarning } from "../errors.js";
import { correlationCp } from "./cpValue.js";
import type { Component, ComponentOrigin, ComponentSources, CpCorrelation } from "./types.js";

/** Constants for `defineComponent`. SI units; optional values may be omitted. */
export interface ComponentSpec {
  /** Id used for lookup and in results, e.g. "corvid-sweet-naphtha". Required, non-empty. */
  id: string;
  /** Display name. Default: the id. */
  name?: string;
  /** Molecular formula (Hill order), e.g. "C7H16". Default: "". */
  formula?: string;
  /** CAS registry number. Default: "". */
  casNumber?: string;
  /** Other names that should find this component. Default: none. */
  synonyms?: readonly string[];
  /** kg/mol, > 0. */
  molarMassKgPerMol: number;
  /** K, > 0. */
  criticalTemperatureK: number;
  /** Pa, > 0. */
  criticalPressurePa: number;
  /** m3/mol, > 0. Default: unknown (NaN). */
  criticalVolumeM3PerMol?: number;
  /** Pitzer acentric factor, between -1 and 3. */
  acentricFactor: number;
  /** K, > 0 and below Tc. Default: unknown (NaN). */
  normalBoilingPointK?: number;
  /** Ideal-gas enthalpy of formation at 298.15 K, J/mol. Default: unknown (NaN). */
  enthalpyOfFormationJPerMol?: number;
  /** Ideal-gas Gibbs energy of formation at 298.15 K and 1 bar, J/mol. Default: unknown (NaN). */
  gibbsEnergyOfFormationJPerMol?: number;
  /** Ideal-gas third-law entropy at 298.15 K and 1 bar, J/(mol K), > 0. Default: unknown (NaN). */
  absoluteEntropyJPerMolK?: number;
  /** Ideal-gas heat-capacity correlation (required). */
  idealGasCp: CpCorrelation;
  /** Citations; any group left out reads "user-supplied". */
  sources?: Partial<ComponentSources>;
  /** Warnings to carry with the component (e.g. from an estimation method). */
  warnings?: readonly ResultWarning[];
}

/** Options for `defineComponent`. */
export interface DefineComponentOptions {
  /** Recorded origin. Default "user". */
  origin?: ComponentOrigin;
}

/**
 * Validates constants and returns a frozen Component, usable wherever a table component is (pass it
 * to `getComponent(name, { include: [...] })` to find it by name as well).
 *
 * @example
 * const c = defineComponent({ id: "my-gas", molarMassKgPerMol: 0.03, criticalTemperatureK: 300,
 *   criticalPressurePa: 4e6, acentricFactor: 0.1,
 *   idealGasCp: { form: "polynomial", minTemperatureK: 200, maxTemperatureK: 1000,
 *     segments: [{ minTemperatureK: 200, maxTemperatureK: 1000, coefficients: [4] }] } });
 */
export function defineComponent(
  spec: ComponentSpec,
  options: DefineComponentOptions = {},
): Component {
  const where = (field: string) => `component ${JSON.stringify(spec?.id)}: ${field}`;
  if (!(typeof spec === "object" && spec !== null)) {
    throw new InputError({ input: "spec", unit: "-", validRange: "an object", received: spec });
  }
  if (!(typeof spec.id === "string" && spec.id.trim().length > 0)) {
    throw new InputError({
      input: "id",
      unit: "-",
      validRange: "a non-empty string",
      received: spec.id,
    });
  }
  const positive = (field: string, value: number, unit: string, max = Infinity) => {
    if (!(typeof value === "number" && value > 0 && value < max)) {
      const range = max === Infinity ? "a finite number > 0" : `> 0 and < ${max}`;
      throw new InputError({ input: where(field), unit, validRange: range, received: value });
    }
    return value;
  };
  const optionalPositive = (field: string, value: number | undefined, unit: string) =>
    value === undefined || Number.isNaN(value) ? NaN : positive(field, value, unit);
  const optionalFinite = (field: string, value: number | undefined, unit: string) => {
    if (value === undefined || Number.isNaN(value)) return NaN;
    if (!(typeof value === "number" && Number.isFinite(value))) {
      throw new InputError({
        input: where(field),
        unit,
        validRange: "a finite number or NaN (unknown)",
        received: value,
      });
    }
    return value;
  };

  const optionalString = (field: "name" | "formula" | "casNumber") => {
    const value = spec[field];
    if (!(value === undefined || typeof value === "string")) {
      throw new InputError({
        input: where(field),
        unit: "-",
        validRange: "a string",
        received: value,
      });
    }
  };
  optionalString("name");
  optionalString("formula");
  optionalString("casNumber");
  if (!(
    spec.synonyms === undefined ||
    (Array.isArray(spec.synonyms) && spec.synonyms.every((x: unknown) => typeof x === "string"))
  )) {
    throw new InputError({
      input: where("synonyms"),
      unit: "-",
      validRange: "an array of strings",
      received: spec.synonyms,
    });
  }
  const molarMass = positive("molarMassKgPerMol", spec.molarMassKgPerMol, "kg/mol", 10);
  const tc = positive("criticalTemperatureK", spec.criticalTemperatureK, "K");
  const pc = positive("criticalPressurePa", spec.criticalPressurePa, "Pa");
  const vc = optionalPositive("criticalVolumeM3PerMol", spec.criticalVolumeM3PerMol, "m3/mol");
  const omega = spec.acentricFactor;
  if (!(typeof omega === "number" && omega > -1 && omega < 3)) {
    throw new InputError({
      input: where("acentricFactor"),
      unit: "-",
      validRange: "between -1 and 3",
      received: omega,
    });
  }
  const tb = optionalPositive("normalBoilingPointK", spec.normalBoilingPointK, "K");
  if (!Number.isNaN(tb) && !(tb < tc)) {
    throw new InputError({
      input: where("normalBoilingPointK"),
      unit: "K",
      validRange: `below the critical temperature (${tc} K)`,
      received: tb,
    });
  }
  const hf = optionalFinite("enthalpyOfFormationJPerMol", spec.enthalpyOfFormationJPerMol, "J/mol");
  const gf = optionalFinite(
    "gibbsEnergyOfFormationJPerMol",
    spec.gibbsEnergyOfFormationJPerMol,
    "J/mol",
  );
  const s0 = optionalPositive("absoluteEntropyJPerMolK", spec.absoluteEntropyJPerMolK, "J/(mol K)");
  const cp = checkCpCorrelation(spec.idealGasCp, where("idealGasCp"));
  const sourceOf = (key: keyof ComponentSources) => spec.sources?.[key] ?? "user-supplied";

  const component: Component = {
    id: spec.id.trim(),
    name: spec.name ?? spec.id.trim(),
    formula: spec.formula ?? "",
    casNumber: spec.casNumber ?? "",
    synonyms: Object.freeze([...(spec.synonyms ?? [])]),
    molarMassKgPerMol: molarMass,
    criticalTemperatureK: tc,
    criticalPressurePa: pc,
    criticalVolumeM3PerMol: vc,
    criticalCompressibility: (pc * vc) / (R * tc),
    acentricFactor: omega,
    normalBoilingPointK: tb,
    enthalpyOfFormationJPerMol: hf,
    gibbsEnergyOfFormationJPerMol: gf,
    absoluteEntropyJPerMolK: s0,
    idealGasCp: cp,
    sources: Object.freeze({
      critical: sourceOf("critical"),
      boilingPoint: sourceOf("boilingPoint"),
      formation: sourceOf("formation"),
      entropy: sourceOf("entropy"),
      heatCapacity: sourceOf("heatCapacity"),
    }),
    origin: options.origin ?? "user",
    warnings: Object.freeze([...(spec.warnings ?? [])]),
  };
  return Object.freeze(component);
}

/** Checks a cp correlation's shape, range and sign (cp > 0 across its range); returns a frozen copy. */
function checkCpCorrelation(cp: CpCorrelation, input: string): CpCorrelation {
  const bad = (field: string, validRange: string, received: unknown): never => {
    throw new InputError({
      input: `${input}.${field}`,
      unit: field.includes("Temperature") ? "K" : "-",
      validRange,
      received,
    });
  };
  if (!(typeof cp === "object" && cp !== null))
    bad("form", 'an object with form "polynomial" or "aly-lee"', cp);
  const lo = cp.minTemperatureK;
  const hi = cp.maxTemperatureK;
  if (!(lo > 0 && lo < Infinity)) bad("minTemperatureK", "a finite number > 0", lo);
  if (!(hi > lo && hi < Infinity))
    bad("maxTemperatureK", `a finite number > minTemperatureK (${lo})`, hi);
  let copy: CpCorrelation;
  if (cp.form === "polynomial") {
    const segments = cp.segments;
    if (!(Array.isArray(segments) && segments.length > 0))
      bad("segments", "a non-empty array", segments);
    let expectedStart = lo;
    segments.forEach((seg, i) => {
      if (!(Math.abs(seg.minTemperatureK - expectedStart) <= 1e-9 * expectedStart)) {
        bad(
          `segments[${i}].minTemperatureK`,
          `${expectedStart} (segments must be contiguous from minTemperatureK)`,
          seg.minTemperatureK,
        );
      }
      if (!(seg.maxTemperatureK > seg.minTemperatureK)) {
        bad(`segments[${i}].maxTemperatureK`, `> ${seg.minTemperatureK}`, seg.maxTemperatureK);
      }
      if (!(
        Array.isArray(seg.coefficients) &&
        seg.coefficients.length > 0 &&
        seg.coefficients.every((a: number) => Number.isFinite(a))
      )) {
        bad(`segments[${i}].coefficients`, "a non-empty array of finite numbers", seg.coefficients);
      }
      expectedStart = seg.maxTemperatureK;
    });
    if (!(Math.abs(expectedStart - hi) <= 1e-9 * hi))
      bad("maxTemperatureK", `the last segment's end (${expectedStart})`, hi);
    copy = Object.freeze({
      form: "polynomial",
      minTemperatureK: lo,
      maxTemperatureK: hi,
      segments: Object.freeze(
        segments.map((s) =>
          Object.freeze({
            minTemperatureK: s.minTemperatureK,
            maxTemperatureK: s.maxTemperatureK,
            coefficients: Object.freeze([...s.coefficients]),
          }),
        ),
      ),
    });
  } else if (cp.form === "aly-lee") {
    for (const key of ["aJPerMolK", "bJPerMolK", "cK", "dJPerMolK", "eK"] as const) {
      if (!Number.isFinite(cp[key])) bad(key, "a finite number", cp[key]);
    }
    copy = Object.freeze({ ...cp });
  } else {
    return bad("form", '"polynomial" or "aly-lee"', (cp as { form?: unknown }).form);
  }
  for (let i = 0; i <= 20; i++) {
    const t = lo + ((hi - lo) * i) / 20;
    const value = correlationCp(copy, t);
    if (!(value > 0 && value < Infinity)) {
      bad(
        "form",
        `a correlation with positive cp over its range (cp at ${t} K is ${value} J/(mol K))`,
        cp.form,
      );
    }
  }
  return copy;
}
