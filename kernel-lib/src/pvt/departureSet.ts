/**
 * The molar residual properties reported at one state, and how they follow from the reduced
 * residual Helmholtz derivatives (eos/types.ts): with alpha_r = a and Z = 1 + aD,
 *   a_res = R T a,  u_res = -R T aT,  s_res = R (-a - aT)     (same T and density)
 *   h_res = R T (aD - aT)                                      (same in both conventions)
 *   ln phi = a + aD - ln(1 + aD),  g_res = R T ln phi          (same T and pressure)
 * (e.g. Span, Multiparameter Equations of State, Springer 2000, Table 3.1 in reduced form).
 * TODO(engine): when state/ exports its residual-property function, call it here instead, so the
 * formula lives in one place.
 */
import type { ResidualDerivatives } from "../eos/types.js";

/** Molar residual properties: J/mol (a, u, h, g), J/(mol K) (s), dimensionless (lnPhi). */
export interface DepartureSet {
  /** Residual Helmholtz energy, same T and density, J/mol. */
  a: number;
  /** Residual entropy, same T and density, J/(mol K). */
  s: number;
  /** Residual internal energy, J/mol. */
  u: number;
  /** Residual enthalpy, J/mol. */
  h: number;
  /** Residual Gibbs energy at the same T and pressure (= R T ln phi), J/mol. */
  g: number;
  /** ln of the fugacity coefficient. */
  lnPhi: number;
}

/** From the two integrals of the data route (a_res and s_res at same T and density) and Z. */
export function departuresFromIntegrals(
  temperatureK: number,
  compressibility: number,
  aResJPerMol: number,
  sResJPerMolK: number,
  gasConstant: number,
): DepartureSet {
  const RT = gasConstant * temperatureK;
  const u = aResJPerMol + temperatureK * sResJPerMolK;
  const lnPhi = aResJPerMol / RT + compressibility - 1 - Math.log(compressibility);
  return {
    a: aResJPerMol,
    s: sResJPerMolK,
    u,
    h: u + RT * (compressibility - 1),
    g: RT * lnPhi,
    lnPhi,
  };
}

/** From reduced residual derivatives (any ResidualModel, or the fitted surface). */
export function departuresFromReduced(
  temperatureK: number,
  d: ResidualDerivatives,
  gasConstant: number,
): DepartureSet {
  const RT = gasConstant * temperatureK;
  return departuresFromIntegrals(
    temperatureK,
    1 + d.aD,
    RT * d.a,
    gasConstant * (-d.a - d.aT),
    gasConstant,
  );
}

export const DEPARTURE_KEYS = ["a", "s", "u", "h", "g", "lnPhi"] as const;
