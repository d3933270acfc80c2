/**
 * Every property of a state from the residual Helmholtz derivatives plus the ideal-gas part: the
 * ONE place where property formulas live. With a = alpha_r and reduced derivatives aD, aDD, aT,
 * aTT, aDT (eos/types.ts), and the relations of e.g. Span, Multiparameter Equations of State
 * (Springer 2000), Table 3.3, or Michelsen & Mollerup, Thermodynamic Models, 2nd ed. (2007), ch. 2:
 *   Z = 1 + aD,  P = rho R T Z
 *   same T and density ("TV"):  a_r/RT = a,  u_r/RT = -aT,  h_r/RT = aD - aT,
 *                               s_r/R = -a - aT,  g_r/RT = a + aD
 *   same T and P ("TP"): h, u unchanged; s_r += R ln Z; a_r, g_r -= R T ln Z
 *   cv = cv0 - R (2 aT + aTT)
 *   (dP/drho)_T = R T (1 + 2 aD + aDD),   (dP/dT)_rho = rho R (1 + aD + aDT)
 *   cp = cv + T (dP/dT)^2 / (rho^2 (dP/drho)),   w^2 = (cp/cv) (dP/drho) / M
 *   kappa_T = 1 / (rho dP/drho),  beta = kappa_T dP/dT,  mu_JT = (T beta - 1) / (rho cp),
 *   isentropic exponent k = (cp/cv) (rho / P) (dP/drho)
 *   ln phi_i = d(n alpha_r)/dn_i - ln Z
 * Absolute values add the ideal gas at the same T and DENSITY (ideal-gas pressure rho R T, mixing
 * included) plus the "TV" residuals. The ideal gas may be supplied at any pressure P_ig (so one
 * evaluation serves a whole isotherm); it is moved to rho R T by its only pressure dependence,
 * s -= R ln(rho R T / P_ig), a and g += R T ln(rho R T / P_ig) (h, u, cp, cv do not depend on P).
 * The sum this equals ideal gas at (T, P) plus the "TP" residuals, and it
 * stays defined where P <= 0 (a stretched liquid) or Z <= 0, where ln Z does not exist. There the
 * TP residuals and ln phi are NaN and a warning says why.
 */
import { R as R_CODATA } from "../constants.js";
import type { ResultWarning } from "../errors.js";
import type { ResidualDerivatives } from "../eos/types.js";
import type { IdealGasProperties } from "../idealgas/types.js";
import type { DepartureMethod, EnergySet, FluidState, PhaseLabel } from "./types.js";
import type { ModelInfo } from "../eos/types.js";
import {
  dPdRho,
  dPdTAtDensity,
  gibbsOverRTFromLnZ,
  lnZOf,
  pressureFromResidual,
  residualGibbsTP,
} from "../eos/residualRelations.js";

// the pressure, (dP/drho)_T and g_r/RT relations live at the model layer (eos/residualRelations.ts),
// where models need them too; the state layer offers them with the other property formulas
export { dPdRho, pressureFromResidual, residualGibbsTP };

/** Everything {@link assembleState} needs; the caller has already found the density. */
export interface StateInputs {
  readonly temperatureK: number;
  readonly densityMolPerM3: number;
  readonly x: readonly number[];
  /** Residual derivatives at (T, rho, x), with dnA. */
  readonly residual: ResidualDerivatives;
  /** Ideal-gas mixture properties at (T, any pressure, x); moved to rho R T here (see the header). */
  readonly ideal: IdealGasProperties;
  /** Mixture molar mass, kg/mol. */
  readonly molarMassKgPerMol: number;
  readonly phase: PhaseLabel;
  readonly model: ModelInfo;
  readonly departureMethod: DepartureMethod;
  /** Gas constant of the model, J/(mol K); default CODATA. */
  readonly gasConstant?: number;
  /** Warnings gathered so far (copied). */
  readonly warnings?: readonly ResultWarning[];
  /**
   * The pressure the state was asked at ((T, P) states), Pa: reported as given. Default (and
   * every other property): P = rho R T Z of the model, which equals the given pressure only to
   * round-off.
   */
  readonly pressurePa?: number;
}

/** Residual h, s, u, a, g in both conventions, J/mol and J/(mol K), with ln Z and ln phi. */
export interface ResidualSets {
  /** Relative to the ideal gas at the same T and density. */
  readonly TV: EnergySet;
  /** Relative to the ideal gas at the same T and pressure (NaN where Z <= 0). */
  readonly TP: EnergySet;
  readonly lnZ: number;
  /** ln phi_i = dnA_i - ln Z (empty when the derivatives carry no dnA). */
  readonly lnPhi: number[];
}

// the departure values of the current residualParts call, overwritten by the next call (no
// allocation in the state loop; read out at once, single-threaded)
const parts = { lnZ: 0, h: 0, u: 0, sTV: 0, aTV: 0, gTV: 0, sTP: 0, aTP: 0, gTP: 0 };

/** The departure formulas of the header, written once: fills `parts`. */
function residualParts(temperatureK: number, d: ResidualDerivatives, gasConstant: number): void {
  const RT = gasConstant * temperatureK;
  const lnZ = lnZOf(d.aD);
  parts.lnZ = lnZ;
  parts.h = RT * (d.aD - d.aT);
  parts.u = -RT * d.aT;
  parts.sTV = -gasConstant * (d.a + d.aT);
  parts.aTV = RT * d.a;
  parts.gTV = RT * (d.a + d.aD);
  parts.sTP = parts.sTV + gasConstant * lnZ;
  parts.aTP = parts.aTV - RT * lnZ;
  parts.gTP = RT * gibbsOverRTFromLnZ(d.a, d.aD, lnZ);
}

/** ln phi_i = dnA_i - ln Z (empty when the derivatives carry no dnA). */
function lnPhiOf(d: ResidualDerivatives, lnZ: number): number[] {
  const dnA = d.dnA;
  if (!dnA) return [];
  const out = new Array<number>(dnA.length);
  for (let i = 0; i < dnA.length; i++) out[i] = dnA[i] - lnZ;
  return out;
}

/** ln phi_i = dnA_i - ln Z written over dnA (an array the caller owns); returns it. */
function lnPhiInPlace(dnA: number[], lnZ: number): number[] {
  for (let i = 0; i < dnA.length; i++) dnA[i] = dnA[i] - lnZ;
  return dnA;
}

/**
 * ln phi_i of a state from its residual derivatives (which must carry dnA): dnA_i - ln Z, NaN where
 * Z <= 0 (the formula of the header, for callers that need the fugacities alone).
 */
export function lnFugacityCoefficients(d: ResidualDerivatives): number[] {
  return lnPhiOf(d, lnZOf(d.aD));
}

/** The departure functions of a state from its residual derivatives (formulas in the header). */
export function residualProperties(
  temperatureK: number,
  d: ResidualDerivatives,
  gasConstant: number = R_CODATA,
): ResidualSets {
  residualParts(temperatureK, d, gasConstant);
  const p = parts;
  return {
    TV: { h: p.h, s: p.sTV, u: p.u, a: p.aTV, g: p.gTV },
    TP: { h: p.h, s: p.sTP, u: p.u, a: p.aTP, g: p.gTP },
    lnZ: p.lnZ,
    lnPhi: lnPhiOf(d, p.lnZ),
  };
}

// the warnings of a state that has none, shared (FluidState.warnings is read-only)
const NO_WARNINGS: readonly ResultWarning[] = Object.freeze([]);

/**
 * Every number of a state, as plain fields (a record a caller keeps and reuses: sweeps fill one
 * per point without allocating). Molar SI values; `residual*` relative to the ideal gas at the
 * same T and P, `residualTV*` at the same T and density.
 */
export interface StateValues {
  pressurePa: number;
  Z: number;
  h: number;
  s: number;
  u: number;
  a: number;
  g: number;
  cp: number;
  cv: number;
  hRes: number;
  uRes: number;
  sTV: number;
  aTV: number;
  gTV: number;
  sTP: number;
  aTP: number;
  gTP: number;
  lnZ: number;
  cvRes: number;
  dPdRho: number;
  dPdT: number;
  /** NaN for a mechanically unstable state. */
  speedOfSound: number;
  kappaT: number;
  beta: number;
  jt: number;
  isentropicExponent: number;
}

/** A fresh {@link StateValues} (all NaN). */
export function emptyStateValues(): StateValues {
  return {
    pressurePa: NaN,
    Z: NaN,
    h: NaN,
    s: NaN,
    u: NaN,
    a: NaN,
    g: NaN,
    cp: NaN,
    cv: NaN,
    hRes: NaN,
    uRes: NaN,
    sTV: NaN,
    aTV: NaN,
    gTV: NaN,
    sTP: NaN,
    aTP: NaN,
    gTP: NaN,
    lnZ: NaN,
    cvRes: NaN,
    dPdRho: NaN,
    dPdT: NaN,
    speedOfSound: NaN,
    kappaT: NaN,
    beta: NaN,
    jt: NaN,
    isentropicExponent: NaN,
  };
}

/**
 * Only the departures of a state at the same T and P (h_r J/mol, s_r J/(mol K), u_r, a_r, g_r,
 * ln Z) into `out` (the other fields untouched): the residual sweeps' path, the formulas of the header.
 */
export function residualValuesInto(
  temperatureK: number,
  d: ResidualDerivatives,
  gasConstant: number,
  out: StateValues,
): void {
  residualParts(temperatureK, d, gasConstant);
  out.hRes = parts.h;
  out.uRes = parts.u;
  out.sTV = parts.sTV;
  out.aTV = parts.aTV;
  out.gTV = parts.gTV;
  out.sTP = parts.sTP;
  out.aTP = parts.aTP;
  out.gTP = parts.gTP;
  out.lnZ = parts.lnZ;
}

// ln(P / P_ig) of the last (T, P) state and its two pressures: states at one pressure (an isobar,
// a series of states of one stream) take the logarithm once
let shiftP = NaN;
let shiftPig = NaN;
let shiftLn = NaN;
const LN_ONE_HALF = -Math.LN2;

/**
 * ln(rho R T / P_ig), the move of the ideal gas from P_ig to the state's density (see the header).
 * A (T, P) state (`givenPressurePa` defined) with Z > 1/2 takes it as ln(P / P_ig) - ln Z
 * (rho R T Z = P), which saves a logarithm. Only there: Z = 1 + aD of a dense state comes from
 * a cancelling sum (aD near -1, whose rounding made ln Z differ by 2e-12 at Z = 0.004), while
 * for Z > 1/2 its rounding is a few ulp; the two forms then differ by the rounding of rho and Z
 * (tests/unit/state/pressureShift.test.ts: within 1e-13 of max(|value|, R or R T) for the
 * absolute s, a and g).
 */
function lnPressureShiftOf(
  rho: number,
  RT: number,
  idealPressurePa: number,
  givenPressurePa: number | undefined,
  lnZ: number,
): number {
  if (givenPressurePa === undefined || !(lnZ > LN_ONE_HALF)) {
    return Math.log((rho * RT) / idealPressurePa);
  }
  if (givenPressurePa !== shiftP || idealPressurePa !== shiftPig) {
    shiftLn = Math.log(givenPressurePa / idealPressurePa);
    shiftP = givenPressurePa;
    shiftPig = idealPressurePa;
  }
  return shiftLn - lnZ;
}

/**
 * The pressure, Z, the departures and the absolute h, s, u, a, g at T (K), rho (mol/m3) into
 * `out` (no heat capacities or derivatives: the sweeps' extent for energies alone; stateValuesInto
 * adds the rest to these very numbers). Reads aD, a and aT of the derivatives. `givenPressurePa`:
 * the pressure a (T, P) state was asked at (as assembleStateOf), undefined for a (T, rho) state.
 */
export function energyValuesInto(
  temperatureK: number,
  densityMolPerM3: number,
  d: ResidualDerivatives,
  ig: IdealGasProperties,
  gasConstant: number,
  out: StateValues,
  givenPressurePa?: number,
): void {
  const Rg = gasConstant;
  const T = temperatureK;
  const rho = densityMolPerM3;
  const RT = Rg * T;
  residualValuesInto(T, d, Rg, out);
  // absolute: ideal gas at the same T and density plus the TV residuals
  const lnPressureShift = lnPressureShiftOf(rho, RT, ig.pressurePa, givenPressurePa, out.lnZ);
  out.pressurePa = pressureFromResidual(T, rho, d.aD, Rg);
  out.Z = 1 + d.aD;
  out.h = ig.h + out.hRes;
  out.s = ig.s - Rg * lnPressureShift + out.sTV;
  out.u = ig.u + out.uRes;
  out.a = ig.a + RT * lnPressureShift + out.aTV;
  out.g = ig.g + RT * lnPressureShift + out.gTV;
}

/**
 * Every property of the header at T (K), rho (mol/m3) from the residual derivatives and the ideal
 * gas (any pressure), into `out`: assembleState builds its record from these very numbers, so a
 * sweep that fills `out` gets the single-state values to the last bit. `givenPressurePa` as
 * energyValuesInto.
 */
export function stateValuesInto(
  temperatureK: number,
  densityMolPerM3: number,
  d: ResidualDerivatives,
  ig: IdealGasProperties,
  molarMassKgPerMol: number,
  gasConstant: number,
  out: StateValues,
  givenPressurePa?: number,
): void {
  const Rg = gasConstant;
  const T = temperatureK;
  const rho = densityMolPerM3;
  energyValuesInto(T, rho, d, ig, Rg, out, givenPressurePa);
  const P = out.pressurePa;
  // derivatives and heat capacities
  const dPdr = dPdRho(T, d, Rg);
  const dPdT = dPdTAtDensity(rho, d, Rg);
  const cvRes = -Rg * (2 * d.aT + d.aTT);
  const cv = ig.cv + cvRes;
  const cp = cv + (T * dPdT * dPdT) / (rho * rho * dPdr);
  const M = molarMassKgPerMol;
  const stable = dPdr > 0;
  const w2 = ((cp / cv) * dPdr) / M;
  const kappaT = 1 / (rho * dPdr);
  const beta = kappaT * dPdT;
  out.cp = cp;
  out.cv = cv;
  out.cvRes = cvRes;
  out.dPdRho = dPdr;
  out.dPdT = dPdT;
  out.speedOfSound = stable && w2 > 0 ? Math.sqrt(w2) : NaN;
  out.kappaT = kappaT;
  out.beta = beta;
  out.jt = (T * beta - 1) / (rho * cp);
  out.isentropicExponent = ((cp / cv) * rho * dPdr) / P;
}

/** Builds the full state record (see the header for every formula). */
export function assembleState(input: StateInputs): FluidState {
  return assembleStateOf(
    input.temperatureK,
    input.densityMolPerM3,
    input.x,
    input.residual,
    input.ideal,
    input.molarMassKgPerMol,
    input.phase,
    input.model,
    input.departureMethod,
    input.gasConstant ?? R_CODATA,
    input.warnings,
    input.pressurePa,
  );
}

/**
 * {@link assembleState} with the inputs as arguments (the state layer's hot path: no inputs
 * record per state). `Rg` is the model's gas constant, J/(mol K); `givenPressurePa` the pressure
 * a (T, P) state was asked at, reported as given (StateInputs.pressurePa); `ownDnA`: `d.dnA` is
 * a fresh array of the caller's that may become the state's lnPhi (overwritten in place).
 */
export function assembleStateOf(
  T: number,
  rho: number,
  x: readonly number[],
  d: ResidualDerivatives,
  ig: IdealGasProperties,
  M: number,
  phase: PhaseLabel,
  model: ModelInfo,
  departureMethod: DepartureMethod,
  Rg: number,
  given: readonly ResultWarning[] | undefined,
  givenPressurePa?: number,
  ownDnA = false,
): FluidState {
  // the arithmetic of stateValuesInto (residualParts, energyValuesInto) written out with locals,
  // operation for operation, so a sweep that fills StateValues gets these very numbers (the sweep
  // tests check it bit for bit); locals instead of the shared records save the stores and loads
  const RT = Rg * T;
  const lnZ = lnZOf(d.aD);
  const hRes = RT * (d.aD - d.aT);
  const uRes = -RT * d.aT;
  const sTV = -Rg * (d.a + d.aT);
  const aTV = RT * d.a;
  const gTV = RT * (d.a + d.aD);
  const sTP = sTV + Rg * lnZ;
  const aTP = aTV - RT * lnZ;
  const gTP = RT * gibbsOverRTFromLnZ(d.a, d.aD, lnZ);
  const lnPressureShift = lnPressureShiftOf(rho, RT, ig.pressurePa, givenPressurePa, lnZ);
  const P = pressureFromResidual(T, rho, d.aD, Rg);
  const Z = 1 + d.aD;
  const h = ig.h + hRes;
  const s = ig.s - Rg * lnPressureShift + sTV;
  const u = ig.u + uRes;
  const a = ig.a + RT * lnPressureShift + aTV;
  const g = ig.g + RT * lnPressureShift + gTV;
  const dPdr = dPdRho(T, d, Rg);
  const dPdT = dPdTAtDensity(rho, d, Rg);
  const cvRes = -Rg * (2 * d.aT + d.aTT);
  const cv = ig.cv + cvRes;
  const cp = cv + (T * dPdT * dPdT) / (rho * rho * dPdr);
  const stable = dPdr > 0;
  const w2 = ((cp / cv) * dPdr) / M;
  const kappaT = 1 / (rho * dPdr);
  const beta = kappaT * dPdT;
  // the caller's fresh dnA array becomes ln phi in place (the same subtraction, no second array)
  const lnPhi = ownDnA && d.dnA ? lnPhiInPlace(d.dnA as number[], lnZ) : lnPhiOf(d, lnZ);
  // one division for the seven specific values (a multiply differs from dividing by at most 1 ulp)
  const perMass = 1 / M;
  let warnings: readonly ResultWarning[] = NO_WARNINGS;
  if (!stable || !(Z > 0) || (given !== undefined && given.length > 0) || ig.warnings.length > 0) {
    const list: ResultWarning[] = given ? given.slice() : [];
    if (!stable) {
      list.push({
        code: "model-limitation",
        message: `mechanically unstable state: (dP/drho)_T = ${dPdr.toPrecision(4)} Pa m3/mol <= 0 at T = ${T} K, rho = ${rho} mol/m3 (inside the spinodal); cp, speed of sound and compressibilities are not physical here (speed of sound reported as NaN)`,
      });
    }
    if (!(Z > 0)) {
      list.push({
        code: "model-limitation",
        message: `P = ${P.toPrecision(4)} Pa <= 0 at T = ${T} K, rho = ${rho} mol/m3: departures at the same T and P and fugacity coefficients do not exist there (NaN); absolute h, s, u, a, g are still defined`,
      });
    }
    for (let i = 0; i < ig.warnings.length; i++) list.push(ig.warnings[i]);
    warnings = dedupe(list);
  }
  return {
    temperatureK: T,
    pressurePa: givenPressurePa ?? P,
    densityMolPerM3: rho,
    densityKgPerM3: rho * M,
    x: x.slice(),
    Z,
    phase,
    molar: { h, s, u, a, g, cp, cv },
    mass: {
      h: h * perMass,
      s: s * perMass,
      u: u * perMass,
      a: a * perMass,
      g: g * perMass,
      cp: cp * perMass,
      cv: cv * perMass,
    },
    residual: { h: hRes, s: sTP, u: uRes, a: aTP, g: gTP, cp: cp - ig.cp, cv: cvRes },
    residualTV: { h: hRes, s: sTV, u: uRes, a: aTV, g: gTV },
    lnPhi,
    speedOfSoundMPerS: stable && w2 > 0 ? Math.sqrt(w2) : NaN,
    jouleThomsonKPerPa: (T * beta - 1) / (rho * cp),
    isothermalCompressibilityPerPa: kappaT,
    thermalExpansionPerK: beta,
    isentropicExponent: ((cp / cv) * rho * dPdr) / P,
    dPdTPaPerK: dPdT,
    dPdRhoPaM3PerMol: dPdr,
    molarMassKgPerMol: M,
    model,
    referenceState: ig.referenceState,
    departureMethod,
    warnings,
  };
}

function dedupe(ws: ResultWarning[]): ResultWarning[] {
  if (ws.length < 2) return ws;
  const seen = new Set<string>();
  const out: ResultWarning[] = [];
  for (const w of ws) {
    if (seen.has(w.message)) continue;
    seen.add(w.message);
    out.push(w);
  }
  return out;
}
