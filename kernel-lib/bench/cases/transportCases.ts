/**
 * Transport cases: viscosity and thermal conductivity (transport/) of the ten-component rich gas
 * by Chung et al. (1988) at given (T, rho), and of water by the IAPWS 2008/2011 formulations
 * (which evaluate IAPWS-95 for their critical enhancements). The ratio to pr-mix10-TP says what
 * transport properties add to a state of the same gas (a vessel model calls both every step).
 */
import { defineFluid } from "../../src/fluid/defineFluid.js";
import { referenceFluid } from "../../src/fluid/referenceFluids.js";
import { referenceFluidBinding } from "../../src/state/referenceStates.js";
import { transportAtTRho } from "../../src/transport/transportAt.js";
import type { BenchCase } from "../harness.js";
import { TEN, X10 } from "./richGas.js";

const TEMPERATURES = Float64Array.from({ length: 16 }, (_, i) => 340.25 + 2.5 * i);

export const transportCases: BenchCase[] = [
  {
    name: "transport-mix10-TRho",
    description: "viscosity and thermal conductivity of a ten-component gas (Chung 1988) at T, rho",
    setup() {
      const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
      let k = 0;
      return function transportMix10() {
        return transportAtTRho(fluid, TEMPERATURES[k++ & 15], 2000, X10);
      };
    },
  },
  {
    name: "transport-water-iapws",
    description: "viscosity and thermal conductivity of liquid water (IAPWS 2008/2011 on IAPWS-95)",
    setup() {
      const water = referenceFluidBinding(referenceFluid("water"));
      let k = 0;
      return function transportWater() {
        return transportAtTRho(water, 300 + (k++ & 15), 55000);
      };
    },
  },
];
