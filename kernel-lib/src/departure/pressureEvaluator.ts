/**
 * A pressure function and how its derivatives are obtained. Two routes:
 * - hyper-dual (exact): the engineer writes P(T, rho, x) with numerics/hyperDual.ts; seeding T
 *   (or rho) as x + eps1 + eps2 gives the value, first and second derivative with no truncation
 *   error (Fike & Alonso, AIAA 2011-886).
 * - plain numbers (less exact, labelled so): derivatives by five-point central differences,
 *   f' = [f(-2h) - 8 f(-h) + 8 f(h) - f(2h)] / (12 h),
 *   f'' = [-f(-2h) + 16 f(-h) - 30 f(0) + 16 f(h) - f(2h)] / (12 h^2)
 *   (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, 25.3.6 and 25.3.24), step
 *   h = 1e-3 T (or 1e-3 rho). Truncation is O(h^4), rounding about eps P / h^2 in f''. The
 *   three-point values are kept as well: their difference from the five-point ones is reported as
 *   an error estimate (an upper bound of the three-point error, so conservative for the five-point).
 */
import { HyperDual } from "../numerics/hyperDual.js";
import type { HyperDualPressure } from "../eos/pressureFunction.js";

export type { HyperDualPressure };

/** A pressure function on plain numbers: Pa, given T (K) and rho (mol/m3). */
export type PlainPressure = (
  temperatureK: number,
  densityMolPerM3: number,
  x: readonly number[],
) => number;

/** P and its first and second derivative along one variable. */
export interface PressureSeries {
  p: number;
  /** dP/dT (Pa/K) or dP/drho (Pa m3/mol). */
  d1: number;
  /** d2P/dT2 or d2P/drho2. */
  d2: number;
  /** Estimated absolute error of d1 (0 for the exact route). */
  d1Error: number;
  /** Estimated absolute error of d2 (0 for the exact route). */
  d2Error: number;
}

/** How the integrator reads a pressure function. */
export interface PressureEvaluator {
  /** "hyper-dual (exact)" or "finite differences (five-point, h = 1e-3 x)". */
  readonly derivativeMethod: string;
  readonly exact: boolean;
  /** P (Pa) at plain arguments. */
  value(temperatureK: number, densityMolPerM3: number, x: readonly number[]): number;
  /** P, dP/dT, d2P/dT2 at constant rho, written into out. */
  alongTemperature(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
    out: PressureSeries,
  ): void;
  /** P, dP/drho, d2P/drho2 at constant T, written into out. */
  alongDensity(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
    out: PressureSeries,
  ): void;
}

/** Exact derivatives of a hyper-dual pressure function. */
export function hyperDualEvaluator(pressure: HyperDualPressure): PressureEvaluator {
  return {
    derivativeMethod: "hyper-dual numbers (exact)",
    exact: true,
    value: (T, rho, x) => pressure(new HyperDual(T), new HyperDual(rho), x).re,
    alongTemperature(T, rho, x, out) {
      const p = pressure(new HyperDual(T, 1, 1, 0), new HyperDual(rho), x);
      out.p = p.re;
      out.d1 = p.e1;
      out.d2 = p.e12;
      out.d1Error = 0;
      out.d2Error = 0;
    },
    alongDensity(T, rho, x, out) {
      const p = pressure(new HyperDual(T), new HyperDual(rho, 1, 1, 0), x);
      out.p = p.re;
      out.d1 = p.e1;
      out.d2 = p.e12;
      out.d1Error = 0;
      out.d2Error = 0;
    },
  };
}

/** Options of {@link finiteDifferenceEvaluator}. */
export interface FiniteDifferenceOptions {
  /** Step as a fraction of the variable. Default 1e-3. */
  relativeStep?: number;
}

function fivePoint(f: (v: number) => number, v: number, step: number, out: PressureSeries): void {
  const h = step * v;
  const f0 = f(v);
  const fm1 = f(v - h);
  const fp1 = f(v + h);
  const fm2 = f(v - 2 * h);
  const fp2 = f(v + 2 * h);
  const d1 = (fm2 - 8 * fm1 + 8 * fp1 - fp2) / (12 * h);
  const d2 = (-fm2 + 16 * fm1 - 30 * f0 + 16 * fp1 - fp2) / (12 * h * h);
  const d1Three = (fp1 - fm1) / (2 * h);
  const d2Three = (fp1 - 2 * f0 + fm1) / (h * h);
  out.p = f0;
  out.d1 = d1;
  out.d2 = d2;
  out.d1Error = Math.abs(d1 - d1Three);
  out.d2Error = Math.abs(d2 - d2Three);
}

/** Derivatives of a plain-number pressure function by five-point central differences. */
export function finiteDifferenceEvaluator(
  pressure: PlainPressure,
  options: FiniteDifferenceOptions = {},
): PressureEvaluator {
  const step = options.relativeStep ?? 1e-3;
  return {
    derivativeMethod: `central finite differences (five-point, step ${step} x the variable); less exact than hyper-dual`,
    exact: false,
    value: (T, rho, x) => pressure(T, rho, x),
    alongTemperature(T, rho, x, out) {
      fivePoint((t) => pressure(t, rho, x), T, step, out);
    },
    alongDensity(T, rho, x, out) {
      fivePoint((r) => pressure(T, r, x), rho, step, out);
    },
  };
}
