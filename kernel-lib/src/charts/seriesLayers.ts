/**
 * Labelled line series: colour and dash per series with one merged legend, the tooltip, and
 * families of curves at one constant value each (isotherms, isobars). Internal to the chart
 * builders.
 *
 * Safety: user strings (titles, series labels, state names) go into a spec only as DATA values or
 * as literal title text. Field names, expressions and formats are fixed strings written here, so
 * a label like `datum.x + alert(1)` or `<script>` can never be evaluated, only shown.
 */
import { requirePositive } from "../validate.js";
import { positionEncoding, type AxisPlan } from "./axisPlan.js";
import { checkArray } from "./chartOptions.js";
import { curveRows, type ChartXY, type LineRow } from "./curveRows.js";
import { toDisplay, withUnit, type DisplayUnit } from "./displayUnits.js";
import { shortNumber } from "./shortNumber.js";
import { SERIES_COLORS, SERIES_DASHES } from "./theme.js";
import type { WarningList } from "./warningList.js";

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
    return c.label ?? withUnit(shortNumber(toDisplay(c[key], displayUnit)), displayUnit);
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
