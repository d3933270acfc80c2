/**
 * The persistent worker pool of the parallel sweep (parallel/workerPool.ts, `npm run build`
 * first): later sweeps reuse the workers and the fluid definitions they hold; ranges handed out
 * on demand come back in any order and are written into their place (arrays and the first error
 * messages equal the single-thread sweep's); a worker terminated by cancellation or one that
 * crashes leaves the pool and the next sweep runs on new ones with equal results; the result
 * arrays, on SharedArrayBuffers, make the same table files; an idle pool does not keep Node
 * alive; the cache key of a definition tells definitions apart faithfully.
 */
import { spawnSync } from "node:child_process";
import * as path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import {
  closeSweepWorkers,
  sweepOnWorkers,
  sweepWorkerStats,
} from "../../../kernel-lib/src/parallel/sweepOnWorkers.js";
import { guidedBounds, rangeBounds } from "../../../kernel-lib/src/parallel/sweepOnWorkers.js";
import { specKey } from "../../../kernel-lib/src/parallel/specKey.js";
import { tableOfSweep } from "../../../kernel-lib/src/propertyTables/propertyTable.js";
import { tableCsv } from "../../../kernel-lib/src/propertyTables/tableCsv.js";
import { tableParquet } from "../../../kernel-lib/src/propertyTables/tableParquet.js";
import type {
  SweepProperty,
  SweepRequest,
  SweepResult,
} from "../../../kernel-lib/src/sweep/types.js";
import {
  abortAtFirstProgress,
  expectSameArrays,
  longRequest,
  threeAlkaneGas,
  threeAlkaneX,
} from "./fixtures.js";

afterAll(() => closeSweepWorkers());

const gas = threeAlkaneGas();
const x = threeAlkaneX;
// one phase of the feed (phaseCheck "none"): cheap points, many ranges
const request: SweepRequest = {
  specification: "TP",
  first: { from: 250.5, to: 450.5, count: 60 },
  second: { from: 1e5, to: 1.5e7, count: 30 },
  x,
  phaseCheck: "none",
  properties: ["h", "s", "rho", "cp"],
};

function expectEqual(
  single: SweepResult,
  parallel: SweepResult,
  properties: readonly SweepProperty[],
) {
  expectSameArrays(single, parallel, properties);
  expect(parallel.failed).toBe(single.failed);
  expect(parallel.errors).toEqual(single.errors);
}

describe("the sweep worker pool", () => {
  it("reuses its workers and the fluid they hold in later sweeps", async () => {
    await closeSweepWorkers();
    const single = gas.sweep(request);
    const options = { workers: 2, threshold: 1, rangeSize: 97, progress: false as const };
    const before = sweepWorkerStats();
    expectEqual(single, await sweepOnWorkers(gas, request, options), request.properties);
    const first = sweepWorkerStats();
    expect(first.started - before.started).toBe(2);
    expect(first.definitions - before.definitions).toBe(2);
    expect(first.workers).toBe(2);
    expect(first.busy).toBe(0);
    // the same fluid again, and an equal definition built separately: nothing started or sent
    const twin = threeAlkaneGas();
    expectEqual(single, await sweepOnWorkers(gas, request, options), request.properties);
    expectEqual(single, await sweepOnWorkers(twin, request, options), request.properties);
    const again = sweepWorkerStats();
    expect(again.started).toBe(first.started);
    expect(again.definitions).toBe(first.definitions);
    // one worker only: taken from the pool
    expectEqual(
      single,
      await sweepOnWorkers(gas, request, { ...options, workers: 1 }),
      request.properties,
    );
    expect(sweepWorkerStats().started).toBe(first.started);
  });

  it("keeps the first 100 error messages by index when ranges return out of order", async () => {
    // every fourth pressure beyond the physical limit: 400 failing points over many ranges
    const bad: SweepRequest = {
      ...request,
      first: { from: 250.5, to: 450.5, count: 100 },
      second: [1e5, 2e6, 8e6, 1e12],
    };
    const single = gas.sweep(bad);
    expect(single.failed).toBe(100);
    const parallel = await sweepOnWorkers(
      gas,
      { ...bad, first: { from: 250.5, to: 450.5, count: 300 } },
      { workers: 2, threshold: 1, rangeSize: 7, progress: false },
    );
    const wide = gas.sweep({ ...bad, first: { from: 250.5, to: 450.5, count: 300 } });
    expect(wide.failed).toBe(300);
    expectEqual(wide, parallel, bad.properties);
  });

  it("runs two sweeps at once on separate workers, each equal to its single-thread run", async () => {
    const other: SweepRequest = { ...request, properties: ["Z", "hRes"], basis: "mass" };
    const options = { workers: 2, threshold: 1, rangeSize: 50, progress: false as const };
    const [a, b] = await Promise.all([
      sweepOnWorkers(gas, request, options),
      sweepOnWorkers(gas, other, options),
    ]);
    expectEqual(gas.sweep(request), a, request.properties);
    expectEqual(gas.sweep(other), b, other.properties);
    expect(sweepWorkerStats().busy).toBe(0);
  });

  it("replaces workers terminated by cancellation", async () => {
    const controller = new AbortController();
    const promise = sweepOnWorkers(gas, longRequest(x), {
      workers: 2,
      threshold: 1,
      chunk: 50,
      signal: controller.signal,
      progress: abortAtFirstProgress(controller),
    });
    await expect(promise).rejects.toThrow("stopped by the test");
    // the two workers were busy: terminated and out of the pool at once
    expect(sweepWorkerStats().busy).toBe(0);
    const started = sweepWorkerStats().started;
    expectEqual(
      gas.sweep(request),
      await sweepOnWorkers(gas, request, { workers: 2, threshold: 1, progress: false }),
      request.properties,
    );
    expect(sweepWorkerStats().started).toBeGreaterThan(started);
  });

  it("a worker that crashes fails the sweep with a typed error; the next sweep runs on new ones", async () => {
    const script = path.resolve(__dirname, "crashingSweepWorker.mjs");
    const options = { workers: 2, threshold: 1, progress: false as const, workerScript: script };
    process.env.ISOCHOR_TEST_CRASH_WORKER = "1";
    try {
      await expect(sweepOnWorkers(gas, request, options)).rejects.toThrow(/exited with code 7/);
    } finally {
      delete process.env.ISOCHOR_TEST_CRASH_WORKER;
    }
    expect(sweepWorkerStats().busy).toBe(0);
    expectEqual(
      gas.sweep(request),
      await sweepOnWorkers(gas, request, options),
      request.properties,
    );
  });

  it("a request that cannot be sent to a thread rejects and gives the workers back", async () => {
    const flash = { onIteration: () => undefined } as unknown as SweepRequest["flash"];
    await expect(
      sweepOnWorkers(gas, { ...request, flash }, { workers: 2, threshold: 1, progress: false }),
    ).rejects.toThrow(/could not be cloned/);
    expect(sweepWorkerStats().busy).toBe(0);
  });

  it("its result arrays (on SharedArrayBuffers) make the same property-table files", async () => {
    const r = await sweepOnWorkers(gas, request, { workers: 2, threshold: 1, progress: false });
    expect(r.values.h!.buffer).toBeInstanceOf(SharedArrayBuffer);
    const a = tableOfSweep(gas.sweep(request));
    const b = tableOfSweep(r);
    expect(tableCsv(b)).toBe(tableCsv(a));
    expect(Buffer.from(await tableParquet(b)).equals(Buffer.from(await tableParquet(a)))).toBe(
      true,
    );
  });

  it("an idle pool does not keep Node alive", () => {
    const dist = path.resolve(__dirname, "../../../kernel-lib/dist");
    const script = `
      const { defineFluid } = require(${JSON.stringify(dist + "/fluid/defineFluid.js")});
      const { sweepOnWorkers } = require(${JSON.stringify(dist + "/parallel/sweepOnWorkers.js")});
      const gas = defineFluid({ components: ["methane", "ethane"], model: "peng-robinson" });
      sweepOnWorkers(gas, { specification: "TP", first: { from: 300, to: 400, count: 20 },
        second: { from: 1e5, to: 1e7, count: 20 }, x: [0.9, 0.1], phaseCheck: "none",
        properties: ["h"] }, { workers: 2, threshold: 1, progress: false })
        .then((r) => console.log("swept", r.count));
    `;
    const r = spawnSync(process.execPath, ["-e", script], { encoding: "utf8", timeout: 30_000 });
    expect(r.error, "the process did not exit by itself within 30 s").toBeUndefined();
    expect(r.stdout.trim()).toBe("swept 400");
    expect(r.status).toBe(0);
  });
});

describe("rangeBounds and specKey", () => {
  it("cuts ranges of about the asked size, whole rows when aligned", () => {
    expect(rangeBounds(10, 4, 1)).toEqual([0, 4, 8, 10]);
    expect(rangeBounds(21, 5, 7)).toEqual([0, 7, 14, 21]);
    expect(rangeBounds(21, 100, 7)).toEqual([0, 21]);
    expect(rangeBounds(3, 1, 1)).toEqual([0, 1, 2, 3]);
  });

  it("guided ranges shrink to the minimum, cover every point once and keep whole rows", () => {
    for (const [count, workers, min, align] of [
      [1_000_000, 2, 1954, 1],
      [20_000, 3, 64, 1],
      [1517, 2, 64, 37],
      [5, 4, 64, 1],
    ]) {
      const b = guidedBounds(count, workers, min, align);
      expect(b[0]).toBe(0);
      expect(b[b.length - 1]).toBe(count);
      const sizes = b.slice(1).map((v, i) => v - b[i]);
      expect(sizes.every((s) => s > 0)).toBe(true);
      // not growing, and at least the minimum (rounded to rows) except the last
      for (let i = 1; i < sizes.length - 1; i++) expect(sizes[i]).toBeLessThanOrEqual(sizes[i - 1]);
      for (let i = 0; i < sizes.length - 1; i++) {
        expect(sizes[i]).toBeGreaterThanOrEqual(Math.min(min, count) - align / 2);
        expect(sizes[i] % align).toBe(0);
      }
      // the first range is a quarter of each worker's share (rounded to rows)
      if (sizes.length > 1) {
        expect(Math.abs(sizes[0] - Math.max(min, count / (4 * workers)))).toBeLessThanOrEqual(
          align,
        );
      }
    }
    expect(guidedBounds(1_000_000, 2, 1954, 1).length - 1).toBe(40);
  });

  it("gives equal definitions one key and tells different ones apart", () => {
    const spec = {
      components: ["methane", "ethane"],
      model: "peng-robinson",
      kij: [
        [0, 0.01],
        [0.01, 0],
      ],
    };
    const key = specKey(spec);
    expect(key).toMatch(/^[0-9a-f]{64}$/);
    // key order does not matter
    expect(
      specKey({
        kij: [
          [0, 0.01],
          [0.01, 0],
        ],
        model: "peng-robinson",
        components: ["methane", "ethane"],
      }),
    ).toBe(key);
    expect(
      specKey({
        ...spec,
        kij: [
          [0, 0.010000000000000002],
          [0.01, 0],
        ],
      }),
    ).not.toBe(key);
    expect(
      specKey({
        ...spec,
        kij: [
          [-0, 0.01],
          [0.01, 0],
        ],
      }),
    ).not.toBe(key);
    expect(specKey({ ...spec, kij: [Float64Array.of(0, 0.01), [0.01, 0]] })).not.toBe(key);
    expect(specKey({ ...spec, volumeTranslation: undefined })).not.toBe(key);
    expect(specKey({ ...spec, components: ["methane", "ethane", undefined] })).not.toBe(key);
    expect(specKey({ ...spec, components: ["methane,ethane"] })).not.toBe(key);
    expect(specKey({ ...spec, model: () => 1 })).toBeUndefined();
    expect(specKey({ ...spec, when: new Date(0) })).toBeUndefined();
  });
});
