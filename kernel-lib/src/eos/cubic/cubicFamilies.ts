/**
 * The two-parameter cubic equations of state as one family,
 *
 *   P = R T / (v - b) - a(T) / ((v + delta1 b)(v + delta2 b)),
 *
 * (the generalized form of e.g. Michelsen & Mollerup, Thermodynamic Models: Fundamentals and
 * Computational Aspects, 2nd ed. 2007, chapter 3, eq. 1 there), with a_c = Omega_a R^2 Tc^2 / Pc and
 * b = Omega_b R Tc / Pc. Omega_a, Omega_b and Zc follow from delta1, delta2 by the critical
 * conditions (the cubic in Z must be (Z - Zc)^3 at Tc, Pc): with u = delta1 + delta2,
 * w = delta1 delta2, B = Omega_b,
 *   Zc = (1 + B (1 - u)) / 3,  Omega_a = 3 Zc^2 - w B^2 + u B + u B^2,  Zc^3 = Omega_a B + w B^2 + w B^3,
 * solved here once per family (bisection in B to full precision), so the constants are exact for
 * the form rather than the rounded values printed in the papers (vdW 27/64, 1/8, 3/8; RK 0.42748,
 * 0.08664, 1/3; PR 0.45724, 0.07780, 0.3074 -- the tests check them against those).
 */
import type { AlphaKind } from "./alphaFunctions.js";

/** The cubic models isochor offers (their `isochor eval` names). */
export type CubicModelId =
  | "van-der-waals"
  | "redlich-kwong"
  | "soave-redlich-kwong"
  | "peng-robinson"
  | "peng-robinson-1978";

/** One member of the cubic family. */
export interface CubicFamily {
  readonly id: CubicModelId;
  readonly name: string;
  readonly citation: string;
  readonly delta1: number;
  readonly delta2: number;
  readonly alpha: AlphaKind;
  /** Which k_ij column of eos/data/kij.json applies. */
  readonly interactionFamily:
    "peng-robinson" | "soave-redlich-kwong" | "redlich-kwong" | "van-der-waals";
  /** Omega_a, from the critical conditions. */
  readonly omegaA: number;
  /** Omega_b, from the critical conditions. */
  readonly omegaB: number;
  /** Critical compressibility factor of the equation. */
  readonly criticalZ: number;
}

/** Solves the critical conditions for Omega_a, Omega_b, Zc (see the header). */
export function criticalConstantsOfCubic(
  delta1: number,
  delta2: number,
): { omegaA: number; omegaB: number; criticalZ: number } {
  const u = delta1 + delta2;
  const w = delta1 * delta2;
  const residual = (B: number): number => {
    const zc = (1 + B * (1 - u)) / 3;
    const A = 3 * zc * zc - w * B * B + u * B + u * B * B;
    return A * B + w * B * B + w * B * B * B - zc * zc * zc;
  };
  // residual(0) = -1/27 < 0 and residual grows through the physical root below B = 0.3
  // for every member of the family used here; plain bisection to the last bit.
  let lo = 0;
  let hi = 0.3;
  for (let i = 0; i < 200 && hi - lo > 1e-17; i++) {
    const mid = 0.5 * (lo + hi);
    if (residual(mid) < 0) lo = mid;
    else hi = mid;
  }
  const B = 0.5 * (lo + hi);
  const zc = (1 + B * (1 - u)) / 3;
  return { omegaA: 3 * zc * zc - w * B * B + u * B + u * B * B, omegaB: B, criticalZ: zc };
}

function family(spec: Omit<CubicFamily, "omegaA" | "omegaB" | "criticalZ">): CubicFamily {
  return { ...spec, ...criticalConstantsOfCubic(spec.delta1, spec.delta2) };
}

const SQRT2 = Math.SQRT2;

/** The family members, by id. */
export const CUBIC_FAMILIES: Readonly<Record<CubicModelId, CubicFamily>> = {
  "van-der-waals": family({
    id: "van-der-waals",
    name: "van der Waals (1873)",
    citation:
      "J. D. van der Waals, Over de Continuiteit van den Gas- en Vloeistoftoestand, thesis, Leiden (1873)",
    delta1: 0,
    delta2: 0,
    alpha: "constant",
    interactionFamily: "van-der-waals",
  }),
  "redlich-kwong": family({
    id: "redlich-kwong",
    name: "Redlich-Kwong (1949)",
    citation:
      "O. Redlich, J. N. S. Kwong, On the thermodynamics of solutions. V. An equation of state. Fugacities of gaseous solutions, Chem. Rev. 44 (1949) 233-244",
    delta1: 1,
    delta2: 0,
    alpha: "redlich-kwong",
    interactionFamily: "redlich-kwong",
  }),
  "soave-redlich-kwong": family({
    id: "soave-redlich-kwong",
    name: "Soave-Redlich-Kwong (1972)",
    citation:
      "G. Soave, Equilibrium constants from a modified Redlich-Kwong equation of state, Chem. Eng. Sci. 27 (1972) 1197-1203",
    delta1: 1,
    delta2: 0,
    alpha: "soave",
    interactionFamily: "soave-redlich-kwong",
  }),
  "peng-robinson": family({
    id: "peng-robinson",
    name: "Peng-Robinson (1976)",
    citation:
      "D.-Y. Peng, D. B. Robinson, A new two-constant equation of state, Ind. Eng. Chem. Fundam. 15 (1976) 59-64",
    delta1: 1 + SQRT2,
    delta2: 1 - SQRT2,
    alpha: "peng-robinson-1976",
    interactionFamily: "peng-robinson",
  }),
  "peng-robinson-1978": family({
    id: "peng-robinson-1978",
    name: "Peng-Robinson (1978 alpha for omega > 0.49)",
    citation:
      "D.-Y. Peng, D. B. Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59-64; with D. B. Robinson, D.-Y. Peng, The characterization of the heptanes and heavier fractions for the GPA Peng-Robinson programs, GPA Research Report RR-28 (1978)",
    delta1: 1 + SQRT2,
    delta2: 1 - SQRT2,
    alpha: "peng-robinson-1978",
    interactionFamily: "peng-robinson",
  }),
};

/** Type guard: is this string one of the cubic model ids? */
export function isCubicModelId(id: string): id is CubicModelId {
  return Object.prototype.hasOwnProperty.call(CUBIC_FAMILIES, id);
}
