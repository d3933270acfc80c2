/**
 * Browser entry (global `isochorWidgets`): the isochor engine core for in-page computation (no
 * kernel round trip; tslab has no comm channel) and the explorers' model and views.
 *
 * A page made by the Node side (kernel-lib/src/explorers/explorerHtml.ts) calls
 * `isochorWidgets.mountExplorer(root)` from each explorer's boot script once this bundle and the
 * chart runtime are loaded.
 */
import type { ExplorerState } from "../../kernel-lib/src/explorers/explorerState.js";
import { ExplorerModel } from "./explorers/explorerModel.js";
import { ExplorerView } from "./explorers/explorerView.js";

export * as engine from "../../kernel-lib/src/core.js";
export { ExplorerModel, readState } from "./explorers/explorerModel.js";
export type { ExplorerModelLike } from "./explorers/explorerModel.js";
export { ExplorerView } from "./explorers/explorerView.js";
export { LiveChart, splitData } from "./explorers/liveChart.js";

const mounted = new WeakMap<HTMLElement, ExplorerView>();

/**
 * Starts the explorer in `root` (an element made by explorerHtml): reads its state from the JSON
 * element inside (parsed, never evaluated), builds the model and view, renders.
 * @returns the view (a second call on the same root returns the first view).
 */
export function mountExplorer(root: HTMLElement): ExplorerView {
  const existing = mounted.get(root);
  if (existing) return existing;
  root.setAttribute("data-isochor-explorer", "starting");
  const source = root.querySelector("script.isochor-explorer-state");
  const state = JSON.parse(source?.textContent ?? "null") as ExplorerState;
  const model = new ExplorerModel(state);
  const view = new ExplorerView(root, model, Object.keys(state));
  mounted.set(root, view);
  void view.render();
  return view;
}
