/**
 * Reading and writing quantities as text, e.g. "25 barg", "-40 °F", "2.5 kJ/(kg K)".
 */
import { InputError } from "../errors.js";
import type { Dimension } from "./dimension.js";
import { SI_UNITS } from "./dimension.js";
import { fromSI, toSI, type UnitConversionOptions } from "./convert.js";
import { lookupUnit } from "./lookupUnit.js";

/** A quantity read from text. */
export interface ParsedQuantity {
  /** The value on the SI molar basis, in `unit`. */
  value: number;
  /** The SI unit of `value`, e.g. "Pa". */
  unit: string;
  dimension: Dimension;
  /** The number as written, e.g. 25. */
  givenValue: number;
  /** The unit as the library writes it, e.g. "barg" for "bar(g)". */
  givenUnit: string;
}

const QUANTITY = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*([^\d\s.,+-].*)$/;

/**
 * Reads "number unit" into an SI value. The number may use an exponent (1.5e3); no thousands
 * separators or decimal commas.
 *
 * @example
 * ```ts
 * parseQuantity("25 barg");
 * // { value: 2601325, unit: "Pa", dimension: "pressure", givenValue: 25, givenUnit: "barg" }
 * parseQuantity("150 degC", { dimension: "temperature" }).value; // 423.15
 * ```
 * @throws InputError if the text is not "number unit" or the value is refused by {@link toSI};
 *   AmbiguousUnitError / UnknownNameError for the unit.
 */
export function parseQuantity(text: string, options: UnitConversionOptions = {}): ParsedQuantity {
  const normalized = typeof text === "string" ? text.trim().replace(/\u2212/g, "-") : "";
  const match = QUANTITY.exec(normalized);
  if (!match) {
    throw new InputError({
      input: options.input ?? "quantity",
      unit: "-",
      validRange: 'a number followed by a unit, e.g. "25 barg" or "-40 degF"',
      received: text,
    });
  }
  const givenValue = Number(match[1]);
  const def = lookupUnit(match[2], options.dimension);
  const value = toSI(givenValue, match[2], options);
  return {
    value,
    unit: SI_UNITS[def.dimension],
    dimension: def.dimension,
    givenValue,
    givenUnit: def.symbol,
  };
}

/** Options of {@link formatQuantity}. */
export interface FormatQuantityOptions extends UnitConversionOptions {
  /** Significant digits of the number, 1 to 17. Default 6. */
  significantDigits?: number;
}

/**
 * Writes an SI value in `unit`, e.g. "25 barg".
 *
 * @example
 * ```ts
 * formatQuantity(2_601_325, "barg"); // "25 barg"
 * formatQuantity(298.15, "degF", { significantDigits: 4 }); // "77 degF"
 * ```
 */
export function formatQuantity(
  valueSI: number,
  unit: string,
  options: FormatQuantityOptions = {},
): string {
  const digits = options.significantDigits ?? 6;
  if (!(Number.isInteger(digits) && digits >= 1 && digits <= 17)) {
    throw new InputError({
      input: "options.significantDigits",
      unit: "-",
      validRange: "an integer from 1 to 17",
      received: digits,
    });
  }
  const def = lookupUnit(unit, options.dimension);
  const v = Number(fromSI(valueSI, unit, options).toPrecision(digits));
  return `${v === 0 ? 0 : v} ${def.symbol}`;
}
