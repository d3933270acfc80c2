/**
 * The HTML fragment of one explorer (Node side):
 *
 *   <div class="isochor-explorer" id=... data-isochor-explorer="static">
 *     <div class="isochor-explorer-controls"></div>            the page's view draws controls here
 *     <figure class="isochor-chart" data-isochor-chart="static">
 *       <div class="isochor-chart-static"><img src="data:image/svg+xml;base64,..."></div>
 *                                                               the starting chart, drawn in Node
 *       <div class="isochor-chart-live"></div>                  vega-embed draws here
 *     </figure>
 *     <div class="isochor-explorer-status"> note (escaped) </div>
 *     <div class="isochor-explorer-table"> starting table (tables/tableHtml, escaped) </div>
 *     <script type="application/json" class="isochor-explorer-state"> state </script>
 *     <script> boot </script>                                   waits for the bundle and runtime
 *   </div>
 *
 * Without scripts (an untrusted notebook, nbconvert without the runtime) the static chart and
 * table stay and the note says how to get the controls. With scripts, the bundle's
 * `isochorWidgets.mountExplorer(root)` reads the state (JSON, never evaluated as code) and takes
 * over; the figure's `data-isochor-chart` goes "live" as for any chart, so the record checker
 * counts explorers too, and `data-isochor-explorer` goes "live" (or "failed").
 */
import { randomBytes } from "node:crypto";
import {
  CHART_STATE_ATTRIBUTE,
  RUNTIME_MISSING_NOTE,
  RUNTIME_MISSING_WAY_OUT,
} from "../display/chartHtml.js";
import { LOAD_AFTER_MS, pageLoaderSource, RUNTIME_FILES } from "../display/pageLoader.js";
import { escapeHtml, jsonForScript } from "../display/escapeHtml.js";
import { renderSvg } from "../display/renderSvg.js";
import { InputError } from "../errors.js";
import { createExplorerState, type ExplorerOptionsByKind } from "./createExplorerState.js";
import { explorerDefinition } from "./explorerDefinitions.js";
import { ExplorerFluids } from "./explorerFluids.js";
import type { ExplorerKind, ExplorerState } from "./explorerState.js";

/** Attribute on each explorer's root: "static", then "live" or "failed". */
export const EXPLORER_STATE_ATTRIBUTE = "data-isochor-explorer";

/** Options of the HTML fragment (besides the explorer's own options). */
export interface ExplorerHtmlOptions {
  /** Caption under the explorer (plain text, escaped). Default: none. */
  caption?: string;
  /**
   * How long the page waits for the bundle and chart runtime before leaving the static chart,
   * ms. Default 15000.
   */
  runtimeWaitMs?: number;
}

/**
 * Browser-side boot of one explorer: waits for the chart runtime and the bundle; a page without
 * them loads them from the notebook server (display/pageLoader.ts) after a short grace time, and
 * when that fails the note under the explorer names the cause (not trust: this script runs).
 */
function bootScript(id: string, runtimeWaitMs: number): string {
  return `(function () {
  var id = ${JSON.stringify(id)}, waited = 0, asked = false, refused = false;
  var reason = "it did not arrive in time";
  ${pageLoaderSource()}
  function runtimeReady() { return typeof window.vegaEmbed === "function"; }
  function bundleReady() { return !!window.isochorWidgets; }
  function failed(error) { reason = error.message; refused = true; }
  function giveUp(root) {
    var note = root.querySelector(".isochor-explorer-note");
    var text = runtimeReady()
      ? "Static picture of the starting state: the explorers' code is not on this page (the kernel " +
        "sends it with the first explorer of its session, and this page was opened or reloaded " +
        "after that); loading it from the notebook server failed too: " + reason +
        ${JSON.stringify(RUNTIME_MISSING_WAY_OUT)}
      : "Static picture of the starting state. " + ${JSON.stringify(RUNTIME_MISSING_NOTE)} + reason +
        ${JSON.stringify(RUNTIME_MISSING_WAY_OUT)};
    if (note) note.textContent = text;
    console.warn("isochor explorer " + id + " stayed static: " + reason);
  }
  function start() {
    var root = document.getElementById(id);
    if (!root || root.getAttribute(${JSON.stringify(EXPLORER_STATE_ATTRIBUTE)}) !== "static") return;
    if (!bundleReady() || !runtimeReady()) {
      if (!asked && waited >= ${LOAD_AFTER_MS}) {
        asked = true;
        Promise.all([
          isochorLoad(${JSON.stringify(RUNTIME_FILES.chart)}, runtimeReady),
          isochorLoad(${JSON.stringify(RUNTIME_FILES.explorers)}, bundleReady),
        ]).then(start, failed);
      }
      if (refused || waited >= ${runtimeWaitMs}) { giveUp(root); return; }
      waited += 100;
      setTimeout(start, 100);
      return;
    }
    window.isochorWidgets.mountExplorer(root);
  }
  if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", start);
  else start();
})();`;
}

/**
 * The fragment of an explorer for a given state (after createExplorerState).
 * @returns HTML text, safe to place in a notebook output or a page; the page also needs the chart
 *   runtime (vegaRuntimeScript) and the bundle (widgetsBundleScript) once.
 */
export async function explorerStateHtml(
  state: ExplorerState,
  options: ExplorerHtmlOptions = {},
): Promise<string> {
  const runtimeWaitMs = options.runtimeWaitMs ?? 15000;
  if (!(runtimeWaitMs >= 0 && runtimeWaitMs < Infinity)) {
    throw new InputError({
      input: "runtimeWaitMs",
      unit: "ms",
      validRange: "a finite number >= 0",
      received: runtimeWaitMs,
    });
  }
  if (options.caption !== undefined && typeof options.caption !== "string") {
    throw new InputError({
      input: "caption",
      unit: "-",
      validRange: "a string",
      received: options.caption,
    });
  }
  const definition = explorerDefinition(state);
  const fluids = new ExplorerFluids(state.components);
  const spec = definition.chart(state, fluids);
  const svg = await renderSvg(spec);
  const width = /^<svg[^>]*\swidth="([\d.]+)"/.exec(svg)?.[1];
  const height = /^<svg[^>]*\sheight="([\d.]+)"/.exec(svg)?.[1];
  const size = width && height ? ` width="${width}" height="${height}"` : "";
  const alt = escapeHtml(state.title ?? `Explorer: ${state.kind}`);
  const image = `<img${size} alt="${alt}" src="data:image/svg+xml;base64,${Buffer.from(svg, "utf8").toString("base64")}">`;
  const table = definition.table ? definition.table(state, fluids) : "";
  const status = definition.status ? definition.status(state, fluids) : "";
  const id = "isochor-explorer-" + randomBytes(6).toString("hex");
  const note =
    "Static picture of the starting state. The controls appear when the page runs scripts " +
    "(a trusted notebook, or the HTML record).";
  const caption =
    options.caption !== undefined
      ? `<div class="isochor-explorer-caption" style="font-size:0.9em;opacity:0.8">${escapeHtml(options.caption)}</div>`
      : "";
  return (
    `<div class="isochor-explorer" id="${id}" ${EXPLORER_STATE_ATTRIBUTE}="static" style="margin:0.5em 0;max-width:100%">` +
    `<div class="isochor-explorer-controls"></div>` +
    `<figure class="isochor-chart" ${CHART_STATE_ATTRIBUTE}="static" style="margin:0.3em 0">` +
    `<div class="isochor-chart-static">${image}</div>` +
    `<div class="isochor-chart-live" style="display:none"></div>` +
    `</figure>` +
    `<div class="isochor-explorer-status" style="font-size:0.9em;margin:0.2em 0">${escapeHtml(status)}</div>` +
    `<div class="isochor-explorer-note" style="font-size:0.85em;opacity:0.75">${escapeHtml(note)}</div>` +
    `<div class="isochor-explorer-table" style="overflow-x:auto">${table}</div>` +
    caption +
    `<script type="application/json" class="isochor-explorer-state">${jsonForScript(state)}</script>` +
    `<script>${bootScript(id, runtimeWaitMs)}</script>` +
    `</div>`
  );
}

/**
 * The fragment of an explorer from its options.
 * @example const html = await explorerHtml("isotherms", { components: "carbon dioxide" });
 */
export async function explorerHtml<K extends ExplorerKind>(
  kind: K,
  options: ExplorerOptionsByKind[K] & ExplorerHtmlOptions,
): Promise<string> {
  const state = createExplorerState(kind, options);
  return explorerStateHtml(state, options);
}
