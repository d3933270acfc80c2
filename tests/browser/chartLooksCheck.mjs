/* global document, getComputedStyle */
// Browser checks of how charts look (headless Chromium through playwright-core, Debian's Chromium):
// what item 1-3 of the "what an engineer sees" review found must not come back.
//
// Charts are built from kernel-lib/dist (needs `npm run build`), rendered to SVG by the project's
// renderSvg and put on one page, where Chromium lays the text out with real fonts. Checks:
//   - the isotherm explorer's first view (CO2 reference equation, as notebook 05 opens it): no
//     pressure tick below zero and no line drawn below the plot frame (the loop's lobes once
//     reached -35 bar and beyond the frame);
//   - labels not clipped: every text mark (critical point, path states, isentrope and quality
//     labels) lies inside the plot frame, on a P-h explorer with its state point in the dome, a
//     P-h diagram with a process path whose last state sits at the plot's right edge and two
//     states close together, and a T-s diagram with a path;
//   - point labels (critical point, path states) do not overlap each other;
//   - every chart carries the theme: the paper background and the theme's font on its text.
//
// Exported for the vitest wrapper (tests/unit/charts/chartLooksBrowser.test.ts):
//   checkChartLooks({ chromiumPath?, pageFile? }) -> [{ name, ok, message }]
// CLI: node tests/browser/chartLooksCheck.mjs
import { createRequire } from "node:module";
import { rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { DEFAULT_CHROMIUM_PATH, launchChromium } from "./explorersCheck.mjs";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..", "..");
const require = createRequire(import.meta.url);
const dist = (p) => require(join(root, "kernel-lib", "dist", p));

/** The charts on the page: id -> spec, built from the dist. */
export async function buildLookCharts() {
  const L = dist("index.js");
  const { ExplorerFluids } = dist("explorers/explorerFluids.js");
  const { explorerDefinition } = dist("explorers/explorerDefinitions.js");
  const charts = {};
  // Isotherm explorer, first view.
  const iso = L.createExplorerState("isotherms", { components: "carbon dioxide" });
  charts["isotherm-explorer"] = explorerDefinition(iso).chart(
    iso,
    new ExplorerFluids(iso.components),
  );
  // P-h explorer, state point moved into the dome (its label sits by the tie line).
  const ph = L.createExplorerState("pressure-enthalpy", {
    components: "carbon dioxide",
    temperatureK: 270,
    pressurePa: 3.2e6,
  });
  const phFluids = new ExplorerFluids(ph.components);
  const phDef = explorerDefinition(ph);
  const inDome = phDef.update(ph, "enthalpyJPerMol", ph.enthalpyJPerMol - 8000, phFluids);
  charts["ph-explorer"] = phDef.chart(inDome, phFluids);
  // Ethane (Peng-Robinson) P-h with the critical isotherm, isentropes and a compressor path.
  const fluid = L.defineFluid({
    components: ["ethane"],
    model: "peng-robinson",
    idealGas: "molecular",
  });
  const dome = L.saturationFromModel(fluid, { points: 24 });
  const P = L.logGrid(2e5, 2e7, 50);
  const isotherms = [220, 260, dome.critical.temperatureK, 340].map((T) =>
    L.isothermOnPressureEnthalpy(fluid, T, P),
  );
  const isentropes = [90, 110, 130].map((s) =>
    L.isentropeOnPressureEnthalpy(fluid, s, L.logGrid(2e5, 2e7, 16)),
  );
  const base = L.pressureEnthalpyChart(
    { ...dome, isotherms, isentropes },
    { units: { system: "SI", pressure: "bar", temperature: "degC" } },
  );
  const st = (T, p, label) => {
    const s = fluid.stateAtTP(T, p);
    return {
      label,
      pressurePa: p,
      enthalpyJPerMol: s.molar.h,
      temperatureK: T,
      entropyJPerMolK: s.molar.s,
    };
  };
  // the last state has the largest enthalpy: it is the right end of the x axis
  const path = [
    st(250, 1e6, "suction"),
    st(252, 1.05e6, "after strainer"),
    st(400, 6e6, "discharge"),
  ];
  charts["ph-path"] = L.withProcessPath(base, path);
  const ts = L.temperatureEntropyChart(
    { ...dome, isobars: [L.isobarOnTemperatureEntropy(fluid, 1e6, L.linearGrid(160, 420, 30))] },
    { units: { system: "SI", temperature: "degC" } },
  );
  charts["ts-path"] = L.withProcessPath(ts, path);
  return charts;
}

/** Writes the page: each chart's SVG (renderSvg) in a div with its id. */
export async function writeLooksPage(file) {
  const { renderSvg } = dist("display/renderSvg.js");
  const charts = await buildLookCharts();
  const parts = [];
  for (const [id, spec] of Object.entries(charts)) {
    parts.push(`<div id="${id}" class="chart">${await renderSvg(spec)}</div>`);
  }
  writeFileSync(
    file,
    `<!doctype html><html><head><meta charset="utf-8"><meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'"></head><body style="margin:0">${parts.join("\n")}</body></html>`,
  );
  return Object.keys(charts);
}

/** Runs in the page: geometry of one chart (client pixels). */
function measure(id) {
  const svg = document.querySelector(`#${id} svg`);
  const frameEl = svg.querySelector("g.role-frame.root > g > path.background");
  const r = (el) => {
    const b = el.getBoundingClientRect();
    return { x0: b.left, x1: b.right, y0: b.top, y1: b.bottom };
  };
  const frame = r(frameEl);
  const texts = Array.from(svg.querySelectorAll("g.mark-text.role-mark text"))
    .filter((t) => t.textContent.trim() !== "")
    .map((t) => ({
      text: t.textContent,
      fill: t.getAttribute("fill") ?? "",
      stroke: t.getAttribute("stroke") ?? "",
      font: getComputedStyle(t).fontFamily,
      ...r(t),
    }));
  const lines = Array.from(svg.querySelectorAll("g.mark-line.role-mark path")).map((p) => r(p));
  const yTicks = Array.from(svg.querySelectorAll("g.role-axis"))
    .filter(
      (g) =>
        g.getAttribute("aria-label")?.includes("Y-axis") ||
        g.querySelector(".role-axis-label text[text-anchor='end']"),
    )
    .flatMap((g) =>
      Array.from(g.querySelectorAll(".role-axis-label text")).map((t) => t.textContent),
    );
  const background = svg.querySelector(":scope > rect")?.getAttribute("fill") ?? "";
  return { frame, texts, lines, yTicks, background };
}

const inside = (b, f, tol = 0.5) =>
  b.x0 >= f.x0 - tol && b.x1 <= f.x1 + tol && b.y0 >= f.y0 - tol && b.y1 <= f.y1 + tol;
const overlap = (a, b) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

/**
 * Runs the checks.
 * @param {{ chromiumPath?: string, pageFile?: string }} [options]
 * @returns {Promise<Array<{ name: string, ok: boolean, message: string }>>}
 */
export async function checkChartLooks(options = {}) {
  const pageFile = options.pageFile ?? join(tmpdir(), `isochor-looks-${process.pid}.html`);
  const ids = await writeLooksPage(pageFile);
  const { context, close } = await launchChromium(options.chromiumPath, {
    width: 900,
    height: 800,
  });
  const results = [];
  const add = (name, ok, message) => results.push({ name, ok, message });
  try {
    const page = await context.newPage();
    await page.goto(pathToFileURL(pageFile).href, { waitUntil: "load" });
    const m = {};
    for (const id of ids) m[id] = await page.evaluate(measure, id);
    // 1. Isotherm explorer: nothing below zero pressure, no line below the frame.
    const iso = m["isotherm-explorer"];
    const negative = iso.yTicks.filter((t) => /^[-−]/.test(t.trim()));
    const below = iso.lines.filter((b) => b.y1 > iso.frame.y1 + 1);
    add(
      "isotherm explorer, first view: lines inside the plot, no negative pressure ticks",
      negative.length === 0 && below.length === 0 && iso.lines.length > 0,
      `${iso.lines.length} lines, ${below.length} below the frame; y ticks ${iso.yTicks.join(" ")}`,
    );
    // 2. Labels not clipped; point labels apart.
    for (const id of ["ph-explorer", "ph-path", "ts-path", "isotherm-explorer"]) {
      const { frame, texts } = m[id];
      const out = texts.filter((t) => !inside(t, frame));
      add(
        `${id}: every label inside the plot frame`,
        out.length === 0 && texts.length > 0,
        out.length === 0
          ? `${texts.length} labels inside`
          : `outside: ${out.map((t) => `"${t.text}" [${t.x0.toFixed(0)}-${t.x1.toFixed(0)}, ${t.y0.toFixed(0)}-${t.y1.toFixed(0)}]`).join(", ")}; frame [${frame.x0.toFixed(0)}-${frame.x1.toFixed(0)}, ${frame.y0.toFixed(0)}-${frame.y1.toFixed(0)}]`,
      );
      // the critical point's and the path's labels share the path colour (INK.path, INK.critical)
      const points = texts.filter((t) => t.fill === "#b0302a");
      const clashes = [];
      for (let i = 0; i < points.length; i++)
        for (let j = i + 1; j < points.length; j++)
          if (overlap(points[i], points[j]))
            clashes.push(`"${points[i].text}" / "${points[j].text}"`);
      add(
        `${id}: point labels do not overlap`,
        clashes.length === 0,
        clashes.length === 0 ? `${points.length} point labels apart` : clashes.join(", "),
      );
    }
    // 3. The theme on every chart: paper background, the theme's fonts on the text.
    const unthemed = ids.filter(
      (id) =>
        m[id].background !== "#fcfbf7" ||
        !m[id].texts.every((t) => /Source Sans|DejaVu Sans/.test(t.font)),
    );
    add(
      "every chart carries the theme (paper background, theme fonts)",
      unthemed.length === 0,
      unthemed.length === 0 ? `${ids.length} charts themed` : `not themed: ${unthemed.join(", ")}`,
    );
    await page.close();
  } finally {
    await close();
    if (!options.pageFile) rmSync(pageFile, { force: true });
  }
  return results;
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const chromiumPath = process.env.ISOCHOR_CHROMIUM ?? DEFAULT_CHROMIUM_PATH;
  checkChartLooks({ chromiumPath, pageFile: process.env.LOOKS_PAGE }).then(
    (results) => {
      for (const r of results)
        process.stdout.write(`${r.ok ? "ok  " : "FAIL"} ${r.name}: ${r.message}\n`);
      const failed = results.filter((r) => !r.ok).length;
      process.stdout.write(`${results.length - failed} passed, ${failed} failed\n`);
      process.exitCode = failed > 0 ? 1 : 0;
    },
    (error) => {
      process.stderr.write(
        `chartLooksCheck: ${error instanceof Error ? error.stack : String(error)}\n`,
      );
      process.exitCode = 1;
    },
  );
}
