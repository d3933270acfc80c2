/**
 * The ideal gas as a residual model: alpha_r = 0 at every state (P = rho R T). Useful as the
 * baseline of a comparison and for low-pressure streams where departures are negligible.
 */
import { R } from "../constants.js";
import type { ModelInfo, ResidualDerivatives, ResidualRequest } from "./types.js";
import type { HyperDual } from "../numerics/hyperDual.js";
import type { ModelWithPressure } from "./pressureFunction.js";
import { checkModelComponents, type ModelComponent } from "./modelComponent.js";

/** Builds the ideal-gas model for these components (only their ids and order are used). */
export function createIdealGasModel(components: readonly ModelComponent[]): ModelWithPressure {
  checkModelComponents(components);
  const n = components.length;
  const info: ModelInfo = {
    id: "ideal-gas",
    name: "Ideal gas",
    citation: "P V = n R T (Clapeyron 1834); no residual part",
    componentIds: components.map((c) => c.id),
  };
  return {
    info,
    pressureFunction: (T: HyperDual, rho: HyperDual) => rho.mul(R).mul(T),
    residual(
      _T: number,
      _rho: number,
      _x: readonly number[],
      request?: ResidualRequest,
    ): ResidualDerivatives {
      const r = { a: 0, aD: 0, aDD: 0, aT: 0, aTT: 0, aDT: 0, aDDD: 0 };
      return request?.composition ? { ...r, dnA: new Array<number>(n).fill(0) } : r;
    },
    maxDensity: () => Infinity,
    densityRoots: (T: number, P: number) => [P / (R * T)],
    pseudoCritical(x: readonly number[]) {
      let Tc = 0;
      let Pc = 0;
      x.forEach((xi, i) => {
        Tc += xi * components[i].criticalTemperatureK;
        Pc += xi * components[i].criticalPressurePa;
      });
      return {
        temperatureK: Tc,
        pressurePa: Pc,
        densityMolPerM3: Pc / (R * Tc),
        rule: "Kay's rule on the components' Tc and Pc (the ideal gas has no critical point)",
      };
    },
  };
}
