/**
 * Flash cases: the isothermal flash (with its stability tests) and the (P, h) flash of the
 * ten-component rich gas of the engine cases (pr-mix10-TP) at 250 K and 50 bar, where it splits
 * into gas and condensate (the setup checks that it does), cycled over 16 temperatures around it
 * so no cache sees the same state twice in a row.
 */
import { defineFluid } from "../../src/fluid/defineFluid.js";
import { overallProperty } from "../../src/phase/flash/stateFunctionFlash.js";
import type { BenchCase } from "../harness.js";
import { TEN, X10 } from "./richGas.js";

// 248.125 to 251.875 K (none a whole number, see engineCases.ts)
const TEMPERATURES = Float64Array.from({ length: 16 }, (_, i) => 248.125 + 0.25 * i);
const P = 50e5;

export const flashCases: BenchCase[] = [
  {
    name: "flash-pt-10",
    description:
      "isothermal flash of the ten-component gas (PR) at about 250 K, 50 bar: stability test, two-phase split, stability test of the split, verification and both phases' states",
    targetSeconds: 100e-6,
    setup() {
      const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
      for (const T of TEMPERATURES) {
        if (fluid.flashTP(T, P, X10).phases.length !== 2) {
          throw new Error(`flash-pt-10: the gas is not two-phase at ${T} K, 50 bar`);
        }
      }
      let k = 0;
      return function flashPt10() {
        return fluid.flashTP(TEMPERATURES[k++ & 15], P, X10);
      };
    },
  },
  {
    name: "flash-ph-10",
    description:
      "(P, h) flash of the same gas at 50 bar with h of the two-phase state at about 250 K (outer search from 300 K around the isothermal flash)",
    setup() {
      const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
      const targets = Array.from(TEMPERATURES, (T) =>
        overallProperty(fluid.flashTP(T, P, X10), "h"),
      );
      let k = 0;
      return function flashPh10() {
        return fluid.flashPH(P, targets[k++ & 15], X10);
      };
    },
  },
];
