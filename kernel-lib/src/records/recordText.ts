/**
 * Checks of the plain-text arguments of a calculation record, and the one-line printed form of a
 * recorded part (a notebook prints a cell's last value).
 */
import { InputError } from "../errors.js";

/** A non-empty string, or an InputError naming `input`. */
export function requireText(value: unknown, input: string): string {
  if (typeof value !== "string" || value.trim() === "") {
    throw new InputError({ input, unit: "-", validRange: "a non-empty string", received: value });
  }
  return value;
}

/** A string or undefined, or an InputError naming `input`. */
export function optionalText(value: unknown, input: string): string | undefined {
  if (value === undefined) return undefined;
  if (typeof value !== "string") {
    throw new InputError({ input, unit: "-", validRange: "a string", received: value });
  }
  return value;
}

/** Node's hook for how util.inspect (and so a notebook cell's last value) prints an object. */
export const INSPECT = Symbol.for("nodejs.util.inspect.custom");

/**
 * Gives a record part a one-line printed form (a notebook prints a cell's last value, and the
 * parts carry whole HTML tables), then freezes it. The hook is not enumerable: JSON is unchanged.
 */
export function withSummary<T extends object>(value: T, summary: string): Readonly<T> {
  Object.defineProperty(value, INSPECT, { value: () => summary, enumerable: false });
  return Object.freeze(value);
}
