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

/**
 * The coefficients of Tsonopoulos (1974), eqs. 3-4, the only copy (virialModel.ts uses them too):
 * f0 = F0_0 + F0_1 y + F0_2 y^2 + F0_3 y^3 + F0_8 y^8 and f1 = F1_0 + F1_2 y^2 + F1_3 y^3 + F1_8 y^8,
 * y = Tc / T.
 */
export const TSONOPOULOS = {
  F0_0: 0.1445,
  F0_1: -0.33,
  F0_2: -0.1385,
  F0_3: -0.0121,
  F0_8: -0.000607,
  F1_0: 0.0637,
  F1_2: 0.331,
  F1_3: -0.423,
  F1_8: -0.008,
} as const;
const { F0_0, F0_1, F0_2, F0_3, F0_8, F1_0, F1_2, F1_3, F1_8 } = TSONOPOULOS;

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
  const f0 = F0_0 + F0_1 * y + F0_2 * y2 + F0_3 * y3 + F0_8 * y8;
  const f1 = F1_0 + F1_2 * y2 + F1_3 * y3 + F1_8 * y8;
  // y f_y and y^2 f_yy
  const yf0y = F0_1 * y + 2 * F0_2 * y2 + 3 * F0_3 * y3 + 8 * F0_8 * y8;
  const yf1y = 2 * F1_2 * y2 + 3 * F1_3 * y3 + 8 * F1_8 * y8;
  const y2f0yy = 2 * F0_2 * y2 + 6 * F0_3 * y3 + 56 * F0_8 * y8;
  const y2f1yy = 2 * F1_2 * y2 + 6 * F1_3 * y3 + 56 * F1_8 * y8;
  const scale = (R * criticalTemperatureK) / criticalPressurePa;
  out.b = scale * (f0 + w * f1);
  out.tDb = -scale * (yf0y + w * yf1y);
  out.ttD2b = scale * (y2f0yy + w * y2f1yy + 2 * (yf0y + w * yf1y));
  return out;
}
