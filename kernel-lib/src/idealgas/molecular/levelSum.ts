/**
 * Thermodynamic functions from an explicit sum over energy levels.
 *
 * With q = f * sum_i g_i exp(-theta_i / T) (theta_i = level energy / kB, measured from the lowest
 * level; f a constant prefactor such as 1/sigma), the molar functions are (McQuarrie, Statistical
 * Mechanics, 2000, ch. 5 and 6; the standard canonical-ensemble relations):
 *   (u - u0)/R = <theta>,  cv/R = (<theta^2> - <theta>^2) / T^2,  s/R = ln q + <theta>/T,
 * where <.> is the Boltzmann average. For internal degrees of freedom cp = cv and h - h0 = u - u0.
 * Levels are shifted by the smallest theta before summing, so no overflow occurs at low T.
 */
import { R } from "../../constants.js";
import type { ThermoContribution } from "./types.js";

/** Energy levels as characteristic temperatures with degeneracies. */
export interface LevelSet {
  /** Level energies / kB, K (any order; shifted internally so the smallest is zero). */
  readonly thetaK: ArrayLike<number>;
  /** Degeneracies, same length as thetaK. */
  readonly degeneracy: ArrayLike<number>;
  /** Constant factor of the partition function (e.g. 1/sigma). Default 1. */
  readonly prefactor?: number;
}

/** Contribution of a set of levels at temperature T (K). Caller validates T > 0. */
export function levelSumContribution(levels: LevelSet, temperatureK: number): ThermoContribution {
  const n = levels.thetaK.length;
  let theta0 = Infinity;
  for (let i = 0; i < n; i++) theta0 = Math.min(theta0, levels.thetaK[i]);
  const weights = new Float64Array(n);
  let q = 0;
  let m1 = 0;
  for (let i = 0; i < n; i++) {
    const th = levels.thetaK[i] - theta0;
    const w = levels.degeneracy[i] * Math.exp(-th / temperatureK);
    weights[i] = w;
    q += w;
    m1 += w * th;
  }
  const mean = m1 / q;
  // Second pass about the mean: avoids the cancellation of <theta^2> - <theta>^2 at high T.
  let m2c = 0;
  for (let i = 0; i < n; i++) {
    const d = levels.thetaK[i] - theta0 - mean;
    m2c += weights[i] * d * d;
  }
  const variance = m2c / q;
  const prefactor = levels.prefactor ?? 1;
  return {
    cp: (R * variance) / (temperatureK * temperatureK),
    enthalpyFrom0K: R * mean,
    entropy: R * (Math.log(prefactor * q) + mean / temperatureK),
  };
}
