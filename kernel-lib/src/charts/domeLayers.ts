/**
 * Layers for the fixed elements of a diagram (internal): the two-phase region with its boundary
 * (the saturation "dome"), the critical point, and lines of constant quality drawn by the lever
 * rule between the saturated liquid and vapour of each saturation row.
 */
import { toDisplay } from "./displayUnits.js";
import type { EnergyBasis } from "./energyBasis.js";
import type { ChartCriticalPoint, ChartSaturationRow } from "./saturationInput.js";
import type { ChartMixtureDome, ChartMixtureDomePoint } from "./mixtureDomeInput.js";
import { plotValue, positionEncoding, type AxisPlan } from "./axisPlan.js";
import { curveRows } from "./curveRows.js";
import { shortNumber } from "./shortNumber.js";
import { WarningList } from "./warningList.js";
import { INK } from "./theme.js";
import { pointLabelLayers } from "./pointLabels.js";

/** How to read a diagram coordinate of a saturated phase (SI); undefined when missing. */
export type PhaseCoordinate = (
  row: ChartSaturationRow,
  phase: "liquid" | "vapor",
) => number | undefined;

/**
 * The dome: a filled two-phase band (horizontal area between liquid and vapour at each saturation
 * ordinate) and its boundary line, liquid branch up to the critical point and vapour branch back.
 * `x` gives the abscissa of a phase; `y` the ordinate of a row (pressure or temperature).
 */
export function domeLayers(
  rows: readonly ChartSaturationRow[],
  critical: { x?: number; y: number } | undefined,
  x: PhaseCoordinate,
  y: (row: ChartSaturationRow) => number,
  xAxis: AxisPlan,
  yAxis: AxisPlan,
  warnings: WarningList,
): Record<string, unknown>[] {
  const usable = rows.filter((r) => x(r, "liquid") !== undefined && x(r, "vapor") !== undefined);
  if (usable.length < 2) return [];
  const fillValues: Record<string, number>[] = [];
  for (const r of usable) {
    const xl = x(r, "liquid") as number;
    const xv = x(r, "vapor") as number;
    const yy = y(r);
    const ok =
      [xl, xv, yy].every(Number.isFinite) &&
      (!xAxis.log || (xl > 0 && xv > 0)) &&
      (!yAxis.log || yy > 0);
    if (!ok) continue;
    fillValues.push({
      x: plotValue(xl, xAxis.unit),
      x2: plotValue(xv, xAxis.unit),
      y: plotValue(yy, yAxis.unit),
    });
  }
  const boundary = [
    ...usable.map((r) => ({ x: x(r, "liquid") as number, y: y(r) })),
    ...(critical && critical.x !== undefined ? [{ x: critical.x, y: critical.y }] : []),
    ...[...usable].reverse().map((r) => ({ x: x(r, "vapor") as number, y: y(r) })),
  ];
  const lineRows = curveRows(
    [{ label: "saturation boundary", points: boundary }],
    xAxis,
    yAxis,
    warnings,
    "dome",
  );
  return [
    {
      data: { values: fillValues },
      mark: {
        type: "area",
        orient: "horizontal",
        color: INK.twoPhaseFill,
        opacity: 0.85,
        clip: true,
      },
      encoding: {
        y: positionEncoding("y", yAxis),
        x: positionEncoding("x", xAxis),
        x2: { field: "x2" },
      },
    },
    {
      data: { values: lineRows },
      mark: { type: "line", color: INK.dome, strokeWidth: 2.2, clip: true },
      encoding: {
        x: positionEncoding("x", xAxis),
        y: positionEncoding("y", yAxis),
        order: { field: "order", type: "quantitative" },
        detail: { field: "path", type: "nominal" },
      },
    },
  ];
}

/** Share of each fixed axis span kept clear at its ends for a label (text beside a point). */
const LABEL_MARGIN = 0.04;

/**
 * Is a point (display units) inside the fixed axis ranges, LABEL_MARGIN of the span clear of each
 * end (in log space on a log axis)? Axes without a fixed range accept every value.
 */
export function insidePlot(
  xAxis: AxisPlan,
  yAxis: AxisPlan,
  margin = LABEL_MARGIN,
): (x: number, y: number) => boolean {
  const within = (axis: AxisPlan, v: number): boolean => {
    if (!axis.domain) return true;
    const f = axis.log ? Math.log : (u: number) => u;
    const lo = f(Math.min(axis.domain[0], axis.domain[1]));
    const hi = f(Math.max(axis.domain[0], axis.domain[1]));
    const pad = margin * (hi - lo);
    const t = f(v);
    return t >= lo + pad && t <= hi - pad;
  };
  return (x, y) => within(xAxis, x) && within(yAxis, y);
}

/** Lines of constant vapour quality q (mole fraction vapour), by the lever rule, x = xl + q (xv - xl). */
export function qualityLayers(
  rows: readonly ChartSaturationRow[],
  qualities: readonly number[],
  x: PhaseCoordinate,
  y: (row: ChartSaturationRow) => number,
  xAxis: AxisPlan,
  yAxis: AxisPlan,
  warnings: WarningList,
): Record<string, unknown>[] {
  const usable = rows.filter((r) => x(r, "liquid") !== undefined && x(r, "vapor") !== undefined);
  if (usable.length < 2 || qualities.length === 0) return [];
  const curves = qualities.map((q) => ({
    label: `q = ${shortNumber(q)}`,
    points: usable.map((r) => {
      const xl = x(r, "liquid") as number;
      const xv = x(r, "vapor") as number;
      return { x: xl + q * (xv - xl), y: y(r) };
    }),
  }));
  const rowsOut = curveRows(curves, xAxis, yAxis, warnings, "quality");
  // Label each quality line at its lowest visible point (rows run from the lowest saturation T):
  // a fixed axis range that starts above the dome's foot would otherwise clip the label.
  const inside = insidePlot(xAxis, yAxis);
  const labels = curves
    .map((c) => {
      const first = rowsOut.find((r) => r.series === c.label && inside(r.x, r.y));
      return first ? { x: first.x, y: first.y, label: c.label } : undefined;
    })
    .filter((v) => v !== undefined);
  return [
    {
      data: { values: rowsOut },
      mark: { type: "line", color: INK.guide, strokeWidth: 0.9, strokeDash: [1, 2.5], clip: true },
      encoding: {
        x: positionEncoding("x", xAxis),
        y: positionEncoding("y", yAxis),
        order: { field: "order", type: "quantitative" },
        detail: { field: "path", type: "nominal" },
      },
    },
    // Under the line's foot; above it, beside the line, where the foot is the plot's bottom.
    ...pointLabelLayers(
      labels,
      { x: positionEncoding("x", xAxis), y: positionEncoding("y", yAxis) },
      "label",
      { color: INK.guide, fontSize: 9, clip: true },
      "quality",
      QUALITY_LABEL_SLOTS,
    ),
  ];
}

/** Candidate places of a quality-line label around the line's lowest visible point. */
const QUALITY_LABEL_SLOTS = [
  { align: "center", dx: 0, dy: 9 },
  { align: "left", dx: 3, dy: -9 },
  { align: "right", dx: -3, dy: -9 },
] as const;

/** The critical point: an open diamond and a small plain-text label. */
export function criticalLayers(
  point: ChartCriticalPoint | undefined,
  xSI: number | undefined,
  ySI: number | undefined,
  xAxis: AxisPlan,
  yAxis: AxisPlan,
): Record<string, unknown>[] {
  if (!point || xSI === undefined || ySI === undefined) return [];
  if (!Number.isFinite(xSI) || !Number.isFinite(ySI)) return [];
  if ((xAxis.log && !(xSI > 0)) || (yAxis.log && !(ySI > 0))) return [];
  const values = [
    {
      x: toDisplay(xSI, xAxis.unit),
      y: toDisplay(ySI, yAxis.unit),
      label: "critical point",
      labelRole: "fixed",
    },
  ];
  const encoding = { x: positionEncoding("x", xAxis), y: positionEncoding("y", yAxis) };
  return [
    {
      data: { values },
      mark: {
        type: "point",
        shape: "diamond",
        filled: false,
        size: 90,
        strokeWidth: 1.8,
        color: INK.critical,
        clip: true,
      },
      encoding: {
        ...encoding,
        tooltip: [
          { field: "label", type: "nominal", title: "Point" },
          { field: "x", type: "quantitative", title: xAxis.title, format: ".5~g" },
          { field: "y", type: "quantitative", title: yAxis.title, format: ".5~g" },
        ],
      },
    },
    // The label moves around the marker, off the critical isotherm and the dome.
    ...pointLabelLayers(
      values,
      encoding,
      "label",
      { color: INK.critical, fontSize: 10 },
      "critical",
    ),
  ];
}

/**
 * The fixed elements of an energy diagram (P-h, T-s): the abscissa is a saturated phase's (or the
 * critical point's) enthalpy or entropy on the chosen basis, the ordinate a row's pressure or
 * temperature. `dome` (two-phase region and quality lines) goes under the property lines,
 * `critical` (the critical-point mark) on top of them.
 */
export function energyDomeLayers(
  saturation: readonly ChartSaturationRow[],
  critical: ChartCriticalPoint | undefined,
  qualities: readonly number[],
  abscissa: "enthalpyJPerMol" | "entropyJPerMolK",
  ordinate: "pressurePa" | "temperatureK",
  basis: EnergyBasis,
  xAxis: AxisPlan,
  yAxis: AxisPlan,
  warnings: WarningList,
): { dome: Record<string, unknown>[]; critical: Record<string, unknown>[] } {
  const xOf: PhaseCoordinate = (r, phase) => {
    const v = r[phase][abscissa];
    return v === undefined ? undefined : basis.perBasis(v);
  };
  const yOf = (r: ChartSaturationRow) => r[ordinate];
  const criticalX =
    critical?.[abscissa] !== undefined ? basis.perBasis(critical[abscissa]) : undefined;
  return {
    dome: [
      ...domeLayers(
        saturation,
        critical && criticalX !== undefined ? { x: criticalX, y: critical[ordinate] } : undefined,
        xOf,
        yOf,
        xAxis,
        yAxis,
        warnings,
      ),
      ...qualityLayers(saturation, qualities, xOf, yOf, xAxis, yAxis, warnings),
    ],
    critical: criticalLayers(critical, criticalX, critical?.[ordinate], xAxis, yAxis),
  };
}

/**
 * The dome of a mixture on an energy diagram (P-h, T-s): the envelope's boundary with the feed's
 * h or s at each point (bubble line: the saturated liquid at z; dew line: the saturated vapour at
 * z), joined at the critical point where the line changes kind; filled when the envelope closes;
 * lines of constant vapour fraction from the feed's overall h or s (not the lever rule, which
 * does not hold for a mixture: bubble and dew points at one pressure have different T).
 */
export function mixtureEnergyDomeLayers(
  dome: ChartMixtureDome,
  abscissa: "enthalpyJPerMol" | "entropyJPerMolK",
  ordinate: "pressurePa" | "temperatureK",
  basis: EnergyBasis,
  xAxis: AxisPlan,
  yAxis: AxisPlan,
  warnings: WarningList,
): { dome: Record<string, unknown>[]; critical: Record<string, unknown>[] } {
  const xy = (p: ChartMixtureDomePoint) => {
    const v = p[abscissa];
    return { x: v === undefined ? NaN : basis.perBasis(v), y: p[ordinate] };
  };
  const critical = dome.critical;
  const criticalXY =
    critical && critical[abscissa] !== undefined
      ? xy(critical as ChartMixtureDomePoint)
      : undefined;
  // runs of one kind within one segment; the critical point closes one run and opens the next
  const runs: { label: string; points: { x: number; y: number }[] }[] = [];
  const outline: { x: number; y: number }[] = [];
  const pts = dome.boundary;
  pts.forEach((p, k) => {
    const prev = k > 0 ? pts[k - 1] : undefined;
    const label = p.kind === "bubble" ? "bubble line" : "dew line";
    if (prev === undefined || prev.segment !== p.segment || prev.kind !== p.kind) {
      const joined = prev !== undefined && prev.segment === p.segment ? criticalXY : undefined;
      if (joined) {
        runs[runs.length - 1].points.push(joined);
        outline.push(joined);
      }
      runs.push({ label, points: joined ? [joined] : [] });
    }
    const q = xy(p);
    runs[runs.length - 1].points.push(q);
    outline.push(q);
  });
  const lineRows = curveRows(runs, xAxis, yAxis, warnings, "mixture-dome");
  const layers: Record<string, unknown>[] = [];
  if (dome.complete && outline.length >= 3) {
    const fillRows = curveRows(
      [{ label: "two-phase region", points: outline }],
      xAxis,
      yAxis,
      new WarningList(), // the fill repeats the boundary's points: their notes are given once
      "mixture-fill",
    );
    layers.push({
      data: { values: fillRows },
      mark: {
        type: "line",
        fill: INK.twoPhaseFill,
        fillOpacity: 0.85,
        strokeWidth: 0,
        clip: true,
      },
      encoding: {
        x: positionEncoding("x", xAxis),
        y: positionEncoding("y", yAxis),
        order: { field: "order", type: "quantitative" },
        detail: { field: "path", type: "nominal" },
      },
    });
  } else if (!dome.complete) {
    warnings.add(
      "The mixture's boundary is not closed (the envelope stopped, or points were left out): it is drawn as far as it goes, without the two-phase fill.",
    );
  }
  layers.push({
    data: { values: lineRows },
    mark: { type: "line", color: INK.dome, strokeWidth: 2.2, clip: true },
    encoding: {
      x: positionEncoding("x", xAxis),
      y: positionEncoding("y", yAxis),
      order: { field: "order", type: "quantitative" },
      detail: { field: "path", type: "nominal" },
      tooltip: [{ field: "series", type: "nominal", title: "Line" }],
    },
  });
  const lines = (dome.qualityLines ?? []).map((l) => ({
    label: `vapour fraction ${shortNumber(l.vaporFraction)}`,
    points: l.points.map(xy),
  }));
  if (lines.length > 0) {
    const rowsOut = curveRows(lines, xAxis, yAxis, warnings, "mixture-quality");
    // each label at the line's lowest drawn point inside the axis ranges (a line of beta that
    // began as 1 - beta starts at the critical point, where the labels would pile up)
    const inside = (v: number, d: readonly [number, number] | undefined) =>
      d === undefined || (v >= Math.min(d[0], d[1]) && v <= Math.max(d[0], d[1]));
    const labels = lines
      .map((c) => {
        const first = rowsOut
          .filter(
            (r) => r.series === c.label && inside(r.x, xAxis.domain) && inside(r.y, yAxis.domain),
          )
          .reduce<(typeof rowsOut)[number] | undefined>(
            (best, r) => (best === undefined || r.y < best.y ? r : best),
            undefined,
          );
        return first
          ? { x: first.x, y: first.y, label: `β = ${c.label.split(" ").pop()}` }
          : undefined;
      })
      .filter((v) => v !== undefined);
    layers.push(
      {
        data: { values: rowsOut },
        mark: {
          type: "line",
          color: INK.guide,
          strokeWidth: 0.9,
          strokeDash: [1, 2.5],
          clip: true,
        },
        encoding: {
          x: positionEncoding("x", xAxis),
          y: positionEncoding("y", yAxis),
          order: { field: "order", type: "quantitative" },
          detail: { field: "path", type: "nominal" },
        },
      },
      // under the line's lowest point, or above it beside the line at the plot's bottom
      ...pointLabelLayers(
        labels,
        { x: positionEncoding("x", xAxis), y: positionEncoding("y", yAxis) },
        "label",
        { color: INK.guide, fontSize: 9, clip: true },
        "mixture-quality",
        QUALITY_LABEL_SLOTS,
      ),
    );
  }
  for (const note of dome.notes ?? []) warnings.add(String(note));
  return {
    dome: layers,
    critical: criticalLayers(critical, criticalXY?.x, criticalXY?.y, xAxis, yAxis),
  };
}
