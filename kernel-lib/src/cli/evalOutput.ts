/**
 * The `"output"` field of an `isochor eval` request: the units and the basis (molar or mass) of
 * the response. The engine computes in SI molar units; this file converts the entries at the
 * edge, through the units module (units/convert.ts), and states the unit of every converted
 * field in the response's "units" map.
 *
 *   "output": {"units": "SI" | "field" | {"T": "degC", "P": "barg", ...}, "basis": "molar" | "mass"}
 *
 * "SI" and "field" are unit sets; "basis" picks between their molar and mass units; a map names
 * the unit of each field it lists, the others keep the SI unit of the basis. Unknown, ambiguous
 * or wrong-dimension units are refused with the JSON path of the field ("$.output.units.P").
 * Mole fractions (x), phase amounts, quality, Z and lnPhi are dimensionless and never change;
 * viscosity (Pa s) and thermal conductivity (W/(m K)) stay SI (the units module has no units
 * for them).
 */
import { IsochorError, RequestError } from "../errors.js";
import type { Dimension } from "../units/dimension.js";
import { fromSI } from "../units/convert.js";
import { lookupUnit } from "../units/lookupUnit.js";

/** The fields of an entry that carry a unit, and their dimension. */
export const OUTPUT_DIMENSIONS: Readonly<Record<string, Dimension>> = {
  T: "temperature",
  P: "pressure",
  rho: "molar-density",
  h: "molar-energy",
  s: "molar-entropy",
  u: "molar-energy",
  cp: "molar-entropy",
  cv: "molar-entropy",
  w: "speed",
  jt: "joule-thomson",
};

/**
 * Residual fields (same T and P, and same T and density) and the field whose unit they take:
 * h, s and u their own; the Helmholtz and Gibbs energies a and g that of h.
 */
const RESIDUAL_KEYS: Readonly<Record<string, "h" | "s" | "u">> = {
  h: "h",
  s: "s",
  u: "u",
  a: "h",
  g: "h",
};

type UnitSet = Readonly<Record<keyof typeof OUTPUT_DIMENSIONS, string>>;

/** The unit sets: SI (molar and mass) and US customary "field" units (molar and mass). */
const UNIT_SETS: Readonly<Record<"SI" | "field", Readonly<Record<"molar" | "mass", UnitSet>>>> = {
  SI: {
    molar: {
      T: "K",
      P: "Pa",
      rho: "mol/m3",
      h: "J/mol",
      s: "J/(mol K)",
      u: "J/mol",
      cp: "J/(mol K)",
      cv: "J/(mol K)",
      w: "m/s",
      jt: "K/Pa",
    },
    mass: {
      T: "K",
      P: "Pa",
      rho: "kg/m3",
      h: "J/kg",
      s: "J/(kg K)",
      u: "J/kg",
      cp: "J/(kg K)",
      cv: "J/(kg K)",
      w: "m/s",
      jt: "K/Pa",
    },
  },
  field: {
    molar: {
      T: "degF",
      P: "psia",
      rho: "lbmol/ft3",
      h: "Btu/lbmol",
      s: "Btu/(lbmol degR)",
      u: "Btu/lbmol",
      cp: "Btu/(lbmol degR)",
      cv: "Btu/(lbmol degR)",
      w: "ft/s",
      jt: "degF/psi",
    },
    mass: {
      T: "degF",
      P: "psia",
      rho: "lb/ft3",
      h: "Btu/lb",
      s: "Btu/(lb degR)",
      u: "Btu/lb",
      cp: "Btu/(lb degR)",
      cv: "Btu/(lb degR)",
      w: "ft/s",
      jt: "degF/psi",
    },
  },
};

/** The output request as the schema lets it through. */
export interface OutputJson {
  units?: "SI" | "field" | Record<string, string>;
  basis?: "molar" | "mass";
}

/** A checked output request: the unit of every field and the molar masses it needs. */
export interface EvalOutput {
  readonly units: UnitSet;
  readonly basis: "molar" | "mass";
  /** Molar mass of the feed, kg/mol (undefined when no unit needs it). */
  readonly feedMolarMassKgPerMol?: number;
  /** Molar mass of each component, kg/mol (phase compositions of flashes). */
  readonly componentMolarMassesKgPerMol?: readonly number[];
}

/**
 * Checks the "output" field: each unit known, unambiguous and of the field's dimension, and a
 * molar mass at hand for mass-based units.
 *
 * @throws RequestError naming the JSON path of the first bad unit.
 */
export function parseOutput(
  o: OutputJson,
  molarMasses: readonly number[] | undefined,
  x: readonly number[],
): EvalOutput {
  const basis = o.basis ?? "molar";
  const preset = typeof o.units === "string" ? o.units : "SI";
  const units: Record<string, string> = { ...UNIT_SETS[preset][basis] };
  if (typeof o.units === "object") {
    for (const [field, unit] of Object.entries(o.units)) {
      const path = `$.output.units.${field}`;
      if (!Object.prototype.hasOwnProperty.call(OUTPUT_DIMENSIONS, field)) {
        throw new RequestError(
          path,
          `unknown field; the fields with units are ${Object.keys(OUTPUT_DIMENSIONS).join(", ")}`,
        );
      }
      try {
        lookupUnit(unit, OUTPUT_DIMENSIONS[field]);
      } catch (e) {
        throw new RequestError(
          path,
          `${JSON.stringify(unit)}: ${e instanceof Error ? e.message : String(e)}`,
        );
      }
      units[field] = unit;
    }
  }
  const needsMass = Object.values(units).some((u) => lookupUnit(u).molarMassPower !== 0);
  if (needsMass && molarMasses === undefined) {
    throw new RequestError(
      o.basis === "mass" ? "$.output.basis" : "$.output.units",
      "mass-based units need the molar mass of every component; give it as constants[i].M (kg/mol)",
    );
  }
  const feed = molarMasses?.reduce((sum, M, i) => sum + x[i] * M, 0);
  return {
    units: units as UnitSet,
    basis,
    feedMolarMassKgPerMol: needsMass ? feed : undefined,
    componentMolarMassesKgPerMol: needsMass ? molarMasses : undefined,
  };
}

/** The "units" map of the response: the unit of each field, "residual.h" style for residuals. */
export function unitsMap(output: EvalOutput, transport: boolean): Record<string, string> {
  const map: Record<string, string> = { ...output.units };
  for (const [field, like] of Object.entries(RESIDUAL_KEYS)) {
    map[`residual.${field}`] = output.units[like];
    if (field !== "h" && field !== "u") map[`residualTV.${field}`] = output.units[like];
  }
  if (transport) {
    map.viscosity = "Pa s";
    map.thermalConductivity = "W/(m K)";
  }
  return map;
}

/**
 * Rounds a converted value to 15 significant digits: a double holds 15 to 17, and the last of
 * them after a multiplication by an inexact factor is round-off (40 bar is not 3999999.9999999995
 * Pa). Used only on values that went through a unit conversion.
 */
export function roundConverted(v: number): number {
  return Number.isFinite(v) ? Number(v.toPrecision(15)) : v;
}

/** One value from SI into its output unit (null and non-numbers pass through). */
function convert(
  value: unknown,
  unit: string,
  M: number | undefined,
  dimension: Dimension,
): unknown {
  if (typeof value !== "number" || !Number.isFinite(value)) return value;
  const si = lookupUnit(unit);
  if (si.factor === 1 && si.offset === 0 && !si.gauge && si.molarMassPower === 0) return value;
  return roundConverted(fromSI(value, unit, { molarMassKgPerMol: M, dimension }));
}

/** Converts the unit-bearing fields of an object in place with the molar mass M. */
function convertFields(
  obj: Record<string, unknown>,
  output: EvalOutput,
  M: number | undefined,
): void {
  for (const [field, dimension] of Object.entries(OUTPUT_DIMENSIONS)) {
    if (field in obj) obj[field] = convert(obj[field], output.units[field], M, dimension);
  }
  for (const key of ["residual", "residualTV"]) {
    const r = obj[key];
    if (typeof r !== "object" || r === null) continue;
    const out: Record<string, unknown> = { ...(r as Record<string, unknown>) };
    for (const [field, like] of Object.entries(RESIDUAL_KEYS)) {
      if (field in out) {
        out[field] = convert(out[field], output.units[like], M, OUTPUT_DIMENSIONS[like]);
      }
    }
    obj[key] = out;
  }
}

/** Molar mass of a phase of composition x, kg/mol. */
function phaseMolarMass(output: EvalOutput, x: unknown): number | undefined {
  const Ms = output.componentMolarMassesKgPerMol;
  if (Ms === undefined || !Array.isArray(x)) return output.feedMolarMassKgPerMol;
  return (x as number[]).reduce((sum, xi, i) => sum + xi * Ms[i], 0);
}

/**
 * An entry of the response in the output units: the overall fields with the feed's molar mass,
 * each phase of a flash with its own composition's. Error entries are returned unchanged.
 */
export function convertEntry<E extends object>(
  entry: E,
  output: EvalOutput,
): E | { error: { code: string; message: string } } {
  if ("error" in entry) return entry;
  const out: Record<string, unknown> = { ...(entry as Record<string, unknown>) };
  try {
    convertFields(out, output, output.feedMolarMassKgPerMol);
    if (Array.isArray(out.phases)) {
      out.phases = (out.phases as Record<string, unknown>[]).map((p) => {
        const q = { ...p };
        convertFields(q, output, phaseMolarMass(output, q.x));
        return q;
      });
    }
  } catch (e) {
    // never an SI number under a unit that says otherwise: the entry becomes an error entry
    if (!(e instanceof IsochorError)) throw e;
    return { error: { code: e.code, message: `output units: ${e.message}` } };
  }
  return out as E;
}

/** T and P pairs (an envelope's points) in the output units. */
export function convertTP<E extends { T: number; P: number }>(p: E, output: EvalOutput): E {
  return {
    ...p,
    T: convert(p.T, output.units.T, undefined, "temperature") as number,
    P: convert(p.P, output.units.P, undefined, "pressure") as number,
  };
}
