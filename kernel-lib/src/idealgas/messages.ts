/**
 * Warnings of the ideal-gas layer, written once here so their wording stays consistent and tests
 * can match them. Each says what is wrong and what to do.
 */
import type { ResultWarning } from "../errors.js";

/** A temperature outside a method's range but within the allowed extrapolation margin. */
export function extrapolatedTemperatureWarning(
  componentId: string,
  method: string,
  temperatureK: number,
  range: { readonly min: number; readonly max: number },
): ResultWarning {
  return {
    code: "extrapolated",
    message:
      `${componentId}: ${temperatureK} K is outside the ${range.min}-${range.max} K range of its ` +
      `${method}; the value is extrapolated. Check it against another source, or use a component ` +
      `with a wider-range correlation.`,
  };
}

/** Adds a warning to a list unless an identical message is already there. */
export function pushUnique(warnings: ResultWarning[], warning: ResultWarning): void {
  if (!warnings.some((w) => w.code === warning.code && w.message === warning.message)) {
    warnings.push(warning);
  }
}
