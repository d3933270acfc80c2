/**
 * The row kernel of (T, P) sweeps for the cubic equations of state (eos/cubic/cubicModel.ts):
 * what depends on T alone is taken once per temperature row (the check of T, the mixture's a(T),
 * da/dT, d2a/dT2 and b through the model's own mixtureParameters, the constants of the Z-cubic and
 * of alpha_r, the ideal gas of the feed), and per point only the Z-cubic
 * (numerics/cubicRoots.ts, monicCubicRootsInto), the derivatives of alpha_r at each root, the root
 * choice, the label and the property formulas run, in one loop body that writes straight into the
 * sweep's columns: no per-point objects and no plain numbers passed to functions that are not
 * inlined (each such number would be boxed on the heap).
 *
 * The same numbers as the single state, to the last bit: the coefficients of the Z-cubic and the
 * conversion of its roots to densities are those of CubicModelImpl.densityRootsInto, the
 * derivatives those of CubicModelImpl.residualInto (the same expressions in the same order, on
 * the same mixture parameters), the root choice that of state/rootChoice.ts
 * (chooseDensityRootInto: mechanically unstable roots dropped by dPdRho, then the lowest
 * g_r/RT by residualGibbsTP, the first on a tie), the pure fluid's label the rule of
 * state/phaseLabel.ts (a mixture's label is phaseLabel itself), and the properties come from
 * state/properties.ts (residualValuesInto, energyValuesInto, stateValuesInto). The sweep tests
 * (tests/unit/sweep/) compare every property, the phase kind and the error code with stateAtTP
 * point by point; a change of the cubic's arithmetic must be made in both places.
 *
 * What the kernel does not finish (a temperature or pressure outside the limits, a density at
 * close packing, no mechanically stable root) it hands back to the general path (runSweep.ts),
 * which throws the single state's typed error for that point: per-point error codes and messages
 * are those of stateValuesAtTP.
 *
 * Extents: "residual" (departures, Z, rho), "energies" (also absolute h, s, u, a, g: the ideal gas
 * of the row, no heat capacities), "all" (also cp, cv, w, jt, kappaT, beta, cpRes, cvRes).
 *
 * Precision "fast" (extents "residual" and "energies"): fastRun takes the points of a grid's row in
 * one loop (a Newton root of the Z-cubic started from the row's previous points), fastPoint one
 * point (the "pairs" layout, and what the loop's guards send back); both within the stated
 * tolerance of the single state, not to the last bit.
 */
import { R } from "../constants.js";
import type { ResidualDerivativesDraft, ResidualModel } from "../eos/types.js";
import type { CubicModel } from "../eos/cubic/cubicModel.js";
import { dPdRho, residualGibbsTP, stiffnessFromResidual } from "../eos/residualRelations.js";
import { monicCubicRootsInto } from "../numerics/cubicRoots.js";
import type { IdealGasProperties } from "../idealgas/types.js";
import type { FluidBinding, PhaseLabel } from "../state/types.js";
import {
  emptyStateValues,
  energyValuesInto,
  residualValuesInto,
  stateValuesInto,
} from "../state/properties.js";
import { idealGasAt, mixtureMolarMass } from "../state/stateAt.js";
import { checkTemperature } from "../state/checkInputs.js";
import { phaseLabel } from "../state/phaseLabel.js";
import { MAX_PRESSURE_PA, MIN_PRESSURE_PA } from "../state/physicalLimits.js";
import { SWEEP_PHASE_KINDS, PER_AMOUNT, type SweepProperty } from "./types.js";

/** What the kernel computes per point (see the header). */
export type RowExtent = "residual" | "energies" | "all";

const ENERGIES: ReadonlySet<SweepProperty> = new Set<SweepProperty>(["h", "s", "u", "a", "g"]);
const ALL: ReadonlySet<SweepProperty> = new Set<SweepProperty>([
  "cp",
  "cv",
  "w",
  "jt",
  "kappaT",
  "beta",
  "cpRes",
  "cvRes",
]);

/** The smallest extent that gives these properties. */
export function rowExtentOf(properties: readonly SweepProperty[]): RowExtent {
  if (properties.some((p) => ALL.has(p))) return "all";
  if (properties.some((p) => ENERGIES.has(p))) return "energies";
  return "residual";
}

/** Whether the row kernel serves this model: a cubic of eos/cubic (with its allocation-free members). */
export function isRowCubic(model: ResidualModel): model is ResidualModel & CubicModel {
  const m = model as Partial<CubicModel> & ResidualModel;
  return (
    typeof m.mixtureParameters === "function" &&
    typeof m.family?.delta1 === "number" &&
    typeof m.family?.delta2 === "number" &&
    typeof m.residualInto === "function" &&
    typeof m.densityRootsInto === "function"
  );
}

/**
 * The derivatives at one root: a class of its own whose fields hold doubles from the start (an
 * object literal with integer zeros shares its hidden class with every such literal, and one
 * that ever held a non-number would make each store here allocate a box).
 */
class RootDerivatives implements ResidualDerivativesDraft {
  a = NaN;
  aD = NaN;
  aDD = NaN;
  aT = NaN;
  aTT = NaN;
  aDT = NaN;
  aDDD = NaN;
  dnA = undefined;
}

// property ids of the columns (the order of SWEEP_PROPERTIES; runSweep.ts's PROPERTY_ID)
const T_ID = 0;
const P_ID = 1;
const RHO_ID = 2;
const RHO_MASS_ID = 3;
const Z_ID = 4;
const H_ID = 5;
const S_ID = 6;
const U_ID = 7;
const A_ID = 8;
const G_ID = 9;
const CP_ID = 10;
const CV_ID = 11;
const W_ID = 12;
const JT_ID = 13;
const KAPPA_ID = 14;
const BETA_ID = 15;
const H_RES_ID = 16;
const S_RES_ID = 17;
const U_RES_ID = 18;
const A_RES_ID = 19;
const G_RES_ID = 20;
const CP_RES_ID = 21;
const CV_RES_ID = 22;
const QUALITY_ID = 23;

const VAPOR = SWEEP_PHASE_KINDS.vapor;
const LIQUID = SWEEP_PHASE_KINDS.liquid;
const SUPERCRITICAL = SWEEP_PHASE_KINDS.supercritical;

/** The columns a kernel writes (index 0 is the first point of the range). */
interface Columns {
  readonly values: Float64Array[];
  readonly phaseCount: Uint8Array;
  readonly phaseKind: Uint8Array;
  readonly errorCode: Uint8Array;
}

/**
 * (T, P) points of one cubic fluid and composition in the stable root, written into columns.
 * `point(i, j, k)` for each point (positions on the plan's axes, index in the columns); false means "not done here" (nothing written; the caller takes
 * the general path for that point).
 */
export class CubicTPRows {
  private readonly model: ResidualModel & CubicModel;
  private readonly binding: FluidBinding;
  private readonly x: readonly number[];
  private readonly extent: RowExtent;
  private readonly all: boolean;
  private readonly Rg: number;
  private readonly gasConstant: number | undefined;
  private readonly M: number;
  private readonly ids: Int32Array;
  private readonly factor: Float64Array;
  private readonly cols: Float64Array[];
  private readonly phaseCount: Uint8Array;
  private readonly phaseKind: Uint8Array;
  private readonly errorCode: Uint8Array;
  private readonly d1: number;
  private readonly d2: number;
  private readonly u: number;
  private readonly w: number;
  /** Pure fluid with a (pseudo-)critical point: labels by phaseLabel's rule, inline. */
  private readonly pureLabels: boolean;
  private readonly tc: number;
  private readonly pc: number;
  private readonly rhoc: number;
  // scratch: coefficients and Z roots, densities, derivatives at the roots, the values
  private readonly temperatures: Float64Array;
  private readonly pressures: Float64Array;
  private readonly coefficients = new Float64Array(3);
  private readonly zRoots = new Float64Array(3);
  private readonly rhos = new Float64Array(3);
  private readonly ra = new RootDerivatives();
  private readonly rb = new RootDerivatives();
  private readonly v = emptyStateValues();
  private readonly ig: IdealGasProperties;
  // the current row
  private rowT = NaN;
  private rowOk = false;
  private RT = NaN;
  private RT2 = NaN;
  private mixA = NaN;
  private mixAT = NaN;
  private mixATT = NaN;
  private mixB = NaN;
  private F = NaN;
  private TF = NaN;
  private TTF = NaN;
  // the fast route (precision "fast", see fastPoint())
  private readonly fast: boolean;
  private lnPressures: Float64Array | undefined;
  private startWeights: Float64Array | undefined;
  private lnPig = NaN;
  private fastI = -1;
  private fastJ = -1;
  /** How many points of the history are known (0 to 4; Z1 and P1 the latest). */
  private fastKnown = 0;
  private fastZ1 = NaN;
  private fastP1 = NaN;
  private fastZ2 = NaN;
  private fastP2 = NaN;
  private fastZ3 = NaN;
  private fastP3 = NaN;
  private fastZ4 = NaN;
  /** fastLoop's columns by property id (undefined: not asked) and their factors. */
  private readonly fastColumns: (Float64Array | undefined)[] = [];
  private readonly fastFactors = new Float64Array(QUALITY_ID + 1).fill(1);
  /** The fast route's values by property id (only the ids of its extents are set). */
  private readonly fastValues = new Float64Array(QUALITY_ID + 1).fill(NaN);
  private fRho = NaN;
  private fAD = NaN;
  private fI = NaN;
  private fL = NaN;
  // the current point (see point())
  private pointT = NaN;
  private pointP = NaN;
  private pointRho = NaN;

  constructor(
    binding: FluidBinding,
    plan: {
      readonly x: readonly number[];
      readonly properties: readonly SweepProperty[];
      readonly propertyIds: Int32Array;
      readonly basis: "molar" | "mass";
      readonly precision?: "exact" | "fast";
      readonly firstAxis: Float64Array;
      readonly secondAxis: Float64Array;
    },
    columns: Columns,
  ) {
    const x = plan.x;
    const properties = plan.properties;
    const ids = plan.propertyIds;
    const basis = plan.basis;
    this.temperatures = plan.firstAxis;
    this.pressures = plan.secondAxis;
    const model = binding.model;
    if (!isRowCubic(model)) throw new Error("CubicTPRows: not a cubic model (isRowCubic)");
    this.model = model;
    this.binding = binding;
    this.x = x;
    this.extent = rowExtentOf(properties);
    this.all = this.extent === "all";
    this.gasConstant = model.gasConstant;
    this.Rg = model.gasConstant ?? R;
    this.M = mixtureMolarMass(binding, x);
    this.ids = ids;
    const mass = basis === "mass";
    const massScale = 1 / this.M;
    this.factor = Float64Array.from(properties, (p) => (mass && PER_AMOUNT.has(p) ? massScale : 1));
    this.cols = columns.values;
    for (let id = 0; id <= QUALITY_ID; id++) this.fastColumns.push(undefined);
    ids.forEach((id, m) => {
      this.fastColumns[id] = columns.values[m];
      this.fastFactors[id] = this.factor[m];
    });
    this.phaseCount = columns.phaseCount;
    this.phaseKind = columns.phaseKind;
    this.errorCode = columns.errorCode;
    this.d1 = model.family.delta1;
    this.d2 = model.family.delta2;
    this.u = this.d1 + this.d2;
    this.w = this.d1 * this.d2;
    const pc = x.length === 1 && model.pseudoCritical ? model.pseudoCritical(x) : undefined;
    this.pureLabels = pc !== undefined;
    // the fast formulas take the properties' gas constant equal to the densities' R
    this.fast = plan.precision === "fast" && this.extent !== "all" && this.Rg === R;
    this.tc = pc?.temperatureK ?? NaN;
    this.pc = pc?.pressurePa ?? NaN;
    this.rhoc = pc?.densityMolPerM3 ?? NaN;
    this.ig = {
      temperatureK: NaN,
      pressurePa: NaN,
      h: NaN,
      s: NaN,
      u: NaN,
      a: NaN,
      g: NaN,
      cp: NaN,
      cv: NaN,
      referenceState: binding.idealGas.referenceState,
      warnings: [],
    };
  }

  /** Takes the row constants of temperature T (K); false when T fails its check. */
  private setRow(T: number): boolean {
    this.rowT = T;
    this.rowOk = false;
    try {
      checkTemperature(T);
    } catch {
      return false;
    }
    const p = this.model.mixtureParameters(T, this.x);
    const a = p.a;
    const b = p.b;
    this.mixA = a;
    this.mixAT = p.aT;
    this.mixATT = p.aTT;
    this.mixB = b;
    // densityRootsInto's and residualInto's expressions, in their order
    const RT = R * T;
    this.RT = RT;
    this.RT2 = RT * RT;
    const bRT = b * R * T;
    this.F = a / bRT;
    this.TF = (T * p.aT - a) / bRT;
    this.TTF = (T * T * p.aTT - 2 * T * p.aT + 2 * a) / bRT;
    if (this.extent !== "residual") {
      // a copy: the state layer's cache entry is overwritten by the next temperature
      const src = idealGasAt(this.binding, T, this.x);
      const ig = this.ig as { -readonly [K in keyof IdealGasProperties]: IdealGasProperties[K] };
      ig.temperatureK = src.temperatureK;
      ig.pressurePa = src.pressurePa;
      ig.h = src.h;
      ig.s = src.s;
      ig.u = src.u;
      ig.a = src.a;
      ig.g = src.g;
      ig.cp = src.cp;
      ig.cv = src.cv;
      ig.referenceState = src.referenceState;
      ig.warnings = src.warnings;
      this.lnPig = Math.log(src.pressurePa);
    }
    this.fastI = -1;
    this.rowOk = true;
    return true;
  }

  /**
   * The point of temperature `temperatures[i]` (K) and pressure `pressures[j]` (Pa) of the plan
   * into index `k` of the columns; false (nothing written) when the general path must take it.
   * `exactOnly`: the exact route even with precision "fast" (fastLoop's last resort).
   */
  point(i: number, j: number, k: number, exactOnly = false): boolean {
    const T = this.temperatures[i];
    const P = this.pressures[j];
    if (T !== this.rowT ? !this.setRow(T) : !this.rowOk) return false;
    // checkPressure's condition (its error comes from the general path)
    if (!(P > 0 && P >= MIN_PRESSURE_PA && P <= MAX_PRESSURE_PA)) return false;
    if (this.fast && !exactOnly) {
      if (this.fastPoint(i, j, k, true)) return true;
      this.fastI = -1;
    }
    const RT = this.RT;
    const b = this.mixB;
    // the Z-cubic of densityRootsInto
    const A = (this.mixA * P) / this.RT2;
    const B = (b * P) / RT;
    const u = this.u;
    const w = this.w;
    const c = this.coefficients;
    c[0] = -(1 + B - u * B);
    c[1] = A + w * B * B - u * B - u * B * B;
    c[2] = -(A * B + w * B * B + w * B * B * B);
    const zRoots = this.zRoots;
    const count = monicCubicRootsInto(c, zRoots, 1 + B);
    const rhos = this.rhos;
    let n = 0;
    for (let m = count - 1; m >= 0; m--) {
      const Z = zRoots[m];
      if (Z > B) {
        const rho = P / (Z * RT);
        if (n === 0 || rho !== rhos[n - 1]) rhos[n++] = rho;
      }
    }
    // the choice of chooseDensityRootInto ("stable"), derivatives of residualInto
    const compareGibbs = n > 1;
    const all = this.all;
    const d1 = this.d1;
    const d2 = this.d2;
    const F = this.F;
    const TF = this.TF;
    let stable = 0;
    let index = 0;
    let rho = NaN;
    let chosen: ResidualDerivativesDraft | undefined;
    let free = this.ra;
    let best = Infinity;
    for (let m = 0; m < n; m++) {
      const r = free;
      const eps = b * rhos[m];
      if (!(eps < 1)) return false;
      const D1 = 1 + d1 * eps;
      const D2 = 1 + d2 * eps;
      const I1 = 1 / (D1 * D2);
      const g1 = d1 / D1 + d2 / D2;
      const I2 = -g1 * I1;
      const oneMinusEps = 1 - eps;
      const q = eps / oneMinusEps;
      r.aD = q - F * eps * I1;
      r.aDD = q * q - F * eps * eps * I2;
      // a mechanically unstable root is dropped before its logarithms are taken
      if (!(dPdRho(T, r, this.gasConstant) > 0)) continue;
      const I = d1 === d2 ? eps / D1 : Math.log(D1 / D2) / (d1 - d2);
      const logTerm = -Math.log1p(-eps);
      r.a = logTerm - F * I;
      r.aT = -TF * I;
      if (all) {
        const I3 = (g1 * g1 + (d1 * d1) / (D1 * D1) + (d2 * d2) / (D2 * D2)) * I1;
        r.aTT = -this.TTF * I;
        r.aDT = -TF * eps * I1;
        r.aDDD = 2 * q * q * q - F * eps * eps * eps * I3;
      }
      let take = stable === 0;
      if (compareGibbs) {
        const g = residualGibbsTP(r);
        if (stable === 0 || g < best) {
          best = g;
          take = true;
        }
      }
      if (take) {
        index = stable;
        rho = rhos[m];
        chosen = r;
        free = r === this.ra ? this.rb : this.ra;
      }
      stable++;
    }
    if (chosen === undefined) return false;
    const d = chosen;
    // the label (state/phaseLabel.ts)
    let label: PhaseLabel;
    if (stable > 1 && index === 0) label = "vapor";
    else if (stable > 1 && index === stable - 1) label = "liquid";
    else if (this.pureLabels) {
      label = T >= this.tc && P >= this.pc ? "supercritical" : rho > this.rhoc ? "liquid" : "vapor";
    } else {
      const position =
        stable === 1 ? "only" : index === 0 ? "lowest" : index === stable - 1 ? "highest" : "only";
      label = phaseLabel(this.model, T, P, rho, this.x, position, 1 + d.aD);
    }
    const v = this.v;
    const Rg = this.Rg;
    if (this.extent === "residual") {
      v.Z = 1 + d.aD;
      residualValuesInto(T, d, Rg, v);
    } else if (this.extent === "energies") {
      energyValuesInto(T, rho, d, this.ig, Rg, v, P);
    } else {
      stateValuesInto(T, rho, d, this.ig, this.M, Rg, v, P);
    }
    // through fields, not arguments: plain numbers passed to a function that is not inlined are
    // boxed on the heap
    this.pointT = T;
    this.pointP = P;
    this.pointRho = rho;
    this.write(k, label);
    return true;
  }

  /** Whether {@link fastRun} serves this plan (precision "fast" and an extent it computes). */
  get fastRuns(): boolean {
    return this.fast;
  }

  /**
   * The fast route over points j0 .. j1 - 1 of row i of a grid (pressures[j0 ..]) into the
   * columns from index k0 on: fastPoint's steps for the one root above B in one loop, with the
   * row's constants and the start's history in locals and the values written straight into the
   * columns. The start: Z of the previous points of the row extrapolated in P, through the last
   * four by a cubic with Lagrange weights taken once per pressure axis (startWeights), through
   * the last two (linear) while fewer are known; from there Newton's method with fastPoint's
   * stop (residual at rounding level) and fastPoint's guards unchanged (discriminant, the
   * deflated quadratic's roots below B, mechanical stability). A point those do not pass goes
   * to fastPoint's closed form, else to the exact route (point). Returns how many points
   * from j0 on were written; the caller takes the next one through point() (the general path:
   * a bad T or P, no stable root).
   */
  fastRun(i: number, j0: number, j1: number, k0: number): number {
    const T = this.temperatures[i];
    if (T !== this.rowT ? !this.setRow(T) : !this.rowOk) return 0;
    if (this.startWeights === undefined) this.startWeights = this.takeStartWeights();
    if (this.lnPressures === undefined) this.lnPressures = this.pressures.map(Math.log);
    return this.fastLoop(i, j0, j1, k0);
  }

  /** fastRun's loop (the row set and checked; kept apart from the row's set-up). */
  private fastLoop(i: number, j0: number, j1: number, k0: number): number {
    const T = this.temperatures[i];
    const pressures = this.pressures;
    const weights = this.startWeights!;
    const energies = this.extent === "energies";
    const lnP = this.lnPressures!;
    const RT = this.RT;
    const b = this.mixB;
    const aOverRT2 = this.mixA / this.RT2;
    const bOverRT = b / RT;
    const overB = 1 / b;
    const u = this.u;
    const w = this.w;
    const d1 = this.d1;
    const d2 = this.d2;
    const equalDeltas = d1 === d2;
    const overD12 = 1 / (d1 - d2);
    const F = this.F;
    const TF = this.TF;
    const FTF = F + TF;
    const M = this.M;
    const pure = this.pureLabels;
    const supercriticalT = T >= this.tc;
    const pc = this.pc;
    const rhoc = this.rhoc;
    const ig = this.ig;
    const igH = ig.h;
    const igU = ig.u;
    // s, a and g of the ideal gas at P: the row's value at its own pressure shifted by ln P
    const igS = ig.s + R * this.lnPig;
    const igA = ig.a - RT * this.lnPig;
    const igG = ig.g - RT * this.lnPig;
    // the asked columns (undefined: not asked) and their factors (1, or 1 / M on a mass basis)
    const out = this.fastColumns;
    const fac = this.fastFactors;
    const oT = out[T_ID];
    const oP = out[P_ID];
    const oRho = out[RHO_ID];
    const oRhoMass = out[RHO_MASS_ID];
    const oZ = out[Z_ID];
    const oH = out[H_ID];
    const oS = out[S_ID];
    const oU = out[U_ID];
    const oA = out[A_ID];
    const oG = out[G_ID];
    const oHRes = out[H_RES_ID];
    const oSRes = out[S_RES_ID];
    const oURes = out[U_RES_ID];
    const oARes = out[A_RES_ID];
    const oGRes = out[G_RES_ID];
    const oQuality = out[QUALITY_ID];
    const fH = fac[H_ID];
    const fS = fac[S_ID];
    const fU = fac[U_ID];
    const fA = fac[A_ID];
    const fG = fac[G_ID];
    const fHRes = fac[H_RES_ID];
    const fSRes = fac[S_RES_ID];
    const fURes = fac[U_RES_ID];
    const fARes = fac[A_RES_ID];
    const fGRes = fac[G_RES_ID];
    const fRho = fac[RHO_ID];
    const phaseCount = this.phaseCount;
    const phaseKind = this.phaseKind;
    const errorCode = this.errorCode;
    // the history: Z at the last `known` points of the row (z1 the latest)
    let known = 0;
    let z1 = NaN;
    let z2 = NaN;
    let z3 = NaN;
    let z4 = NaN;
    if (i === this.fastI && j0 === this.fastJ + 1) {
      known = this.fastKnown;
      z1 = this.fastZ1;
      z2 = this.fastZ2;
      z3 = this.fastZ3;
      z4 = this.fastZ4;
    }
    let j = j0;
    for (; j < j1; j++) {
      const k = k0 + (j - j0);
      const P = pressures[j];
      // checkPressure's condition (its error comes from the general path)
      if (!(P > 0 && P >= MIN_PRESSURE_PA && P <= MAX_PRESSURE_PA)) break;
      const A = aOverRT2 * P;
      const B = bOverRT * P;
      const c2 = -(1 + B - u * B);
      const c1 = A + w * B * B - u * B - u * B * B;
      const c0 = -(A * B + w * B * B + w * B * B * B);
      const Q = (c2 * c2 - 3 * c1) * (1 / 9);
      const Rq = (2 * c2 * c2 * c2 - 9 * c2 * c1 + 27 * c0) * (1 / 54);
      const R2 = Rq * Rq;
      const Q3 = Q * Q * Q;
      const gap = 1e-8 * Math.max(R2, Math.abs(Q3));
      // (every operation of the loop runs at every point, so that the engine's type feedback
      // covers it: an operation first met after compilation, such as a three-root point, sent
      // the compiled loop back, and the recompiled loop was about 1.5 times slower)
      const disc = R2 - Q3;
      const one = disc > gap;
      const three = disc < -gap;
      let Z = NaN;
      if (known > 0 && (one || three)) {
        let z = z1;
        if (known >= 4 && weights[4 * j] === weights[4 * j]) {
          const o = 4 * j;
          z = weights[o] * z1 + weights[o + 1] * z2 + weights[o + 2] * z3 + weights[o + 3] * z4;
        } else if (known >= 2) {
          z += ((z1 - z2) * (P - pressures[j - 1])) / (pressures[j - 1] - pressures[j - 2]);
        }
        const ac2 = Math.abs(c2);
        const ac1 = Math.abs(c1);
        const ac0 = Math.abs(c0);
        let converged = false;
        for (let it = 0; it < 9; it++) {
          const f = ((z + c2) * z + c1) * z + c0;
          const az = Math.abs(z);
          if (Math.abs(f) <= 16 * Number.EPSILON * (((az + ac2) * az + ac1) * az + ac0)) {
            converged = true;
            break;
          }
          if (it === 8) break;
          const df = (3 * z + 2 * c2) * z + c1;
          if (!(df !== 0 && Number.isFinite(df))) break;
          z -= f / df;
        }
        // with three real roots z only when the other two (the deflated quadratic
        // x^2 + s1 x + s0) lie below B with a margin (taken at every point, see above)
        const s1 = c2 + z;
        const s0 = c1 + z * s1;
        const qB = (B + s1) * B + s0;
        const othersBelow =
          -s1 / 2 < B && qB > 1e-10 * (B * B + Math.abs(s1) * B + Math.abs(s0)) && z > B;
        if (converged && (one || othersBelow)) Z = z;
      }
      let rho = NaN;
      let aD = NaN;
      let I = NaN;
      let L = NaN;
      if (Z > B) {
        // eps = b rho = B / Z and q = eps / (1 - eps) = B / (Z - B) through one division
        const ZB = Z - B;
        const t = 1 / (Z * ZB);
        const eps = B * ZB * t;
        rho = eps * overB;
        if (eps < 1) {
          const D1 = 1 + d1 * eps;
          const D2 = 1 + d2 * eps;
          // I1 = 1 / (D1 D2) and D1 / D2 = D1^2 I1 through one division
          const I1 = 1 / (D1 * D2);
          const I2 = -(d1 * D2 + d2 * D1) * I1 * I1;
          const q = B * Z * t;
          aD = q - F * eps * I1;
          // mechanically stable (stiffnessFromResidual: 1 + 2 aD + aDD > 0)
          if (1 + 2 * aD + (q * q - F * eps * eps * I2) > 0) {
            I = equalDeltas ? eps / D1 : Math.log(D1 * D1 * I1) * overD12;
            L = Math.log(ZB);
          }
        }
      }
      if (!(L === L)) {
        // not finished here: fastPoint's closed form, else the exact route
        this.fastI = known > 0 ? i : -1;
        this.fastJ = j - 1;
        // (written here, not through a method: doubles passed to a call that is not inlined
        // are boxed, and the engine then kept the history boxed at every point)
        this.fastKnown = known;
        this.fastZ1 = z1;
        this.fastZ2 = z2;
        this.fastZ3 = z3;
        this.fastZ4 = z4;
        this.fastP1 = j >= 1 ? pressures[j - 1] : NaN;
        this.fastP2 = j >= 2 ? pressures[j - 2] : NaN;
        this.fastP3 = j >= 3 ? pressures[j - 3] : NaN;
        if (this.fastPoint(i, j, k, false)) {
          known = this.fastKnown;
          z1 = this.fastZ1;
          z2 = this.fastZ2;
          z3 = this.fastZ3;
          z4 = this.fastZ4;
          continue;
        }
        this.fastI = -1;
        known = 0;
        if (!this.point(i, j, k, true)) break;
        continue;
      }
      const hRes = RT * (aD + TF * I);
      const uRes = RT * TF * I;
      const sTP = R * (L + FTF * I);
      const aTP = -RT * (L + F * I);
      const gTP = aTP + RT * aD;
      let kind: number;
      if (pure) kind = supercriticalT && P >= pc ? SUPERCRITICAL : rho > rhoc ? LIQUID : VAPOR;
      else {
        const label = phaseLabel(this.model, T, P, rho, this.x, "only", 1 + aD);
        kind = label === "vapor" ? VAPOR : label === "liquid" ? LIQUID : SUPERCRITICAL;
      }
      // the energies of the ideal gas at P (NaN for extent "residual", and then not asked)
      const lnPj = energies ? lnP[j] : NaN;
      const h = igH + hRes;
      const sAbs = igS - R * lnPj + sTP;
      const uAbs = igU + uRes;
      const aAbs = igA + RT * lnPj + aTP;
      const gAbs = igG + RT * lnPj + gTP;
      // (the factors of T, P, rho mass, Z and quality are 1: not amount-specific)
      if (oT !== undefined) oT[k] = T;
      if (oP !== undefined) oP[k] = P;
      if (oRho !== undefined) oRho[k] = rho * fRho;
      if (oRhoMass !== undefined) oRhoMass[k] = rho * M;
      if (oZ !== undefined) oZ[k] = 1 + aD;
      if (oH !== undefined) oH[k] = h * fH;
      if (oS !== undefined) oS[k] = sAbs * fS;
      if (oU !== undefined) oU[k] = uAbs * fU;
      if (oA !== undefined) oA[k] = aAbs * fA;
      if (oG !== undefined) oG[k] = gAbs * fG;
      if (oHRes !== undefined) oHRes[k] = hRes * fHRes;
      if (oSRes !== undefined) oSRes[k] = sTP * fSRes;
      if (oURes !== undefined) oURes[k] = uRes * fURes;
      if (oARes !== undefined) oARes[k] = aTP * fARes;
      if (oGRes !== undefined) oGRes[k] = gTP * fGRes;
      if (oQuality !== undefined) oQuality[k] = kind === VAPOR ? 1 : kind === LIQUID ? 0 : NaN;
      phaseCount[k] = 1;
      phaseKind[k] = kind;
      errorCode[k] = 0;
      z4 = z3;
      z3 = z2;
      z2 = z1;
      z1 = Z;
      if (known < 4) known++;
    }
    // the history for the next run or point of this row
    this.fastI = known > 0 ? i : -1;
    this.fastJ = j - 1;
    this.fastKnown = known;
    this.fastZ1 = z1;
    this.fastZ2 = z2;
    this.fastZ3 = z3;
    this.fastZ4 = z4;
    this.fastP1 = j >= 1 ? pressures[j - 1] : NaN;
    this.fastP2 = j >= 2 ? pressures[j - 2] : NaN;
    this.fastP3 = j >= 3 ? pressures[j - 3] : NaN;
    return j - j0;
  }

  /**
   * The cubic start's Lagrange weights of the pressure axis: for point j (j >= 4) the weights of
   * the points j - 1 .. j - 4, four per point (NaN where two of the five pressures coincide or
   * j < 4).
   */
  private takeStartWeights(): Float64Array {
    const p = this.pressures;
    const wts = new Float64Array(4 * p.length).fill(NaN);
    for (let j = 4; j < p.length; j++) {
      const P = p[j];
      let ok = true;
      for (let m = 0; m < 4; m++) {
        const Pm = p[j - 1 - m];
        let l = 1;
        for (let n = 0; n < 4; n++) {
          if (n !== m) {
            const Pn = p[j - 1 - n];
            l *= (P - Pn) / (Pm - Pn);
          }
        }
        wts[4 * j + m] = l;
        if (!Number.isFinite(l)) ok = false;
      }
      if (!ok) wts.fill(NaN, 4 * j, 4 * j + 4);
    }
    return wts;
  }

  /**
   * The fast route of one point (precision "fast"; the row and the pressure are checked by
   * point()). Where the Z-cubic's discriminant (R^2 - Q^3 of the depressed cubic) is within 1e-8
   * of its terms of zero, the exact route runs. The root: Newton's method on the monic cubic
   * started from the previous point of the row (extrapolated in P through the last two or three),
   * accepted when within 8 steps the residual is at rounding level (16 eps of the sum of the
   * terms' magnitudes), and, with three real roots,
   * the other two (the deflated quadratic) lie below B with a margin, so that Z is the one root
   * above B, the root the exact route takes. Otherwise, and at the first point of a row, the
   * closed form (monicCubicRootsInto); with three roots above B the outer two are compared by
   * g_r/RT (chooseDensityRootInto's rule; a near tie, within 1e-11, goes to the exact route);
   * `tryNewton` false (fastRun's Newton did not finish the point) goes to the closed form. The
   * logarithms: ln(Z - B) = ln(1 - b rho) + ln Z (the residual's ln(1 - b rho) and the (T, P)
   * departures' ln Z in one) and ln(D1 / D2); ln(P / P_ig) from a per-pressure table. The
   * formulas of state/properties.ts rearranged: s_r(T,P) = R (ln(Z - B) + (F + T F_T) I),
   * a_r(T,P) = -RT (ln(Z - B) + F I), g_r(T,P) = a_r + RT (Z - 1). False (nothing written) hands
   * the point to the exact route.
   */
  private fastPoint(i: number, j: number, k: number, tryNewton: boolean): boolean {
    const T = this.temperatures[i];
    const P = this.pressures[j];
    const RT = this.RT;
    const b = this.mixB;
    const A = (this.mixA * P) / this.RT2;
    const B = (b * P) / RT;
    const u = this.u;
    const w = this.w;
    const c2 = -(1 + B - u * B);
    const c1 = A + w * B * B - u * B - u * B * B;
    const c0 = -(A * B + w * B * B + w * B * B * B);
    // (only their sign and size matter: products with 1/9 and 1/54 for the divisions)
    const Q = (c2 * c2 - 3 * c1) * (1 / 9);
    const Rq = (2 * c2 * c2 * c2 - 9 * c2 * c1 + 27 * c0) * (1 / 54);
    const R2 = Rq * Rq;
    const Q3 = Q * Q * Q;
    const gap = 1e-8 * Math.max(R2, Math.abs(Q3));
    const one = R2 - Q3 > gap;
    // near the boundary of the three-root region the exact route runs
    if (!one && !(R2 - Q3 < -gap)) return false;
    const continued = i === this.fastI && j === this.fastJ + 1;
    let Z = NaN;
    if (continued && tryNewton) {
      // the start: Z of the previous point, extrapolated in P through the last two or three
      // points of the row (Lagrange)
      const Z1 = this.fastZ1;
      const P1 = this.fastP1;
      const P2 = this.fastP2;
      const P3 = this.fastP3;
      let z = Z1;
      if (this.fastKnown >= 3 && P1 !== P2 && P2 !== P3 && P1 !== P3) {
        z =
          (Z1 * (P - P2) * (P - P3)) / ((P1 - P2) * (P1 - P3)) +
          (this.fastZ2 * (P - P1) * (P - P3)) / ((P2 - P1) * (P2 - P3)) +
          (this.fastZ3 * (P - P1) * (P - P2)) / ((P3 - P1) * (P3 - P2));
      } else if (this.fastKnown >= 2 && P1 !== P2) {
        z += ((Z1 - this.fastZ2) * (P - P1)) / (P1 - P2);
      }
      // Newton until the residual is at rounding level (16 eps of the sum of the terms'
      // magnitudes), at most 8 steps
      const ac2 = Math.abs(c2);
      const ac1 = Math.abs(c1);
      const ac0 = Math.abs(c0);
      let converged = false;
      for (let it = 0; it < 9; it++) {
        const f = ((z + c2) * z + c1) * z + c0;
        const az = Math.abs(z);
        if (Math.abs(f) <= 16 * Number.EPSILON * (((az + ac2) * az + ac1) * az + ac0)) {
          converged = true;
          break;
        }
        if (it === 8) break;
        const df = (3 * z + 2 * c2) * z + c1;
        if (!(df !== 0 && Number.isFinite(df))) break;
        z -= f / df;
      }
      if (converged) {
        if (one) Z = z;
        else {
          // three real roots: z is taken only when the other two (the roots of the deflated
          // quadratic x^2 + s1 x + s0) lie below B with a margin, i.e. z is the one root above B
          const s1 = c2 + z;
          const s0 = c1 + z * s1;
          const qB = (B + s1) * B + s0;
          if (z > B && -s1 / 2 < B && qB > 1e-10 * (B * B + Math.abs(s1) * B + Math.abs(s0))) {
            Z = z;
          }
        }
      }
    }
    const zRoots = this.zRoots;
    let threeLabel: PhaseLabel | undefined;
    if (Number.isNaN(Z)) {
      const c = this.coefficients;
      c[0] = c2;
      c[1] = c1;
      c[2] = c0;
      const count = monicCubicRootsInto(c, zRoots);
      if (one) {
        if (count !== 1) return false;
        Z = zRoots[0];
      } else if (count === 3 && zRoots[1] <= B && zRoots[2] > B) {
        // one root above B (as the exact route, which drops the others): labelled as one root
        Z = zRoots[2];
      } else {
        // three roots, all above B and distinct: the outer two (the middle one is mechanically
        // unstable) compared by g_r/RT as chooseDensityRootInto does; a near tie (the saturation
        // pressure within rounding) goes to the exact route, whose rounding decides it
        if (count !== 3 || !(zRoots[0] > B && zRoots[0] < zRoots[1] && zRoots[1] < zRoots[2])) {
          return false;
        }
        if (!this.rootValues(0, j)) return false;
        const aDL = this.fAD;
        const IL = this.fI;
        const LL = this.fL;
        const rhoL = this.fRho;
        if (!this.rootValues(2, j)) return false;
        const gL = aDL - LL - this.F * IL;
        const gV = this.fAD - this.fL - this.F * this.fI;
        if (!(Math.abs(gL - gV) > 1e-11 * (Math.abs(gL) + Math.abs(gV) + 1))) return false;
        if (gL < gV) {
          this.fAD = aDL;
          this.fI = IL;
          this.fL = LL;
          this.fRho = rhoL;
          Z = zRoots[0];
          threeLabel = "liquid";
        } else {
          Z = zRoots[2];
          threeLabel = "vapor";
        }
      }
    }
    let rho: number;
    let aD: number;
    let I: number;
    let L: number;
    const F = this.F;
    if (threeLabel === undefined) {
      // rootValues() written out (the hot path of one root)
      if (!(Z > B)) return false;
      rho = P / (Z * RT);
      const eps = b * rho;
      if (!(eps < 1)) return false;
      const d1 = this.d1;
      const d2 = this.d2;
      const D1 = 1 + d1 * eps;
      const D2 = 1 + d2 * eps;
      const I1 = 1 / (D1 * D2);
      const I2 = -(d1 * D2 + d2 * D1) * I1 * I1;
      const q = eps / (1 - eps);
      aD = q - F * eps * I1;
      // mechanically stable (stiffnessFromResidual: the sign of dP/drho)
      const r = this.ra;
      r.aD = aD;
      r.aDD = q * q - F * eps * eps * I2;
      if (!(stiffnessFromResidual(r) > 0)) return false;
      I = d1 === d2 ? eps / D1 : Math.log(D1 / D2) / (d1 - d2);
      L = Math.log(Z - B);
    } else {
      rho = this.fRho;
      aD = this.fAD;
      I = this.fI;
      L = this.fL;
    }
    const TF = this.TF;
    // the values by property id (see writeFast)
    const fv = this.fastValues;
    const hRes = RT * (aD + TF * I);
    const uRes = RT * TF * I;
    const sTP = R * (L + (F + TF) * I);
    const aTP = -RT * (L + F * I);
    const gTP = aTP + RT * aD;
    fv[T_ID] = T;
    fv[P_ID] = P;
    fv[RHO_ID] = rho;
    fv[RHO_MASS_ID] = rho * this.M;
    fv[Z_ID] = 1 + aD;
    fv[H_RES_ID] = hRes;
    fv[U_RES_ID] = uRes;
    fv[S_RES_ID] = sTP;
    fv[A_RES_ID] = aTP;
    fv[G_RES_ID] = gTP;
    if (this.extent === "energies") {
      let lnP = this.lnPressures;
      if (lnP === undefined) {
        lnP = this.pressures.map(Math.log);
        this.lnPressures = lnP;
      }
      const shift = lnP[j] - this.lnPig;
      const ig = this.ig;
      fv[H_ID] = ig.h + hRes;
      fv[U_ID] = ig.u + uRes;
      fv[S_ID] = ig.s - R * shift + sTP;
      fv[A_ID] = ig.a + RT * shift + aTP;
      fv[G_ID] = ig.g + RT * shift + gTP;
    }
    let label: PhaseLabel;
    if (threeLabel !== undefined) label = threeLabel;
    else if (this.pureLabels) {
      label = T >= this.tc && P >= this.pc ? "supercritical" : rho > this.rhoc ? "liquid" : "vapor";
    } else {
      label = phaseLabel(this.model, T, P, rho, this.x, "only", 1 + aD);
    }
    fv[QUALITY_ID] = label === "vapor" ? 1 : label === "liquid" ? 0 : NaN;
    this.fastKnown = continued ? Math.min(this.fastKnown + 1, 4) : 1;
    this.fastZ4 = this.fastZ3;
    this.fastZ3 = this.fastZ2;
    this.fastP3 = this.fastP2;
    this.fastZ2 = this.fastZ1;
    this.fastP2 = this.fastP1;
    this.fastZ1 = Z;
    this.fastP1 = P;
    this.fastI = i;
    this.fastJ = j;
    const ids = this.ids;
    const cols = this.cols;
    const factor = this.factor;
    for (let m = 0; m < ids.length; m++) cols[m][k] = fv[ids[m]] * factor[m];
    this.phaseCount[k] = 1;
    this.phaseKind[k] =
      label === "vapor"
        ? SWEEP_PHASE_KINDS.vapor
        : label === "liquid"
          ? SWEEP_PHASE_KINDS.liquid
          : SWEEP_PHASE_KINDS.supercritical;
    this.errorCode[k] = 0;
    return true;
  }

  /**
   * The quantities of the fast route at root zRoots[m] of the point of pressure pressures[j]
   * into fRho, fAD (alpha_r's rho-derivative term, Z - 1), fI (the integral I of the cubic's
   * attraction term) and fL (ln(Z - B)); false when the root is at or beyond close packing or
   * mechanically unstable (dP/drho <= 0: 1 + 2 aD + aDD <= 0).
   */
  private rootValues(m: number, j: number): boolean {
    const Z = this.zRoots[m];
    const P = this.pressures[j];
    const RT = this.RT;
    const b = this.mixB;
    const B = (b * P) / RT;
    if (!(Z > B)) return false;
    const rho = P / (Z * RT);
    const eps = b * rho;
    if (!(eps < 1)) return false;
    const d1 = this.d1;
    const d2 = this.d2;
    const F = this.F;
    const D1 = 1 + d1 * eps;
    const D2 = 1 + d2 * eps;
    const I1 = 1 / (D1 * D2);
    const I2 = -(d1 * D2 + d2 * D1) * I1 * I1;
    const q = eps / (1 - eps);
    const aD = q - F * eps * I1;
    const r = this.ra;
    r.aD = aD;
    r.aDD = q * q - F * eps * eps * I2;
    if (!(stiffnessFromResidual(r) > 0)) return false;
    this.fRho = rho;
    this.fAD = aD;
    this.fI = d1 === d2 ? eps / D1 : Math.log(D1 / D2) / (d1 - d2);
    this.fL = Math.log(Z - B);
    return true;
  }

  private write(k: number, label: PhaseLabel): void {
    const T = this.pointT;
    const P = this.pointP;
    const rho = this.pointRho;
    const v = this.v;
    const ids = this.ids;
    const cols = this.cols;
    // one store per case (a shared variable of mixed cases made the engine box the numbers); the
    // factor is 1 (exact) or 1 / M for an amount-specific property on a mass basis
    for (let m = 0; m < ids.length; m++) {
      const col = cols[m];
      const f = this.factor[m];
      switch (ids[m]) {
        case T_ID:
          col[k] = T * f;
          break;
        case P_ID:
          col[k] = P * f;
          break;
        case RHO_ID:
          col[k] = rho * f;
          break;
        case RHO_MASS_ID:
          col[k] = rho * this.M * f;
          break;
        case Z_ID:
          col[k] = v.Z * f;
          break;
        case H_ID:
          col[k] = v.h * f;
          break;
        case S_ID:
          col[k] = v.s * f;
          break;
        case U_ID:
          col[k] = v.u * f;
          break;
        case A_ID:
          col[k] = v.a * f;
          break;
        case G_ID:
          col[k] = v.g * f;
          break;
        case CP_ID:
          col[k] = v.cp * f;
          break;
        case CV_ID:
          col[k] = v.cv * f;
          break;
        case W_ID:
          col[k] = v.speedOfSound * f;
          break;
        case JT_ID:
          col[k] = v.jt * f;
          break;
        case KAPPA_ID:
          col[k] = v.kappaT * f;
          break;
        case BETA_ID:
          col[k] = v.beta * f;
          break;
        case H_RES_ID:
          col[k] = v.hRes * f;
          break;
        case S_RES_ID:
          col[k] = v.sTP * f;
          break;
        case U_RES_ID:
          col[k] = v.uRes * f;
          break;
        case A_RES_ID:
          col[k] = v.aTP * f;
          break;
        case G_RES_ID:
          col[k] = v.gTP * f;
          break;
        case CP_RES_ID:
          col[k] = (v.cp - this.ig.cp) * f;
          break;
        case CV_RES_ID:
          col[k] = v.cvRes * f;
          break;
        case QUALITY_ID:
          col[k] = (label === "vapor" ? 1 : label === "liquid" ? 0 : NaN) * f;
          break;
        default:
          col[k] = NaN;
      }
    }
    this.phaseCount[k] = 1;
    this.phaseKind[k] =
      label === "vapor"
        ? SWEEP_PHASE_KINDS.vapor
        : label === "liquid"
          ? SWEEP_PHASE_KINDS.liquid
          : SWEEP_PHASE_KINDS.supercritical;
    this.errorCode[k] = 0;
  }
}
