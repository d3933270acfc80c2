/**
 * Precision "fast" on worker threads (parallel/, `npm run build` first): the fast route of the
 * row kernel starts each point's Newton iteration from the previous points of its temperature row
 * (sweep/leanRows.ts fastPoint), so a worker's range that began inside a row would start from the
 * closed form there and round differently. The arrays must equal the fast sweep of one thread
 * exactly (Object.is per element), on grids whose rows do not divide evenly among the ranges.
 */
import { afterAll, describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import {
  closeSweepWorkers,
  sweepOnWorkers,
} from "../../../kernel-lib/src/parallel/sweepOnWorkers.js";
import type { SweepRequest } from "../../../kernel-lib/src/sweep/types.js";
import { expectSameArrays } from "./fixtures.js";

afterAll(() => closeSweepWorkers());

function expectSame(
  single: ReturnType<ReturnType<typeof defineFluid>["sweep"]>,
  parallel: typeof single,
  request: SweepRequest,
) {
  expectSameArrays(single, parallel, request.properties);
  expect(Array.from(parallel.phaseCount)).toEqual(Array.from(single.phaseCount));
}

describe('sweepOnWorkers with precision "fast"', () => {
  it("methane (pure, three-root region below Tc included) equals the one-thread fast sweep", async () => {
    const methane = defineFluid({ components: ["methane"], model: "peng-robinson" });
    // 41 rows of 37 pressures: 1517 points, no split of them into ranges falls on row starts
    // by chance; 150-400 K crosses Tc = 190.56 K (PR methane), so some rows have three roots
    const request: SweepRequest = {
      specification: "TP",
      first: { from: 150.3, to: 400.3, count: 41 },
      second: { from: 1e5, to: 2e7, count: 37 },
      properties: ["hRes", "sRes", "rho", "Z"],
      precision: "fast",
    };
    const single = methane.sweep(request);
    // the fast route must have taken points (else the test would compare the exact route)
    const exact = methane.sweep({ ...request, precision: "exact" });
    let differ = 0;
    for (let i = 0; i < single.count; i++) {
      if (!Object.is(single.values.hRes![i], exact.values.hRes![i])) differ++;
    }
    expect(differ).toBeGreaterThan(0);
    for (const workers of [2, 3]) {
      const parallel = await sweepOnWorkers(methane, request, {
        workers,
        threshold: 1,
        chunk: 50,
        // ranges of about 50 points: most would begin inside a row of 37 if not rounded to rows
        rangeSize: 50,
        progress: false,
      });
      expectSame(single, parallel, request);
    }
  });

  it("the ten-component gas (energies extent, mass basis) equals the one-thread fast sweep", async () => {
    const gas = defineFluid({
      components: ["methane", "ethane", "propane", "n-butane", "nitrogen", "carbon-dioxide"],
      model: "peng-robinson",
    });
    const request: SweepRequest = {
      specification: "TP",
      first: { from: 300.1, to: 500.1, count: 23 },
      second: { from: 1e6, to: 1e7, count: 29 },
      x: [0.8, 0.08, 0.04, 0.02, 0.03, 0.03],
      phaseCheck: "none",
      basis: "mass",
      properties: ["h", "s", "rho"],
      precision: "fast",
    };
    const single = gas.sweep(request);
    const parallel = await sweepOnWorkers(gas, request, {
      workers: 2,
      threshold: 1,
      chunk: 40,
      rangeSize: 40,
      progress: false,
    });
    expectSame(single, parallel, request);
  });
});
