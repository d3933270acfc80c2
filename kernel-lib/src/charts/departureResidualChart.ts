/**
 * Residual plot of a model comparison (compareWithModel.ts): data-derived departure minus the
 * model's, against density, one colour per isotherm, with the data's +/- k standard uncertainty
 * band around zero: where a model's curve leaves the band, the data say it is wrong there.
 * A pure function returning an editable Vega-Lite spec; SI molar units on the axes.
 */
import { themeConfig } from "./theme.js";
import { VEGA_LITE_SCHEMA } from "./topLevel.js";
import type { ChartSpec as VegaLiteSpec } from "./chartSpec.js";
import { InputError } from "../errors.js";
import type { ModelComparisonPoint } from "../pvt/compareWithModel.js";
import {
  checkDepartureChartOptions,
  densityEncoding,
  isothermColorEncoding,
  isothermLabel,
  bandLayers,
} from "./departureChartParts.js";
import type { PvtRouteResult } from "../pvt/departuresFromPvt.js";

/** Options of {@link departureResidualChart}. */
export interface DepartureResidualChartOptions {
  /** Which residual property. Default "h". */
  quantity?: "a" | "s" | "u" | "h" | "g";
  /** Coverage factor of the band. Default 2. */
  coverageFactor?: number;
  /** Model name for the title. Default "model". */
  modelLabel?: string;
  width?: number;
  height?: number;
}

/** A Vega-Lite chart of the data-minus-model differences in units of their uncertainty. */
export function departureResidualChart(
  result: PvtRouteResult,
  comparison: readonly ModelComparisonPoint[],
  options: DepartureResidualChartOptions = {},
): VegaLiteSpec {
  const { quantity: q, coverageFactor: k, unit, symbol } = checkDepartureChartOptions(options);
  if (comparison.length === 0) {
    throw new InputError({
      input: "comparison",
      unit: "-",
      validRange: "at least one compared state",
      received: 0,
    });
  }
  const band = result.isotherms.flatMap((iso) =>
    iso.states.map((s) => ({
      isotherm: isothermLabel(iso.temperatureK),
      rho: s.densityMolPerM3,
      lower: -k * s.uncertainty[q],
      upper: k * s.uncertainty[q],
    })),
  );
  const rows = comparison.map((p) => ({
    isotherm: isothermLabel(p.temperatureK),
    rho: p.densityMolPerM3,
    difference: p.difference[q],
    z: p.z[q],
  }));
  const x = densityEncoding();
  const labels = result.isotherms.map((iso) => isothermLabel(iso.temperatureK));
  const color = isothermColorEncoding(labels);
  const model = options.modelLabel ?? "model";
  return {
    $schema: VEGA_LITE_SCHEMA,
    config: themeConfig(),
    title: {
      text: `Data minus ${model}: residual ${q}`,
      subtitle: `band: ±${k} standard uncertainties of the data`,
    },
    width: options.width ?? 560,
    height: options.height ?? 260,
    layer: [
      // Bands readable where several overlap, legend from the lines (bandLayers).
      ...bandLayers(band, labels, {
        field: "lower",
        type: "quantitative",
        title: `Δ${q}_res (data − ${model}) / ${symbol}`,
      }),
      {
        data: { values: rows },
        mark: { type: "line", point: true },
        encoding: {
          x,
          y: { field: "difference", type: "quantitative" },
          color,
          tooltip: [
            { field: "isotherm", type: "nominal" },
            { field: "rho", type: "quantitative", format: ".5~g" },
            { field: "difference", type: "quantitative", format: ".4~g" },
            { field: "z", type: "quantitative", title: "difference / u", format: ".2f" },
          ],
        },
      },
      {
        data: { values: [{ zero: 0 }] },
        mark: { type: "rule", color: "#555" },
        encoding: { y: { field: "zero", type: "quantitative" } },
      },
    ],
    usermeta: {
      isochor: {
        chart: "pvt-departure-residuals",
        units: { molarDensity: "mol/m3", [q]: unit },
        warnings: [],
      },
    },
  } as VegaLiteSpec;
}
