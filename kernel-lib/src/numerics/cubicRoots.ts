/**
 * All real roots of a cubic c3 x^3 + c2 x^2 + c1 x + c0 = 0.
 *
 * Method: the closed form of Press, Teukolsky, Vetterling & Flannery, Numerical Recipes, 3rd ed.
 * (2007), section 5.6, eqs. 5.6.10-5.6.18 (trigonometric form for three real roots, Cardano form
 * with the sign choice that avoids cancellation for one real root), applied to a cubic rescaled by
 * a power of two so that no intermediate overflows or underflows. With three real roots only the
 * largest-magnitude one is kept from the closed form (Newton-polished); the other two come from the
 * deflated quadratic whose product (-c / x1) and sum ((b - product) / x1) are formed without
 * cancellation, in the spirit of W. Kahan, "To solve a real cubic equation", Berkeley report
 * PAM-352 (1986). Finally every root is Newton-polished on the ORIGINAL coefficients (Horner),
 * a step being accepted only when it lowers |p(x)| and moves less than half-way to another root.
 * Deflation plus polishing recover full relative accuracy for roots much smaller than the largest
 * one (the cubic equation of state in Z at low pressure: one root near 1 and tiny ones), where the
 * closed form alone is accurate only to about machine epsilon times the largest root.
 * Quadratics (c3 = 0) use the cancellation-free form q = -(b + sign(b) sqrt(b^2 - 4ac)) / 2,
 * x1 = q / a, x2 = c / q (Numerical Recipes 3rd ed., eqs. 5.6.4-5.6.5).
 *
 * Roots that coincide to within rounding (a discriminant that is zero within a few units of
 * roundoff) are returned as a repeated root, listed once per multiplicity. A repeated root is
 * intrinsically ill-conditioned: a double root is determined only to about sqrt(eps) relative,
 * a triple root to about eps^(1/3); the residuals say how well each returned root satisfies p.
 *
 * Coefficients near the smallest or the largest doubles: the rescaling divides by s, s^2, s^3
 * in turn where s^2 or s^3 would underflow to 0 or overflow (s itself is at most 2^1023), and the
 * quadratic's 4 a c / size^2 is formed without Infinity * 0, so x^3 - 5e-324 x has its three
 * roots, not NaN. Where c2/c3, c1/c3 or c0/c3 is not a finite double the cubic is refused
 * (OutOfRangeError, c3); where a nonzero coefficient drops below the normal range on the way to
 * the rescaled cubic (sizes spanning more than the doubles' range), each root is verified by
 * its backward error and a failure is a SolverError; a root that is not finite is one as well.
 */
import { InputError, OutOfRangeError, SolverError } from "../errors.js";

/** Options of {@link realCubicRoots}. */
export interface CubicRootsOptions {
  /**
   * Maximum Newton polishing steps per root. Default 4 (one or two are normally taken: polishing
   * stops when the step is below 2 eps |x| or stops lowering |p(x)|). 0 returns the closed form.
   */
  maxPolishSteps?: number;
}

/** Result of {@link realCubicRoots}. */
export interface CubicRootsResult {
  /** Real roots in ascending order, a repeated root listed once per multiplicity. */
  roots: number[];
  /** p(root) for each root, evaluated by Horner's rule on the given coefficients. */
  residuals: number[];
  /** Total Newton polishing steps taken over all roots. */
  iterations: number;
}

const EPS = Number.EPSILON;
const COEFFICIENT_NAMES = ["c3", "c2", "c1", "c0"] as const;
// the largest power of two among the doubles: the cap of the rescaling factor s (2^1024 is Infinity)
const MAX_POWER_OF_TWO = 2 ** 1023;

/**
 * All real roots of c3 x^3 + c2 x^2 + c1 x + c0 = 0, ascending.
 *
 * Degenerate cases: c3 = 0 solves the quadratic, c3 = c2 = 0 the linear equation; a nonzero
 * constant has no roots (empty list); all coefficients zero throws InputError (every x is a root).
 *
 * @example
 * ```ts
 * // (x - 1)(x - 2)(x - 3) = x^3 - 6x^2 + 11x - 6
 * realCubicRoots(1, -6, 11, -6).roots; // [1, 2, 3]
 * ```
 * @throws InputError if a coefficient is NaN or infinite, or all are zero; OutOfRangeError (c3)
 *   where c2/c3, c1/c3 or c0/c3 is not a finite double; SolverError where a root is not finite
 *   or, with coefficients spanning more than the doubles' range, fails its verification.
 */
export function realCubicRoots(
  c3: number,
  c2: number,
  c1: number,
  c0: number,
  options: CubicRootsOptions = {},
): CubicRootsResult {
  const out = new Float64Array(3);
  const count = solveInto(c3, c2, c1, c0, options.maxPolishSteps ?? 4, out);
  const roots: number[] = [];
  const residuals: number[] = [];
  for (let i = 0; i < count; i++) {
    roots.push(out[i]);
    residuals.push(horner(c3, c2, c1, c0, out[i]));
  }
  return { roots, residuals, iterations: polishStepsOfLastSolve };
}

/**
 * Allocation-free form of {@link realCubicRoots} for hot loops (density roots of a cubic equation
 * of state at every state): the same algorithm, with the default polishing (at most 4 Newton steps
 * per root). The real roots are written ascending into `out[0 .. count - 1]` and their number
 * (0 to 3) is returned; the rest of `out` is left untouched. No residuals are formed.
 *
 * @example
 * ```ts
 * const out = new Float64Array(3);
 * const n = realCubicRootsInto(1, -6, 11, -6, out); // n = 3, out = [1, 2, 3]
 * ```
 * @throws InputError if a coefficient is NaN or infinite, if all are zero, or if `out` holds fewer
 *   than 3 numbers; OutOfRangeError and SolverError as {@link realCubicRoots}.
 */
export function realCubicRootsInto(
  c3: number,
  c2: number,
  c1: number,
  c0: number,
  out: Float64Array,
): number {
  if (!(out.length >= 3)) {
    throw new InputError({
      input: "out",
      unit: "-",
      validRange: "a Float64Array of length >= 3",
      received: out.length,
    });
  }
  return solveInto(c3, c2, c1, c0, 4, out);
}

// Newton steps taken by the last solveInto call: read by realCubicRoots right after the call
// (single-threaded, so no other solve can run in between); keeps the lean path free of a result object.
let polishStepsOfLastSolve = 0;
// closed-form (unpolished) roots of the current solve, reused across calls (at most 3)
const rawScratch = new Float64Array(3);

function checkCoefficient(index: number, value: number): void {
  if (!Number.isFinite(value)) {
    throw new InputError({
      input: COEFFICIENT_NAMES[index],
      unit: "-",
      validRange: "a finite number",
      received: value,
    });
  }
}

/** The shared algorithm: checks, closed form, polishing, ascending order into out; returns the count. */
function solveInto(
  c3: number,
  c2: number,
  c1: number,
  c0: number,
  maxPolishSteps: number,
  out: Float64Array,
): number {
  checkCoefficient(0, c3);
  checkCoefficient(1, c2);
  checkCoefficient(2, c1);
  checkCoefficient(3, c0);
  if (!(maxPolishSteps >= 0 && Number.isInteger(maxPolishSteps))) {
    throw new InputError({
      input: "options.maxPolishSteps",
      unit: "-",
      validRange: "an integer >= 0",
      received: maxPolishSteps,
    });
  }

  const raw = rawScratch;
  let count: number;
  lostBelowNormal = false;
  if (c3 !== 0) {
    // monic already (the Z-cubic of an equation of state): no divisions on the critical path
    if (c3 === 1) {
      count = closedFormCubic(c2, c1, c0, raw);
    } else {
      const a = c2 / c3;
      const b = c1 / c3;
      const c = c0 / c3;
      checkMonic(c3, c2, c1, c0, a, b, c);
      const lost = leftNormalRange(c2, a) || leftNormalRange(c1, b) || leftNormalRange(c0, c);
      count = closedFormCubic(a, b, c, raw);
      lostBelowNormal ||= lost;
    }
  } else if (c2 !== 0) {
    count = quadraticRoots(c2, c1, c0, raw, 0);
  } else if (c1 !== 0) {
    raw[0] = -c0 / c1;
    count = 1;
  } else if (c0 !== 0) {
    count = 0;
  } else {
    throw new InputError({
      input: "coefficients (c3, c2, c1, c0)",
      unit: "-",
      validRange: "not all zero (a zero polynomial has every x as a root)",
      received: [c3, c2, c1, c0],
    });
  }

  let iterations = 0;
  for (let i = 0; i < count; i++) {
    let x = raw[i];
    // A polishing step may not travel more than half-way to another root, so that Newton near
    // a (nearly) double root cannot jump to a different root.
    let nearest = Infinity;
    for (let j = 0; j < count; j++) {
      if (j !== i && raw[j] !== x) nearest = Math.min(nearest, Math.abs(raw[j] - x));
    }
    let px = horner(c3, c2, c1, c0, x);
    // A single real root whose first Newton step would be below 2 eps |x| (the stopping rule
    // below, tested with a product instead of the quotient px / dp) stands as the closed form gave
    // it, without the division. (Several roots are always polished: near a saturation state the
    // liquid root's last ulps show in the fugacities.)
    const dp0 = (3 * c3 * x + 2 * c2) * x + c1;
    const steps =
      count === 1 && Math.abs(px) <= 2 * EPS * Math.abs(x) * Math.abs(dp0) ? 0 : maxPolishSteps;
    for (let k = 0; k < steps && px !== 0; k++) {
      const dp = (3 * c3 * x + 2 * c2) * x + c1;
      if (dp === 0 || !Number.isFinite(dp)) break;
      const step = px / dp;
      const xNew = x - step;
      const pNew = horner(c3, c2, c1, c0, xNew);
      if (!(Math.abs(pNew) < Math.abs(px)) || !(Math.abs(xNew - raw[i]) < nearest / 2)) {
        break;
      }
      iterations++;
      x = xNew;
      px = pNew;
      if (Math.abs(step) <= 2 * EPS * Math.abs(x)) break;
    }
    // verified before it is returned: a finite x; and where the normalisation or the rescaling
    // took a nonzero coefficient below the normal range (its last bits or all of it lost, so the
    // closed form solved another cubic), the backward error of a computed root,
    // |p(x)| <= 64 eps sum |c_i x^i| (plus 64 subnormal units where the terms underflow)
    if (
      !(Math.abs(x) < Infinity) ||
      (lostBelowNormal &&
        !(
          Math.abs(px) <=
          64 *
            EPS *
            (Math.abs(c3 * x * x * x) + Math.abs(c2 * x * x) + Math.abs(c1 * x) + Math.abs(c0)) +
            64 * Number.MIN_VALUE
        ))
    ) {
      throw new SolverError(
        "real cubic roots (closed form, Numerical Recipes 3rd ed. sec. 5.6, power-of-two rescaling)",
        `the coefficients (c3, c2, c1, c0) = (${c3}, ${c2}, ${c1}, ${c0}) gave x = ${x} with p(x) = ${px}, not verified as a root: their sizes span more than the range of doubles; substitute x = k y with a power of two k`,
      );
    }
    // insertion sort into out (at most 3 roots): ascending without a comparator closure
    let j = i;
    while (j > 0 && out[j - 1] > x) {
      out[j] = out[j - 1];
      j--;
    }
    out[j] = x;
  }
  polishStepsOfLastSolve = iterations;
  return count;
}

function horner(c3: number, c2: number, c1: number, c0: number, x: number): number {
  return ((c3 * x + c2) * x + c1) * x + c0;
}

/**
 * Refuses the monic form (a, b, c) = (c2, c1, c0) / c3 where one of them is not a finite double
 * (c3 near the smallest doubles beside the others): the monic form cannot hold that cubic.
 */
function checkMonic(
  c3: number,
  c2: number,
  c1: number,
  c0: number,
  a: number,
  b: number,
  c: number,
): void {
  if (!(Math.abs(a) < Infinity && Math.abs(b) < Infinity && Math.abs(c) < Infinity)) {
    throw new OutOfRangeError({
      input: "c3",
      unit: "-",
      validRange: `large enough beside (c2, c1, c0) = (${c2}, ${c1}, ${c0}) that c2/c3, c1/c3 and c0/c3 are finite doubles`,
      received: c3,
      hint: "Substitute x = k y with a power of two k to bring the coefficients together",
    });
  }
}

// the smallest normal double, 2^-1022
const MIN_NORMAL = 2 ** -1022;

// set by solveInto and closedFormCubic: a nonzero coefficient left the normal range on its way
// to the rescaled cubic (read by solveInto right after; single-threaded, as polishStepsOfLastSolve)
let lostBelowNormal = false;

/** True when a nonzero coefficient `v` became `scaled` below the normal range (bits lost). */
function leftNormalRange(v: number, scaled: number): boolean {
  return v !== 0 && !(Math.abs(scaled) >= MIN_NORMAL) && Math.abs(v) >= MIN_NORMAL;
}

/** Smallest power of two >= v (v > 0), so that rescaling is exact; at most 2^1023. */
function powerOfTwoAtLeast(v: number): number {
  return Math.min(Math.pow(2, Math.ceil(Math.log2(v))), MAX_POWER_OF_TWO);
}

/**
 * v / s^k for the rescaling factor s (a power of two) and k = 2 or 3: one division by s^k where
 * s^k is a nonzero finite double (exact, the path of every ordinary cubic), else k divisions by
 * s. Coefficients near the smallest doubles (x^3 - 5e-324 x) make s^k underflow to 0 (0/0 gave
 * NaN roots); near the largest, s^k overflows to Infinity (v / Infinity dropped the coefficient).
 */
function overPowerOf(v: number, s: number, k: 2 | 3): number {
  const sk = k === 2 ? s * s : s * s * s;
  if (sk > 0 && sk < Infinity) return v / sk;
  return k === 2 ? v / s / s : v / s / s / s;
}

/**
 * Roots of the monic cubic x^3 + a x^2 + b x + c (Numerical Recipes 3rd ed. §5.6), written into
 * out[0 ..]; returns their number (1 or 3, or 1 to 3 after deflation).
 */
function closedFormCubic(a: number, b: number, c: number, out: Float64Array): number {
  // Rescale x = s y with s a power of two so that |a'|, |b'|, |c'| <= 1: exact, and keeps
  // a^3, R^2, Q^3 far from overflow and underflow. s is the smallest power of two >= size =
  // max(|a|, |b|^(1/2), |c|^(1/3)); when size lies in (1/2, 1], as for the Z-cubic of an equation
  // of state, s = 1 is decided from the coefficients themselves, without the root and logarithm.
  const aa = Math.abs(a);
  const ab = Math.abs(b);
  const ac = Math.abs(c);
  let s = 1;
  if (!(aa <= 1 && ab <= 1 && ac <= 1 && (aa > 0.5 || ab > 0.25 || ac > 0.125))) {
    const size = Math.max(aa, Math.sqrt(ab), Math.cbrt(ac));
    if (size === 0) {
      out[0] = 0;
      out[1] = 0;
      out[2] = 0;
      return 3;
    }
    s = powerOfTwoAtLeast(size);
  }
  const A = s === 1 ? a : a / s;
  const B = s === 1 ? b : overPowerOf(b, s, 2);
  const C = s === 1 ? c : overPowerOf(c, s, 3);
  lostBelowNormal =
    s > 1 && (leftNormalRange(a, A) || leftNormalRange(b, B) || leftNormalRange(c, C));

  const Q = (A * A - 3 * B) / 9; // eq. 5.6.10
  const R = (2 * A * A * A - 9 * A * B + 27 * C) / 54;
  const R2 = R * R;
  const Q3 = Q * Q * Q;
  const shift = A / 3;
  // Rounding in R^2 - Q^3 is a few eps times the larger of the two terms: inside that band the
  // closed form cannot tell a double root from two close roots or a close complex pair.
  const band = 16 * EPS * Math.max(R2, Math.abs(Q3), 16 * EPS * EPS);
  // y1: the largest-magnitude of the three real closed-form roots
  let y1: number;
  if (Math.abs(R2 - Q3) <= band && Q >= 0) {
    // roots -2 sgn sqrt(Q) - shift and (twice) sgn sqrt(Q) - shift
    const sq = Math.sqrt(Q);
    const sgn = R >= 0 ? 1 : -1;
    y1 = largestMagnitude(-2 * sgn * sq - shift, sgn * sq - shift, sgn * sq - shift);
  } else if (R2 < Q3) {
    // Three distinct real roots, eqs. 5.6.11-5.6.12.
    const sq = Math.sqrt(Q);
    const ratio = Math.max(-1, Math.min(1, R / (sq * sq * sq)));
    const theta = Math.acos(ratio);
    y1 = largestMagnitude(
      -2 * sq * Math.cos(theta / 3) - shift,
      -2 * sq * Math.cos((theta + 2 * Math.PI) / 3) - shift,
      -2 * sq * Math.cos((theta - 2 * Math.PI) / 3) - shift,
    );
  } else {
    // One real root, eqs. 5.6.15-5.6.18 (sign chosen so |R| + sqrt(...) does not cancel).
    const sgn = R >= 0 ? 1 : -1;
    const Acard = -sgn * Math.cbrt(Math.abs(R) + Math.sqrt(R2 - Q3));
    const Bcard = Acard === 0 ? 0 : Q / Acard;
    out[0] = (Acard + Bcard - shift) * s;
    return 1;
  }
  // The closed form gives each root with an ABSOLUTE error of a few eps times the largest root:
  // small roots lose relative accuracy and close pairs may be blurred into a double root. Keep
  // the largest-magnitude root (polished), and get the other two from the deflated quadratic
  // y^2 - S y + P with P = -C / y1 (product of the other two roots) and S = (B - P) / y1 (from
  // B = y1 (y2 + y3) + y2 y3), which avoids the cancellation of the sum -A - y1.
  for (let k = 0; k < 4; k++) {
    const p = ((y1 + A) * y1 + B) * y1 + C;
    const dp = (3 * y1 + 2 * A) * y1 + B;
    if (p === 0 || dp === 0) break;
    const yNew = y1 - p / dp;
    // a polishing step stays near y1: at a double root dp ~ 0 and a step could land on another
    // root (x (x + 10)^2: from -10 onto 0, where P = -C / y1 = 0/0 gave NaN roots)
    if (!(Math.abs(yNew - y1) < 0.5 * Math.abs(y1))) break;
    const pNew = ((yNew + A) * yNew + B) * yNew + C;
    if (!(Math.abs(pNew) < Math.abs(p))) break;
    y1 = yNew;
  }
  const P = -C / y1;
  const S = (B - P) / y1;
  // P and S are accurate, so the quadratic's own verdict (complex pair, double or two distinct
  // roots) is trusted over the closed form's near-zero discriminant.
  const pairCount = quadraticRoots(1, -S, P, out, 1);
  out[0] = y1 * s;
  for (let k = 1; k <= pairCount; k++) out[k] *= s;
  return 1 + pairCount;
}

/** The first of three numbers with the largest magnitude (ties keep the earlier one). */
function largestMagnitude(y0: number, y1: number, y2: number): number {
  let best = y0;
  if (Math.abs(y1) > Math.abs(best)) best = y1;
  if (Math.abs(y2) > Math.abs(best)) best = y2;
  return best;
}

/**
 * Real roots of a x^2 + b x + c with a != 0 (Numerical Recipes 3rd ed. eqs. 5.6.4-5.6.5), written
 * into out[offset ..]; returns their number (0 or 2, a double root listed twice).
 */
function quadraticRoots(
  a: number,
  b: number,
  c: number,
  out: Float64Array,
  offset: number,
): number {
  const size = Math.max(Math.abs(b), Math.sqrt(Math.abs(a * c)));
  if (size === 0) {
    out[offset] = 0;
    out[offset + 1] = 0;
    return 2;
  }
  // Scale b and the product a c to order one to avoid overflow in b^2 - 4ac.
  const bs = b / size;
  const acs = a / size;
  const ccs = c / size;
  // 4 a c / size^2 as 4 (a/size)(c/size), as always; where size is so small that 4 a/size
  // overflows (coefficients near the smallest doubles: Infinity * 0 gave NaN), as
  // 4 (a (c/size)) / size, finite because size^2 >= |a c|
  const fourAC = Math.abs(4 * acs) < Infinity ? 4 * acs * ccs : (4 * (a * ccs)) / size;
  const disc = bs * bs - fourAC;
  const band = 8 * EPS * Math.max(bs * bs, Math.abs(fourAC));
  if (Math.abs(disc) <= band) {
    const r = -b / (2 * a);
    out[offset] = r;
    out[offset + 1] = r;
    return 2;
  }
  if (disc < 0) return 0;
  const q = -0.5 * (bs + (bs >= 0 ? 1 : -1) * Math.sqrt(disc)) * size;
  if (q === 0) {
    out[offset] = 0;
    out[offset + 1] = 0;
    return 2;
  }
  out[offset] = q / a;
  out[offset + 1] = c / q;
  return 2;
}

// closed-form roots of the current monicCubicRootsInto call (at most 3), reused
const monicRaw = new Float64Array(3);

// the root found by the last successful newtonFromAbove call
let newtonRoot = NaN;

/**
 * Newton's method on x^3 + c2 x^2 + c1 x + c0 from `x0` downwards (monicCubicRootsInto's
 * `upperStart`: the caller has established one real root, right of the inflection point). True
 * with the root in `newtonRoot` when the conditions of the start hold and the iteration ends at
 * rounding level; false otherwise (the caller takes the closed form).
 */
function newtonFromAbove(c2: number, c1: number, c0: number, x0: number): boolean {
  if (!(x0 > -c2 / 3)) return false;
  let x = x0;
  let p = ((x + c2) * x + c1) * x + c0;
  if (!(p >= 0)) return false;
  for (let k = 0; k < 100; k++) {
    const dp = (3 * x + 2 * c2) * x + c1;
    const xNew = x - p / dp;
    if (!(xNew < x)) {
      const ax = Math.abs(x);
      const size = ((ax + Math.abs(c2)) * ax + Math.abs(c1)) * ax + Math.abs(c0);
      if (!(Math.abs(p) <= 16 * EPS * size && size < Infinity)) return false;
      // a well-conditioned root only (|x p'(x)| at least 1 % of the terms: its rounding then
      // moves x by a few eps); near a double or triple root (the critical point) the closed form
      if (!(Math.abs(x * dp) >= 0.01 * size)) return false;
      newtonRoot = x;
      return true;
    }
    x = xNew;
    p = ((x + c2) * x + c1) * x + c0;
  }
  return false;
}

/**
 * The roots of the monic cubic x^3 + c[0] x^2 + c[1] x + c[2] = 0 written ascending into
 * `out[0 .. count - 1]`, their number returned: the algorithm of {@link realCubicRootsInto} for
 * c3 = 1, step for step on the same numbers (so the same roots to the last bit; a test holds the
 * two equal), written as one function whose numbers come and go through typed arrays. A call that
 * passes plain numbers to a function the engine does not inline boxes each of them on the heap; in
 * a loop over millions of states (the sweeps' row kernel) those boxes cost more than the algebra.
 *
 * `upperStart` (optional; the Z-cubic of a cubic equation of state passes 1 + B, above every root
 * with Z - B > 0): where the closed form would take a cube root (one real root) and that root lies
 * right of the inflection point x_i = -c2/3 (R < 0 of the depressed cubic), a start with
 * x0 > x_i and p(x0) >= 0 lies at or above the root in the region where p is convex and rising,
 * so Newton's method from it decreases monotonically to the root (Fourier's condition; e.g.
 * J. Stoer and R. Bulirsch, Introduction to Numerical Analysis, 3rd ed. (2002), sec. 5.3). It
 * stops at the first step that no longer decreases x and is accepted when |p(x)| is then at
 * rounding level (16 eps of the sum of the terms' magnitudes), within 100 steps, and the root is
 * well conditioned (|x p'(x)| at least 1 % of that sum; not near the critical point); otherwise, and
 * for a start that fails the two conditions, the closed form runs. This takes no cube root (about
 * 6 steps from 1 + B for a gas); the root may differ from the closed form's in the last bits
 * (tests/unit/numerics/cubicNewtonStart.test.ts: within 1e-13 relative). Omitted (NaN): the
 * closed form, step for step as realCubicRootsInto.
 *
 * The guards against coefficients near the smallest and largest doubles are the same as there;
 * the verification that follows them in realCubicRootsInto (a root not finite, or not a root to
 * rounding after a coefficient left the normal range) is not repeated on this path, whose
 * Z-cubic coefficients are of order one.
 *
 * @throws InputError as realCubicRootsInto: a coefficient NaN or infinite.
 */
export function monicCubicRootsInto(c: Float64Array, out: Float64Array, upperStart = NaN): number {
  const c2 = c[0];
  const c1 = c[1];
  const c0 = c[2];
  if (!Number.isFinite(c2) || !Number.isFinite(c1) || !Number.isFinite(c0)) {
    checkCoefficient(1, c2);
    checkCoefficient(2, c1);
    checkCoefficient(3, c0);
  }
  const raw = monicRaw;
  let count = 0;
  // closedFormCubic(c2, c1, c0, raw), inline
  {
    const a = c2;
    const b = c1;
    const cc = c0;
    const aa = Math.abs(a);
    const ab = Math.abs(b);
    const ac = Math.abs(cc);
    let s = 1;
    let zero = false;
    if (!(aa <= 1 && ab <= 1 && ac <= 1 && (aa > 0.5 || ab > 0.25 || ac > 0.125))) {
      const size = Math.max(aa, Math.sqrt(ab), Math.cbrt(ac));
      if (size === 0) zero = true;
      else s = Math.min(Math.pow(2, Math.ceil(Math.log2(size))), MAX_POWER_OF_TWO);
    }
    if (zero) {
      raw[0] = 0;
      raw[1] = 0;
      raw[2] = 0;
      count = 3;
    } else {
      const A = s === 1 ? a : a / s;
      // overPowerOf(b, s, 2) and overPowerOf(cc, s, 3), inline: for a power of two s, s^2 is a
      // nonzero finite double exactly when 2^-537 <= s <= 2^511, s^3 when 2^-358 <= s <= 2^341
      const B = s === 1 ? b : s >= 2 ** -537 && s <= 2 ** 511 ? b / (s * s) : b / s / s;
      const C = s === 1 ? cc : s >= 2 ** -358 && s <= 2 ** 341 ? cc / (s * s * s) : cc / s / s / s;
      const Q = (A * A - 3 * B) / 9;
      const R = (2 * A * A * A - 9 * A * B + 27 * C) / 54;
      const R2 = R * R;
      const Q3 = Q * Q * Q;
      const shift = A / 3;
      const band = 16 * EPS * Math.max(R2, Math.abs(Q3), 16 * EPS * EPS);
      let y1 = NaN;
      let three = true;
      if (Math.abs(R2 - Q3) <= band && Q >= 0) {
        const sq = Math.sqrt(Q);
        const sgn = R >= 0 ? 1 : -1;
        y1 = largestMagnitude(-2 * sgn * sq - shift, sgn * sq - shift, sgn * sq - shift);
      } else if (R2 < Q3) {
        const sq = Math.sqrt(Q);
        const ratio = Math.max(-1, Math.min(1, R / (sq * sq * sq)));
        const theta = Math.acos(ratio);
        const yLow = -2 * sq * Math.cos(theta / 3) - shift;
        const yHigh = -2 * sq * Math.cos((theta + 2 * Math.PI) / 3) - shift;
        // the third, the middle root (its cosine lies in [-1/2, 1/2]), has |y| <= sq + |shift|:
        // when one of the outer two is larger by a margin far above rounding, largestMagnitude
        // cannot pick it, and its cosine is not needed
        // (largestMagnitude written out: the first of the three with the largest magnitude)
        y1 = Math.abs(yHigh) > Math.abs(yLow) ? yHigh : yLow;
        if (!(Math.abs(y1) > (sq + Math.abs(shift)) * (1 + 1e-12))) {
          const yMid = -2 * sq * Math.cos((theta - 2 * Math.PI) / 3) - shift;
          if (Math.abs(yMid) > Math.abs(y1)) y1 = yMid;
        }
      } else if (R < 0 && newtonFromAbove(A, B, C, s === 1 ? upperStart : upperStart / s)) {
        // on the rescaled cubic (a power of two: the same steps, no underflow or overflow)
        raw[0] = newtonRoot * s;
        count = 1;
        three = false;
      } else {
        const sgn = R >= 0 ? 1 : -1;
        const Acard = -sgn * Math.cbrt(Math.abs(R) + Math.sqrt(R2 - Q3));
        const Bcard = Acard === 0 ? 0 : Q / Acard;
        raw[0] = (Acard + Bcard - shift) * s;
        count = 1;
        three = false;
      }
      if (three) {
        for (let k = 0; k < 4; k++) {
          const p = ((y1 + A) * y1 + B) * y1 + C;
          const dp = (3 * y1 + 2 * A) * y1 + B;
          if (p === 0 || dp === 0) break;
          const yNew = y1 - p / dp;
          // (closedFormCubic's guard: a step stays near y1, never onto another root)
          if (!(Math.abs(yNew - y1) < 0.5 * Math.abs(y1))) break;
          const pNew = ((yNew + A) * yNew + B) * yNew + C;
          if (!(Math.abs(pNew) < Math.abs(p))) break;
          y1 = yNew;
        }
        const P = -C / y1;
        const S = (B - P) / y1;
        // quadraticRoots(1, -S, P, raw, 1), inline
        let pairCount: number;
        {
          const qa = 1;
          const qb = -S;
          const qc = P;
          const size = Math.max(Math.abs(qb), Math.sqrt(Math.abs(qa * qc)));
          if (size === 0) {
            raw[1] = 0;
            raw[2] = 0;
            pairCount = 2;
          } else {
            const bs = qb / size;
            const acs = qa / size;
            const ccs = qc / size;
            // as in quadraticRoots: no Infinity * 0 where size is near the smallest doubles
            const fourAC = Math.abs(4 * acs) < Infinity ? 4 * acs * ccs : (4 * (qa * ccs)) / size;
            const disc = bs * bs - fourAC;
            const qband = 8 * EPS * Math.max(bs * bs, Math.abs(fourAC));
            if (Math.abs(disc) <= qband) {
              const r = -qb / (2 * qa);
              raw[1] = r;
              raw[2] = r;
              pairCount = 2;
            } else if (disc < 0) {
              pairCount = 0;
            } else {
              const q = -0.5 * (bs + (bs >= 0 ? 1 : -1) * Math.sqrt(disc)) * size;
              if (q === 0) {
                raw[1] = 0;
                raw[2] = 0;
              } else {
                raw[1] = q / qa;
                raw[2] = qc / q;
              }
              pairCount = 2;
            }
          }
        }
        raw[0] = y1 * s;
        for (let k = 1; k <= pairCount; k++) raw[k] *= s;
        count = 1 + pairCount;
      }
    }
  }
  // the polishing of solveInto with c3 = 1 (3 * c3 * x = 3 * x and 1 * x = x exactly)
  for (let i = 0; i < count; i++) {
    let x = raw[i];
    let nearest = Infinity;
    for (let j = 0; j < count; j++) {
      if (j !== i && raw[j] !== x) nearest = Math.min(nearest, Math.abs(raw[j] - x));
    }
    let px = ((x + c2) * x + c1) * x + c0;
    const dp0 = (3 * x + 2 * c2) * x + c1;
    const steps = count === 1 && Math.abs(px) <= 2 * EPS * Math.abs(x) * Math.abs(dp0) ? 0 : 4;
    for (let k = 0; k < steps && px !== 0; k++) {
      const dp = (3 * x + 2 * c2) * x + c1;
      if (dp === 0 || !Number.isFinite(dp)) break;
      const step = px / dp;
      const xNew = x - step;
      const pNew = ((xNew + c2) * xNew + c1) * xNew + c0;
      if (!(Math.abs(pNew) < Math.abs(px)) || !(Math.abs(xNew - raw[i]) < nearest / 2)) break;
      x = xNew;
      px = pNew;
      if (Math.abs(step) <= 2 * EPS * Math.abs(x)) break;
    }
    let j = i;
    while (j > 0 && out[j - 1] > x) {
      out[j] = out[j - 1];
      j--;
    }
    out[j] = x;
  }
  return count;
}
