/**
 * Closed-form residual Helmholtz energy of one Lee-Kesler fluid (simple or reference), from its
 * modified Benedict-Webb-Rubin equation (Lee & Kesler, AIChE J. 21 (1975) 510, eq. 1; constants in
 * eos/data/leeKesler.json). With r = 1/Vr = R Tc rho / Pc (reduced ideal density) and q = gamma r^2:
 *   alpha_r = B r + C r^2/2 + D r^5/5 + E,
 *   E = c4 / (2 Tr^3 gamma) [beta + 1 - (beta + 1 + q) exp(-q)]
 * (the integral of (Z - 1)/r from 0; E is eq. 6 of the paper, the enthalpy-departure term).
 * Reduced derivatives (Dr = r d/dr = 2 q d/dq): with k = c4/Tr^3 and
 *   e = (beta q + q^2) exp(-q) / gamma,  Dr e = 2q (beta + 2q - beta q - q^2) exp(-q) / gamma,
 *   Dr^2 e = 4q (beta + 4q - 3 beta q - 5 q^2 + beta q^2 + q^3) exp(-q) / gamma,
 *   aD = B r + C r^2 + D r^5 + k e,   aDD = C r^2 + 4 D r^5 + k (Dr e - e),
 *   aDDD = 12 D r^5 + k (Dr^2 e - 3 Dr e + 2 e),
 * and in temperature (T d/dT = Tr d/dTr at constant r): Tr dB/dTr = b2/Tr + 2 b3/Tr^2 + 3 b4/Tr^3,
 * Tr dC/dTr = c2/Tr - 3 c3/Tr^3, Tr dD/dTr = -d2/Tr, Tr d(Tr^-3)/dTr = -3 Tr^-3, etc.
 */

/** The twelve constants of one Lee-Kesler fluid. */
export interface LeeKeslerConstants {
  readonly b1: number;
  readonly b2: number;
  readonly b3: number;
  readonly b4: number;
  readonly c1: number;
  readonly c2: number;
  readonly c3: number;
  readonly c4: number;
  readonly d1: number;
  readonly d2: number;
  readonly beta: number;
  readonly gamma: number;
}

/** Reduced residual derivatives of one fluid at (Tr, r). */
export interface FluidDerivatives {
  a: number;
  aD: number;
  aDD: number;
  aDDD: number;
  aT: number;
  aTT: number;
  aDT: number;
}

/** Evaluates alpha_r and its reduced derivatives for one fluid; writes into `out`. */
export function leeKeslerFluid(
  k: LeeKeslerConstants,
  reducedTemperature: number,
  reducedDensity: number,
  out: FluidDerivatives,
): FluidDerivatives {
  const t = 1 / reducedTemperature;
  const t2 = t * t;
  const t3 = t2 * t;
  const r = reducedDensity;
  const r2 = r * r;
  const r5 = r2 * r2 * r;
  const B = k.b1 - k.b2 * t - k.b3 * t2 - k.b4 * t3;
  const C = k.c1 - k.c2 * t + k.c3 * t3;
  const D = k.d1 + k.d2 * t;
  const TB = k.b2 * t + 2 * k.b3 * t2 + 3 * k.b4 * t3;
  const TTB = -2 * k.b2 * t - 6 * k.b3 * t2 - 12 * k.b4 * t3;
  const TC = k.c2 * t - 3 * k.c3 * t3;
  const TTC = -2 * k.c2 * t + 12 * k.c3 * t3;
  const TD = -k.d2 * t;
  const TTD = 2 * k.d2 * t;
  const beta = k.beta;
  const gamma = k.gamma;
  const q = gamma * r2;
  const ex = Math.exp(-q);
  const kk = k.c4 * t3;
  const G = (beta + 1 - (beta + 1 + q) * ex) / (2 * gamma);
  const E = kk * G;
  const e = ((beta * q + q * q) * ex) / gamma;
  const De = (2 * q * (beta + 2 * q - beta * q - q * q) * ex) / gamma;
  const D2e =
    (4 * q * (beta + 4 * q - 3 * beta * q - 5 * q * q + beta * q * q + q * q * q) * ex) / gamma;
  out.a = B * r + (C * r2) / 2 + (D * r5) / 5 + E;
  out.aD = B * r + C * r2 + D * r5 + kk * e;
  out.aDD = C * r2 + 4 * D * r5 + kk * (De - e);
  out.aDDD = 12 * D * r5 + kk * (D2e - 3 * De + 2 * e);
  out.aT = TB * r + (TC * r2) / 2 + (TD * r5) / 5 - 3 * E;
  out.aTT = TTB * r + (TTC * r2) / 2 + (TTD * r5) / 5 + 12 * E;
  out.aDT = TB * r + TC * r2 + TD * r5 - 3 * kk * e;
  return out;
}
