/**
 * Ideal-gas heat capacity of a petroleum fraction, Kesler & Lee (1976), Hydrocarbon Processing
 * 55(3), 153-158, in the SI form (T in K, cp in kJ/(kg K)) with the Watson factor Kw and the
 * acentric factor w:
 *   cp = A0 + A1 T + A2 T^2 - C (B0 + B1 T + B2 T^2)
 *   A0 = -1.41779 + 0.11828 Kw          A1 = -(6.99724 - 8.69326 Kw + 0.27715 Kw^2) 1e-4
 *   A2 = -2.2582e-6
 *   B0 = 1.09223 - 2.48245 w            B1 = -(3.434 - 7.14 w) 1e-3      B2 = -(7.2661 - 9.2561 w) 1e-7
 *   C  = [(12.8 - Kw)(10 - Kw) / (10 w)]^2 for 10 < Kw < 12.8, else 0
 * (coefficients from memory of the paper as reproduced in Riazi 2005, ASTM MNL50, ch. 7; the SI and
 * Rankine/Btu versions were cross-checked by unit conversion). Usually quoted for 0-1200 degF; here
 * its range is taken as 255-922 K.
 * Since Kw, w and M are fixed for a fraction, the molar cp is a quadratic in T, returned as a
 * polynomial cp/R correlation that the ideal-gas layer integrates exactly.
 */
import { R } from "../constants.js";
import type { PolynomialCp } from "../components/types.js";

export const KESLER_LEE_CP_1976 =
  "Kesler & Lee (1976), Hydrocarbon Processing 55(3), 153-158: ideal-gas cp of petroleum fractions with the Watson K factor (coefficients from memory, as in Riazi 2005, ASTM MNL50, ch. 7)";

/** Temperature range assigned to the Kesler-Lee cp correlation, K. */
export const KESLER_LEE_CP_RANGE_K = { min: 255, max: 922 } as const;

/** Kesler-Lee (1976) ideal-gas cp of a fraction as a polynomial cp/R in T (K). */
export function keslerLeeIdealGasCp(
  watsonKFactor: number,
  acentricFactor: number,
  molarMassKgPerMol: number,
): PolynomialCp {
  const kw = watsonKFactor;
  const w = acentricFactor;
  const a0 = -1.41779 + 0.11828 * kw;
  const a1 = -(6.99724 - 8.69326 * kw + 0.27715 * kw ** 2) * 1e-4;
  const a2 = -2.2582e-6;
  const b0 = 1.09223 - 2.48245 * w;
  const b1 = -(3.434 - 7.14 * w) * 1e-3;
  const b2 = -(7.2661 - 9.2561 * w) * 1e-7;
  const c = kw > 10 && kw < 12.8 ? (((12.8 - kw) * (10 - kw)) / (10 * w)) ** 2 : 0;
  // kJ/(kg K) times kg/mol times 1000 gives J/(mol K); divide by R for cp/R.
  const scale = (molarMassKgPerMol * 1000) / R;
  const coefficients = [(a0 - c * b0) * scale, (a1 - c * b1) * scale, (a2 - c * b2) * scale];
  return {
    form: "polynomial",
    minTemperatureK: KESLER_LEE_CP_RANGE_K.min,
    maxTemperatureK: KESLER_LEE_CP_RANGE_K.max,
    segments: [
      {
        minTemperatureK: KESLER_LEE_CP_RANGE_K.min,
        maxTemperatureK: KESLER_LEE_CP_RANGE_K.max,
        coefficients,
      },
    ],
  };
}
