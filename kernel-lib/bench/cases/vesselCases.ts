/**
 * Vessel cases: the adiabatic blowdown of the ten-component rich gas (richGas.ts, Peng-Robinson)
 * from 100 bar and 330 K (one phase there; it crosses the dew line within two seconds) to 7 barg
 * through a 50 mm orifice (Cd 0.8) from a vertical vessel of 1.5 m diameter and 4 m shell with
 * 2:1 heads: every step with the (u, v) equilibrium of the contents and the homogeneous
 * equilibrium choke. The goal is below 2 s per run; a call took about 3 s of CPU at
 * efeaf7f and about 1.4 s since the warm-started trial splits (December 2026, this 2-core
 * machine; DEVELOPERS.md, "Blowdown benchmark"), so the case measures a few calls only
 * (`npm run bench -- blowdown --processes 1`).
 */
import { defineFluid } from "../../src/fluid/defineFluid.js";
import { simulateVessel } from "../../src/process/vessel/simulateVessel.js";
import type { BenchCase } from "../harness.js";
import { TEN, X10 } from "./richGas.js";

export const vesselCases: BenchCase[] = [
  {
    name: "blowdown-10",
    description:
      "adiabatic blowdown of the ten-component gas (PR) from 100 bar, 330 K to 7 barg: contents (u, v) equilibrium and the HEM orifice flux at every step",
    targetSeconds: 2,
    measure: { samples: 1, minWarmupSeconds: 0, maxWarmupSeconds: 0 },
    setup() {
      const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
      return function blowdown10() {
        const run = simulateVessel({
          fluid,
          shape: { kind: "vertical-cylinder", diameterM: 1.5, lengthM: 4 },
          initial: { temperatureK: 330, pressurePa: 100e5, z: X10 },
          outlets: [{ diameterM: 0.05, dischargeCoefficient: 0.8, backPressurePa: 101325 }],
          until: { pressurePa: 101325 + 7e5 },
        });
        if (run.stoppedBecause !== "target-pressure" || run.phaseChanges.length === 0) {
          throw new Error(`blowdown-10: stopped by ${run.stoppedBecause}, expected the target`);
        }
        return run;
      };
    },
  },
];
