/**
 * Reference-equation and saturation cases of issue 5: all properties of water (IAPWS-95) at given
 * T and density and at given T and P, water saturation at given T, and Peng-Robinson saturation at
 * given T. Each call varies the state so that no memo or cache answers it; the temperatures are
 * never whole numbers (see engineCases.ts on V8 small integers and deoptimisation).
 */
import { referenceFluid } from "../../src/fluid/referenceFluids.js";
import { referenceStateTP, referenceStateTRho } from "../../src/state/referenceStates.js";
import { saturationAtTemperature } from "../../src/phase/saturation.js";
import { defineFluid } from "../../src/fluid/defineFluid.js";
import type { BenchCase } from "../harness.js";

const MW = 0.018015268; // kg/mol, IAPWS-95

export const referenceCases: BenchCase[] = [
  {
    name: "reference-water-Trho",
    description:
      "IAPWS-95 water, all properties at given T and density (liquid 300.25-499.25 K, 900 kg/m3)",
    targetSeconds: 3e-6,
    setup() {
      const water = referenceFluid("water");
      let i = 0;
      return function referenceWaterTRho() {
        return referenceStateTRho(water, 300.25 + (i++ % 200), 900 / MW);
      };
    },
  },
  {
    name: "reference-water-TP",
    description:
      "IAPWS-95 water, all properties at given T and P (5 MPa, 300.25-599.25 K: liquid and vapour)",
    targetSeconds: 15e-6,
    setup() {
      const water = referenceFluid("water");
      let i = 0;
      return function referenceWaterTP() {
        return referenceStateTP(water, 300.25 + (i++ % 300), 5e6);
      };
    },
  },
  {
    name: "saturation-water-T",
    description: "IAPWS-95 water saturation at given T (300.25-639.25 K)",
    targetSeconds: 50e-6,
    setup() {
      const water = referenceFluid("water");
      let i = 0;
      return function saturationWaterT() {
        return saturationAtTemperature(water, 300.25 + (i++ % 340));
      };
    },
  },
  {
    name: "saturation-pr-T",
    description: "Peng-Robinson propane saturation at given T (200.25-359.25 K)",
    targetSeconds: 20e-6,
    setup() {
      const propane = defineFluid({ components: ["propane"], model: "peng-robinson" });
      let i = 0;
      return function saturationPrT() {
        return saturationAtTemperature(propane.model, 200.25 + (i++ % 160));
      };
    },
  },
];
