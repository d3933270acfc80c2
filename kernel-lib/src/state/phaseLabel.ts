/**
 * Phase labels. A pure fluid is "supercritical" when T >= Tc and P >= Pc of the model; otherwise
 * the state is "liquid" when its density is above the critical density and "vapor" below (on a
 * subcritical isotherm the whole vapor branch lies below rho_c and the liquid branch above, since
 * the spinodal meets the critical point). When the equation has several stable roots at (T, P),
 * the lowest-density one is the vapor and the highest the liquid whatever their density.
 *
 * Mixtures (more than one component) with a single stable root are labelled by the phase
 * identification parameter of G. Venkatarathnam and L. R. Oellrich, "Identification of the phase
 * of a fluid using partial derivatives of pressure, volume, and temperature without reference to
 * saturation properties: Applications in phase equilibria calculations", Fluid Phase Equilib. 301
 * (2011) 225-233:
 *   PIP = V [ (d2P/dV dT) / (dP/dT)_V - (d2P/dV2)_T / (dP/dV)_T ]
 *       = 2 - rho [ (d2P/drho dT) / (dP/dT)_rho - (d2P/drho2)_T / (dP/drho)_T ],
 * "liquid" when PIP > 1 and "vapor" when PIP <= 1 (the ideal gas has PIP = 1). It needs no
 * (pseudo-)critical point, so a natural gas at 60 barg is a vapour, not "supercritical" as Kay's
 * pseudo-critical rule made it; mixtures are never labelled "supercritical". d2P/drho2 comes from
 * the model's aDDD when it has it, else a central difference of (dP/drho)_T in rho; d2P/drho dT
 * from the model's aDDT when it has it (the cubics), else a central difference of (dP/drho)_T in
 * T (relative steps 1e-5). This is a label, not a
 * phase-stability test: whether a mixture splits is decided by the tangent-plane test and the
 * flash (phase/).
 * A model without `pseudoCritical` labels a single root of a pure fluid "liquid" when Z < 0.3
 * (common practice, no source) and "vapor" otherwise.
 */
import type { ResidualDerivatives, ResidualModel } from "../eos/types.js";
import { dPdTAtDensity, stiffnessFromResidual } from "../eos/residualRelations.js";
import type { PhaseLabel } from "./types.js";

// relative steps of the central differences of (dP/drho)_T (error ~ h^2 + eps / h)
const STEP_T = 1e-5;
const STEP_RHO = 1e-5;

/** (dP/drho)_T / (R T) from reduced derivatives (eos/residualRelations.ts). */
const dPdRhoOverRT = stiffnessFromResidual;

/**
 * The phase identification parameter of Venkatarathnam and Oellrich (2011) at T (K), rho
 * (mol/m3), x (see the header): > 1 liquid-like, <= 1 vapour-like. `residual` may pass the
 * model's derivatives at this state when the caller has them.
 */
export function phaseIdentificationParameter(
  model: ResidualModel,
  temperatureK: number,
  densityMolPerM3: number,
  x: readonly number[],
  residual?: ResidualDerivatives,
): number {
  const T = temperatureK;
  const rho = densityMolPerM3;
  const r = residual ?? model.residual(T, rho, x);
  const pRho = dPdRhoOverRT(r); // (dP/drho)_T / RT
  // rho (d2P/drho2)_T / RT
  let rhoPRhoRho: number;
  if (r.aDDD !== undefined) {
    rhoPRhoRho = 2 * r.aD + 4 * r.aDD + r.aDDD;
  } else {
    const h = rho * STEP_RHO;
    const up = dPdRhoOverRT(model.residual(T, rho + h, x));
    const dn = dPdRhoOverRT(model.residual(T, rho - h, x));
    rhoPRhoRho = (rho * (up - dn)) / (2 * h);
  }
  // (d2P/drho dT) / R = d[T (1 + 2 aD + aDD)]/dT = 1 + 2 aD + aDD + 2 aDT + aDDT, and
  // (dP/dT)_rho / (rho R)
  let pRhoT: number;
  if (r.aDDT !== undefined) {
    pRhoT = pRho + 2 * r.aDT + r.aDDT;
  } else {
    const hT = T * STEP_T;
    const pRhoUp = (T + hT) * dPdRhoOverRT(model.residual(T + hT, rho, x));
    const pRhoDn = (T - hT) * dPdRhoOverRT(model.residual(T - hT, rho, x));
    pRhoT = (pRhoUp - pRhoDn) / (2 * hT);
  }
  const pT = dPdTAtDensity(rho, r, 1) / rho; // (dP/dT)_rho / (rho R)
  return 2 - (pRhoT / pT - rhoPRhoRho / pRho);
}

/**
 * Label of a state at (T, P, rho).
 *
 * @param position - where the root sits among the stable roots found at this (T, P): "lowest",
 *   "highest" or "only" (the single stable root).
 * @param residual - the model's derivatives at this state, when the caller has them (saves one
 *   evaluation for a mixture).
 */
export function phaseLabel(
  model: ResidualModel,
  temperatureK: number,
  pressurePa: number,
  densityMolPerM3: number,
  x: readonly number[],
  position: "lowest" | "highest" | "only",
  Z: number,
  residual?: ResidualDerivatives,
): PhaseLabel {
  if (position === "lowest") return "vapor";
  if (position === "highest") return "liquid";
  if (x.length > 1) {
    return phaseIdentificationParameter(model, temperatureK, densityMolPerM3, x, residual) > 1
      ? "liquid"
      : "vapor";
  }
  if (!model.pseudoCritical) return Z < 0.3 ? "liquid" : "vapor";
  const pc = model.pseudoCritical(x);
  if (temperatureK >= pc.temperatureK && pressurePa >= pc.pressurePa) return "supercritical";
  return densityMolPerM3 > pc.densityMolPerM3 ? "liquid" : "vapor";
}
