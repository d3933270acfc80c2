/**
 * Reproducible pseudo-random numbers for Monte Carlo uncertainty: xoshiro128** (Blackman & Vigna,
 * "Scrambled linear pseudorandom number generators", ACM Trans. Math. Softw. 47 (2021) 36), its
 * 128-bit state filled from the 32-bit seed by a SplitMix-style sequence (Steele, Lea & Flood,
 * OOPSLA 2014: a golden-ratio increment followed by a mixing finaliser; the 32-bit finaliser used
 * here is C. Wellons' "lowbias32", from memory of his hash-prospector notes; it only has to
 * spread the seed over the state, so any good mixer would do). Standard normal deviates by the Marsaglia polar method (Marsaglia & Bray, SIAM Rev. 6
 * (1964) 260). The same seed gives the same sequence on every platform, so a reported seed
 * reproduces a reported uncertainty exactly.

 */
import { InputError } from "../errors.js";

export interface SeededRandom {
  /** The seed this generator started from. */
  readonly seed: number;
  /** Uniform deviate in [0, 1), 32 bits of resolution. */
  uniform(): number;
  /** Standard normal deviate (mean 0, standard deviation 1). */
  normal(): number;
}

/** Creates a generator from an integer seed in [0, 2^32). */
export function seededRandom(seed: number): SeededRandom {
  if (!(Number.isInteger(seed) && seed >= 0 && seed < 2 ** 32)) {
    throw new InputError({
      input: "seed",
      unit: "-",
      validRange: "an integer in [0, 2^32)",
      received: seed,
    });
  }
  let sm = seed >>> 0;
  const splitmix32 = (): number => {
    sm = (sm + 0x9e3779b9) >>> 0;
    let z = sm;
    z = Math.imul(z ^ (z >>> 16), 0x7feb352d) >>> 0;
    z = Math.imul(z ^ (z >>> 15), 0x846ca68b) >>> 0;
    return (z ^ (z >>> 16)) >>> 0;
  };
  let s0 = splitmix32();
  let s1 = splitmix32();
  let s2 = splitmix32();
  let s3 = splitmix32();
  const next = (): number => {
    const result = Math.imul(rotl(Math.imul(s1, 5) >>> 0, 7), 9) >>> 0;
    const t = (s1 << 9) >>> 0;
    s2 = (s2 ^ s0) >>> 0;
    s3 = (s3 ^ s1) >>> 0;
    s1 = (s1 ^ s2) >>> 0;
    s0 = (s0 ^ s3) >>> 0;
    s2 = (s2 ^ t) >>> 0;
    s3 = rotl(s3, 11);
    return result;
  };
  let spare: number | undefined;
  return {
    seed,
    uniform: () => next() / 4294967296,
    normal: () => {
      if (spare !== undefined) {
        const s = spare;
        spare = undefined;
        return s;
      }
      for (;;) {
        const u = 2 * (next() / 4294967296) - 1;
        const v = 2 * (next() / 4294967296) - 1;
        const q = u * u + v * v;
        if (q > 0 && q < 1) {
          const f = Math.sqrt((-2 * Math.log(q)) / q);
          spare = v * f;
          return u * f;
        }
      }
    },
  };
}

function rotl(x: number, k: number): number {
  return ((x << k) | (x >>> (32 - k))) >>> 0;
}
