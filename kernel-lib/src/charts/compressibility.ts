/**
 * Compressibility chart: Z = P v / (R T) against reduced pressure Pr = P / Pc for isotherms of
 * reduced temperature Tr = T / Tc, the corresponding-states form of a generalized compressibility
 * chart (principle of corresponding states: van der Waals 1873; charts after Nelson and Obert,
 * Chem. Eng. 61 (1954) 203). Works for any model: the caller samples Z(Tr, Pr).
 */
import { requirePositive } from "../validate.js";
import type { ChartSpec } from "./chartSpec.js";
import { planAxis, positionEncoding, rangeOption } from "./axisPlan.js";
import { checkArray, checkNonEmptyArray, type BaseChartOptions } from "./chartOptions.js";
import { curveRows } from "./curveRows.js";
import { seriesLineLayer } from "./seriesLayers.js";
import { shortNumber } from "./shortNumber.js";
import { topLevel } from "./topLevel.js";
import { WarningList } from "./warningList.js";

/** One reduced isotherm: Z at reduced pressures. */
export interface ReducedIsotherm {
  /** Reduced temperature T/Tc, dimensionless. */
  reducedTemperature: number;
  /** Legend label (plain text). Default "Tr = 1.2". */
  label?: string;
  points: readonly { reducedPressure: number; z: number }[];
}

/** Options of {@link compressibilityChart}. */
export interface CompressibilityChartOptions extends BaseChartOptions {
  /** Logarithmic reduced-pressure axis (useful below Pr = 0.1). Default false. */
  logX?: boolean;
  /** Reduced-pressure axis range [low, high]. Default: fitted to the data. */
  reducedPressureRange?: readonly [number, number];
  /** Z axis range [low, high]. Default: fitted to the data. */
  zRange?: readonly [number, number];
}

/**
 * Builds a generalized compressibility chart.
 * @example compressibilityChart([{ reducedTemperature: 1.5, points }], { logX: true })
 */
export function compressibilityChart(
  isotherms: readonly ReducedIsotherm[],
  options: CompressibilityChartOptions = {},
): ChartSpec {
  const list = checkNonEmptyArray("isotherms", isotherms, "at least one isotherm");
  const warnings = new WarningList();
  const xAxis = planAxis(
    "dimensionless",
    "Reduced pressure Pr = P/Pc",
    "SI",
    options.logX ?? false,
  );
  const yAxis = planAxis("dimensionless", "Compressibility factor Z = Pv/(RT)", "SI");
  rangeOption("reducedPressureRange", options.reducedPressureRange, xAxis, "-");
  rangeOption("zRange", options.zRange, yAxis, "-");
  const labels = list.map((c, i) => {
    requirePositive(`isotherms[${i}].reducedTemperature`, c.reducedTemperature, "-");
    return c.label ?? `Tr = ${shortNumber(c.reducedTemperature)}`;
  });
  const rows = curveRows(
    list.map((c, i) => ({
      label: labels[i],
      points: checkArray(`isotherms[${i}].points`, c.points)
        .map((p) => ({ x: p.reducedPressure, y: p.z }))
        .sort((a, b) => a.x - b.x),
    })),
    xAxis,
    yAxis,
    warnings,
  );
  const layers = [
    {
      data: { values: [{ one: 1 }] },
      mark: { type: "rule", color: "#9b968b", strokeWidth: 0.8, strokeDash: [4, 3] },
      encoding: { y: positionEncoding("one", yAxis) },
    },
    seriesLineLayer(rows, labels, "Reduced temperature", xAxis, yAxis),
  ];
  return topLevel("compressibility", "Compressibility factor", options, [xAxis], warnings, {
    layer: layers,
  });
}
