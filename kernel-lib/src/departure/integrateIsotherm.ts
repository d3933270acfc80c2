/**
 * The departure-function integrator: residual Helmholtz energy and its derivatives at (T, rho, x)
 * for ANY pressure function, by integrating along the isotherm from zero density,
 *   alpha_r      = int_0^rho (Z - 1) / rho' drho'                       (Z = P / (rho' R T))
 *   T dalpha_r/dT = int_0^rho T (dZ/dT)_rho' / rho' drho',  T dZ/dT = (T P_T - P) / (rho' R T)
 *   T^2 d2alpha_r/dT2 = int_0^rho T^2 Z_TT / rho' drho',  T^2 Z_TT = (T^2 P_TT - 2 T P_T + 2 P) / (rho' R T)
 * (the Maxwell-relation route, e.g. Smith, Van Ness & Abbott, Introduction to Chemical Engineering
 * Thermodynamics, 7th ed. (2005), section 6.2, eqs. 6.46-6.48 in residual-Gibbs form; here in
 * Helmholtz form at constant T and V). The endpoint derivatives need no integral:
 *   aD = Z - 1,  aDD = rho Z_rho - (Z - 1),  aDDD = rho^2 Z_rhorho - 2 rho Z_rho + 2 (Z - 1),
 *   aDT = T (dZ/dT)_rho.
 * Composition derivatives: d(n alpha_r)/dn_i = alpha_r + aD + D_i alpha_r, D_i the directional
 * derivative along x + h (e_i - x) (which stays on the simplex), integrated the same way with
 * D_i Z by central differences in mole fraction, h = 1e-5 (forward three-point where x_i < 2h);
 * error O(h^2) (about 1e-10 for smooth mixing rules) plus rounding eps/h (about 1e-11).
 *
 * Quadrature: adaptive Gauss-Kronrod 7-15 (numerics/gaussKronrod.ts, QUADPACK QAG). The
 * integrand (Z-1)/rho' is finite at rho' -> 0 (it tends to the second virial coefficient), and
 * the Kronrod nodes never touch 0, so no 0/0 is formed; "series start": below rho' = 1e-12 rho the
 * integrand is taken as its value at that point (the first term of its virial series), an error
 * below 1e-12 of the integral. When the model has a finite maximum density rho_max (close
 * packing), the variable is changed to s = -ln(1 - rho'/rho_max), drho' = (rho_max - rho') ds,
 * which removes the 1/(rho_max - rho') growth of the repulsive term and keeps dense liquids cheap.
 */
import { R as R_CODATA } from "../constants.js";
import { integrateAdaptive } from "../numerics/gaussKronrod.js";
import type { ResidualDerivatives } from "../eos/types.js";
import type { PressureEvaluator, PressureSeries } from "./pressureEvaluator.js";

/** Options of {@link integrateResidual}. */
export interface IntegrationOptions {
  /** Relative tolerance of each quadrature. Default 1e-11 (so departures agree to 1e-9). */
  relTolerance?: number;
  /** Absolute tolerance of each quadrature (dimensionless, like alpha_r). Default 1e-14. */
  absTolerance?: number;
  /** Maximum subintervals per quadrature. Default 200. */
  maxSubdivisions?: number;
  /** Close-packing density (mol/m3) for the change of variable; Infinity for none. Default Infinity. */
  maxDensityMolPerM3?: number;
  /** Also compute d(n alpha_r)/dn_i. Default false. */
  composition?: boolean;
  /** Gas constant, J/(mol K). Default CODATA. */
  gasConstant?: number;
}

/** Absolute error estimates of the integrated quantities (dimensionless). */
export interface IntegrationErrors {
  /** alpha_r */
  readonly a: number;
  /** T d(alpha_r)/dT, including the derivative error of a finite-difference evaluator. */
  readonly aT: number;
  /** T^2 d2(alpha_r)/dT2, same. */
  readonly aTT: number;
  /** d(n alpha_r)/dn_i, one per component (quadrature plus mole-fraction differencing). */
  readonly dnA?: readonly number[];
}

/** Result of {@link integrateResidual}. */
export interface IntegratedResidual {
  readonly derivatives: ResidualDerivatives;
  readonly errorEstimate: IntegrationErrors;
  /** Pressure-function evaluations used (hyper-dual evaluations count once). */
  readonly evaluations: number;
  /** How the temperature derivatives were obtained. */
  readonly derivativeMethod: string;
}

const COMPOSITION_STEP = 1e-5;

/** The integrands along one isotherm, in the integration variable u (see the header). */
export interface IsothermIntegrands {
  /** u at density rho (mol/m3). */
  toVariable(densityMolPerM3: number): number;
  /** rho' at u. */
  densityAt(u: number): number;
  /**
   * Integrands at u: [alpha_r, T dalpha_r/dT, T^2 d2alpha_r/dT2, and the finite-difference error
   * bounds of the last two], memoised by u so the three quadratures share their nodes.
   */
  values(u: number): Float64Array;
  /** drho'/du / rho': the Jacobian of u times the 1/rho' of the integrands. */
  weightAt(u: number, densityMolPerM3: number): number;
  /** Pressure evaluations so far. */
  evaluations(): number;
  /** Memoised node values (for the finite-difference error bound). */
  memo: Map<number, Float64Array>;
}

/** Builds the integrands of one isotherm (T, x), with the close-packing change of variable. */
export function isothermIntegrands(
  evaluator: PressureEvaluator,
  temperatureK: number,
  x: readonly number[],
  gasConstant: number,
  maxDensityMolPerM3: number,
  floorDensityMolPerM3: number,
): IsothermIntegrands {
  const T = temperatureK;
  const RT = gasConstant * T;
  const rhoMax = maxDensityMolPerM3;
  const transformed = Number.isFinite(rhoMax);
  const floor = floorDensityMolPerM3;
  const densityAt = (u: number): number => {
    const r = transformed ? -rhoMax * Math.expm1(-u) : u;
    return r < floor ? floor : r;
  };
  const weightAt = (u: number, r: number): number =>
    transformed ? (rhoMax * Math.exp(-u)) / r : 1 / r;
  let count = 0;
  const series: PressureSeries = { p: 0, d1: 0, d2: 0, d1Error: 0, d2Error: 0 };
  const memo = new Map<number, Float64Array>();
  const values = (u: number): Float64Array => {
    let v = memo.get(u);
    if (v) return v;
    const r = densityAt(u);
    const w = weightAt(u, r);
    evaluator.alongTemperature(T, r, x, series);
    count++;
    const inv = 1 / (r * RT);
    v = new Float64Array(5);
    v[0] = w * (series.p * inv - 1);
    v[1] = w * (T * series.d1 - series.p) * inv;
    v[2] = w * (T * T * series.d2 - 2 * T * series.d1 + 2 * series.p) * inv;
    v[3] = w * T * series.d1Error * inv;
    v[4] = w * T * T * series.d2Error * inv;
    memo.set(u, v);
    return v;
  };
  return {
    toVariable: (rho) => (transformed ? -Math.log1p(-rho / rhoMax) : rho),
    densityAt,
    values,
    weightAt,
    evaluations: () => count,
    memo,
  };
}

/** Endpoint quantities that need no integral: aD, aDD, aDDD, aDT (and P, Z). */
export interface EndpointDerivatives {
  pressurePa: number;
  aD: number;
  aDD: number;
  aDDD: number;
  aDT: number;
}

/** aD, aDD, aDDD, aDT at (T, rho, x) from the pressure and its derivatives (see the header). */
export function endpointDerivatives(
  evaluator: PressureEvaluator,
  temperatureK: number,
  densityMolPerM3: number,
  x: readonly number[],
  gasConstant: number,
): EndpointDerivatives {
  const T = temperatureK;
  const rho = densityMolPerM3;
  const RT = gasConstant * T;
  const series: PressureSeries = { p: 0, d1: 0, d2: 0, d1Error: 0, d2Error: 0 };
  evaluator.alongTemperature(T, rho, x, series);
  const P = series.p;
  const aD = P / (rho * RT) - 1;
  const aDT = (T * series.d1 - P) / (rho * RT);
  evaluator.alongDensity(T, rho, x, series);
  // rho Z_rho = (P_rho rho - P) / (rho RT);  rho^2 Z_rhorho = (P_rhorho rho^2 - 2 rho P_rho + 2 P) / (rho RT)
  const rhoZr = (series.d1 * rho - P) / (rho * RT);
  const rho2Zrr = (series.d2 * rho * rho - 2 * rho * series.d1 + 2 * P) / (rho * RT);
  return { pressurePa: P, aD, aDD: rhoZr - aD, aDDD: rho2Zrr - 2 * rhoZr + 2 * aD, aDT };
}

/**
 * alpha_r and all its derivatives at (T, rho, x) from a pressure function (see the header).
 *
 * @example
 * ```ts
 * const ev = hyperDualEvaluator((T, rho) => rho.mul(R).mul(T).div(rho.mul(-3e-5).add(1)));
 * integrateResidual(ev, 300, 2000, [1]).derivatives.a; // -ln(1 - b rho)
 * ```
 */
export function integrateResidual(
  evaluator: PressureEvaluator,
  temperatureK: number,
  densityMolPerM3: number,
  x: readonly number[],
  options: IntegrationOptions = {},
): IntegratedResidual {
  const T = temperatureK;
  const rho = densityMolPerM3;
  const Rg = options.gasConstant ?? R_CODATA;
  const RT = Rg * T;
  const rhoMax = options.maxDensityMolPerM3 ?? Infinity;
  const quad = {
    relTolerance: options.relTolerance ?? 1e-11,
    absTolerance: options.absTolerance ?? 1e-14,
    maxSubdivisions: options.maxSubdivisions ?? 200,
  };
  const line = isothermIntegrands(
    evaluator,
    T,
    x,
    Rg,
    rhoMax > rho ? rhoMax : Infinity,
    rho * 1e-12,
  );
  const upper = line.toVariable(rho);
  const ia = integrateAdaptive((u) => line.values(u)[0], 0, upper, quad);
  const iT = integrateAdaptive((u) => line.values(u)[1], 0, upper, quad);
  const iTT = integrateAdaptive((u) => line.values(u)[2], 0, upper, quad);
  const fd = finiteDifferenceBound(evaluator, line, upper);
  const end = endpointDerivatives(evaluator, T, rho, x, Rg);
  let evaluations = line.evaluations() + 2;
  const aD = end.aD;
  const derivatives: {
    a: number;
    aD: number;
    aDD: number;
    aT: number;
    aTT: number;
    aDT: number;
    aDDD: number;
    dnA?: number[];
  } = {
    a: ia.value,
    aD,
    aDD: end.aDD,
    aT: iT.value,
    aTT: iTT.value,
    aDT: end.aDT,
    aDDD: end.aDDD,
  };
  let dnAErrors: number[] | undefined;
  if (options.composition) {
    const n = x.length;
    const dnA = new Array<number>(n);
    dnAErrors = new Array<number>(n);
    const xp = new Array<number>(n);
    const xm = new Array<number>(n);
    for (let i = 0; i < n; i++) {
      let onVertex = true;
      for (let k = 0; k < n; k++) if ((k === i ? 1 - x[k] : -x[k]) !== 0) onVertex = false;
      if (onVertex) {
        // pure component i: the direction e_i - x is zero
        dnA[i] = derivatives.a + aD;
        dnAErrors[i] = ia.errorEstimate;
        continue;
      }
      const h = COMPOSITION_STEP;
      const central = x[i] >= 2 * h && 1 - x[i] >= 2 * h;
      const zAt = (xs: readonly number[], r: number): number =>
        evaluator.value(T, r, xs) / (r * RT);
      const shift = (target: number[], t: number): void => {
        for (let k = 0; k < n; k++) target[k] = x[k] + t * ((k === i ? 1 : 0) - x[k]);
      };
      const integrand = (u: number): number => {
        const r = line.densityAt(u);
        const w = line.weightAt(u, r);
        let dz: number;
        if (central) {
          shift(xp, h);
          shift(xm, -h);
          dz = (zAt(xp, r) - zAt(xm, r)) / (2 * h);
          evaluations += 2;
        } else {
          const z0 = zAt(x, r);
          shift(xp, h);
          const z1 = zAt(xp, r);
          shift(xm, 2 * h);
          const z2 = zAt(xm, r);
          dz = (-3 * z0 + 4 * z1 - z2) / (2 * h);
          evaluations += 3;
        }
        return w * dz;
      };
      const id = integrateAdaptive(integrand, 0, upper, quad);
      dnA[i] = derivatives.a + aD + id.value;
      // quadrature errors plus an assumed differencing error of 1e-9 relative
      // (h = 1e-5: truncation O(h^2) ~ 1e-10, rounding eps/h ~ 2e-11)
      dnAErrors[i] = ia.errorEstimate + id.errorEstimate + Math.abs(id.value) * 1e-9;
    }
    derivatives.dnA = dnA;
  }
  return {
    derivatives,
    errorEstimate: {
      a: ia.errorEstimate,
      aT: iT.errorEstimate + fd.aT,
      aTT: iTT.errorEstimate + fd.aTT,
      dnA: dnAErrors,
    },
    evaluations,
    derivativeMethod: evaluator.derivativeMethod,
  };
}

/**
 * Bound of the finite-difference error in the T-derivative integrals: the largest memoised
 * node error times the integration length (zero for the exact hyper-dual route).
 */
export function finiteDifferenceBound(
  evaluator: PressureEvaluator,
  line: IsothermIntegrands,
  length: number,
): { aT: number; aTT: number } {
  if (evaluator.exact) return { aT: 0, aTT: 0 };
  let t = 0;
  let tt = 0;
  for (const v of line.memo.values()) {
    t = Math.max(t, Math.abs(v[3]));
    tt = Math.max(tt, Math.abs(v[4]));
  }
  return { aT: t * length, aTT: tt * length };
}
