// A standalone test page with one explorer of each kind, built from the Node side
// (kernel-lib/dist: explorerHtml + the chart runtime + the explorers' bundle, each once), with the
// same Content-Security-Policy as the calculation records: nothing may load from anywhere.
// Used by the explorer browser checks (explorersCheck.mjs) and the benchmark (widgets/bench/).
// Needs `npm run build` (kernel-lib/dist and widgets/dist).
import { createRequire } from "node:module";
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..", "..");
const require = createRequire(import.meta.url);

/** A title with markup in it: it must show as text and never run. */
export const HOSTILE_TITLE = '<script>window.__isochorInjected = 1</script><b>bold?</b> & "quotes"';

/** The explorers on the page: id of the wrapper element -> kind and options. */
export const PAGE_EXPLORERS = [
  {
    id: "isotherms",
    kind: "isotherms",
    options: {
      components: "carbon dioxide",
      model: "peng-robinson",
      temperatureK: 280,
      points: 400,
      title: HOSTILE_TITLE,
    },
  },
  {
    id: "departures",
    kind: "departures",
    options: {
      components: ["methane", "propane"],
      x: [0.7, 0.3],
      temperatureK: 300,
      points: 400,
      properties: ["h", "s"],
    },
  },
  {
    id: "pressure-enthalpy",
    kind: "pressure-enthalpy",
    options: {
      components: "propane",
      model: "peng-robinson",
      temperatureK: 300,
      pressurePa: 5e5,
      points: 400,
    },
  },
];

/** Explorers on the CO2 reference equation (Span-Wagner), as in notebook 05: benchmark only. */
export const REFERENCE_EXPLORERS = [
  {
    id: "isotherms-reference",
    kind: "isotherms",
    options: { components: "carbon dioxide", model: "reference", temperatureK: 280, points: 400 },
  },
  {
    id: "pressure-enthalpy-reference",
    kind: "pressure-enthalpy",
    options: {
      components: "carbon dioxide",
      model: "reference",
      temperatureK: 308.15,
      pressurePa: 3e6,
      pressureRangePa: [6e5, 2e7],
      temperatureRangeK: [223.15, 453.15],
      points: 400,
    },
  },
];

/**
 * A stand-in for the classic notebook's RequireJS: a global AMD `define` that records anonymous
 * module definitions. The runtime and the bundle must ignore it and still set their globals.
 */
const AMD_STUB = `<script>window.__amdDefines = 0; window.define = function () { window.__amdDefines++; }; window.define.amd = { jQuery: true }; window.require = function () {};</script>`;

/**
 * Writes the page.
 * @param {string} file output path
 * @param {{ requireJs?: boolean, explorers?: typeof PAGE_EXPLORERS }} [options] requireJs: put an
 *   AMD `define` on the page first, as the classic notebook has; explorers: default PAGE_EXPLORERS
 * @returns {Promise<string>} the absolute path
 */
export async function writeExplorersPage(file, options = {}) {
  const lib = require(join(root, "kernel-lib", "dist", "index.js"));
  // the records' own policy (kernel-lib/src/records/recordHtml.ts), not a copy of it
  const csp = require(
    join(root, "kernel-lib", "dist", "records", "recordHtml.js"),
  ).CONTENT_SECURITY_POLICY;
  const parts = [];
  for (const e of options.explorers ?? PAGE_EXPLORERS) {
    const html = await lib.explorerHtml(e.kind, e.options);
    parts.push(`<section id="page-${e.id}"><h2>${e.kind}</h2>${html}</section>`);
  }
  const page = `<!doctype html>
<html lang="en"><head><meta charset="utf-8">
<meta http-equiv="Content-Security-Policy" content="${csp}">
<title>isochor explorers test page</title>
${options.requireJs ? AMD_STUB : ""}
${lib.vegaRuntimeScript()}
${lib.widgetsBundleScript().script}
</head><body>
${parts.join("\n")}
</body></html>`;
  const out = resolve(file);
  mkdirSync(dirname(out), { recursive: true });
  writeFileSync(out, page);
  return out;
}
