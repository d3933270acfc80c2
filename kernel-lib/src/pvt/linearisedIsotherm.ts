/**
 * Linearised (first-order, JCGM 100:2008 eq. 10) standard uncertainties of the departures along one
 * isotherm of the isochore route, from the covariance of every node's smoothed P and (dP/dT)_rho,
 * in time proportional to the number of nodes.
 *
 * With the bridge degrees and weights frozen, a_res and s_res at node k are linear in the node
 * values: a_k = sum_j (wA_j + q_kj) fA_j with fA_j = (P_j - rho_j R T)/rho_j^2, s_k likewise with
 * fS_j = (rho_j R - (dP/dT)_j)/rho_j^2, where w are the bridge's weights (its integral applied to
 * unit integrands, lowDensityBridge.ts) and q_kj the cumulative quadrature weights
 * (cumulativeIrregular.ts applied to unit integrands over a 7-node window: node j enters the four
 * intervals around it, so q_kj = 0 for k <= j - 2 and equals the total weight Q_j for k >= j + 2).
 * Different isochores are independent, so u^2(o_k) = sum_j g_kj^T V_j g_kj with V_j the 2 x 2
 * covariance of (P_j, (dP/dT)_j) and g_kj the gradient of output o_k; the terms with j <= k - 2
 * share Q_j and come from prefix sums. The other departures (u, h, g, ln phi) depend on a_res,
 * s_res and Z = P/(rho R T) through departuresFromIntegrals (departureSet.ts), whose Jacobian is
 * taken by central differences. Exact where the route is linear (all but the ln Z term of g and
 * ln phi), as the sum over one-sigma pressure steps it replaces; there it differs from that
 * secant by second-order terms.
 */
import { cumulativeIrregular } from "../numerics/cumulativeIrregular.js";
import { DEPARTURE_KEYS, departuresFromIntegrals } from "./departureSet.js";
import type { IsothermDepartures } from "./integrateIsotherm.js";
import type { FrozenBridge } from "./lowDensityBridge.js";

/** Covariance of a node's smoothed P (Pa2), slope (Pa2/K2) and their cross term (Pa2/K). */
export interface NodeCovariance {
  pressure: number;
  slope: number;
  cross: number;
}

/** One isotherm: its nodes, their covariances, the nominal integration and the frozen bridge. */
export interface LinearisedIsothermInput {
  temperatureK: number;
  densityMolPerM3: readonly number[];
  pressurePa: readonly number[];
  covariance: readonly NodeCovariance[];
  nominal: IsothermDepartures;
  /** The bridges of the a and s integrands, frozen at the nominal fits. */
  bridges: { a: FrozenBridge; s: FrozenBridge };
  gasConstant: number;
}

/**
 * Standard uncertainties in the order of the route's flattened values: the six departures
 * (DEPARTURE_KEYS) of every node, then B and C (0 when the bridge has no C).
 */
export function linearisedIsotherm(input: LinearisedIsothermInput): Float64Array {
  const { temperatureK: T, densityMolPerM3: rho, covariance: V, gasConstant: R } = input;
  const RT = R * T;
  const N = rho.length;
  const bA = input.bridges.a;
  const bS = input.bridges.s;
  const m = bA.integralWeights.length;
  const mS = bS.integralWeights.length;
  const zero = new Float64Array(m);
  const wA = {
    integral: bA.integralWeights,
    c0: bA.coefficientWeights[0] ?? zero,
    c1: bA.coefficientWeights[1] ?? zero,
  };
  // Quadrature weights of node j: partial ones at nodes j-1..j+1, the total beyond.
  const lo = new Int32Array(N);
  const partial: number[][] = [];
  const total = new Float64Array(N);
  for (let j = 0; j < N; j++) {
    const a = Math.max(0, j - 3);
    const b = Math.min(N - 1, j + 3);
    const unit = new Array<number>(b - a + 1).fill(0);
    unit[j - a] = 1;
    const values = cumulativeIrregular(rho.slice(a, b + 1), unit).values;
    lo[j] = a;
    partial.push(values);
    total[j] = values[b - a];
  }
  const q = (k: number, j: number): number => {
    if (k <= j - 2) return 0;
    if (k >= j + 2) return total[j];
    return partial[j][k - lo[j]];
  };
  const alphaA = (k: number, j: number) => ((j < m ? wA.integral[j] : 0) + q(k, j)) / rho[j] ** 2;
  const alphaS = (k: number, j: number) =>
    -((j < mS ? bS.integralWeights[j] : 0) + q(k, j)) / rho[j] ** 2;
  // Prefix sums over j of the terms with the total weights (k-independent).
  const pAA = new Float64Array(N);
  const pAS = new Float64Array(N);
  const pSS = new Float64Array(N);
  for (let j = 0; j < N; j++) {
    const a = alphaA(N + 2, j);
    const s = alphaS(N + 2, j);
    pAA[j] = (j > 0 ? pAA[j - 1] : 0) + a * a * V[j].pressure;
    pAS[j] = (j > 0 ? pAS[j - 1] : 0) + a * s * V[j].cross;
    pSS[j] = (j > 0 ? pSS[j - 1] : 0) + s * s * V[j].slope;
  }
  const keys = DEPARTURE_KEYS.length;
  const out = new Float64Array(N * keys + 2);
  for (let k = 0; k < N; k++) {
    const d = input.nominal.departures[k];
    const Z = input.pressurePa[k] / (rho[k] * RT);
    const jac = jacobian(T, Z, d.a, d.s, R);
    for (let o = 0; o < keys; o++) {
      const dA = jac.dA[o];
      const dS = jac.dS[o];
      const dP = jac.dZ[o] / (rho[k] * RT);
      let v = k >= 2 ? dA * dA * pAA[k - 2] + 2 * dA * dS * pAS[k - 2] + dS * dS * pSS[k - 2] : 0;
      const last = Math.max(k + 1, m - 1, mS - 1);
      for (let j = Math.max(0, k - 1); j <= last && j < N; j++) {
        const a = dA * alphaA(k, j) + (j === k ? dP : 0);
        const s = dS * alphaS(k, j);
        v += a * a * V[j].pressure + 2 * a * s * V[j].cross + s * s * V[j].slope;
      }
      out[k * keys + o] = Math.sqrt(Math.max(v, 0));
    }
  }
  let vB = 0;
  let vC = 0;
  for (let j = 0; j < m; j++) {
    const gB = wA.c0[j] / (rho[j] * rho[j] * RT);
    const gC = wA.c1[j] / (rho[j] * rho[j] * RT);
    vB += gB * gB * V[j].pressure;
    vC += gC * gC * V[j].pressure;
  }
  out[N * keys] = Math.sqrt(vB);
  out[N * keys + 1] = input.nominal.C !== undefined ? Math.sqrt(vC) : 0;
  return out;
}

/** d(departures)/d(a_res, s_res, Z) at one node by central differences, in DEPARTURE_KEYS order. */
function jacobian(
  T: number,
  Z: number,
  a: number,
  s: number,
  R: number,
): { dA: number[]; dS: number[]; dZ: number[] } {
  const column = (da: number, ds: number, dz: number, h: number): number[] => {
    const up = departuresFromIntegrals(T, Z + dz, a + da, s + ds, R);
    const down = departuresFromIntegrals(T, Z - dz, a - da, s - ds, R);
    return DEPARTURE_KEYS.map((key) => (up[key] - down[key]) / (2 * h));
  };
  const hA = 1e-6 * (Math.abs(a) + R * T);
  const hS = 1e-6 * (Math.abs(s) + R);
  const hZ = 1e-6 * Z;
  return {
    dA: column(hA, 0, 0, hA),
    dS: column(0, hS, 0, hS),
    dZ: column(0, 0, hZ, hZ),
  };
}
