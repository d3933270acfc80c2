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
import { cumulativeIrregular } from "../numerics/cumulativeIrregular.js";
import { lowDensityBridge } from "./lowDensityBridge.js";
import type { BridgeOptions, BridgeResult, FrozenBridge } from "./lowDensityBridge.js";

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
    fA: rho.map((r, k) => (nodes.pressurePa[k] - r * R * T) / (r * r)),
    fS: rho.map((r, k) => (r * R - nodes.slopePaPerK[k]) / (r * r)),
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
    const Z = (nodes.pressurePa[k] as number) / (r * R * T);
    return departuresFromIntegrals(
      T,
      Z,
      bridgeA.integral + (qA.values[k] as number),
      bridgeS.integral + (qS.values[k] as number),
      R,
    );
  });
  const RT = R * T;
  return {
    temperatureK: T,
    departures,
    quadratureError: rho.map((_, k) => ({
      a: qA.errorEstimates[k] as number,
      s: qS.errorEstimates[k] as number,
    })),
    bridgeA,
    bridgeS,
    B: (bridgeA.coefficients[0] as number) / RT,
    uB: Math.hypot(bridgeA.coefficientUncertainties[0] as number, bridgeA.truncationAtZero) / RT,
    ...(bridgeA.degree >= 1
      ? {
          C: (bridgeA.coefficients[1] as number) / RT,
          uC: (bridgeA.coefficientUncertainties[1] as number) / RT,
        }
      : {}),
  };
}
