/**
 * Second virial coefficient from the corresponding-states correlation of Tsonopoulos,
 * AIChE J. 20 (1974) 263-272, eqs. 2-4 (non-polar part):
 *   B Pc / (R Tc) = f0(Tr) + omega f1(Tr),
 *   f0 = 0.1445 - 0.330/Tr - 0.1385/Tr^2 - 0.0121/Tr^3 - 0.000607/Tr^8,
 *   f1 = 0.0637 + 0.331/Tr^2 - 0.423/Tr^3 - 0.008/Tr^8.
 * The polar term f2 (a/Tr^6 - b/Tr^8) is not included: for water, ammonia, alcohols the result is
 * the non-polar estimate, and the virial model (virialModel.ts) warns for strongly polar components.
 * Temperature derivatives are exact: with y = 1/Tr, T dB/dT = (R Tc/Pc)(-y f_y) and
 * T^2 d2B/dT2 = (R Tc/Pc)(y^2 f_yy + 2 y f_y).
 */
import { R } from "../../constants.js";

/** B (m3/mol) with T dB/dT and T^2 d2B/dT2 (both m3/mol). */
export interface SecondVirial {
  b: number;
  tDb: number;
  ttD2b: number;
}

/**
 * Tsonopoulos' B at temperature T for a (pseudo-)component with critical temperature Tc (K),
 * critical pressure Pc (Pa) and acentric factor omega. Writes into `out` and returns it.
 */
export function tsonopoulosB(
  temperatureK: number,
  criticalTemperatureK: number,
  criticalPressurePa: number,
  acentricFactor: number,
  out: SecondVirial = { b: 0, tDb: 0, ttD2b: 0 },
): SecondVirial {
  const y = criticalTemperatureK / temperatureK;
  const y2 = y * y;
  const y3 = y2 * y;
  const y7 = y3 * y3 * y;
  const y8 = y7 * y;
  const w = acentricFactor;
  const f0 = 0.1445 - 0.33 * y - 0.1385 * y2 - 0.0121 * y3 - 0.000607 * y8;
  const f1 = 0.0637 + 0.331 * y2 - 0.423 * y3 - 0.008 * y8;
  // y f_y and y^2 f_yy
  const yf0y = -0.33 * y - 2 * 0.1385 * y2 - 3 * 0.0121 * y3 - 8 * 0.000607 * y8;
  const yf1y = 2 * 0.331 * y2 - 3 * 0.423 * y3 - 8 * 0.008 * y8;
  const y2f0yy = -2 * 0.1385 * y2 - 6 * 0.0121 * y3 - 56 * 0.000607 * y8;
  const y2f1yy = 2 * 0.331 * y2 - 6 * 0.423 * y3 - 56 * 0.008 * y8;
  const scale = (R * criticalTemperatureK) / criticalPressurePa;
  out.b = scale * (f0 + w * f1);
  out.tDb = -scale * (yf0y + w * yf1y);
  out.ttD2b = scale * (y2f0yy + w * y2f1yy + 2 * (yf0y + w * yf1y));
  return out;
}
