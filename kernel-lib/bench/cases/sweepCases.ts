/**
 * Sweep cases (issue 16): the same grids through the per-state path (stateAtTP, one object per
 * state) and through fluid.sweep (typed arrays, the allocation-free cubic path), in one run so
 * their ratio is measured under the same load.
 */
import { defineFluid } from "../../src/fluid/defineFluid.js";
import type { BenchCase } from "../harness.js";

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
];
