/**
 * The axes of a sweep: a list, a typed array or a range ({ from, to, count, spacing }) turned
 * into a Float64Array, with every value checked to be a finite number.
 */
import { InputError } from "../errors.js";
import type { SweepAxis, SweepRange } from "./types.js";

function isRange(axis: SweepAxis): axis is SweepRange {
  return !Array.isArray(axis) && !(axis instanceof Float64Array);
}

/** The values of an axis; `name` labels errors ("first", "second"). */
export function axisValues(axis: SweepAxis, name: string): Float64Array {
  if (axis === null || typeof axis !== "object") {
    throw new InputError({
      input: name,
      unit: "-",
      validRange: "an array of numbers, a Float64Array or a range { from, to, count, spacing }",
      received: axis,
    });
  }
  if (!isRange(axis)) {
    const out = Float64Array.from(axis);
    if (out.length === 0) {
      throw new InputError({
        input: name,
        unit: "-",
        validRange: "at least one value",
        received: "[]",
      });
    }
    for (let i = 0; i < out.length; i++) {
      if (!Number.isFinite(out[i])) {
        throw new InputError({
          input: `${name}[${i}]`,
          unit: "-",
          validRange: "a finite number",
          received: (axis as ArrayLike<unknown>)[i],
        });
      }
    }
    return out;
  }
  const { from, to, count } = axis;
  const spacing = axis.spacing ?? "linear";
  if (!(Number.isInteger(count) && count >= 1)) {
    throw new InputError({
      input: `${name}.count`,
      unit: "-",
      validRange: "an integer >= 1",
      received: count,
    });
  }
  if (!Number.isFinite(from)) {
    throw new InputError({
      input: `${name}.from`,
      unit: "-",
      validRange: "a finite number",
      received: from,
    });
  }
  if (!Number.isFinite(to)) {
    throw new InputError({
      input: `${name}.to`,
      unit: "-",
      validRange: "a finite number",
      received: to,
    });
  }
  if (!(spacing === "linear" || spacing === "log")) {
    throw new InputError({
      input: `${name}.spacing`,
      unit: "-",
      validRange: '"linear" or "log"',
      received: spacing,
    });
  }
  if (spacing === "log" && !(from > 0 && to > 0)) {
    throw new InputError({
      input: `${name}.from`,
      unit: "-",
      validRange: "positive ends for log spacing",
      received: `${from} to ${to}`,
    });
  }
  const out = new Float64Array(count);
  if (count === 1) {
    out[0] = from;
    return out;
  }
  const last = count - 1;
  if (spacing === "linear") {
    // from + (to - from) i / last: exact at both ends
    for (let i = 0; i < count; i++) out[i] = from + ((to - from) * i) / last;
  } else {
    const lf = Math.log(from);
    const lt = Math.log(to);
    for (let i = 0; i < count; i++) out[i] = Math.exp(lf + ((lt - lf) * i) / last);
    out[0] = from;
    out[last] = to;
  }
  return out;
}
