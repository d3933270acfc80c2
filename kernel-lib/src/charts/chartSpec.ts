/**
 * The spec type every chart builder returns: the library's own public Vega-Lite type (display/),
 * re-exported under the charts' name. Type-only import, so charts/ stays browser-safe.
 */
import type { VegaLiteSpec } from "../display/vegaLiteSpec.js";

/** A Vega-Lite v6 specification built by one of the chart builders; plain JSON, free to edit. */
export type ChartSpec = VegaLiteSpec;

/** What a builder records about itself in `spec.usermeta.isochor`, so overlays can match it. */
export interface ChartMeta {
  /** Which builder made the spec, e.g. "pressure-enthalpy". */
  readonly chart: string;
  /** Display unit symbol per quantity kind used on the axes, e.g. { pressure: "MPa" }. */
  readonly units: Readonly<Record<string, string>>;
  /** Molar mass used for a mass basis, kg/mol; absent for a molar basis. */
  readonly molarMassKgPerMol?: number;
  /** Warnings the builder raised (points dropped from a log axis, ...), de-duplicated. */
  readonly warnings: readonly string[];
}

/** Reads the builder metadata of a spec made by this library (undefined for other specs). */
export function chartMeta(spec: ChartSpec): ChartMeta | undefined {
  const usermeta = spec["usermeta"] as { isochor?: ChartMeta } | undefined;
  return usermeta?.isochor;
}
