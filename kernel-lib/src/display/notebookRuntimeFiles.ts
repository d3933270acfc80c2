/**
 * Writes the page-side runtime as files a notebook server serves under
 * `<base_url>nbextensions/isochor/` (see pageLoader.ts): the chart runtime and the explorers'
 * bundle, each the same wrapped text the inline <script> elements carry. Outputs of a page that
 * never received the inline copy (refreshed or reopened on a running kernel) load them from there.
 * Called by scripts/install-kernel.mjs (`npm run notebook`, `npm run kernel:install`) with the
 * project-local Jupyter data directory. Node side only.
 */
import * as fs from "node:fs";
import * as path from "node:path";
import { widgetsBundleSource } from "../explorers/widgetsBundle.js";
import { NBEXTENSION_FOLDER, RUNTIME_FILES } from "./pageLoader.js";
import { vegaRuntimeSource } from "./vegaRuntime.js";

/**
 * Writes `<dataDir>/nbextensions/isochor/chart-runtime.js` and `explorers.js`.
 * @param jupyterDataDir A directory on the server's Jupyter data path (JUPYTER_PATH entry or
 *   JUPYTER_DATA_DIR); its `nbextensions/` subfolder is served by the classic notebook.
 * @returns The folder written and the size of each file in bytes.
 */
export function writeNotebookRuntimeFiles(jupyterDataDir: string): {
  folder: string;
  bytes: Record<string, number>;
} {
  const folder = path.join(jupyterDataDir, "nbextensions", NBEXTENSION_FOLDER);
  fs.mkdirSync(folder, { recursive: true });
  const files: Record<string, string> = {
    [RUNTIME_FILES.chart]: vegaRuntimeSource().source,
    [RUNTIME_FILES.explorers]: widgetsBundleSource().source,
  };
  const bytes: Record<string, number> = {};
  for (const [name, text] of Object.entries(files)) {
    // write then rename, so a server never serves half a file
    const target = path.join(folder, name);
    fs.writeFileSync(target + ".tmp", text);
    fs.renameSync(target + ".tmp", target);
    bytes[name] = Buffer.byteLength(text);
  }
  return { folder, bytes };
}
