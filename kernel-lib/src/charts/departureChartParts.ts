/**
 * Parts shared by the P-V-T departure charts (departureBandChart, departureResidualChart;
 * internal): the residual property and coverage-factor options, the SI unit of each residual
 * property, the isotherm label, and the density axis and isotherm colour encodings.
 */
import { InputError } from "../errors.js";
import { SERIES_COLORS } from "./theme.js";

/** A residual property of the P-V-T route. */
export type ResidualQuantity = "a" | "s" | "u" | "h" | "g";

/** SI molar unit of each residual property (ids of displayUnits.ts, kept in the chart metadata). */
export const RESIDUAL_UNITS = { a: "J/mol", s: "J/(mol K)", u: "J/mol", h: "J/mol", g: "J/mol" };

/** The same units as printed on axes, as every other builder prints them (displayUnits.ts). */
export const RESIDUAL_SYMBOLS = { a: "J/mol", s: "J/(mol·K)", u: "J/mol", h: "J/mol", g: "J/mol" };

/**
 * Checks a chart's `quantity` (default "h") and `coverageFactor` (default 2, finite and > 0) and
 * returns them with the quantity's unit.
 */
export function checkDepartureChartOptions(options: {
  quantity?: ResidualQuantity;
  coverageFactor?: number;
}): { quantity: ResidualQuantity; coverageFactor: number; unit: string; symbol: string } {
  const q = options.quantity ?? "h";
  if (!(q in RESIDUAL_UNITS)) {
    throw new InputError({
      input: "options.quantity",
      unit: "-",
      validRange: "one of a, s, u, h, g",
      received: q,
    });
  }
  const k = options.coverageFactor ?? 2;
  if (!(k > 0 && k < Infinity)) {
    throw new InputError({
      input: "options.coverageFactor",
      unit: "-",
      validRange: "a finite number > 0",
      received: k,
    });
  }
  return { quantity: q, coverageFactor: k, unit: RESIDUAL_UNITS[q], symbol: RESIDUAL_SYMBOLS[q] };
}

/** The legend label of an isotherm, "310.0 K". */
export function isothermLabel(temperatureK: number): string {
  return `${temperatureK.toFixed(1)} K`;
}

/** A fresh x encoding: molar density, field "rho", mol/m3. */
export function densityEncoding(): Record<string, unknown> {
  return { field: "rho", type: "quantitative", title: "Molar density ρ / mol/m³" };
}

/**
 * A fresh colour encoding: one colour per isotherm (field "isotherm"), in the order of `labels`,
 * from the theme's series colours (so bands, outlines and lines of one isotherm match).
 */
export function isothermColorEncoding(labels?: readonly string[]): Record<string, unknown> {
  const enc: Record<string, unknown> = {
    field: "isotherm",
    type: "nominal",
    title: "Isotherm",
    sort: null,
  };
  if (labels && labels.length > 0) {
    enc["scale"] = {
      domain: [...labels],
      range: labels.map((_, i) => SERIES_COLORS[i % SERIES_COLORS.length]),
    };
  }
  return enc;
}

/**
 * Uncertainty bands, one area layer per isotherm in its series colour: a light fill (four
 * overlapping bands still let the grid and the lines through) and a thin outline in the same
 * colour. No colour encoding, so the legend comes from the lines alone and its swatches look like
 * the lines. `rows` carry `isotherm`, `rho`, `lower`, `upper`; `y` is the band's y encoding.
 */
export function bandLayers(
  rows: readonly Record<string, unknown>[],
  labels: readonly string[],
  y: Record<string, unknown>,
): Record<string, unknown>[] {
  return labels.map((label, i) => {
    const colour = SERIES_COLORS[i % SERIES_COLORS.length];
    return {
      data: { values: rows.filter((r) => r["isotherm"] === label) },
      mark: {
        type: "area",
        color: colour,
        fillOpacity: 0.08,
        stroke: colour,
        strokeWidth: 0.8,
        strokeOpacity: 0.6,
      },
      encoding: { x: densityEncoding(), y, y2: { field: "upper" } },
    };
  });
}
