/**
 * Watson (UOP) characterisation factor, Kw = (Tb in degrees Rankine)^(1/3) / SG
 * (Watson, Nelson & Murphy 1935, Ind. Eng. Chem. 27, 1460). About 12.5-13 for paraffins, 11-12 for
 * naphthenes, 10 and below for aromatics.
 */
import { requirePositive } from "../validate.js";

/** Kw from the normal boiling point (K) and specific gravity at 60/60 degF (dimensionless). */
export function watsonK(normalBoilingPointK: number, specificGravity: number): number {
  requirePositive("normalBoilingPointK", normalBoilingPointK, "K");
  requirePositive("specificGravity", specificGravity, "-");
  return Math.cbrt(1.8 * normalBoilingPointK) / specificGravity;
}
