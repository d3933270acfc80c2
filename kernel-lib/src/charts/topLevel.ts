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
  const spec: ChartSpec = {
    $schema: VEGA_LITE_SCHEMA,
    title: title as ChartSpec["title"],
    ...(sized
      ? {
          width: checkSize("width", options.width, DEFAULT_WIDTH),
          height: checkSize("height", options.height, DEFAULT_HEIGHT),
        }
      : {}),
    ...body,
    config: themeConfig(),
    usermeta: { isochor: meta },
  };
  return spec;
}
