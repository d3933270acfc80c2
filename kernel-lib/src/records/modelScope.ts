/**
 * What each built-in model is meant for, in words, for the "validity" line of a calculation
 * record. Ranges are stated only where the model's own source states one; otherwise the text says
 * that there is no published range and what the model is generally used for (common practice).
 */
import type { ResidualModel } from "../eos/types.js";

const CUBIC_SCOPE =
  "No published range of temperature or pressure: parameters come from each component's critical " +
  "temperature, critical pressure and acentric factor. Meant for non-polar and mildly polar fluids " +
  "(hydrocarbons, light gases); gas-phase properties are its strength, liquid densities are less " +
  "accurate unless volume-translated (common practice).";

const SCOPES: Readonly<Record<string, string>> = {
  "ideal-gas": "Ideal gas: departures are zero by construction; use only at low pressure.",
  virial:
    "Second virial coefficient only (truncated virial equation): gas at low to moderate density, " +
    "roughly below half the critical density; not for liquids or near-critical states (common practice).",
  "van-der-waals": "Historical two-constant cubic; qualitative only. " + CUBIC_SCOPE,
  "redlich-kwong": CUBIC_SCOPE,
  "soave-redlich-kwong": CUBIC_SCOPE,
  "peng-robinson": CUBIC_SCOPE,
  "peng-robinson-1978": CUBIC_SCOPE,
  "lee-kesler":
    "Corresponding states fitted for reduced temperatures 0.3 to 4 (the library warns outside " +
    "them); reduced pressures up to 10 in the original fit (Lee and Kesler 1975).",
};

/**
 * The validity text of a model: a reference equation's published range when the model carries one
 * (`validityDescription`), else the scope of a built-in model id, else undefined.
 */
export function modelScope(model: ResidualModel): string | undefined {
  const described = (model as { validityDescription?: unknown }).validityDescription;
  if (typeof described === "string" && described !== "") return described;
  return SCOPES[model.info.id];
}
