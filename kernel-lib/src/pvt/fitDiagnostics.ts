/**
 * What a fit says about itself, and the advice an engineer can act on. Criteria (common practice,
 * no single source): reduced chi-square far from 1 when the uncertainties were stated (data noisier
 * than stated, or model order too low); a runs test z below -2 (systematic residual pattern); fewer
 * than 2 degrees of freedom per coefficient (too sparse for the order); a condition number above
 * 1e8 (coefficients ill-determined; lower the order or widen the range).
 */
import { runsTest } from "../numerics/runsTest.js";
import type { RunsTestResult } from "../numerics/runsTest.js";
import type { WeightedLeastSquaresResult } from "../numerics/weightedLeastSquares.js";

/** Quality of one weighted fit: chi-square, runs test, worst residuals, recommendations. */
export interface FitDiagnostics {
  /** What was fitted, e.g. "isochore 5012.3 mol/m3" or "surface". */
  readonly subject: string;
  readonly observations: number;
  readonly coefficients: number;
  readonly degreesOfFreedom: number;
  readonly chiSquare: number;
  /** chi2 / dof (NaN when dof = 0). */
  readonly reducedChiSquare: number;
  /** Where the weights came from: the file's u(P) (and u(T), u(rho)), or unit weights with the scale from the scatter. */
  readonly sigmaSource: "stated" | "from-scatter";
  readonly conditionNumber: number;
  readonly runs: RunsTestResult;
  /** Advice when the data look too sparse or too noisy for the order, or the fit shows a pattern. */
  readonly recommendations: readonly string[];
}

/** @param orderedResiduals normalized residuals in the order of the fitted variable (for the runs test). */
export function fitDiagnostics(
  subject: string,
  fit: WeightedLeastSquaresResult,
  orderedResiduals: readonly number[],
  sigmaSource: "stated" | "from-scatter",
): FitDiagnostics {
  const m = fit.residuals.length;
  const k = fit.coefficients.length;
  const dof = fit.degreesOfFreedom;
  const red = dof > 0 ? fit.chiSquare / dof : Number.NaN;
  const runs = runsTest(orderedResiduals);
  const rec: string[] = [];
  if (dof < 3 || (dof < k && dof < 5)) {
    rec.push(
      `${subject}: ${m} points for ${k} coefficients leave ${dof} degrees of freedom; too sparse to judge the fit: add points or lower the order`,
    );
  }
  if (sigmaSource === "stated" && dof >= 3) {
    if (red > 3) {
      rec.push(
        `${subject}: reduced chi-square ${red.toFixed(2)} > 3: the data scatter more than their stated uncertainties (or the order is too low); uncertainties were enlarged by sqrt(${red.toFixed(2)})`,
      );
    } else if (red < 0.1) {
      rec.push(
        `${subject}: reduced chi-square ${red.toFixed(3)} < 0.1: the stated uncertainties look too large, or the order is too high`,
      );
    }
  }
  if (runs.z < -2) {
    rec.push(
      `${subject}: residuals show a systematic pattern (runs test z = ${runs.z.toFixed(2)}): raise the order, or look for a phase change or a bad point`,
    );
  }
  if (fit.conditionNumber > 1e8) {
    rec.push(
      `${subject}: condition number ${fit.conditionNumber.toExponential(2)}: coefficients ill-determined; lower the order`,
    );
  }
  return {
    subject,
    observations: m,
    coefficients: k,
    degreesOfFreedom: dof,
    chiSquare: fit.chiSquare,
    reducedChiSquare: red,
    sigmaSource,
    conditionNumber: fit.conditionNumber,
    runs,
    recommendations: rec,
  };
}
