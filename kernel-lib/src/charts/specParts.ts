/**
 * Building blocks shared by the chart builders (internal): options common to every chart, axis
 * descriptions, conversion of SI curves into data rows, series encodings and the top-level spec.
 *
 * Safety: user strings (titles, series labels, state names) go into a spec only as DATA values or
 * as literal title text. Field names, expressions and formats are fixed strings written here, so
 * a label like `datum.x + alert(1)` or `<script>` can never be evaluated, only shown.
 */
import { InputError } from "../errors.js";
import { requirePositive } from "../validate.js";
import type { ChartMeta, ChartSpec } from "./chartSpec.js";
import {
  quantityTitle,
  resolveUnit,
  toDisplay,
  type DisplayUnit,
  type QuantityKind,
  type UnitChoice,
} from "./displayUnits.js";
import { LABEL_FRACTIONS } from "./labelPlacement.js";
import { applyLogTicks } from "./logTicks.js";
import {
  INK,
  DEFAULT_HEIGHT,
  DEFAULT_WIDTH,
  SERIES_COLORS,
  SERIES_DASHES,
  themeConfig,
} from "./theme.js";

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

export const VEGA_LITE_SCHEMA = "https://vega.github.io/schema/vega-lite/v6.json";

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

/** Collects de-duplicated warnings while a spec is built. */
export class WarningList {
  private readonly seen = new Set<string>();
  add(message: string): void {
    this.seen.add(message);
  }
  list(): string[] {
    return [...this.seen];
  }
}

/** A point of a curve, SI. */
export interface ChartXY {
  readonly x: number;
  readonly y: number;
}

/** A data row of a line layer (display units). */
export interface LineRow {
  x: number;
  y: number;
  /** Series label (user text or built from a number); shown in the legend and tooltip. */
  series: string;
  /** Line identity: series index and segment, so gaps split a line. */
  path: string;
  /** Drawing order along the line. */
  order: number;
  [extra: string]: unknown;
}

/**
 * Converts curves (SI points) to line rows in display units. Points that cannot be drawn
 * (non-finite, or <= 0 on a logarithmic axis) are left out, split the line there, and are reported
 * once per curve in `warnings`.
 */
export function curveRows(
  curves: readonly { label: string; points: readonly ChartXY[] }[],
  xAxis: AxisPlan,
  yAxis: AxisPlan,
  warnings: WarningList,
  pathPrefix = "",
): LineRow[] {
  const rows: LineRow[] = [];
  curves.forEach((curve, s) => {
    let segment = 0;
    let open = false;
    let dropped = 0;
    curve.points.forEach((p) => {
      const ok =
        Number.isFinite(p.x) &&
        Number.isFinite(p.y) &&
        (!xAxis.log || p.x > 0) &&
        (!yAxis.log || p.y > 0);
      if (!ok) {
        dropped++;
        if (open) segment++;
        open = false;
        return;
      }
      open = true;
      rows.push({
        x: plotValue(p.x, xAxis.unit),
        y: plotValue(p.y, yAxis.unit),
        series: curve.label,
        path: `${pathPrefix}${s}:${segment}`,
        order: rows.length,
      });
    });
    if (dropped > 0) {
      warnings.add(
        `${dropped} point(s) of the curve "${curve.label}" were left out: not finite, or not > 0 ` +
          "on a logarithmic axis. Check the data or use a linear axis.",
      );
    }
  });
  return rows;
}

/** Positional encoding for an axis (field "x", "y", "x2" or "y2" of the rows). */
export function positionEncoding(field: string, axis: AxisPlan): Record<string, unknown> {
  const scale: Record<string, unknown> = axis.log
    ? { type: "log", nice: false }
    : { type: "linear", zero: false };
  if (axis.domain) scale["domain"] = [axis.domain[0], axis.domain[1]];
  return { field, type: "quantitative", title: axis.title, scale };
}

/** Colour plus dash encodings for series labels, in the order given (one merged legend). */
export function seriesEncodings(
  labels: readonly string[],
  legendTitle: string,
): Record<string, unknown> {
  const domain = [...labels];
  const colors = domain.map((_, i) => SERIES_COLORS[i % SERIES_COLORS.length]);
  const dashes = domain.map((_, i) =>
    SERIES_DASHES[(i + Math.floor(i / SERIES_COLORS.length)) % SERIES_DASHES.length].slice(),
  );
  return {
    color: {
      field: "series",
      type: "nominal",
      title: legendTitle,
      scale: { domain, range: colors },
    },
    strokeDash: {
      field: "series",
      type: "nominal",
      title: legendTitle,
      scale: { domain, range: dashes },
    },
  };
}

/** Tooltip listing the series and both coordinates with their axis titles. */
export function lineTooltip(xAxis: AxisPlan, yAxis: AxisPlan, seriesTitle: string): unknown[] {
  return [
    { field: "series", type: "nominal", title: seriesTitle },
    { field: "x", type: "quantitative", title: xAxis.title, format: ".4~g" },
    { field: "y", type: "quantitative", title: yAxis.title, format: ".4~g" },
  ];
}

/**
 * A coordinate in display units as written into a spec: 7 significant figures (a relative
 * 1e-7, far below a pixel), which keeps specs of dense curves and heat maps about half the size.
 */
export function plotValue(valueSI: number, unit: DisplayUnit): number {
  return Number(toDisplay(valueSI, unit).toPrecision(7));
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

/** Formats a number for a label, 4 significant figures, no trailing zeros. */
export function shortNumber(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  return String(Number(value.toPrecision(4)));
}

/** The top level of every spec: schema, title, size, theme and builder metadata. */
export function topLevel(
  chart: string,
  defaultTitle: string,
  options: BaseChartOptions,
  axes: readonly AxisPlan[],
  warnings: WarningList,
  body: Record<string, unknown>,
  extraMeta: { molarMassKgPerMol?: number } = {},
  sized = true,
): ChartSpec {
  const title: Record<string, unknown> = {
    text: options.title === undefined ? defaultTitle : checkText("title", options.title),
  };
  if (options.subtitle !== undefined) title["subtitle"] = checkText("subtitle", options.subtitle);
  const units: Record<string, string> = {};
  for (const axis of axes) units[axis.kind] = axis.unit.id;
  const meta: ChartMeta = {
    chart,
    units,
    ...(extraMeta.molarMassKgPerMol !== undefined
      ? { molarMassKgPerMol: extraMeta.molarMassKgPerMol }
      : {}),
    warnings: warnings.list(),
  };
  applyLogTicks(body);
  const spec: ChartSpec = {
    $schema: VEGA_LITE_SCHEMA,
    title: title as ChartSpec["title"],
    ...(sized
      ? {
          width: checkSize("width", options.width, DEFAULT_WIDTH),
          height: checkSize("height", options.height, DEFAULT_HEIGHT),
        }
      : {}),
    ...body,
    config: themeConfig(),
    usermeta: { isochor: meta },
  };
  return spec;
}

/** A line layer of labelled series (colour and dash per series, merged legend, tooltip). */
export function seriesLineLayer(
  rows: readonly LineRow[],
  labels: readonly string[],
  legendTitle: string,
  xAxis: AxisPlan,
  yAxis: AxisPlan,
): Record<string, unknown> {
  return {
    data: { values: rows },
    mark: { type: "line", clip: true },
    encoding: {
      x: positionEncoding("x", xAxis),
      y: positionEncoding("y", yAxis),
      ...seriesEncodings(labels, legendTitle),
      order: { field: "order", type: "quantitative" },
      detail: { field: "path", type: "nominal" },
      tooltip: lineTooltip(xAxis, yAxis, legendTitle),
    },
  };
}

/**
 * Legend labels of curves that each sit at one constant value (isotherms, isobars): the curve's own
 * label, else the value in its display unit ("350 K"). Each value must be finite and > 0; an error
 * names it as `<input>[i].<key>` in `unitSI`.
 */
export function seriesLabels<K extends string>(
  input: string,
  curves: readonly ({ label?: string } & Record<K, number>)[],
  key: K,
  unitSI: string,
  displayUnit: DisplayUnit,
): string[] {
  return curves.map((c, i) => {
    requirePositive(`${input}[${i}].${key}`, c[key], unitSI);
    return c.label ?? `${shortNumber(toDisplay(c[key], displayUnit))} ${displayUnit.symbol}`;
  });
}

/**
 * Curves at one constant value each (isotherms, isobars) as one labelled series layer
 * ({@link seriesLabels}, {@link curveRows}, {@link seriesLineLayer}); no layer when nothing can be
 * drawn. `toXY` maps a point (SI) to the diagram's coordinates (SI, on the diagram's basis).
 */
export function constantValueSeriesLayers<K extends string, P>(
  family: {
    input: string;
    curves: readonly ({ label?: string; points: readonly P[] } & Record<K, number>)[];
    key: K;
    unitSI: string;
    displayUnit: DisplayUnit;
    toXY: (p: P) => ChartXY;
    legendTitle: string;
  },
  xAxis: AxisPlan,
  yAxis: AxisPlan,
  warnings: WarningList,
): Record<string, unknown>[] {
  const { input, curves, toXY } = family;
  const labels = seriesLabels(input, curves, family.key, family.unitSI, family.displayUnit);
  const rows = curveRows(
    curves.map((c, i) => ({
      label: labels[i],
      points: checkArray(`${input}[${i}].points`, c.points).map(toXY),
    })),
    xAxis,
    yAxis,
    warnings,
  );
  return rows.length > 0 ? [seriesLineLayer(rows, labels, family.legendTitle, xAxis, yAxis)] : [];
}

/**
 * A family of thin guide lines in one style (isentropes, isobars, quality lines), each labelled in
 * plain text at its last drawn point.
 */
export function guideLineLayers(
  rows: readonly LineRow[],
  xAxis: AxisPlan,
  yAxis: AxisPlan,
  style: { color: string; strokeDash: number[]; strokeWidth?: number; tooltipTitle: string },
): Record<string, unknown>[] {
  if (rows.length === 0) return [];
  // Label each line inside its drawn length (the ends are often clipped).
  const bySeries = new Map<string, LineRow[]>();
  for (const r of rows) {
    const list = bySeries.get(r.series) ?? [];
    list.push(r);
    bySeries.set(r.series, list);
  }
  // Candidate label positions along each line; neighbouring lines start at different heights
  // (60, 72, 84 % of the line). placeGuideLabels picks the first free one once the chart is built.
  const labels = [...bySeries.values()].map((list, k) => {
    const shift = k % 3;
    const fractions = [...LABEL_FRACTIONS.slice(shift), ...LABEL_FRACTIONS.slice(0, shift)];
    const along = fractions.map((f) => {
      const r = list[Math.floor(f * (list.length - 1))];
      return [r.x, r.y];
    });
    return { x: along[0][0], y: along[0][1], label: list[0].series, labelRole: "guide", along };
  });
  const labelMark = { type: "text", fontSize: 9, align: "left", dx: 3, dy: -4, clip: true };
  const labelEncoding = {
    x: positionEncoding("x", xAxis),
    y: positionEncoding("y", yAxis),
    text: { field: "label", type: "nominal" },
  };
  return [
    {
      data: { values: rows },
      mark: {
        type: "line",
        color: style.color,
        strokeDash: style.strokeDash,
        strokeWidth: style.strokeWidth ?? 1,
        clip: true,
      },
      encoding: {
        x: positionEncoding("x", xAxis),
        y: positionEncoding("y", yAxis),
        order: { field: "order", type: "quantitative" },
        detail: { field: "path", type: "nominal" },
        tooltip: lineTooltip(xAxis, yAxis, style.tooltipTitle),
      },
    },
    // A paper-coloured halo under each label keeps it legible where it crosses other lines
    // (Vega strokes text over its fill, so the halo is a layer of its own, drawn first).
    {
      data: { values: labels.map((l) => ({ ...l, labelRole: "guide-halo" })) },
      mark: {
        ...labelMark,
        color: INK.paper,
        stroke: INK.paper,
        strokeWidth: 3,
        strokeOpacity: 0.9,
      },
      encoding: labelEncoding,
    },
    {
      data: { values: labels },
      mark: { ...labelMark, color: style.color },
      encoding: labelEncoding,
    },
  ];
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
