/**
 * Input checks written so that NaN fails too (`!(x > 0)` rather than `x <= 0`).
 * Each throws an InputError naming the input, its unit, the valid range and the value received.
 */
import { InputError } from "./errors.js";

/** Requires a finite number > 0. Returns it, so checks can be used inline. */
export function requirePositive(input: string, value: number, unit: string): number {
  if (!(typeof value === "number" && value > 0 && value < Infinity)) {
    throw new InputError({ input, unit, validRange: "a finite number > 0", received: value });
  }
  return value;
}

/** Requires a finite number >= 0. */
export function requireNonNegative(input: string, value: number, unit: string): number {
  if (!(typeof value === "number" && value >= 0 && value < Infinity)) {
    throw new InputError({ input, unit, validRange: "a finite number >= 0", received: value });
  }
  return value;
}

/** Requires any finite number. */
export function requireFinite(input: string, value: number, unit: string): number {
  if (!(typeof value === "number" && Number.isFinite(value))) {
    throw new InputError({ input, unit, validRange: "a finite number", received: value });
  }
  return value;
}

/** Requires lo <= value <= hi (both inclusive). */
export function requireInRange(
  input: string,
  value: number,
  unit: string,
  lo: number,
  hi: number,
): number {
  if (!(typeof value === "number" && value >= lo && value <= hi)) {
    throw new InputError({ input, unit, validRange: `between ${lo} and ${hi}`, received: value });
  }
  return value;
}

/** Requires a whole number >= 1 (an iteration or subdivision limit, a count). Unit "-". */
export function requireCount(input: string, value: number): number {
  if (!(Number.isInteger(value) && value >= 1)) {
    throw new InputError({ input, unit: "-", validRange: "an integer >= 1", received: value });
  }
  return value;
}

/**
 * Requires one of a few fixed strings (an axis choice, a mode). The error lists them quoted:
 * '"pressure" or "density"'. Unit "-".
 */
export function requireChoice<T extends string>(
  input: string,
  value: unknown,
  choices: readonly T[],
): T {
  if (!(typeof value === "string" && (choices as readonly string[]).includes(value))) {
    throw new InputError({
      input,
      unit: "-",
      validRange: choices.map((c) => `"${c}"`).join(" or "),
      received: value,
    });
  }
  return value as T;
}
