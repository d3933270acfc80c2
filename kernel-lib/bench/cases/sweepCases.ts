/**
 * Sweep cases (issue 16): the same grids through the per-state path (stateAtTP, one object per
 * state) and through fluid.sweep (typed arrays, the allocation-free cubic path), in one run so
 * their ratio is measured under the same load.
 */
import * as os from "node:os";
import * as path from "node:path";
import { defineFluid } from "../../src/fluid/defineFluid.js";
import {
  closeSweepWorkers,
  sweepOnWorkers,
  workerScriptIn,
} from "../../src/parallel/sweepOnWorkers.js";
import type { BenchCase } from "../harness.js";
import { TEN, X10 } from "./richGas.js";

// grid-residual-200x200: Peng-Robinson methane, residual h and s, 100-600 K, 0.01-30 MPa
const N = 200;
const T_RES = Float64Array.from({ length: N }, (_, i) => 100 + (500 * i) / (N - 1));
const P_RES = Float64Array.from({ length: N }, (_, j) => 1e4 + ((30e6 - 1e4) * j) / (N - 1));

export const sweepCases: BenchCase[] = [
  {
    name: "grid-residual-200x200",
    description:
      "residual h and s of methane (PR, stable root) on a 200 x 200 grid, 100-600 K, 0.01-30 MPa, one thread, through fluid.sweep",
    measure: { samples: 21 },
    setup() {
      const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
      return function gridResidualSweep() {
        const r = fluid.sweep({
          specification: "TP",
          first: T_RES,
          second: P_RES,
          properties: ["hRes", "sRes"],
        });
        if (r.failed !== 0) throw new Error(`grid-residual-200x200: ${r.failed} points failed`);
        return r.values.hRes![0] + r.values.sRes![N * N - 1];
      };
    },
  },
  {
    name: "grid-residual-200x200-per-state",
    description: "the same grid through stateAtTP per state (the path before sweeps)",
    measure: { samples: 21 },
    setup() {
      const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
      const h = new Float64Array(N * N);
      const s = new Float64Array(N * N);
      return function gridResidualPerState() {
        for (let i = 0; i < N; i++) {
          for (let j = 0; j < N; j++) {
            const st = fluid.stateAtTP(T_RES[i], P_RES[j]);
            h[i * N + j] = st.residual.h;
            s[i * N + j] = st.residual.s;
          }
        }
        return h[0] + s[N * N - 1];
      };
    },
  },
  {
    name: "surface-200x200-sweep",
    description:
      "the surface-200x200 grid (h and s of methane, PR, 200-500 K, 0.1-20 MPa) through fluid.sweep",
    measure: { samples: 21 },
    setup() {
      const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
      return function surfaceSweep() {
        const r = fluid.sweep({
          specification: "TP",
          first: { from: 200, to: 500, count: 200 },
          second: { from: 1e5, to: 20e6, count: 200 },
          properties: ["h", "s"],
        });
        return r.values.h![0] + r.values.s![0];
      };
    },
  },
  {
    name: "grid-residual-200x200-fast",
    description:
      'the grid-residual-200x200 grid through fluid.sweep with precision "fast" (within 1e-10 of the single state)',
    measure: { samples: 21 },
    setup() {
      const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
      return function gridResidualSweepFast() {
        const r = fluid.sweep({
          specification: "TP",
          first: T_RES,
          second: P_RES,
          properties: ["hRes", "sRes"],
          precision: "fast",
        });
        if (r.failed !== 0)
          throw new Error(`grid-residual-200x200-fast: ${r.failed} points failed`);
        return r.values.hRes![0] + r.values.sRes![N * N - 1];
      };
    },
  },
  {
    name: "surface-200x200-sweep-fast",
    description:
      'the surface-200x200 grid through fluid.sweep with precision "fast" (within 1e-10 of the single state)',
    measure: { samples: 21 },
    setup() {
      const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
      return function surfaceSweepFast() {
        const r = fluid.sweep({
          specification: "TP",
          first: { from: 200, to: 500, count: 200 },
          second: { from: 1e5, to: 20e6, count: 200 },
          properties: ["h", "s"],
          precision: "fast",
        });
        return r.values.h![0] + r.values.s![0];
      };
    },
  },
];

/** The built worker script (the bench bundle runs from out/bench; workers need kernel-lib/dist). */
function workerScript(): string {
  // the build's one-file bundle, as the library picks it (else the module-by-module entry)
  const dir = path.resolve(process.cwd(), "kernel-lib", "dist", "parallel");
  const file = workerScriptIn(dir);
  if (file === undefined) throw new Error(`no worker in ${dir}: run \`npm run build\` first`);
  return file;
}

/** One million (T, P) states of the ten-component gas: 1000 x 1000, 340-600 K, 1-10 MPa. */
function mix10Case(
  name: string,
  workers: number | "all",
  description: string,
  cold = false,
): BenchCase {
  return {
    name,
    description,
    measure: { samples: 3 },
    setup() {
      throw new Error(`${name} is asynchronous (setupAsync)`);
    },
    setupAsync() {
      const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
      const script = workerScript();
      const count = workers === "all" ? os.availableParallelism() : workers;
      return async function sweepMix10() {
        const r = await sweepOnWorkers(
          fluid,
          {
            specification: "TP",
            first: { from: 340.25, to: 600.25, count: 1000 },
            second: { from: 1e6, to: 10e6, count: 1000 },
            x: X10,
            // one phase there: the gas is two-phase in PR only below about 325 K at 5 MPa (see
            // engineCases.ts); the sweep says so in its warnings
            phaseCheck: "none",
            properties: ["h", "s", "rho"],
          },
          { workers: count, threshold: 1, progress: false, workerScript: script },
        );
        if (r.failed !== 0) throw new Error(`${name}: ${r.failed} points failed`);
        // cold: the pool's workers are ended, so the next call starts and defines them again
        if (cold) await closeSweepWorkers();
        return r.values.h![0];
      };
    },
  };
}

sweepCases.push(
  mix10Case(
    "sweep-1e6-mix10",
    "all",
    "h, s and rho of the ten-component gas (PR) at 1e6 (T, P) points on all cores (worker threads), the pool warmed by one sweep first (the measurement's warm-up call), as repeated sweeps in a notebook; CPU time counts every thread, so 1e6 / secondsPerCall is states per second per core",
  ),
  mix10Case(
    "sweep-1e6-mix10-1worker",
    1,
    "the same sweep on one worker thread of a warmed pool (the baseline of the scaling ratio)",
  ),
  mix10Case(
    "sweep-1e6-mix10-cold",
    "all",
    "the sweep-1e6-mix10 sweep on all cores from cold: the workers are started, load the library and define the fluid in every call, and are ended after it (closeSweepWorkers)",
    true,
  ),
  mix10Case(
    "sweep-1e6-mix10-1worker-cold",
    1,
    "the same cold sweep on one worker thread (the baseline of the cold scaling ratio)",
    true,
  ),
);
