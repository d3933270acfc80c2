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
 * error O(h^2) (about 1e-10 for smooth mixing rules) plus rounding eps/h (about 2e-11 per node,
 * which integrated against 1/rho over many decades of density limits ln phi of a mixture to about
 * 1e-9 absolute; pure fluids need no differencing).
 *
 * Series start: the integrand (Z-1)/rho' tends to the second virial coefficient B as rho' -> 0,
 * but computed from P it loses digits there (Z - 1 is a difference of nearly equal numbers: at
 * |Z - 1| = 1e-12 only four digits remain). So below a switch density rho_s, chosen where
 * |Z - 1| is about 1e-6 (ten digits left), each integrand is replaced by its virial series to
 * second order, F(rho') = c0 + c1 rho' + c2 rho'^2, fitted through rho_s/4, rho_s/2 and rho_s and
 * integrated exactly; the neglected cubic term is of relative size (B rho_s)^3 ~ 1e-18, and the
 * quadratic term itself, |c2| r^3 / 3, is reported as the error estimate of that piece (a
 * conservative bound). This also gives full relative accuracy at densities far below rho_s.
 * Above rho_s: adaptive Gauss-Kronrod 7-15 (numerics/gaussKronrod.ts, QUADPACK QAG). When the
 * model has a finite maximum density rho_max (close packing), the variable is changed to
 * s = -ln(1 - rho'/rho_max), drho' = (rho_max - rho') ds, which removes the 1/(rho_max - rho')
 * growth of the repulsive term and keeps dense liquids cheap.
 */
import { R as R_CODATA } from "../constants.js";
import { integrateAdaptive } from "../numerics/gaussKronrod.js";
import type {
  IntegratedResidual,
  IntegrationErrors,
  ResidualDerivativesDraft,
} from "../eos/types.js";
import { pressureFromResidual } from "../eos/residualRelations.js";
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
// IntegrationErrors and IntegratedResidual (the result of integrateResidual) are declared with the
// model interface (eos/types.ts), where a pressure-function model's `integrate` returns them
export type { IntegrationErrors, IntegratedResidual };

const COMPOSITION_STEP = 1e-5;

/** F(rho') ~ c0 + c1 rho' + c2 rho'^2 below the switch density (see the header). */
export interface SeriesStart {
  /** Switch density rho_s, mol/m3. */
  readonly densityMolPerM3: number;
  /** c0 of the three integrands [alpha, T alpha_T, T^2 alpha_TT] (units of 1/rho). */
  readonly c0: Float64Array;
  /** c1 of the three integrands. */
  readonly c1: Float64Array;
  /** c2 of the three integrands. */
  readonly c2: Float64Array;
}

/** Quadratic through (r/4, f1), (r/2, f2), (r, f3): coefficients [c0, c1, c2] of c0 + c1 t + c2 t^2. */
export function quadraticThrough(
  r: number,
  f1: number,
  f2: number,
  f3: number,
): [number, number, number] {
  // Newton divided differences on t1 = r/4, t2 = r/2, t3 = r
  const t1 = 0.25 * r;
  const t2 = 0.5 * r;
  const d12 = (f2 - f1) / (t2 - t1);
  const d23 = (f3 - f2) / (r - t2);
  const c2 = (d23 - d12) / (r - t1);
  const c1 = d12 - c2 * (t1 + t2);
  const c0 = f1 - c1 * t1 - c2 * t1 * t1;
  return [c0, c1, c2];
}

/** Integral of c0 + c1 t + c2 t^2 over [0, r] and the size of its quadratic part. */
function seriesPiece(
  c0: number,
  c1: number,
  c2: number,
  r: number,
): { value: number; error: number } {
  const q = (c2 * r * r * r) / 3;
  return { value: c0 * r + 0.5 * c1 * r * r + q, error: Math.abs(q) };
}

/** The integrands along one isotherm, in the integration variable u (see the header). */
export interface IsothermIntegrands {
  /** u at density rho (mol/m3). */
  toVariable(densityMolPerM3: number): number;
  /** rho' at u. */
  densityAt(u: number): number;
  /** drho'/du at u. */
  jacobianAt(u: number): number;
  /**
   * Integrands at u, times drho'/du: [alpha_r, T dalpha_r/dT, T^2 d2alpha_r/dT2, and the
   * finite-difference error bounds of the last two], memoised by u so the three quadratures share
   * their nodes.
   */
  values(u: number): Float64Array;
  /** The series start below rho_s. */
  readonly series: SeriesStart;
  /** Integral of the series over [0, r] (r <= rho_s) for integrand k, with its error bound. */
  seriesIntegral(k: number, r: number): { value: number; error: number };
  /** Pressure evaluations so far. */
  evaluations(): number;
  /** Memoised node values (for the finite-difference error bound). */
  readonly memo: Map<number, Float64Array>;
}

/** Integrands without the Jacobian at density rho' (written into out[0..4]). */
function rawIntegrands(
  evaluator: PressureEvaluator,
  T: number,
  r: number,
  x: readonly number[],
  RT: number,
  series: PressureSeries,
  out: Float64Array,
): void {
  evaluator.alongTemperature(T, r, x, series);
  const inv = 1 / (r * r * RT);
  out[0] = (series.p / (r * RT) - 1) / r;
  out[1] = (T * series.d1 - series.p) * inv;
  out[2] = (T * T * series.d2 - 2 * T * series.d1 + 2 * series.p) * inv;
  out[3] = T * series.d1Error * inv;
  out[4] = T * T * series.d2Error * inv;
}

/**
 * Switch density where |Z - 1| is about 1e-6, found from the slope of Z - 1 at a probe density
 * (two refinements), capped at half the close-packing density and at 1e8 times the probe.
 */
function switchDensity(
  zMinusOne: (r: number) => number,
  probe: number,
  rhoMax: number,
  probeZMinusOne?: number,
): number {
  const cap = Math.min(Number.isFinite(rhoMax) ? 0.5 * rhoMax : Infinity, probe * 1e8);
  let r = Math.min(probe, cap);
  // a known Z - 1 at the probe well above the target (1e-4) places rho_s in one step: the series
  // region is where Z - 1 is linear in rho, and a factor of ten either way is harmless
  if (probeZMinusOne !== undefined && r === probe && Math.abs(probeZMinusOne) >= 1e-4) {
    return (r * 1e-6) / Math.abs(probeZMinusOne);
  }
  for (let k = 0; k < 3; k++) {
    const z = Math.abs(zMinusOne(r));
    if (!(z > 0)) return Math.min(cap, r * 1e4);
    const next = Math.min(cap, (r * 1e-6) / z);
    if (Math.abs(next / r - 1) < 0.5) return next;
    r = next;
  }
  return r;
}

/** Builds the integrands of one isotherm (T, x), with the close-packing change of variable. */
export function isothermIntegrands(
  evaluator: PressureEvaluator,
  temperatureK: number,
  x: readonly number[],
  gasConstant: number,
  maxDensityMolPerM3: number,
  probeDensityMolPerM3: number,
  probeZMinusOne?: number,
): IsothermIntegrands {
  const T = temperatureK;
  const RT = gasConstant * T;
  const rhoMax = maxDensityMolPerM3;
  const transformed = Number.isFinite(rhoMax);
  const densityAt = (u: number): number => (transformed ? -rhoMax * Math.expm1(-u) : u);
  const jacobianAt = (u: number): number => (transformed ? rhoMax * Math.exp(-u) : 1);
  let count = 0;
  const ps: PressureSeries = { p: 0, d1: 0, d2: 0, d1Error: 0, d2Error: 0 };
  const rs = switchDensity(
    (r) => {
      count++;
      return evaluator.value(T, r, x) / (r * RT) - 1;
    },
    probeDensityMolPerM3,
    rhoMax,
    probeZMinusOne,
  );
  const f1 = new Float64Array(5);
  const f2 = new Float64Array(5);
  const f3 = new Float64Array(5);
  rawIntegrands(evaluator, T, 0.25 * rs, x, RT, ps, f1);
  rawIntegrands(evaluator, T, 0.5 * rs, x, RT, ps, f2);
  rawIntegrands(evaluator, T, rs, x, RT, ps, f3);
  count += 3;
  const c0 = new Float64Array(3);
  const c1 = new Float64Array(3);
  const c2 = new Float64Array(3);
  for (let k = 0; k < 3; k++) {
    [c0[k], c1[k], c2[k]] = quadraticThrough(rs, f1[k], f2[k], f3[k]);
  }
  const memo = new Map<number, Float64Array>();
  const raw = new Float64Array(5);
  const values = (u: number): Float64Array => {
    let v = memo.get(u);
    if (v) return v;
    const r = densityAt(u);
    const j = jacobianAt(u);
    rawIntegrands(evaluator, T, r, x, RT, ps, raw);
    count++;
    v = new Float64Array(5);
    for (let k = 0; k < 5; k++) v[k] = j * raw[k];
    memo.set(u, v);
    return v;
  };
  return {
    toVariable: (rho) => (transformed ? -Math.log1p(-rho / rhoMax) : rho),
    densityAt,
    jacobianAt,
    values,
    series: { densityMolPerM3: rs, c0, c1, c2 },
    seriesIntegral: (k, r) => seriesPiece(c0[k], c1[k], c2[k], r),
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
 * Endpoint derivatives, taken from the series start when rho is below the switch density (where
 * Z - 1 computed from P would have lost its digits): with Z - 1 = rho F(rho), F = c0 + c1 rho +
 * c2 rho^2, aD = rho F, aDD = rho^2 F', aDDD = rho^3 F'', aDT = rho F_T (the second integrand).
 */
export function endpointWithSeries(
  evaluator: PressureEvaluator,
  line: IsothermIntegrands,
  temperatureK: number,
  densityMolPerM3: number,
  x: readonly number[],
  gasConstant: number,
): EndpointDerivatives {
  const rho = densityMolPerM3;
  const s = line.series;
  if (!(rho < s.densityMolPerM3))
    return endpointDerivatives(evaluator, temperatureK, rho, x, gasConstant);
  const F = s.c0[0] + s.c1[0] * rho + s.c2[0] * rho * rho;
  const aD = rho * F;
  return {
    pressurePa: pressureFromResidual(temperatureK, rho, aD, gasConstant),
    aD,
    aDD: rho * rho * (s.c1[0] + 2 * s.c2[0] * rho),
    aDDD: 2 * s.c2[0] * rho * rho * rho,
    aDT: rho * (s.c0[1] + s.c1[1] * rho + s.c2[1] * rho * rho),
  };
}

/** Quadrature tolerances of one integral; looser where the integrand carries differencing noise. */
function tolerances(
  options: IntegrationOptions,
  noisy: boolean,
): { relTolerance: number; absTolerance: number; maxSubdivisions: number } {
  const rel = options.relTolerance ?? 1e-11;
  const abs = options.absTolerance ?? 1e-14;
  return {
    relTolerance: noisy ? Math.max(rel, 1e-9) : rel,
    absTolerance: noisy ? Math.max(abs, 1e-12) : abs,
    maxSubdivisions: options.maxSubdivisions ?? 200,
  };
}

/**
 * Integral of integrand k of `line` from 0 to rho: the series below rho_s, quadrature above.
 * Returns { value, errorEstimate }.
 */
export function integrateFromZero(
  line: IsothermIntegrands,
  k: number,
  fromDensity: number,
  toDensity: number,
  quad: { relTolerance: number; absTolerance: number; maxSubdivisions: number },
): { value: number; errorEstimate: number } {
  const rs = line.series.densityMolPerM3;
  let value = 0;
  let err = 0;
  if (fromDensity < rs) {
    const top = line.seriesIntegral(k, Math.min(rs, toDensity));
    const bottom = line.seriesIntegral(k, fromDensity);
    value += top.value - bottom.value;
    err += top.error + bottom.error;
  }
  const start = Math.max(fromDensity, rs);
  if (toDensity > start) {
    const q = integrateAdaptive(
      (u) => line.values(u)[k],
      line.toVariable(start),
      line.toVariable(toDensity),
      quad,
    );
    value += q.value;
    err += q.errorEstimate;
  }
  return { value, errorEstimate: err };
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
  // the endpoint first: its Z - 1 also places the series start
  const direct = endpointDerivatives(evaluator, T, rho, x, Rg);
  const line = isothermIntegrands(
    evaluator,
    T,
    x,
    Rg,
    rhoMax > rho ? rhoMax : Infinity,
    rho,
    direct.aD,
  );
  const exactQuad = tolerances(options, false);
  const derivQuad = tolerances(options, !evaluator.exact);
  const ia = integrateFromZero(line, 0, 0, rho, exactQuad);
  const iT = integrateFromZero(line, 1, 0, rho, derivQuad);
  const iTT = integrateFromZero(line, 2, 0, rho, derivQuad);
  const fd = finiteDifferenceBound(evaluator, line, rho);
  const end =
    rho < line.series.densityMolPerM3 ? endpointWithSeries(evaluator, line, T, rho, x, Rg) : direct;
  let evaluations = line.evaluations() + 2;
  const aD = end.aD;
  const derivatives: ResidualDerivativesDraft & { aDDD: number } = {
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
    const rs = line.series.densityMolPerM3;
    // differenced integrand: rounding noise about eps/h = 2e-11 in D_i Z per node, integrated
    // against 1/rho over many decades of density: about 1e-9 absolute at best
    const compQuad = {
      ...tolerances(options, true),
      absTolerance: Math.max(options.absTolerance ?? 0, 1e-9),
    };
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
      // D_i Z / rho' at density r
      const raw = (r: number): number => {
        if (central) {
          shift(xp, h);
          shift(xm, -h);
          evaluations += 2;
          return (zAt(xp, r) - zAt(xm, r)) / (2 * h * r);
        }
        const z0 = zAt(x, r);
        shift(xp, h);
        const z1 = zAt(xp, r);
        shift(xm, 2 * h);
        const z2 = zAt(xm, r);
        evaluations += 3;
        return (-3 * z0 + 4 * z1 - z2) / (2 * h * r);
      };
      // series start for this integrand too
      const [s0, s1, s2] = quadraticThrough(rs, raw(0.25 * rs), raw(0.5 * rs), raw(rs));
      const piece = seriesPiece(s0, s1, s2, Math.min(rs, rho));
      let value = piece.value;
      let err = piece.error;
      if (rho > rs) {
        const q = integrateAdaptive(
          (u) => line.jacobianAt(u) * raw(line.densityAt(u)),
          line.toVariable(rs),
          line.toVariable(rho),
          compQuad,
        );
        value += q.value;
        err += q.errorEstimate;
      }
      dnA[i] = derivatives.a + aD + value;
      // quadrature errors plus an assumed differencing error of 1e-9 relative
      // (h = 1e-5: truncation O(h^2) ~ 1e-10, rounding eps/h ~ 2e-11)
      dnAErrors[i] = ia.errorEstimate + err + Math.abs(value) * 1e-9;
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
 * Bound of the finite-difference error in the T-derivative integrals: the largest memoised node
 * error (per unit density) times the density range (zero for the exact hyper-dual route).
 */
export function finiteDifferenceBound(
  evaluator: PressureEvaluator,
  line: IsothermIntegrands,
  densityMolPerM3: number,
): { aT: number; aTT: number } {
  if (evaluator.exact) return { aT: 0, aTT: 0 };
  let t = 0;
  let tt = 0;
  for (const [u, v] of line.memo) {
    const j = line.jacobianAt(u);
    t = Math.max(t, Math.abs(v[3] / j));
    tt = Math.max(tt, Math.abs(v[4] / j));
  }
  return { aT: t * densityMolPerM3, aTT: tt * densityMolPerM3 };
}
