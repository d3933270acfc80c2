/**
 * Thin guide lines in one style (isentropes, isobars, quality lines), each labelled in plain
 * text. Internal to the chart builders.
 *
 * Safety: user strings (titles, series labels, state names) go into a spec only as DATA values or
 * as literal title text. Field names, expressions and formats are fixed strings written here, so
 * a label like `datum.x + alert(1)` or `<script>` can never be evaluated, only shown.
 */
import { positionEncoding, type AxisPlan } from "./axisPlan.js";
import type { LineRow } from "./curveRows.js";
import { LABEL_FRACTIONS } from "./labelPlacement.js";
import { lineTooltip } from "./seriesLayers.js";
import { INK } from "./theme.js";

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
