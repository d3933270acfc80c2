/**
 * P-V-T route cases: the whole route of departuresFromPvt (surface fit, leave-one-out screen,
 * isochore fits, integration, 200 Monte Carlo replicates and the linearised estimate) on a
 * synthetic isochoric campaign of carbon dioxide: pressures from the library's Peng-Robinson model
 * (pressureFromResidual) on a grid of isochores x temperatures above the critical temperature,
 * with 1e-4 relative seeded noise and that u(P) stated. Goal of the 100,000-row case: under 10 s.
 * One call takes seconds, so these cases measure 3 calls after 1 warm-up call.
 */
import { getComponent } from "../../src/components/getComponent.js";
import { createModel } from "../../src/eos/createModel.js";
import { seededRandom } from "../../src/numerics/seededRandom.js";
import { departuresFromPvt } from "../../src/pvt/departuresFromPvt.js";
import { pvtFromArrays } from "../../src/pvt/pvtFromArrays.js";
import type { PvtDataset } from "../../src/pvt/types.js";
import { pressureFromResidual } from "../../src/state/properties.js";
import type { BenchCase } from "../harness.js";

/** isochores x temperatures rows of CO2 (PR), 100 to 8000 mol/m3, 310 to 450 K. */
export function pvtCampaign(isochores: number, temperatures: number): PvtDataset {
  const model = createModel("peng-robinson", [getComponent("carbon-dioxide")]);
  const rng = seededRandom(7);
  const T: number[] = [];
  const rho: number[] = [];
  const P: number[] = [];
  const uP: number[] = [];
  for (let i = 0; i < isochores; i++) {
    const d = 100 * 80 ** (i / (isochores - 1));
    for (let j = 0; j < temperatures; j++) {
      const t = 310 + (140 * j) / (temperatures - 1);
      const p = pressureFromResidual(t, d, model.residual(t, d, [1]).aD, model.gasConstant);
      T.push(t);
      rho.push(d);
      P.push(p * (1 + 1e-4 * rng.normal()));
      uP.push(1e-4 * p);
    }
  }
  return pvtFromArrays({ temperatureK: T, densityMolPerM3: rho, pressurePa: P, uPressurePa: uP });
}

function routeCase(
  name: string,
  isochores: number,
  temperatures: number,
  target?: number,
): BenchCase {
  return {
    name,
    description: `the whole P-V-T route (defaults: 200 Monte Carlo samples, linearised) on ${isochores} isochores x ${temperatures} temperatures = ${isochores * temperatures} rows of CO2 (PR)`,
    ...(target !== undefined ? { targetSeconds: target } : {}),
    measure: { samples: 3, minWarmupSeconds: 0, maxWarmupSeconds: 0 },
    setup() {
      const data = pvtCampaign(isochores, temperatures);
      return function pvtRoute() {
        return departuresFromPvt(data).isotherms.length;
      };
    },
  };
}

export const pvtCases: BenchCase[] = [
  routeCase("pvt-2k", 40, 50),
  routeCase("pvt-10k", 100, 100),
  routeCase("pvt-100k", 250, 400, 10),
];
