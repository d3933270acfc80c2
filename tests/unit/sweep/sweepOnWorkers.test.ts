/**
 * Sweeps on worker threads (parallel/, run from kernel-lib/dist: `npm run build` first): the
 * arrays equal the single-thread sweep's exactly, progress reaches 100 %, and an AbortSignal
 * stops the workers before the sweep completes.
 */
import { describe, expect, it } from "vitest";
import { sweepOnWorkers } from "../../../kernel-lib/src/parallel/sweepOnWorkers.js";
import type { ProgressSnapshot } from "../../../kernel-lib/src/progress/progressTypes.js";
import type { SweepRequest } from "../../../kernel-lib/src/sweep/types.js";
import {
  abortAtFirstProgress,
  expectSameArrays,
  longRequest,
  threeAlkaneGas,
  threeAlkaneX,
} from "./fixtures.js";

const gas = threeAlkaneGas();
const x = threeAlkaneX;

function recorder() {
  const shown: ProgressSnapshot[] = [];
  return { shown, sink: { show: (s: ProgressSnapshot) => shown.push(s) } };
}

describe("sweepOnWorkers", () => {
  it("equals fluid.sweep exactly, with failing points, and reports progress to 100 %", async () => {
    const request: SweepRequest = {
      specification: "TP",
      first: { from: 170, to: 400, count: 40 },
      // the last pressure is beyond the physical limit: every point of that column fails
      second: [1e5, 2e6, 8e6, 2e7, 1e12],
      x,
      phaseCheck: "stability",
      properties: ["h", "s", "rho", "cp", "quality"],
    };
    const single = gas.sweep(request);
    const { shown, sink } = recorder();
    const parallel = await sweepOnWorkers(gas, request, {
      workers: 2,
      threshold: 1,
      chunk: 16,
      progress: { sink, maxUpdatesPerSecond: 1000 },
    });
    expectSameArrays(single, parallel, request.properties);
    expect(Array.from(parallel.phaseCount)).toEqual(Array.from(single.phaseCount));
    expect(parallel.failed).toBe(40);
    expect(parallel.errors.map((e) => e.index)).toEqual(single.errors.map((e) => e.index));
    // some points split below the dew line of this gas: flashed, not one phase
    expect(Array.from(parallel.phaseCount).some((c) => c === 2)).toBe(true);
    const last = shown[shown.length - 1];
    expect(last.status).toBe("done");
    expect(last.done).toBe(single.count);
    expect(last.total).toBe(single.count);
  });

  it("an AbortSignal stops the sweep and rejects with its reason", async () => {
    const controller = new AbortController();
    const { shown, sink } = recorder();
    const promise = sweepOnWorkers(gas, longRequest(x), {
      workers: 2,
      threshold: 1,
      chunk: 50,
      signal: controller.signal,
      progress: abortAtFirstProgress(controller, sink),
    });
    await expect(promise).rejects.toThrow("stopped by the test");
    const last = shown[shown.length - 1];
    expect(last.status).toBe("failed");
    // 160,000 flashed points: stopped long before the end
    expect(last.done).toBeLessThan(160_000);
  });

  it("a small sweep runs in this thread; bad options are refused", async () => {
    const r = await sweepOnWorkers(
      gas,
      { specification: "TP", first: [300.5], second: [5e6], x, properties: ["h"] },
      { progress: false },
    );
    expect(r.values.h![0]).toBe(
      gas.sweep({ specification: "TP", first: [300.5], second: [5e6], x, properties: ["h"] }).values
        .h![0],
    );
    await expect(
      sweepOnWorkers(
        gas,
        { specification: "TP", first: [300.5], second: [5e6], x, properties: ["h"] },
        { workers: 0 },
      ),
    ).rejects.toThrow(/workers/);
  });
});
