/**
 * Departures from P-V-T data with their uncertainty bands, as a Vega-Lite spec: one residual
 * property against density, one colour per isotherm, a band of +/- k standard uncertainties
 * (k = 2 by default, about 95 % for a normal distribution, JCGM 100:2008 §6.3), the data-derived
 * states as points, and optionally a model's departures as dashed lines (from compareWithModel).
 * A pure function: the returned spec is plain JSON the user may still edit. SI molar units on the
 * axes (mol/m3; J/mol or J/(mol K)).
 */
import { themeConfig } from "./theme.js";
import { VEGA_LITE_SCHEMA } from "./topLevel.js";
import type { ChartSpec as VegaLiteSpec } from "./chartSpec.js";
import type { ModelComparisonPoint } from "../pvt/compareWithModel.js";
import {
  checkDepartureChartOptions,
  densityEncoding,
  isothermColorEncoding,
  isothermLabel,
  bandLayers,
} from "./departureChartParts.js";
import type { PvtRouteResult } from "../pvt/departuresFromPvt.js";

/** Options of {@link departureBandChart}. */
export interface DepartureBandChartOptions {
  /** Which residual property. Default "h". */
  quantity?: "a" | "s" | "u" | "h" | "g";
  /** Coverage factor of the band. Default 2. */
  coverageFactor?: number;
  /** A model comparison to overlay (dashed lines), and its label. */
  model?: { label: string; points: readonly ModelComparisonPoint[] };
  /** Chart title. Default "Residual <name> from P-V-T data". */
  title?: string;
  /** Size in px. Defaults 560 x 340. */
  width?: number;
  height?: number;
}

const NAMES = {
  a: "Helmholtz energy",
  s: "entropy",
  u: "internal energy",
  h: "enthalpy",
  g: "Gibbs energy",
};
/** A Vega-Lite chart of one departure against density with its uncertainty band, per isotherm. */
export function departureBandChart(
  result: PvtRouteResult,
  options: DepartureBandChartOptions = {},
): VegaLiteSpec {
  const { quantity: q, coverageFactor: k, unit, symbol } = checkDepartureChartOptions(options);
  const rows = result.isotherms.flatMap((iso) =>
    iso.states.map((s) => ({
      isotherm: isothermLabel(iso.temperatureK),
      rho: s.densityMolPerM3,
      value: s.residual[q],
      lower: s.residual[q] - k * s.uncertainty[q],
      upper: s.residual[q] + k * s.uncertainty[q],
      u: s.uncertainty[q],
    })),
  );
  const x = densityEncoding();
  const labels = result.isotherms.map((iso) => isothermLabel(iso.temperatureK));
  const color = isothermColorEncoding(labels);
  // Bands readable where several overlap, legend from the lines (bandLayers).
  const layers: Record<string, unknown>[] = [
    ...bandLayers(rows, labels, {
      field: "lower",
      type: "quantitative",
      title: `Residual ${NAMES[q]} / ${symbol}`,
    }),
    {
      data: { values: rows },
      mark: { type: "line", point: true },
      encoding: {
        x,
        y: { field: "value", type: "quantitative" },
        color,
        tooltip: [
          { field: "isotherm", type: "nominal" },
          { field: "rho", type: "quantitative", title: "ρ / mol/m³", format: ".5~g" },
          { field: "value", type: "quantitative", title: `${q}_res / ${symbol}`, format: ".5~g" },
          { field: "u", type: "quantitative", title: `u / ${symbol}`, format: ".2~g" },
        ],
      },
    },
  ];
  if (options.model) {
    layers.push({
      data: {
        values: options.model.points.map((p) => ({
          isotherm: isothermLabel(p.temperatureK),
          rho: p.densityMolPerM3,
          model: p.model[q],
        })),
      },
      mark: { type: "line", strokeDash: [6, 4] },
      encoding: { x, y: { field: "model", type: "quantitative" }, color },
    });
  }
  return {
    $schema: VEGA_LITE_SCHEMA,
    config: themeConfig(),
    title: {
      text: options.title ?? `Residual ${NAMES[q]} from P-V-T data`,
      subtitle:
        `bands: ±${k} standard uncertainties` +
        (options.model ? `; dashed: ${options.model.label}` : ""),
    },
    width: options.width ?? 560,
    height: options.height ?? 340,
    layer: layers,
    usermeta: {
      isochor: {
        chart: "pvt-departure-band",
        units: { molarDensity: "mol/m3", [q]: unit },
        warnings: [],
      },
    },
  } as VegaLiteSpec;
}
