/**
 * Cumulative integral of tabulated values on irregularly spaced nodes. Over each interval the
 * parabolas through its two neighbouring three-node stencils are integrated exactly and averaged
 * (one stencil at the ends; the trapezoid when there are only two nodes). For equal spacing the
 * average equals the middle-interval rule of the cubic through four nodes, weights
 * (-1, 13, 13, -1) h/24, the scheme of Gill & Miller, "An algorithm for the integration of
 * unequally spaced data", The Computer Journal 15 (1972) 80; local error O(h^4) per interval for
 * smooth integrands. The composite Simpson rule for unequal spacing (Shklov, Amer. Math. Monthly 67
 * (1960) 1022) uses the same parabolas but gives the integral only at every other node.
 *
 * Error estimate per interval: half the difference of the two stencils' integrals (at the ends:
 * the difference between the parabola and the trapezoid), accumulated as a sum of absolute values.
 */
import { InputError } from "../errors.js";

export interface CumulativeIntegral {
  /** Integral from the first node to each node (first entry 0). */
  values: number[];
  /** Accumulated error estimate at each node (first entry 0). */
  errorEstimates: number[];
}

/** Integral over [a, b] of the parabola through (x0,f0), (x1,f1), (x2,f2) (Newton form). */
function parabolaIntegral(
  x0: number,
  x1: number,
  x2: number,
  f0: number,
  f1: number,
  f2: number,
  a: number,
  b: number,
): number {
  const d01 = (f1 - f0) / (x1 - x0);
  const d12 = (f2 - f1) / (x2 - x1);
  const d012 = (d12 - d01) / (x2 - x0);
  // p(x) = f0 + d01 (x - x0) + d012 (x - x0)(x - x1); integrate in t = x - a for accuracy.
  const h = b - a;
  const A = a - x0;
  const B = a - x1;
  // int_0^h (A + t) dt = A h + h^2/2;  int_0^h (A + t)(B + t) dt = A B h + (A + B) h^2/2 + h^3/3.
  return (
    f0 * h +
    d01 * (A * h + (h * h) / 2) +
    d012 * (A * B * h + ((A + B) * h * h) / 2 + (h * h * h) / 3)
  );
}

export function cumulativeIrregular(
  x: readonly number[],
  f: readonly number[],
): CumulativeIntegral {
  const n = x.length;
  if (n !== f.length || n < 1) {
    throw new InputError({
      input: "x, f",
      unit: "-",
      validRange: "equal, non-zero lengths",
      received: `${x.length}, ${f.length}`,
    });
  }
  for (let i = 1; i < n; i++) {
    if (!(x[i] > x[i - 1])) {
      throw new InputError({
        input: `x[${i}]`,
        unit: "-",
        validRange: `> x[${i - 1}] = ${x[i - 1]} (strictly increasing nodes)`,
        received: x[i],
      });
    }
  }
  const values = [0];
  const errors = [0];
  for (let k = 0; k < n - 1; k++) {
    const { piece, error } = intervalPiece(x, f, k);
    values.push(values[k] + piece);
    errors.push(errors[k] + error);
  }
  return { values, errorEstimates: errors };
}

/** The integral over [x_k, x_k+1] and its error estimate (see the header). */
function intervalPiece(
  x: ArrayLike<number>,
  f: ArrayLike<number>,
  k: number,
): { piece: number; error: number } {
  const n = x.length;
  const a = x[k];
  const b = x[k + 1];
  const trap = 0.5 * (b - a) * (f[k] + f[k + 1]);
  const left =
    k >= 1 ? parabolaIntegral(x[k - 1], a, b, f[k - 1], f[k], f[k + 1], a, b) : undefined;
  const right =
    k + 2 < n ? parabolaIntegral(a, b, x[k + 2], f[k], f[k + 1], f[k + 2], a, b) : undefined;
  if (left !== undefined && right !== undefined)
    return { piece: 0.5 * (left + right), error: 0.5 * Math.abs(left - right) };
  const one = left ?? right;
  if (one !== undefined) return { piece: one, error: Math.abs(one - trap) };
  return { piece: trap, error: Math.abs(trap) };
}

/**
 * The rule of {@link cumulativeIrregular} as weights: the integral over interval k is
 * sum_{q=0..3} w[4k + q] f[k - 1 + q] (weights of nodes outside the range are 0), since the rule
 * is linear in f. For integrating many integrands on the same nodes.
 */
export function cumulativeIrregularWeights(x: readonly number[]): Float64Array {
  const n = x.length;
  const w = new Float64Array(4 * Math.max(n - 1, 0));
  const unit = new Float64Array(n);
  for (let k = 0; k < n - 1; k++) {
    for (let q = 0; q < 4; q++) {
      const j = k - 1 + q;
      if (j < 0 || j >= n) continue;
      unit[j] = 1;
      w[4 * k + q] = intervalPiece(x, unit, k).piece;
      unit[j] = 0;
    }
  }
  return w;
}
