/**
 * Weighted least-squares fit of the virial-type surface (virialSurface.ts) to P-V-T points, with
 * the order (density terms x temperature terms) either given or chosen by AICc (selectByAicc.ts).
 * The fitted quantity is Z - 1 = P/(rho R T) - 1, with standard deviation u(P)/(rho R T), which
 * is the pressure residual rescaled, so the weights are those of the pressures.
 */
import { R } from "../constants.js";
import { InputError } from "../errors.js";
import { extent } from "../numerics/extent.js";
import { fitDiagnostics } from "./fitDiagnostics.js";
import type { FitDiagnostics } from "./fitDiagnostics.js";
import { aicc } from "../numerics/aicc.js";
import { surfaceBasis } from "./virialSurface.js";
import type { VirialSurface } from "./virialSurface.js";
import {
  reduceLeastSquares,
  weightedLeastSquaresColumns,
} from "../numerics/weightedLeastSquares.js";
import type { ReducedLeastSquares } from "../numerics/weightedLeastSquares.js";
import type { WeightedLeastSquaresResult } from "../numerics/weightedLeastSquares.js";

/** One point of a surface fit: T (K), density (mol/m3), pressure (Pa). */
export interface SurfacePoint {
  temperatureK: number;
  densityMolPerM3: number;
  pressurePa: number;
}

/** Options of {@link fitVirialSurface}. */
export interface FitVirialSurfaceOptions {
  /** Fixed number of density terms (powers rho^1..rho^n). Default: chosen by AICc. */
  densityTerms?: number;
  /** Fixed number of temperature terms per density power (tau^0..tau^(n-1)). Default: chosen by AICc. */
  temperatureTerms?: number;
  /** Largest density-term count tried by AICc. Default 6. */
  maxDensityTerms?: number;
  /** Largest temperature-term count tried by AICc. Default 4. */
  maxTemperatureTerms?: number;
  /** Gas constant, J/(mol K). Default: CODATA R of constants.ts. */
  gasConstant?: number;
}

/** Result of {@link fitVirialSurface}: the surface, the underlying fit and its diagnostics. */
export interface VirialSurfaceFit {
  surface: VirialSurface;
  fit: WeightedLeastSquaresResult;
  diagnostics: FitDiagnostics;
  /** Pressure residuals (measured - fitted), Pa, in the order of the points. */
  pressureResidualsPa: number[];
}

/**
 * @param sigmaPa standard deviation of each pressure, Pa; pass undefined to use unit weights and
 *   take the scale from the scatter (the covariance is then multiplied by chi2/dof).
 */
export function fitVirialSurface(
  points: readonly SurfacePoint[],
  sigmaPa: readonly number[] | undefined,
  options: FitVirialSurfaceOptions = {},
): VirialSurfaceFit {
  const gas = options.gasConstant ?? R;
  const n = points.length;
  if (!(n >= 3)) {
    throw new InputError({
      input: "points",
      unit: "-",
      validRange: "at least 3 points for a surface fit",
      received: n,
    });
  }
  const temperatureScale = points.reduce((s, p) => s + p.temperatureK, 0) / n;
  const densityScale = extent(points.map((p) => p.densityMolPerM3)).max;
  const temperatures = extent(points.map((p) => p.temperatureK));
  const y = points.map((p) => p.pressurePa / (p.densityMolPerM3 * gas * p.temperatureK) - 1);
  const scaleKnown = sigmaPa !== undefined;
  const sigma = points.map(
    (p, i) => (sigmaPa ? sigmaPa[i] : p.pressurePa) / (p.densityMolPerM3 * gas * p.temperatureK),
  );
  // Unit weights in P when unknown: sigma_y = P/(rho R T) ~ Z, i.e. relative pressure weights.
  const candidates: [number, number][] = [];
  const dMax = options.densityTerms ?? options.maxDensityTerms ?? 6;
  const tMax = options.temperatureTerms ?? options.maxTemperatureTerms ?? 4;
  for (let d = options.densityTerms ?? 1; d <= dMax; d++) {
    for (let t = options.temperatureTerms ?? 1; t <= tMax; t++) candidates.push([d, t]);
  }
  const distinctT = new Set(points.map((p) => p.temperatureK.toPrecision(8))).size;
  // The "aD" basis of the largest shape, by columns (delta^i tau^j, i = 1..dMax outer, j inner, as
  // surfaceBasis builds them): every candidate shape is a subset of its columns.
  const basis = Array.from({ length: dMax * tMax }, () => new Float64Array(n));
  points.forEach((p, r) => {
    const row = surfaceBasis(
      { densityTerms: dMax, temperatureTerms: tMax, densityScale, temperatureScale },
      "aD",
      p.temperatureK,
      p.densityMolPerM3,
    );
    for (let k = 0; k < row.length; k++) basis[k][r] = row[k];
  });
  // With many points and several candidates, the candidates are compared on the problem reduced
  // by one QR of the largest basis (reduceLeastSquares: the same chi-square, n rows instead of
  // one factorisation of all points per candidate); the chosen one is then fitted to all points.
  const choosing = candidates.length > 1;
  const reduced =
    choosing && n >= REDUCE_FROM_POINTS ? reduceIfPossible(basis, y, sigma) : undefined;
  const unitSigma = reduced ? new Float64Array(reduced.qtb.length).fill(1) : undefined;
  const columnsOf = (from: readonly Float64Array[], d: number, t: number): Float64Array[] => {
    const design: Float64Array[] = [];
    for (let i = 1; i <= d; i++) for (let j = 0; j < t; j++) design.push(from[(i - 1) * tMax + j]);
    return design;
  };
  let best: { score: number; d: number; t: number } | undefined;
  let lastError: unknown;
  for (const [d, t] of candidates) {
    if (t > distinctT || d * t > n - 2) continue;
    let chiSquare: number;
    try {
      chiSquare =
        reduced && unitSigma
          ? weightedLeastSquaresColumns(columnsOf(reduced.columns, d, t), reduced.qtb, unitSigma)
              .chiSquare + reduced.residualSquare
          : weightedLeastSquaresColumns(columnsOf(basis, d, t), y, sigma).chiSquare;
    } catch (e) {
      lastError = e;
      continue;
    }
    const score = choosing ? aicc(chiSquare, n, d * t, scaleKnown) : 0;
    if (!best || score < best.score) best = { score, d, t };
  }
  if (!best) {
    throw new InputError({
      input: "points",
      unit: "-",
      validRange: "enough distinct temperatures and densities for at least one surface order",
      received:
        `${n} points at ${distinctT} temperatures` +
        (lastError instanceof Error ? ` (${lastError.message})` : ""),
    });
  }
  const fit = weightedLeastSquaresColumns(columnsOf(basis, best.d, best.t), y, sigma);
  const { d, t } = best;
  const dof = fit.degreesOfFreedom;
  const red = dof > 0 ? fit.chiSquare / dof : 1;
  const factor = scaleKnown ? Math.max(1, red) : dof > 0 ? red : 1;
  const covariance = fit.covariance.map((row) => row.map((v) => v * factor));
  const order = points
    .map((_, i) => i)
    .sort(
      (a, b) =>
        (points[a] as SurfacePoint).densityMolPerM3 - (points[b] as SurfacePoint).densityMolPerM3,
    );
  const diagnostics = fitDiagnostics(
    `surface fit (${d} density x ${t} temperature terms)`,
    fit,
    order.map((i) => fit.normalizedResiduals[i]),
    scaleKnown ? "stated" : "from-scatter",
  );
  const surface: VirialSurface = {
    densityTerms: d,
    temperatureTerms: t,
    densityScale,
    temperatureScale,
    coefficients: fit.coefficients,
    covariance,
    range: {
      minTemperatureK: temperatures.min,
      maxTemperatureK: temperatures.max,
      maxDensityMolPerM3: densityScale,
    },
  };
  return {
    surface,
    fit,
    diagnostics,
    pressureResidualsPa: points.map(
      (p, i) => fit.residuals[i] * p.densityMolPerM3 * gas * p.temperatureK,
    ),
  };
}

/** From this many points on, AICc compares the candidates on the QR-reduced problem. */
const REDUCE_FROM_POINTS = 2000;

/** The reduced problem, or undefined when the largest basis cannot be factorised (then every candidate is fitted to all points). */
function reduceIfPossible(
  basis: readonly Float64Array[],
  y: readonly number[],
  sigma: readonly number[],
): ReducedLeastSquares | undefined {
  try {
    return reduceLeastSquares(basis, y, sigma);
  } catch {
    return undefined;
  }
}
