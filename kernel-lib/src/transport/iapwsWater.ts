/**
 * Viscosity and thermal conductivity of water and steam by the IAPWS formulations:
 *
 * - Viscosity: IAPWS R12-08, "Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary
 *   Water Substance" (2008); Huber, Perkins, Laesecke, Friend, Sengers, Assael, Metaxa, Vogel,
 *   Mares and Miyagawa (2009), J. Phys. Chem. Ref. Data 38, 101-125. Eqs. (10) to (22):
 *   mu = mu0(T) mu1(T, rho) mu2(T, rho), the form for general and scientific use, with the
 *   critical enhancement mu2 from the correlation length of the bound IAPWS-95 equation (mu2 is
 *   above 1.02 only close to the critical point).
 * - Thermal conductivity: IAPWS R15-11, "Release on the IAPWS Formulation 2011 for the Thermal
 *   Conductivity of Ordinary Water Substance" (2011); Huber, Perkins, Friend, Sengers, Assael,
 *   Metaxa, Miyagawa, Hellmann and Vogel (2012), J. Phys. Chem. Ref. Data 41, 033102. Eqs. (10),
 *   (15), (16) and the critical enhancement lambda2 of Eqs. (18) to (21), the form for general and
 *   scientific use, with the derivatives from the bound IAPWS-95 equation (the caller passes them)
 *   and the viscosity of the 2008 formulation including mu2.
 *
 * Coefficients from memory of the releases' tables (checked by their verification tables in
 * tests/unit/transport). Reducing constants: T* = 647.096 K, rho* = 322 kg/m3, p* = 22.064 MPa,
 * mu* = 1e-6 Pa s, lambda* = 1e-3 W/(m K). Range of the formulations (from memory): viscosity
 * 253.15 K (at high pressure; 273.16 K at low) to 1173.15 K up to 1000 MPa (narrower at the high
 * temperatures); thermal conductivity the same temperatures, pressures up to 1000 MPa; outside
 * these the result carries a warning.
 */

/**
 * Molar mass of IAPWS-95, kg/mol (R6-95(2018), from memory): the releases' densities in kg/m3 are
 * the equation's molar densities times this value.
 */
export const IAPWS_MOLAR_MASS_KG_PER_MOL = 0.018015268;

const T_STAR = 647.096;
const RHO_STAR = 322;
const P_STAR = 22.064e6;
/** Specific gas constant of IAPWS-95 used to reduce cp in Eq. (19), J/(kg K). */
const R_SPECIFIC = 461.51805;

const H0 = [1.67752, 2.20462, 0.6366564, -0.241605];

// H_ij, i = 0..5 (powers of 1/Tbar - 1), j = 0..6 (powers of rhobar - 1); R12-08 Table 2
const H1: readonly (readonly number[])[] = [
  [5.20094e-1, 2.22531e-1, -2.81378e-1, 1.61913e-1, -3.25372e-2, 0, 0],
  [8.50895e-2, 9.99115e-1, -9.06851e-1, 2.57399e-1, 0, 0, 0],
  [-1.08374, 1.88797, -7.72479e-1, 0, 0, 0, 0],
  [-2.89555e-1, 1.26613, -4.89837e-1, 0, 6.98452e-2, 0, -4.35673e-3],
  [0, 0, -2.5704e-1, 0, 0, 8.72102e-3, 0],
  [0, 1.20573e-1, 0, 0, 0, 0, -5.93264e-4],
];

const L0 = [2.443221e-3, 1.323095e-2, 6.770357e-3, -3.454586e-3, 4.096266e-4];

// L_ij, i = 0..4 (powers of 1/Tbar - 1), j = 0..5 (powers of rhobar - 1); R15-11 Table 2
const L1: readonly (readonly number[])[] = [
  [1.60397357, -0.646013523, 0.111443906, 0.102997357, -0.0504123634, 0.00609859258],
  [2.33771842, -2.78843778, 1.53616167, -0.463045512, 0.0832827019, -0.00719201245],
  [2.19650529, -4.54580785, 3.55777244, -1.40944978, 0.275418278, -0.0205938816],
  [-1.21051378, 1.60812989, -0.621178141, 0.0716373224, 0, 0],
  [-2.720337, 4.57586331, -3.18369245, 1.1168348, -0.19268305, 0.012913842],
];

/** sum_i (1/Tbar - 1)^i sum_j c_ij (rhobar - 1)^j */
function doubleSum(c: readonly (readonly number[])[], tBar: number, rhoBar: number): number {
  const a = 1 / tBar - 1;
  const b = rhoBar - 1;
  let total = 0;
  let ai = 1;
  for (const row of c) {
    let inner = 0;
    let bj = 1;
    for (const cij of row) {
      inner += cij * bj;
      bj *= b;
    }
    total += ai * inner;
    ai *= a;
  }
  return total;
}

/** Dilute-gas viscosity mu0 of IAPWS 2008, Eq. (11), Pa s. */
export function iapwsDiluteViscosity(temperatureK: number): number {
  const t = temperatureK / T_STAR;
  let sum = 0;
  for (let i = 0; i < H0.length; i++) sum += H0[i] / t ** i;
  return ((100 * Math.sqrt(t)) / sum) * 1e-6;
}

/** Viscosity of IAPWS 2008 without the critical enhancement (mu2 = 1), Pa s; rho in kg/m3. */
export function iapwsBackgroundViscosity(temperatureK: number, densityKgPerM3: number): number {
  const t = temperatureK / T_STAR;
  const r = densityKgPerM3 / RHO_STAR;
  return iapwsDiluteViscosity(temperatureK) * Math.exp(r * doubleSum(H1, t, r));
}

/** Dilute-gas thermal conductivity lambda0 of IAPWS 2011, Eq. (16), W/(m K). */
export function iapwsDiluteConductivity(temperatureK: number): number {
  const t = temperatureK / T_STAR;
  let sum = 0;
  for (let k = 0; k < L0.length; k++) sum += L0[k] / t ** k;
  return (Math.sqrt(t) / sum) * 1e-3;
}

/** Temperature of the reference isotherm of the critical enhancements, K (T_R = 1.5 T*). */
export const IAPWS_REFERENCE_TEMPERATURE_K = 1.5 * T_STAR;

/**
 * Correlation length xi (nm) of the critical enhancements, R12-08 Eqs. (21) and (22) and R15-11
 * Eqs. (19) and (20) (the same form and constants: xi0 = 0.13 nm, Gamma0 = 0.06, nu = 0.630,
 * gamma = 1.239); 0 where Delta chi <= 0.
 *
 * @param dRhodPAtT (d rho/d P)_T at the state, (kg/m3)/Pa, from IAPWS-95.
 * @param dRhodPAtReference (d rho/d P)_T at the same density and T_R = 1.5 T*, (kg/m3)/Pa.
 */
export function iapwsCorrelationLengthNm(
  temperatureK: number,
  densityKgPerM3: number,
  dRhodPAtT: number,
  dRhodPAtReference: number,
): number {
  const t = temperatureK / T_STAR;
  const r = densityKgPerM3 / RHO_STAR;
  const zeta = (P_STAR / RHO_STAR) * dRhodPAtT;
  const zetaR = (P_STAR / RHO_STAR) * dRhodPAtReference;
  const deltaChi = r * (zeta - (zetaR * 1.5) / t);
  if (!(deltaChi > 0)) return 0;
  return 0.13 * Math.pow(deltaChi / 0.06, 0.63 / 1.239);
}

/**
 * Critical enhancement mu2 of the viscosity, R12-08 Eqs. (13) to (20): mu2 = exp(x_mu Y) with
 * x_mu = 0.068, qC^-1 = 1.9 nm, qD^-1 = 1.1 nm, Y in two forms split at xi = 0.3817016416 nm.
 */
export function iapwsViscosityEnhancement(correlationLengthNm: number): number {
  const xi = correlationLengthNm;
  if (!(xi > 0)) return 1;
  const qc = 1 / 1.9;
  const qd = 1 / 1.1;
  const c = qc * xi;
  const d = qd * xi;
  let Y: number;
  if (xi <= 0.3817016416) {
    Y = 0.2 * c * d ** 5 * (1 - c + c * c - (765 / 504) * d * d);
  } else {
    const psi = Math.acos(1 / Math.sqrt(1 + d * d));
    const w = Math.sqrt(Math.abs((c - 1) / (c + 1))) * Math.tan(psi / 2);
    const L = c > 1 ? Math.log((1 + w) / (1 - w)) : 2 * Math.atan(Math.abs(w));
    Y =
      Math.sin(3 * psi) / 12 -
      Math.sin(2 * psi) / (4 * c) +
      ((1 - 1.25 * c * c) * Math.sin(psi)) / (c * c) -
      ((1 - 1.5 * c * c) * psi - Math.pow(Math.abs(c * c - 1), 1.5) * L) / (c * c * c);
  }
  return Math.exp(0.068 * Y);
}

/** The thermodynamic inputs of the conductivity's critical enhancement, from IAPWS-95. */
export interface WaterCriticalInputs {
  /** Isobaric heat capacity, J/(kg K). */
  readonly cpJPerKgK: number;
  /** Isochoric heat capacity, J/(kg K). */
  readonly cvJPerKgK: number;
  /** Correlation length, nm ({@link iapwsCorrelationLengthNm}). */
  readonly correlationLengthNm: number;
  /** Viscosity at the state (with its enhancement), Pa s. */
  readonly viscosityPaS: number;
}

/**
 * Critical enhancement lambda2 of IAPWS 2011, Eqs. (18) to (21), W/(m K): Lambda = 177.8514,
 * qD^-1 = 0.40 nm, Z(y) = 0 for y = qD xi below 1.2e-7.
 */
export function iapwsCriticalEnhancement(
  temperatureK: number,
  densityKgPerM3: number,
  inputs: WaterCriticalInputs,
): number {
  const t = temperatureK / T_STAR;
  const r = densityKgPerM3 / RHO_STAR;
  const y = inputs.correlationLengthNm / 0.4;
  if (!(y >= 1.2e-7)) return 0;
  const kappaInv = inputs.cvJPerKgK / inputs.cpJPerKgK;
  const Z =
    (2 / (Math.PI * y)) *
    ((1 - kappaInv) * Math.atan(y) +
      kappaInv * y -
      (1 - Math.exp(-1 / (1 / y + (y * y) / (3 * r * r)))));
  const cpBar = inputs.cpJPerKgK / R_SPECIFIC;
  const muBar = inputs.viscosityPaS / 1e-6;
  return ((177.8514 * r * cpBar * t) / muBar) * Z * 1e-3;
}

/** Thermal conductivity of IAPWS 2011 without lambda2 (lambda0 lambda1), W/(m K). */
export function iapwsBackgroundConductivity(temperatureK: number, densityKgPerM3: number): number {
  const t = temperatureK / T_STAR;
  const r = densityKgPerM3 / RHO_STAR;
  return iapwsDiluteConductivity(temperatureK) * Math.exp(r * doubleSum(L1, t, r));
}
