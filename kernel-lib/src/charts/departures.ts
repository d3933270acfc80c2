/**
 * Departure (residual) functions against pressure or density for several isotherms: h, s, u, a
 * and g of the real fluid minus the ideal gas, per mole, with optional uncertainty bands when the
 * departures come from measured data (band = value +- k u, k the coverage factor; JCGM 100:2008,
 * "Guide to the expression of uncertainty in measurement", section 6.2).
 */
import { InputError } from "../errors.js";
import { requireChoice, requireCount } from "../validate.js";
import type { ChartSpec } from "./chartSpec.js";
import { toDisplay } from "./displayUnits.js";
import { planAxis, positionEncoding, type AxisPlan } from "./axisPlan.js";
import { checkNonEmptyArray, checkSize, type BaseChartOptions } from "./chartOptions.js";
import { curveRows, type LineRow } from "./curveRows.js";
import { lineTooltip, seriesLabels, seriesLineLayer } from "./seriesLayers.js";
import { topLevel } from "./topLevel.js";
import { WarningList } from "./warningList.js";
import { DEFAULT_HEIGHT, DEFAULT_WIDTH, SERIES_COLORS, SERIES_DASHES } from "./theme.js";

/** Residual properties: enthalpy, entropy, internal energy, Helmholtz and Gibbs energy. */
export type DepartureProperty = "h" | "s" | "u" | "a" | "g";

const PROPERTIES: readonly DepartureProperty[] = ["h", "s", "u", "a", "g"];
const SYMBOLS: Record<DepartureProperty, string> = {
  h: "h − hⁱᵍ",
  s: "s − sⁱᵍ",
  u: "u − uⁱᵍ",
  a: "a − aⁱᵍ",
  g: "g − gⁱᵍ",
};
const NAMES: Record<DepartureProperty, string> = {
  h: "Residual enthalpy h − hⁱᵍ",
  s: "Residual entropy s − sⁱᵍ",
  u: "Residual internal energy u − uⁱᵍ",
  a: "Residual Helmholtz energy a − aⁱᵍ",
  g: "Residual Gibbs energy g − gⁱᵍ",
};

/** One point of a departure curve, SI per mole. */
export interface DeparturePoint {
  /** Pressure, Pa (needed when x = "pressure"). */
  pressurePa?: number;
  /** Molar density, mol/m3 (needed when x = "density"). */
  densityMolPerM3?: number;
  /** Residual enthalpy, J/mol. */
  h?: number;
  /** Residual entropy, J/(mol K). */
  s?: number;
  /** Residual internal energy, J/mol. */
  u?: number;
  /** Residual Helmholtz energy, J/mol. */
  a?: number;
  /** Residual Gibbs energy, J/mol. */
  g?: number;
  /** Standard uncertainties (k = 1) of the residuals, same units; draws a band. */
  uncertainty?: Partial<Record<DepartureProperty, number>>;
}

/** One isotherm of departures. */
export interface DepartureCurve {
  /** Temperature, K. */
  temperatureK: number;
  /** Legend label (plain text). Default: the temperature in the chosen unit. */
  label?: string;
  /**
   * The model (or data set) the curve comes from, when curves of several models are compared.
   * When every curve names one, colour tells the models apart and dash the isotherms (two
   * legends, "Model" and "Isotherm"); otherwise each curve has a colour and dash of its own.
   */
  model?: string;
  points: readonly DeparturePoint[];
}

/** Options of {@link departureChart}. */
export interface DepartureChartOptions extends BaseChartOptions {
  /** Which residual(s); several give one panel each. Default "h". */
  property?: DepartureProperty | readonly DepartureProperty[];
  /** Abscissa: "pressure" (default) or "density" (molar density). */
  x?: "pressure" | "density";
  /** Logarithmic abscissa. Default false. */
  logX?: boolean;
  /** Coverage factor k of the uncertainty bands (value +- k u). Default 2 (about 95 %). */
  coverageFactor?: number;
  /**
   * Which ideal gas the residuals are relative to, for the axis titles: "TP" (same T and P, the
   * engineering departure; default) or "TV" (same T and density). h and u are the same in both.
   */
  convention?: "TP" | "TV";
  /** Panels per row when several properties are drawn. Default 2. */
  columns?: number;
}

/**
 * Builds departure-function curves, one series per isotherm, one panel per property.
 * @example
 * departureChart(curves, { property: ["h", "s"], units: { system: "SI", pressure: "bar" } })
 */
export function departureChart(
  curves: readonly DepartureCurve[],
  options: DepartureChartOptions = {},
): ChartSpec {
  const list = checkNonEmptyArray("curves", curves, "at least one isotherm");
  const props = Array.isArray(options.property) ? [...options.property] : [options.property ?? "h"];
  if (props.length === 0 || props.some((p) => !PROPERTIES.includes(p as DepartureProperty))) {
    throw new InputError({
      input: "property",
      unit: "-",
      validRange: 'one or more of "h", "s", "u", "a", "g"',
      received: options.property,
    });
  }
  const xKind = requireChoice("x", options.x ?? "pressure", ["pressure", "density"]);
  const k = options.coverageFactor ?? 2;
  if (!(k > 0 && k < 10)) {
    throw new InputError({
      input: "coverageFactor",
      unit: "-",
      validRange: "between 0 and 10",
      received: k,
    });
  }
  const convention = options.convention ?? "TP";
  const warnings = new WarningList();
  const xAxis: AxisPlan =
    xKind === "pressure"
      ? planAxis("pressure", "Pressure P", options.units, options.logX ?? false)
      : planAxis("molarDensity", "Molar density ρ", options.units, options.logX ?? false);
  const temperatureUnit = planAxis("temperature", "T", options.units).unit;
  const labels = seriesLabels("curves", list, "temperatureK", "K", temperatureUnit);
  const byModel = list.every((c) => typeof c.model === "string" && c.model !== "");
  const temperatureLabels = seriesLabels(
    "curves",
    list.map((c) => ({ temperatureK: c.temperatureK })),
    "temperatureK",
    "K",
    temperatureUnit,
  );
  const width = checkSize("width", options.width, DEFAULT_WIDTH);
  const height = checkSize("height", options.height, DEFAULT_HEIGHT);
  const xOf = (p: DeparturePoint) =>
    (xKind === "pressure" ? p.pressurePa : p.densityMolPerM3) ?? NaN;

  const axes: AxisPlan[] = [xAxis, { ...xAxis, kind: "temperature", unit: temperatureUnit }];
  const panels = (props as DepartureProperty[]).map((prop) => {
    const suffix =
      prop === "h" || prop === "u" ? "" : convention === "TP" ? " (same T, P)" : " (same T, ρ)";
    // Several panels (narrower by default): the full name goes to the panel title and the axis
    // keeps the symbol, so a long rotated title cannot outgrow the panel's height.
    const several = props.length > 1;
    const yAxis = planAxis(
      prop === "s" ? "molarEntropy" : "molarEnergy",
      several ? SYMBOLS[prop] : NAMES[prop] + suffix,
      options.units,
    );
    axes.push(yAxis);
    const rows = curveRows(
      list.map((c, i) => ({
        label: labels[i],
        points: [...c.points]
          .map((p) => ({ x: xOf(p), y: p[prop] ?? NaN }))
          .sort((a, b) => a.x - b.x),
      })),
      xAxis,
      yAxis,
      warnings,
    );
    const band: Record<string, unknown>[] = [];
    list.forEach((c, i) => {
      for (const p of c.points) {
        const u = p.uncertainty?.[prop];
        const v = p[prop];
        const x = xOf(p);
        if (u === undefined || v === undefined) continue;
        if (!(u >= 0 && Number.isFinite(v) && Number.isFinite(x) && (!xAxis.log || x > 0)))
          continue;
        band.push({
          x: toDisplay(x, xAxis.unit),
          lo: toDisplay(v - k * u, yAxis.unit),
          hi: toDisplay(v + k * u, yAxis.unit),
          series: labels[i],
          path: String(i),
        });
      }
    });
    const layers: Record<string, unknown>[] = [];
    if (band.length > 0) {
      band.sort((a, b) => (a.x as number) - (b.x as number));
      layers.push({
        data: { values: band },
        mark: { type: "area", opacity: 0.18, clip: true },
        encoding: {
          x: positionEncoding("x", xAxis),
          y: { ...positionEncoding("lo", yAxis) },
          y2: { field: "hi" },
          color: {
            field: "series",
            type: "nominal",
            scale: {
              domain: labels,
              range: labels.map((_, i) =>
                byModel
                  ? SERIES_COLORS[distinct(list.map((c) => c.model)).indexOf(list[i].model)]
                  : SERIES_COLORS[i % SERIES_COLORS.length],
              ),
            },
            legend: null,
          },
          detail: { field: "path", type: "nominal" },
        },
      });
    }
    layers.push({
      data: { values: [{ zero: 0 }] },
      mark: { type: "rule", color: "#9b968b", strokeWidth: 0.8 },
      encoding: { y: positionEncoding("zero", yAxis) },
    });
    layers.push(
      byModel
        ? modelIsothermLayer(rows, list, labels, temperatureLabels, xAxis, yAxis)
        : seriesLineLayer(rows, labels, "Isotherm", xAxis, yAxis),
    );
    return several
      ? { title: { text: NAMES[prop] + suffix, fontSize: 12 }, width, height, layer: layers }
      : { width, height, layer: layers };
  });
  const columns = options.columns ?? 2;
  requireCount("columns", columns);
  const body: Record<string, unknown> =
    panels.length === 1
      ? { width, height, layer: panels[0].layer }
      : { columns, concat: panels, resolve: { scale: { color: "shared", strokeDash: "shared" } } };
  const title =
    props.length === 1 ? "Departure from the ideal gas" : "Departures from the ideal gas";
  return topLevel("departures", title, options, axes, warnings, body, {}, false);
}

/** Distinct values in first-seen order. */
function distinct<T>(values: readonly T[]): T[] {
  return [...new Set(values)];
}

/** Curves of several models: colour per model, dash per isotherm, each with its own legend. */
function modelIsothermLayer(
  rows: readonly LineRow[],
  curves: readonly DepartureCurve[],
  labels: readonly string[],
  temperatureLabels: readonly string[],
  xAxis: AxisPlan,
  yAxis: AxisPlan,
): Record<string, unknown> {
  const models = distinct(curves.map((c) => String(c.model)));
  const temperatures = distinct(temperatureLabels);
  const index = new Map(labels.map((l, i) => [l, i]));
  const values = rows.map((r) => {
    const i = index.get(r.series) ?? 0;
    return { ...r, model: String(curves[i].model), isotherm: temperatureLabels[i] };
  });
  return {
    data: { values },
    mark: { type: "line", clip: true },
    encoding: {
      x: positionEncoding("x", xAxis),
      y: positionEncoding("y", yAxis),
      color: {
        field: "model",
        type: "nominal",
        title: "Model",
        scale: {
          domain: models,
          range: models.map((_, i) => SERIES_COLORS[i % SERIES_COLORS.length]),
        },
      },
      strokeDash: {
        field: "isotherm",
        type: "nominal",
        title: "Isotherm",
        scale: {
          domain: temperatures,
          range: temperatures.map((_, i) => SERIES_DASHES[i % SERIES_DASHES.length].slice()),
        },
      },
      order: { field: "order", type: "quantitative" },
      detail: { field: "path", type: "nominal" },
      tooltip: lineTooltip(xAxis, yAxis, "Curve"),
    },
  };
}
