/* global document, window, Event */
// Browser checks of the explorers (headless Chromium through playwright-core, Debian's Chromium).
//
// On the test page (explorersPage.mjs: one explorer of each kind, records' CSP) and checks:
//   - every explorer goes live (vega view drawn from the inline runtime, bundle mounted);
//   - a slider input changes the drawn chart (the SVG markup differs after the redraw event);
//   - the P-h explorer's state point moves on a drag across the diagram (table changes);
//   - the title "<script>..." shows as text: the text is on the page, the script never ran, no
//     element came from it;
//   - no request leaves file:// or data:, no page error, no console error.
//
// Exported for the test orchestrator and the vitest wrapper (tests/unit/explorers/browser.test.ts):
//   checkExplorers({ chromiumPath?, pageFile? }) -> [{ name, ok, message }]
// CLI: node tests/browser/explorersCheck.mjs
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { chromium } from "playwright-core";
import { HOSTILE_TITLE, PAGE_EXPLORERS, writeExplorersPage } from "./explorersPage.mjs";

export const DEFAULT_CHROMIUM_PATH = "/usr/lib/chromium/chromium";
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

/** Launches Chromium with the record checker's options; returns { context, close }. */
export async function launchChromium(chromiumPath = DEFAULT_CHROMIUM_PATH, viewport) {
  if (!existsSync(chromiumPath)) throw new Error(`no Chromium at ${chromiumPath}`);
  const userDataDir = mkdtempSync(join(tmpdir(), "isochor-explorers-"));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: chromiumPath,
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: viewport ?? { width: 1100, height: 2600 },
  });
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(userDataDir, { recursive: true, force: true });
    },
  };
}

/** Opens the page with every request outside file:/data: blocked and recorded in `problems`. */
export async function openGuarded(context, file, problems, timeoutMs = 30000) {
  const page = await context.newPage();
  await page.route("**/*", (route) => {
    const url = route.request().url();
    if (url.startsWith("file:") || url.startsWith("data:")) return route.continue();
    problems.push(`request outside file:// blocked: ${url.slice(0, 200)}`);
    return route.abort("blockedbyclient");
  });
  page.on("websocket", (s) => problems.push(`websocket opened: ${s.url().slice(0, 200)}`));
  page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
  page.on("console", (m) => {
    if (m.type() === "error") problems.push(`console error: ${m.text().slice(0, 300)}`);
  });
  await page.goto(pathToFileURL(resolve(file)).href, { waitUntil: "load", timeout: timeoutMs });
  await page.waitForFunction(
    () =>
      Array.from(document.querySelectorAll("[data-isochor-explorer]")).every((el) =>
        ["live", "failed"].includes(el.getAttribute("data-isochor-explorer")),
      ),
    undefined,
    { timeout: timeoutMs },
  );
  return page;
}

/**
 * Moves the first slider of an explorer to `position` and waits for the redraw.
 * Runs in the page; returns { before, after, detail } (the chart SVG markup around the move).
 */
function moveSlider([id, position]) {
  const root = document.querySelector(`#page-${id} .isochor-explorer`);
  const svgText = () => root.querySelector(".isochor-chart-live svg")?.outerHTML ?? "";
  const before = svgText();
  const slider = root.querySelector(".isochor-explorer-controls input[type=range]");
  return new Promise((done, fail) => {
    const timer = setTimeout(() => fail(new Error(`no redraw of ${id} within 20 s`)), 20000);
    root.addEventListener(
      "isochor-explorer-redraw",
      (event) => {
        clearTimeout(timer);
        done({ before, after: svgText(), detail: event.detail });
      },
      { once: true },
    );
    slider.value = String(position);
    slider.dispatchEvent(new Event("input", { bubbles: true }));
  });
}

/**
 * Runs the checks.
 * @param {{ chromiumPath?: string, pageFile?: string }} [options]
 * @returns {Promise<Array<{ name: string, ok: boolean, message: string }>>}
 */
export async function checkExplorers(options = {}) {
  const pageFile = options.pageFile ?? join(tmpdir(), `isochor-explorers-${process.pid}.html`);
  await writeExplorersPage(pageFile);
  const { context, close } = await launchChromium(options.chromiumPath);
  const results = [];
  const add = (name, ok, message) => results.push({ name, ok, message });
  const problems = [];
  try {
    const page = await openGuarded(context, pageFile, problems);
    for (const e of PAGE_EXPLORERS) {
      const state = await page.evaluate(
        (id) =>
          document
            .querySelector(`#page-${id} .isochor-explorer`)
            .getAttribute("data-isochor-explorer") +
          " / chart " +
          document
            .querySelector(`#page-${id} [data-isochor-chart]`)
            .getAttribute("data-isochor-chart") +
          " / svg " +
          Boolean(document.querySelector(`#page-${id} .isochor-chart-live svg`)),
        e.id,
      );
      add(`${e.id}: live`, state === "live / chart live / svg true", state);
      const moved = await page.evaluate(moveSlider, [e.id, 300]);
      add(
        `${e.id}: slider input redraws a changed chart`,
        moved.before.length > 0 && moved.after.length > 0 && moved.before !== moved.after,
        `redraw by ${moved.detail.path} in ${moved.detail.totalMs.toFixed(1)} ms; svg ${moved.before.length} -> ${moved.after.length} chars, ${moved.before === moved.after ? "unchanged" : "changed"}`,
      );
    }
    // Drag across the P-h diagram: the state point (and its table) must follow.
    const table = () =>
      page.evaluate(
        () => document.querySelector("#page-pressure-enthalpy .isochor-explorer-table").textContent,
      );
    const tableBefore = await table();
    const box = await page.locator("#page-pressure-enthalpy .isochor-chart-live svg").boundingBox();
    const redrawn = page.evaluate(
      () =>
        new Promise((done) =>
          document
            .querySelector("#page-pressure-enthalpy .isochor-explorer")
            .addEventListener("isochor-explorer-redraw", () => setTimeout(done, 300), {
              once: true,
            }),
        ),
    );
    await page.mouse.move(box.x + box.width * 0.35, box.y + box.height * 0.5);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.45, box.y + box.height * 0.45, { steps: 4 });
    await page.mouse.up();
    await redrawn;
    const tableAfter = await table();
    add(
      "pressure-enthalpy: drag moves the state point",
      tableBefore !== tableAfter,
      tableBefore !== tableAfter ? "table changed" : "table unchanged",
    );
    // The hostile title: shown as text, not run, no element made from it.
    const hostile = await page.evaluate(
      (title) => ({
        injected: window.__isochorInjected === 1,
        bold: Array.from(document.querySelectorAll("#page-isotherms b")).length,
        scriptsWithText: Array.from(document.scripts).filter(
          (s) => s.textContent.includes("__isochorInjected = 1") && !s.type,
        ).length,
        shown: Array.from(
          document.querySelectorAll("#page-isotherms .isochor-chart-live svg text"),
        ).some(
          (t) =>
            t.textContent.includes("<script>window.__isochorInjected") &&
            title.startsWith(t.textContent),
        ),
      }),
      HOSTILE_TITLE,
    );
    add(
      "label with <script> shows as text",
      !hostile.injected && hostile.bold === 0 && hostile.scriptsWithText === 0 && hostile.shown,
      JSON.stringify(hostile),
    );
    await page.waitForTimeout(200);
    await page.close();
    // The classic notebook has RequireJS: with an AMD define on the page the explorers still go live.
    const amdFile = pageFile.replace(/\.html$/, "") + "-requirejs.html";
    await writeExplorersPage(amdFile, { requireJs: true });
    try {
      const amdPage = await openGuarded(context, amdFile, problems);
      const amd = await amdPage.evaluate(() => ({
        live: Array.from(document.querySelectorAll("[data-isochor-explorer]")).map((el) =>
          el.getAttribute("data-isochor-explorer"),
        ),
        defines: window.__amdDefines,
      }));
      add(
        "with RequireJS on the page (classic notebook) every explorer goes live",
        amd.live.length === PAGE_EXPLORERS.length &&
          amd.live.every((s) => s === "live") &&
          amd.defines === 0,
        JSON.stringify(amd),
      );
      await amdPage.close();
    } finally {
      rmSync(amdFile, { force: true });
    }
  } catch (error) {
    problems.push(error instanceof Error ? error.message.split("\n")[0] : String(error));
  } finally {
    await close();
    if (!options.pageFile) rmSync(pageFile, { force: true });
  }
  add(
    "no request outside file://, no page or console error",
    problems.length === 0,
    problems.join("; ") || "none",
  );
  return results;
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const chromiumPath = process.env.ISOCHOR_CHROMIUM ?? DEFAULT_CHROMIUM_PATH;
  checkExplorers({ chromiumPath }).then(
    (results) => {
      for (const r of results)
        process.stdout.write(`${r.ok ? "ok  " : "FAIL"} ${r.name}: ${r.message}\n`);
      const failed = results.filter((r) => !r.ok).length;
      process.stdout.write(`${results.length - failed} passed, ${failed} failed\n`);
      process.exitCode = failed > 0 ? 1 : 0;
    },
    (error) => {
      process.stderr.write(
        `explorersCheck: ${error instanceof Error ? error.message : String(error)}\n`,
      );
      process.exitCode = 1;
    },
  );
}
