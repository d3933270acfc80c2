/**
 * The molar residual properties reported at one state. The formulas live in one place, the
 * engine's state/properties.ts (residualProperties): with alpha_r = a and Z = 1 + aD,
 *   a_res = R T a,  u_res = -R T aT,  s_res = R (-a - aT)     (same T and density)
 *   h_res = R T (aD - aT)                                      (same in both conventions)
 *   ln phi = a + aD - ln(1 + aD),  g_res = R T ln phi          (same T and pressure)
 * The data route has the integrals a_res and s_res and Z instead of derivatives; they are turned
 * into the equivalent reduced derivatives (a = a_res/RT, aD = Z - 1, aT = -(a_res + T s_res)/RT)
 * and passed through the same function.
 */
import type { ResidualDerivatives } from "../eos/types.js";
import { residualProperties } from "../state/properties.js";

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
  return departuresFromReduced(
    temperatureK,
    {
      a: aResJPerMol / RT,
      aD: compressibility - 1,
      aT: -(aResJPerMol + temperatureK * sResJPerMolK) / RT,
      aDD: Number.NaN,
      aTT: Number.NaN,
      aDT: Number.NaN,
    },
    gasConstant,
  );
}

/** From reduced residual derivatives (any ResidualModel, or the fitted surface). */
export function departuresFromReduced(
  temperatureK: number,
  d: ResidualDerivatives,
  gasConstant: number,
): DepartureSet {
  const r = residualProperties(temperatureK, d, gasConstant);
  return {
    a: r.TV.a,
    s: r.TV.s,
    u: r.TV.u,
    h: r.TV.h,
    g: r.TP.g,
    lnPhi: r.TP.g / (gasConstant * temperatureK),
  };
}

/** The entries of a DepartureSet, in the order of the route's flattened values. */
export const DEPARTURE_KEYS = ["a", "s", "u", "h", "g", "lnPhi"] as const;

/** One entry name of a DepartureSet. */
export type DepartureKey = (typeof DEPARTURE_KEYS)[number];
