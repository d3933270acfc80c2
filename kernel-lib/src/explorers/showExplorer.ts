/**
 * Shows an explorer in the current tslab cell as ONE text/html output: the chart runtime and the
 * explorers' bundle (each only the first time in the kernel session, through display's session),
 * then the explorer fragment (explorerHtml). Everything the page needs is inline: it works
 * offline, in exported HTML and in the records. A page that missed the inline copies (refreshed
 * or reopened on a running kernel) loads them from its notebook server (display/pageLoader.ts).
 */
import { displaySession } from "../display/displaySession.js";
import { displayHtml } from "../display/tslabDisplay.js";
import { vegaRuntimeScript } from "../display/vegaRuntime.js";
import type { ExplorerOptionsByKind } from "./createExplorerState.js";
import { explorerHtml, type ExplorerHtmlOptions } from "./explorerHtml.js";
import type { ExplorerKind } from "./explorerState.js";
import { widgetsBundleScript } from "./widgetsBundle.js";

/** Options of {@link showExplorer} besides the explorer's own. */
export interface ShowExplorerOptions extends ExplorerHtmlOptions {
  /**
   * Send the chart runtime and the bundle again even if this kernel session sent them before
   * (for a page without a notebook server that serves them: display/pageLoader.ts). Default:
   * only the first time.
   */
  includeScripts?: boolean;
}

/**
 * Displays an explorer: sliders and selectors that recompute the chart in the page with the
 * bundled engine (no kernel round trip).
 * @param kind "isotherms", "departures" or "pressure-enthalpy".
 * @param options The explorer's options (components, model, ranges, units, title) and
 *   {@link ShowExplorerOptions}.
 * @example
 * await showExplorer("isotherms", { components: "carbon dioxide", temperatureK: 290 });
 */
export async function showExplorer<K extends ExplorerKind>(
  kind: K,
  options: ExplorerOptionsByKind[K] & ShowExplorerOptions,
): Promise<void> {
  const session = displaySession();
  const bundle = widgetsBundleScript();
  const runtimeWasSent = session.runtimeSent;
  const bundleWasSent = session.scriptsSent.has(bundle.key);
  const sendRuntime = options.includeScripts ?? !runtimeWasSent;
  const sendBundle = options.includeScripts ?? !bundleWasSent;
  // Claimed before the await, so two outputs started together do not both carry the scripts.
  if (sendRuntime) session.runtimeSent = true;
  if (sendBundle) session.scriptsSent.add(bundle.key);
  try {
    const fragment = await explorerHtml(kind, options);
    const html =
      (sendRuntime ? vegaRuntimeScript() + "\n" : "") +
      (sendBundle ? bundle.script + "\n" : "") +
      fragment;
    displayHtml(html, {
      name: "showExplorer",
      otherwise: "use explorerHtml() with vegaRuntimeScript() and widgetsBundleScript()",
    });
  } catch (error) {
    session.runtimeSent = runtimeWasSent;
    if (!bundleWasSent) session.scriptsSent.delete(bundle.key);
    throw error;
  }
}
