/**
 * Flow rates as plants write them, converted at the edge to the library's molar flow (mol/s).
 *
 * Four kinds of flow unit:
 * - molar (mol/s, kmol/h, lbmol/h): exact factors;
 * - mass (kg/s, kg/h, t/h, t/d, lb/h): through the stream's molar mass (kg/mol);
 * - standard volume (Sm3/h, Sm3/d, Nm3/h, Nm3/d, MMSCFD, MSCFD, scf/h, scf/d): a volume of gas
 *   at reference conditions, through the molar volume at those conditions. The reference
 *   conditions are ALWAYS explicit: a standard or normal volume flow without them is refused
 *   (ISO 13443 uses 15 degC and 101.325 kPa, "normal" cubic metres 0 degC, US gas practice
 *   60 degF with 14.696 or 14.73 psia; the same "MMSCFD" differs by 0.2 % between the two);
 * - volume at stated conditions (m3/h, m3/s, L/min, bbl/d, USgpm): an actual (often liquid)
 *   volume flow, through the molar volume at the stated conditions.
 *
 * This module only does the arithmetic: the molar volumes (ideal gas R T / P at the reference,
 * or the real gas from a model) are computed by the caller (process/stream.ts) and passed in.
 *
 * Factors (exact by definition): NIST SP 811 (2008) App. B.8: 1 ft = 0.3048 m, 1 lb =
 * 0.45359237 kg, 1 US gallon = 3.785411784e-3 m3, 1 barrel (petroleum, 42 US gal) =
 * 0.158987294928 m3; 1 h = 3600 s, 1 d = 86400 s.
 */
import { InputError, UnknownNameError } from "../errors.js";
import { R } from "../constants.js";
import { editDistance } from "../numerics/editDistance.js";
import { FOOT_M, POUND_KG, PSI_PA } from "./unitTable.js";
import { unitKey } from "./lookupUnit.js";

/** What a flow unit measures. */
export type FlowKind = "molar" | "mass" | "standard-volume" | "volume";

/** One flow unit. */
export interface FlowUnitDefinition {
  readonly symbol: string;
  readonly aliases: readonly string[];
  readonly kind: FlowKind;
  /** SI per unit: mol/s (molar), kg/s (mass), m3/s (volumes). */
  readonly factor: number;
}

const H = 3600;
const D = 86400;
const FT3 = FOOT_M * FOOT_M * FOOT_M;
const US_GALLON_M3 = 3.785411784e-3;
const BARREL_M3 = 42 * US_GALLON_M3;

function flowUnit(
  symbol: string,
  kind: FlowKind,
  factor: number,
  aliases: readonly string[] = [],
): FlowUnitDefinition {
  return { symbol, kind, factor, aliases };
}

/** Every flow unit the library reads. */
export const FLOW_UNITS: readonly FlowUnitDefinition[] = Object.freeze([
  flowUnit("mol/s", "molar", 1),
  flowUnit("mol/h", "molar", 1 / H),
  flowUnit("kmol/s", "molar", 1e3),
  flowUnit("kmol/h", "molar", 1e3 / H, ["kmol/hr"]),
  flowUnit("kmol/d", "molar", 1e3 / D),
  flowUnit("lbmol/h", "molar", (1e3 * POUND_KG) / H, ["lbmol/hr", "lb-mol/h"]),
  flowUnit("kg/s", "mass", 1),
  flowUnit("kg/h", "mass", 1 / H, ["kg/hr"]),
  flowUnit("t/h", "mass", 1e3 / H, ["tonne/h", "t/hr"]),
  flowUnit("t/d", "mass", 1e3 / D, ["tonne/d", "t/day"]),
  flowUnit("lb/h", "mass", POUND_KG / H, ["lb/hr", "lbm/h"]),
  flowUnit("Sm3/s", "standard-volume", 1),
  flowUnit("Sm3/h", "standard-volume", 1 / H, ["sm3/h", "Sm3/hr"]),
  flowUnit("Sm3/d", "standard-volume", 1 / D, ["sm3/d", "Sm3/day"]),
  flowUnit("Nm3/h", "standard-volume", 1 / H, ["nm3/h", "Nm3/hr"]),
  flowUnit("Nm3/d", "standard-volume", 1 / D, ["nm3/d", "Nm3/day"]),
  flowUnit("scf/h", "standard-volume", FT3 / H, ["SCFH", "scfh"]),
  flowUnit("scf/d", "standard-volume", FT3 / D, ["SCFD", "scfd"]),
  flowUnit("MSCFD", "standard-volume", (1e3 * FT3) / D, ["Mscf/d", "MSCF/D"]),
  flowUnit("MMSCFD", "standard-volume", (1e6 * FT3) / D, ["MMscf/d", "MMSCF/D", "MMscfd"]),
  flowUnit("m3/s", "volume", 1),
  flowUnit("m3/h", "volume", 1 / H, ["m3/hr"]),
  flowUnit("m3/d", "volume", 1 / D, ["m3/day"]),
  flowUnit("L/min", "volume", 1e-3 / 60, ["l/min"]),
  flowUnit("bbl/d", "volume", BARREL_M3 / D, ["BPD", "bbl/day"]),
  flowUnit("USgpm", "volume", US_GALLON_M3 / 60, ["gpm", "USgal/min"]),
]);

const BY_KEY = new Map<string, FlowUnitDefinition>();
for (const def of FLOW_UNITS) {
  for (const name of [def.symbol, ...def.aliases]) BY_KEY.set(unitKey(name), def);
}

/**
 * The definition of a flow unit.
 *
 * @example
 * ```ts
 * lookupFlowUnit("kmol/h").factor; // 0.2777... (mol/s per kmol/h)
 * lookupFlowUnit("MMSCFD").kind; // "standard-volume"
 * ```
 * @throws InputError for a missing unit; UnknownNameError with the closest flow units.
 */
export function lookupFlowUnit(unit: string): FlowUnitDefinition {
  if (typeof unit !== "string" || unit.trim() === "") {
    throw new InputError({
      input: "flow.unit",
      unit: "-",
      validRange: `a flow unit, one of ${FLOW_UNITS.map((u) => u.symbol).join(", ")}`,
      received: unit,
      hint: 'a flow has no default unit: write e.g. { value: 1200, unit: "kmol/h" }',
    });
  }
  const def = BY_KEY.get(unitKey(unit));
  if (def) return def;
  const key = unitKey(unit).toLowerCase();
  const scored = FLOW_UNITS.map((u) => ({
    symbol: u.symbol,
    d: Math.min(
      ...[u.symbol, ...u.aliases].map((n) => editDistance(key, unitKey(n).toLowerCase())),
    ),
  })).sort((a, b) => a.d - b.d);
  throw new UnknownNameError(
    "flow unit",
    unit,
    scored.slice(0, 3).map((s) => s.symbol),
  );
}

/** Reference conditions of a standard volume: temperature and pressure, with a name. */
export interface ReferenceConditions {
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** How the conditions are written in results, e.g. "ISO 13443 (15 degC, 101.325 kPa)". */
  readonly name: string;
}

/** The named reference conditions of standard and normal volumes. */
export const NAMED_REFERENCE_CONDITIONS: Readonly<Record<string, ReferenceConditions>> =
  Object.freeze({
    "ISO 13443 (15 degC, 101.325 kPa)": {
      temperatureK: 288.15,
      pressurePa: 101325,
      name: "ISO 13443 (15 degC, 101.325 kPa)",
    },
    "normal (0 degC, 101.325 kPa)": {
      temperatureK: 273.15,
      pressurePa: 101325,
      name: "normal (0 degC, 101.325 kPa)",
    },
    "60 degF, 14.696 psia": {
      temperatureK: ((60 + 459.67) * 5) / 9,
      pressurePa: 14.696 * PSI_PA,
      name: "60 degF, 14.696 psia",
    },
    "60 degF, 14.73 psia": {
      temperatureK: ((60 + 459.67) * 5) / 9,
      pressurePa: 14.73 * PSI_PA,
      name: "60 degF, 14.73 psia",
    },
  });

/** Reference conditions as a caller gives them: a name of {@link NAMED_REFERENCE_CONDITIONS} or T and P. */
export type ReferenceConditionsSpec =
  string | { readonly temperatureK: number; readonly pressurePa: number; readonly name?: string };

/**
 * Resolves reference conditions given by name or by value.
 *
 * @param input - name of the input in error messages, e.g. "flow.reference".
 * @throws InputError when none are given (a standard volume flow without reference conditions is
 *   ambiguous), for an unknown name, or for a temperature or pressure outside 200-400 K, 50-200 kPa.
 */
export function resolveReferenceConditions(
  spec: ReferenceConditionsSpec | undefined,
  input = "flow.reference",
): ReferenceConditions {
  const names = Object.keys(NAMED_REFERENCE_CONDITIONS);
  if (spec === undefined) {
    throw new InputError({
      input,
      unit: "-",
      validRange: `the reference conditions of the standard volume: one of ${names.map((n) => `"${n}"`).join(", ")}, or { temperatureK, pressurePa }`,
      received: spec,
      hint: "a standard or normal volume flow means nothing without its reference temperature and pressure, which differ between standards and contracts; state them",
    });
  }
  if (typeof spec === "string") {
    const found = NAMED_REFERENCE_CONDITIONS[spec];
    if (found) return found;
    throw new InputError({
      input,
      unit: "-",
      validRange: `one of ${names.map((n) => `"${n}"`).join(", ")}, or { temperatureK, pressurePa }`,
      received: spec,
    });
  }
  const T = spec.temperatureK;
  const P = spec.pressurePa;
  if (!(typeof T === "number" && T >= 200 && T <= 400)) {
    throw new InputError({
      input: `${input}.temperatureK`,
      unit: "K",
      validRange: "between 200 and 400 (a reference temperature)",
      received: T,
    });
  }
  if (!(typeof P === "number" && P >= 5e4 && P <= 2e5)) {
    throw new InputError({
      input: `${input}.pressurePa`,
      unit: "Pa",
      validRange: "between 50000 and 200000 (a reference pressure, absolute)",
      received: P,
    });
  }
  return {
    temperatureK: T,
    pressurePa: P,
    name: spec.name ?? `${(T - 273.15).toFixed(2)} degC, ${(P / 1e3).toFixed(3)} kPa`,
  };
}

/** Ideal-gas molar volume R T / P at reference conditions, m3/mol. */
export function idealGasMolarVolumeM3PerMol(ref: ReferenceConditions): number {
  return (R * ref.temperatureK) / ref.pressurePa;
}

/** What a flow conversion needs beyond the unit, depending on its kind. */
export interface FlowConversionContext {
  /** kg/mol: mass units. */
  readonly molarMassKgPerMol?: number;
  /** m3/mol at the reference conditions: standard-volume units. */
  readonly standardMolarVolumeM3PerMol?: number;
  /** m3/mol at the stated conditions: volume units. */
  readonly actualMolarVolumeM3PerMol?: number;
  /** Name of the input in error messages. Default "flow". */
  readonly input?: string;
}

function perMolOf(def: FlowUnitDefinition, ctx: FlowConversionContext): number {
  const input = ctx.input ?? "flow";
  const need = (v: number | undefined, name: string, unit: string, why: string): number => {
    if (!(typeof v === "number" && v > 0 && v < Infinity)) {
      throw new InputError({
        input: `${input}: ${name}`,
        unit,
        validRange: `> 0 (${why})`,
        received: v,
      });
    }
    return v;
  };
  switch (def.kind) {
    case "molar":
      return 1;
    case "mass":
      return need(ctx.molarMassKgPerMol, "molar mass", "kg/mol", `${def.symbol} is a mass flow`);
    case "standard-volume":
      return need(
        ctx.standardMolarVolumeM3PerMol,
        "molar volume at the reference conditions",
        "m3/mol",
        `${def.symbol} is a standard volume flow`,
      );
    case "volume":
      return need(
        ctx.actualMolarVolumeM3PerMol,
        "molar volume at the stated conditions",
        "m3/mol",
        `${def.symbol} is a volume flow at stated conditions`,
      );
  }
}

/**
 * A flow in `unit` as a molar flow, mol/s.
 *
 * @example
 * ```ts
 * molarFlowToSI(3600, "kmol/h"); // 1000
 * molarFlowToSI(36, "t/h", { molarMassKgPerMol: 0.018 }); // 555.6
 * molarFlowToSI(10, "MMSCFD", { standardMolarVolumeM3PerMol: 0.023645 }); // 138.6
 * ```
 * @throws InputError for a negative or non-finite value or a missing molar mass / volume.
 */
export function molarFlowToSI(
  value: number,
  unit: string,
  ctx: FlowConversionContext = {},
): number {
  const def = lookupFlowUnit(unit);
  if (!(typeof value === "number" && value >= 0 && value < Infinity)) {
    throw new InputError({
      input: `${ctx.input ?? "flow"}.value`,
      unit: def.symbol,
      validRange: "a finite number >= 0",
      received: value,
    });
  }
  return (value * def.factor) / perMolOf(def, ctx);
}

/** A molar flow (mol/s) in `unit` (the inverse of {@link molarFlowToSI}). */
export function molarFlowFromSI(
  molarFlowMolPerS: number,
  unit: string,
  ctx: FlowConversionContext = {},
): number {
  const def = lookupFlowUnit(unit);
  if (!(typeof molarFlowMolPerS === "number" && Number.isFinite(molarFlowMolPerS))) {
    throw new InputError({
      input: ctx.input ?? "molarFlowMolPerS",
      unit: "mol/s",
      validRange: "a finite number",
      received: molarFlowMolPerS,
    });
  }
  return (molarFlowMolPerS * perMolOf(def, ctx)) / def.factor;
}
