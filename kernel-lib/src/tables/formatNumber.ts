/**
 * Number formatting for tables: a fixed number of significant figures, plain notation for
 * magnitudes from 1e-4 to below 1e6 and scientific notation outside, no "-0".
 */
import { InputError } from "../errors.js";

/** Options of {@link formatSignificant}. */
export interface FormatNumberOptions {
  /** Significant figures, 1 to 17. Default 5. */
  digits?: number;
  /** Fixed number of decimals instead of significant figures (0 to 12). Default: not used. */
  decimals?: number;
  /** Exponent from which scientific notation is used (|x| >= 10^this). Default 6. */
  maxPlainExponent?: number;
  /** Exponent below which scientific notation is used (|x| < 10^this). Default -4. */
  minPlainExponent?: number;
}

/**
 * Formats a number for a table cell. NaN shows as "NaN" and infinities as "inf" / "-inf", so a
 * bad value is visible rather than hidden.
 * @example formatSignificant(101325, { digits: 4 }) // "101300"
 * @example formatSignificant(0.000012345) // "1.2345e-5"
 */
export function formatSignificant(value: number, options: FormatNumberOptions = {}): string {
  if (Number.isNaN(value)) return "NaN";
  if (value === Infinity) return "inf";
  if (value === -Infinity) return "-inf";
  if (options.decimals !== undefined) {
    const d = options.decimals;
    if (!(Number.isInteger(d) && d >= 0 && d <= 12)) {
      throw new InputError({
        input: "decimals",
        unit: "-",
        validRange: "an integer from 0 to 12",
        received: d,
      });
    }
    return dropNegativeZero(value.toFixed(d));
  }
  const digits = options.digits ?? 5;
  if (!(Number.isInteger(digits) && digits >= 1 && digits <= 17)) {
    throw new InputError({
      input: "digits",
      unit: "-",
      validRange: "an integer from 1 to 17",
      received: digits,
    });
  }
  if (value === 0) return "0";
  const rounded = Number(value.toPrecision(digits));
  const exponent = Math.floor(Math.log10(Math.abs(rounded)));
  const maxPlain = options.maxPlainExponent ?? 6;
  const minPlain = options.minPlainExponent ?? -4;
  if (exponent >= maxPlain || exponent < minPlain) {
    const [mantissa, exp] = rounded.toExponential(digits - 1).split("e");
    return `${mantissa}e${Number(exp)}`;
  }
  const decimals = Math.max(0, digits - 1 - exponent);
  return dropNegativeZero(rounded.toFixed(decimals));
}

function dropNegativeZero(text: string): string {
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}
