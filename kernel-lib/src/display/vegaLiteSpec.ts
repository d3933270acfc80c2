/**
 * The library's own public type for a Vega-Lite specification.
 *
 * Deliberately permissive: it names the fields an engineer edits most (data, mark, encoding,
 * layers, size, title) and accepts every other Vega-Lite v6 field through an index signature.
 * The full schema is checked where it matters, by vega-lite's compiler when a chart is rendered.
 * vega-lite's own TypeScript types are not used in public signatures: they do not compile under
 * the TypeScript 5.0 that tslab ships, and they would tie every notebook to one vega-lite release.
 *
 * @example
 * const spec: VegaLiteSpec = {
 *   data: { values: [{ pressureBar: 1, z: 0.99 }, { pressureBar: 50, z: 0.81 }] },
 *   mark: "line",
 *   encoding: {
 *     x: { field: "pressureBar", type: "quantitative", title: "Pressure / bar" },
 *     y: { field: "z", type: "quantitative", title: "Compressibility factor Z / -" },
 *   },
 * };
 */
export interface VegaLiteSpec {
  /** Schema URL, e.g. "https://vega.github.io/schema/vega-lite/v6.json" (not fetched). */
  $schema?: string;
  /** Chart title: text, or a title object ({ text, subtitle, ... }). */
  title?: string | string[] | { text: string | string[]; [key: string]: unknown };
  /** Inline data. URL data is refused by the renderers: charts and records stay offline. */
  data?: VegaLiteData;
  /** Mark type ("line", "point", "area", "rect", ...) or a mark definition object. */
  mark?: string | { type: string; [key: string]: unknown };
  /** Encoding channels (x, y, color, strokeDash, tooltip, ...). */
  encoding?: Record<string, unknown>;
  /** Layered sub-charts drawn on shared axes. */
  layer?: VegaLiteSpec[];
  /** Concatenated or faceted sub-charts. */
  hconcat?: VegaLiteSpec[];
  vconcat?: VegaLiteSpec[];
  /** Plot width and height in CSS pixels ("container" fills the output area when live). */
  width?: number | "container";
  height?: number | "container";
  /** Any other Vega-Lite field (transform, params, resolve, config, ...). */
  [key: string]: unknown;
}

/** Inline data for a chart: rows of plain values, optionally named. */
export interface VegaLiteData {
  /** Rows of data, one object per point. */
  values?: Array<Record<string, unknown>> | unknown[];
  /** Name of the data set (for data referenced by name in layers or params). */
  name?: string;
  /** Any other data field (format, ...). `url` is refused. */
  [key: string]: unknown;
}
