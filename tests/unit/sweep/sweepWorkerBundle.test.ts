/**
 * The sweep worker as one bundled file (`npm run build` first: kernel-lib/bundleWorker.js writes
 * dist/parallel/sweepWorker.bundle.js after tsc): the build made it and it is current; it loads
 * as one file (no module of dist besides itself); the library picks it from kernel-lib/dist
 * whatever the working folder (a notebook's kernel, the CLI) and through the installed package
 * name; a stale bundle (a tsc-only build after it) is passed over for the module-by-module entry;
 * a sweep on the bundle's workers equals the single-thread sweep exactly. startSweepWorkers
 * starts the pool ahead of need (optionally running a warm-up sweep): a later sweep starts no
 * worker and sends no definition, its numbers stay exact, and the started workers do not keep
 * Node alive.
 */
import { spawnSync } from "node:child_process";
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { Worker } from "node:worker_threads";
import { afterAll, describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import {
  closeSweepWorkers,
  defaultWorkerScript,
  startSweepWorkers,
  sweepOnWorkers,
  sweepWorkerStats,
  workerScriptIn,
} from "../../../kernel-lib/src/parallel/sweepOnWorkers.js";
import type { SweepRequest } from "../../../kernel-lib/src/sweep/types.js";

afterAll(() => closeSweepWorkers());

const root = path.resolve(__dirname, "../../..");
const parallelDir = path.join(root, "kernel-lib", "dist", "parallel");
const entry = path.join(parallelDir, "sweepWorker.js");
const bundle = path.join(parallelDir, "sweepWorker.bundle.js");

/** The files a worker thread has required after requiring `file` (CommonJS module cache). */
function loadedInWorker(file: string): Promise<string[]> {
  return new Promise<string[]>((resolve, reject) => {
    const w = new Worker(
      `const { parentPort } = require("node:worker_threads");
       require(${JSON.stringify(file)});
       parentPort.postMessage(Object.keys(require.cache));`,
      { eval: true },
    );
    w.once("message", (m: string[]) => {
      void w.terminate();
      resolve(m);
    });
    w.once("error", reject);
  });
}

describe("the bundled sweep worker", () => {
  it("is made by the build, current, and chosen by default", () => {
    expect(fs.existsSync(entry), `${entry} (run npm run build)`).toBe(true);
    expect(fs.existsSync(bundle), `${bundle}: the build did not bundle the worker`).toBe(true);
    expect(fs.statSync(bundle).mtimeMs).toBeGreaterThanOrEqual(fs.statSync(entry).mtimeMs);
    expect(workerScriptIn(parallelDir)).toBe(bundle);
    expect(defaultWorkerScript()).toBe(bundle);
  });

  it("requires nothing of dist besides itself (static and in a worker thread)", async () => {
    const source = fs.readFileSync(bundle, "utf8");
    const required = [...source.matchAll(/\brequire\("([^"]+)"\)/g)].map((m) => m[1]);
    expect(required.length).toBeGreaterThan(0);
    for (const r of required) expect(r, `the bundle requires ${r}`).toMatch(/^node:/);
    // what a worker thread loads to start: the bundle only, where the entry loads the library
    // module by module (the test runner may add a preload of its own, outside kernel-lib)
    const library = (files: string[]) =>
      files.filter((f) => f.startsWith(path.join(root, "kernel-lib")));
    expect(library(await loadedInWorker(bundle))).toEqual([bundle]);
    expect(library(await loadedInWorker(entry)).length).toBeGreaterThan(50);
  });

  it("is found from kernel-lib/dist and through the package name, whatever the working folder", () => {
    const script = `
      const lib = require("isochor");
      const gas = lib.defineFluid({ components: ["methane", "ethane"], model: "peng-robinson" });
      const request = { specification: "TP", first: { from: 300, to: 400, count: 30 },
        second: { from: 1e5, to: 1e7, count: 20 }, x: [0.9, 0.1], phaseCheck: "none",
        properties: ["h", "rho"] };
      const single = gas.sweep(request);
      lib.sweepOnWorkers(gas, request, { workers: 2, threshold: 1, rangeSize: 50, progress: false })
        .then((r) => {
          const same = ["h", "rho"].every((p) =>
            single.values[p].every((v, i) => Object.is(v, r.values[p][i])));
          console.log(JSON.stringify({ script: lib.defaultWorkerScript(), same, count: r.count }));
        });
    `;
    // a folder outside the repository, as a notebook's kernel or a user's shell may have
    const cwd = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-worker-"));
    try {
      const r = spawnSync(process.execPath, ["-e", script], {
        cwd,
        encoding: "utf8",
        timeout: 60_000,
        env: { ...process.env, NODE_PATH: path.join(root, "node_modules") },
      });
      expect(r.stderr).toBe("");
      expect(JSON.parse(r.stdout)).toEqual({ script: bundle, same: true, count: 600 });
    } finally {
      fs.rmSync(cwd, { recursive: true, force: true });
    }
  });

  it("is passed over when older than the entry, and missing files are said so", () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-worker-"));
    try {
      expect(workerScriptIn(dir)).toBeUndefined();
      const e = path.join(dir, "sweepWorker.js");
      const b = path.join(dir, "sweepWorker.bundle.js");
      fs.writeFileSync(e, "");
      expect(workerScriptIn(dir)).toBe(e);
      fs.writeFileSync(b, "");
      fs.utimesSync(e, new Date(1_000_000), new Date(1_000_000));
      fs.utimesSync(b, new Date(2_000_000), new Date(2_000_000));
      expect(workerScriptIn(dir)).toBe(b);
      // a tsc-only build after the bundle: the entry is newer, the bundle may hold old code
      fs.utimesSync(e, new Date(3_000_000), new Date(3_000_000));
      expect(workerScriptIn(dir)).toBe(e);
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });

  it("gives the single-thread sweep's numbers exactly", async () => {
    const gas = defineFluid({
      components: ["methane", "propane", "n-butane"],
      model: "peng-robinson",
    });
    const request: SweepRequest = {
      specification: "TP",
      first: { from: 200.5, to: 420.5, count: 45 },
      second: { from: 5e4, to: 1.2e7, count: 25 },
      x: [0.8, 0.15, 0.05],
      phaseCheck: "stability",
      properties: ["h", "s", "rho", "cp", "quality"],
    };
    const single = gas.sweep(request);
    const parallel = await sweepOnWorkers(gas, request, {
      workers: 2,
      threshold: 1,
      rangeSize: 101,
      progress: false,
      workerScript: bundle,
    });
    for (const p of request.properties) {
      const a = single.values[p]!;
      const b = parallel.values[p]!;
      for (let i = 0; i < a.length; i++) expect(Object.is(a[i], b[i]), `${p}[${i}]`).toBe(true);
    }
    expect(Array.from(parallel.phaseKind)).toEqual(Array.from(single.phaseKind));
    expect(Array.from(parallel.errorCode)).toEqual(Array.from(single.errorCode));
    expect(parallel.errors).toEqual(single.errors);
  });

  it("starts ahead of need: the next sweep reuses the workers and fluids, Node still exits", async () => {
    await closeSweepWorkers();
    const gas = defineFluid({ components: ["methane", "ethane"], model: "peng-robinson" });
    const request: SweepRequest = {
      specification: "TP",
      first: { from: 260.5, to: 380.5, count: 20 },
      second: { from: 1e5, to: 8e6, count: 15 },
      x: [0.9, 0.1],
      phaseCheck: "none",
      properties: ["h", "s"],
    };
    const before = sweepWorkerStats();
    expect(startSweepWorkers({ workers: 2, fluids: [gas] })).toBe(2);
    // workers already idle count: asking again starts none
    expect(startSweepWorkers({ workers: 2, fluids: [gas] })).toBe(2);
    const ready = sweepWorkerStats();
    expect(ready.workers).toBe(2);
    expect(ready.busy).toBe(0);
    expect(ready.started - before.started).toBe(2);
    expect(ready.definitions - before.definitions).toBe(2);
    const single = gas.sweep(request);
    const r = await sweepOnWorkers(gas, request, {
      workers: 2,
      threshold: 1,
      rangeSize: 40,
      progress: false,
    });
    const after = sweepWorkerStats();
    expect(after.started).toBe(ready.started);
    expect(after.definitions).toBe(ready.definitions);
    for (const p of ["h", "s"] as const) {
      const a = single.values[p]!;
      const b = r.values[p]!;
      for (let i = 0; i < a.length; i++) expect(Object.is(a[i], b[i]), `${p}[${i}]`).toBe(true);
    }
    expect(() => startSweepWorkers({ workers: 0 })).toThrow(/options\.workers/);
  });

  it("a warm-up sweep ahead of need leaves the next sweep's numbers exact", async () => {
    await closeSweepWorkers();
    const gas = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
    const request: SweepRequest = {
      specification: "TP",
      first: { from: 230.5, to: 430.5, count: 30 },
      second: { from: 2e5, to: 9e6, count: 20 },
      x: [0.7, 0.3],
      phaseCheck: "stability",
      properties: ["h", "s", "rho", "quality"],
    };
    const before = sweepWorkerStats();
    // the warm-up's fluid is defined once per worker; a partial warm-up (fewer points than asked)
    const n = startSweepWorkers({ workers: 2, warmUp: { fluid: gas, request, points: 150 } });
    expect(n).toBe(2);
    expect(sweepWorkerStats().definitions - before.definitions).toBe(2);
    const single = gas.sweep(request);
    const r = await sweepOnWorkers(gas, request, {
      workers: 2,
      threshold: 1,
      rangeSize: 33,
      progress: false,
    });
    expect(sweepWorkerStats().started - before.started).toBe(2);
    for (const p of request.properties) {
      const a = single.values[p]!;
      const b = r.values[p]!;
      for (let i = 0; i < a.length; i++) expect(Object.is(a[i], b[i]), `${p}[${i}]`).toBe(true);
    }
    expect(Array.from(r.phaseKind)).toEqual(Array.from(single.phaseKind));
    expect(r.errors).toEqual(single.errors);
    expect(() =>
      startSweepWorkers({ workers: 1, warmUp: { fluid: gas, request, points: 0 } }),
    ).toThrow(/options\.warmUp\.points/);
  });

  it("started workers that never sweep do not keep Node alive", () => {
    const dist = path.join(root, "kernel-lib", "dist");
    const script = `
      const { defineFluid } = require(${JSON.stringify(dist + "/fluid/defineFluid.js")});
      const { startSweepWorkers, sweepWorkerStats } = require(${JSON.stringify(dist + "/parallel/sweepOnWorkers.js")});
      const gas = defineFluid({ components: ["methane"], model: "peng-robinson" });
      const request = { specification: "TP", first: { from: 200, to: 400, count: 50 },
        second: { from: 1e5, to: 1e7, count: 40 }, phaseCheck: "none", properties: ["h", "s"] };
      // workers loading, then sweeping their warm-up, while the main script has nothing left to do
      const n = startSweepWorkers({ workers: 2, fluids: [gas], warmUp: { fluid: gas, request } });
      setTimeout(() => console.log("started", n, sweepWorkerStats().workers), 300);
    `;
    const r = spawnSync(process.execPath, ["-e", script], { encoding: "utf8", timeout: 30_000 });
    expect(r.error, "the process did not exit by itself within 30 s").toBeUndefined();
    expect(r.stdout.trim()).toBe("started 2 2");
    expect(r.status).toBe(0);
  });
});
