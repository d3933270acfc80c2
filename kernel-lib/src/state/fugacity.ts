/**
 * Fugacity of one phase at given T, P and composition, and its derivatives: the building block of
 * the stability test, the flash, saturation points and envelopes. Nothing here assembles a full
 * state (state/stateAt.ts does), so an iteration pays only for what it uses.
 *
 * Root choice (state/rootChoice.ts, the same as for states at (T, P)): every density root of the
 * model at (T, P, x), mechanically unstable roots ((dP/drho)_T <= 0) discarded; "stable" takes the
 * root of lowest residual Gibbs energy g_r/RT = a + aD - ln Z (at equal T and P the ideal parts
 * are equal), "vapor" the lowest stable density and "liquid" the highest. ln phi_i = dnA_i - ln Z
 * (state/properties.ts). This is the one place that gives ln phi of a phase at (T, P): the
 * stability test (phase/stability.ts) and the flash to come take it from here.
 *
 * Derivatives at fixed density (Michelsen & Mollerup, Thermodynamic Models: Fundamentals and
 * Computational Aspects, 2nd ed. 2007, ch. 2, eqs. for ln phi in terms of F = A_res/(RT) =
 * n alpha_r as a function of T, V, n), with F_ij = d2F/dn_i dn_j, F_iT = d2F/dn_i dT at constant V:
 *   (dP/dn_i)_{T,V} = (R T / V) (1 + rho (d dnA_i / d rho)_{T,x})
 *   (dP/dV)_{T,n}   = -(rho^2 / n) (dP/drho)_{T,x}
 *   v_i             = -(dP/dn_i) / (dP/dV)                     (partial molar volume)
 *   (d ln phi_i / dP)_{T,n} = v_i / (R T) - 1 / P
 *   (d ln phi_i / dT)_{P,n} = F_iT + 1 / T - v_i (dP/dT)_{V,n} / (R T)
 *   n (d ln phi_i / dn_j)_{T,P} = n F_ij + 1 + (n / (R T)) (dP/dn_i)(dP/dn_j) / (dP/dV)
 * A model may provide F_ij, F_iT and rho d(dnA_i)/d rho in closed form (`ResidualModel.
 * compositionHessian`); otherwise they are taken by central differences of dnA (steps stated below),
 * which is enough for Newton steps (final accuracy is set by the residuals, never by a Jacobian).
 * The basis is one mole of the phase (n = 1).
 */
import { R as R_CODATA } from "../constants.js";
import { PhaseUnavailableError } from "../errors.js";
import type { ResidualDerivatives, ResidualModel } from "../eos/types.js";
import { dPdTAtDensity } from "../eos/residualRelations.js";
import { densityRootsOf } from "./findDensityRoots.js";
import {
  dPdRho,
  lnFugacityCoefficients,
  pressureFromResidual,
  residualGibbsTP,
} from "./properties.js";
import { chooseDensityRoot, emptyRootChoice } from "./rootChoice.js";
import type { PhaseRequest } from "./types.js";

/** ln phi of one phase at (T, P, x) with the root it was taken in. */
export interface PhaseFugacity {
  /** mol/m3 */
  readonly densityMolPerM3: number;
  /** P / (rho R T) */
  readonly Z: number;
  /** ln phi_i, one per component (model order); absent components still get a value. */
  readonly lnPhi: number[];
  /** g_r/RT at the same T and P (decides between roots and between phases). */
  readonly gibbsResidualOverRT: number;
  /** How many mechanically stable roots the model had at (T, P, x). */
  readonly stableRootCount: number;
  /** The residual derivatives at the chosen root (with dnA). */
  readonly residual: ResidualDerivatives;
}

const COMPOSITION = Object.freeze({ composition: true });
// the root choice of the current phaseFugacityAtTP call, read out at once (plain numbers)
const choice = emptyRootChoice();
// the density roots of the current phaseFugacityAtTP call (models with densityRootsInto)
const ROOTS = new Float64Array(3);

function gasConstant(model: ResidualModel): number {
  return model.gasConstant ?? R_CODATA;
}

/**
 * ln phi_i at T (K), P (Pa), mole fractions x in the root `phase` asks for (see the header).
 * Inputs are not checked here (callers iterate; their public entry checks once).
 *
 * @throws PhaseUnavailableError when the model has no mechanically stable root at (T, P, x).
 */
export function phaseFugacityAtTP(
  model: ResidualModel,
  temperatureK: number,
  pressurePa: number,
  x: readonly number[],
  phase: PhaseRequest = "stable",
): PhaseFugacity {
  const T = temperatureK;
  // the roots: into the reused scratch when the model can (no array per call)
  let rhos: ArrayLike<number>;
  let rootCount: number;
  if (model.densityRootsInto !== undefined) {
    rootCount = model.densityRootsInto(T, pressurePa, x, ROOTS);
    rhos = ROOTS;
  } else {
    rhos = densityRootsOf(model, T, pressurePa, x);
    rootCount = rhos.length;
  }
  const chosen = chooseDensityRoot(model, T, rhos, x, phase, choice, rootCount);
  const count = choice.stableCount;
  const chosenRho = choice.densityMolPerM3;
  // g_r/RT of the chosen root: compared already when "stable" had several roots
  const compared = phase === "stable" && rootCount > 1;
  const lowestG = choice.lowestGibbsOverRT;
  if (chosen === undefined || chosen.dnA === undefined || !(1 + chosen.aD > 0)) {
    const found = Array.from(rhos).slice(0, rootCount);
    throw new PhaseUnavailableError(
      `${model.info.name} has no mechanically stable density root at T = ${T} K, P = ${pressurePa} Pa for the composition [${x.map((v) => v.toPrecision(4)).join(", ")}]` +
        (found.length > 0
          ? ` (roots: ${found.map((r) => r.toPrecision(6)).join(", ")} mol/m3)`
          : ""),
    );
  }
  return {
    densityMolPerM3: chosenRho,
    Z: 1 + chosen.aD,
    lnPhi: lnFugacityCoefficients(chosen),
    gibbsResidualOverRT: compared ? lowestG : residualGibbsTP(chosen),
    stableRootCount: count,
    residual: chosen,
  };
}

/** ln phi and its derivatives at (T, P, x) of one phase (one mole of it). */
export interface FugacityDerivatives {
  readonly lnPhi: number[];
  /** (d ln phi_i / dT)_{P,n}, 1/K */
  readonly dLnPhiDT: number[];
  /** (d ln phi_i / dP)_{T,n}, 1/Pa */
  readonly dLnPhiDP: number[];
  /** n (d ln phi_i / dn_j)_{T,P}, dimensionless, symmetric, row i = component i. */
  readonly dLnPhiDn: number[][];
  /** Partial molar volumes, m3/mol. */
  readonly partialMolarVolume: number[];
  readonly densityMolPerM3: number;
  readonly Z: number;
}

/**
 * Closed-form second derivatives of F = n alpha_r a model may offer (all at constant V, one mole):
 * `nFij[i][j]` = n d2F/dn_i dn_j, `FiT[i]` = d2F/dn_i dT (1/K), `rhoDdnA[i]` = rho d(dnA_i)/d rho
 * at constant T and x.
 */
export interface CompositionHessian {
  readonly nFij: number[][];
  readonly FiT: number[];
  readonly rhoDdnA: number[];
}

// relative steps of the central differences (about the cube root of the unit round-off, for
// central differences of a function evaluated to full precision: error ~ h^2 + eps / h)
const STEP_RHO = 1e-5;
const STEP_T = 1e-5;
const STEP_N = 1e-5;

/** F_ij, F_iT and rho d(dnA)/d rho by central differences of the model's dnA (see the header). */
function numericHessian(
  model: ResidualModel,
  T: number,
  rho: number,
  x: readonly number[],
): CompositionHessian {
  const n = x.length;
  const dnAAt = (TT: number, rr: number, xx: readonly number[]): readonly number[] => {
    const d = model.residual(TT, rr, xx, COMPOSITION).dnA;
    if (d === undefined) {
      throw new PhaseUnavailableError(
        `${model.info.name} does not provide composition derivatives (dnA): fugacities of mixtures need them`,
      );
    }
    return d;
  };
  const hr = rho * STEP_RHO;
  const up = dnAAt(T, rho + hr, x);
  const dn = dnAAt(T, rho - hr, x);
  const rhoDdnA = new Array<number>(n);
  for (let i = 0; i < n; i++) rhoDdnA[i] = (rho * (up[i] - dn[i])) / (2 * hr);
  const hT = T * STEP_T;
  const tUp = dnAAt(T + hT, rho, x);
  const tDn = dnAAt(T - hT, rho, x);
  const FiT = new Array<number>(n);
  for (let i = 0; i < n; i++) FiT[i] = (tUp[i] - tDn[i]) / (2 * hT);
  // d/dn_j at constant T and V: with V = 1/rho for one mole, adding h moles of j gives
  // rho' = (1 + h) rho and x' = (x + h e_j) / (1 + h)
  const nFij: number[][] = [];
  for (let i = 0; i < n; i++) nFij.push(new Array<number>(n).fill(0));
  const xs = new Array<number>(n);
  for (let j = 0; j < n; j++) {
    const h = STEP_N;
    for (let k = 0; k < n; k++) xs[k] = (x[k] + (k === j ? h : 0)) / (1 + h);
    const plus = dnAAt(T, rho * (1 + h), xs.slice());
    for (let k = 0; k < n; k++) xs[k] = (x[k] - (k === j ? h : 0)) / (1 - h);
    if (x[j] - h < 0) {
      // near zero amount: the second-order forward difference (-3 f(0) + 4 f(h) - f(2h)) / 2h
      const here = dnAAt(T, rho, x);
      for (let k = 0; k < n; k++) xs[k] = (x[k] + (k === j ? 2 * h : 0)) / (1 + 2 * h);
      const twice = dnAAt(T, rho * (1 + 2 * h), xs.slice());
      for (let i = 0; i < n; i++) nFij[i][j] = (4 * plus[i] - 3 * here[i] - twice[i]) / (2 * h);
      continue;
    }
    const minus = dnAAt(T, rho * (1 - h), xs.slice());
    for (let i = 0; i < n; i++) nFij[i][j] = (plus[i] - minus[i]) / (2 * h);
  }
  // symmetrise (F_ij = F_ji exactly; differences differ in the last digits)
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const m = 0.5 * (nFij[i][j] + nFij[j][i]);
      nFij[i][j] = m;
      nFij[j][i] = m;
    }
  }
  return { nFij, FiT, rhoDdnA };
}

/**
 * ln phi and its T, P and composition derivatives of the phase at T (K), density rho (mol/m3)
 * and mole fractions x (a root already chosen, e.g. by {@link phaseFugacityAtTP}).
 */
export function fugacityDerivatives(
  model: ResidualModel,
  temperatureK: number,
  densityMolPerM3: number,
  x: readonly number[],
): FugacityDerivatives {
  const T = temperatureK;
  const rho = densityMolPerM3;
  const n = x.length;
  const Rg = gasConstant(model);
  const RT = Rg * T;
  const d = model.residual(T, rho, x, COMPOSITION);
  if (d.dnA === undefined) {
    throw new PhaseUnavailableError(
      `${model.info.name} does not provide composition derivatives (dnA): fugacities of mixtures need them`,
    );
  }
  const Z = 1 + d.aD;
  const P = pressureFromResidual(T, rho, d.aD, Rg);
  const lnPhi = lnFugacityCoefficients(d);
  const hess = model.compositionHessian
    ? model.compositionHessian(T, rho, x)
    : numericHessian(model, T, rho, x);
  const V = 1 / rho; // one mole
  const dPdV = -rho * rho * dPdRho(T, d, Rg);
  const dPdT = dPdTAtDensity(rho, d, Rg);
  const dPdn = new Array<number>(n);
  const vBar = new Array<number>(n);
  const dT = new Array<number>(n);
  const dP = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    dPdn[i] = (RT / V) * (1 + hess.rhoDdnA[i]);
    vBar[i] = -dPdn[i] / dPdV;
    dP[i] = vBar[i] / RT - 1 / P;
    dT[i] = hess.FiT[i] + 1 / T - (vBar[i] * dPdT) / RT;
  }
  const dN: number[][] = [];
  for (let i = 0; i < n; i++) {
    const row = new Array<number>(n);
    for (let j = 0; j < n; j++) {
      row[j] = hess.nFij[i][j] + 1 + (dPdn[i] * dPdn[j]) / (RT * dPdV);
    }
    dN.push(row);
  }
  return {
    lnPhi,
    dLnPhiDT: dT,
    dLnPhiDP: dP,
    dLnPhiDn: dN,
    partialMolarVolume: vBar,
    densityMolPerM3: rho,
    Z,
  };
}
