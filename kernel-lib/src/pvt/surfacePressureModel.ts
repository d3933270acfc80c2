/**
 * The fitted surface handed to the engine through its general user-model entry point: the surface's
 * pressure P = rho R T (1 + sum_ij b_ij delta^i tau^j) written in hyper-dual arithmetic and given to
 * departure/modelFromPressure, which integrates it like any user-typed equation of state. The
 * closed-form route (surfaceResidualModel.ts) is faster; this one exercises the engine's own
 * integrator, so the two together cross-check the hand-off (see the unit tests).
 */
import { R as CODATA_R } from "../constants.js";
import { modelFromPressure } from "../departure/index.js";
import type { PressureModel } from "../departure/index.js";
import type { HyperDual } from "../numerics/index.js";
import type { VirialSurface } from "./virialSurface.js";

/** Options of {@link surfacePressureModel}. */
export interface SurfacePressureModelOptions {
  /** Model name. Default "P-V-T surface fit". */
  name?: string;
  /** Component ids. Default ["fluid"]. */
  componentIds?: readonly string[];
  /** Gas constant used in the fit, J/(mol K). Default CODATA. */
  gasConstant?: number;
  /** Where the data came from, for the citation. */
  dataSource?: string;
}

/** The fitted surface as a pressure function P(T, rho) for the departure integrator. */
export function surfacePressureModel(
  surface: VirialSurface,
  options: SurfacePressureModelOptions = {},
): PressureModel {
  const R = options.gasConstant ?? CODATA_R;
  const { densityTerms, temperatureTerms, densityScale, temperatureScale, coefficients } = surface;
  const pressure = (T: HyperDual, rho: HyperDual): HyperDual => {
    const delta = rho.div(densityScale);
    const tau = T.inv().mul(temperatureScale);
    let sum = delta.mul(0);
    let di = delta;
    for (let i = 1; i <= densityTerms; i++) {
      let poly = tau.mul(0);
      let tj = tau.mul(0).add(1);
      for (let j = 0; j < temperatureTerms; j++) {
        poly = poly.add(tj.mul(coefficients[(i - 1) * temperatureTerms + j]));
        tj = tj.mul(tau);
      }
      sum = sum.add(di.mul(poly));
      di = di.mul(delta);
    }
    return rho.mul(T).mul(R).mul(sum.add(1));
  };
  return modelFromPressure({
    name: options.name ?? "P-V-T surface fit",
    components: options.componentIds ?? ["fluid"],
    citation:
      `virial-type surface (${densityTerms} x ${temperatureTerms} terms) fitted by isochor pvt` +
      (options.dataSource ? ` to ${options.dataSource}` : ""),
    gasConstant: R,
    pressure,
  });
}
