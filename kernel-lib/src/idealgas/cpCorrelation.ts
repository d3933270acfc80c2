/**
 * Ideal-gas heat-capacity correlations and their exact integrals.
 *
 * Polynomial (one or more temperature segments), cp°/R = sum a_k T^k:
 *   int cp dT   = R sum a_k (T2^(k+1) - T1^(k+1)) / (k+1)
 *   int cp/T dT = R [a_0 ln(T2/T1) + sum_(k>=1) a_k (T2^k - T1^k) / k]
 * Segments are integrated piece by piece; below the first segment the first polynomial is used, above
 * the last the last one (extrapolation, which the callers allow only within their stated margin).
 *
 * Aly-Lee (1981, Fluid Phase Equilibria 6, 169-179; the DIPPR 107 form),
 *   cp° = A + B [x / sinh x]^2 + D [y / cosh y]^2,  x = C/T, y = E/T:
 *   int cp dT   = A T + B T x coth x - D T y tanh y                          (+ const)
 *   int cp/T dT = A ln T + B [x coth x - ln|sinh x|] - D [y tanh y - ln cosh y]  (+ const)
 * (differentiate to check: d/dT of x coth x - ln sinh x is x^2 csch^2 x / T). When C = 0 the B term
 * is the constant B (x/sinh x -> 1), integrated as B T and B ln T; when E = 0 the D term vanishes.
 *
 * Rounding: the polynomial integrals use ln(1 + (T2-T1)/T1) and T2^n - T1^n = (T2-T1) sum T2^j T1^(n-1-j),
 * so short steps keep full relative precision. The Aly-Lee integrals are differences of the
 * antiderivatives, whose relative rounding error grows as the step shrinks (about 1e-9 for a
 * 1e-3 K step): fine for finite differences of that size, not for much smaller ones.
 */
import { R } from "../constants.js";
import type { AlyLeeCp, CpCorrelation, PolynomialCp } from "../components/types.js";
import { correlationCp } from "../components/cpValue.js";
import { STANDARD_TEMPERATURE_K } from "./types.js";

// cp°(T) itself is evaluated with the component data (components/cpValue.ts), where
// defineComponent checks it; the integrals below are the ideal-gas layer's
export { correlationCp };

/** int_{T1}^{T2} cp° dT, J/mol (closed form). */
export function correlationCpIntegral(
  correlation: CpCorrelation,
  t1K: number,
  t2K: number,
): number {
  if (correlation.form === "polynomial") {
    return integratePiecewise(correlation, t1K, t2K, polynomialCpPiece);
  }
  return alyLeeH(correlation, t2K) - alyLeeH(correlation, t1K);
}

/** int_{T1}^{T2} cp°/T dT, J/(mol K) (closed form). */
export function correlationCpOverTIntegral(
  correlation: CpCorrelation,
  t1K: number,
  t2K: number,
): number {
  if (correlation.form === "polynomial") {
    return integratePiecewise(correlation, t1K, t2K, polynomialCpOverTPiece);
  }
  return alyLeeS(correlation, t2K) - alyLeeS(correlation, t1K);
}

/**
 * R sum_k a_k (hi^(k+1) - lo^(k+1)) / (k+1) over one segment. Each power difference is written
 * hi^n - lo^n = (hi - lo) q_n with q_n = sum_j hi^j lo^(n-1-j), so a short step loses no digits to
 * cancellation; q_n comes from the recurrence q_(n+1) = hi^n + lo q_n (q_1 = 1), one multiply-add
 * per coefficient instead of a sum of powers.
 */
function polynomialCpPiece(a: readonly number[], lo: number, hi: number): number {
  let sum = 0;
  let q = 1; // q_(k+1)
  let hiPower = 1; // hi^k
  for (let k = 0; k < a.length; k++) {
    sum += (a[k] * q) / (k + 1);
    hiPower *= hi;
    q = hiPower + lo * q;
  }
  return R * (hi - lo) * sum;
}

/** R [a_0 ln(hi/lo) + sum_(k>=1) a_k (hi^k - lo^k) / k] over one segment (same recurrence). */
function polynomialCpOverTPiece(a: readonly number[], lo: number, hi: number): number {
  if (a.length === 0) return 0;
  let sum = 0;
  let q = 1; // q_k
  let hiPower = 1; // hi^(k-1)
  for (let k = 1; k < a.length; k++) {
    sum += (a[k] * q) / k;
    hiPower *= hi;
    q = hiPower + lo * q;
  }
  return R * (a[0] * Math.log1p((hi - lo) / lo) + (hi - lo) * sum);
}

function integratePiecewise(
  correlation: PolynomialCp,
  t1K: number,
  t2K: number,
  piece: (a: readonly number[], lo: number, hi: number) => number,
): number {
  if (t2K < t1K) return -integratePiecewise(correlation, t2K, t1K, piece);
  const segments = correlation.segments;
  let total = 0;
  let t = t1K;
  for (let i = 0; i < segments.length && t < t2K; i++) {
    const last = i === segments.length - 1;
    if (!last && t >= segments[i].maxTemperatureK) continue;
    const upper = last ? t2K : Math.min(t2K, segments[i].maxTemperatureK);
    total += piece(segments[i].coefficients, t, upper);
    t = upper;
  }
  return total;
}

/** x coth x = x / tanh x, with its limit 1 at x = 0. */
function xCoth(x: number): number {
  return x === 0 ? 1 : x / Math.tanh(x);
}

/** ln|sinh x| without overflow for large |x|. */
function logAbsSinh(x: number): number {
  const ax = Math.abs(x);
  return ax + Math.log((1 - Math.exp(-2 * ax)) / 2);
}

/** ln cosh x without overflow for large |x|. */
function logCosh(x: number): number {
  const ax = Math.abs(x);
  return ax + Math.log((1 + Math.exp(-2 * ax)) / 2);
}

/** Antiderivative of the Aly-Lee cp in T, J/mol. */
function alyLeeH(c: AlyLeeCp, t: number): number {
  const x = c.cK / t;
  const y = c.eK / t;
  return c.aJPerMolK * t + c.bJPerMolK * t * xCoth(x) - c.dJPerMolK * t * y * Math.tanh(y);
}

/** Antiderivative of the Aly-Lee cp/T in T, J/(mol K). */
function alyLeeS(c: AlyLeeCp, t: number): number {
  const x = c.cK / t;
  const y = c.eK / t;
  const bPart = c.cK === 0 ? Math.log(t) : xCoth(x) - logAbsSinh(x);
  const dPart = y * Math.tanh(y) - logCosh(y);
  return c.aJPerMolK * Math.log(t) + c.bJPerMolK * bPart - c.dJPerMolK * dPart;
}

/** cp°, h° - h°(298.15 K) and s° - s°(298.15 K) at one temperature (J/(mol K), J/mol, J/(mol K)). */
export interface CpAndIntegrals {
  cp: number;
  hFrom298: number;
  sFrom298: number;
}

/** A correlation compiled for repeated evaluation (see {@link compileCorrelation}). */
export interface CompiledCorrelation {
  /** Writes cp°(T) and the integrals from 298.15 K into `out` (no allocation, no range check). */
  evaluate(temperatureK: number, out: CpAndIntegrals): void;
  /**
   * The same with ln T supplied by the caller (a mixture takes the logarithm once for all its
   * components); `lnT` must be Math.log(temperatureK).
   */
  evaluateWithLog(temperatureK: number, lnT: number, out: CpAndIntegrals): void;
}

/**
 * Aly-Lee with one exponential per hyperbolic argument: for u = |C/T| (or |E/T|) and
 * e = e^-u, q = 1 - e^2 (formed as 1 - e^2 for u > 1/2, where e^2 < 0.37 and the difference
 * loses at most about one bit, and as -expm1(-u) (1 + e) with e = 1 + expm1(-u) below, where
 * 1 - e^2 would cancel):
 *   x/sinh x = 2u e / q,  x coth x = u (1 + e^2) / q,  ln|sinh x| = u + ln(q / 2),
 *   y/cosh y = 2u e / p,  y tanh y = u q / p,  ln cosh y = u + ln(p / 2),  p = 1 + e^2.
 * Two exponentials and two logarithms per correlation (ln T comes from the caller). Against the
 * form with separate exp and expm1 of -u and -2u (this file before 2026-12-04) the rounding
 * differs by a few units in the last place (tests/unit/idealgas/compileCorrelation.test.ts
 * holds the two within 1e-13 relative over the correlation's range).
 */
const ALY_LEE_SPLIT = 0.5;

/**
 * A correlation compiled for repeated evaluation: `evaluate(T, out)` writes cp° and the integrals
 * from 298.15 K into `out` (no allocation, no range check). Polynomials use the functions above
 * unchanged. Aly-Lee shares its transcendental functions between cp, h and s (one exponential
 * per hyperbolic argument, see ALY_LEE_SPLIT) and keeps its antiderivatives at 298.15 K as
 * constants; it agrees with the functions above to rounding.
 */
export function compileCorrelation(correlation: CpCorrelation): CompiledCorrelation {
  if (correlation.form === "polynomial") return compilePolynomial(correlation);
  const c = correlation;
  const A = c.aJPerMolK;
  const B = c.bJPerMolK;
  const D = c.dJPerMolK;
  const absC = Math.abs(c.cK);
  const absE = Math.abs(c.eK);
  const noB = c.cK === 0;
  const scratch: CpAndIntegrals = { cp: 0, hFrom298: 0, sFrom298: 0 };
  const alyLeeAll = (t: number, lnT: number, out: CpAndIntegrals, h0: number, s0: number): void => {
    // x = C/T (see ALY_LEE_SPLIT for the formulas)
    const ax = absC / t;
    let ex: number;
    let qx: number;
    if (ax > ALY_LEE_SPLIT) {
      ex = Math.exp(-ax);
      qx = 1 - ex * ex;
    } else {
      const m = Math.expm1(-ax);
      ex = 1 + m;
      qx = -m * (1 + ex);
    }
    const xOverSinhX = ax === 0 ? 1 : (2 * ax * ex) / qx;
    const xCothX = ax === 0 ? 1 : (ax * (1 + ex * ex)) / qx;
    // y = E/T
    const ay = absE / t;
    let ey: number;
    let qy: number;
    if (ay > ALY_LEE_SPLIT) {
      ey = Math.exp(-ay);
      qy = 1 - ey * ey;
    } else {
      const m = Math.expm1(-ay);
      ey = 1 + m;
      qy = -m * (1 + ey);
    }
    const py = 1 + ey * ey;
    const yOverCoshY = (2 * ay * ey) / py;
    const yTanhY = (ay * qy) / py;
    const bPart = noB ? lnT : xCothX - (ax + Math.log(qx / 2));
    const dPart = yTanhY - (ay + Math.log(py / 2));
    out.cp = A + B * xOverSinhX * xOverSinhX + D * yOverCoshY * yOverCoshY;
    out.hFrom298 = A * t + B * t * xCothX - D * t * yTanhY - h0;
    out.sFrom298 = A * lnT + B * bPart - D * dPart - s0;
  };
  const t298 = STANDARD_TEMPERATURE_K;
  alyLeeAll(t298, Math.log(t298), scratch, 0, 0);
  const h298 = scratch.hFrom298;
  const s298 = scratch.sFrom298;
  return {
    evaluate: (t, out) => alyLeeAll(t, Math.log(t), out, h298, s298),
    evaluateWithLog: (t, lnT, out) => alyLeeAll(t, lnT, out, h298, s298),
  };
}

/**
 * A polynomial correlation compiled segment by segment. Each segment's integrals are written as
 * polynomials in d = T - c about a centre c inside the segment (298.15 K when the segment holds it,
 * else the segment's end nearest to it): int_c^T cp dT = R d sum_m B_m d^m and
 * int_c^T (cp - R a_0)/T dT = R d sum_m E_m d^m (Taylor coefficients of the shifted polynomial,
 * computed once), plus the exact integrals from 298.15 K to c. One Horner pass each, and no
 * cancellation for T near c, like the power-difference form above.
 */
function compilePolynomial(correlation: PolynomialCp): CompiledCorrelation {
  const segments = correlation.segments;
  const last = segments.length - 1;
  const compiled = segments.map((segment, i) => {
    const a = segment.coefficients;
    const lower = i === 0 ? -Infinity : segments[i - 1].maxTemperatureK;
    const upper = i === last ? Infinity : segment.maxTemperatureK;
    const centre = Math.min(Math.max(STANDARD_TEMPERATURE_K, lower), upper);
    // cp/R about the centre: b_m = sum_(k>=m) a_k C(k, m) c^(k-m); cp integral coefficients b_m/(m+1)
    const b = shiftPolynomial(a, centre);
    const cpIntegral = b.map((bm, m) => bm / (m + 1));
    // sum_(k>=1) a_k T^k / k about the centre, without its constant term (it cancels)
    const p = a.map((ak, k) => (k === 0 ? 0 : ak / k));
    const overT = shiftPolynomial(p, centre).slice(1);
    // Float64Array copies: the component's coefficient arrays are frozen, and a frozen array keeps
    // its numbers boxed, which showed in the profile of every state evaluation
    return {
      maxTemperatureK: segment.maxTemperatureK,
      coefficients: Float64Array.from(a),
      centre,
      lnCentre: Math.log(centre),
      a0: a.length > 0 ? a[0] : 0,
      cpIntegral: Float64Array.from(cpIntegral),
      overT: Float64Array.from(overT),
      hOffset: correlationCpIntegral(correlation, STANDARD_TEMPERATURE_K, centre),
      sOffset: correlationCpOverTIntegral(correlation, STANDARD_TEMPERATURE_K, centre),
      // the three coefficient lists interleaved, [a_m, cpIntegral_m, overT_m] for m = 0 .. L-1
      // (overT has L - 1 entries: its last slot is 0, which leaves its Horner sum unchanged,
      // since 0 d + 0 = 0 exactly), for one loop that carries the three independent sums
      fused: Float64Array.from({ length: 3 * a.length }, (_, k) => {
        const m = Math.floor(k / 3);
        const which = k % 3;
        return which === 0 ? a[m] : which === 1 ? cpIntegral[m] : m < overT.length ? overT[m] : 0;
      }),
    };
  });
  // evaluateWithLog: a_0 ln(T / c) as ln T - ln c from the caller's ln T (no logarithm of its
  // own; absolute error about 1e-15 R a_0 where log1p(d / c) would be exact near c)
  const evaluateWithLog = (t: number, lnT: number, out: CpAndIntegrals): void => {
    // the same segment choice as segmentFor (components/cpValue.ts), so cp is bit-for-bit correlationCp
    let i = 0;
    while (i < last && !(t < compiled[i].maxTemperatureK)) i++;
    const g = compiled[i];
    // the Horner sums of cp (in T), of the cp integral and of the cp/T integral (in d) in one
    // loop: the same operations on each sum as the three loops of evaluate, so the same numbers
    const f = g.fused;
    const d = t - g.centre;
    let cp = 0;
    let h = 0;
    let s = 0;
    for (let k = f.length - 3; k >= 0; k -= 3) {
      cp = cp * t + f[k];
      h = h * d + f[k + 1];
      s = s * d + f[k + 2];
    }
    out.cp = R * cp;
    out.hFrom298 = g.hOffset + R * d * h;
    out.sFrom298 = g.sOffset + R * (g.a0 * (lnT - g.lnCentre) + d * s);
  };
  return {
    evaluate(t, out) {
      let i = 0;
      while (i < last && !(t < compiled[i].maxTemperatureK)) i++;
      const g = compiled[i];
      const a = g.coefficients;
      let cp = 0;
      for (let k = a.length - 1; k >= 0; k--) cp = cp * t + a[k];
      out.cp = R * cp;
      const d = t - g.centre;
      let h = 0;
      for (let m = g.cpIntegral.length - 1; m >= 0; m--) h = h * d + g.cpIntegral[m];
      let s = 0;
      for (let m = g.overT.length - 1; m >= 0; m--) s = s * d + g.overT[m];
      out.hFrom298 = g.hOffset + R * d * h;
      out.sFrom298 = g.sOffset + R * (g.a0 * Math.log1p(d / g.centre) + d * s);
    },
    evaluateWithLog,
  };
}

/** Coefficients of sum_k a_k T^k rewritten in powers of d = T - c (Taylor shift, O(n^2)). */
function shiftPolynomial(a: readonly number[], c: number): number[] {
  // repeated synthetic division by (T - c) (Horner's scheme for the Taylor shift)
  const b = a.slice();
  const n = b.length;
  for (let j = 0; j < n - 1; j++) {
    for (let k = n - 2; k >= j; k--) b[k] += c * b[k + 1];
  }
  return b;
}
