/**
 * display/: charts in notebook cells, in records and as images (Node side).
 *
 *   VegaLiteSpec --renderSvg--> SVG --chartHtml--> HTML fragment (static SVG + live upgrade)
 *                                |                  --showChart--> tslab cell (runtime once)
 *                                +--chartPng/savePng--> PNG (resvg)
 */
export type { VegaLiteSpec, VegaLiteData } from "./vegaLiteSpec.js";
export { renderSvg } from "./renderSvg.js";
export { chartHtml, CHART_STATE_ATTRIBUTE } from "./chartHtml.js";
export type { ChartHtmlOptions } from "./chartHtml.js";
export { showChart } from "./showChart.js";
export { showTable } from "./showTable.js";
export type { ShowChartOptions } from "./showChart.js";
export { resetDisplaySession } from "./displaySession.js";
export { chartPng, savePng, systemFontsAvailable } from "./chartPng.js";
export type { ChartPngOptions } from "./chartPng.js";
export { vegaRuntimeScript, RUNTIME_MARKER_ATTRIBUTE } from "./vegaRuntime.js";
export { escapeHtml } from "./escapeHtml.js";
