/**
 * Properties of a reference fluid at given temperature and density, from its own ideal part phi_0
 * and residual part phi_r, in the publication's reference state ("direct path": reproduces the
 * published tables, e.g. IAPWS-95 with u = s = 0 for the saturated liquid at the triple point).
 *
 * Relations: W. Wagner and A. Pruss, J. Phys. Chem. Ref. Data 31, 387 (2002), Table 6.3;
 * IAPWS R6-95(2018), Table 3. With reduced derivatives (X_T = tau X_tau, X_DT = delta tau X_dtau):
 *   p / (rho R T) = 1 + phir_D
 *   u / (R T) = phi0_T + phir_T,   h / (R T) = 1 + phi0_T + phir_T + phir_D
 *   s / R = phi0_T + phir_T - phi0 - phir
 *   cv / R = -(phi0_TT + phir_TT)
 *   cp / R = cv / R + (1 + phir_D - phir_DT)^2 / (1 + 2 phir_D + phir_DD)
 *   w^2 M / (R T) = 1 + 2 phir_D + phir_DD + (1 + phir_D - phir_DT)^2 / (cv / R)
 */
import { OutOfRangeError } from "../../errors.js";
import type { ResultWarning } from "../../errors.js";
import type { ReferenceState } from "../../idealgas/types.js";
import { requirePositive } from "../../validate.js";
import type { ReferenceFluid } from "./referenceFluid.js";
import { emptyReducedHelmholtz } from "./residualPart.js";

/** Options of {@link referencePropertiesTRho}. */
export interface ReferencePropertiesOptions {
  /**
   * Allow states outside the equation's extrapolation range (they are refused otherwise). States
   * outside the published validity range but inside the extrapolation range always get a warning.
   * Default false.
   */
  allowOutsideRange?: boolean;
}

/** Single-phase properties of a reference fluid, SI molar, in the fluid's own reference state. */
export interface ReferenceProperties {
  readonly componentId: string;
  readonly temperatureK: number;
  readonly densityMolPerM3: number;
  readonly densityKgPerM3: number;
  readonly pressurePa: number;
  /** Compressibility factor Z = P / (rho R T), with the equation's own R. */
  readonly Z: number;
  /** J/mol */
  readonly u: number;
  /** J/mol */
  readonly h: number;
  /** J/(mol K) */
  readonly s: number;
  /** Helmholtz energy, J/mol */
  readonly a: number;
  /** Gibbs energy, J/mol */
  readonly g: number;
  /** J/(mol K) */
  readonly cv: number;
  /** J/(mol K) */
  readonly cp: number;
  /** Speed of sound, m/s */
  readonly w: number;
  /** (dP/d rho)_T, Pa m3/mol; negative inside the spinodal (mechanically unstable). */
  readonly dPdRho: number;
  /** Molar mass, kg/mol (divide molar quantities by it for per-kg values). */
  readonly molarMassKgPerMol: number;
  readonly referenceState: ReferenceState;
  readonly model: string;
  readonly warnings: readonly ResultWarning[];
}

/**
 * All properties of a reference fluid at temperature T (K) and molar density rho (mol/m3),
 * in the fluid's published reference state.
 *
 * @example
 * ```ts
 * const p = referencePropertiesTRho(referenceFluid("water"), 500, 838.025 / 0.018015268);
 * p.pressurePa; // 10000385.8... (IAPWS R6-95 Table 7: 0.100003858e2 MPa)
 * ```
 * @throws InputError for a non-positive or non-finite T or rho.
 * @throws OutOfRangeError outside the extrapolation range unless `allowOutsideRange`.
 */
export function referencePropertiesTRho(
  fluid: ReferenceFluid,
  temperatureK: number,
  densityMolPerM3: number,
  options: ReferencePropertiesOptions = {},
): ReferenceProperties {
  requirePositive("temperatureK", temperatureK, "K");
  requirePositive("densityMolPerM3", densityMolPerM3, "mol/m3");
  const R = fluid.gasConstant;
  const M = fluid.molarMassKgPerMol;
  const tau = fluid.reducing.temperatureK / temperatureK;
  const delta = densityMolPerM3 / fluid.reducing.densityMolPerM3;
  const r = fluid.residualReduced(tau, delta, emptyReducedHelmholtz());
  const o = fluid.idealReduced(tau, delta, emptyReducedHelmholtz());
  const RT = R * temperatureK;
  const Z = 1 + r.fD;
  const pressurePa = densityMolPerM3 * RT * Z;
  const warnings: ResultWarning[] = [];
  const status = fluid.validityStatus(temperatureK, pressurePa);
  if (status === "outside" && !options.allowOutsideRange) {
    throw new OutOfRangeError({
      input: "state (temperatureK, densityMolPerM3)",
      unit: "K, mol/m3",
      validRange: fluid.validityDescription,
      received: { temperatureK, densityMolPerM3, pressurePa },
      hint: "pass { allowOutsideRange: true } to evaluate the equation there anyway",
    });
  }
  if (status !== "inside")
    warnings.push(...(fluid.checkValidity?.(temperatureK, densityMolPerM3, [1]) ?? []));
  const cvR = -(o.fTT + r.fTT);
  const dpdrhoR = 1 + 2 * r.fD + r.fDD;
  const q = 1 + r.fD - r.fDT;
  const uRT = o.fT + r.fT;
  const sR = o.fT + r.fT - o.f - r.f;
  const w2 = ((dpdrhoR + (q * q) / cvR) * RT) / M;
  return {
    componentId: fluid.data.id,
    temperatureK,
    densityMolPerM3,
    densityKgPerM3: densityMolPerM3 * M,
    pressurePa,
    Z,
    u: uRT * RT,
    h: (uRT + Z) * RT,
    s: sR * R,
    a: (o.f + r.f) * RT,
    g: (o.f + r.f + Z) * RT,
    cv: cvR * R,
    cp: (cvR + (q * q) / dpdrhoR) * R,
    w: w2 > 0 ? Math.sqrt(w2) : NaN,
    dPdRho: RT * dpdrhoR,
    molarMassKgPerMol: M,
    referenceState: fluid.referenceState,
    model: fluid.data.name,
    warnings,
  };
}
