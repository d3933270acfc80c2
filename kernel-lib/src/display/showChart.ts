/**
 * Shows a chart in the current tslab cell, in one call and one output (text/html: nbconvert's HTML
 * export would strip image/svg+xml). The first chart of a kernel session carries the runtime; a
 * page that lacks it (refreshed or reopened on a running kernel) loads it from the notebook
 * server, see pageLoader.ts.
 */
import { chartHtml } from "./chartHtml.js";
import { displaySession } from "./displaySession.js";
import { displayHtml } from "./tslabDisplay.js";
import type { VegaLiteSpec } from "./vegaLiteSpec.js";

/** Options of {@link showChart}. */
export interface ShowChartOptions {
  /**
   * Send the inline runtime with this chart even if it was sent before in this kernel session
   * (for a page without a notebook server behind it that serves the runtime: see pageLoader.ts).
   * Default: only with the first chart of the session.
   */
  includeRuntime?: boolean;
  /** Caption under the chart, as plain text (escaped). Default: none. */
  caption?: string;
}

/**
 * Displays a Vega-Lite chart in the current tslab notebook cell: static SVG at once, live view
 * when the notebook is trusted.
 * @param spec A Vega-Lite v6 specification with inline data.
 * @param options See {@link ShowChartOptions}.
 * @example
 * await showChart(spec, { caption: "Feed gas Z, Corvid Point crude unit" });
 */
export async function showChart(spec: VegaLiteSpec, options: ShowChartOptions = {}): Promise<void> {
  const session = displaySession();
  const wasSent = session.runtimeSent;
  const includeRuntime = options.includeRuntime ?? !wasSent;
  // Claimed before the await, so two charts started together do not both carry the runtime.
  if (includeRuntime) session.runtimeSent = true;
  try {
    const html = await chartHtml(spec, { includeRuntime, caption: options.caption });
    displayHtml(html, {
      name: "showChart",
      otherwise: "use chartHtml() for HTML or savePng() for an image",
    });
  } catch (error) {
    session.runtimeSent = wasSent;
    throw error;
  }
}
