/**
 * Propagation of the pressure uncertainties through a frozen route (fixed groupings, orders and
 * nodes, so the route is a fixed, nearly linear map from the pressures to the departures):
 *  - Monte Carlo (JCGM 101:2008, GUM Supplement 1, §7): pressures resampled as P_i + sigma_i N(0,1)
 *    from a seeded generator (seededRandom.ts), standard deviation of each output;
 *  - linearised (JCGM 100:2008, GUM, eq. 10): sensitivity of each output to each pressure by a
 *    one-sigma step, u^2 = sum_i (f(P + sigma_i e_i) - f(P))^2; exact where the map is linear
 *    (every departure except the ln Z term of g and ln phi).
 * Temperature and density uncertainties enter through sigma_i as effective pressure
 * uncertainties (the "effective variance" of Orear, Am. J. Phys. 50 (1982) 912), so they are
 * treated as independent per point.
 */
import { seededRandom } from "../numerics/seededRandom.js";

/** Standard uncertainties of a propagation, one per output. */
export interface PropagationResult {
  /** Standard uncertainty of each output. */
  standardUncertainty: number[];
  samples: number;
}

/**
 * Monte Carlo propagation (JCGM 101): `samples` seeded replicates of the pressures through `evaluate`.
 * `evaluate` gets one reused buffer of replicate pressures and must not keep it; its output is read
 * before the next call, so it may reuse its own output buffer too.
 */
export function monteCarloPropagation(
  evaluate: (pressuresPa: ArrayLike<number>) => ArrayLike<number>,
  pressuresPa: readonly number[],
  sigmaPa: readonly number[],
  samples: number,
  seed: number,
): PropagationResult {
  const rng = seededRandom(seed);
  const n = pressuresPa.length;
  const p = new Float64Array(n);
  let mean: Float64Array | undefined;
  let m2: Float64Array | undefined;
  for (let s = 1; s <= samples; s++) {
    for (let i = 0; i < n; i++) p[i] = pressuresPa[i] + sigmaPa[i] * rng.normal();
    const out = evaluate(p);
    if (!mean || !m2) {
      mean = Float64Array.from(out);
      m2 = new Float64Array(out.length);
      continue;
    }
    // Welford's running variance (Welford, Technometrics 4 (1962) 419).
    for (let k = 0; k < out.length; k++) {
      const o = out[k];
      const d = o - mean[k];
      const mk = mean[k] + d / s;
      mean[k] = mk;
      m2[k] = m2[k] + d * (o - mk);
    }
  }
  return {
    standardUncertainty: m2 ? Array.from(m2, (v) => Math.sqrt(v / Math.max(samples - 1, 1))) : [],
    samples,
  };
}

/** Linearised propagation (JCGM 100 eq. 10) by one-sigma steps of every pressure (cost: one evaluation per pressure). */
export function linearisedPropagation(
  evaluate: (pressuresPa: readonly number[]) => ArrayLike<number>,
  pressuresPa: readonly number[],
  sigmaPa: readonly number[],
  nominal: ArrayLike<number>,
): PropagationResult {
  const acc = new Array<number>(nominal.length).fill(0);
  const p = pressuresPa.slice();
  for (let i = 0; i < p.length; i++) {
    const keep = p[i];
    p[i] = keep + sigmaPa[i];
    const out = evaluate(p);
    for (let k = 0; k < acc.length; k++) {
      const d = out[k] - nominal[k];
      acc[k] = acc[k] + d * d;
    }
    p[i] = keep;
  }
  return { standardUncertainty: acc.map(Math.sqrt), samples: p.length };
}
