/**
 * A closed-form "truth" for checking the P-V-T route while the reference equations are not yet in
 * the tree: the Peng-Robinson equation (Peng & Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59,
 * eqs. 4-5, 9-10, 17-18) for carbon dioxide, with its residual Helmholtz energy and temperature
 * derivative in closed form (integral of the PR pressure, e.g. Poling, Prausnitz & O'Connell, The
 * Properties of Gases and Liquids, 5th ed., 2001, Table 6-3 form), and its exact second virial
 * coefficient B(T) = b - a(T)/(R T). Constants of CO2: Tc = 304.1282 K, Pc = 7.3773 MPa, omega =
 * 0.22394 (Span & Wagner, J. Phys. Chem. Ref. Data 25 (1996) 1509, Table 3 for Tc and Pc; omega from
 * memory of the same paper's acentric factor).
 * The checks only need a smooth, thermodynamically consistent model whose departures are known
 * exactly; PR is one, independent of the route's code.
 */
import { R } from "../../../kernel-lib/src/constants.js";

export const CO2 = { Tc: 304.1282, Pc: 7.3773e6, omega: 0.22394, M: 0.0440098 };

const SQ2 = Math.SQRT2;
const kappa = 0.37464 + 1.54226 * CO2.omega - 0.26992 * CO2.omega ** 2;
const a0 = (0.45724 * R * R * CO2.Tc * CO2.Tc) / CO2.Pc;
export const bPR = (0.0778 * R * CO2.Tc) / CO2.Pc;

export function aOf(T: number): { a: number; dadT: number } {
  const sr = Math.sqrt(T / CO2.Tc);
  const alphaSqrt = 1 + kappa * (1 - sr);
  return { a: a0 * alphaSqrt * alphaSqrt, dadT: (-a0 * kappa * alphaSqrt) / Math.sqrt(T * CO2.Tc) };
}

export function pressurePR(T: number, rho: number): number {
  const { a } = aOf(T);
  const b = bPR;
  return (rho * R * T) / (1 - b * rho) - (a * rho * rho) / (1 + 2 * b * rho - b * b * rho * rho);
}

/** Exact second virial coefficient of PR, m3/mol. */
export function secondVirialPR(T: number): number {
  return bPR - aOf(T).a / (R * T);
}

/** Residual properties of PR at (T, rho): a, s (same T and density), u, h, g = R T ln phi (same T, P). */
export function departuresPR(
  T: number,
  rho: number,
): { a: number; s: number; u: number; h: number; g: number; lnPhi: number } {
  const b = bPR;
  const { a, dadT } = aOf(T);
  const L = Math.log((1 + (1 + SQ2) * b * rho) / (1 + (1 - SQ2) * b * rho));
  const k = L / (2 * SQ2 * b * R);
  const alphaR = -Math.log(1 - b * rho) - (a / T) * k;
  // T d(alpha_r)/dT = -k T d(a/T)/dT = -k (dadT - a/T)
  const aT = -k * (dadT - a / T);
  const Z = pressurePR(T, rho) / (rho * R * T);
  const RT = R * T;
  const lnPhi = alphaR + Z - 1 - Math.log(Z);
  return {
    a: RT * alphaR,
    s: R * (-alphaR - aT),
    u: -RT * aT,
    h: RT * (-aT + Z - 1),
    g: RT * lnPhi,
    lnPhi,
  };
}

/**
 * Saturation of PR CO2 at T by equal fugacity (Brent on the pressure between the cubic's
 * spinodal-bounded three-root range), with dPsat/dT from the Clapeyron equation
 * (h_V - h_L) / (T (v_V - v_L)), all from the closed forms above.
 */
export function saturationPR(T: number): {
  pressurePa: number;
  slopePaPerK: number;
  rhoV: number;
  rhoL: number;
} {
  const b = bPR;
  const { a } = aOf(T);
  const roots = (P: number): number[] => {
    const A = (a * P) / (R * T) ** 2;
    const B = (b * P) / (R * T);
    const c2 = -(1 - B);
    const c1 = A - 3 * B * B - 2 * B;
    const c0 = -(A * B - B * B - B * B * B);
    // Real roots of Z^3 + c2 Z^2 + c1 Z + c0 by bisection-safe Newton from both ends.
    const f = (z: number) => ((z + c2) * z + c1) * z + c0;
    const df = (z: number) => (3 * z + 2 * c2) * z + c1;
    const polish = (z0: number) => {
      let z = z0;
      for (let i = 0; i < 100; i++) z -= f(z) / df(z);
      return z;
    };
    return [polish(B + 1e-9), polish(1.5)];
  };
  const lnPhiDiff = (P: number) => {
    const [zL, zV] = roots(P) as [number, number];
    return departuresPR(T, P / (zV * R * T)).lnPhi - departuresPR(T, P / (zL * R * T)).lnPhi;
  };
  let lo = 1e5;
  let hi = 7.3e6;
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    const zs = roots(mid);
    if (!(Math.abs((zs[0] as number) - (zs[1] as number)) > 1e-6)) {
      hi = mid; // one root only: above the loop's range
      continue;
    }
    if (lnPhiDiff(mid) > 0) hi = mid;
    else lo = mid;
  }
  const P = 0.5 * (lo + hi);
  const [zL, zV] = roots(P) as [number, number];
  const rhoV = P / (zV * R * T);
  const rhoL = P / (zL * R * T);
  const dh = departuresPR(T, rhoV).h - departuresPR(T, rhoL).h;
  return { pressurePa: P, slopePaPerK: dh / (T * (1 / rhoV - 1 / rhoL)), rhoV, rhoL };
}
