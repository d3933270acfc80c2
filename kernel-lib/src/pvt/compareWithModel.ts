/**
 * Data-derived departures against any ResidualModel of the library (a cubic, a reference
 * equation, ...): at every reported (T, rho), the model's own departures, the difference, and the
 * difference in units of the data's standard uncertainty (|z| > 2 flags a disagreement).
 */
import { R as CODATA_R } from "../constants.js";
import type { ResidualModel } from "../eos/types.js";
import { pressureFromResidual } from "../state/properties.js";
import { departuresFromReduced } from "./departureSet.js";
import type { DepartureKey, DepartureSet } from "./departureSet.js";
import type { PvtRouteResult } from "./departuresFromPvt.js";

/** One reported state: data and model departures, their difference and its z-score. */
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

/**
 * Compares the data route's departures with a model's at the same (T, rho).
 * @param result the route's result (departuresFromPvt)
 * @param model any ResidualModel of the library
 * @param x mole fractions for the model. Default [1] (a pure fluid)
 */
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
      const diff = mapDepartures((k) => s.residual[k] - m[k]);
      const z = mapDepartures((k) =>
        s.uncertainty[k] > 0 ? diff[k] / s.uncertainty[k] : Number.NaN,
      );
      out.push({
        temperatureK: t,
        densityMolPerM3: s.densityMolPerM3,
        data: s.residual,
        model: m,
        difference: diff,
        z,
        pressureDifferencePa: pressureFromResidual(t, s.densityMolPerM3, d.aD, R) - s.pressurePa,
      });
    }
  }
  return out;
}

/** A departure set whose every entry comes from `f`. */
function mapDepartures(f: (key: DepartureKey) => number): DepartureSet {
  return { a: f("a"), s: f("s"), u: f("u"), h: f("h"), g: f("g"), lnPhi: f("lnPhi") };
}
