/**
 * Data-derived departures against any ResidualModel of the library (a cubic, a reference
 * equation, ...): at every reported (T, rho), the model's own departures, the difference, and the
 * difference in units of the data's standard uncertainty (|z| > 2 flags a disagreement).
 */
import { R as CODATA_R } from "../constants.js";
import type { ResidualModel } from "../eos/types.js";
import { DEPARTURE_KEYS, departuresFromReduced } from "./departureSet.js";
import type { DepartureSet } from "./departureSet.js";
import type { PvtRouteResult } from "./departuresFromPvt.js";

export interface ModelComparisonPoint {
  temperatureK: number;
  densityMolPerM3: number;
  data: DepartureSet;
  model: DepartureSet;
  /** data - model. */
  difference: DepartureSet;
  /** (data - model) / u(data); NaN where u is 0. */
  z: DepartureSet;
  /** Model pressure at (T, rho) minus the smoothed data pressure, Pa. */
  pressureDifferencePa: number;
}

export function compareWithModel(
  result: PvtRouteResult,
  model: ResidualModel,
  x: readonly number[] = [1],
): ModelComparisonPoint[] {
  const R = model.gasConstant ?? CODATA_R;
  const out: ModelComparisonPoint[] = [];
  for (const iso of result.isotherms) {
    const t = iso.temperatureK;
    for (const s of iso.states) {
      const d = model.residual(t, s.densityMolPerM3, x);
      const m = departuresFromReduced(t, d, R);
      const diff = Object.fromEntries(
        DEPARTURE_KEYS.map((k) => [k, s.residual[k] - m[k]]),
      ) as unknown as DepartureSet;
      const z = Object.fromEntries(
        DEPARTURE_KEYS.map((k) => [
          k,
          s.uncertainty[k] > 0 ? diff[k] / s.uncertainty[k] : Number.NaN,
        ]),
      ) as unknown as DepartureSet;
      out.push({
        temperatureK: t,
        densityMolPerM3: s.densityMolPerM3,
        data: s.residual,
        model: m,
        difference: diff,
        z,
        pressureDifferencePa: s.densityMolPerM3 * R * t * (1 + d.aD) - s.pressurePa,
      });
    }
  }
  return out;
}
