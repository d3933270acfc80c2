/**
 * What phase equilibrium of a pure fluid needs from a ResidualModel, and nothing more: pressure,
 * (dP/drho)_T and the density-dependent part of the Gibbs energy along an isotherm. With
 * alpha_r = a and reduced derivatives aD, aDD (eos/types.ts), at temperature T (the formulas
 * themselves live in eos/residualRelations.ts):
 *   P = rho R T (1 + aD),    (dP/drho)_T = R T (1 + 2 aD + aDD)
 *   g / RT = ln(rho) + a + aD + f(T)    (f(T): ideal-gas part, equal in both phases: dropped)
 *   d(g/RT)/d(rho) = (1 + 2 aD + aDD) / rho  (so (dg/dP)_T = 1/rho, Gibbs-Duhem).
 * Source: any Helmholtz-energy text, e.g. R. Span, Multiparameter Equations of State (Springer,
 * 2000), Table 3.3; the saturation conditions as in Akasaka, J. Therm. Sci. Tech. 3, 442 (2008).
 */
import { R as R_CODATA } from "../constants.js";
import { InputError } from "../errors.js";
import type { PseudoCriticalPoint, ResidualModel } from "../eos/types.js";
import {
  gibbsAtDensityRT,
  pressureFromResidual,
  stiffnessFromResidual,
} from "../eos/residualRelations.js";

/** The single-component composition vector. */
export const PURE: readonly number[] = [1];

/** Values along an isotherm at one density. */
export interface IsothermPoint {
  /** Pa */
  pressurePa: number;
  /** (dP/drho)_T / (R T), dimensionless: 1 + 2 aD + aDD */
  stiffness: number;
  /** g/RT less its ideal-gas temperature function: ln(rho) + a + aD */
  gibbsRT: number;
  /** aD - aT: h_res / RT (same T and density) */
  hResRT: number;
}

/** Gas constant of a model, J/(mol K): its own when published, else CODATA. */
export function gasConstantOf(model: ResidualModel): number {
  return model.gasConstant ?? R_CODATA;
}

/** Throws unless the model has exactly one component. */
export function requirePure(model: ResidualModel, what: string): void {
  if (model.info.componentIds.length !== 1) {
    throw new InputError({
      input: "model",
      unit: "-",
      validRange: `a single-component model (${what} is a pure-fluid calculation; mixtures need a flash)`,
      received: model.info.componentIds,
    });
  }
}

/** Evaluates the model at (T, rho) and fills `out`. */
export function isothermPoint(
  model: ResidualModel,
  temperatureK: number,
  densityMolPerM3: number,
  gasConstant: number,
  out: IsothermPoint,
): IsothermPoint {
  const d = model.residual(temperatureK, densityMolPerM3, PURE);
  out.pressurePa = pressureFromResidual(temperatureK, densityMolPerM3, d.aD, gasConstant);
  out.stiffness = stiffnessFromResidual(d);
  out.gibbsRT = gibbsAtDensityRT(densityMolPerM3, d);
  out.hResRT = d.aD - d.aT;
  return out;
}

/** Pressure (Pa) of a pure fluid at T (K) and rho (mol/m3). */
export function pressureAt(
  model: ResidualModel,
  temperatureK: number,
  densityMolPerM3: number,
  gasConstant: number,
): number {
  const aD = model.residual(temperatureK, densityMolPerM3, PURE).aD;
  return pressureFromResidual(temperatureK, densityMolPerM3, aD, gasConstant);
}

/** (dP/drho)_T / RT of a pure fluid at T (K) and rho (mol/m3): 1 + 2 aD + aDD. */
export function stiffnessAt(
  model: ResidualModel,
  temperatureK: number,
  densityMolPerM3: number,
): number {
  return stiffnessFromResidual(model.residual(temperatureK, densityMolPerM3, PURE));
}

/** g/RT less its ideal-gas function of T, of a pure fluid at T (K) and rho (mol/m3). */
export function gibbsAt(
  model: ResidualModel,
  temperatureK: number,
  densityMolPerM3: number,
): number {
  return gibbsAtDensityRT(densityMolPerM3, model.residual(temperatureK, densityMolPerM3, PURE));
}

/** A fresh {@link IsothermPoint}. */
export function emptyIsothermPoint(): IsothermPoint {
  return { pressurePa: NaN, stiffness: NaN, gibbsRT: NaN, hResRT: NaN };
}

/**
 * Hints a model may carry (reference fluids have them, cubic models may not): optional members of
 * the model interface (eos/types.ts), named together here.
 */
export type SaturationHints = Pick<ResidualModel, "saturationEstimate" | "critical" | "triple">;

/** Is there an ancillary saturation estimate on this model? */
export function hasSaturationEstimate(
  model: ResidualModel,
): model is ResidualModel & Required<Pick<SaturationHints, "saturationEstimate">> {
  return typeof model.saturationEstimate === "function";
}

/** A critical-point guess: pseudoCritical() of the model, or a published `critical` field. */
export function criticalGuessOf(model: ResidualModel): PseudoCriticalPoint | undefined {
  if (model.pseudoCritical) return model.pseudoCritical(PURE);
  const c = model.critical;
  if (c) return { ...c, rule: "published critical point" };
  return undefined;
}
