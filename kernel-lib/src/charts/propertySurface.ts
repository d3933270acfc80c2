/**
 * A property surface over temperature and pressure: a heat map of the property with labelled
 * isolines (d3-contour, see isolines.ts), the vapour-pressure curve and the critical point.
 * Pressure is logarithmic by default: surfaces are usually sampled over decades of pressure.
 */
import { ticks } from "d3-array";
import { InputError } from "../errors.js";
import { requireFinite, requirePositive } from "../validate.js";
import type { ChartSpec } from "./chartSpec.js";
import { fromDisplay, toDisplay, type QuantityKind } from "./displayUnits.js";
import { criticalLayers } from "./domeLayers.js";
import { gridIsolines } from "./isolines.js";
import { placeGuideLabels } from "./labelPlacement.js";
import {
  addDomeWarnings,
  checkCritical,
  checkSaturation,
  type ChartCriticalPoint,
  type ChartSaturationRow,
} from "./saturationInput.js";
import { planAxis, plotValue, positionEncoding, type AxisPlan } from "./axisPlan.js";
import { checkArray, checkText, type BaseChartOptions } from "./chartOptions.js";
import { curveRows } from "./curveRows.js";
import { shortNumber } from "./shortNumber.js";
import { topLevel } from "./topLevel.js";
import { WarningList } from "./warningList.js";
import { HEATMAP_SCHEME, INK } from "./theme.js";

/** Data of {@link propertySurfaceChart}: values[i][j] at temperaturesK[i], pressuresPa[j], SI. */
export interface PropertySurfaceData {
  /** Temperatures of the grid, K, ascending. */
  temperaturesK: readonly number[];
  /** Pressures of the grid, Pa, ascending. */
  pressuresPa: readonly number[];
  /** Property values, SI, values[iT][iP]; NaN where there is no single-phase value. */
  values: readonly (readonly number[])[];
  /** What the values are: a name (plain text) and a quantity kind for the unit. */
  quantity: { name: string; kind: QuantityKind };
  /** Vapour-pressure curve (T, P of each row). Default: none. */
  saturation?: readonly ChartSaturationRow[];
  /** Critical point to mark. Default: none. */
  critical?: ChartCriticalPoint;
  /** Notes of a sampled dome (saturationFromModel), copied into the chart's warnings. */
  domeWarnings?: readonly string[];
}

/** Options of {@link propertySurfaceChart}. */
export interface PropertySurfaceChartOptions extends BaseChartOptions {
  /** GridIsoline levels, SI; or a number of roughly evenly spaced "nice" levels. Default 8. */
  levels?: number | readonly number[];
  /** Logarithmic pressure axis. Default true. */
  logP?: boolean;
  /** Draw the heat map (false: isolines only). Default true. */
  heatmap?: boolean;
  /**
   * Most heat-map cells written into the spec; a finer grid is drawn with every k-th sample
   * (isolines always use the full grid). Keeps records small (about 70 bytes per cell). Default 8000 (about 90 x 90).
   */
  maxHeatmapCells?: number;
}

/**
 * Builds a property surface chart.
 * @example propertySurfaceChart({ temperaturesK, pressuresPa, values, quantity: { name: "Z", kind: "dimensionless" } })
 */
export function propertySurfaceChart(
  data: PropertySurfaceData,
  options: PropertySurfaceChartOptions = {},
): ChartSpec {
  const ts = checkAscending("temperaturesK", data.temperaturesK, "K");
  const ps = checkAscending("pressuresPa", data.pressuresPa, "Pa");
  if (!data.quantity || typeof data.quantity !== "object") {
    throw new InputError({
      input: "quantity",
      unit: "-",
      validRange: "{ name, kind }",
      received: data.quantity,
    });
  }
  const name = checkText("quantity.name", data.quantity.name);
  const values = checkArray("values", data.values);
  if (
    values.length !== ts.length ||
    values.some((col) => !Array.isArray(col) || col.length !== ps.length)
  ) {
    throw new InputError({
      input: "values",
      unit: "SI",
      validRange: `${ts.length} arrays (one per temperature) of ${ps.length} numbers`,
      received: `${values.length} arrays`,
    });
  }
  const saturation = checkSaturation(data.saturation);
  const critical = checkCritical(data.critical);
  const logP = options.logP ?? true;
  const warnings = new WarningList();
  addDomeWarnings(warnings, data.domeWarnings);
  const xAxis = planAxis("temperature", "Temperature T", options.units);
  const yAxis = planAxis("pressure", "Pressure P", options.units, logP);
  const vAxis = planAxis(data.quantity.kind, name, options.units);

  const finite: number[] = [];
  for (const col of values) for (const v of col) if (Number.isFinite(v)) finite.push(v);
  if (finite.length === 0) {
    throw new InputError({
      input: "values",
      unit: "SI",
      validRange: "at least one finite value",
      received: "no finite value",
    });
  }
  const levelsSI = chooseLevels(options.levels ?? 8, finite, vAxis);

  const layers: Record<string, unknown>[] = [];
  if (options.heatmap ?? true) {
    const maxCells = options.maxHeatmapCells ?? 8000;
    if (!(Number.isInteger(maxCells) && maxCells >= 4)) {
      throw new InputError({
        input: "maxHeatmapCells",
        unit: "-",
        validRange: "an integer >= 4",
        received: maxCells,
      });
    }
    const stride = Math.max(1, Math.ceil(Math.sqrt((ts.length * ps.length) / maxCells)));
    const iKeep = strided(ts.length, stride);
    const jKeep = strided(ps.length, stride);
    if (stride > 1) {
      warnings.add(
        `The heat map shows every ${stride}th grid sample (${iKeep.length} x ${jKeep.length} cells); isolines use the full grid. Raise maxHeatmapCells to draw all.`,
      );
    }
    const xEdges = edges(
      iKeep.map((i) => ts[i]),
      false,
    );
    const yEdges = edges(
      jKeep.map((j) => ps[j]),
      logP,
    );
    // The temperature axis spans exactly the cells (a "nice" linear domain would leave empty
    // strips beside the heat map).
    xAxis.domain = [
      plotValue(xEdges[0], xAxis.unit),
      plotValue(xEdges[xEdges.length - 1], xAxis.unit),
    ];
    const cells: Record<string, number>[] = [];
    let skipped = 0;
    for (let i = 0; i < iKeep.length; i++) {
      for (let j = 0; j < jKeep.length; j++) {
        const v = values[iKeep[i]][jKeep[j]];
        if (!Number.isFinite(v)) {
          skipped++;
          continue;
        }
        const shown = plotValue(v, vAxis.unit);
        cells.push({
          x: plotValue(xEdges[i], xAxis.unit),
          x2: plotValue(xEdges[i + 1], xAxis.unit),
          y: plotValue(yEdges[j], yAxis.unit),
          y2: plotValue(yEdges[j + 1], yAxis.unit),
          value: shown,
          shade: shown,
        });
      }
    }
    if (skipped > 0) warnings.add(`${skipped} grid cell(s) without a finite value are left blank.`);
    layers.push({
      data: { values: cells },
      // A hairline stroke in the cell's own colour hides the anti-aliasing seams between cells.
      mark: { type: "rect", strokeWidth: 0.6 },
      encoding: {
        x: positionEncoding("x", xAxis),
        x2: { field: "x2" },
        y: positionEncoding("y", yAxis),
        y2: { field: "y2" },
        color: {
          field: "value",
          type: "quantitative",
          title: vAxis.title,
          scale: { scheme: HEATMAP_SCHEME },
        },
        // The same value under its own field name: on the field "value" Vega-Lite would merge
        // fill and stroke into one legend, and `legend: null` would then remove the colour bar.
        stroke: {
          field: "shade",
          type: "quantitative",
          scale: { scheme: HEATMAP_SCHEME },
          legend: null,
        },
        tooltip: [{ field: "value", type: "quantitative", title: vAxis.title, format: ".5~g" }],
      },
    });
  }

  const isolines = gridIsolines({ xs: ts, ys: ps, values }, levelsSI, { logY: logP }).map(
    (iso) => ({
      level: iso.level,
      lines:
        saturation.length >= 2
          ? iso.lines.flatMap((l) => cutAtJump(l, saturation, ts, ps))
          : iso.lines,
    }),
  );
  const lineRows: Record<string, unknown>[] = [];
  const labelRows: Record<string, unknown>[] = [];
  isolines.forEach((iso, k) => {
    const label = shortNumber(toDisplay(iso.level, vAxis.unit));
    let longest: { x: number; y: number }[] = [];
    iso.lines.forEach((line, m) => {
      if (line.length > longest.length) longest = line;
      line.forEach((p, order) =>
        lineRows.push({
          x: plotValue(p.x, xAxis.unit),
          y: plotValue(p.y, yAxis.unit),
          level: label,
          path: `${k}:${m}`,
          order,
        }),
      );
    });
    if (longest.length >= 2) {
      const mid = longest[Math.floor(longest.length / 2)];
      labelRows.push({ x: toDisplay(mid.x, xAxis.unit), y: toDisplay(mid.y, yAxis.unit), label });
    }
  });
  if (lineRows.length > 0) {
    layers.push({
      data: { values: lineRows },
      mark: { type: "line", color: "#fdfaf0", strokeWidth: 1, opacity: 0.9, clip: true },
      encoding: {
        x: positionEncoding("x", xAxis),
        y: positionEncoding("y", yAxis),
        detail: { field: "path", type: "nominal" },
        order: { field: "order", type: "quantitative" },
        tooltip: [{ field: "level", type: "nominal", title: `GridIsoline (${vAxis.unit.symbol})` }],
      },
    });
    layers.push({
      data: { values: labelRows },
      mark: {
        type: "text",
        fontSize: 9.5,
        color: "#1d1c1a",
        stroke: "#fdfaf0",
        strokeWidth: 2.5,
        strokeOpacity: 0.85,
        clip: true,
      },
      encoding: {
        x: positionEncoding("x", xAxis),
        y: positionEncoding("y", yAxis),
        text: { field: "label", type: "nominal" },
      },
    });
    // Vega draws stroked text over its fill: repeat the labels without halo on top.
    layers.push({
      data: { values: labelRows },
      mark: { type: "text", fontSize: 9.5, color: "#1d1c1a", clip: true },
      encoding: {
        x: positionEncoding("x", xAxis),
        y: positionEncoding("y", yAxis),
        text: { field: "label", type: "nominal" },
      },
    });
  }
  // The vapour-pressure curve, within the grid's temperature range.
  const inGrid = saturation.filter(
    (r) => r.temperatureK >= ts[0] && r.temperatureK <= ts[ts.length - 1],
  );
  if (inGrid.length >= 2) {
    const rows = curveRows(
      [
        {
          label: "vapour pressure",
          points: inGrid.map((r) => ({ x: r.temperatureK, y: r.pressurePa })),
        },
      ],
      xAxis,
      yAxis,
      warnings,
      "psat",
    );
    layers.push({
      data: { values: rows },
      mark: { type: "line", color: INK.dome, strokeWidth: 2.4, clip: true },
      encoding: {
        x: positionEncoding("x", xAxis),
        y: positionEncoding("y", yAxis),
        order: { field: "order", type: "quantitative" },
        detail: { field: "path", type: "nominal" },
        tooltip: [{ field: "series", type: "nominal", title: "Curve" }],
      },
    });
  }
  layers.push(
    ...criticalLayers(critical, critical?.temperatureK, critical?.pressurePa, xAxis, yAxis),
  );
  const spec = topLevel("property-surface", name, options, [xAxis, yAxis, vAxis], warnings, {
    layer: layers,
  });
  // the critical-point label: a slot around its point inside the plot, clear of the curves
  placeGuideLabels(spec);
  return spec;
}

/** Cell edges around sample positions: midpoints (in log space when log), half a step outside. */
function edges(samples: readonly number[], log: boolean): number[] {
  const v = log ? samples.map(Math.log) : [...samples];
  const n = v.length;
  const out: number[] = [];
  if (n === 1)
    return log ? [samples[0] / 1.05, samples[0] * 1.05] : [samples[0] - 0.5, samples[0] + 0.5];
  out.push(v[0] - (v[1] - v[0]) / 2);
  for (let i = 1; i < n; i++) out.push((v[i - 1] + v[i]) / 2);
  out.push(v[n - 1] + (v[n - 1] - v[n - 2]) / 2);
  return log ? out.map(Math.exp) : out;
}

function checkAscending(input: string, list: readonly number[], unit: string): readonly number[] {
  const values = checkArray(input, list);
  if (values.length < 2) {
    throw new InputError({ input, unit, validRange: "at least 2 values", received: values.length });
  }
  values.forEach((v, i) => {
    requirePositive(`${input}[${i}]`, v, unit);
    if (i > 0 && !(v > values[i - 1])) {
      throw new InputError({
        input: `${input}[${i}]`,
        unit,
        validRange: `ascending (> ${values[i - 1]})`,
        received: v,
      });
    }
  });
  return values;
}

/** GridIsoline levels, SI: explicit, or "nice" round numbers in the display unit. */
function chooseLevels(
  levels: number | readonly number[],
  finite: readonly number[],
  axis: AxisPlan,
): number[] {
  if (typeof levels === "number") {
    if (!(Number.isInteger(levels) && levels >= 1 && levels <= 60)) {
      throw new InputError({
        input: "levels",
        unit: "-",
        validRange: "an integer from 1 to 60, or an array of levels",
        received: levels,
      });
    }
    let lo = Infinity;
    let hi = -Infinity;
    for (const v of finite) {
      const d = toDisplay(v, axis.unit);
      if (d < lo) lo = d;
      if (d > hi) hi = d;
    }
    if (!(hi > lo)) return [fromDisplay(lo, axis.unit)];
    return ticks(lo, hi, levels)
      .filter((t) => t > lo && t < hi)
      .map((t) => fromDisplay(t, axis.unit));
  }
  return checkArray("levels", levels).map((v, i) => requireFinite(`levels[${i}]`, v, "SI"));
}

/**
 * A property jumps across the vapour-pressure curve (liquid on one side, vapour on the other), and
 * marching squares then lays every level between the two values along the curve, cell by cell.
 * Those stretches say nothing: the parts of an isoline within one grid cell of the curve are cut.
 */
function cutAtJump(
  line: readonly { x: number; y: number }[],
  saturation: readonly ChartSaturationRow[],
  ts: readonly number[],
  ps: readonly number[],
): { x: number; y: number }[][] {
  const sat = saturation.map((r) => ({ t: r.temperatureK, lnp: Math.log(r.pressurePa) }));
  const dT = (ts[ts.length - 1] - ts[0]) / (ts.length - 1);
  const dLnP = (Math.log(ps[ps.length - 1]) - Math.log(ps[0])) / (ps.length - 1);
  const lnPsat = (t: number): number | undefined => {
    if (t < sat[0].t || t > sat[sat.length - 1].t) return undefined;
    let k = 1;
    while (k < sat.length - 1 && sat[k].t < t) k++;
    const f = (t - sat[k - 1].t) / (sat[k].t - sat[k - 1].t);
    return sat[k - 1].lnp + f * (sat[k].lnp - sat[k - 1].lnp);
  };
  const tSat = (lnp: number): number | undefined => {
    if (lnp < sat[0].lnp || lnp > sat[sat.length - 1].lnp) return undefined;
    let k = 1;
    while (k < sat.length - 1 && sat[k].lnp < lnp) k++;
    const f = (lnp - sat[k - 1].lnp) / (sat[k].lnp - sat[k - 1].lnp);
    return sat[k - 1].t + f * (sat[k].t - sat[k - 1].t);
  };
  const near = (p: { x: number; y: number }) => {
    const lnp = Math.log(p.y);
    const a = lnPsat(p.x);
    const b = tSat(lnp);
    return (
      (a !== undefined && Math.abs(lnp - a) < dLnP) || (b !== undefined && Math.abs(p.x - b) < dT)
    );
  };
  const out: { x: number; y: number }[][] = [];
  let current: { x: number; y: number }[] = [];
  for (const p of line) {
    if (near(p)) {
      if (current.length >= 2) out.push(current);
      current = [];
    } else current.push(p);
  }
  if (current.length >= 2) out.push(current);
  return out;
}

/** Indices 0, k, 2k, ... and always the last one. */
function strided(n: number, k: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < n; i += k) out.push(i);
  if (out[out.length - 1] !== n - 1) out.push(n - 1);
  return out;
}
