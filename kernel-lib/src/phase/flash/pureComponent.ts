/**
 * A feed with one present component (a pure fluid, or a mixture model with the other components
 * absent) seen as a pure fluid, so the saturation routes of phase/ (saturation.ts, criticalPoint.ts)
 * apply: the model restricted to the present component (every call made at the feed composition),
 * and the two saturated phases at a given T or P as an equilibrium.
 */
import type { ResidualDerivatives, ResidualModel } from "../../eos/types.js";
import type { FluidBinding } from "../../state/types.js";
import { locateCriticalPoint, type CriticalPointResult } from "../criticalPoint.js";
import {
  saturationAtPressure,
  saturationAtTemperature,
  type SaturationResult,
} from "../saturation.js";

const restricted = new WeakMap<ResidualModel, Map<number, ResidualModel>>();

/** The model seen as the pure component k (the feed z = e_k). Cached per model and k. */
export function restrictToComponent(model: ResidualModel, k: number): ResidualModel {
  if (model.info.componentIds.length === 1) return model;
  let byK = restricted.get(model);
  if (byK === undefined) {
    byK = new Map();
    restricted.set(model, byK);
  }
  const known = byK.get(k);
  if (known !== undefined) return known;
  const n = model.info.componentIds.length;
  const e = new Array<number>(n).fill(0);
  e[k] = 1;
  const pure: ResidualModel = {
    info: { ...model.info, componentIds: [model.info.componentIds[k]] },
    gasConstant: model.gasConstant,
    residual(T, rho, _x, request): ResidualDerivatives {
      const r = model.residual(T, rho, e, request);
      return request?.composition && r.dnA ? { ...r, dnA: [r.dnA[k]] } : r;
    },
    maxDensity: (T) => model.maxDensity(T, e),
    ...(typeof model.densityRoots === "function"
      ? { densityRoots: (T: number, P: number) => model.densityRoots!(T, P, e) }
      : {}),
    ...(model.pressure ? { pressure: (T: number, rho: number) => model.pressure!(T, rho, e) } : {}),
    ...(model.pseudoCritical ? { pseudoCritical: () => model.pseudoCritical!(e) } : {}),
  };
  byK.set(k, pure);
  return pure;
}

/** The critical point of the present component k. */
export function componentCritical(binding: FluidBinding, k: number): CriticalPointResult {
  return locateCriticalPoint(restrictToComponent(binding.model, k));
}

/** Saturation of the present component at T (K) or P (Pa). */
export function componentSaturation(
  binding: FluidBinding,
  k: number,
  given: { temperatureK: number } | { pressurePa: number },
): SaturationResult {
  const pure = restrictToComponent(binding.model, k);
  return "temperatureK" in given
    ? saturationAtTemperature(pure, given.temperatureK)
    : saturationAtPressure(pure, given.pressurePa);
}
