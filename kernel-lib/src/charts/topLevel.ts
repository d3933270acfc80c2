/**
 * The top level of every chart spec: schema, title, size, theme and the builder's metadata.
 * Internal to the chart builders.
 *
 * Safety: user strings (titles, series labels, state names) go into a spec only as DATA values or
 * as literal title text. Field names, expressions and formats are fixed strings written here, so
 * a label like `datum.x + alert(1)` or `<script>` can never be evaluated, only shown.
 */
import type { AxisPlan } from "./axisPlan.js";
import type { ChartMeta, ChartSpec } from "./chartSpec.js";
import { checkSize, checkText, type BaseChartOptions } from "./chartOptions.js";
import { applyLogTicks } from "./logTicks.js";
import { applyLinearTicks } from "./linearTicks.js";
import { DEFAULT_HEIGHT, DEFAULT_WIDTH, themeConfig } from "./theme.js";
import type { WarningList } from "./warningList.js";

export const VEGA_LITE_SCHEMA = "https://vega.github.io/schema/vega-lite/v6.json";

/** The top level of every spec: schema, title, size, theme and builder metadata. */
export function topLevel(
  chart: string,
  defaultTitle: string,
  options: BaseChartOptions,
  axes: readonly AxisPlan[],
  warnings: WarningList,
  body: Record<string, unknown>,
  extraMeta: { molarMassKgPerMol?: number } = {},
  sized = true,
): ChartSpec {
  const title: Record<string, unknown> = {
    text: options.title === undefined ? defaultTitle : checkText("title", options.title),
  };
  if (options.subtitle !== undefined) title["subtitle"] = checkText("subtitle", options.subtitle);
  // A legend with one entry takes width and says little: drop it and name the series in the
  // subtitle instead ("Isotherm: 40 °C").
  const single = dropSingleEntryLegends(body);
  if (single.length > 0) {
    const note = single.join("; ");
    // A second subtitle line: appended to a long subtitle it would widen the chart.
    title["subtitle"] =
      typeof title["subtitle"] === "string" && title["subtitle"] !== ""
        ? [title["subtitle"], note]
        : note;
  }
  const units: Record<string, string> = {};
  for (const axis of axes) units[axis.kind] = axis.unit.id;
  const meta: ChartMeta = {
    chart,
    units,
    ...(extraMeta.molarMassKgPerMol !== undefined
      ? { molarMassKgPerMol: extraMeta.molarMassKgPerMol }
      : {}),
    warnings: warnings.list(),
  };
  applyLogTicks(body);
  const size = sized
    ? {
        width: checkSize("width", options.width, DEFAULT_WIDTH),
        height: checkSize("height", options.height, DEFAULT_HEIGHT),
      }
    : {};
  applyLinearTicks(body, size);
  const spec: ChartSpec = {
    $schema: VEGA_LITE_SCHEMA,
    title: title as ChartSpec["title"],
    ...size,
    ...body,
    config: themeConfig(),
    usermeta: { isochor: meta },
  };
  return spec;
}

const LEGEND_CHANNELS = ["color", "strokeDash", "shape", "fill", "stroke"] as const;

/**
 * Turns off every legend of a spec body whose scale domain has one entry; returns the series it
 * named as "Title: entry" (once per distinct pair). Changes `body`.
 */
export function dropSingleEntryLegends(body: Record<string, unknown>): string[] {
  const found = new Set<string>();
  const visit = (node: unknown): void => {
    if (node === null || typeof node !== "object") return;
    const spec = node as Record<string, unknown>;
    for (const key of ["layer", "concat", "hconcat", "vconcat"]) {
      if (Array.isArray(spec[key])) for (const child of spec[key] as unknown[]) visit(child);
    }
    const encoding = spec["encoding"] as Record<string, Record<string, unknown>> | undefined;
    if (!encoding) return;
    for (const channel of LEGEND_CHANNELS) {
      const enc = encoding[channel];
      const domain = (enc?.["scale"] as { domain?: unknown } | undefined)?.domain;
      if (!enc || !Array.isArray(domain) || domain.length !== 1 || enc["legend"] === null) continue;
      if (typeof enc["field"] !== "string") continue;
      enc["legend"] = null;
      const name = typeof enc["title"] === "string" ? enc["title"] : "";
      found.add(name === "" ? String(domain[0]) : `${name}: ${String(domain[0])}`);
    }
  };
  visit(body);
  return [...found];
}
