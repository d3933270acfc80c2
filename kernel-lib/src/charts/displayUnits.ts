/**
 * Display units for chart axes and table columns: the edge where SI values become the units an
 * engineer reads. Values inside the library stay SI (K, Pa, mol/m3, J/mol, J/(mol K), kg/m3).
 *
 * Conversion factors are exact by definition unless noted, from NIST Special Publication 811
 * (2008 edition, Taylor and Thompson), Appendix B.8/B.9:
 *   1 lb = 0.45359237 kg; 1 ft = 0.3048 m; 1 in = 0.0254 m; standard gravity 9.80665 m/s2,
 *   so 1 lbf/in2 = 6894.757293168361 Pa; 1 atm = 101325 Pa; 1 bar = 1e5 Pa;
 *   1 Btu (International Table) = 1055.05585262 J, so 1 Btu/lb = 2326 J/kg and
 *   1 Btu/(lb degR) = 4186.8 J/(kg K); 1 degR = 5/9 K; degF = degR - 459.67.
 */
import { UnknownNameError } from "../errors.js";

/** Kinds of quantity that charts and tables know how to show. */
export type QuantityKind =
  | "temperature"
  | "pressure"
  | "molarDensity"
  | "molarVolume"
  | "massDensity"
  | "specificVolume"
  | "molarEnergy"
  | "molarEntropy"
  | "massEnergy"
  | "massEntropy"
  | "speed"
  | "dimensionless";

/** One display unit: its symbol as printed and the conversion from the SI value. */
export interface DisplayUnit {
  /** Symbol as typed by a user, e.g. "degF", "psia", "kJ/mol". */
  readonly id: string;
  /** Symbol as printed on an axis or a column head, e.g. "°F". */
  readonly symbol: string;
  /** Display value = SI value * scale + offset. */
  readonly scale: number;
  readonly offset: number;
}

const LB_KG = 0.45359237;
const FT_M = 0.3048;
const PSI_PA = (LB_KG * 9.80665) / (0.0254 * 0.0254);
const BTU_J = 1055.05585262;
const LBMOL_MOL = LB_KG * 1000;
const FT3_M3 = FT_M ** 3;

function unit(id: string, symbol: string, siPerUnit: number, offset = 0): DisplayUnit {
  return { id, symbol, scale: 1 / siPerUnit, offset };
}

/** Every display unit, by quantity kind. The first of each list is the plain SI unit. */
export const DISPLAY_UNITS: Readonly<Record<QuantityKind, readonly DisplayUnit[]>> = {
  temperature: [
    unit("K", "K", 1),
    unit("degC", "°C", 1, -273.15),
    unit("degF", "°F", 5 / 9, -459.67),
    unit("degR", "°R", 5 / 9),
  ],
  pressure: [
    unit("Pa", "Pa", 1),
    unit("kPa", "kPa", 1e3),
    unit("MPa", "MPa", 1e6),
    unit("bar", "bar", 1e5),
    unit("atm", "atm", 101325),
    unit("psia", "psia", PSI_PA),
  ],
  molarDensity: [
    unit("mol/m3", "mol/m³", 1),
    unit("kmol/m3", "kmol/m³", 1e3),
    unit("mol/L", "mol/L", 1e3),
    unit("lbmol/ft3", "lbmol/ft³", LBMOL_MOL / FT3_M3),
  ],
  molarVolume: [
    unit("m3/mol", "m³/mol", 1),
    unit("m3/kmol", "m³/kmol", 1e-3),
    unit("L/mol", "L/mol", 1e-3),
    unit("cm3/mol", "cm³/mol", 1e-6),
    unit("ft3/lbmol", "ft³/lbmol", FT3_M3 / LBMOL_MOL),
  ],
  massDensity: [unit("kg/m3", "kg/m³", 1), unit("lb/ft3", "lb/ft³", LB_KG / FT3_M3)],
  specificVolume: [unit("m3/kg", "m³/kg", 1), unit("ft3/lb", "ft³/lb", FT3_M3 / LB_KG)],
  molarEnergy: [
    unit("J/mol", "J/mol", 1),
    unit("kJ/mol", "kJ/mol", 1e3),
    unit("kJ/kmol", "kJ/kmol", 1e-3),
    unit("Btu/lbmol", "Btu/lbmol", BTU_J / LBMOL_MOL),
  ],
  molarEntropy: [
    unit("J/(mol K)", "J/(mol·K)", 1),
    unit("kJ/(kmol K)", "kJ/(kmol·K)", 1),
    unit("Btu/(lbmol degR)", "Btu/(lbmol·°R)", BTU_J / LBMOL_MOL / (5 / 9)),
  ],
  massEnergy: [
    unit("J/kg", "J/kg", 1),
    unit("kJ/kg", "kJ/kg", 1e3),
    unit("Btu/lb", "Btu/lb", BTU_J / LB_KG),
  ],
  massEntropy: [
    unit("J/(kg K)", "J/(kg·K)", 1),
    unit("kJ/(kg K)", "kJ/(kg·K)", 1e3),
    unit("Btu/(lb degR)", "Btu/(lb·°R)", BTU_J / LB_KG / (5 / 9)),
  ],
  speed: [unit("m/s", "m/s", 1), unit("ft/s", "ft/s", FT_M)],
  dimensionless: [unit("-", "–", 1), unit("%", "%", 0.01)],
};

/** Named unit systems: "SI" (SI with convenient prefixes) and "field" (US oilfield units). */
export type UnitSystem = "SI" | "field";

const SYSTEMS: Readonly<Record<UnitSystem, Readonly<Record<QuantityKind, string>>>> = {
  SI: {
    temperature: "K",
    pressure: "MPa",
    molarDensity: "kmol/m3",
    molarVolume: "m3/kmol",
    massDensity: "kg/m3",
    specificVolume: "m3/kg",
    molarEnergy: "kJ/mol",
    molarEntropy: "J/(mol K)",
    massEnergy: "kJ/kg",
    massEntropy: "kJ/(kg K)",
    speed: "m/s",
    dimensionless: "-",
  },
  field: {
    temperature: "degF",
    pressure: "psia",
    molarDensity: "lbmol/ft3",
    molarVolume: "ft3/lbmol",
    massDensity: "lb/ft3",
    specificVolume: "ft3/lb",
    molarEnergy: "Btu/lbmol",
    molarEntropy: "Btu/(lbmol degR)",
    massEnergy: "Btu/lb",
    massEntropy: "Btu/(lb degR)",
    speed: "ft/s",
    dimensionless: "-",
  },
};

/**
 * Which display units to use: a unit system, or a system plus per-quantity overrides, e.g.
 * `{ system: "SI", pressure: "bar", temperature: "degC" }`. Default everywhere: "SI".
 */
export type UnitChoice =
  UnitSystem | ({ system?: UnitSystem } & Partial<Record<QuantityKind, string>>);

/** Looks up a display unit of a quantity kind by its id (e.g. "psia"); throws UnknownNameError. */
export function displayUnit(kind: QuantityKind, id: string): DisplayUnit {
  const found = DISPLAY_UNITS[kind].find((u) => u.id === id);
  if (!found) {
    throw new UnknownNameError(
      `${kind} unit`,
      id,
      DISPLAY_UNITS[kind].map((u) => u.id),
    );
  }
  return found;
}

/** The display unit chosen for a quantity kind by a {@link UnitChoice}. */
export function resolveUnit(kind: QuantityKind, choice: UnitChoice = "SI"): DisplayUnit {
  if (typeof choice === "string") {
    if (!(choice in SYSTEMS)) throw new UnknownNameError("unit system", choice, ["SI", "field"]);
    return displayUnit(kind, SYSTEMS[choice][kind]);
  }
  const system = choice.system ?? "SI";
  if (!(system in SYSTEMS)) throw new UnknownNameError("unit system", system, ["SI", "field"]);
  return displayUnit(kind, choice[kind] ?? SYSTEMS[system][kind]);
}

/** Converts an SI value to a display unit. */
export function toDisplay(valueSI: number, target: DisplayUnit): number {
  return valueSI * target.scale + target.offset;
}

/** Converts a value in a display unit back to SI. */
export function fromDisplay(value: number, source: DisplayUnit): number {
  return (value - source.offset) / source.scale;
}

/**
 * Axis or column title in the ISO 80000-1 "quantity / unit" form, e.g. "Pressure / MPa";
 * dimensionless quantities get no unit.
 */
export function quantityTitle(name: string, target: DisplayUnit): string {
  return target.id === "-" ? name : `${name} / ${target.symbol}`;
}
