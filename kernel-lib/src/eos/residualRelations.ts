/**
 * The relations every layer needs between alpha_r = A_res/(nRT) with its reduced derivatives
 * (eos/types.ts) and the pressure, its density derivative and the Gibbs energy, written ONCE here
 * (at the model layer, so models and the layers above use the same lines; state/properties.ts
 * builds every other property on them and re-exports them). With Z = 1 + aD:
 *   P = rho R T (1 + aD)
 *   (dP/drho)_T = R T (1 + 2 aD + aDD),   its reduced form ("stiffness") 1 + 2 aD + aDD
 *   (dP/dT)_rho = rho R (1 + aD + aDT)
 *   g_r/RT at the same T and P = a + aD - ln Z (decides between density roots at given T, P)
 *   g/RT at given T and density, less its ideal-gas function of T = ln(rho) + a + aD
 *     (equal in coexisting phases of a pure fluid; d/d(rho) of it = stiffness / rho, Gibbs-Duhem)
 * Source: R. Span, Multiparameter Equations of State (Springer, 2000), Table 3.3; M. L. Michelsen
 * and J. M. Mollerup, Thermodynamic Models, 2nd ed. (2007), ch. 2.
 * A test (tests/unit/architecture/onePlace.test.ts) fails when these formulas are written again
 * elsewhere in kernel-lib/src.
 */
import { R as R_CODATA } from "../constants.js";
import type { ResidualDerivatives } from "./types.js";

/** Pressure (Pa) of a state from its residual derivative aD: P = rho R T (1 + aD). */
export function pressureFromResidual(
  temperatureK: number,
  densityMolPerM3: number,
  aD: number,
  gasConstant: number = R_CODATA,
): number {
  return densityMolPerM3 * gasConstant * temperatureK * (1 + aD);
}

/** (dP/drho)_T / (R T), dimensionless: 1 + 2 aD + aDD (positive on a mechanically stable root). */
export function stiffnessFromResidual(residual: ResidualDerivatives): number {
  return 1 + 2 * residual.aD + residual.aDD;
}

/** (dP/drho)_T in Pa m3/mol from the derivatives: R T (1 + 2 aD + aDD). */
export function dPdRho(
  temperatureK: number,
  residual: ResidualDerivatives,
  gasConstant: number = R_CODATA,
): number {
  return gasConstant * temperatureK * stiffnessFromResidual(residual);
}

/** (dP/dT) at constant density and composition, Pa/K: rho R (1 + aD + aDT). */
export function dPdTAtDensity(
  densityMolPerM3: number,
  residual: ResidualDerivatives,
  gasConstant: number = R_CODATA,
): number {
  return densityMolPerM3 * gasConstant * (1 + residual.aD + residual.aDT);
}

/** ln Z with Z = 1 + aD; NaN where Z <= 0 (no state at the same T and P exists there). */
export function lnZOf(aD: number): number {
  const Z = 1 + aD;
  return Z > 0 ? Math.log(Z) : NaN;
}

/** g_r/RT at the same T and P with ln Z given: a + aD - ln Z. */
export function gibbsOverRTFromLnZ(a: number, aD: number, lnZ: number): number {
  return a + aD - lnZ;
}

/**
 * Residual Gibbs energy over RT at the same T and P, g_r/RT = a + aD - ln Z: the quantity that
 * decides which density root is stable at a given (T, P).
 */
export function residualGibbsTP(residual: ResidualDerivatives): number {
  return gibbsOverRTFromLnZ(residual.a, residual.aD, lnZOf(residual.aD));
}

/**
 * g/RT at T and molar density rho (mol/m3) less its ideal-gas function of T alone:
 * ln(rho) + a + aD. Two phases of a pure fluid at the same T coexist where it is equal.
 */
export function gibbsAtDensityRT(densityMolPerM3: number, residual: ResidualDerivatives): number {
  return Math.log(densityMolPerM3) + residual.a + residual.aD;
}
