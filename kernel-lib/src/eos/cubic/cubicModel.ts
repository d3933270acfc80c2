/**
 * One implementation for every two-parameter cubic equation of state (see cubicFamilies.ts), with
 * van der Waals one-fluid mixing,
 *   a = sum_i sum_j x_i x_j sqrt(a_i a_j) (1 - k_ij),   b = sum_i x_i b_i,
 * and its residual Helmholtz energy in closed form. With eps = b rho, D_k = 1 + delta_k eps and
 * F(T) = a(T) / (b R T):
 *   alpha_r = -ln(1 - eps) - F I(eps),
 *   I(eps)  = ln(D_1 / D_2) / (delta1 - delta2)   (delta1 != delta2),   eps / (1 + delta eps) otherwise,
 *   I'      = 1 / (D_1 D_2),   I'' = -(delta1/D_1 + delta2/D_2) I',
 *   I'''    = [(delta1/D_1 + delta2/D_2)^2 + delta1^2/D_1^2 + delta2^2/D_2^2] I'.
 * (The integral of (Z - 1)/rho from zero density; e.g. Michelsen & Mollerup, Thermodynamic Models,
 * 2nd ed. 2007, chapter 3.) The composition derivative at constant T, V:
 *   d(n alpha_r)/dn_i = -ln(1-eps) + (b_i/b) eps/(1-eps)
 *                       - F [ (2 sum_j x_j a_ij / a - b_i/b) I + (b_i/b) eps I' ],
 * which reduces to alpha_r + aD for a pure fluid. Pressure roots come from the cubic in Z,
 *   Z^3 - (1 + B - uB) Z^2 + (A + wB^2 - uB - uB^2) Z - (AB + wB^2 + wB^3) = 0,
 * u = delta1 + delta2, w = delta1 delta2, A = aP/(RT)^2, B = bP/(RT), keeping roots with Z > B.
 */
import { pressureFromResidual } from "../residualRelations.js";
import { zeroResidualDraft } from "../residualDraft.js";
import { R } from "../../constants.js";
import { OutOfRangeError, type ResultWarning } from "../../errors.js";
import { monicCubicRootsInto } from "../../numerics/cubicRoots.js";
import { HyperDual } from "../../numerics/hyperDual.js";
import type { ModelWithPressure } from "../pressureFunction.js";
import type {
  ModelInfo,
  PseudoCriticalPoint,
  ResidualDerivatives,
  ResidualDerivativesDraft,
  ResidualRequest,
} from "../types.js";
import { checkModelComponents, type ModelComponent } from "../modelComponent.js";
import { resolveInteractions, type InteractionMatrix } from "../interaction/interactionTable.js";
import { alphaSlope, evaluatePsi, type PsiValues } from "./alphaFunctions.js";
import { CUBIC_FAMILIES, type CubicFamily, type CubicModelId } from "./cubicFamilies.js";

// the answer of checkValidity inside the range, shared (read-only)
const NO_WARNINGS: readonly ResultWarning[] = Object.freeze([]);

// Z roots of the current densityRoots call, reused (read out before the next call: no allocation)
const Z_ROOTS = new Float64Array(3);
// the Z-cubic's coefficients c2, c1, c0 of the current densityRootsInto call (read at once)
const Z_COEFFICIENTS = new Float64Array(3);
// densities of the current densityRoots call, copied out at once
const DENSITY_SCRATCH = new Float64Array(3);

/** Options of {@link createCubicModel}. */
export interface CubicModelOptions {
  /**
   * Binary interaction matrix k_ij (N x N, symmetric, zero diagonal). Default: the values of
   * eos/data/kij.json for this equation family, zero for pairs not listed (and reported in
   * `interactions.defaultedPairs`).
   */
  kij?: readonly (readonly number[])[];
}

/** Mixture parameters at one (T, x): a (Pa m6/mol2), its T-derivatives, b (m3/mol). */
export interface CubicMixtureParameters {
  a: number;
  /** da/dT, Pa m6/(mol2 K) */
  aT: number;
  /** d2a/dT2 */
  aTT: number;
  /** m3/mol */
  b: number;
}

/** A cubic equation of state bound to its components: a ResidualModel plus its parameters. */
export interface CubicModel extends ModelWithPressure {
  readonly family: CubicFamily;
  readonly components: readonly ModelComponent[];
  /** The k_ij used, with the source of every pair. */
  readonly interactions: InteractionMatrix;
  /** Mixture a, da/dT, d2a/dT2 and b at (T, x) (a fresh object). */
  mixtureParameters(temperatureK: number, x: readonly number[]): CubicMixtureParameters;
}

class CubicModelImpl implements CubicModel {
  readonly info: ModelInfo;
  readonly family: CubicFamily;
  readonly components: readonly ModelComponent[];
  readonly interactions: InteractionMatrix;
  private readonly n: number;
  private readonly sqrtAc: Float64Array;
  private readonly bi: Float64Array;
  private readonly slope: Float64Array;
  private readonly tc: Float64Array;
  private readonly oneMinusK: Float64Array;
  private readonly delta1: number;
  private readonly delta2: number;
  // cache of the mixture at the last (T, x)
  private cacheT = NaN;
  private readonly cacheX: Float64Array;
  private readonly psi: Float64Array;
  private readonly dPsi: Float64Array;
  private readonly d2Psi: Float64Array;
  /** sum_j x_j a_ij at the cached state. */
  private readonly sumA: Float64Array;
  private mixA = NaN;
  private mixAT = NaN;
  private mixATT = NaN;
  private mixB = NaN;
  private readonly psiScratch: PsiValues = { psi: 0, dPsi: 0, d2Psi: 0 };
  // Soave-type alpha functions (psi = 1 + m (1 - sqrt(T / Tc))): 1 / sqrt(Tc_i) and
  // -sqrt(a_c,i) m_i / sqrt(Tc_i), so that a new T takes one square root for all components
  private readonly soaveType: boolean;
  private readonly invSqrtTc: Float64Array;
  private readonly dPsiScale: Float64Array;
  // w_ij = x_j (1 - k_ij) of the composition in cacheX (valid once cacheWValid is true): a new T
  // at the same composition (an isobar, the bench's states, a sweep's rows) reuses the products
  private readonly w: Float64Array;
  private cacheWValid = false;
  // the highest Tc among the present components of cacheX, and its index
  private cacheTcMax = 0;
  private cacheHeaviest = 0;

  constructor(
    family: CubicFamily,
    components: readonly ModelComponent[],
    options: CubicModelOptions,
  ) {
    checkModelComponents(components);
    this.family = family;
    this.components = components;
    const n = components.length;
    this.n = n;
    const ids = components.map((c) => c.id);
    this.info = { id: family.id, name: family.name, citation: family.citation, componentIds: ids };
    this.interactions = resolveInteractions(ids, family.interactionFamily, options.kij);
    this.sqrtAc = new Float64Array(n);
    this.bi = new Float64Array(n);
    this.slope = new Float64Array(n);
    this.tc = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const c = components[i];
      const Tc = c.criticalTemperatureK;
      const Pc = c.criticalPressurePa;
      this.sqrtAc[i] = Math.sqrt((family.omegaA * R * R * Tc * Tc) / Pc);
      this.bi[i] = (family.omegaB * R * Tc) / Pc;
      this.slope[i] = alphaSlope(family.alpha, c.acentricFactor);
      this.tc[i] = Tc;
    }
    const kind = family.alpha;
    this.soaveType =
      kind === "soave" || kind === "peng-robinson-1976" || kind === "peng-robinson-1978";
    this.invSqrtTc = new Float64Array(n);
    this.dPsiScale = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      this.invSqrtTc[i] = 1 / Math.sqrt(this.tc[i]);
      this.dPsiScale[i] = -this.sqrtAc[i] * this.slope[i] * this.invSqrtTc[i];
    }
    this.w = new Float64Array(n * n);
    this.oneMinusK = new Float64Array(n * n);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) this.oneMinusK[i * n + j] = 1 - this.interactions.kij[i][j];
    }
    this.delta1 = family.delta1;
    this.delta2 = family.delta2;
    this.cacheX = new Float64Array(n);
    this.psi = new Float64Array(n);
    this.dPsi = new Float64Array(n);
    this.d2Psi = new Float64Array(n);
    this.sumA = new Float64Array(n);
    this.scratchC0 = new Float64Array(n);
    this.scratchC1 = new Float64Array(n);
    this.attractionX = new Float64Array(n);
  }

  /** Fills the cache for (T, x) unless it already holds it. */
  private update(T: number, x: readonly number[]): void {
    // the hit (every call after the first of a state) in a function small enough to be inlined
    if (T === this.cacheT && this.cacheWValid && this.sameComposition(x)) return;
    this.refresh(T, x);
  }

  /** Whether x is the composition of the cache (entry by entry). */
  private sameComposition(x: readonly number[]): boolean {
    for (let i = 0; i < this.n; i++) if (x[i] !== this.cacheX[i]) return false;
    return true;
  }

  /** The cache for (T, x): alpha functions when T changed, mixing sums always. */
  private refresh(T: number, x: readonly number[]): void {
    const n = this.n;
    const sameX = this.cacheWValid && this.sameComposition(x);
    // the temperature part (alpha functions) only when T changed: a flash or a stability test
    // calls at one T with many compositions
    if (T !== this.cacheT) {
      const psi = this.psi;
      const dPsi = this.dPsi;
      const d2Psi = this.d2Psi;
      if (this.soaveType) {
        // psi = s (1 + m (1 - sqrt(T) / sqrt(Tc))), dpsi/dT = -s m / (2 sqrt(T Tc)),
        // d2psi/dT2 = -(dpsi/dT) / (2 T): one square root and two divisions per temperature
        // (evaluatePsi's sqrt(T / Tc) and sqrt(T Tc) per component agree to a few ulp;
        // tests/unit/eos/cubicMixtureParameters.test.ts)
        const sqrtT = Math.sqrt(T);
        const halfInvSqrtT = 0.5 / sqrtT;
        const minusHalfInvT = -0.5 / T;
        for (let i = 0; i < n; i++) {
          psi[i] = this.sqrtAc[i] * (1 + this.slope[i] * (1 - sqrtT * this.invSqrtTc[i]));
          const d = this.dPsiScale[i] * halfInvSqrtT;
          dPsi[i] = d;
          d2Psi[i] = d * minusHalfInvT;
        }
      } else {
        const kind = this.family.alpha;
        const out = this.psiScratch;
        for (let i = 0; i < n; i++) {
          evaluatePsi(kind, this.slope[i], T, this.tc[i], out);
          const s = this.sqrtAc[i];
          psi[i] = s * out.psi;
          dPsi[i] = s * out.dPsi;
          d2Psi[i] = s * out.d2Psi;
        }
      }
    }
    const w = this.w;
    if (!sameX) {
      for (let i = 0; i < n; i++) this.cacheX[i] = x[i];
      for (let i = 0; i < n; i++) {
        const row = i * n;
        for (let j = 0; j < n; j++) w[row + j] = x[j] * this.oneMinusK[row + j];
      }
      // the present component of highest Tc (rangeWarnings)
      let tcMax = 0;
      let heaviest = 0;
      for (let i = 0; i < n; i++) {
        if (x[i] > 0 && this.tc[i] > tcMax) {
          tcMax = this.tc[i];
          heaviest = i;
        }
      }
      this.cacheTcMax = tcMax;
      this.cacheHeaviest = heaviest;
      this.cacheWValid = true;
    }
    let a = 0;
    let aT = 0;
    let aTT = 0;
    let b = 0;
    for (let i = 0; i < n; i++) {
      const xi = this.cacheX[i];
      b += xi * this.bi[i];
      let sA = 0;
      let sT = 0;
      const row = i * n;
      for (let j = 0; j < n; j++) {
        const wij = w[row + j];
        sA += wij * this.psi[j];
        sT += wij * this.dPsi[j];
      }
      // a_ij = s_i s_j (1-k_ij), s = sqrt(a_c) psi
      this.sumA[i] = this.psi[i] * sA;
      a += xi * this.psi[i] * sA;
      aT += 2 * xi * this.dPsi[i] * sA;
      aTT += 2 * xi * (this.d2Psi[i] * sA + this.dPsi[i] * sT);
    }
    this.mixA = a;
    this.mixAT = aT;
    this.mixATT = aTT;
    this.mixB = b;
    this.cacheT = T;
  }

  /**
   * P(T, rho, x) written directly from the equation with hyper-dual arithmetic (independent of the
   * closed-form alpha_r above; the numeric departure route integrates it):
   *   P = rho R T / (1 - b rho) - a(T) rho^2 / ((1 + delta1 b rho)(1 + delta2 b rho)),
   *   a(T) = sum_i sum_j x_i x_j (1 - k_ij) s_i s_j,  s_i = sqrt(a_c,i) psi_i(T).
   * The integrator seeds either T or rho (pressureEvaluator.ts), so the variable that carries no
   * derivative parts is handled as a plain number: fewer hyper-dual temporaries per call.
   */
  readonly pressureFunction = (T: HyperDual, rho: HyperDual, x: readonly number[]): HyperDual => {
    const b = this.mixtureB(x);
    const a = this.cachedAttraction(T, x);
    if (rho.isConstant()) {
      // rho a plain number: P = T [rho R / (1 - b rho)] - a [rho^2 / (D1 D2)]
      const r = rho.re;
      const repulsiveOverT = (r * R) / (1 - b * r);
      const attractiveOverA = (r * r) / ((1 + this.delta1 * b * r) * (1 + this.delta2 * b * r));
      // T.mul(repulsiveOverT).sub(a.mul(attractiveOverA)) part by part: the same products and
      // differences, one object instead of three
      return new HyperDual(
        T.re * repulsiveOverT - a.re * attractiveOverA,
        T.e1 * repulsiveOverT - a.e1 * attractiveOverA,
        T.e2 * repulsiveOverT - a.e2 * attractiveOverA,
        T.e12 * repulsiveOverT - a.e12 * attractiveOverA,
      );
    }
    const repulsive = rho.mul(R).mul(T).div(rho.mul(-b).add(1));
    const d1 = rho.mul(this.delta1 * b).add(1);
    const d2 = rho.mul(this.delta2 * b).add(1);
    return repulsive.sub(a.mul(rho).mul(rho).div(d1.mul(d2)));
  };

  // a(T) of the last pressure-function call and its arguments: along an isotherm (the numeric
  // departure integration) every node has the same T and x, so a(T) and its T-derivatives are
  // formed once per isotherm. Returned as is (HyperDual is immutable), so the numbers are those
  // of a fresh evaluation.
  private attractionT: HyperDual | undefined;
  private attractionValue: HyperDual | undefined;
  private readonly attractionX: Float64Array;

  /** a(T, x) of the pressure function, from the one-entry cache when T and x are the same. */
  private cachedAttraction(T: HyperDual, x: readonly number[]): HyperDual {
    const last = this.attractionT;
    const n = x.length;
    if (
      last !== undefined &&
      n === this.n &&
      last.re === T.re &&
      last.e1 === T.e1 &&
      last.e2 === T.e2 &&
      last.e12 === T.e12
    ) {
      let same = true;
      for (let i = 0; i < n; i++) {
        if (this.attractionX[i] !== x[i]) {
          same = false;
          break;
        }
      }
      if (same) return this.attractionValue!;
    }
    const a = T.isConstant()
      ? HyperDual.constant(this.plainAttraction(T.re, x))
      : this.attraction(T, x);
    // kept only for x with one entry per component (the model's own length)
    if (n === this.n) {
      for (let i = 0; i < n; i++) this.attractionX[i] = x[i];
      this.attractionT = T;
      this.attractionValue = a;
    }
    return a;
  }

  /** b = sum_i x_i b_i, m3/mol (pressure function). */
  private mixtureB(x: readonly number[]): number {
    let b = 0;
    for (let i = 0; i < this.n; i++) b += x[i] * this.bi[i];
    return b;
  }

  /** s_i = sqrt(a_c,i) psi_i(T) at a plain temperature (pressure function, T not seeded). */
  private plainS(T: number, i: number): number {
    const kind = this.family.alpha;
    if (kind === "constant") return this.sqrtAc[i];
    if (kind === "redlich-kwong") return this.sqrtAc[i] * Math.pow(T / this.tc[i], -0.25);
    return this.sqrtAc[i] * (1 + this.slope[i] * (1 - Math.sqrt(T / this.tc[i])));
  }

  /** a(T) of the one-fluid rule at a plain temperature, Pa m6/mol2 (pressure function). */
  private plainAttraction(T: number, x: readonly number[]): number {
    const n = this.n;
    let a = 0;
    for (let i = 0; i < n; i++) {
      let row = 0;
      for (let j = 0; j < n; j++) row += x[j] * this.oneMinusK[i * n + j] * this.plainS(T, j);
      a += x[i] * this.plainS(T, i) * row;
    }
    return a;
  }

  /**
   * a(T) of the one-fluid rule with T hyper-dual (pressure function). s_i is linear in sqrt(T)
   * (psi = 1 + m - (m / sqrt(Tc)) sqrt(T)) or in T^(-1/4) (Redlich-Kwong), so one hyper-dual power
   * of T serves every component; the row sums sum_j x_j (1 - k_ij) s_j are linear and are summed
   * part by part, leaving one hyper-dual product per component.
   */
  private attraction(T: HyperDual, x: readonly number[]): HyperDual {
    const n = this.n;
    const kind = this.family.alpha;
    if (kind === "constant") return HyperDual.constant(this.plainAttraction(T.re, x));
    const power = kind === "redlich-kwong" ? T.pow(-0.25) : T.sqrt();
    // s_j = c0_j + c1_j * power
    const c0 = this.scratchC0;
    const c1 = this.scratchC1;
    for (let j = 0; j < n; j++) {
      const sAc = this.sqrtAc[j];
      if (kind === "redlich-kwong") {
        c0[j] = 0;
        c1[j] = sAc * Math.pow(this.tc[j], 0.25);
      } else {
        c0[j] = sAc * (1 + this.slope[j]);
        c1[j] = (-sAc * this.slope[j]) / Math.sqrt(this.tc[j]);
      }
    }
    let aRe = 0;
    let aE1 = 0;
    let aE2 = 0;
    let aE12 = 0;
    for (let i = 0; i < n; i++) {
      // row_i = sum_j w_ij s_j = (sum_j w_ij c0_j) + (sum_j w_ij c1_j) power
      let r0 = 0;
      let r1 = 0;
      for (let j = 0; j < n; j++) {
        const w = x[j] * this.oneMinusK[i * n + j];
        r0 += w * c0[j];
        r1 += w * c1[j];
      }
      const si = power.mul(c1[i]).add(c0[i]);
      const term = si.mul(power.mul(r1).add(r0)).mul(x[i]);
      aRe += term.re;
      aE1 += term.e1;
      aE2 += term.e2;
      aE12 += term.e12;
    }
    return new HyperDual(aRe, aE1, aE2, aE12);
  }

  // per-component coefficients of s_j in the hyper-dual power of T (scratch, no allocation per call)
  private readonly scratchC0: Float64Array;
  private readonly scratchC1: Float64Array;

  mixtureParameters(temperatureK: number, x: readonly number[]): CubicMixtureParameters {
    this.update(temperatureK, x);
    return { a: this.mixA, aT: this.mixAT, aTT: this.mixATT, b: this.mixB };
  }

  residual(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
    request?: ResidualRequest,
  ): ResidualDerivatives {
    // one object shape whether or not dnA is requested
    const result = zeroResidualDraft();
    if (request?.composition) {
      const dnA = new Array<number>(this.n);
      this.residualWithCompositionInto(temperatureK, densityMolPerM3, x, result, dnA);
      result.dnA = dnA;
    } else {
      this.residualInto(temperatureK, densityMolPerM3, x, result);
      // T d(aDD)/dT: in aDD = q^2 - F eps^2 I'' only F depends on T, and T dF/dT = TF
      result.aDDT = -this.lastTF * this.lastEps2I2;
    }
    return result;
  }

  /**
   * {@link residual} with composition derivatives written into `out` and `dnA` (no allocation:
   * the state layer's (T, P) path); residual() itself runs through here, so the same numbers.
   */
  residualWithCompositionInto(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
    out: ResidualDerivativesDraft,
    dnA: number[],
  ): void {
    this.residualInto(temperatureK, densityMolPerM3, x, out);
    // T d(aDD)/dT: in aDD = q^2 - F eps^2 I'' only F depends on T, and T dF/dT = TF
    out.aDDT = -this.lastTF * this.lastEps2I2;
    const n = this.n;
    const a = this.mixA;
    const b = this.mixB;
    const eps = b * densityMolPerM3;
    const F = a / (b * R * temperatureK);
    const I = this.lastI;
    const I1 = this.lastI1;
    const logTerm = this.lastLogTerm;
    const q = eps / (1 - eps);
    for (let i = 0; i < n; i++) {
      const bRatio = this.bi[i] / b;
      dnA[i] =
        logTerm + bRatio * q - F * ((2 * this.sumA[i]) / a - bRatio) * I - F * bRatio * eps * I1;
    }
  }

  // I, I' and -ln(1 - eps) of the last residualInto call (read by residual() at once)
  private lastI = NaN;
  private lastI1 = NaN;
  private lastLogTerm = NaN;
  // T dF/dT and eps^2 I'' of the last residualInto call (for aDDT in residual())
  private lastTF = NaN;
  private lastEps2I2 = NaN;

  /**
   * The derivatives of {@link residual} without composition derivatives, written into `out` (no
   * allocation: the sweeps' hot path). The same arithmetic as residual(), so the same numbers.
   */
  residualInto(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
    out: ResidualDerivativesDraft,
  ): void {
    const T = temperatureK;
    this.update(T, x);
    const a = this.mixA;
    const b = this.mixB;
    const eps = b * densityMolPerM3;
    if (!(eps < 1)) {
      throw new OutOfRangeError({
        input: "densityMolPerM3",
        unit: "mol/m3",
        validRange: `below the close-packing limit 1/b = ${1 / b} mol/m3 of ${this.info.name}`,
        received: densityMolPerM3,
      });
    }
    const d1 = this.delta1;
    const d2 = this.delta2;
    const D1 = 1 + d1 * eps;
    const D2 = 1 + d2 * eps;
    const I = d1 === d2 ? eps / D1 : Math.log(D1 / D2) / (d1 - d2);
    const I1 = 1 / (D1 * D2);
    const g1 = d1 / D1 + d2 / D2;
    const I2 = -g1 * I1;
    const I3 = (g1 * g1 + (d1 * d1) / (D1 * D1) + (d2 * d2) / (D2 * D2)) * I1;
    const bRT = b * R * T;
    const F = a / bRT;
    const TF = (T * this.mixAT - a) / bRT;
    const TTF = (T * T * this.mixATT - 2 * T * this.mixAT + 2 * a) / bRT;
    const oneMinusEps = 1 - eps;
    const logTerm = -Math.log1p(-eps);
    const q = eps / oneMinusEps;
    this.lastI = I;
    this.lastI1 = I1;
    this.lastLogTerm = logTerm;
    this.lastTF = TF;
    this.lastEps2I2 = eps * eps * I2;
    out.a = logTerm - F * I;
    out.aD = q - F * eps * I1;
    out.aDD = q * q - F * eps * eps * I2;
    out.aT = -TF * I;
    out.aTT = -TTF * I;
    out.aDT = -TF * eps * I1;
    out.aDDD = 2 * q * q * q - F * eps * eps * eps * I3;
  }

  /**
   * Closed-form second derivatives of F = n alpha_r for one mole (state/fugacity.ts says what each
   * is), from M. L. Michelsen and J. M. Mollerup, Thermodynamic Models: Fundamentals and
   * Computational Aspects, 2nd ed. (2007), ch. 3: F = -n g(V, B) - (D(T)/T) f(V, B) with
   * g = ln(1 - B/V), f = ln((V + delta1 B)/(V + delta2 B)) / (R B (delta1 - delta2)),
   * B = sum n_i b_i, D = sum sum n_i n_j a_ij, and
   *   F_ij = F_nB (B_i + B_j) + F_BB B_i B_j + F_BD (B_i D_j + B_j D_i) + F_D D_ij,
   *   F_iT = F_BT B_i + F_DT D_i + F_D D_iT,   rho dF_i/drho = -V (F_nV + F_BV B_i + F_DV D_i).
   */
  compositionHessian(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
  ): { nFij: number[][]; FiT: number[]; rhoDdnA: number[] } {
    const T = temperatureK;
    this.update(T, x);
    const n = this.n;
    const V = 1 / densityMolPerM3;
    const B = this.mixB;
    const D = this.mixA;
    const DT = this.mixAT;
    const d1 = this.delta1;
    const d2 = this.delta2;
    const E1 = V + d1 * B;
    const E2 = V + d2 * B;
    const f = d1 === d2 ? 1 / (R * E1) : Math.log(E1 / E2) / (R * B * (d1 - d2));
    const fV = -1 / (R * E1 * E2);
    const fB = -(f + V * fV) / B;
    const fVB = ((d1 + d2) * V + 2 * d1 * d2 * B) / (R * E1 * E1 * E2 * E2);
    const fBB = -(2 * fB + V * fVB) / B;
    const VmB = V - B;
    const gV = B / (V * VmB);
    const gB = -1 / VmB;
    const gBB = -1 / (VmB * VmB);
    const gBV = 1 / (VmB * VmB);
    const FnB = -gB;
    const FnV = -gV;
    const FBB = -gBB - (D / T) * fBB;
    const FBV = -gBV - (D / T) * fVB;
    const FBD = -fB / T;
    const FD = -f / T;
    const FDV = -fV / T;
    const FBT = -fB * (DT / T - D / (T * T));
    const FDT = f / (T * T);
    const Di = new Array<number>(n);
    const DiT = new Array<number>(n);
    for (let i = 0; i < n; i++) {
      let sT = 0;
      for (let j = 0; j < n; j++) {
        sT +=
          x[j] *
          this.oneMinusK[i * n + j] *
          (this.dPsi[i] * this.psi[j] + this.psi[i] * this.dPsi[j]);
      }
      Di[i] = 2 * this.sumA[i];
      DiT[i] = 2 * sT;
    }
    const nFij: number[][] = [];
    const FiT = new Array<number>(n);
    const rhoDdnA = new Array<number>(n);
    for (let i = 0; i < n; i++) {
      const bi = this.bi[i];
      const row = new Array<number>(n);
      for (let j = 0; j < n; j++) {
        const bj = this.bi[j];
        const Dij = 2 * this.psi[i] * this.psi[j] * this.oneMinusK[i * n + j];
        row[j] = FnB * (bi + bj) + FBB * bi * bj + FBD * (bi * Di[j] + bj * Di[i]) + FD * Dij;
      }
      nFij.push(row);
      FiT[i] = FBT * bi + FDT * Di[i] + FD * DiT[i];
      rhoDdnA[i] = -V * (FnV + FBV * bi + FDV * Di[i]);
    }
    return { nFij, FiT, rhoDdnA };
  }

  maxDensity(temperatureK: number, x: readonly number[]): number {
    this.update(temperatureK, x);
    return 1 / this.mixB;
  }

  densityRoots(temperatureK: number, pressurePa: number, x: readonly number[]): number[] {
    const count = this.densityRootsInto(temperatureK, pressurePa, x, DENSITY_SCRATCH);
    const out: number[] = [];
    for (let k = 0; k < count; k++) out.push(DENSITY_SCRATCH[k]);
    return out;
  }

  /**
   * The roots of {@link densityRoots} written into `out` (ascending, mol/m3; at most 3), their
   * number returned: no allocation (the sweeps' hot path), the same numbers.
   */
  densityRootsInto(
    temperatureK: number,
    pressurePa: number,
    x: readonly number[],
    out: Float64Array,
  ): number {
    const T = temperatureK;
    this.update(T, x);
    const RT = R * T;
    const A = (this.mixA * pressurePa) / (RT * RT);
    const B = (this.mixB * pressurePa) / RT;
    const u = this.delta1 + this.delta2;
    const w = this.delta1 * this.delta2;
    const roots = Z_ROOTS;
    // the monic solver without the generic checks of realCubicRootsInto; a single real root by
    // Newton from 1 + B (no cube root; Z - B <= 1 for every root with Z > B: Z (1 - b rho) =
    // 1 - (1 - b rho) a rho / (RT D1 D2) <= 1), the sweeps' exact route the same (leanRows.ts)
    const c = Z_COEFFICIENTS;
    c[0] = -(1 + B - u * B);
    c[1] = A + w * B * B - u * B - u * B * B;
    c[2] = -(A * B + w * B * B + w * B * B * B);
    const count = monicCubicRootsInto(c, roots, 1 + B);
    let n = 0;
    // ascending Z means descending density; return densities ascending
    for (let k = count - 1; k >= 0; k--) {
      const Z = roots[k];
      if (Z > B) {
        const rho = pressurePa / (Z * RT);
        if (n === 0 || rho !== out[n - 1]) out[n++] = rho;
      }
    }
    return n;
  }

  private lastPseudo: { x: number[]; value: PseudoCriticalPoint } | undefined;

  pseudoCritical(x: readonly number[]): PseudoCriticalPoint {
    const last = this.lastPseudo;
    if (last && last.x.length === x.length) {
      let same = true;
      for (let i = 0; i < x.length; i++) if (last.x[i] !== x[i]) same = false;
      if (same) return last.value;
    }
    const value = this.computePseudoCritical(x);
    this.lastPseudo = { x: x.slice(), value };
    return value;
  }

  private computePseudoCritical(x: readonly number[]): PseudoCriticalPoint {
    let Tc = 0;
    let Pc = 0;
    for (let i = 0; i < this.n; i++) {
      Tc += x[i] * this.components[i].criticalTemperatureK;
      Pc += x[i] * this.components[i].criticalPressurePa;
    }
    return {
      temperatureK: Tc,
      pressurePa: Pc,
      densityMolPerM3: Pc / (this.family.criticalZ * R * Tc),
      rule:
        this.n === 1
          ? "critical point of the equation (Tc, Pc of the component, Zc of the equation)"
          : "Kay's rule (mole-fraction averages of Tc and Pc) with Zc of the equation",
    };
  }

  checkValidity(
    temperatureK: number,
    _rho: number,
    x: readonly number[],
  ): readonly ResultWarning[] {
    const kind = this.family.alpha;
    // psi_i at T is in the mixture cache already (the state layer asks after residual() at the
    // same T and x); the cache holds sqrt(a_c,i) psi_i, whose sign is that of psi_i
    this.update(temperatureK, x);
    let warnings = this.rangeWarnings(temperatureK, _rho, x);
    if (kind === "constant" || kind === "redlich-kwong") return warnings ?? NO_WARNINGS;
    for (let i = 0; i < this.n; i++) {
      if (!(this.psi[i] > 0)) {
        warnings ??= [];
        warnings.push({
          code: "model-limitation",
          message: `${this.components[i].id}: the Soave-type alpha function passes its minimum at T = ${temperatureK} K (Tr = ${(temperatureK / this.tc[i]).toFixed(2)}); a(T) rises again with T there, which is unphysical`,
        });
      }
    }
    return warnings ?? NO_WARNINGS;
  }

  /**
   * The stated range of the cubics (state/physicalLimits.ts gives the basis): T from 0.3 Tc of
   * the heaviest component present to 1500 K, P up to 100 MPa. Uses the mixture cache at (T, x).
   */
  private rangeWarnings(
    temperatureK: number,
    rho: number,
    x: readonly number[],
  ): ResultWarning[] | undefined {
    let warnings: ResultWarning[] | undefined;
    // the present component of highest Tc, kept with the composition in the cache (checkValidity
    // has updated it for x)
    const tcMax = this.cacheTcMax;
    const heaviest = this.cacheHeaviest;
    if (temperatureK < 0.3 * tcMax || temperatureK > CUBIC_MAX_TEMPERATURE_K) {
      warnings = [
        {
          code: "outside-validity",
          message: `T = ${temperatureK} K is outside the stated range of ${this.family.name} (from 0.3 Tc of ${this.components[heaviest].id} = ${(0.3 * tcMax).toPrecision(4)} K to ${CUBIC_MAX_TEMPERATURE_K} K): its alpha function was fitted to vapour pressures at reduced temperatures 0.4 to 1`,
        },
      ];
    }
    // rho R T / (1 - b rho) bounds P from above (the attractive term is not negative), so the
    // exact pressure is needed only for dense states
    const repulsive = (rho * R * temperatureK) / (1 - this.mixB * rho);
    const pressurePa =
      repulsive > CUBIC_MAX_PRESSURE_PA
        ? pressureFromResidual(temperatureK, rho, this.residual(temperatureK, rho, x).aD, R)
        : repulsive;
    if (pressurePa > CUBIC_MAX_PRESSURE_PA) {
      warnings ??= [];
      warnings.push({
        code: "outside-validity",
        message: `P = ${pressurePa.toPrecision(6)} Pa is above the stated range of ${this.family.name} (up to 100 MPa): cubic equations are fitted to vapour pressures and are not meant for such pressures`,
      });
    }
    return warnings;
  }
}

/** Highest temperature of the cubics' stated range, K (state/physicalLimits.ts). */
const CUBIC_MAX_TEMPERATURE_K = 1500;
/** Highest pressure of the cubics' stated range, Pa (state/physicalLimits.ts). */
const CUBIC_MAX_PRESSURE_PA = 1e8;

/**
 * Builds a cubic equation of state for these components.
 *
 * @example
 * ```ts
 * const pr = createCubicModel("peng-robinson", [getComponent("methane")]);
 * pr.residual(300, 1000, [1]).aD; // Z - 1 at 300 K and 1000 mol/m3
 * ```
 */
export function createCubicModel(
  id: CubicModelId,
  components: readonly ModelComponent[],
  options: CubicModelOptions = {},
): CubicModel {
  return new CubicModelImpl(CUBIC_FAMILIES[id], components, options);
}
