/**
 * Curves given as SI points turned into the data rows of a line layer, in display units.
 * Internal to the chart builders.
 *
 * Safety: user strings (titles, series labels, state names) go into a spec only as DATA values or
 * as literal title text. Field names, expressions and formats are fixed strings written here, so
 * a label like `datum.x + alert(1)` or `<script>` can never be evaluated, only shown.
 */
import { plotValue, type AxisPlan } from "./axisPlan.js";
import type { WarningList } from "./warningList.js";

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
