/**
 * Phase labels. A pure fluid is "supercritical" when T >= Tc and P >= Pc of the model; otherwise
 * the state is "liquid" when its density is above the critical density and "vapor" below (on a
 * subcritical isotherm the whole vapor branch lies below rho_c and the liquid branch above, since
 * the spinodal meets the critical point). When the equation has several stable roots at (T, P),
 * the lowest-density one is the vapor and the highest the liquid whatever their density.
 *
 * Mixtures use the same rule with a pseudo-critical point (the model's `pseudoCritical`, e.g. Kay's
 * rule). That is a label, not a phase-stability test: a mixture can be two-phase above its Kay
 * temperature (up to the cricondentherm); the flash decides that, not this label.
 * A model without `pseudoCritical` labels a single root "liquid" when Z < 0.3 (common practice,
 * no source) and "vapor" otherwise.
 */
import type { ResidualModel } from "../eos/types.js";
import type { PhaseLabel } from "./types.js";

/**
 * Label of a state at (T, P, rho).
 *
 * @param position - where the root sits among the stable roots found at this (T, P): "lowest",
 *   "highest" or "only" (the single stable root).
 */
export function phaseLabel(
  model: ResidualModel,
  temperatureK: number,
  pressurePa: number,
  densityMolPerM3: number,
  x: readonly number[],
  position: "lowest" | "highest" | "only",
  Z: number,
): PhaseLabel {
  if (position === "lowest") return "vapor";
  if (position === "highest") return "liquid";
  if (!model.pseudoCritical) return Z < 0.3 ? "liquid" : "vapor";
  const pc = model.pseudoCritical(x);
  if (temperatureK >= pc.temperatureK && pressurePa >= pc.pressurePa) return "supercritical";
  return densityMolPerM3 > pc.densityMolPerM3 ? "liquid" : "vapor";
}
