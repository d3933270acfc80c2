/**
 * Starting values of saturation points from Wilson's K-factors (phase/wilson.ts; G. M. Wilson, "A modified Redlich-Kwong equation of state, application to general physical
 * data calculations", AIChE National Meeting, Cleveland (1969), paper 15C; as used in
 * M. L. Michelsen & J. M. Mollerup, Thermodynamic Models, 2nd ed. (2007), ch. 9-12), with the
 * Rachford-Rice condition sum_i z_i (K_i - 1) / (1 + beta (K_i - 1)) = 0 (H. H. Rachford and
 * J. D. Rice, J. Petrol. Technol. 4 (1952) 19) solved for P at given T, or for T at given P, by
 * Brent's method on ln P or ln T.
 */
import { findRootBrent } from "../../numerics/brent.js";
import type { WilsonConstants } from "../stability.js";
import { wilsonLnReducedVaporPressure } from "../wilson.js";

/** ln K_i of Wilson at T (K), P (Pa), one per component (phase/wilson.ts). */
export function wilsonLnK(
  constants: readonly WilsonConstants[],
  temperatureK: number,
  pressurePa: number,
): number[] {
  return constants.map(
    (c) =>
      Math.log(c.criticalPressurePa / pressurePa) +
      wilsonLnReducedVaporPressure(temperatureK, c.criticalTemperatureK, c.acentricFactor),
  );
}

function rachfordRice(
  z: readonly number[],
  present: readonly number[],
  lnK: readonly number[],
  beta: number,
): number {
  let g = 0;
  for (const i of present) {
    const K = Math.exp(lnK[i]);
    // 1 - beta + beta K, not 1 + beta (K - 1): at beta = 1 and a tiny K the latter rounds to 0
    g += (z[i] * (K - 1)) / (1 - beta + beta * K);
  }
  return g;
}

/** Wilson's estimate of the saturation pressure at T, Pa (undefined when none brackets). */
export function wilsonPressure(
  constants: readonly WilsonConstants[],
  z: readonly number[],
  present: readonly number[],
  beta: number,
  temperatureK: number,
): number | undefined {
  // K_i = A_i / P: the root lies between the smallest and largest A_i
  const lnA = wilsonLnK(constants, temperatureK, 1);
  let lo = Infinity;
  let hi = -Infinity;
  for (const i of present) {
    lo = Math.min(lo, lnA[i]);
    hi = Math.max(hi, lnA[i]);
  }
  const g = (lnP: number): number =>
    rachfordRice(
      z,
      present,
      lnA.map((a) => a - lnP),
      beta,
    );
  if (!(hi > lo)) return Math.exp(lo);
  const a = lo - 1e-9;
  const b = hi + 1e-9;
  const ga = g(a);
  const gb = g(b);
  if (!(Number.isFinite(ga) && Number.isFinite(gb) && ga * gb < 0)) return undefined;
  return Math.exp(findRootBrent(g, a, b, { tolerance: 1e-10 }).value);
}

/** Wilson's estimate of the saturation temperature at P, K (undefined when none brackets). */
export function wilsonTemperature(
  constants: readonly WilsonConstants[],
  z: readonly number[],
  present: readonly number[],
  beta: number,
  pressurePa: number,
): number | undefined {
  let tcMin = Infinity;
  let tcMax = 0;
  for (const i of present) {
    tcMin = Math.min(tcMin, constants[i].criticalTemperatureK);
    tcMax = Math.max(tcMax, constants[i].criticalTemperatureK);
  }
  const g = (lnT: number): number =>
    rachfordRice(z, present, wilsonLnK(constants, Math.exp(lnT), pressurePa), beta);
  // from a quarter of the lowest Tc (every K tiny but finite) to ten times the highest
  const a = Math.log(0.25 * tcMin);
  const b = Math.log(10 * tcMax);
  const ga = g(a);
  const gb = g(b);
  if (!(Number.isFinite(ga) && Number.isFinite(gb) && ga * gb < 0)) return undefined;
  return Math.exp(findRootBrent(g, a, b, { tolerance: 1e-10 }).value);
}
