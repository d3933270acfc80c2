/**
 * The HTML fragment of one chart: a static SVG rendered in Node, upgraded in place to a live
 * vega-embed view when scripts run and the runtime (vegaRuntimeScript) is on the page.
 *
 *   <figure class="isochor-chart" id=... data-isochor-chart="static">
 *     <div class="isochor-chart-static"><img src="data:image/svg+xml;base64,..."></div>
 *                                                            shown until the live view is up
 *     <div class="isochor-chart-live"></div>                 vega-embed renders here
 *     <script type="application/json"> spec </script>        escaped for the script element
 *     <script> boot </script>                                waits for window.vegaEmbed (loads it
 *                                                            from the notebook server when the
 *                                                            page lacks it: pageLoader.ts), embeds
 *     <figcaption> caption (escaped) </figcaption>
 *   </figure>
 *
 * The static chart is an <img> with the SVG as a data: URI, not inline <svg>: the classic
 * notebook's sanitizer removes inline SVG from untrusted outputs (a notebook reopened after
 * nbconvert or `isochor run` is untrusted) but keeps images, so the fallback survives there.
 *
 * Marker for checkers: `data-isochor-chart` goes "static" -> "live" once vega-embed has rendered,
 * or "failed" (with a console error) if it could not. Untrusted notebooks and pages without
 * scripts keep the static SVG, which is the intended fallback; a page that runs scripts but cannot
 * get the runtime keeps it too, with a note under it naming that cause and the way out.
 */
import { randomBytes } from "node:crypto";
import { InputError } from "../errors.js";
import { chartTitle } from "./chartTitle.js";
import { escapeHtml, jsonForScript } from "./escapeHtml.js";
import { renderSvg } from "./renderSvg.js";
import { withTheme } from "../charts/theme.js";
import { LOAD_AFTER_MS, pageLoaderSource, RUNTIME_FILES } from "./pageLoader.js";
import { vegaRuntimeScript } from "./vegaRuntime.js";
import type { VegaLiteSpec } from "./vegaLiteSpec.js";

/** Attribute on each chart's container: "static", then "live" or "failed". */
export const CHART_STATE_ATTRIBUTE = "data-isochor-chart";

/** Options of {@link chartHtml}. */
export interface ChartHtmlOptions {
  /**
   * Put the inline runtime (about 830 KB) in front of the chart. Default false: the caller sends
   * it once per page (showChart does this for the first chart of a kernel session; records put it
   * in the page head).
   */
  includeRuntime?: boolean;
  /** Caption shown under the chart, as plain text (escaped). Default: none. */
  caption?: string;
  /**
   * How long the live upgrade waits for the runtime to appear on the page, in milliseconds,
   * before it leaves the static SVG in place. Default 15000.
   */
  runtimeWaitMs?: number;
}

/** Chart element ids: random, so two outputs on one page never collide. */
function newChartId(): string {
  return "isochor-chart-" + randomBytes(6).toString("hex");
}

/** What a page without the runtime tells its reader, and the way out (shared with explorers). */
export const RUNTIME_MISSING_NOTE =
  "The chart runtime is not on this page: the kernel sends it inline with the first chart or " +
  "explorer of its session, and this page was opened or reloaded after that. Loading it from " +
  "the notebook server failed too: ";
/** The way out, after the reason. */
export const RUNTIME_MISSING_WAY_OUT =
  ". Run resetDisplaySession() in a cell and re-run this one, or restart the kernel.";

/**
 * Browser-side boot of one chart. Plain ES2017, no template literals with user text: the id is
 * generated here, the spec travels as JSON data in its own element and is never evaluated as code.
 * Without the runtime on the page it loads it from the notebook server (pageLoader.ts) after a
 * short grace time; when that fails too, a note under the chart names the cause.
 */
function bootScript(id: string, runtimeWaitMs: number): string {
  return `(function () {
  var id = ${JSON.stringify(id)}, waited = 0, asked = false, refused = false;
  var reason = "it did not arrive in time";
  ${pageLoaderSource()}
  function ready() { return typeof window.vegaEmbed === "function"; }
  function giveUp(root) {
    var note = document.createElement("div");
    note.className = "isochor-chart-note";
    note.style.cssText = "font-size:0.85em;opacity:0.75";
    note.textContent = "Static chart. " + ${JSON.stringify(RUNTIME_MISSING_NOTE)} + reason +
      ${JSON.stringify(RUNTIME_MISSING_WAY_OUT)};
    root.appendChild(note);
    console.warn("isochor chart " + id + " stayed static: " + reason);
  }
  function start() {
    var root = document.getElementById(id);
    if (!root || root.getAttribute(${JSON.stringify(CHART_STATE_ATTRIBUTE)}) !== "static") return;
    if (!ready()) {
      if (!asked && waited >= ${LOAD_AFTER_MS}) {
        asked = true;
        isochorLoad(${JSON.stringify(RUNTIME_FILES.chart)}, ready).then(start, function (error) {
          reason = error.message;
          refused = true;
        });
      }
      if (refused || waited >= ${runtimeWaitMs}) { giveUp(root); return; }
      waited += 100;
      setTimeout(start, 100);
      return;
    }
    root.setAttribute(${JSON.stringify(CHART_STATE_ATTRIBUTE)}, "starting");
    var spec = JSON.parse(root.querySelector("script.isochor-chart-spec").textContent);
    var live = root.querySelector(".isochor-chart-live");
    window.vegaEmbed(live, spec, { actions: false, renderer: "svg" }).then(function () {
      root.querySelector(".isochor-chart-static").style.display = "none";
      live.style.display = "";
      var stale = root.querySelector(".isochor-chart-note");
      if (stale) stale.parentNode.removeChild(stale);
      root.setAttribute(${JSON.stringify(CHART_STATE_ATTRIBUTE)}, "live");
    }, function (error) {
      root.setAttribute(${JSON.stringify(CHART_STATE_ATTRIBUTE)}, "failed");
      console.error("isochor chart " + id + " stayed static: " + (error && error.message));
    });
  }
  if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", start);
  else start();
})();`;
}

/**
 * Builds the HTML fragment for one chart: static SVG now, live vega-embed view when scripts run.
 * @param spec A Vega-Lite v6 specification with inline data.
 * @param options See {@link ChartHtmlOptions}.
 * @returns HTML text, safe to place in a notebook output or a page.
 * @example
 * const html = await chartHtml(spec, { caption: "Z against pressure, Corvid Point feed gas" });
 */
export async function chartHtml(
  spec: VegaLiteSpec,
  options: ChartHtmlOptions = {},
): Promise<string> {
  return (await chartFigure(spec, options)).html;
}

/**
 * {@link chartHtml} with the static SVG it embeds, for writers that also keep the image as a file
 * (the Markdown form of a calculation record).
 */
export async function chartFigure(
  spec: VegaLiteSpec,
  options: ChartHtmlOptions = {},
): Promise<{ html: string; svg: string }> {
  const includeRuntime = options.includeRuntime ?? false;
  const runtimeWaitMs = options.runtimeWaitMs ?? 15000;
  if (!(runtimeWaitMs >= 0) || !Number.isFinite(runtimeWaitMs)) {
    throw new InputError({
      input: "options.runtimeWaitMs",
      unit: "ms",
      validRange: "a finite number >= 0",
      received: runtimeWaitMs,
    });
  }
  if (options.caption !== undefined && typeof options.caption !== "string") {
    throw new InputError({
      input: "options.caption",
      unit: "-",
      validRange: "a string",
      received: options.caption,
    });
  }
  spec = withTheme(spec);
  const svg = await renderSvg(spec);
  const width = /^<svg[^>]*\swidth="([\d.]+)"/.exec(svg)?.[1];
  const height = /^<svg[^>]*\sheight="([\d.]+)"/.exec(svg)?.[1];
  const size = width && height ? ` width="${width}" height="${height}"` : "";
  const alt = escapeHtml(options.caption ?? chartTitle(spec) ?? "Chart");
  const image = `<img${size} alt="${alt}" src="data:image/svg+xml;base64,${Buffer.from(svg, "utf8").toString("base64")}">`;
  const id = newChartId();
  const caption =
    options.caption !== undefined
      ? `<figcaption class="isochor-chart-caption" style="font-size:0.9em;opacity:0.8">${escapeHtml(options.caption)}</figcaption>`
      : "";
  const html =
    (includeRuntime ? vegaRuntimeScript() + "\n" : "") +
    `<figure class="isochor-chart" id="${id}" ${CHART_STATE_ATTRIBUTE}="static" style="margin:0.5em 0">` +
    `<div class="isochor-chart-static">${image}</div>` +
    `<div class="isochor-chart-live" style="display:none"></div>` +
    `<script type="application/json" class="isochor-chart-spec">${jsonForScript(spec)}</script>` +
    `<script>${bootScript(id, runtimeWaitMs)}</script>` +
    caption +
    `</figure>`;
  return { html, svg };
}
