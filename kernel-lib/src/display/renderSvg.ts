/**
 * Static SVG rendering of a Vega-Lite spec in Node, with no canvas package:
 *
 *   Vega-Lite spec --compile (vega-lite)--> Vega spec --parse (vega)--> View(renderer "none")
 *   --toSVG--> SVG string
 *
 * Text is sized by vega's built-in width estimate (no canvas), which is what the live view would
 * fall back to as well. Data must be inline: a loader that refuses every URL keeps charts offline.
 */
import { InputError } from "../errors.js";
import { loadVega } from "./loadVega.js";
import type { VegaLiteSpec } from "./vegaLiteSpec.js";

/** Throws InputError when `spec` is not a plain object or asks for data by URL. */
export function checkChartSpec(spec: VegaLiteSpec, input = "spec"): void {
  if (spec === null || typeof spec !== "object" || Array.isArray(spec)) {
    throw new InputError({
      input,
      unit: "-",
      validRange: "a Vega-Lite specification object",
      received: spec,
    });
  }
  const found = findUrlData(spec, input);
  if (found !== undefined) {
    throw new InputError({
      input: found.path,
      unit: "-",
      validRange: "absent (charts take inline data.values only, so records stay offline)",
      received: found.url,
      hint: "Load the file in the notebook and pass its rows as data: { values: rows }",
    });
  }
}

function findUrlData(node: unknown, path: string): { path: string; url: unknown } | undefined {
  if (node === null || typeof node !== "object") return undefined;
  if (Array.isArray(node)) {
    for (let i = 0; i < node.length; i++) {
      const found = findUrlData(node[i], `${path}[${i}]`);
      if (found) return found;
    }
    return undefined;
  }
  for (const [key, value] of Object.entries(node)) {
    if (key === "data" && value && typeof value === "object" && "url" in value) {
      return { path: `${path}.data.url`, url: (value as { url: unknown }).url };
    }
    if (key === "data" && value && typeof value === "object" && "values" in value) continue;
    const found = findUrlData(value, `${path}.${key}`);
    if (found) return found;
  }
  return undefined;
}

/**
 * Renders a Vega-Lite spec to an SVG string in Node.
 * @param spec A Vega-Lite v6 specification with inline data.
 * @returns The SVG document as text (width and height attributes in CSS pixels).
 * @throws InputError when the spec is not an object or uses URL data; vega-lite's own error
 *   (with its message) when the spec does not compile.
 */
export async function renderSvg(spec: VegaLiteSpec): Promise<string> {
  checkChartSpec(spec);
  const { vega, vegaLite } = await loadVega();
  // vega tags data rows it ingests (a symbol id on each object): work on a copy, so the caller's
  // spec and rows stay as they were (and serialise the same in chartHtml).
  const copy = structuredClone(spec) as Parameters<typeof vegaLite.compile>[0];
  let compiled: ReturnType<typeof vegaLite.compile>;
  try {
    compiled = vegaLite.compile(copy);
  } catch (error) {
    throw new InputError({
      input: "spec",
      unit: "-",
      validRange: "a Vega-Lite v6 specification that vega-lite can compile",
      received: `a spec with mark ${JSON.stringify(spec.mark ?? null)}`,
      hint: `vega-lite said: ${error instanceof Error ? error.message : String(error)}`,
    });
  }
  const loader = vega.loader();
  const refuse = (uri: string): Promise<never> =>
    Promise.reject(
      new Error(`isochor charts load no data from ${JSON.stringify(uri)}: use inline values`),
    );
  loader.load = refuse;
  loader.sanitize = refuse;
  const view = new vega.View(vega.parse(compiled.spec), { renderer: "none", loader });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}
