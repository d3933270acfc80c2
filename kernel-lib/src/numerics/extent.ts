/**
 * Smallest and largest value of a list by one loop. `Math.min(...values)` passes every element as
 * an argument and overflows the call stack for lists of about 100,000 numbers and more (the limit
 * depends on the engine), so data-sized lists go through here.
 */
import { InputError } from "../errors.js";

/** Minimum and maximum of a non-empty list (-0 below +0, as Math.min); NaN is refused (it has no order). */
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
    if (v < min || (v === 0 && min === 0 && Object.is(v, -0))) min = v;
    if (v > max || (v === 0 && Object.is(max, -0))) max = v;
  }
  return { min, max };
}

/** Math.max over a list of any length (no spread): -Infinity for an empty list, NaN if any is NaN. */
export function maxOf(values: ArrayLike<number>): number {
  let max = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (Number.isNaN(v)) return Number.NaN;
    if (v > max || (v === 0 && Object.is(max, -0))) max = v;
  }
  return max;
}

/** Math.min over a list of any length (no spread): Infinity for an empty list, NaN if any is NaN. */
export function minOf(values: ArrayLike<number>): number {
  let min = Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (Number.isNaN(v)) return Number.NaN;
    if (v < min || (v === 0 && min === 0 && Object.is(v, -0))) min = v;
  }
  return min;
}
