// The files a notebook server serves to pages that lack the inline runtime
// (display/notebookRuntimeFiles.ts): the same wrapped text as the inline <script> elements, so a
// served copy behaves exactly like the inline one (globals set, RequireJS left alone).
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { writeNotebookRuntimeFiles } from "../../../kernel-lib/src/display/notebookRuntimeFiles.js";
import { RUNTIME_FILES } from "../../../kernel-lib/src/display/pageLoader.js";
import { vegaRuntimeScript } from "../../../kernel-lib/src/display/vegaRuntime.js";
import { widgetsBundleScript } from "../../../kernel-lib/src/explorers/widgetsBundle.js";

const dirs: string[] = [];
afterEach(() => {
  for (const d of dirs.splice(0)) fs.rmSync(d, { recursive: true, force: true });
});

/** The JavaScript inside a <script ...>...</script> element, with the element's escapes undone. */
function scriptBody(element: string): string {
  return element
    .replace(/^<script[^>]*>\n/, "")
    .replace(/\n<\/script>$/, "")
    .replace(/<\\\/(script)/gi, "</$1")
    .replace(/<\\!--/g, "<!--");
}

describe("writeNotebookRuntimeFiles", () => {
  it("writes the chart runtime and the explorers' bundle under nbextensions/isochor/", () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-nbext-"));
    dirs.push(dir);
    const { folder, bytes } = writeNotebookRuntimeFiles(dir);
    expect(folder).toBe(path.join(dir, "nbextensions", "isochor"));
    const chart = fs.readFileSync(path.join(folder, RUNTIME_FILES.chart), "utf8");
    const explorers = fs.readFileSync(path.join(folder, RUNTIME_FILES.explorers), "utf8");
    expect(chart).toBe(scriptBody(vegaRuntimeScript()));
    expect(explorers).toBe(scriptBody(widgetsBundleScript().script));
    expect(bytes[RUNTIME_FILES.chart]).toBe(Buffer.byteLength(chart));
    // both run with define/module/exports/require shadowed, as the inline copies do
    for (const text of [chart, explorers]) {
      expect(text.startsWith("(function (define, module, exports, require) {")).toBe(true);
    }
    expect(fs.readdirSync(folder).sort()).toEqual(
      [RUNTIME_FILES.chart, RUNTIME_FILES.explorers].sort(),
    );
  });
});
