/**
 * The heat curve of a heater, cooler or exchanger: temperature against the heat transferred,
 * measured from the cold end of the equipment (so every curve rises to the right), with the
 * bubble and dew points marked and, for an exchanger, the point of minimum approach (the pinch)
 * drawn as a rule between the hot and the cold curve.
 *
 * Data are SI (W, K); the axes follow the unit choice ("power" and "temperature" display units).
 * Safety: labels go in as data values only (see topLevel.ts).
 */
import { InputError } from "../errors.js";
import type { ExchangerResult } from "../process/exchanger.js";
import type { HeaterResult } from "../process/heater.js";
import { requireFinite, requirePositive } from "../validate.js";
import { planAxis, plotValue, positionEncoding } from "./axisPlan.js";
import { checkNonEmptyArray, checkText, type BaseChartOptions } from "./chartOptions.js";
import type { ChartSpec } from "./chartSpec.js";
import { toDisplay } from "./displayUnits.js";
import { seriesEncodings } from "./seriesLayers.js";
import { shortNumber } from "./shortNumber.js";
import { INK } from "./theme.js";
import { topLevel } from "./topLevel.js";
import { WarningList } from "./warningList.js";

/** One point of a heat curve for the chart (SI). */
export interface HeatCurveChartPoint {
  /** Heat transferred from the cold end of the equipment up to this point, W (>= 0). */
  heatW: number;
  temperatureK: number;
  /** Marks the exact bubble or dew point of the stream. */
  marker?: "bubble" | "dew";
}

/** One stream's curve. */
export interface HeatCurveChartCurve {
  /** Legend label (plain text), e.g. "hot: reactor effluent". */
  label: string;
  points: readonly HeatCurveChartPoint[];
}

/** The minimum approach of an exchanger. */
export interface HeatCurveChartPinch {
  /** Heat from the cold end, W. */
  heatW: number;
  hotTemperatureK: number;
  coldTemperatureK: number;
}

/** Input of {@link heatCurveChart}. */
export interface HeatCurveChartData {
  curves: readonly HeatCurveChartCurve[];
  /** Drawn as a rule with its temperature difference. Default: none. */
  pinch?: HeatCurveChartPinch;
}

/** Options of {@link heatCurveChart}. */
export type HeatCurveChartOptions = BaseChartOptions;

/**
 * Heat curve chart: one line per stream, the samples as small points, bubble and dew points as
 * labelled markers, the pinch as a rule.
 * @example heatCurveChart({ curves: [{ label: "steam", points }] }, { units: { system: "SI", temperature: "degC" } })
 */
export function heatCurveChart(
  data: HeatCurveChartData,
  options: HeatCurveChartOptions = {},
): ChartSpec {
  const xAxis = planAxis("power", "Heat transferred Q", options.units);
  const yAxis = planAxis("temperature", "Temperature T", options.units);
  const warnings = new WarningList();
  const curves = checkNonEmptyArray("data.curves", data?.curves, "at least one curve");
  const labels = curves.map((c, i) => checkText(`data.curves[${i}].label`, c.label));
  const lineRows: Record<string, unknown>[] = [];
  const markerRows: Record<string, unknown>[] = [];
  curves.forEach((c, i) => {
    const pts = checkNonEmptyArray(`data.curves[${i}].points`, c.points, "at least two points");
    if (pts.length < 2) warnings.add(`curve "${labels[i]}" has fewer than two points`);
    pts.forEach((p, k) => {
      const where = `data.curves[${i}].points[${k}]`;
      const x = plotValue(requireFinite(`${where}.heatW`, p.heatW, "W"), xAxis.unit);
      const y = plotValue(
        requirePositive(`${where}.temperatureK`, p.temperatureK, "K"),
        yAxis.unit,
      );
      lineRows.push({ x, y, series: labels[i], order: k });
      if (p.marker === "bubble" || p.marker === "dew") {
        const word = p.marker === "bubble" ? "bubble point" : "dew point";
        markerRows.push({
          x,
          y,
          series: labels[i],
          kind: word,
          text: `${word} ${shortNumber(y)} ${yAxis.unit.symbol}`,
        });
      }
    });
  });
  const enc = { x: positionEncoding("x", xAxis), y: positionEncoding("y", yAxis) };
  const tooltip = [
    { field: "series", type: "nominal", title: "Stream" },
    { field: "x", type: "quantitative", title: xAxis.title, format: ".5~g" },
    { field: "y", type: "quantitative", title: yAxis.title, format: ".5~g" },
  ];
  const layers: Record<string, unknown>[] = [
    {
      data: { values: lineRows },
      mark: { type: "line", clip: true, strokeWidth: 2 },
      encoding: {
        ...enc,
        ...seriesEncodings(labels, "Stream"),
        order: { field: "order", type: "quantitative" },
      },
    },
    {
      data: { values: lineRows },
      mark: { type: "point", filled: true, size: 14, clip: true, color: INK.guide },
      encoding: { ...enc, tooltip },
    },
  ];
  if (markerRows.length > 0) {
    layers.push(
      {
        data: { values: markerRows },
        mark: { type: "point", shape: "diamond", filled: true, size: 90, color: INK.critical },
        encoding: {
          ...enc,
          tooltip: [{ field: "kind", type: "nominal", title: "Point" }, ...tooltip],
        },
      },
      {
        data: { values: markerRows },
        mark: {
          type: "text",
          align: "left",
          dx: 8,
          dy: 10,
          fontSize: 10,
          color: INK.critical,
        },
        encoding: { ...enc, text: { field: "text", type: "nominal" } },
      },
    );
  }
  if (data.pinch !== undefined) {
    const p = data.pinch;
    const x = plotValue(requireFinite("data.pinch.heatW", p.heatW, "W"), xAxis.unit);
    const yh = plotValue(
      requirePositive("data.pinch.hotTemperatureK", p.hotTemperatureK, "K"),
      yAxis.unit,
    );
    const yc = plotValue(
      requirePositive("data.pinch.coldTemperatureK", p.coldTemperatureK, "K"),
      yAxis.unit,
    );
    const dT = toDisplay(p.hotTemperatureK, yAxis.unit) - toDisplay(p.coldTemperatureK, yAxis.unit);
    const text = `minimum approach ${shortNumber(dT)} ${yAxis.unit.symbol}`;
    const row = { x, y: yc, y2: yh, text };
    layers.push(
      {
        data: { values: [row] },
        mark: { type: "rule", color: INK.dome, strokeWidth: 1.4, strokeDash: [3, 2] },
        encoding: { ...enc, y2: { field: "y2" } },
      },
      {
        data: { values: [row] },
        mark: { type: "text", align: "left", dx: 6, fontSize: 10.5, color: INK.dome },
        encoding: {
          x: enc.x,
          y: { ...positionEncoding("y", yAxis), field: "ymid" },
          text: { field: "text", type: "nominal" },
        },
        transform: [{ calculate: "(datum.y + datum.y2) / 2", as: "ymid" }],
      },
    );
  }
  return topLevel("heat-curve", "Heat curve", options, [xAxis, yAxis], warnings, {
    layer: layers,
  });
}

/**
 * The heat-curve chart of a step result: a heater's or cooler's curve (heat measured from the
 * cold end: the inlet of a heater, the outlet of a cooler), or an exchanger's two curves with
 * its pinch.
 * @example stepHeatCurveChart(exchanger(hot, cold, { minimumApproachK: 10 }), { units: "field" })
 */
export function stepHeatCurveChart(
  result: HeaterResult | ExchangerResult,
  options: HeatCurveChartOptions = {},
): ChartSpec {
  if (result?.kind === "exchanger") {
    const x = result;
    const curve = (name: string, pts: ExchangerResult["curves"]["hot"]): HeatCurveChartCurve => ({
      label: name,
      points: pts.map((p) => ({
        heatW: p.heatFromColdEndW,
        temperatureK: p.temperatureK,
        ...(p.marker ? { marker: p.marker } : {}),
      })),
    });
    const m = x.minimumApproach;
    return heatCurveChart(
      {
        curves: [
          curve(`hot: ${x.inlets[0].name ?? "hot stream"}`, x.curves.hot),
          curve(`cold: ${x.inlets[1].name ?? "cold stream"}`, x.curves.cold),
        ],
        pinch: {
          heatW: m.heatFromColdEndW,
          hotTemperatureK: m.hotTemperatureK,
          coldTemperatureK: m.coldTemperatureK,
        },
      },
      { title: "Heat curves", ...options },
    );
  }
  if (result?.kind === "heater" || result?.kind === "cooler") {
    const Q = Math.abs(result.dutyW);
    const points = result.heatCurve.points.map((p) => ({
      heatW: result.kind === "heater" ? p.dutyW : Q + p.dutyW,
      temperatureK: p.temperatureK,
      ...(p.marker ? { marker: p.marker } : {}),
    }));
    return heatCurveChart(
      { curves: [{ label: result.inlets[0].name ?? result.kind, points }] },
      { title: "Heat curve", ...options },
    );
  }
  throw new InputError({
    input: "result",
    unit: "-",
    validRange: "the result of heater, cooler or exchanger",
    received: (result as { kind?: unknown } | undefined)?.kind,
  });
}
