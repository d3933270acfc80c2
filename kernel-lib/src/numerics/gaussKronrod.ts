/**
 * Globally adaptive quadrature with the 7-point Gauss / 15-point Kronrod pair.
 *
 * Source: R. Piessens, E. de Doncker-Kapenga, C. W. Überhuber & D. K. Kahaner, "QUADPACK: A
 * Subroutine Package for Automatic Integration", Springer (1983): the 15-point rule and its error
 * estimate are those of routine QK15 (section 2.2.1, error formula
 * err = resasc min(1, (200 |K15 - G7| / resasc)^1.5), floored at 50 eps resabs); the adaptive
 * strategy is that of QAG (section 3.1): keep a list of subintervals and bisect the one with the
 * largest error estimate until the summed error meets max(absTolerance, relTolerance |I|), or
 * the rounding floor 50 eps ∫|f| below which no estimate can go (QK15's own error floor; this
 * lets integrals that cancel to about zero, such as odd integrands, succeed).
 * The Kronrod nodes and weights below are the published QK15 values (Kronrod 1965, as tabulated in
 * QUADPACK's qk15.f); tests check them independently (Legendre roots, polynomial exactness).
 */
import { InputError, SolverError } from "../errors.js";
import { requireCount } from "../validate.js";

/** Options of {@link integrateAdaptive}. */
export interface QuadratureOptions {
  /**
   * Relative tolerance on the integral. Default 1e-10. The target error is
   * max(absTolerance, relTolerance |I|, 50 eps ∫|f|): the last term is the rounding floor.
   */
  relTolerance?: number;
  /** Absolute tolerance on the integral, in units of f times units of x. Default 0. */
  absTolerance?: number;
  /** Maximum number of subintervals (bisections + 1). Default 200. */
  maxSubdivisions?: number;
}

/** Result of {@link integrateAdaptive}. */
export interface QuadratureResult {
  /** The integral, in units of f times units of x. */
  value: number;
  /** Estimated absolute error (QUADPACK's estimate, conservative for smooth integrands). */
  errorEstimate: number;
  /** Number of integrand evaluations. */
  evaluations: number;
  /** Number of subintervals in the final partition (1 when the first 15-point rule sufficed). */
  subdivisions: number;
}

// The tables keep all published digits (33) so they can be compared with the source at a glance;
// the conversion to binary64 rounds them, which is intended.
/* eslint-disable no-loss-of-precision */
// Kronrod abscissae on [-1, 1] (non-negative half); odd indices 1, 3, 5 and node 7 = 0 are the
// 7-point Gauss nodes. Values of QUADPACK qk15.f (Piessens et al. 1983).
const XGK = [
  0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
  0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
  0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
  0.207784955007898467600689403773245, 0.0,
];
// Kronrod weights for XGK.
const WGK = [
  0.02293532201052922496373200805897, 0.063092092629978553290700663189204,
  0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
  0.16900472663926790282658342659855, 0.190350578064785409913256402421014,
  0.204432940075298892414161999234649, 0.209482141084727828012999174891714,
];
// 7-point Gauss weights for XGK[1], XGK[3], XGK[5], XGK[7].
const WG = [
  0.129484966168869693270611432679082, 0.27970539148927666790146777142378,
  0.381830050505118944950369775488975, 0.417959183673469387755102040816327,
];
/* eslint-enable no-loss-of-precision */

/** Exported for the tests that verify the tabulated rule; not part of the public API. */
export const KRONROD_15 = { nodes: XGK, kronrodWeights: WGK, gaussWeights: WG } as const;

const EPS = Number.EPSILON;
const UFLOW = Number.MIN_VALUE * 1e10; // QUADPACK's d1mach(1) guard, well above subnormals

// Outputs of the last rule application (module scratch: no allocation per rule; read right after
// each call, and written only after all integrand evaluations, so nested use stays correct).
let ruleResult = 0;
let ruleError = 0;
let ruleAbs = 0;
// Integrand values of the rule being applied, one buffer per nesting depth (an integrand may
// itself call integrateAdaptive), allocated once and reused.
const valuePool: Float64Array[] = [];
let depth = 0;

/** QK15 on [a, b]; sets ruleResult and ruleError. Returns false if a value was not finite. */
function applyRule(f: (x: number) => number, a: number, b: number): boolean {
  const fv = valuePool[depth] ?? (valuePool[depth] = new Float64Array(15));
  depth++;
  try {
    const centre = 0.5 * (a + b);
    const half = 0.5 * (b - a);
    const fc = f(centre);
    let resg = fc * WG[3];
    let resk = fc * WGK[7];
    let resabs = Math.abs(resk);
    for (let j = 0; j < 7; j++) {
      const dx = half * XGK[j];
      const f1 = f(centre - dx);
      const f2 = f(centre + dx);
      fv[2 * j] = f1;
      fv[2 * j + 1] = f2;
      const sum = f1 + f2;
      resk += WGK[j] * sum;
      resabs += WGK[j] * (Math.abs(f1) + Math.abs(f2));
      if (j % 2 === 1) resg += WG[(j - 1) >> 1] * sum;
    }
    const reskh = resk * 0.5;
    let resasc = WGK[7] * Math.abs(fc - reskh);
    for (let j = 0; j < 7; j++) {
      resasc += WGK[j] * (Math.abs(fv[2 * j] - reskh) + Math.abs(fv[2 * j + 1] - reskh));
    }
    const absHalf = Math.abs(half);
    const result = resk * half;
    const absAsc = resasc * absHalf;
    const absAbs = resabs * absHalf;
    let err = Math.abs((resk - resg) * half);
    if (absAsc !== 0 && err !== 0) err = absAsc * Math.min(1, Math.pow((200 * err) / absAsc, 1.5));
    if (absAbs > UFLOW / (50 * EPS)) err = Math.max(50 * EPS * absAbs, err);
    ruleResult = result;
    ruleError = err;
    ruleAbs = absAbs;
    return Number.isFinite(result) && Number.isFinite(err);
  } finally {
    depth--;
  }
}

/**
 * Integral of f from a to b (a > b gives the negative of the integral from b to a).
 *
 * @example
 * ```ts
 * const r = integrateAdaptive(Math.sqrt, 0, 1); // sqrt endpoint: bisects towards 0
 * r.value; // ≈ 0.666666666667 (closed form 2/3), with r.errorEstimate < 1e-10
 * ```
 * @throws InputError if a or b is not finite or an option is invalid.
 * @throws SolverError if f is not finite somewhere in [a, b], or the tolerance is not met within
 *   maxSubdivisions (the message gives the achieved error estimate and the target).
 */
export function integrateAdaptive(
  f: (x: number) => number,
  a: number,
  b: number,
  options: QuadratureOptions = {},
): QuadratureResult {
  if (!Number.isFinite(a)) {
    throw new InputError({ input: "a", unit: "units of x", validRange: "finite", received: a });
  }
  if (!Number.isFinite(b)) {
    throw new InputError({ input: "b", unit: "units of x", validRange: "finite", received: b });
  }
  const relTolerance = options.relTolerance ?? 1e-10;
  const absTolerance = options.absTolerance ?? 0;
  const maxSubdivisions = options.maxSubdivisions ?? 200;
  if (!(relTolerance >= 0 && relTolerance < 1)) {
    throw new InputError({
      input: "options.relTolerance",
      unit: "-",
      validRange: ">= 0 and < 1",
      received: relTolerance,
    });
  }
  if (!(absTolerance >= 0 && absTolerance < Infinity)) {
    throw new InputError({
      input: "options.absTolerance",
      unit: "units of f times units of x",
      validRange: "a finite number >= 0",
      received: absTolerance,
    });
  }
  if (relTolerance === 0 && absTolerance === 0) {
    throw new InputError({
      input: "options.relTolerance and options.absTolerance",
      unit: "-",
      validRange: "not both zero",
      received: 0,
    });
  }
  requireCount("options.maxSubdivisions", maxSubdivisions);
  if (a === b) return { value: 0, errorEstimate: 0, evaluations: 0, subdivisions: 1 };

  const notFinite = (lo: number, hi: number): never => {
    throw new SolverError(
      "adaptive Gauss-Kronrod 7-15 quadrature",
      `the integrand is NaN or infinite somewhere in [${lo}, ${hi}] (integrating from ${a} to ${b}); ` +
        `integrable endpoint singularities must not be evaluated at the end point itself`,
    );
  };

  if (!applyRule(f, a, b)) notFinite(a, b);
  let total = ruleResult;
  let totalError = ruleError;
  let totalAbs = ruleAbs;
  let evaluations = 15;
  const target = (): number =>
    Math.max(absTolerance, relTolerance * Math.abs(total), 50 * EPS * totalAbs);
  if (totalError <= target()) {
    return { value: total, errorEstimate: totalError, evaluations, subdivisions: 1 };
  }

  // Interval list, allocated only when the first rule was not enough.
  const lo = new Float64Array(maxSubdivisions);
  const hi = new Float64Array(maxSubdivisions);
  const res = new Float64Array(maxSubdivisions);
  const err = new Float64Array(maxSubdivisions);
  const abs = new Float64Array(maxSubdivisions);
  lo[0] = a;
  hi[0] = b;
  res[0] = total;
  err[0] = totalError;
  abs[0] = totalAbs;
  let count = 1;
  while (count < maxSubdivisions) {
    let worst = 0;
    for (let i = 1; i < count; i++) if (err[i] > err[worst]) worst = i;
    const left = lo[worst];
    const right = hi[worst];
    const mid = 0.5 * (left + right);
    if (!(mid > Math.min(left, right) && mid < Math.max(left, right))) break; // no room left
    if (!applyRule(f, left, mid)) notFinite(left, mid);
    const r1 = ruleResult;
    const e1 = ruleError;
    const a1 = ruleAbs;
    if (!applyRule(f, mid, right)) notFinite(mid, right);
    const r2 = ruleResult;
    const e2 = ruleError;
    const a2 = ruleAbs;
    evaluations += 30;
    total += r1 + r2 - res[worst];
    totalError += e1 + e2 - err[worst];
    totalAbs += a1 + a2 - abs[worst];
    hi[worst] = mid;
    res[worst] = r1;
    err[worst] = e1;
    abs[worst] = a1;
    lo[count] = mid;
    hi[count] = right;
    res[count] = r2;
    err[count] = e2;
    abs[count] = a2;
    count++;
    if (totalError <= target()) {
      // Re-sum to remove drift from the running updates before returning.
      let sum = 0;
      let sumErr = 0;
      let sumAbs = 0;
      for (let i = 0; i < count; i++) {
        sum += res[i];
        sumErr += err[i];
        sumAbs += abs[i];
      }
      total = sum;
      totalError = sumErr;
      totalAbs = sumAbs;
      if (totalError <= target()) {
        return { value: total, errorEstimate: totalError, evaluations, subdivisions: count };
      }
    }
  }
  throw new SolverError(
    "adaptive Gauss-Kronrod 7-15 quadrature",
    `tolerance not met on [${a}, ${b}] with ${count} subintervals (maxSubdivisions ` +
      `${maxSubdivisions}, ${evaluations} evaluations): achieved error estimate ${totalError} for ` +
      `integral ${total}, target ${target()} (relTolerance ${relTolerance}, absTolerance ` +
      `${absTolerance}); the integrand may be singular, discontinuous or too oscillatory, or the ` +
      `tolerance below rounding`,
  );
}
