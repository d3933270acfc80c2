/**
 * Process cases (issue 14): a compressor stage with the exact polytropic path on the
 * ten-component rich gas of the engine and flash cases, from 20 to 50 bar with polytropic
 * efficiency 0.78, suction cycled over 16 temperatures around 330 K (one phase; the setup checks
 * that the path stays on the single-phase route). One call: the path (RK4 with step doubling to
 * 1e-9), the isentrope, the interior nodes' flashes, the discharge flash and Schultz's method.
 */
import { defineFluid } from "../../src/fluid/defineFluid.js";
import { defineStream } from "../../src/process/stream.js";
import { compressorStage } from "../../src/process/compressor.js";
import type { BenchCase } from "../harness.js";
import { TEN, X10 } from "./richGas.js";

// 328.125 to 331.875 K (none a whole number, see engineCases.ts)
const TEMPERATURES = Float64Array.from({ length: 16 }, (_, i) => 328.125 + 0.25 * i);

export const processCases: BenchCase[] = [
  {
    name: "compressor-polytropic-10",
    description:
      "compressor stage, exact polytropic path (eta_p 0.78, 20 -> 50 bar) of the ten-component gas (PR) with isentrope, path flashes, discharge flash and Schultz's method",
    targetSeconds: 5e-3,
    measure: { samples: 11 },
    setup() {
      const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
      const inlets = Array.from(TEMPERATURES, (T) =>
        defineStream({ fluid, z: X10, T, P: 20e5, flow: { value: 1000, unit: "kmol/h" } }),
      );
      const first = compressorStage(inlets[0], {
        outletPressurePa: 50e5,
        polytropicEfficiency: 0.78,
      });
      if (first.polytropicPath?.route !== "single-phase" || inlets[0].state.phases.length !== 1) {
        throw new Error("compressor-polytropic-10: the path is not one phase");
      }
      let k = 0;
      return function compressorPolytropic10() {
        return compressorStage(inlets[k++ & 15], {
          outletPressurePa: 50e5,
          polytropicEfficiency: 0.78,
        });
      };
    },
  },
];
