/**
 * Isotherms in pressure against molar volume (logarithmic by default) or molar density, with the
 * saturation boundary, the two-phase region and the equal-area (Maxwell) construction: the tie
 * line at the vapour pressure and the two lobes between the model's loop and the tie line, whose
 * areas are equal at coexistence (J. C. Maxwell, Nature 11 (1875) 357-359).
 */
import { maxOf } from "../numerics/extent.js";
import { InputError } from "../errors.js";
import { requireChoice, requirePositive } from "../validate.js";
import type { ChartSpec } from "./chartSpec.js";
import { toDisplay } from "./displayUnits.js";
import { criticalLayers, domeLayers } from "./domeLayers.js";
import {
  addDomeWarnings,
  checkCritical,
  checkSaturation,
  type ChartCriticalPoint,
  type ChartSaturationRow,
} from "./saturationInput.js";
import { planAxis, positionEncoding, type AxisPlan } from "./axisPlan.js";
import { checkArray, checkNonEmptyArray, type BaseChartOptions } from "./chartOptions.js";
import { curveRows } from "./curveRows.js";
import { lineTooltip, seriesEncodings } from "./seriesLayers.js";
import { shortNumber } from "./shortNumber.js";
import { topLevel } from "./topLevel.js";
import { WarningList } from "./warningList.js";
import { placeGuideLabels } from "./labelPlacement.js";
import { INK } from "./theme.js";

/** A point of an isotherm, SI. */
export interface IsothermChartPoint {
  /** Molar density, mol/m3. */
  densityMolPerM3: number;
  /** Pressure, Pa (may be negative inside a van der Waals loop). */
  pressurePa: number;
}

/** The result of an equal-area construction on one subcritical isotherm, SI. */
export interface ChartEqualArea {
  /** Vapour pressure at this temperature, Pa. */
  pressurePa: number;
  /** Saturated liquid density, mol/m3. */
  liquidDensityMolPerM3: number;
  /** Saturated vapour density, mol/m3. */
  vaporDensityMolPerM3: number;
}

/** One isotherm: its temperature, points (sample in density), optional equal-area result. */
export interface IsothermChartCurve {
  /** Temperature, K. */
  temperatureK: number;
  /** Legend label (plain text). Default: the temperature in the chosen unit, e.g. "190 K". */
  label?: string;
  /** Points along the isotherm, any order of density. */
  points: readonly IsothermChartPoint[];
  /** Equal-area construction at this temperature (subcritical only). */
  equalArea?: ChartEqualArea;
}

/** Data of {@link isothermChart}. */
export interface IsothermChartData {
  isotherms: readonly IsothermChartCurve[];
  /** Saturation rows (liquid and vapour densities) for the boundary. Default: none. */
  saturation?: readonly ChartSaturationRow[];
  /** Critical point (with densityMolPerM3) to mark. Default: none. */
  critical?: ChartCriticalPoint;
  /** Notes of a sampled dome (saturationFromModel), copied into the chart's warnings. */
  domeWarnings?: readonly string[];
}

/** Options of {@link isothermChart}. */
export interface IsothermChartOptions extends BaseChartOptions {
  /** Abscissa: "molarVolume" (default) or "density" (molar density). */
  x?: "molarVolume" | "density";
  /** Logarithmic abscissa. Default: true for molar volume, false for density. */
  logX?: boolean;
  /**
   * Pressure axis range, Pa, [low, high]. Default: from the data, capped at twice the critical
   * pressure (or three times the highest vapour pressure) so steep liquid branches do not flatten
   * the rest; parts of the curves outside are clipped.
   */
  pressureRangePa?: readonly [number, number];
  /** Draw the equal-area tie lines and lobes. Default true. */
  showEqualArea?: boolean;
}

/**
 * Builds a P-v (or P-rho) isotherm chart.
 * @example
 * const spec = isothermChart({ isotherms: [{ temperatureK: 180, points }] }, { units: "field" });
 */
export function isothermChart(
  data: IsothermChartData,
  options: IsothermChartOptions = {},
): ChartSpec {
  const isotherms = checkNonEmptyArray("isotherms", data.isotherms, "at least one isotherm");
  const saturation = checkSaturation(data.saturation);
  const critical = checkCritical(data.critical);
  const xKind = requireChoice("x", options.x ?? "molarVolume", ["molarVolume", "density"]);
  const warnings = new WarningList();
  addDomeWarnings(warnings, data.domeWarnings);
  const useVolume = xKind === "molarVolume";
  const xAxis: AxisPlan = useVolume
    ? planAxis("molarVolume", "Molar volume v", options.units, options.logX ?? true)
    : planAxis("molarDensity", "Molar density ρ", options.units, options.logX ?? false);
  const yAxis = planAxis("pressure", "Pressure P", options.units);
  const temperatureUnit = planAxis("temperature", "T", options.units).unit;
  const xOf = (densityMolPerM3: number) => (useVolume ? 1 / densityMolPerM3 : densityMolPerM3);

  const labels: string[] = [];
  const curves = isotherms.map((curve, i) => {
    requirePositive(`isotherms[${i}].temperatureK`, curve.temperatureK, "K");
    const label =
      curve.label ??
      `${shortNumber(toDisplay(curve.temperatureK, temperatureUnit))} ${temperatureUnit.symbol}`;
    labels.push(label);
    const points = checkArray(`isotherms[${i}].points`, curve.points)
      .map((p) => ({ x: xOf(p.densityMolPerM3), y: p.pressurePa }))
      .sort((a, b) => a.x - b.x);
    return { label, points };
  });
  const rows = curveRows(curves, xAxis, yAxis, warnings);

  // Pressure range: explicit wins; otherwise cap so liquid branches do not squash the chart.
  if (options.pressureRangePa) {
    const [lo, hi] = options.pressureRangePa;
    if (!(Number.isFinite(lo) && Number.isFinite(hi) && hi > lo)) {
      throw new InputError({
        input: "pressureRangePa",
        unit: "Pa",
        validRange: "[low, high] with high > low",
        received: options.pressureRangePa,
      });
    }
    yAxis.domain = [toDisplay(lo, yAxis.unit), toDisplay(hi, yAxis.unit)];
  } else {
    const cap = critical
      ? 2 * critical.pressurePa
      : saturation.length > 0
        ? 3 * maxOf(saturation.map((r) => r.pressurePa))
        : undefined;
    if (cap !== undefined) {
      const capDisplay = toDisplay(cap, yAxis.unit);
      const lowest = Math.min(0, ...rows.map((r) => r.y));
      yAxis.domain = [Math.max(lowest, -0.5 * capDisplay), capDisplay];
    }
  }

  const layers: Record<string, unknown>[] = [];
  layers.push(
    ...domeLayers(
      saturation,
      critical?.densityMolPerM3 !== undefined
        ? { x: xOf(critical.densityMolPerM3), y: critical.pressurePa }
        : undefined,
      (r, phase) => {
        const rho = r[phase].densityMolPerM3;
        return rho === undefined ? undefined : xOf(rho);
      },
      (r) => r.pressurePa,
      xAxis,
      yAxis,
      warnings,
    ),
  );

  if (options.showEqualArea ?? true) {
    layers.push(...equalAreaLayers(isotherms, curves, xOf, xAxis, yAxis));
  }

  layers.push({
    data: { values: rows },
    mark: { type: "line", clip: true },
    encoding: {
      x: positionEncoding("x", xAxis),
      y: positionEncoding("y", yAxis),
      ...seriesEncodings(labels, "Isotherm"),
      order: { field: "order", type: "quantitative" },
      detail: { field: "path", type: "nominal" },
      tooltip: lineTooltip(xAxis, yAxis, "Isotherm"),
    },
  });
  layers.push(
    ...criticalLayers(
      critical,
      critical?.densityMolPerM3 !== undefined ? xOf(critical.densityMolPerM3) : undefined,
      critical?.pressurePa,
      xAxis,
      yAxis,
    ),
  );
  const spec = topLevel(
    "isotherms",
    "Isotherms",
    options,
    [xAxis, yAxis, { ...yAxis, kind: "temperature", unit: temperatureUnit }],
    warnings,
    { layer: layers },
  );
  // The critical-point label: clear of the lines and inside the plot.
  placeGuideLabels(spec);
  return spec;
}

/** Tie lines at the vapour pressure and the lobes between loop and tie line. */
function equalAreaLayers(
  isotherms: readonly IsothermChartCurve[],
  curves: readonly { label: string; points: readonly { x: number; y: number }[] }[],
  xOf: (rho: number) => number,
  xAxis: AxisPlan,
  yAxis: AxisPlan,
): Record<string, unknown>[] {
  const ties: Record<string, unknown>[] = [];
  const lobes: Record<string, unknown>[] = [];
  isotherms.forEach((curve, i) => {
    const ea = curve.equalArea;
    if (!ea) return;
    requirePositive(
      `isotherms[${i}].equalArea.liquidDensityMolPerM3`,
      ea.liquidDensityMolPerM3,
      "mol/m3",
    );
    requirePositive(
      `isotherms[${i}].equalArea.vaporDensityMolPerM3`,
      ea.vaporDensityMolPerM3,
      "mol/m3",
    );
    requirePositive(`isotherms[${i}].equalArea.pressurePa`, ea.pressurePa, "Pa");
    const xa = xOf(ea.liquidDensityMolPerM3);
    const xb = xOf(ea.vaporDensityMolPerM3);
    const lo = Math.min(xa, xb);
    const hi = Math.max(xa, xb);
    const psat = toDisplay(ea.pressurePa, yAxis.unit);
    ties.push({
      x: toDisplay(lo, xAxis.unit),
      x2: toDisplay(hi, xAxis.unit),
      y: psat,
      series: curves[i].label,
    });
    for (const p of curves[i].points) {
      if (p.x >= lo && p.x <= hi && Number.isFinite(p.y) && (!xAxis.log || p.x > 0)) {
        lobes.push({
          x: toDisplay(p.x, xAxis.unit),
          y: toDisplay(p.y, yAxis.unit),
          y2: psat,
          path: String(i),
        });
      }
    }
  });
  if (ties.length === 0) return [];
  return [
    {
      data: { values: lobes },
      mark: { type: "area", color: INK.equalArea, opacity: 0.45, clip: true },
      encoding: {
        x: positionEncoding("x", xAxis),
        y: positionEncoding("y", yAxis),
        y2: { field: "y2" },
        detail: { field: "path", type: "nominal" },
      },
    },
    {
      data: { values: ties },
      mark: { type: "rule", color: INK.dome, strokeWidth: 1.1, strokeDash: [5, 3], clip: true },
      encoding: {
        x: positionEncoding("x", xAxis),
        x2: { field: "x2" },
        y: positionEncoding("y", yAxis),
        tooltip: [
          { field: "series", type: "nominal", title: "Equal-area tie line" },
          {
            field: "y",
            type: "quantitative",
            title: `Vapour pressure / ${yAxis.unit.symbol}`,
            format: ".5~g",
          },
        ],
      },
    },
  ];
}
