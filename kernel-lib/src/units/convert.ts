/**
 * Conversion between units as written and the library's SI molar basis (K, Pa, mol, J/mol,
 * J/(mol K), m3/mol, mol/m3, m/s, K/Pa, W). Conversions happen here, at the edges, and nowhere
 * else.
 *
 * Absolute values versus differences: by default a value is absolute, so 25 degC is 298.15 K and
 * 10 barg is 10 bar plus the atmospheric pressure. With `difference: true` a value is a
 * difference: 1 degC of difference is 1 K, 1 degF is 5/9 K, and 1 barg of difference is 1 bar.
 */
import { InputError } from "../errors.js";
import type { Dimension } from "./dimension.js";
import { SI_UNITS } from "./dimension.js";
import { checkAtmosphericPressure, getDefaultAtmosphericPressure } from "./atmosphericPressure.js";
import { lookupUnit } from "./lookupUnit.js";
import type { UnitDefinition } from "./unitTable.js";

/** Options of {@link toSI}, {@link fromSI} and the functions built on them. */
export interface UnitConversionOptions {
  /**
   * Molar mass in kg/mol (e.g. 0.04401 for CO2). Required by mass-based units (kJ/kg, kg/m3,
   * lb/ft3, kg, lb, ...) and refused as missing without it. No default.
   */
  molarMassKgPerMol?: number;
  /**
   * Atmospheric pressure in Pa for gauge units (barg, psig, kPa(g)). Default: the notebook-wide
   * default ({@link setDefaultAtmosphericPressure}), initially 101325 Pa.
   */
  atmosphericPressurePa?: number;
  /**
   * Treat the value as a difference: no temperature offset, no atmospheric pressure added.
   * Default false. Example: `toSI(9, "degF", { difference: true })` is 5 (K).
   */
  difference?: boolean;
  /** If given, the unit must measure this dimension; a unit of another one is refused. */
  dimension?: Dimension;
  /** Name of the quantity in error messages, e.g. "feed temperature". Default "value". */
  input?: string;
}

/** Largest molar mass accepted, kg/mol: heavy residues are ~1 kg/mol; 44 means g/mol by mistake. */
const MAX_MOLAR_MASS = 5;

function molarMassFactor(
  def: UnitDefinition,
  unit: string,
  options: UnitConversionOptions,
): number {
  if (def.molarMassPower === 0) return 1;
  const M = options.molarMassKgPerMol;
  if (!(typeof M === "number" && M > 0 && M <= MAX_MOLAR_MASS)) {
    throw new InputError({
      input: "options.molarMassKgPerMol",
      unit: "kg/mol",
      validRange: `> 0 and <= ${MAX_MOLAR_MASS} (needed because ${unit} is a mass-based unit)`,
      received: M,
      hint:
        typeof M === "number" && M > MAX_MOLAR_MASS
          ? `the molar mass is in kg/mol: ${M} g/mol is ${M / 1000} kg/mol`
          : "give the molar mass in kg/mol, e.g. 0.04401 for CO2",
    });
  }
  return def.molarMassPower === 1 ? M : 1 / M;
}

function atmosphere(options: UnitConversionOptions): number {
  return options.atmosphericPressurePa === undefined
    ? getDefaultAtmosphericPressure()
    : checkAtmosphericPressure(options.atmosphericPressurePa, "options.atmosphericPressurePa");
}

function checkAbsolute(
  def: UnitDefinition,
  si: number,
  value: number,
  unit: string,
  options: UnitConversionOptions,
  direction: "to" | "from",
): void {
  if (options.difference) return;
  const input = options.input ?? "value";
  if (def.dimension === "temperature" && !(si >= 0)) {
    throw new InputError({
      input,
      unit: direction === "to" ? unit : "K",
      validRange: `at or above absolute zero (0 K = ${Number((-def.offset / def.factor).toPrecision(10))} ${def.symbol})`,
      received: value,
      hint: "for a temperature difference pass { difference: true }",
    });
  }
  if (direction === "to" && def.dimension === "pressure" && !(si >= 0)) {
    throw new InputError({
      input,
      unit,
      validRange: def.gauge
        ? `>= ${-atmosphere(options) / def.factor} ${def.symbol} (a gauge pressure cannot be below vacuum at atmospheric pressure ${atmosphere(options)} Pa)`
        : ">= 0 (an absolute pressure)",
      received: value,
      hint: "for a pressure difference pass { difference: true }",
    });
  }
}

function requireFiniteValue(value: number, unit: string, options: UnitConversionOptions): void {
  if (!(typeof value === "number" && Number.isFinite(value))) {
    throw new InputError({
      input: options.input ?? "value",
      unit,
      validRange: "a finite number",
      received: value,
    });
  }
}

/**
 * Converts a value in `unit` to the SI molar basis of its dimension.
 *
 * @example
 * ```ts
 * toSI(25, "degC"); // 298.15 (K)
 * toSI(25, "barg"); // 2_601_325 (Pa, with 101325 Pa atmosphere)
 * toSI(-40, "degF"); // 233.15 (K)
 * toSI(1, "degF", { difference: true }); // 0.5555555555555556 (K)
 * toSI(100, "kJ/kg", { molarMassKgPerMol: 0.04401 }); // 4401 (J/mol)
 * ```
 * @throws InputError for NaN or infinite values, absolute temperatures below 0 K, pressures
 *   below vacuum, a missing molar mass for a mass-based unit, or a unit of the wrong dimension;
 *   AmbiguousUnitError / UnknownNameError for units that cannot be read.
 */
export function toSI(value: number, unit: string, options: UnitConversionOptions = {}): number {
  const def = lookupUnit(unit, options.dimension);
  requireFiniteValue(value, unit, options);
  let si = value * def.factor;
  if (!options.difference) {
    si += def.offset;
    if (def.gauge) si += atmosphere(options);
  }
  checkAbsolute(def, si, value, unit, options, "to");
  return si * molarMassFactor(def, unit, options);
}

/**
 * Converts a value on the SI molar basis to `unit` (the inverse of {@link toSI}). Negative
 * absolute pressures are converted (an equation of state can return them); negative absolute
 * temperatures are refused.
 *
 * @example
 * ```ts
 * fromSI(298.15, "degC"); // 25
 * fromSI(2_601_325, "barg"); // 25
 * ```
 * @throws InputError for NaN or infinite values, temperatures below 0 K, a missing molar mass.
 */
export function fromSI(valueSI: number, unit: string, options: UnitConversionOptions = {}): number {
  const def = lookupUnit(unit, options.dimension);
  requireFiniteValue(valueSI, SI_UNITS[def.dimension], options);
  checkAbsolute(def, valueSI, valueSI, unit, options, "from");
  let v = valueSI / molarMassFactor(def, unit, options);
  if (!options.difference) {
    if (def.gauge) v -= atmosphere(options);
    v -= def.offset;
  }
  return v / def.factor;
}

/**
 * Converts between two units of the same dimension (through SI).
 *
 * @example
 * ```ts
 * convertUnit(100, "psig", "barg"); // 6.894757293168361
 * ```
 */
export function convertUnit(
  value: number,
  fromUnit: string,
  toUnit: string,
  options: UnitConversionOptions = {},
): number {
  const dimension = options.dimension ?? lookupUnit(fromUnit).dimension;
  const si = toSI(value, fromUnit, { ...options, dimension });
  return fromSI(si, toUnit, { ...options, dimension });
}
