/**
 * Viscosity and thermal conductivity of gases and dense fluids by the method of Chung, Ajlan, Lee
 * and Starling (1988), Ind. Eng. Chem. Res. 27, 671-679, with its dilute-gas limit of Chung, Lee
 * and Starling (1984), Ind. Eng. Chem. Fundam. 23, 8-13; equations as written in Poling,
 * Prausnitz and O'Connell (2001), The Properties of Gases and Liquids, 5th ed., McGraw-Hill,
 * Eqs. 9-4.10 to 9-4.12 (dilute viscosity), 9-5.24 to 9-5.44 (mixing rules), 9-6.18 to 9-6.23 with
 * Table 9-6 (dense viscosity), 10-3.14 (dilute conductivity) and 10-5.5 to 10-5.7 with Table 10-5
 * (dense conductivity). Coefficients from memory of those tables (not re-checked against print).
 *
 * Dilute gas (Chung et al. 1984):
 *   eta0 = 40.785 Fc sqrt(M T) / (Vc^(2/3) Omega_v)            [micropoise; M g/mol, Vc cm3/mol]
 *   Omega_v: Neufeld, Janzen and Aziz (1972), J. Chem. Phys. 57, 1100, at T* = 1.2593 T/Tc
 *     (the three-term form of Poling Eq. 9-4.3; Neufeld's small sine term is left out)
 *   Fc = 1 - 0.2756 omega + 0.059035 mu_r^4 + kappa,  mu_r = 131.3 mu / sqrt(Vc Tc)  [debye]
 * Dense fluid (Chung et al. 1988), y = rho Vc / 6:
 *   eta = 36.344 sqrt(M Tc) / Vc^(2/3) * [ sqrt(T*) / Omega_v Fc (1/G2 + E6 y) + eta** ]
 *   G1 = (1 - y/2) / (1 - y)^3
 *   G2 = { E1 [1 - exp(-E4 y)] / y + E2 G1 exp(E5 y) + E3 G1 } / (E1 E4 + E2 + E3)
 *   eta** = E7 y^2 G2 exp(E8 + E9 / T* + E10 / T*^2),  E_i = a_i + b_i omega + c_i mu_r^4 + d_i kappa
 *   lambda = 31.2 eta0 Psi / M' (1/H2 + B6 y) + q B7 y^2 sqrt(Tr) H2     [W/(m K); eta0 Pa s,
 *     M' kg/mol], H2 the G2 form with the B_i, q = 3.586e-3 sqrt(Tc / M') / Vc^(2/3),
 *   Psi = 1 + alpha (0.215 + 0.28288 alpha - 1.061 beta + 0.26665 Z) / (0.6366 + beta Z + 1.061 alpha beta)
 *   alpha = cv0/R - 3/2, beta = 0.7862 - 0.7109 omega + 1.3168 omega^2, Z = 2 + 10.5 Tr^2.
 * As y -> 0 both reduce to the dilute-gas values (G2 -> 1); the dilute conductivity is
 * lambda0 = 3.75 Psi eta0 R / M' (31.2 = 3.75 R).
 *
 * Mixtures (Chung et al. 1988; Poling Eqs. 9-5.24 to 9-5.44): sigma_i = 0.809 Vc_i^(1/3),
 * eps_i/k = Tc_i / 1.2593, combining rules sigma_ij = sqrt(sigma_i sigma_j), eps_ij =
 * sqrt(eps_i eps_j) (binary parameters 1), omega_ij and M_ij = 2 M_i M_j / (M_i + M_j), kappa_ij =
 * sqrt(kappa_i kappa_j); one-fluid sums for sigma_m^3, (eps/k)_m, M_m, omega_m, mu_m^4, kappa_m;
 * then Vc_m = (sigma_m / 0.809)^3, Tc_m = 1.2593 (eps/k)_m. The mixture's ideal-gas cv0 is the
 * mole-fraction average.
 *
 * Stated accuracy (from memory of Poling et al. 2001, sections 9-4, 9-6, 10-3 and 10-5, and of
 * Chung et al. 1988): dilute-gas viscosity of nonpolar gases about 1-2 % (polar gases a few %);
 * dense-fluid viscosity typically within about 5-10 %, worse for liquids well below the critical
 * temperature (errors of 20 % and more at Tr below about 0.6, where liquid-specific methods are
 * better); dilute-gas thermal conductivity about 5 %; dense-fluid thermal conductivity typically
 * within about 5-10 %. Not for the near-critical enhancement of conductivity, which the method
 * does not contain. Polar gases fare worse in conductivity: water vapour at 500 K comes out 33 %
 * above IAPWS 2011 (this project's comparison), one reason water bound to IAPWS-95 gets the IAPWS
 * formulations instead.
 *
 * Checked (tests/unit/transport/chung.test.ts): nitrogen against Lemmon and Jacobsen (2004) within
 * 4 % (dilute, dense gas) and 11-14 % (liquid at 100 K); nitrogen, methane, carbon dioxide and air
 * at 300 K and 1 bar against the CRC Handbook within 1.5 %; liquid n-hexane at 25 degC within 3 %;
 * liquid methane at its boiling point within 8 %; liquid CO2 at 0 degC (viscosity) within 1 %;
 * sulfur dioxide gas at 40 degC (a polar gas, Poling et al. section 9-4 example) within 1 %.
 */

/** The constants of one component that Chung's method uses (SI, dipole in debye). */
export interface ChungComponent {
  /** K */
  readonly criticalTemperatureK: number;
  /** m3/mol */
  readonly criticalVolumeM3PerMol: number;
  /** kg/mol */
  readonly molarMassKgPerMol: number;
  readonly acentricFactor: number;
  /** debye */
  readonly dipoleDebye: number;
  /** Chung's association factor kappa, dimensionless. */
  readonly association: number;
}

/** The one-fluid (pseudo-pure) parameters of a mixture in Chung's units. */
export interface ChungParameters {
  /** K */
  readonly criticalTemperatureK: number;
  /** cm3/mol */
  readonly criticalVolumeCm3PerMol: number;
  /** g/mol */
  readonly molarMassGPerMol: number;
  readonly acentricFactor: number;
  /** Reduced dipole moment mu_r, dimensionless. */
  readonly reducedDipole: number;
  readonly association: number;
}

/** Gas constant in Chung's conductivity equation (31.2 = 3.75 R rounded), J/(mol K). */
const R_CHUNG = 8.314;

/**
 * Chung's mixing rules (one-fluid parameters); for one component they return its own constants.
 */
export function chungParameters(
  components: readonly ChungComponent[],
  x: readonly number[],
): ChungParameters {
  const n = components.length;
  const sigma = components.map((c) => 0.809 * Math.cbrt(c.criticalVolumeM3PerMol * 1e6));
  const eps = components.map((c) => c.criticalTemperatureK / 1.2593);
  const M = components.map((c) => c.molarMassKgPerMol * 1e3);
  let s3 = 0;
  let epsS3 = 0;
  let massSum = 0;
  let omegaS3 = 0;
  let dipole4OverS3 = 0;
  let kappa = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const xx = x[i] * x[j];
      if (xx === 0) continue;
      const sij = Math.sqrt(sigma[i] * sigma[j]);
      const sij3 = sij * sij * sij;
      const eij = Math.sqrt(eps[i] * eps[j]);
      const mij = (2 * M[i] * M[j]) / (M[i] + M[j]);
      const ci = components[i];
      const cj = components[j];
      s3 += xx * sij3;
      epsS3 += xx * eij * sij3;
      massSum += xx * eij * sij * sij * Math.sqrt(mij);
      omegaS3 += xx * 0.5 * (ci.acentricFactor + cj.acentricFactor) * sij3;
      dipole4OverS3 += (xx * ci.dipoleDebye ** 2 * cj.dipoleDebye ** 2) / sij3;
      kappa += xx * Math.sqrt(ci.association * cj.association);
    }
  }
  const sigmaM = Math.cbrt(s3);
  const epsM = epsS3 / s3;
  const molarMass = (massSum / (epsM * sigmaM * sigmaM)) ** 2;
  const Vc = (sigmaM / 0.809) ** 3;
  const Tc = 1.2593 * epsM;
  const dipoleM = Math.sqrt(Math.sqrt(s3 * dipole4OverS3));
  return {
    criticalTemperatureK: Tc,
    criticalVolumeCm3PerMol: Vc,
    molarMassGPerMol: molarMass,
    acentricFactor: omegaS3 / s3,
    reducedDipole: (131.3 * dipoleM) / Math.sqrt(Vc * Tc),
    association: kappa,
  };
}

/** Neufeld et al. (1972) collision integral Omega_v at T* (three-term form, Poling Eq. 9-4.3). */
export function collisionIntegral(reducedTemperature: number): number {
  const t = reducedTemperature;
  return (
    1.16145 * Math.pow(t, -0.14874) +
    0.52487 * Math.exp(-0.7732 * t) +
    2.16178 * Math.exp(-2.43787 * t)
  );
}

function shapeFactor(p: ChungParameters): number {
  return 1 - 0.2756 * p.acentricFactor + 0.059035 * p.reducedDipole ** 4 + p.association;
}

/** Dilute-gas viscosity of Chung et al. (1984), Pa s. */
export function chungDiluteViscosity(p: ChungParameters, temperatureK: number): number {
  const tStar = (1.2593 * temperatureK) / p.criticalTemperatureK;
  const microPoise =
    (40.785 * shapeFactor(p) * Math.sqrt(p.molarMassGPerMol * temperatureK)) /
    (Math.pow(p.criticalVolumeCm3PerMol, 2 / 3) * collisionIntegral(tStar));
  return microPoise * 1e-7;
}

// Chung et al. (1988) Table II / Poling Table 9-6: E_i = a + b omega + c mu_r^4 + d kappa
const E_COEFFICIENTS: readonly (readonly [number, number, number, number])[] = [
  [6.32402, 50.4119, -51.6801, 1189.02],
  [0.0012102, -0.0011536, -0.0062571, 0.037283],
  [5.28346, 254.209, -168.481, 3898.27],
  [6.62263, 38.0957, -8.46414, 31.4178],
  [19.7454, 7.63034, -14.3544, 31.5267],
  [-1.89992, -12.5367, 4.98529, -18.1507],
  [24.2745, 3.44945, -11.2913, 69.3466],
  [0.79716, 1.11764, 0.012348, -4.11661],
  [-0.23816, 0.067695, -0.8163, 4.02528],
  [0.068629, 0.34793, 0.59256, -0.72663],
];

// Chung et al. (1988) / Poling Table 10-5: B_i = a + b omega + c mu_r^4 + d kappa
const B_COEFFICIENTS: readonly (readonly [number, number, number, number])[] = [
  [2.4166, 0.74824, -0.91858, 121.72],
  [-0.50924, -1.5094, -49.991, 69.983],
  [6.6107, 5.6207, 64.76, 27.039],
  [14.543, -8.9139, -5.6379, 74.344],
  [0.79274, 0.82019, -0.69369, 6.3173],
  [-5.8634, 12.801, 9.5893, 65.529],
  [91.089, 128.11, -54.217, 523.81],
];

function combine(
  table: readonly (readonly [number, number, number, number])[],
  p: ChungParameters,
): number[] {
  const mu4 = p.reducedDipole ** 4;
  return table.map(([a, b, c, d]) => a + b * p.acentricFactor + c * mu4 + d * p.association);
}

/** G2 of Chung et al. (1988) with coefficients c[0..4] = (E1..E5) or (B1..B5); 1 at y = 0. */
function g2Of(c: readonly number[], y: number): number {
  const g1 = (1 - 0.5 * y) / (1 - y) ** 3;
  // E1 [1 - exp(-E4 y)] / y, written with expm1 so that y -> 0 gives E1 E4 without cancellation
  const first = y > 0 ? (-c[0] * Math.expm1(-c[3] * y)) / y : c[0] * c[3];
  return (first + c[1] * g1 * Math.exp(c[4] * y) + c[2] * g1) / (c[0] * c[3] + c[1] + c[2]);
}

/** Reduced density y = rho Vc / 6 (rho mol/m3, Vc of the parameters). */
export function chungReducedDensity(p: ChungParameters, densityMolPerM3: number): number {
  return (densityMolPerM3 * p.criticalVolumeCm3PerMol * 1e-6) / 6;
}

/** Viscosity of a gas or dense fluid by Chung et al. (1988), Pa s. */
export function chungViscosity(
  p: ChungParameters,
  temperatureK: number,
  densityMolPerM3: number,
): number {
  const E = combine(E_COEFFICIENTS, p);
  const y = chungReducedDensity(p, densityMolPerM3);
  const tStar = (1.2593 * temperatureK) / p.criticalTemperatureK;
  const G2 = g2Of(E, y);
  const etaStarStar = E[6] * y * y * G2 * Math.exp(E[7] + E[8] / tStar + E[9] / (tStar * tStar));
  const etaStar =
    (Math.sqrt(tStar) / collisionIntegral(tStar)) * shapeFactor(p) * (1 / G2 + E[5] * y) +
    etaStarStar;
  const microPoise =
    (etaStar * 36.344 * Math.sqrt(p.molarMassGPerMol * p.criticalTemperatureK)) /
    Math.pow(p.criticalVolumeCm3PerMol, 2 / 3);
  return microPoise * 1e-7;
}

/**
 * Thermal conductivity of a gas or dense fluid by Chung et al. (1988), W/(m K).
 *
 * @param idealGasCvJPerMolK the ideal-gas isochoric heat capacity of the fluid at T, J/(mol K).
 */
export function chungThermalConductivity(
  p: ChungParameters,
  temperatureK: number,
  densityMolPerM3: number,
  idealGasCvJPerMolK: number,
): number {
  const B = combine(B_COEFFICIENTS, p);
  const y = chungReducedDensity(p, densityMolPerM3);
  const Tr = temperatureK / p.criticalTemperatureK;
  const w = p.acentricFactor;
  const alpha = idealGasCvJPerMolK / R_CHUNG - 1.5;
  const beta = 0.7862 - 0.7109 * w + 1.3168 * w * w;
  const Z = 2 + 10.5 * Tr * Tr;
  const psi =
    1 +
    (alpha * (0.215 + 0.28288 * alpha - 1.061 * beta + 0.26665 * Z)) /
      (0.6366 + beta * Z + 1.061 * alpha * beta);
  const eta0 = chungDiluteViscosity(p, temperatureK);
  const mKg = p.molarMassGPerMol * 1e-3;
  const H2 = g2Of(B, y);
  const q =
    (3.586e-3 * Math.sqrt(p.criticalTemperatureK / mKg)) /
    Math.pow(p.criticalVolumeCm3PerMol, 2 / 3);
  return ((31.2 * eta0 * psi) / mKg) * (1 / H2 + B[5] * y) + q * B[6] * y * y * Math.sqrt(Tr) * H2;
}
