/**
 * Smallest and largest value of a list by one loop. `Math.min(...values)` passes every element as
 * an argument and overflows the call stack for lists of about 100,000 numbers and more (the limit
 * depends on the engine), so data-sized lists go through here.
 */
import { InputError } from "../errors.js";

/** Minimum and maximum of a non-empty list; NaN anywhere is refused (it has no order). */
export function extent(values: ArrayLike<number>): { min: number; max: number } {
  const n = values.length;
  if (!(n > 0)) {
    throw new InputError({
      input: "values",
      unit: "-",
      validRange: "a non-empty list",
      received: n,
    });
  }
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < n; i++) {
    const v = values[i];
    if (Number.isNaN(v)) {
      throw new InputError({
        input: `values[${i}]`,
        unit: "-",
        validRange: "a number, not NaN",
        received: v,
      });
    }
    if (v < min) min = v;
    if (v > max) max = v;
  }
  return { min, max };
}
