/**
 * Ideal-gas part phi_0(tau, delta) of a multiparameter Helmholtz equation of state:
 *   phi_0 = ln(delta) + c0 + c1 tau + lnTau ln(tau) + sum_k n_k tau^(t_k)
 *           + sum_k n_k ln(1 - exp(-gamma_k tau))       (vibrational, Planck-Einstein terms)
 * The two constants c0 and c1 fix the zero of entropy and energy: the publication's values give
 * its reference state (IAPWS-95: u = s = 0 for the saturated liquid at the triple point).
 * Sources: W. Wagner and A. Pruss, J. Phys. Chem. Ref. Data 31, 387 (2002), eq. (6.5) and Table 6.4;
 * R. Span et al., J. Phys. Chem. Ref. Data 29, 1361 (2000), eq. (9) (the power terms in tau).
 *
 * Derivatives: phi_0 depends on delta only through ln(delta), so delta phi_d = 1,
 * delta^2 phi_dd = -1, delta^3 phi_ddd = 2, and delta tau phi_dt = 0.
 */
import type { ReducedHelmholtz } from "./residualPart.js";

/** Coefficient tables of an ideal part (all dimensionless). */
export interface IdealPartData {
  /** Constant c0 (sets the zero of entropy). */
  readonly c0: number;
  /** Coefficient c1 of tau (sets the zero of energy). */
  readonly c1: number;
  /** Coefficient of ln(tau). */
  readonly lnTau: number;
  /** Terms n tau^t. */
  readonly tauPowers: readonly { readonly n: number; readonly t: number }[];
  /** Vibrational (Planck-Einstein) terms n ln(1 - exp(-gamma tau)); IAPWS-95's n°_i, γ°_i. */
  readonly vibrational: readonly { readonly n: number; readonly gamma: number }[];
}

/** The compiled ideal part; create with {@link compileIdealPart}. */
export interface IdealPart {
  /** Overwrites `out` with phi_0 and its reduced derivatives at (tau, delta). */
  evaluate(tau: number, delta: number, out: ReducedHelmholtz): ReducedHelmholtz;
  /** The coefficients, for reports and for shifting the reference state. */
  readonly data: IdealPartData;
}

/** Compiles an ideal part. */
export function compileIdealPart(data: IdealPartData): IdealPart {
  const pn = Float64Array.from(data.tauPowers.map((p) => p.n));
  const pt = Float64Array.from(data.tauPowers.map((p) => p.t));
  const em = Float64Array.from(data.vibrational.map((p) => p.n));
  const et = Float64Array.from(data.vibrational.map((p) => p.gamma));
  function evaluate(tau: number, delta: number, out: ReducedHelmholtz): ReducedHelmholtz {
    let f = Math.log(delta) + data.c0 + data.c1 * tau + data.lnTau * Math.log(tau);
    let fT = data.c1 * tau + data.lnTau;
    let fTT = -data.lnTau;
    for (let i = 0; i < pn.length; i++) {
      const v = pn[i] * Math.pow(tau, pt[i]);
      f += v;
      fT += v * pt[i];
      fTT += v * pt[i] * (pt[i] - 1);
    }
    for (let i = 0; i < em.length; i++) {
      const x = et[i] * tau;
      const e = Math.exp(-x);
      // 1 - e is exact enough: x = gamma tau stays above ~0.1 for published terms and T < 5000 K.
      const oneMinus = 1 - e;
      f += em[i] * Math.log(oneMinus);
      // tau d/dtau: m x e / (1 - e); tau^2 d2/dtau2: -m x^2 e / (1 - e)^2
      const r = e / oneMinus;
      fT += em[i] * x * r;
      fTT -= (em[i] * x * x * r) / oneMinus;
    }
    out.f = f;
    out.fD = 1;
    out.fDD = -1;
    out.fDDD = 2;
    out.fT = fT;
    out.fTT = fTT;
    out.fDT = 0;
    return out;
  }
  return { evaluate, data };
}
