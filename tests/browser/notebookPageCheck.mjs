/* global document, window, Jupyter, fetch */
// A real classic-notebook page through run, refresh and re-run (headless Chromium through
// playwright-core, Debian's Chromium and Debian's Jupyter notebook server, the project-local tslab
// kernel written by scripts/install-kernel.mjs).
//
//   1. start `jupyter notebook` on 127.0.0.1 (a free port, a random token, --allow-root as root)
//      serving a temporary folder under out/ with a three-cell notebook: import, showChart,
//      showExplorer;
//   2. open the page, run all cells: the chart and the explorer go live from the inline runtime
//      the kernel sends with its first chart;
//   3. reload the page WITHOUT saving (the kernel keeps running, so it will not send the runtime
//      again) and run all cells again: the new outputs carry no inline runtime, and each must load
//      it from the server (/nbextensions/isochor/, display/pageLoader.ts) and go live, with a
//      rendered <svg> or <canvas> in the chart;
//   4. no request leaves 127.0.0.1 for anything of ours (no CDN), no page error;
//   5. reload once more with the served folder blocked and run again: the outputs stay static and
//      the notes under the chart and the explorer name the missing runtime (not trust).
//
// Exported for the vitest wrapper (tests/unit/display/notebookPage.test.ts):
//   notebookPageUnavailable() -> null or the reason the check cannot run here
//   checkNotebookPage({ chromiumPath? }) -> [{ name, ok, message }]
// CLI: node tests/browser/notebookPageCheck.mjs (ISOCHOR_TIMING=1 prints the time of each phase;
// about 50 s on an idle machine: 4 s server, 12 s Chromium and page, 18 s first run with the kernel
// start, 7 s refresh and re-run, 8 s shutdown)
import { spawn } from "node:child_process";
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, rmSync, writeFileSync } from "node:fs";
import { createServer } from "node:net";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { installKernel, installPageRuntime } from "../../scripts/install-kernel.mjs";
import { findJupyter, jupyterEnv, repoRoot } from "../../scripts/jupyter-env.mjs";
import { DEFAULT_CHROMIUM_PATH, launchChromium } from "./explorersCheck.mjs";

const NOTEBOOK = "live.ipynb";

/** Cells of the test notebook: one chart, one explorer (what a user's notebook does). */
const CELLS = [
  'import { showChart, showExplorer } from "isochor";',
  [
    "await showChart({",
    '  $schema: "https://vega.github.io/schema/vega-lite/v6.json",',
    '  title: "Live after refresh",',
    "  data: { values: [{ p: 1, z: 0.99 }, { p: 20, z: 0.93 }, { p: 60, z: 0.82 }] },",
    '  mark: "line",',
    '  encoding: { x: { field: "p", type: "quantitative" }, y: { field: "z", type: "quantitative" } },',
    "});",
  ].join("\n"),
  'await showExplorer("isotherms", { components: "carbon dioxide" });',
];

function notebookJson() {
  return {
    cells: CELLS.map((source) => ({
      cell_type: "code",
      execution_count: null,
      metadata: {},
      outputs: [],
      source,
    })),
    metadata: {
      kernelspec: { display_name: "TypeScript", language: "typescript", name: "tslab" },
      language_info: { name: "typescript" },
    },
    nbformat: 4,
    nbformat_minor: 5,
  };
}

/** Null when the check can run here, otherwise the reason it cannot. */
export function notebookPageUnavailable(chromiumPath = DEFAULT_CHROMIUM_PATH) {
  if (!existsSync(chromiumPath)) return `no Chromium at ${chromiumPath}`;
  const jupyter = findJupyter();
  if (!jupyter) return "no Jupyter (/usr/bin/jupyter)";
  if (!existsSync(`${jupyter}-notebook`)) {
    return `no classic notebook server (${jupyter}-notebook; Debian package jupyter-notebook)`;
  }
  for (const built of [
    "kernel-lib/dist/display/notebookRuntimeFiles.js",
    "widgets/dist/isochor-widgets.js",
  ]) {
    if (!existsSync(join(repoRoot, built))) return `${built} missing: run npm run build`;
  }
  return null;
}

function freePort() {
  return new Promise((resolvePort, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address();
      server.close(() => resolvePort(port));
    });
  });
}

async function waitForServer(url, child, log, timeoutMs) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`jupyter exited (${child.exitCode}):\n${log()}`);
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`jupyter did not answer ${url} within ${timeoutMs} ms:\n${log()}`);
}

/** Runs every cell in the page and waits until each chart container has settled. */
async function runAll(page, timeoutMs) {
  await page.waitForFunction(
    () =>
      typeof Jupyter !== "undefined" &&
      Jupyter.notebook &&
      Jupyter.notebook.kernel &&
      Jupyter.notebook.kernel.is_connected(),
    undefined,
    { timeout: timeoutMs },
  );
  await page.evaluate(() => {
    Jupyter.notebook.set_autosave_interval(0);
    Jupyter.notebook.execute_all_cells();
  });
  await page.waitForFunction(
    () => {
      const charts = Array.from(document.querySelectorAll("[data-isochor-chart]"));
      const explorers = Array.from(document.querySelectorAll("[data-isochor-explorer]"));
      const settled = (el, attr) => ["live", "failed"].includes(el.getAttribute(attr));
      const noted = document.querySelector(".isochor-chart-note") !== null;
      return (
        charts.length >= 2 &&
        explorers.length >= 1 &&
        ((charts.every((el) => settled(el, "data-isochor-chart")) &&
          explorers.every((el) => settled(el, "data-isochor-explorer"))) ||
          noted)
      );
    },
    undefined,
    { timeout: timeoutMs },
  );
}

/** What the page shows: states, live drawings, inline runtime copies, notes. */
function pageState(page) {
  return page.evaluate(() => ({
    charts: Array.from(document.querySelectorAll("[data-isochor-chart]")).map((el) => ({
      state: el.getAttribute("data-isochor-chart"),
      drawn: el.querySelector(".isochor-chart-live svg, .isochor-chart-live canvas") !== null,
    })),
    explorers: Array.from(document.querySelectorAll("[data-isochor-explorer]")).map((el) =>
      el.getAttribute("data-isochor-explorer"),
    ),
    inlineRuntimes: document.querySelectorAll("#notebook script[data-isochor-once]").length,
    notes: Array.from(document.querySelectorAll(".isochor-chart-note")).map((el) => el.textContent),
    loaded: Object.keys(window.isochorRuntimeLoads || {}),
  }));
}

function allLive(state) {
  return (
    state.charts.length >= 2 &&
    state.charts.every((c) => c.state === "live" && c.drawn) &&
    state.explorers.length >= 1 &&
    state.explorers.every((s) => s === "live")
  );
}

/**
 * Drives the notebook page through run, refresh and re-run.
 * @returns [{ name, ok, message }]
 */
export async function checkNotebookPage({
  chromiumPath = DEFAULT_CHROMIUM_PATH,
  timeoutMs = 90000,
} = {}) {
  const results = [];
  const record = (name, ok, message = "") => results.push({ name, ok, message });
  installKernel({ quiet: true });
  await installPageRuntime({ quiet: true });
  const dir = join(repoRoot, "out", `notebook-page-${randomBytes(4).toString("hex")}`);
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, NOTEBOOK), JSON.stringify(notebookJson(), null, 1));
  const port = await freePort();
  const token = randomBytes(16).toString("hex");
  const args = [
    "notebook",
    "--no-browser",
    "--ip=127.0.0.1",
    `--port=${port}`,
    "--port-retries=0",
    `--NotebookApp.token=${token}`,
    `--notebook-dir=${dir}`,
  ];
  if (process.getuid?.() === 0) args.push("--allow-root");
  let output = "";
  const server = spawn(findJupyter(), args, {
    env: jupyterEnv(),
    stdio: ["ignore", "pipe", "pipe"],
  });
  server.stdout.on("data", (d) => (output += d));
  server.stderr.on("data", (d) => (output += d));
  const log = () => output.split("\n").slice(-30).join("\n");
  const t0 = Date.now();
  const mark = (what) => {
    if (process.env.ISOCHOR_TIMING)
      console.error(`${((Date.now() - t0) / 1000).toFixed(1)} s: ${what}`);
  };
  let browser;
  try {
    const base = `http://127.0.0.1:${port}`;
    await waitForServer(`${base}/api/status?token=${token}`, server, log, timeoutMs);
    mark("server up");
    browser = await launchChromium(chromiumPath, { width: 1100, height: 1600 });
    const page = await browser.context.newPage();
    const problems = [];
    const served = [];
    await page.route("**/*", (route) => {
      const url = route.request().url();
      if (url.startsWith(base) || url.startsWith("data:") || url.startsWith("blob:")) {
        if (url.includes("/nbextensions/isochor/")) served.push(url.replace(base, ""));
        return route.continue();
      }
      // anything else (a CDN, the internet) is blocked; ours must never ask for it
      if (/vega|isochor/i.test(url)) problems.push(`request outside the server: ${url}`);
      return route.abort("blockedbyclient");
    });
    page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
    page.on("console", (m) => {
      if (m.type() === "error" && /isochor|vega/i.test(m.text()))
        problems.push(`console error: ${m.text().slice(0, 300)}`);
    });
    const url = `${base}/notebooks/${NOTEBOOK}?token=${token}`;

    await page.goto(url, { waitUntil: "load", timeout: timeoutMs });
    mark("page loaded");
    await runAll(page, timeoutMs);
    mark("first run settled");
    const first = await pageState(page);
    record(
      "first run: chart and explorer live from the inline runtime",
      allLive(first) && first.inlineRuntimes >= 1 && served.length === 0,
      JSON.stringify(first),
    );

    // refresh without saving: the running kernel will not send the runtime again
    await page.evaluate(() => {
      Jupyter.notebook.set_dirty(false);
      window.onbeforeunload = null;
    });
    await page.reload({ waitUntil: "load", timeout: timeoutMs });
    const reloaded = await page.evaluate(
      () => document.querySelectorAll("[data-isochor-chart]").length,
    );
    record("refresh: the page starts without outputs", reloaded === 0, `${reloaded} charts`);
    mark("reloaded");
    await runAll(page, timeoutMs);
    mark("second run settled");
    const second = await pageState(page);
    record(
      "re-run after refresh: outputs without inline runtime go live",
      allLive(second) && second.inlineRuntimes === 0,
      JSON.stringify(second),
    );
    record(
      "re-run after refresh: the runtime came from the notebook server",
      served.some((u) => u.includes("chart-runtime.js")) &&
        served.some((u) => u.includes("explorers.js")),
      `served: ${served.join(", ") || "nothing"}`,
    );
    record(
      "no page error, nothing of ours outside the server",
      problems.length === 0,
      problems.join("\n"),
    );

    // a page whose server does not serve the runtime: the outputs stay static and say why
    await page.route("**/nbextensions/isochor/**", (route) => route.abort("failed"));
    await page.evaluate(() => {
      Jupyter.notebook.set_dirty(false);
      window.onbeforeunload = null;
    });
    await page.reload({ waitUntil: "load", timeout: timeoutMs });
    await runAll(page, timeoutMs);
    await page.waitForFunction(
      () =>
        Array.from(document.querySelectorAll(".isochor-explorer-note")).every((el) =>
          /not on this page/.test(el.textContent ?? ""),
        ),
      undefined,
      { timeout: timeoutMs },
    );
    mark("third run, without the served runtime, settled");
    const third = await page.evaluate(() => ({
      chartNotes: Array.from(document.querySelectorAll(".isochor-chart-note")).map(
        (el) => el.textContent,
      ),
      explorerNotes: Array.from(document.querySelectorAll(".isochor-explorer-note")).map(
        (el) => el.textContent,
      ),
      live: document.querySelectorAll('[data-isochor-chart="live"]').length,
    }));
    const namesCause = (text) =>
      /not on this page/.test(text) && /could not load/.test(text) && !/trust/i.test(text);
    record(
      "without the served runtime: static, and the notes name the cause, not trust",
      third.live === 0 &&
        third.chartNotes.length >= 1 &&
        third.chartNotes.every(namesCause) &&
        third.explorerNotes.length >= 1 &&
        third.explorerNotes.every(namesCause),
      JSON.stringify(third),
    );
    await page.evaluate(() => Jupyter.notebook.kernel.kill());
  } catch (error) {
    record("notebook page", false, `${error instanceof Error ? error.stack : error}\n${log()}`);
  } finally {
    if (browser) await browser.close();
    server.kill("SIGTERM");
    await new Promise((r) => (server.exitCode !== null ? r() : server.once("exit", r)));
    rmSync(dir, { recursive: true, force: true });
  }
  return results;
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const reason = notebookPageUnavailable();
  if (reason) {
    console.log(`skipped: ${reason}`);
  } else {
    const t0 = Date.now();
    const results = await checkNotebookPage();
    for (const r of results)
      console.log(`${r.ok ? "ok  " : "FAIL"} ${r.name}${r.ok ? "" : `\n${r.message}`}`);
    console.log(`${((Date.now() - t0) / 1000).toFixed(1)} s`);
    process.exit(results.every((r) => r.ok) ? 0 : 1);
  }
}
