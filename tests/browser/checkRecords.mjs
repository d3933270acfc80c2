/* global document, window */
// Browser check of HTML calculation records (plain ESM, runs without a build step).
//
// Each record is opened from file:// in headless Chromium (playwright-core, system Chromium).
// A record passes when:
//   - no request leaves file:// or data: (every request is intercepted; others are aborted and fail
//     the check),
//   - the page raises no error and logs no console error,
//   - every chart container (data-isochor-chart, set by chartHtml) reaches "live": vega-embed has
//     drawn it from the inline runtime, and it holds a rendered <svg> or <canvas>,
//   - no injected script ran: the canary globals (default INJECTION_FLAG, which the security tests
//     put in their <script> payloads) are still undefined after the charts went live,
//   - optionally, given texts are on the page as literal text (options.expectText) or in the live
//     SVG of every live chart (options.expectChartText): a label "<script>..." shows as text.
// A notebook record x.html is checked together with the calculation records beside it
// (x.record.html, x.record-2.html, ...) unless options.siblings is false; they are reported as
// separate results.
//
// CLI: node tests/browser/checkRecords.mjs [--chromium <path>] <record.html...>
//      prints one line per record and exits 1 if any failed.
import { mkdtempSync, rmSync, existsSync, readdirSync } from "node:fs";
import { tmpdir } from "node:os";
import { basename, dirname, join, resolve } from "node:path";
import { pathToFileURL, fileURLToPath } from "node:url";
import { chromium } from "playwright-core";

export const DEFAULT_CHROMIUM_PATH = "/usr/lib/chromium/chromium";
/** Global that security payloads set (`window.__isochorInjected = 1`); it must stay undefined. */
export const INJECTION_FLAG = "__isochorInjected";
const CHART_ATTRIBUTE = "data-isochor-chart";
const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

/**
 * Checks records in headless Chromium.
 * @param {string[]} htmlFiles paths of record files
 * @param {{ chromiumPath?: string, timeoutMs?: number, expectText?: string[],
 *   expectChartText?: string[], forbiddenGlobals?: string[], siblings?: boolean }} [options]
 *   chromiumPath: Chromium binary (default /usr/lib/chromium/chromium);
 *   timeoutMs: how long each record may take to make all charts live (default 20000 ms);
 *   expectText: strings each page must show as literal text (text nodes outside script/style);
 *   expectChartText: strings every live chart of each page must draw (text of its SVG);
 *   forbiddenGlobals: window properties that must stay undefined (default [INJECTION_FLAG]);
 *   siblings: also check x.record.html, x.record-N.html beside each x.html (default true)
 * @returns {Promise<Array<{ name: string, ok: boolean, message: string }>>}
 */
export async function checkRecords(htmlFiles, options = {}) {
  const chromiumPath = options.chromiumPath ?? DEFAULT_CHROMIUM_PATH;
  const timeoutMs = options.timeoutMs ?? 20000;
  const expectations = {
    text: options.expectText ?? [],
    chartText: options.expectChartText ?? [],
    globals: options.forbiddenGlobals ?? [INJECTION_FLAG],
  };
  if (options.siblings ?? true) htmlFiles = withCalculationRecords(htmlFiles);
  if (!existsSync(chromiumPath)) {
    throw new Error(`checkRecords: no Chromium at ${chromiumPath}`);
  }
  if (!htmlFiles.some((file) => existsSync(file))) {
    return htmlFiles.map((file) => ({
      name: basename(file),
      ok: false,
      message: `no such file: ${file}`,
    }));
  }
  const userDataDir = mkdtempSync(join(tmpdir(), "isochor-check-"));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: chromiumPath,
    headless: true,
    args: CHROMIUM_ARGS,
  });
  const results = [];
  try {
    for (const file of htmlFiles) {
      results.push(await checkOne(context, file, timeoutMs, expectations));
    }
  } finally {
    await context.close();
    rmSync(userDataDir, { recursive: true, force: true });
  }
  return results;
}

/** Adds the calculation records written beside notebook records (x.record.html, x.record-2.html). */
function withCalculationRecords(files) {
  const out = [];
  for (const file of files) {
    out.push(file);
    if (/\.record(-\d+)?\.html$/.test(file) || !file.endsWith(".html") || !existsSync(file))
      continue;
    const dir = dirname(file);
    const stem = basename(file).slice(0, -".html".length);
    const siblings = readdirSync(dir)
      .filter(
        (f) =>
          f.startsWith(`${stem}.record`) && /^\.record(-\d+)?\.html$/.test(f.slice(stem.length)),
      )
      .sort((a, b) => a.localeCompare(b, "en", { numeric: true }))
      .map((f) => join(dir, f));
    for (const sibling of siblings) if (!files.includes(sibling)) out.push(sibling);
  }
  return out;
}

async function checkOne(context, file, timeoutMs, expectations) {
  const name = basename(file);
  if (!existsSync(file)) return { name, ok: false, message: `no such file: ${file}` };
  const page = await context.newPage();
  const problems = [];
  // Intercept every request of this page: file: and data: pass, anything else is aborted.
  await page.route("**/*", (route) => {
    const url = route.request().url();
    if (url.startsWith("file:") || url.startsWith("data:")) return route.continue();
    problems.push(`request outside file:// blocked: ${url.slice(0, 200)}`);
    return route.abort("blockedbyclient");
  });
  page.on("websocket", (socket) =>
    problems.push(`websocket opened: ${socket.url().slice(0, 200)}`),
  );
  page.on("pageerror", (error) => problems.push(`page error: ${error.message}`));
  page.on("console", (message) => {
    if (message.type() === "error") problems.push(`console error: ${message.text().slice(0, 300)}`);
  });
  try {
    await page.goto(pathToFileURL(resolve(file)).href, { waitUntil: "load", timeout: timeoutMs });
    const total = await page.locator(`[${CHART_ATTRIBUTE}]`).count();
    let live = 0;
    if (total > 0) {
      try {
        await page.waitForFunction(
          (attr) =>
            Array.from(document.querySelectorAll(`[${attr}]`)).every(
              (el) => el.getAttribute(attr) === "live" || el.getAttribute(attr) === "failed",
            ),
          CHART_ATTRIBUTE,
          { timeout: timeoutMs },
        );
      } catch {
        // counted below
      }
      live = await page.evaluate((attr) => {
        let n = 0;
        for (const el of document.querySelectorAll(`[${attr}]`)) {
          const drawn = el.querySelector(".isochor-chart-live svg, .isochor-chart-live canvas");
          if (el.getAttribute(attr) === "live" && drawn) n++;
        }
        return n;
      }, CHART_ATTRIBUTE);
      if (live < total) problems.push(`${total - live} of ${total} charts did not become live`);
    }
    // Let late requests or errors surface.
    await page.waitForTimeout(200);
    const seen = await page.evaluate(
      ({ globals }) => {
        const skip = new Set(["SCRIPT", "STYLE", "NOSCRIPT", "TEMPLATE"]);
        const walker = document.createTreeWalker(document.body ?? document.documentElement, 4);
        const parts = [];
        for (let node = walker.nextNode(); node; node = walker.nextNode()) {
          if (!skip.has(node.parentElement?.tagName ?? "")) parts.push(node.nodeValue ?? "");
        }
        const chartTexts = Array.from(
          document.querySelectorAll(".isochor-chart-live svg"),
          (svg) => svg.textContent ?? "",
        );
        const setGlobals = globals.filter((g) => typeof window[g] !== "undefined");
        return { text: parts.join(""), chartTexts, setGlobals };
      },
      { globals: expectations.globals },
    );
    for (const g of seen.setGlobals) problems.push(`injected script ran: window.${g} is set`);
    for (const t of expectations.text) {
      if (!seen.text.includes(t))
        problems.push(`text not shown: ${JSON.stringify(t).slice(0, 120)}`);
    }
    for (const t of expectations.chartText) {
      const missing = seen.chartTexts.filter((c) => !c.includes(t)).length;
      if (seen.chartTexts.length === 0 || missing > 0)
        problems.push(
          `text not drawn in ${seen.chartTexts.length === 0 ? "any live chart (none)" : `${missing} of ${seen.chartTexts.length} live charts`}: ${JSON.stringify(t).slice(0, 120)}`,
        );
    }
    const ok = problems.length === 0;
    const message = ok
      ? `${total} chart${total === 1 ? "" : "s"} live, no request outside file://, no page errors`
      : problems.join("; ");
    return { name, ok, message };
  } catch (error) {
    problems.push(error instanceof Error ? error.message.split("\n")[0] : String(error));
    return { name, ok: false, message: problems.join("; ") };
  } finally {
    await page.close();
  }
}

async function main(argv) {
  let chromiumPath = process.env.ISOCHOR_CHROMIUM ?? DEFAULT_CHROMIUM_PATH;
  const files = [];
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === "--chromium") chromiumPath = argv[++i];
    else files.push(argv[i]);
  }
  if (files.length === 0) {
    process.stderr.write(
      "usage: node tests/browser/checkRecords.mjs [--chromium <path>] <record.html...>\n",
    );
    return 2;
  }
  const results = await checkRecords(files, { chromiumPath });
  for (const r of results)
    process.stdout.write(`${r.ok ? "ok  " : "FAIL"} ${r.name}: ${r.message}\n`);
  const failed = results.filter((r) => !r.ok).length;
  process.stdout.write(`${results.length - failed} passed, ${failed} failed\n`);
  return failed > 0 ? 1 : 0;
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  main(process.argv.slice(2)).then(
    (code) => {
      process.exitCode = code;
    },
    (error) => {
      process.stderr.write(
        `checkRecords: ${error instanceof Error ? error.message : String(error)}\n`,
      );
      process.exitCode = 1;
    },
  );
}
