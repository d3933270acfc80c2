/**
 * Riazi-Daubert correlations for petroleum fractions from the normal boiling point Tb and specific
 * gravity SG (60/60 degF).
 *
 * 1980 form: Riazi, M.R., Daubert, T.E. (1980), "Simplify property predictions", Hydrocarbon
 * Processing 59(3), 115-116:  theta = a Tb^b SG^c, here with Tb in K (the coefficients converted
 * from the paper's degrees Rankine and psia; the converted set is also printed in Riazi 2005,
 * ASTM MNL50, ch. 2; equation numbers not checked):
 *   M        = 1.6607e-4 Tb^2.1962  SG^-1.0164
 *   Tc  (K)  = 19.06232  Tb^0.58848 SG^0.3596
 *   Pc (bar) = 5.53027e7 Tb^-2.3125 SG^2.3201
 *   Vc (ft3/lb) = 7.5214e-3 TbR^0.2896 SG^-0.7666   (TbR = Tb in degrees Rankine, as in the paper)
 * Range stated for the 1980 form: Tb 100-850 degF (311-728 K); M about 70-300.
 *
 * 1987 form: Riazi, M.R., Daubert, T.E. (1987), "Characterization parameters for petroleum fractions",
 * Ind. Eng. Chem. Res. 26, 755-759:  theta = a exp(b Tb + c SG + d Tb SG) Tb^e SG^f, Tb in K
 * (as printed in Riazi 2005, ASTM MNL50, ch. 2; equation numbers not checked):
 *   M        = 42.965    exp( 2.097e-4 Tb - 7.78712 SG + 2.08476e-3 Tb SG) Tb^1.26007 SG^4.98308
 *   Tc  (K)  = 9.5233    exp(-9.314e-4 Tb - 0.544442 SG + 6.4791e-4 Tb SG) Tb^0.81067 SG^0.53691
 *   Pc (bar) = 3.1958e5  exp(-8.505e-3 Tb - 4.8014 SG + 5.749e-3 Tb SG)     Tb^-0.4844 SG^4.0846
 * Range: M 70-700 for M (Tb 300-850 K); 70-300 for Tc and Pc (Tb 300-620 K); SG 0.63-0.97.
 * `riaziDaubert1987` returns all three, so it applies the tighter Tc/Pc range to its input.
 * All coefficients and ranges are from the author's memory of the papers and of Riazi (2005).
 */
import type { ResultWarning } from "../errors.js";
import { checkValidity } from "./validity.js";

/** Critical constants and molar mass of a fraction; SI. */
export interface FractionCriticalEstimate {
  /** kg/mol */
  readonly molarMassKgPerMol: number;
  /** K */
  readonly criticalTemperatureK: number;
  /** Pa */
  readonly criticalPressurePa: number;
  /** m3/mol; NaN when the method gives none. */
  readonly criticalVolumeM3PerMol: number;
  /** Citation of the method. */
  readonly source: string;
  readonly warnings: readonly ResultWarning[];
}

export const RIAZI_DAUBERT_1980 =
  "Riazi & Daubert (1980), Hydrocarbon Processing 59(3), 115-116 (coefficients from memory)";
export const RIAZI_DAUBERT_1987 =
  "Riazi & Daubert (1987), Ind. Eng. Chem. Res. 26, 755-759, as printed in Riazi (2005), ASTM MNL50, ch. 2 (from memory)";

/** Riazi-Daubert (1980): M, Tc, Pc, Vc from Tb (K) and SG. */
export function riaziDaubert1980(
  normalBoilingPointK: number,
  specificGravity: number,
  options: { allowOutsideRange?: boolean } = {},
): FractionCriticalEstimate {
  const allow = options.allowOutsideRange ?? false;
  const name = "Riazi-Daubert (1980)";
  const warnings = [
    ...checkValidity(
      name,
      "normalBoilingPointK",
      normalBoilingPointK,
      { min: 311, max: 728, unit: "K" },
      allow,
    ),
    ...checkValidity(
      name,
      "specificGravity",
      specificGravity,
      { min: 0.6, max: 1.0, unit: "-" },
      allow,
    ),
  ];
  const tb = normalBoilingPointK;
  const sg = specificGravity;
  const m = 1.6607e-4 * tb ** 2.1962 * sg ** -1.0164;
  const tc = 19.06232 * tb ** 0.58848 * sg ** 0.3596;
  const pcBar = 5.53027e7 * tb ** -2.3125 * sg ** 2.3201;
  const vcFt3PerLb = 7.5214e-3 * (1.8 * tb) ** 0.2896 * sg ** -0.7666;
  const vcM3PerKg = (vcFt3PerLb * 0.028316846592) / 0.45359237;
  return {
    molarMassKgPerMol: m / 1000,
    criticalTemperatureK: tc,
    criticalPressurePa: pcBar * 1e5,
    criticalVolumeM3PerMol: vcM3PerKg * (m / 1000),
    source: RIAZI_DAUBERT_1980,
    warnings,
  };
}

/** Riazi-Daubert (1987): M, Tc, Pc from Tb (K) and SG (no Vc). */
export function riaziDaubert1987(
  normalBoilingPointK: number,
  specificGravity: number,
  options: { allowOutsideRange?: boolean } = {},
): FractionCriticalEstimate {
  const allow = options.allowOutsideRange ?? false;
  const name = "Riazi-Daubert (1987) critical constants";
  const warnings = [
    ...checkValidity(
      name,
      "normalBoilingPointK",
      normalBoilingPointK,
      { min: 300, max: 620, unit: "K" },
      allow,
    ),
    ...checkValidity(
      name,
      "specificGravity",
      specificGravity,
      { min: 0.63, max: 0.97, unit: "-" },
      allow,
    ),
  ];
  const tb = normalBoilingPointK;
  const sg = specificGravity;
  const m =
    42.965 *
    Math.exp(2.097e-4 * tb - 7.78712 * sg + 2.08476e-3 * tb * sg) *
    tb ** 1.26007 *
    sg ** 4.98308;
  const tc =
    9.5233 *
    Math.exp(-9.314e-4 * tb - 0.544442 * sg + 6.4791e-4 * tb * sg) *
    tb ** 0.81067 *
    sg ** 0.53691;
  const pcBar =
    3.1958e5 *
    Math.exp(-8.505e-3 * tb - 4.8014 * sg + 5.749e-3 * tb * sg) *
    tb ** -0.4844 *
    sg ** 4.0846;
  return {
    molarMassKgPerMol: m / 1000,
    criticalTemperatureK: tc,
    criticalPressurePa: pcBar * 1e5,
    criticalVolumeM3PerMol: NaN,
    source: RIAZI_DAUBERT_1987,
    warnings,
  };
}
