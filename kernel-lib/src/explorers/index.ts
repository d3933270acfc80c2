/**
 * explorers/: interactive charts that recompute in the page (tslab has no comm channel).
 *
 *   options --createExplorerState--> state (JSON, widget-protocol names)
 *   state --definition.chart (charts/ builders + engine)--> spec --renderSvg--> static fallback
 *   state + bundle + runtime --showExplorer--> one text/html output
 *   page: isochorWidgets.mountExplorer(root) -> model (state) + view (controls, live chart)
 *
 * The definitions (controls, update, chart, table) are browser-safe and bundled by widgets/;
 * explorerHtml, showExplorer and widgetsBundle need Node.
 */
export { showExplorer } from "./showExplorer.js";
export type { ShowExplorerOptions } from "./showExplorer.js";
export { explorerHtml, explorerStateHtml, EXPLORER_STATE_ATTRIBUTE } from "./explorerHtml.js";
export type { ExplorerHtmlOptions } from "./explorerHtml.js";
export { widgetsBundleScript } from "./widgetsBundle.js";
export { createExplorerState } from "./createExplorerState.js";
export type {
  ExplorerOptionsBase,
  ExplorerOptionsByKind,
  IsothermExplorerOptions,
  DepartureExplorerOptions,
  PressureEnthalpyExplorerOptions,
} from "./createExplorerState.js";
export { EXPLORER_KINDS } from "./explorerState.js";
export type {
  ExplorerKind,
  ExplorerModelId,
  ExplorerState,
  IsothermExplorerState,
  DepartureExplorerState,
  PressureEnthalpyExplorerState,
} from "./explorerState.js";
