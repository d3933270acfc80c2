/**
 * Validity ranges of the petroleum correlations and the one policy applied to them: input outside a
 * correlation's range is refused with OutOfRangeError, unless the caller passes
 * `allowOutsideRange: true`, in which case the value is computed and an "outside-validity" warning
 * is returned with it.
 */
import { OutOfRangeError, type ResultWarning } from "../errors.js";

/** A closed interval with its unit and where it comes from. */
export interface ValidityInterval {
  readonly min: number;
  readonly max: number;
  readonly unit: string;
}

/** Checks one input against a correlation's interval; returns warnings or throws. */
export function checkValidity(
  correlation: string,
  input: string,
  value: number,
  interval: ValidityInterval,
  allowOutsideRange: boolean,
): ResultWarning[] {
  if (value >= interval.min && value <= interval.max) return [];
  if (!allowOutsideRange || !Number.isFinite(value)) {
    throw new OutOfRangeError({
      input,
      unit: interval.unit,
      validRange: `${interval.min} to ${interval.max} ${interval.unit} (validity range of ${correlation})`,
      received: value,
      hint: "Pass allowOutsideRange: true to extrapolate (the result then carries a warning)",
    });
  }
  return [
    {
      code: "outside-validity",
      message: `${input} = ${value} ${interval.unit} is outside the ${interval.min}-${interval.max} ${interval.unit} range of ${correlation}; the estimate is extrapolated and may be poor.`,
    },
  ];
}
