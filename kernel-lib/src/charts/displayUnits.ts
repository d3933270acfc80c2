/**
 * Display units for chart axes and table columns: which units each kind of quantity may be shown
 * in, how each is printed, and the unit systems "SI" and "field". The conversion factors are NOT
 * written here: every unit is looked up in units/ (the one conversion table of the library), so
 * axes, tables and notebook inputs can never disagree. Values inside the library stay SI.
 *
 * Mass-based kinds (massEnergy, massEntropy, massDensity, specificVolume) take values already on
 * a per-kilogram SI basis (J/kg, J/(kg K), kg/m3, m3/kg): the builder divides by the molar mass.
 */
import { UnknownNameError } from "../errors.js";
import { lookupUnit } from "../units/lookupUnit.js";

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

/** A display unit whose factor and offset come from the units/ table. */
function unit(id: string, symbol: string): DisplayUnit {
  const def = lookupUnit(id);
  return { id, symbol, scale: 1 / def.factor, offset: -def.offset / def.factor };
}

/** Every display unit, by quantity kind. The first of each list is the plain SI unit. */
export const DISPLAY_UNITS: Readonly<Record<QuantityKind, readonly DisplayUnit[]>> = {
  temperature: [unit("K", "K"), unit("degC", "°C"), unit("degF", "°F"), unit("degR", "°R")],
  pressure: [
    unit("Pa", "Pa"),
    unit("kPa", "kPa"),
    unit("MPa", "MPa"),
    unit("bar", "bar"),
    unit("atm", "atm"),
    unit("psia", "psia"),
  ],
  molarDensity: [
    unit("mol/m3", "mol/m³"),
    unit("kmol/m3", "kmol/m³"),
    unit("mol/L", "mol/L"),
    unit("lbmol/ft3", "lbmol/ft³"),
  ],
  molarVolume: [
    unit("m3/mol", "m³/mol"),
    unit("m3/kmol", "m³/kmol"),
    unit("L/mol", "L/mol"),
    unit("cm3/mol", "cm³/mol"),
    unit("ft3/lbmol", "ft³/lbmol"),
  ],
  massDensity: [unit("kg/m3", "kg/m³"), unit("lb/ft3", "lb/ft³")],
  specificVolume: [unit("m3/kg", "m³/kg"), unit("ft3/lb", "ft³/lb")],
  molarEnergy: [
    unit("J/mol", "J/mol"),
    unit("kJ/mol", "kJ/mol"),
    unit("kJ/kmol", "kJ/kmol"),
    unit("Btu/lbmol", "Btu/lbmol"),
  ],
  molarEntropy: [
    unit("J/(mol K)", "J/(mol·K)"),
    unit("kJ/(kmol K)", "kJ/(kmol·K)"),
    unit("Btu/(lbmol degR)", "Btu/(lbmol·°R)"),
  ],
  massEnergy: [unit("J/kg", "J/kg"), unit("kJ/kg", "kJ/kg"), unit("Btu/lb", "Btu/lb")],
  massEntropy: [
    unit("J/(kg K)", "J/(kg·K)"),
    unit("kJ/(kg K)", "kJ/(kg·K)"),
    unit("Btu/(lb degR)", "Btu/(lb·°R)"),
  ],
  speed: [unit("m/s", "m/s"), unit("ft/s", "ft/s")],
  // Dimensionless: not a unit of units/; a ratio shown as is or in per cent.
  dimensionless: [
    // No symbol: a dash after a number reads as a minus sign.
    { id: "-", symbol: "", scale: 1, offset: 0 },
    { id: "%", symbol: "%", scale: 100, offset: 0 },
  ],
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

/** A number in a display unit as text, "40.0 °C"; a dimensionless number without a symbol. */
export function withUnit(text: string, unit: DisplayUnit): string {
  return unit.symbol === "" ? text : `${text} ${unit.symbol}`;
}

/**
 * Axis or column title in the ISO 80000-1 "quantity / unit" form, e.g. "Pressure / MPa";
 * dimensionless quantities get no unit.
 */
export function quantityTitle(name: string, target: DisplayUnit): string {
  return target.id === "-" ? name : `${name} / ${target.symbol}`;
}
