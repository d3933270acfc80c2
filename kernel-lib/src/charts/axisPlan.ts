/**
 * An axis of a chart: its quantity, display unit, title, scale and domain, and the positional
 * encoding and plotted coordinates that follow from it. Internal to the chart builders.
 */
import { InputError } from "../errors.js";
import {
  quantityTitle,
  resolveUnit,
  toDisplay,
  type DisplayUnit,
  type QuantityKind,
  type UnitChoice,
} from "./displayUnits.js";

/** Room, px, kept at each end of a log axis fitted to the data (half a marker and a stroke). */
export const LOG_PADDING = 7;

/** One axis: its quantity, display unit, title and scale type. */
export interface AxisPlan {
  readonly kind: QuantityKind;
  readonly unit: DisplayUnit;
  readonly title: string;
  readonly log: boolean;
  /** Fixed scale domain in display units; undefined lets Vega-Lite fit the data. */
  domain?: readonly [number, number];
}

/** Plans an axis: resolves the display unit and writes "Name / unit". */
export function planAxis(
  kind: QuantityKind,
  name: string,
  units: UnitChoice | undefined,
  log = false,
): AxisPlan {
  const unit = resolveUnit(kind, units);
  return { kind, unit, title: quantityTitle(name, unit), log };
}

/** Positional encoding for an axis (field "x", "y", "x2" or "y2" of the rows). */
export function positionEncoding(field: string, axis: AxisPlan): Record<string, unknown> {
  const scale: Record<string, unknown> = axis.log
    ? { type: "log", nice: false }
    : { type: "linear", zero: false };
  if (axis.domain) scale["domain"] = [axis.domain[0], axis.domain[1]];
  // A log scale is not made "nice", so its data would touch the frame: the critical-point
  // marker and the dome top were cut. LOG_PADDING px of room at each end (Vega's scale padding).
  else if (axis.log) scale["padding"] = LOG_PADDING;
  return { field, type: "quantitative", title: axis.title, scale };
}

/**
 * A coordinate in display units as written into a spec: 7 significant figures (a relative
 * 1e-7, far below a pixel), which keeps specs of dense curves and heat maps about half the size.
 */
export function plotValue(valueSI: number, unit: DisplayUnit): number {
  return Number(toDisplay(valueSI, unit).toPrecision(7));
}

/** Checks an optional [low, high] range option in SI and converts it to a display domain. */
export function rangeOption(
  input: string,
  range: readonly [number, number] | undefined,
  axis: AxisPlan,
  unitSI: string,
  scaleSI: (v: number) => number = (v) => v,
): void {
  if (range === undefined) return;
  const [lo, hi] = Array.isArray(range) ? range : [NaN, NaN];
  if (!(Number.isFinite(lo) && Number.isFinite(hi) && hi > lo && (!axis.log || lo > 0))) {
    throw new InputError({
      input,
      unit: unitSI,
      validRange: axis.log ? "[low, high] with 0 < low < high" : "[low, high] with high > low",
      received: range,
    });
  }
  axis.domain = [toDisplay(scaleSI(lo), axis.unit), toDisplay(scaleSI(hi), axis.unit)];
}
