/**
 * Kesler-Lee (1976) correlations for petroleum fractions: Kesler, M.G., Lee, B.I. (1976), "Improve
 * prediction of enthalpy of fractions", Hydrocarbon Processing 55(3), 153-158. Tb in degrees Rankine,
 * Tc in degR, Pc in psia, SG at 60/60 degF:
 *   Tc = 341.7 + 811 SG + (0.4244 + 0.1174 SG) Tb + (0.4669 - 3.2623 SG) 1e5 / Tb
 *   ln Pc = 8.3634 - 0.0566/SG - (0.24244 + 2.2898/SG + 0.11857/SG^2) 1e-3 Tb
 *           + (1.4685 + 3.648/SG + 0.47227/SG^2) 1e-7 Tb^2 - (0.42019 + 1.6977/SG^2) 1e-10 Tb^3
 *   M  = -12272.6 + 9486.4 SG + (4.6523 - 3.3287 SG) Tb
 *        + (1 - 0.77084 SG - 0.02058 SG^2)(1.3437 - 720.79/Tb) 1e7/Tb
 *        + (1 - 0.80882 SG + 0.02226 SG^2)(1.8828 - 181.98/Tb) 1e12/Tb^3
 * Range: Tb up to 1200 degF (922 K) for Tc and Pc, M 60-650 for M (as usually quoted, e.g. Riazi
 * 2005, ASTM MNL50, sec. 2.5; from memory). Lower limit taken as 255 K (0 degF; common practice,
 * no source). SG limits 0.6-1.1 (common practice, no source).
 */
import { checkValidity } from "./validity.js";
import type { FractionCriticalEstimate } from "./riaziDaubert.js";

export const KESLER_LEE_1976 =
  "Kesler & Lee (1976), Hydrocarbon Processing 55(3), 153-158 (coefficients from memory)";

/** Kesler-Lee (1976): M, Tc, Pc from Tb (K) and SG (no Vc). */
export function keslerLee1976(
  normalBoilingPointK: number,
  specificGravity: number,
  options: { allowOutsideRange?: boolean } = {},
): FractionCriticalEstimate {
  const allow = options.allowOutsideRange ?? false;
  const name = "Kesler-Lee (1976)";
  const warnings = [
    ...checkValidity(
      name,
      "normalBoilingPointK",
      normalBoilingPointK,
      { min: 255, max: 922, unit: "K" },
      allow,
    ),
    ...checkValidity(
      name,
      "specificGravity",
      specificGravity,
      { min: 0.6, max: 1.1, unit: "-" },
      allow,
    ),
  ];
  const tb = 1.8 * normalBoilingPointK;
  const sg = specificGravity;
  const tcR = 341.7 + 811 * sg + (0.4244 + 0.1174 * sg) * tb + ((0.4669 - 3.2623 * sg) * 1e5) / tb;
  const lnPc =
    8.3634 -
    0.0566 / sg -
    (0.24244 + 2.2898 / sg + 0.11857 / sg ** 2) * 1e-3 * tb +
    (1.4685 + 3.648 / sg + 0.47227 / sg ** 2) * 1e-7 * tb ** 2 -
    (0.42019 + 1.6977 / sg ** 2) * 1e-10 * tb ** 3;
  const m =
    -12272.6 +
    9486.4 * sg +
    (4.6523 - 3.3287 * sg) * tb +
    ((1 - 0.77084 * sg - 0.02058 * sg ** 2) * (1.3437 - 720.79 / tb) * 1e7) / tb +
    ((1 - 0.80882 * sg + 0.02226 * sg ** 2) * (1.8828 - 181.98 / tb) * 1e12) / tb ** 3;
  warnings.push(
    ...checkValidity(
      `${name} molar mass`,
      "estimated molar mass",
      m,
      { min: 60, max: 650, unit: "g/mol" },
      allow,
    ),
  );
  return {
    molarMassKgPerMol: m / 1000,
    criticalTemperatureK: tcR / 1.8,
    criticalPressurePa: Math.exp(lnPc) * 6894.757293168,
    criticalVolumeM3PerMol: NaN,
    source: KESLER_LEE_1976,
    warnings,
  };
}
