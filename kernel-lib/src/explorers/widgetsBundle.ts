/**
 * The explorers' browser bundle (widgets/dist/isochor-widgets.js, built by widgets/build.mjs) as
 * one once-per-page <script> element, marked with display's RUNTIME_MARKER_ATTRIBUTE so records
 * lift it into the page head once and the display session sends it once per kernel session.
 *
 * Like the chart runtime it is evaluated inside a function whose `define`, `module`, `exports` and
 * `require` are undefined, so nothing in it registers with RequireJS in the classic notebook; it
 * then sets `window.isochorWidgets`. Node side only (reads the file).
 */
import { createHash } from "node:crypto";
import * as fs from "node:fs";
import * as path from "node:path";
import { RUNTIME_MARKER_ATTRIBUTE } from "../display/vegaRuntime.js";
import { EXPLORER_MODULE, EXPLORER_MODULE_VERSION } from "./explorerState.js";

const BUNDLE_FILE = "dist/isochor-widgets.js";

let cached:
  { file: string; mtimeMs: number; source: string; script: string; key: string } | undefined;

/** Where the built bundle is: the workspace package isochor-widgets, or beside kernel-lib. */
export function widgetsBundlePath(): string {
  const candidates: string[] = [];
  try {
    candidates.push(require.resolve(`isochor-widgets/${BUNDLE_FILE}`));
  } catch {
    // not resolvable as a package: try the repository layout below
  }
  candidates.push(path.resolve(__dirname, "..", "..", "..", "widgets", BUNDLE_FILE));
  candidates.push(path.resolve(__dirname, "..", "..", "..", "..", "widgets", BUNDLE_FILE));
  const found = candidates.find((file) => fs.existsSync(file));
  if (!found) {
    throw new Error(
      "isochor explorers need the browser bundle widgets/dist/isochor-widgets.js, which is not " +
        "built. Run `npm run build` (or `node widgets/build.mjs`) in the isochor repository. " +
        `Looked in: ${candidates.join(", ")}`,
    );
  }
  return found;
}

/**
 * The bundle's JavaScript wrapped as it runs in the page (without the <script> element) and its
 * once-per-page key (cached; re-read when the file changes, e.g. after a rebuild during a kernel
 * session). The notebook server serves this same text (display/notebookRuntimeFiles.ts).
 */
export function widgetsBundleSource(): { source: string; key: string } {
  const { source, key } = bundleEntry();
  return { source, key };
}

function bundleEntry(): { source: string; script: string; key: string } {
  const file = widgetsBundlePath();
  const { mtimeMs } = fs.statSync(file);
  if (!cached || cached.file !== file || cached.mtimeMs !== mtimeMs) {
    const code = fs.readFileSync(file, "utf8").replace(/\/\/# sourceMappingURL=\S+\s*$/, "");
    const source =
      "(function (define, module, exports, require) {\n" +
      'if (typeof globalThis.isochorWidgets === "object" && globalThis.isochorWidgets) return;\n' +
      code +
      "\nglobalThis.isochorWidgets = isochorWidgets;\n" +
      "}).call(globalThis, undefined, undefined, undefined, undefined);";
    // Nothing in the element may close it or open an HTML comment state.
    const safe = source.replace(/<\/(script)/gi, "<\\/$1").replace(/<!--/g, "<\\!--");
    const digest = createHash("sha256").update(code).digest("hex").slice(0, 12);
    const key = `explorers ${EXPLORER_MODULE}@${EXPLORER_MODULE_VERSION} sha256:${digest}`;
    cached = {
      file,
      mtimeMs,
      key,
      source,
      script: `<script ${RUNTIME_MARKER_ATTRIBUTE}="${key}">\n${safe}\n</script>`,
    };
  }
  return cached;
}

/**
 * The bundle as one HTML <script> element and its once-per-page key (cached; re-read when the
 * file changes, e.g. after a rebuild during a kernel session).
 */
export function widgetsBundleScript(): { script: string; key: string } {
  const { script, key } = bundleEntry();
  return { script, key };
}
