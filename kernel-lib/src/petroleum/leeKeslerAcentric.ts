/**
 * Acentric factor of a petroleum fraction, Kesler & Lee (1976), Hydrocarbon Processing 55(3),
 * 153-158 (the Lee-Kesler vapour-pressure equation solved at the normal boiling point):
 * with Tbr = Tb/Tc and Pbr = 1 atm / Pc,
 *   Tbr <= 0.8: w = [-ln(Pc/1 atm) - 5.92714 + 6.09648/Tbr + 1.28862 ln Tbr - 0.169347 Tbr^6]
 *                 / [15.2518 - 15.6875/Tbr - 13.4721 ln Tbr + 0.43577 Tbr^6]
 *   Tbr >  0.8: w = -7.904 + 0.1352 Kw - 0.007465 Kw^2 + 8.359 Tbr + (1.408 - 0.01063 Kw)/Tbr
 * (coefficients from memory; the first form is the Lee-Kesler 1975 AIChE J. 21, 510-527
 * vapour-pressure equation at Tb.)
 */
import { requirePositive } from "../validate.js";
import { watsonK } from "./watsonK.js";

/** Acentric factor from Tb (K), Tc (K), Pc (Pa) and SG. */
export function leeKeslerAcentricFactor(
  normalBoilingPointK: number,
  criticalTemperatureK: number,
  criticalPressurePa: number,
  specificGravity: number,
): number {
  requirePositive("normalBoilingPointK", normalBoilingPointK, "K");
  requirePositive("criticalTemperatureK", criticalTemperatureK, "K");
  requirePositive("criticalPressurePa", criticalPressurePa, "Pa");
  const tbr = normalBoilingPointK / criticalTemperatureK;
  if (tbr <= 0.8) {
    const numerator =
      -Math.log(criticalPressurePa / 101325) -
      5.92714 +
      6.09648 / tbr +
      1.28862 * Math.log(tbr) -
      0.169347 * tbr ** 6;
    const denominator = 15.2518 - 15.6875 / tbr - 13.4721 * Math.log(tbr) + 0.43577 * tbr ** 6;
    return numerator / denominator;
  }
  const kw = watsonK(normalBoilingPointK, specificGravity);
  return -7.904 + 0.1352 * kw - 0.007465 * kw ** 2 + 8.359 * tbr + (1.408 - 0.01063 * kw) / tbr;
}
