/**
 * Two-phase Rachford-Rice equation (H. H. Rachford and J. D. Rice, J. Petrol. Technol. 4 (1952)
 * 19-20) for the amount beta of the phase y = K x:
 *   f(beta) = sum_i z_i (K_i - 1) / (1 + beta (K_i - 1)) = sum_i z_i / (beta - c_i) = 0,
 *   c_i = 1 / (1 - K_i),
 * solved so that round-off cannot lose the root (M. Nielsen and H. Lia, "Avoiding round-off error
 * in the Rachford-Rice equation", Fluid Phase Equilib. 2023): beta is never iterated on directly
 * near a pole. It is written as the distance from the nearest asymptote, beta = c_max + u (left,
 * the component of largest K) or beta = c_min - v (right, smallest K), and the differences
 * d_i = c_r - c_i = (K_r - K_i) / ((1 - K_r)(1 - K_i)) are formed from the K-values without
 * cancellation, so every denominator beta - c_i = d_i +- u keeps full relative precision even when
 * the root lies 1e-15 from the pole (K up to 1e12, trace components). The root is bracketed by
 * the window of H. Leibovici and J. Neoschil (Fluid Phase Equilib. 74 (1992) 303-308),
 *   max_{K_i>1} (K_i z_i - 1)/(K_i - 1) <= beta <= min_{K_i<1} (1 - z_i)/(1 - K_i),
 * and found by Newton's method in u (or v) safeguarded by bisection of the bracket (f is monotone
 * in beta, so the bracket always holds the root). The side is chosen by the sign of f halfway
 * between the two poles, so the variable is the distance to the nearer pole and every other
 * denominator is at least as large as it (relative error a few eps).
 *
 * beta may lie outside [0, 1] (the negative flash of C. H. Whitson and M. L. Michelsen, Fluid
 * Phase Equilib. 53 (1989) 51-71): callers decide what that means.
 */
import { InputError, SolverError } from "../../errors.js";

/** Options of {@link solveRachfordRice}. */
export interface RachfordRiceOptions {
  /** Iteration cap of the safeguarded Newton. Default 200. */
  maxIterations?: number;
}

/** Root of the Rachford-Rice equation with the two phase compositions. */
export interface RachfordRiceResult {
  /** Amount of the y phase per mole of feed (may be outside [0, 1]: negative flash). */
  readonly beta: number;
  /** Amount of the x phase, 1 - beta, formed from the distance to the pole (no cancellation). */
  readonly oneMinusBeta: number;
  /** x_i = z_i / (1 + beta (K_i - 1)). */
  readonly x: number[];
  /** y_i = K_i x_i. */
  readonly y: number[];
  /** f(beta) at the returned root (dimensionless). */
  readonly residual: number;
  readonly iterations: number;
}

const METHOD = "Rachford-Rice (distance-from-pole form, Leibovici-Neoschil window)";

/**
 * Solves the Rachford-Rice equation for feed z and K-values K (same length; components with
 * z_i = 0 are ignored and get x_i = y_i = 0; K_i = 1 components contribute nothing).
 *
 * @throws InputError for bad z or K; SolverError when no root exists (all present K_i >= 1 or
 *   all <= 1) or the bracket did not close.
 */
export function solveRachfordRice(
  z: readonly number[],
  K: readonly number[],
  options: RachfordRiceOptions = {},
): RachfordRiceResult {
  const n = z.length;
  if (K.length !== n) {
    throw new InputError({
      input: "K.length",
      unit: "-",
      validRange: `${n} (one per component)`,
      received: K.length,
    });
  }
  let rMax = -1;
  let rMin = -1;
  for (let i = 0; i < n; i++) {
    if (!(z[i] >= 0))
      throw new InputError({
        input: `z[${i}]`,
        unit: "mol/mol",
        validRange: ">= 0",
        received: z[i],
      });
    if (!(K[i] > 0 && K[i] < Infinity)) {
      throw new InputError({
        input: `K[${i}]`,
        unit: "-",
        validRange: "> 0 and finite",
        received: K[i],
      });
    }
    if (z[i] === 0 || K[i] === 1) continue;
    if (rMax < 0 || K[i] > K[rMax]) rMax = i;
    if (rMin < 0 || K[i] < K[rMin]) rMin = i;
  }
  if (rMax < 0 || !(K[rMax] > 1) || !(K[rMin] < 1)) {
    throw new SolverError(
      METHOD,
      `no root: the K-values of the present components are all ${rMax >= 0 && K[rMax] > 1 ? ">" : "<"}= 1 (K from ${rMin >= 0 ? K[rMin] : 1} to ${rMax >= 0 ? K[rMax] : 1}), so the feed is one phase for these K-values`,
    );
  }
  const maxIterations = options.maxIterations ?? 200;
  const cOf = (i: number): number => 1 / (1 - K[i]);
  // d_i = c_r - c_i without cancellation
  const dFrom = (r: number): number[] => {
    const d = new Array<number>(n).fill(0);
    for (let i = 0; i < n; i++) {
      if (z[i] === 0 || K[i] === 1 || i === r) continue;
      d[i] = (K[r] - K[i]) / ((1 - K[r]) * (1 - K[i]));
    }
    return d;
  };
  // the window in the left variable u = beta - c_max
  const dL = dFrom(rMax);
  let uLo = 0;
  let uHi = Infinity;
  for (let i = 0; i < n; i++) {
    if (z[i] === 0 || K[i] === 1) continue;
    if (K[i] > 1) uLo = Math.max(uLo, (z[i] * K[i]) / (K[i] - 1) - dL[i]);
    else uHi = Math.min(uHi, -dL[i] - z[i] / (1 - K[i]));
  }
  const fLeft = (u: number): number => {
    let f = 0;
    for (let i = 0; i < n; i++) if (z[i] !== 0 && K[i] !== 1) f += z[i] / (dL[i] + u);
    return f;
  };
  // the side: the root is nearer the left pole when f <= 0 halfway between the two poles
  // (distance c_min - c_max = -dL[rMin], formed without cancellation)
  const uHalf = -0.5 * dL[rMin];
  const useLeft = !(fLeft(uHalf) > 0);
  // s = u (left) or v = c_min - beta (right); denominators beta - c_i = d_i + sign s
  const r = useLeft ? rMax : rMin;
  const d = useLeft ? dL : dFrom(rMin);
  const sign = useLeft ? 1 : -1;
  let lo: number;
  let hi: number;
  if (useLeft) {
    lo = uLo;
    hi = Math.max(uLo, Math.min(uHalf, uHi));
  } else {
    let vLo = 0;
    let vHi = uHalf;
    for (let i = 0; i < n; i++) {
      if (z[i] === 0 || K[i] === 1) continue;
      if (K[i] < 1) vLo = Math.max(vLo, d[i] + z[i] / (1 - K[i]));
      else vHi = Math.min(vHi, d[i] - (z[i] * K[i]) / (K[i] - 1));
    }
    lo = vLo;
    hi = Math.max(vLo, vHi);
  }
  // g(s) = f in the side's variable (increasing in s on the left? f decreases in beta; on the
  // left s = u grows with beta, so f decreases in s; on the right s = v, f increases in s)
  const evaluate = (s: number): { f: number; df: number } => {
    let f = 0;
    let df = 0;
    for (let i = 0; i < n; i++) {
      if (z[i] === 0 || K[i] === 1) continue;
      const t = d[i] + sign * s;
      const q = z[i] / t;
      f += q;
      df -= (sign * q) / t;
    }
    return { f, df };
  };
  // the bracket: f has the sign of the near pole at lo (+ on the left, - on the right) and the
  // other sign at hi. The window bounds are formed with some cancellation (K_i z_i - 1), so each
  // is checked and replaced by the pole itself (s = 0) or the halfway point when it fails
  const nearSign = useLeft ? 1 : -1;
  let fl = evaluate(lo).f;
  if (!(Math.sign(fl) === nearSign)) {
    if (fl === 0) return finish(lo, 0);
    lo = 0;
  }
  const fh = evaluate(hi).f;
  if (fh === 0) return finish(hi, 0);
  if (!(Math.sign(fh) === -nearSign)) hi = uHalf;
  fl = nearSign;
  // Newton safeguarded by the bracket (the rule of "rtsafe", W. H. Press et al., Numerical
  // Recipes, 3rd ed. 2007, sec. 9.4): bisect when the Newton step leaves the bracket or does not
  // shrink at least half as fast as bisection would
  let s = 0.5 * (lo + hi);
  let dxOld = Math.abs(hi - lo);
  let dx = dxOld;
  let { f, df } = evaluate(s);
  if (Math.sign(f) === Math.sign(fl)) {
    lo = s;
    fl = f;
  } else {
    hi = s;
  }
  let iterations = 0;
  for (; iterations < maxIterations && f !== 0; iterations++) {
    if (((s - hi) * df - f) * ((s - lo) * df - f) > 0 || Math.abs(2 * f) > Math.abs(dxOld * df)) {
      dxOld = dx;
      dx = 0.5 * (hi - lo);
      const next = lo + dx;
      if (next === lo || next === hi) break;
      s = next;
    } else {
      dxOld = dx;
      dx = f / df;
      const next = s - dx;
      if (next === s) break;
      s = next;
    }
    if (Math.abs(dx) <= 2 * Number.EPSILON * Math.abs(s)) break;
    ({ f, df } = evaluate(s));
    if (Math.sign(f) === Math.sign(fl)) {
      lo = s;
      fl = f;
    } else {
      hi = s;
    }
  }
  if (iterations >= maxIterations) {
    throw new SolverError(
      METHOD,
      `the bracket [${lo}, ${hi}] (distance from the pole of ${useLeft ? "the largest" : "the smallest"} K) did not close in ${maxIterations} iterations`,
    );
  }
  return finish(s, iterations);

  function finish(sRoot: number, its: number): RachfordRiceResult {
    const x = new Array<number>(n).fill(0);
    const y = new Array<number>(n).fill(0);
    let residual = 0;
    for (let i = 0; i < n; i++) {
      if (z[i] === 0) continue;
      if (K[i] === 1) {
        x[i] = z[i];
        y[i] = z[i];
        continue;
      }
      const t = d[i] + sign * sRoot; // beta - c_i
      residual += z[i] / t;
      x[i] = z[i] / ((K[i] - 1) * t);
      y[i] = K[i] * x[i];
    }
    const cR = cOf(r);
    const beta = cR + sign * sRoot;
    // 1 - beta = (1 - c_r) - sign s, with 1 - c_r = -K_r / (1 - K_r)
    const oneMinusBeta = -K[r] / (1 - K[r]) - sign * sRoot;
    return { beta, oneMinusBeta, x, y, residual, iterations: its };
  }
}
