/**
 * Temperature-range policy of the ideal-gas layer (any route):
 * - inside [min, max] of the method: no warning;
 * - outside, but not below min * (1 - margin) nor above max * (1 + margin): the value is computed
 *   by extrapolation and an "extrapolated" warning is returned;
 * - further out: refused with OutOfRangeError.
 * The margin is 0.10 (10 % of the limit) unless the caller passes another one.
 * The refusal names the component, the method, its range, the temperature asked and what to do
 * (messages.ts, outOfRangeAdvice).
 */
import { OutOfRangeError, type ResultWarning } from "../errors.js";
import { requirePositive } from "../validate.js";
import { extrapolatedTemperatureWarning, outOfRangeAdvice } from "./messages.js";

/** Default allowed extrapolation beyond a method's temperature range, as a fraction of the limit. */
export const DEFAULT_EXTRAPOLATION_MARGIN = 0.1;

/** Options for temperature-range checks. */
export interface TemperatureRangeOptions {
  /**
   * Allowed extrapolation beyond the range, as a fraction of the violated limit (0.1 = 10 %).
   * Default 0.1. Pass 0 to refuse any extrapolation.
   */
  extrapolationMargin?: number;
}

/**
 * Checks a temperature against a method's range. Returns the warnings (empty inside the range);
 * throws InputError for a non-positive or NaN temperature and OutOfRangeError beyond the margin.
 */
export function checkTemperatureRange(
  componentId: string,
  method: string,
  range: { readonly min: number; readonly max: number },
  temperatureK: number,
  options: TemperatureRangeOptions = {},
): ResultWarning[] {
  requirePositive("temperatureK", temperatureK, "K");
  const margin = options.extrapolationMargin ?? DEFAULT_EXTRAPOLATION_MARGIN;
  if (!(margin >= 0 && margin < 1)) {
    throw new OutOfRangeError({
      input: "extrapolationMargin",
      unit: "-",
      validRange: "between 0 and 1",
      received: margin,
    });
  }
  if (temperatureK >= range.min && temperatureK <= range.max) return [];
  const lo = range.min * (1 - margin);
  const hi = range.max * (1 + margin);
  if (!(temperatureK >= lo && temperatureK <= hi)) {
    throw new OutOfRangeError({
      input: `temperatureK (${componentId}, ${method})`,
      unit: "K",
      validRange: `${range.min} K to ${range.max} K (extrapolation allowed to ${round(lo)}-${round(hi)} K)`,
      received: temperatureK,
      hint: outOfRangeAdvice(componentId, method, range, temperatureK),
    });
  }
  return [extrapolatedTemperatureWarning(componentId, method, temperatureK, range)];
}

function round(x: number): number {
  return Math.round(x * 100) / 100;
}
