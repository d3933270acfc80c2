/* global document, Event */
// `npm run bench:browser`: time from a slider input to the redrawn chart, per explorer, in headless
// Chromium (the page of tests/browser/explorersPage.mjs: 400-point curves, records' CSP).
// One JSON line per case: { case, secondsPerCall (median wall time), p90Seconds,
// mainThreadCpuSecondsPerCall (the page's main-thread CPU time per redraw), calls, dataPathShare }.
// "dataPathShare" is the fraction of redraws that replaced data in the running view (the rest
// re-embedded the chart because its layers or titles changed, e.g. an isotherm crossing Tc).
// Needs `npm run build` first. The machine's load average is printed with the results: on a
// shared machine the numbers move with it.
import { loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import { launchChromium, openGuarded } from "../../tests/browser/explorersCheck.mjs";
import {
  PAGE_EXPLORERS,
  REFERENCE_EXPLORERS,
  writeExplorersPage,
} from "../../tests/browser/explorersPage.mjs";

const EXPLORERS = [...PAGE_EXPLORERS, ...REFERENCE_EXPLORERS];

const CALLS = Number(process.env.BENCH_CALLS ?? 25);
const WARMUP = 3;

function sweep([id, positions]) {
  const root = document.querySelector(`#page-${id} .isochor-explorer`);
  const slider = root.querySelector(".isochor-explorer-controls input[type=range]");
  const out = [];
  const one = (position) =>
    new Promise((done) => {
      root.addEventListener(
        "isochor-explorer-redraw",
        (event) => done({ wallMs: performance.now() - started, ...event.detail }),
        { once: true },
      );
      const started = performance.now();
      slider.value = String(position);
      slider.dispatchEvent(new Event("input", { bubbles: true }));
    });
  return positions
    .reduce((chain, p) => chain.then(() => one(p).then((r) => void out.push(r))), Promise.resolve())
    .then(() => out);
}

const quantile = (sorted, q) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];

const page_file = join(tmpdir(), `isochor-bench-explorers-${process.pid}.html`);
await writeExplorersPage(page_file, { explorers: EXPLORERS });
const { context, close } = await launchChromium(process.env.ISOCHOR_CHROMIUM);
const problems = [];
try {
  const page = await openGuarded(context, page_file, problems);
  // Main-thread CPU time of the page (Chrome's "ThreadTime" metric): unlike wall time it does
  // not grow when other processes share the cores.
  const cdp = await context.newCDPSession(page);
  await cdp.send("Performance.enable");
  const threadTime = async () =>
    (await cdp.send("Performance.getMetrics")).metrics.find((m) => m.name === "ThreadTime").value;
  for (const e of EXPLORERS) {
    // positions walk back and forth over the slider's middle (steps of 7 of 400)
    const positions = Array.from({ length: CALLS }, (_, i) => 150 + 7 * (i % 15));
    await page.evaluate(sweep, [e.id, [120, 130, 140].slice(0, WARMUP)]);
    const cpuBefore = await threadTime();
    const results = await page.evaluate(sweep, [e.id, positions]);
    const cpuSeconds = (await threadTime()) - cpuBefore;
    const wall = results.map((r) => r.wallMs).sort((a, b) => a - b);
    const line = {
      case: `explorer-${e.id}-slider-400-points`,
      secondsPerCall: quantile(wall, 0.5) / 1000,
      p90Seconds: quantile(wall, 0.9) / 1000,
      mainThreadCpuSecondsPerCall: cpuSeconds / results.length,
      computeSecondsMedian:
        results.map((r) => r.computeMs).sort((a, b) => a - b)[results.length >> 1] / 1000,
      calls: results.length,
      dataPathShare: results.filter((r) => r.path === "data").length / results.length,
    };
    process.stdout.write(JSON.stringify(line) + "\n");
  }
  await page.close();
} finally {
  await close();
}
process.stdout.write(
  JSON.stringify({
    case: "machine-load-average-1min",
    value: loadavg()[0],
    cpus: (await import("node:os")).cpus().length,
  }) + "\n",
);
if (problems.length > 0) {
  process.stderr.write(`problems: ${problems.join("; ")}\n`);
  process.exitCode = 1;
}
