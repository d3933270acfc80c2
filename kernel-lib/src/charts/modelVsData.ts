/**
 * Model against data: model curves and measured points on one panel, the deviations of the data
 * from the model on a residual panel below, sharing the abscissa. Deviations are relative,
 * 100 (data - model) / model in %, or absolute in the property's unit. The model value at a data
 * point is the one given with the point, or linear interpolation along the model curve.
 */
import { InputError } from "../errors.js";
import { requireChoice } from "../validate.js";
import type { ChartSpec } from "./chartSpec.js";
import { toDisplay, type QuantityKind } from "./displayUnits.js";
import { planAxis, positionEncoding, type AxisPlan } from "./axisPlan.js";
import { checkArray, checkSize, checkText, type BaseChartOptions } from "./chartOptions.js";
import { curveRows, type ChartXY } from "./curveRows.js";
import { seriesLineLayer } from "./seriesLayers.js";
import { topLevel } from "./topLevel.js";
import { WarningList } from "./warningList.js";
import { DEFAULT_HEIGHT, DEFAULT_WIDTH, INK } from "./theme.js";

/** One measured point, SI. */
export interface ChartMeasuredPoint {
  x: number;
  y: number;
  /** Model value at this x, SI. Default: interpolated on the model curve. */
  model?: number;
}

/** Data of {@link modelVsDataChart}. */
export interface ModelVsDataInput {
  /** Abscissa: name (plain text) and quantity kind, e.g. { name: "Pressure P", kind: "pressure" }. */
  x: { name: string; kind: QuantityKind };
  /** Ordinate: name and kind, e.g. { name: "Molar density ρ", kind: "molarDensity" }. */
  y: { name: string; kind: QuantityKind };
  /** Model curves, SI. */
  model: readonly { label: string; points: readonly ChartXY[] }[];
  /**
   * Measured data sets. `modelLabel` names the model curve to compare with (default: the curve
   * with the same label, else the only curve).
   */
  data: readonly { label: string; modelLabel?: string; points: readonly ChartMeasuredPoint[] }[];
}

/** Options of {@link modelVsDataChart}. */
export interface ModelVsDataOptions extends BaseChartOptions {
  /** "relative" deviations in % (default) or "absolute" in the property's unit. */
  residual?: "relative" | "absolute";
  /** Logarithmic abscissa. Default false. */
  logX?: boolean;
  /** Logarithmic ordinate of the upper panel. Default false. */
  logY?: boolean;
  /** Height of the residual panel, px. Default 130. */
  residualHeight?: number;
}

/**
 * Builds a model-against-data chart with a residual panel.
 * @example modelVsDataChart({ x, y, model: [{ label: "PR", points }], data: [{ label: "Corvid Point lab", points }] })
 */
export function modelVsDataChart(
  input: ModelVsDataInput,
  options: ModelVsDataOptions = {},
): ChartSpec {
  const models = checkArray("model", input.model);
  const sets = checkArray("data", input.data);
  if (models.length === 0 || sets.length === 0) {
    throw new InputError({
      input: "model, data",
      unit: "-",
      validRange: "at least one model curve and one data set",
      received: `${models.length} curves, ${sets.length} data sets`,
    });
  }
  const mode = requireChoice("residual", options.residual ?? "relative", ["relative", "absolute"]);
  const warnings = new WarningList();
  const xAxis = planAxis(
    input.x.kind,
    checkText("x.name", input.x.name),
    options.units,
    options.logX ?? false,
  );
  const yAxis = planAxis(
    input.y.kind,
    checkText("y.name", input.y.name),
    options.units,
    options.logY ?? false,
  );
  const rAxis: AxisPlan =
    mode === "relative"
      ? { ...planAxis("dimensionless", "", "SI"), title: "Deviation (data − model)/model / %" }
      : { ...yAxis, log: false, title: `Deviation data − model / ${yAxis.unit.symbol}` };
  const width = checkSize("width", options.width, DEFAULT_WIDTH);
  const height = checkSize("height", options.height, DEFAULT_HEIGHT);
  const residualHeight = checkSize("residualHeight", options.residualHeight, 130);

  const modelLabels = models.map((m, i) => checkText(`model[${i}].label`, m.label));
  const sorted = models.map((m) =>
    [...checkArray("points", m.points)]
      .filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y))
      .sort((a, b) => a.x - b.x),
  );
  const modelRows = curveRows(
    models.map((m, i) => ({ label: modelLabels[i], points: sorted[i] })),
    xAxis,
    yAxis,
    warnings,
  );

  const dataLabels = sets.map((d, i) => checkText(`data[${i}].label`, d.label));
  const points: Record<string, unknown>[] = [];
  const residuals: Record<string, unknown>[] = [];
  sets.forEach((set, i) => {
    const target = set.modelLabel ?? set.label;
    let m = modelLabels.indexOf(target);
    if (m < 0 && models.length === 1) m = 0;
    if (m < 0 && set.points.some((p) => p.model === undefined)) {
      throw new InputError({
        input: `data[${i}].modelLabel`,
        unit: "-",
        validRange: `one of the model labels (${modelLabels.join(", ")})`,
        received: target,
      });
    }
    let outside = 0;
    for (const p of checkArray(`data[${i}].points`, set.points)) {
      if (
        !(Number.isFinite(p.x) && Number.isFinite(p.y)) ||
        (xAxis.log && !(p.x > 0)) ||
        (yAxis.log && !(p.y > 0))
      ) {
        warnings.add(
          `Points of the data set "${set.label}" that are not finite (or not > 0 on a log axis) were left out.`,
        );
        continue;
      }
      const x = toDisplay(p.x, xAxis.unit);
      points.push({ x, y: toDisplay(p.y, yAxis.unit), set: set.label });
      const ym = p.model ?? interpolate(sorted[m], p.x);
      if (ym === undefined || !Number.isFinite(ym)) {
        outside++;
        continue;
      }
      const dev = mode === "relative" ? (100 * (p.y - ym)) / ym : (p.y - ym) * yAxis.unit.scale;
      if (Number.isFinite(dev)) residuals.push({ x, r: dev, set: set.label });
    }
    if (outside > 0) {
      warnings.add(
        `${outside} point(s) of "${set.label}" lie outside the model curve's range: no deviation shown.`,
      );
    }
  });

  const shapes = ["circle", "square", "triangle-up", "diamond", "cross", "triangle-down"];
  const setEncoding = {
    field: "set",
    type: "nominal",
    title: "Data",
    scale: { domain: dataLabels, range: dataLabels.map((_, i) => shapes[i % shapes.length]) },
  };
  const pointMark = {
    type: "point",
    filled: false,
    color: INK.dome,
    size: 38,
    strokeWidth: 1.2,
    clip: true,
  };
  const upper = {
    width,
    height,
    layer: [
      seriesLineLayer(modelRows, modelLabels, "Model", xAxis, yAxis),
      {
        data: { values: points },
        mark: pointMark,
        encoding: {
          x: positionEncoding("x", xAxis),
          y: positionEncoding("y", yAxis),
          shape: setEncoding,
          tooltip: [
            { field: "set", type: "nominal", title: "Data" },
            { field: "x", type: "quantitative", title: xAxis.title, format: ".5~g" },
            { field: "y", type: "quantitative", title: yAxis.title, format: ".5~g" },
          ],
        },
      },
    ],
  };
  const lower = {
    width,
    height: residualHeight,
    layer: [
      {
        data: { values: [{ zero: 0 }] },
        mark: { type: "rule", color: "#9b968b", strokeWidth: 0.8 },
        encoding: { y: positionEncoding("zero", rAxis) },
      },
      {
        data: { values: residuals },
        mark: pointMark,
        encoding: {
          x: positionEncoding("x", xAxis),
          y: positionEncoding("r", rAxis),
          shape: setEncoding,
          tooltip: [
            { field: "set", type: "nominal", title: "Data" },
            { field: "x", type: "quantitative", title: xAxis.title, format: ".5~g" },
            { field: "r", type: "quantitative", title: rAxis.title, format: ".3~g" },
          ],
        },
      },
    ],
  };
  return topLevel(
    "model-vs-data",
    "Model against data",
    options,
    [xAxis, yAxis],
    warnings,
    { vconcat: [upper, lower], resolve: { scale: { x: "shared" } } },
    {},
    false,
  );
}

/** Linear interpolation on an ascending curve; undefined outside its x range. */
function interpolate(curve: readonly ChartXY[], x: number): number | undefined {
  const n = curve.length;
  if (n === 0 || x < curve[0].x || x > curve[n - 1].x) return undefined;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (curve[mid].x <= x) lo = mid;
    else hi = mid;
  }
  if (n === 1 || curve[hi].x === curve[lo].x) return curve[lo].y;
  const f = (x - curve[lo].x) / (curve[hi].x - curve[lo].x);
  return curve[lo].y + f * (curve[hi].y - curve[lo].y);
}
