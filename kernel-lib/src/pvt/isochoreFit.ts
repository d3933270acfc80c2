/**
 * Smoothing fit along one isochore: P(T) as a weighted polynomial in the centred, scaled
 * temperature x = (T - Tmid)/halfRange (keeps the normal equations well conditioned), order chosen
 * by AICc (selectByAicc.ts) unless fixed. Gives P and the isochoric slope (dP/dT)_rho with their
 * standard uncertainties from the coefficient covariance (JCGM 100:2008 eq. 13).
 */
import { powerRow } from "../numerics/powerRow.js";
import { InputError } from "../errors.js";
import { extent } from "../numerics/extent.js";
import { fitDiagnostics } from "./fitDiagnostics.js";
import type { FitDiagnostics } from "./fitDiagnostics.js";
import { aicc } from "../numerics/aicc.js";
import { weightedLeastSquares } from "../numerics/weightedLeastSquares.js";
import type { WeightedLeastSquaresResult } from "../numerics/weightedLeastSquares.js";

/** Options of {@link fitIsochore}. */
export interface IsochoreFitOptions {
  /** Fixed polynomial order (1 = linear in T). Default: chosen by AICc up to `maxOrder`. */
  order?: number;
  /** Highest order tried. Default 6. */
  maxOrder?: number;
  /**
   * Lowest order tried. Default 2 when the isochore has 4 or more distinct temperatures, else 1:
   * the slope (dP/dT)_rho is what the route needs, and a straight line, which AICc often prefers
   * on short noisy isochores, biases the slope at the ends of the range by the neglected curvature
   * (model-selection bias that the stated uncertainty cannot cover; seen in the coverage test).
   */
  minOrder?: number;
}

/** A smoothing fit P(T) along one isochore (see the header). */
export interface IsochoreFit {
  /** The isochore's density, mol/m3. */
  readonly densityMolPerM3: number;
  readonly order: number;
  /** Number of distinct temperatures on the isochore (the highest admissible order is one less). */
  readonly distinctTemperatures: number;
  readonly minTemperatureK: number;
  readonly maxTemperatureK: number;
  readonly diagnostics: FitDiagnostics;
  /** Residual pressures (measured - fitted), Pa, in the order the points were given. */
  readonly residualsPa: readonly number[];
  /** Standard deviation used for each point, Pa (stated, or from the scatter). */
  readonly sigmaPa: readonly number[];
  /** P (Pa) and dP/dT (Pa/K) at T, with standard uncertainties. */
  /** (d2P/dT2)_rho at T, Pa/K2, with its standard uncertainty (0 for a straight line). */
  curvature(temperatureK: number): { curvaturePaPerK2: number; uCurvaturePaPerK2: number };
  /**
   * The same data fitted again with other options (e.g. `{ order: this.order + 1 }`), for
   * estimates of the fit-order (model) error.
   */
  refit(options: IsochoreFitOptions): IsochoreFit;
  evaluate(temperatureK: number): {
    pressurePa: number;
    slopePaPerK: number;
    uPressurePa: number;
    uSlopePaPerK: number;
  };
  /**
   * Covariance of the smoothed P and (dP/dT)_rho at T from the (scaled) coefficient covariance:
   * variances Pa2 and Pa2/K2, and their covariance Pa2/K.
   */
  covarianceAt(temperatureK: number): { pressure: number; slope: number; cross: number };
  /**
   * The same fit (same order and weights) with every pressure moved by `deltaPressuresPa` (in
   * the order the points were given): the fit is linear in the pressures, so this is the fitted
   * polynomial plus the fit of the deltas, C X^T W delta (C the unscaled covariance), without a
   * new factorisation. Returns P and (dP/dT)_rho of the moved fit at T.
   */
  shifted(deltaPressuresPa: ArrayLike<number>): (temperatureK: number) => {
    pressurePa: number;
    slopePaPerK: number;
  };
}

/** Fits P(T) on one isochore; `sigmaPa` undefined means unit weights with the scale from the scatter. */
export function fitIsochore(
  densityMolPerM3: number,
  temperaturesK: readonly number[],
  pressuresPa: readonly number[],
  sigmaPa: readonly number[] | undefined,
  options: IsochoreFitOptions = {},
): IsochoreFit {
  const n = temperaturesK.length;
  const distinct = new Set(temperaturesK.map((t) => t.toPrecision(10))).size;
  if (!(distinct >= 2)) {
    throw new InputError({
      input: `isochore ${densityMolPerM3.toPrecision(6)} mol/m3`,
      unit: "-",
      validRange: "at least 2 distinct temperatures",
      received: distinct,
    });
  }
  const { min: tMin, max: tMax } = extent(temperaturesK);
  const mid = 0.5 * (tMin + tMax);
  const half = 0.5 * (tMax - tMin);
  const xs = temperaturesK.map((t) => (t - mid) / half);
  const scaleKnown = sigmaPa !== undefined;
  const sigma = sigmaPa ?? temperaturesK.map(() => 1);
  const orders: number[] = [];
  if (options.order !== undefined) orders.push(options.order);
  else {
    const lo = Math.min(options.minOrder ?? (distinct >= 4 ? 2 : 1), distinct - 1);
    for (let k = lo; k <= Math.min(options.maxOrder ?? 6, distinct - 1); k++) orders.push(k);
  }
  let best: { score: number; order: number; fit: WeightedLeastSquaresResult } | undefined;
  for (const order of orders) {
    if (order + 1 > distinct) continue;
    const design = xs.map((x) => powerRow(x, order + 1));
    const fit = weightedLeastSquares(design, pressuresPa, sigma);
    const raw = aicc(fit.chiSquare, n, order + 1, scaleKnown);
    // Infinity when n - k - 1 <= 0: keep the lowest such order only as a last resort.
    const score = Number.isFinite(raw) ? raw : 1e300 + order;
    if (!best || score < best.score) best = { score, order, fit };
  }
  if (!best) {
    throw new InputError({
      input: `isochore ${densityMolPerM3.toPrecision(6)} mol/m3 order`,
      unit: "-",
      validRange: `at most ${distinct - 1} (distinct temperatures - 1)`,
      received: options.order,
    });
  }
  const { order, fit } = best;
  const dof = fit.degreesOfFreedom;
  const red = dof > 0 ? fit.chiSquare / dof : Number.NaN;
  // Stated sigmas: enlarge when the scatter is larger (Birge ratio); unknown: scale from the scatter.
  const factor = scaleKnown ? (dof > 0 ? Math.max(1, red) : 1) : dof > 0 ? red : 0;
  const cov = fit.covariance.map((r) => r.map((v) => v * factor));
  const sortIdx = temperaturesK
    .map((_, i) => i)
    .sort((a, b) => temperaturesK[a] - temperaturesK[b]);
  const diagnostics = fitDiagnostics(
    `isochore ${densityMolPerM3.toPrecision(6)} mol/m3 (order ${order})`,
    fit,
    sortIdx.map((i) => fit.normalizedResiduals[i]),
    scaleKnown ? "stated" : "from-scatter",
  );
  const c = fit.coefficients;
  const usedSigma = scaleKnown
    ? sigma.map((s) => s * Math.sqrt(Math.max(1, dof > 0 ? red : 1)))
    : sigma.map(() => Math.sqrt(factor));
  return {
    densityMolPerM3,
    order,
    distinctTemperatures: distinct,
    minTemperatureK: tMin,
    maxTemperatureK: tMax,
    diagnostics,
    residualsPa: fit.residuals,
    sigmaPa: usedSigma,
    refit(other: IsochoreFitOptions) {
      return fitIsochore(densityMolPerM3, temperaturesK, pressuresPa, sigmaPa, other);
    },
    evaluate(temperatureK: number) {
      const x = (temperatureK - mid) / half;
      const gP = c.map((_, j) => x ** j);
      const gS = c.map((_, j) => (j === 0 ? 0 : (j * x ** (j - 1)) / half));
      const quad = (g: number[]) => {
        let v = 0;
        for (let i = 0; i < g.length; i++)
          for (let j = 0; j < g.length; j++) v += g[i] * cov[i][j] * g[j];
        return Math.sqrt(Math.max(v, 0));
      };
      let P = 0;
      let S = 0;
      for (let j = 0; j < c.length; j++) {
        P += c[j] * gP[j];
        S += c[j] * gS[j];
      }
      return { pressurePa: P, slopePaPerK: S, uPressurePa: quad(gP), uSlopePaPerK: quad(gS) };
    },
    covarianceAt(temperatureK: number) {
      const x = (temperatureK - mid) / half;
      const gP = c.map((_, j) => x ** j);
      const gS = c.map((_, j) => (j === 0 ? 0 : (j * x ** (j - 1)) / half));
      let pressure = 0;
      let slope = 0;
      let cross = 0;
      for (let i = 0; i < c.length; i++) {
        for (let j = 0; j < c.length; j++) {
          const v = cov[i][j];
          pressure += gP[i] * v * gP[j];
          slope += gS[i] * v * gS[j];
          cross += gP[i] * v * gS[j];
        }
      }
      return { pressure: Math.max(pressure, 0), slope: Math.max(slope, 0), cross };
    },
    shifted(deltaPressuresPa: ArrayLike<number>) {
      const k = c.length;
      const rhs = new Float64Array(k);
      for (let i = 0; i < n; i++) {
        const w = deltaPressuresPa[i] / (sigma[i] * sigma[i]);
        let xj = 1;
        for (let j = 0; j < k; j++) {
          rhs[j] += xj * w;
          xj *= xs[i];
        }
      }
      const moved = c.slice();
      for (let a = 0; a < k; a++) {
        let d = 0;
        for (let b = 0; b < k; b++) d += fit.covariance[a][b] * rhs[b];
        moved[a] += d;
      }
      return (temperatureK: number) => {
        const x = (temperatureK - mid) / half;
        let P = 0;
        let S = 0;
        let xj = 1;
        for (let j = 0; j < k; j++) {
          P += moved[j] * xj;
          if (j + 1 < k) S += (j + 1) * moved[j + 1] * xj;
          xj *= x;
        }
        return { pressurePa: P, slopePaPerK: S / half };
      };
    },
    curvature(temperatureK: number) {
      const x = (temperatureK - mid) / half;
      const g = c.map((_, j) => (j < 2 ? 0 : (j * (j - 1) * x ** (j - 2)) / (half * half)));
      let v = 0;
      let C = 0;
      for (let i = 0; i < g.length; i++) {
        C += c[i] * g[i];
        for (let j = 0; j < g.length; j++) v += g[i] * cov[i][j] * g[j];
      }
      return { curvaturePaPerK2: C, uCurvaturePaPerK2: Math.sqrt(Math.max(v, 0)) };
    },
  };
}
