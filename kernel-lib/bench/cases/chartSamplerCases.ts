/**
 * Chart sampler cases (issue 16): a property surface of the chart samplers on the sweep path (a
 * quantity named by its sweep property) and the same surface through the per-state path (a
 * `pick` from one stateAtTP object per point, what every sampler did before), in one run so
 * their ratio is measured under the same load.
 */
import { surfaceFromFluid } from "../../src/charts/sample/surfaceFromFluid.js";
import { linearGrid } from "../../src/charts/sampling.js";
import { defineFluid } from "../../src/fluid/defineFluid.js";
import type { BenchCase } from "../harness.js";

// the surface-200x200 grid: methane, Peng-Robinson, 200-500 K, 0.1-20 MPa
const TEMPS = linearGrid(200, 500, 200);
const PRESSURES = linearGrid(1e5, 20e6, 200);

export const chartSamplerCases: BenchCase[] = [
  {
    name: "sampler-surface-200x200",
    description:
      "surfaceFromFluid, h of methane (PR) on a 200 x 200 grid, 200-500 K, 0.1-20 MPa, sweep path (property: h)",
    measure: { samples: 21 },
    setup() {
      const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
      return function samplerSurfaceSweep() {
        const r = surfaceFromFluid(fluid, TEMPS, PRESSURES, {
          name: "Enthalpy",
          kind: "molarEnergy",
          property: "h",
        });
        return r.values[0][0] + r.values[199][199];
      };
    },
  },
  {
    name: "sampler-surface-200x200-pick",
    description: "the same surface through one stateAtTP per point (pick: s.molar.h)",
    measure: { samples: 21 },
    setup() {
      const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
      return function samplerSurfacePick() {
        const r = surfaceFromFluid(fluid, TEMPS, PRESSURES, {
          name: "Enthalpy",
          kind: "molarEnergy",
          pick: (s) => s.molar.h,
        });
        return r.values[0][0] + r.values[199][199];
      };
    },
  },
];
