/**
 * Options every chart builder takes and the option checks the builders share (internal to
 * the chart builders except {@link BaseChartOptions}).
 */
import { InputError } from "../errors.js";
import type { UnitChoice } from "./displayUnits.js";

/** Options every chart builder takes. */
export interface BaseChartOptions {
  /** Chart title (plain text). Default: a title naming the diagram. */
  title?: string;
  /** Subtitle under the title (plain text), e.g. the fluid and model. Default: none. */
  subtitle?: string;
  /** Plot width, CSS px. Default 520. */
  width?: number;
  /** Plot height, CSS px. Default 340. */
  height?: number;
  /**
   * Display units: "SI" (K, MPa, kmol/m3, kJ/mol, ...), "field" (degF, psia, lbmol/ft3,
   * Btu/lbmol, ...) or a system with overrides, e.g. `{ system: "SI", pressure: "bar" }`.
   * Default "SI". Data are always given in SI; only the axes change.
   */
  units?: UnitChoice;
}

/** Checks a plot dimension option. */
export function checkSize(input: string, value: number | undefined, fallback: number): number {
  const v = value ?? fallback;
  if (!(Number.isFinite(v) && v >= 40 && v <= 4000)) {
    throw new InputError({ input, unit: "px", validRange: "between 40 and 4000", received: v });
  }
  return v;
}

/** Checks a user label (titles, series names): any string, shown as plain text. */
export function checkText(input: string, value: unknown): string {
  if (typeof value !== "string") {
    throw new InputError({ input, unit: "-", validRange: "a string", received: value });
  }
  return value;
}

/** Checks that a list option is an array. */
export function checkArray<T>(input: string, value: readonly T[] | undefined): readonly T[] {
  if (value === undefined) return [];
  if (!Array.isArray(value)) {
    throw new InputError({ input, unit: "-", validRange: "an array", received: value });
  }
  return value;
}

/**
 * Checks that a list input is an array with at least one element; `validRange` says what it must
 * hold ("at least one isotherm"). The error carries the value as given.
 */
export function checkNonEmptyArray<T>(
  input: string,
  value: readonly T[] | undefined,
  validRange: string,
): readonly T[] {
  const list = checkArray(input, value);
  if (list.length === 0) {
    throw new InputError({ input, unit: "-", validRange, received: value });
  }
  return list;
}
