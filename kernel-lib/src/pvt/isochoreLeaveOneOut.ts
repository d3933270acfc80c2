/**
 * Leave-one-out (deleted, externally studentized) prediction residuals of the points of one
 * isochore, with the order chosen again by AICc without the point, computed exactly from the fits
 * through all points instead of one refit per point (Belsley, Kuh & Welsch, Regression
 * Diagnostics, 1980, §2.1; Cook & Weisberg, Residuals and Influence in Regression, 1982, §2.2).
 * For a weighted linear fit with unscaled covariance C, leverage h_i = w_i g_i^T C g_i
 * (w_i = 1/sigma_i^2, g_i the basis row of point i) and residual e_i, the fit without point i has
 * (Sherman-Morrison):
 *
 *   prediction at T_i       P_(i) = P_i - e_i / (1 - h_i)
 *   its variance            g_i^T C g_i / (1 - h_i)            (unscaled)
 *   chi-square              chi2_(i) = chi2 - w_i e_i^2 / (1 - h_i)
 *
 * so every order's AICc without the point, and the prediction of the order one higher, come from
 * one fit per order through all points. The statistic is the one of the refitting screen it
 * replaces: z = |P_i - P_(i)| / sqrt(sigma_i^2 + u(P_(i))^2 + u_order^2), u(P_(i)) Birge-scaled
 * by the deleted fit's reduced chi-square as in isochoreFit.ts, u_order the change of P_(i) when
 * the chosen order is raised by one (an end point is an extrapolation of the others, where a
 * too-low order shows). Identical to refitting up to rounding.
 */
import { powerRow } from "../numerics/powerRow.js";
import { aicc } from "../numerics/aicc.js";
import { extent } from "../numerics/extent.js";
import { weightedLeastSquares } from "../numerics/weightedLeastSquares.js";
import type { IsochoreFitOptions } from "./isochoreFit.js";

/** One fit order through all points, with what the deleted fits need. */
interface OrderFit {
  order: number;
  chiSquare: number;
  /** Fitted value at each point minus the data, reversed: e_i = P_i - fit_i. */
  residuals: number[];
  /** g_i^T C g_i, unscaled variance of the fitted value at point i. */
  fittedVariance: Float64Array;
}

/** Deleted prediction of point i at one order (undefined when the order is not admissible). */
interface Deleted {
  prediction: number;
  variance: number;
  score: number;
}

/**
 * The statistic z of every point of one isochore (NaN where the point cannot be judged: fewer than
 * 3 distinct temperatures would remain without it).
 * @param temperaturesK temperatures of the isochore's points, K
 * @param pressuresPa their pressures, Pa
 * @param sigmaPa their standard uncertainties, Pa (stated; the screen needs them)
 * @param options the isochore fit options of the route (order range, or a fixed order)
 */
export function isochoreLeaveOneOut(
  temperaturesK: readonly number[],
  pressuresPa: readonly number[],
  sigmaPa: readonly number[],
  options: IsochoreFitOptions = {},
): Float64Array {
  const n = temperaturesK.length;
  const keys = temperaturesK.map((t) => t.toPrecision(10));
  const count = new Map<string, number>();
  for (const k of keys) count.set(k, (count.get(k) ?? 0) + 1);
  const distinct = count.size;
  const { min, max } = extent(temperaturesK);
  const mid = 0.5 * (min + max);
  const half = 0.5 * (max - min);
  const xs = temperaturesK.map((t) => (t - mid) / half);
  const highest = Math.min(options.order ?? options.maxOrder ?? 6, distinct - 1) + 1;
  const fits: (OrderFit | undefined)[] = [];
  for (let order = 1; order <= highest && order + 1 <= distinct; order++) {
    const design = xs.map((x) => powerRow(x, order + 1));
    let fit;
    try {
      fit = weightedLeastSquares(design, pressuresPa, sigmaPa);
    } catch {
      break; // rank-deficient at this order: the higher ones are too
    }
    const fittedVariance = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const g = design[i];
      let v = 0;
      for (let a = 0; a <= order; a++) {
        let row = 0;
        for (let b = 0; b <= order; b++) row += fit.covariance[a][b] * g[b];
        v += g[a] * row;
      }
      fittedVariance[i] = v;
    }
    fits[order] = { order, chiSquare: fit.chiSquare, residuals: fit.residuals, fittedVariance };
  }
  const deleted = (f: OrderFit | undefined, i: number): Deleted | undefined => {
    if (!f) return undefined;
    const w = 1 / (sigmaPa[i] * sigmaPa[i]);
    const h = w * f.fittedVariance[i];
    if (!(h < 1)) return undefined;
    const e = f.residuals[i];
    const chi2 = f.chiSquare - (w * e * e) / (1 - h);
    const dof = n - 1 - (f.order + 1);
    const red = dof > 0 ? chi2 / dof : Number.NaN;
    const factor = dof > 0 ? Math.max(1, red) : 1;
    const raw = aicc(chi2, n - 1, f.order + 1, true);
    return {
      prediction: pressuresPa[i] - e / (1 - h),
      variance: (factor * f.fittedVariance[i]) / (1 - h),
      score: Number.isFinite(raw) ? raw : 1e300 + f.order,
    };
  };
  const z = new Float64Array(n).fill(Number.NaN);
  for (let i = 0; i < n; i++) {
    const others = distinct - (count.get(keys[i]) === 1 ? 1 : 0);
    if (others < 3) continue;
    const orders: number[] = [];
    if (options.order !== undefined) orders.push(options.order);
    else {
      const lo = Math.min(options.minOrder ?? (others >= 4 ? 2 : 1), others - 1);
      for (let k = lo; k <= Math.min(options.maxOrder ?? 6, others - 1); k++) orders.push(k);
    }
    let best: { order: number; d: Deleted } | undefined;
    for (const order of orders) {
      if (order + 1 > others) continue;
      const d = deleted(fits[order], i);
      if (d && (!best || d.score < best.d.score)) best = { order, d };
    }
    if (!best) continue;
    let uOrder = 0;
    if (best.order + 1 <= others - 1 && options.order === undefined) {
      const up = deleted(fits[best.order + 1], i);
      if (up) uOrder = Math.abs(up.prediction - best.d.prediction);
    }
    z[i] =
      Math.abs(pressuresPa[i] - best.d.prediction) /
      Math.sqrt(sigmaPa[i] ** 2 + best.d.variance + uOrder ** 2);
  }
  return z;
}
