/**
 * The Maxwell-relation route along one isotherm, from smoothed pressures and isochoric slopes at
 * irregular density nodes (the data densities). With (dS/dV)_T = (dP/dT)_V and V = 1/rho
 * (e.g. Smith, Van Ness & Abbott, Introduction to Chemical Engineering Thermodynamics, 7th ed.,
 * 2005, §6.2 and §13.6 for the residual-property integrals at constant T):
 *
 *   a_res(T, rho) = int_0^rho (P - rho R T) / rho'^2 drho'               (same T and density)
 *   s_res(T, rho) = int_0^rho (rho' R - (dP/dT)_rho) / rho'^2 drho'      (same T and density)
 *   u_res = a_res + T s_res, then h, g and ln phi from Z (departureSet.ts).
 *
 * Each integral = low-density bridge from 0 to the first node (lowDensityBridge.ts) + cumulative
 * irregular quadrature between nodes (irregularQuadrature.ts). The second virial coefficient is
 * the bridge's value of the a-integrand at zero density divided by R T.
 */
import { departuresFromIntegrals } from "./departureSet.js";
import type { DepartureSet } from "./departureSet.js";
import {
  cumulativeIrregular,
  cumulativeIrregularWeights,
} from "../numerics/cumulativeIrregular.js";
import { lowDensityBridge } from "./lowDensityBridge.js";
import type { BridgeOptions, BridgeResult, FrozenBridge } from "./lowDensityBridge.js";

/** The smoothed values at the nodes of one isotherm. */
export interface IsothermNodes {
  temperatureK: number;
  /** Ascending, mol/m3. */
  densityMolPerM3: readonly number[];
  /** Smoothed pressure at each node, Pa. */
  pressurePa: readonly number[];
  /** Smoothed (dP/dT)_rho at each node, Pa/K. */
  slopePaPerK: readonly number[];
  /** Standard uncertainties of the smoothed P and slope (for the bridge weights); omit if unknown. */
  uPressurePa?: readonly number[];
  uSlopePaPerK?: readonly number[];
}

/** Result of {@link integrateIsotherm}: departures at every node, the bridges, B and C. */
export interface IsothermDepartures {
  temperatureK: number;
  departures: DepartureSet[];
  /** Quadrature error estimates of a_res (J/mol) and s_res (J/(mol K)) at each node (bridge excluded). */
  quadratureError: { a: number; s: number }[];
  bridgeA: BridgeResult;
  bridgeS: BridgeResult;
  /** Second virial coefficient, m3/mol, and its standard uncertainty (fit and truncation). */
  B: number;
  uB: number;
  /** Third virial coefficient, m6/mol2, when the bridge degree allowed it. */
  C?: number;
  uC?: number;
}

/** Options of {@link integrateIsotherm}. */
export interface IntegrateIsothermOptions {
  bridge?: BridgeOptions;
  /** Fixed bridge degrees (used by the uncertainty propagation to freeze the nominal choice). */
  bridgeDegrees?: { a: number; s: number };
  /**
   * Bridges frozen as linear maps (lowDensityBridge.ts, freezeBridge): used instead of fitting,
   * when the route is re-evaluated for other pressures. Their uncertainty fields are the nominal ones.
   */
  frozenBridges?: { a: FrozenBridge; s: FrozenBridge };
  gasConstant: number;
}

/** The a_res integrand (P - rho R T)/rho^2, Pa m6/mol2. */
function helmholtzIntegrand(pressurePa: number, rho: number, T: number, R: number): number {
  return (pressurePa - rho * R * T) / (rho * rho);
}

/** The s_res integrand (rho R - (dP/dT)_rho)/rho^2, in Pa m6/(mol2 K). */
function entropyIntegrand(slopePaPerK: number, rho: number, R: number): number {
  return (rho * R - slopePaPerK) / (rho * rho);
}

/**
 * The two integrands at the nodes, (P - rho R T)/rho^2 and (rho R - (dP/dT)_rho)/rho^2, and their
 * standard deviations (from those of P and the slope; undefined when the nodes carry none).
 */
export function isothermIntegrands(
  nodes: IsothermNodes,
  gasConstant: number,
): { fA: number[]; fS: number[]; sA?: number[]; sS?: number[] } {
  const T = nodes.temperatureK;
  const R = gasConstant;
  const rho = nodes.densityMolPerM3;
  const uP = nodes.uPressurePa;
  const uS = nodes.uSlopePaPerK;
  return {
    fA: rho.map((r, k) => helmholtzIntegrand(nodes.pressurePa[k], r, T, R)),
    fS: rho.map((r, k) => entropyIntegrand(nodes.slopePaPerK[k], r, R)),
    sA: uP ? rho.map((r, k) => uP[k] / (r * r)) : undefined,
    sS: uS ? rho.map((r, k) => uS[k] / (r * r)) : undefined,
  };
}

/** Departures along one isotherm from its nodes (see the header). */
export function integrateIsotherm(
  nodes: IsothermNodes,
  options: IntegrateIsothermOptions,
): IsothermDepartures {
  const T = nodes.temperatureK;
  const R = options.gasConstant;
  const rho = nodes.densityMolPerM3;
  const { fA, fS, sA, sS } = isothermIntegrands(nodes, R);
  const frozen = options.frozenBridges;
  const bridgeA = frozen
    ? frozen.a.apply(fA)
    : lowDensityBridge(rho, fA, sA, {
        ...options.bridge,
        degree: options.bridgeDegrees?.a ?? options.bridge?.degree,
      });
  const bridgeS = frozen
    ? frozen.s.apply(fS)
    : lowDensityBridge(rho, fS, sS, {
        ...options.bridge,
        degree: options.bridgeDegrees?.s ?? options.bridge?.degree,
      });
  const qA = cumulativeIrregular(rho, fA);
  const qS = cumulativeIrregular(rho, fS);
  const departures = rho.map((r, k) => {
    const Z = nodes.pressurePa[k] / (r * R * T);
    return departuresFromIntegrals(
      T,
      Z,
      bridgeA.integral + qA.values[k],
      bridgeS.integral + qS.values[k],
      R,
    );
  });
  const RT = R * T;
  return {
    temperatureK: T,
    departures,
    quadratureError: rho.map((_, k) => ({
      a: qA.errorEstimates[k],
      s: qS.errorEstimates[k],
    })),
    bridgeA,
    bridgeS,
    B: bridgeA.coefficients[0] / RT,
    uB: Math.hypot(bridgeA.coefficientUncertainties[0], bridgeA.truncationAtZero) / RT,
    ...(bridgeA.degree >= 1
      ? {
          C: bridgeA.coefficients[1] / RT,
          uC: bridgeA.coefficientUncertainties[1] / RT,
        }
      : {}),
  };
}

/**
 * One isotherm's integration with its nodes, bridges and quadrature weights fixed: a map from
 * the nodes' P and (dP/dT)_rho to the departures, B and C, for re-evaluation at other pressures
 * (uncertainty propagation) without fitting or allocating per node. The same integrals as
 * {@link integrateIsotherm} with frozen bridges, as weights.
 */
export interface FrozenIsothermMap {
  /** Number of values written: six departures per node (DEPARTURE_KEYS order), then B and C. */
  readonly length: number;
  /** Writes the values for these node values at `out[offset ...]` (C = 0 when the bridge has none). */
  evaluate(
    pressurePa: ArrayLike<number>,
    slopePaPerK: ArrayLike<number>,
    out: Float64Array,
    offset: number,
  ): void;
}

/** Freezes the integration of one isotherm (nodes' densities and temperature) with frozen bridges. */
export function freezeIsotherm(
  temperatureK: number,
  densityMolPerM3: readonly number[],
  bridges: { a: FrozenBridge; s: FrozenBridge },
  gasConstant: number,
): FrozenIsothermMap {
  const T = temperatureK;
  const R = gasConstant;
  const RT = R * T;
  const rho = densityMolPerM3;
  const n = rho.length;
  const weights = cumulativeIrregularWeights(rho);
  const fA = new Float64Array(n);
  const fS = new Float64Array(n);
  const bA = bridges.a;
  const bS = bridges.s;
  const hasC = bA.coefficientWeights.length > 1;
  const dot = (w: Float64Array, f: Float64Array): number => {
    let v = 0;
    for (let j = 0; j < w.length; j++) v += w[j] * f[j];
    return v;
  };
  return {
    length: 6 * n + 2,
    evaluate(pressurePa, slopePaPerK, out, offset) {
      for (let k = 0; k < n; k++) {
        fA[k] = helmholtzIntegrand(pressurePa[k], rho[k], T, R);
        fS[k] = entropyIntegrand(slopePaPerK[k], rho[k], R);
      }
      let A = dot(bA.integralWeights, fA);
      let S = dot(bS.integralWeights, fS);
      for (let k = 0; k < n; k++) {
        if (k > 0) {
          // interval k - 1 (nodes k - 2 .. k + 1)
          const i = k - 1;
          for (let q = 0; q < 4; q++) {
            const j = i - 1 + q;
            if (j < 0 || j >= n) continue;
            A += weights[4 * i + q] * fA[j];
            S += weights[4 * i + q] * fS[j];
          }
        }
        const d = departuresFromIntegrals(T, pressurePa[k] / (rho[k] * RT), A, S, R);
        const at = offset + 6 * k;
        out[at] = d.a;
        out[at + 1] = d.s;
        out[at + 2] = d.u;
        out[at + 3] = d.h;
        out[at + 4] = d.g;
        out[at + 5] = d.lnPhi;
      }
      out[offset + 6 * n] = dot(bA.coefficientWeights[0], fA) / RT;
      out[offset + 6 * n + 1] = hasC ? dot(bA.coefficientWeights[1], fA) / RT : 0;
    },
  };
}
