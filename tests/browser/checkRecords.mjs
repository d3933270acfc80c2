/* global document */
// Browser check of HTML calculation records (plain ESM, runs without a build step).
//
// Each record is opened from file:// in headless Chromium (playwright-core, system Chromium).
// A record passes when:
//   - no request leaves file:// or data: (every request is intercepted; others are aborted and fail
//     the check),
//   - the page raises no error and logs no console error,
//   - every chart container (data-isochor-chart, set by chartHtml) reaches "live": vega-embed has
//     drawn it from the inline runtime, and it holds a rendered <svg> or <canvas>.
//
// CLI: node tests/browser/checkRecords.mjs [--chromium <path>] <record.html...>
//      prints one line per record and exits 1 if any failed.
import { mkdtempSync, rmSync, existsSync } from "node:fs";
import { tmpdir } from "node:os";
import { basename, join, resolve } from "node:path";
import { pathToFileURL, fileURLToPath } from "node:url";
import { chromium } from "playwright-core";

export const DEFAULT_CHROMIUM_PATH = "/usr/lib/chromium/chromium";
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
 * @param {{ chromiumPath?: string, timeoutMs?: number }} [options]
 *   chromiumPath: Chromium binary (default /usr/lib/chromium/chromium);
 *   timeoutMs: how long each record may take to make all charts live (default 20000 ms)
 * @returns {Promise<Array<{ name: string, ok: boolean, message: string }>>}
 */
export async function checkRecords(htmlFiles, options = {}) {
  const chromiumPath = options.chromiumPath ?? DEFAULT_CHROMIUM_PATH;
  const timeoutMs = options.timeoutMs ?? 20000;
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
      results.push(await checkOne(context, file, timeoutMs));
    }
  } finally {
    await context.close();
    rmSync(userDataDir, { recursive: true, force: true });
  }
  return results;
}

async function checkOne(context, file, timeoutMs) {
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
