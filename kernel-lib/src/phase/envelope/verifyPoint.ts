/**
 * What every saturation point must pass before it leaves: equal fugacity of every present
 * component in the two phases (recomputed at the final T, P and normalised compositions, not
 * taken from the iteration), compositions summing to one, and two distinct phases (not the
 * trivial solution K = 1, where both "phases" are the feed).
 */
import type { SaturationSolution, SaturationSystem } from "./saturationSystem.js";
import { phaseFugacityAtTP } from "../../state/fugacity.js";

/** The checked facts of one point (SI). */
export interface VerifiedPoint {
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Phase compositions, model order: x is the feed when beta = 0, y when beta = 1. */
  readonly x: readonly number[];
  readonly y: readonly number[];
  readonly densityX: number;
  readonly densityY: number;
  /** max_i |ln f_i(y) - ln f_i(x)| over present components. */
  readonly fugacityResidual: number;
  /** max_i |ln K_i|. */
  readonly maxLnK: number;
}

/** Why a point failed verification (undefined when it passed). */
export function verifyPoint(
  sys: SaturationSystem,
  solution: SaturationSolution,
  tolerance: number,
  trivialLnK: number,
): { point: VerifiedPoint; failure?: string } {
  const ev = solution.evaluation;
  const T = ev.temperatureK;
  const P = ev.pressurePa;
  const fx = phaseFugacityAtTP(sys.model, T, P, ev.x, "stable");
  const fy = phaseFugacityAtTP(sys.model, T, P, ev.y, "stable");
  let residual = 0;
  let maxLnK = 0;
  let sumX = 0;
  let sumY = 0;
  for (let p = 0; p < sys.present.length; p++) {
    const i = sys.present[p];
    const d = Math.log(ev.y[i]) + fy.lnPhi[i] - Math.log(ev.x[i]) - fx.lnPhi[i];
    residual = Math.max(residual, Math.abs(d));
    maxLnK = Math.max(maxLnK, Math.abs(solution.X[p]));
    sumX += ev.x[i];
    sumY += ev.y[i];
  }
  const point: VerifiedPoint = {
    temperatureK: T,
    pressurePa: P,
    x: ev.x,
    y: ev.y,
    densityX: fx.densityMolPerM3,
    densityY: fy.densityMolPerM3,
    fugacityResidual: residual,
    maxLnK,
  };
  if (!(residual <= tolerance)) {
    return {
      point,
      failure: `fugacities differ by ${residual.toExponential(2)} in ln f (tolerance ${tolerance})`,
    };
  }
  if (!(Math.abs(sumX - 1) < 1e-12 && Math.abs(sumY - 1) < 1e-12)) {
    return { point, failure: "phase compositions do not sum to one" };
  }
  if (!(maxLnK > trivialLnK)) {
    return {
      point,
      failure: `trivial solution: every |ln K| <= ${trivialLnK} (both phases are the feed)`,
    };
  }
  return { point };
}
