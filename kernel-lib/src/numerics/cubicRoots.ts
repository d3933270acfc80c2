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
 */
import { InputError } from "../errors.js";

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
 * @throws InputError if a coefficient is NaN or infinite, or all are zero.
 */
export function realCubicRoots(
  c3: number,
  c2: number,
  c1: number,
  c0: number,
  options: CubicRootsOptions = {},
): CubicRootsResult {
  const coefficients = [c3, c2, c1, c0];
  const names = ["c3", "c2", "c1", "c0"];
  for (let i = 0; i < 4; i++) {
    if (!Number.isFinite(coefficients[i])) {
      throw new InputError({
        input: names[i],
        unit: "-",
        validRange: "a finite number",
        received: coefficients[i],
      });
    }
  }
  const maxPolishSteps = options.maxPolishSteps ?? 4;
  if (!(maxPolishSteps >= 0 && Number.isInteger(maxPolishSteps))) {
    throw new InputError({
      input: "options.maxPolishSteps",
      unit: "-",
      validRange: "an integer >= 0",
      received: maxPolishSteps,
    });
  }

  let raw: number[];
  if (c3 !== 0) {
    raw = closedFormCubic(c2 / c3, c1 / c3, c0 / c3);
  } else if (c2 !== 0) {
    raw = quadraticRoots(c2, c1, c0);
  } else if (c1 !== 0) {
    raw = [-c0 / c1];
  } else if (c0 !== 0) {
    raw = [];
  } else {
    throw new InputError({
      input: "coefficients (c3, c2, c1, c0)",
      unit: "-",
      validRange: "not all zero (a zero polynomial has every x as a root)",
      received: [c3, c2, c1, c0],
    });
  }

  let iterations = 0;
  const roots: number[] = [];
  for (let i = 0; i < raw.length; i++) {
    let x = raw[i];
    // A polishing step may not travel more than half-way to another root, so that Newton near
    // a (nearly) double root cannot jump to a different root.
    let nearest = Infinity;
    for (let j = 0; j < raw.length; j++) {
      if (j !== i && raw[j] !== x) nearest = Math.min(nearest, Math.abs(raw[j] - x));
    }
    let px = horner(c3, c2, c1, c0, x);
    for (let k = 0; k < maxPolishSteps && px !== 0; k++) {
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
    roots.push(x);
  }
  roots.sort((a, b) => a - b);
  const residuals = roots.map((x) => horner(c3, c2, c1, c0, x));
  return { roots, residuals, iterations };
}

function horner(c3: number, c2: number, c1: number, c0: number, x: number): number {
  return ((c3 * x + c2) * x + c1) * x + c0;
}

/** Smallest power of two >= v (v > 0), so that rescaling is exact. */
function powerOfTwoAtLeast(v: number): number {
  return Math.pow(2, Math.ceil(Math.log2(v)));
}

/** Roots of the monic cubic x^3 + a x^2 + b x + c (Numerical Recipes 3rd ed. §5.6). */
function closedFormCubic(a: number, b: number, c: number): number[] {
  // Rescale x = s y with s a power of two so that |a'|, |b'|, |c'| <= 1: exact, and keeps
  // a^3, R^2, Q^3 far from overflow and underflow.
  const size = Math.max(Math.abs(a), Math.sqrt(Math.abs(b)), Math.cbrt(Math.abs(c)));
  if (size === 0) return [0, 0, 0];
  const s = powerOfTwoAtLeast(size);
  const A = a / s;
  const B = b / (s * s);
  const C = c / (s * s * s);

  const Q = (A * A - 3 * B) / 9; // eq. 5.6.10
  const R = (2 * A * A * A - 9 * A * B + 27 * C) / 54;
  const R2 = R * R;
  const Q3 = Q * Q * Q;
  const shift = A / 3;
  // Rounding in R^2 - Q^3 is a few eps times the larger of the two terms: inside that band the
  // closed form cannot tell a double root from two close roots or a close complex pair.
  const band = 16 * EPS * Math.max(R2, Math.abs(Q3), 16 * EPS * EPS);
  let threeReal: number[];
  if (Math.abs(R2 - Q3) <= band && Q >= 0) {
    const sq = Math.sqrt(Q);
    const sgn = R >= 0 ? 1 : -1;
    threeReal = [-2 * sgn * sq - shift, sgn * sq - shift, sgn * sq - shift];
  } else if (R2 < Q3) {
    // Three distinct real roots, eqs. 5.6.11-5.6.12.
    const sq = Math.sqrt(Q);
    const ratio = Math.max(-1, Math.min(1, R / (sq * sq * sq)));
    const theta = Math.acos(ratio);
    threeReal = [
      -2 * sq * Math.cos(theta / 3) - shift,
      -2 * sq * Math.cos((theta + 2 * Math.PI) / 3) - shift,
      -2 * sq * Math.cos((theta - 2 * Math.PI) / 3) - shift,
    ];
  } else {
    // One real root, eqs. 5.6.15-5.6.18 (sign chosen so |R| + sqrt(...) does not cancel).
    const sgn = R >= 0 ? 1 : -1;
    const Acard = -sgn * Math.cbrt(Math.abs(R) + Math.sqrt(R2 - Q3));
    const Bcard = Acard === 0 ? 0 : Q / Acard;
    return [(Acard + Bcard - shift) * s];
  }
  // The closed form gives each root with an ABSOLUTE error of a few eps times the largest root:
  // small roots lose relative accuracy and close pairs may be blurred into a double root. Keep
  // the largest-magnitude root (polished), and get the other two from the deflated quadratic
  // y^2 - S y + P with P = -C / y1 (product of the other two roots) and S = (B - P) / y1 (from
  // B = y1 (y2 + y3) + y2 y3), which avoids the cancellation of the sum -A - y1.
  let y1 = threeReal[0];
  for (const y of threeReal) if (Math.abs(y) > Math.abs(y1)) y1 = y;
  for (let k = 0; k < 4; k++) {
    const p = ((y1 + A) * y1 + B) * y1 + C;
    const dp = (3 * y1 + 2 * A) * y1 + B;
    if (p === 0 || dp === 0) break;
    const yNew = y1 - p / dp;
    const pNew = ((yNew + A) * yNew + B) * yNew + C;
    if (!(Math.abs(pNew) < Math.abs(p))) break;
    y1 = yNew;
  }
  const P = -C / y1;
  const S = (B - P) / y1;
  // P and S are accurate, so the quadratic's own verdict (complex pair, double or two distinct
  // roots) is trusted over the closed form's near-zero discriminant.
  const pair = quadraticRoots(1, -S, P);
  return [y1, ...pair].map((y) => y * s);
}

/** Real roots of a x^2 + b x + c with a != 0 (Numerical Recipes 3rd ed. eqs. 5.6.4-5.6.5). */
function quadraticRoots(a: number, b: number, c: number): number[] {
  const size = Math.max(Math.abs(b), Math.sqrt(Math.abs(a * c)));
  if (size === 0) return [0, 0];
  // Scale b and the product a c to order one to avoid overflow in b^2 - 4ac.
  const bs = b / size;
  const acs = a / size;
  const ccs = c / size;
  const disc = bs * bs - 4 * acs * ccs;
  const band = 8 * EPS * Math.max(bs * bs, Math.abs(4 * acs * ccs));
  if (Math.abs(disc) <= band) {
    const r = -b / (2 * a);
    return [r, r];
  }
  if (disc < 0) return [];
  const q = -0.5 * (bs + (bs >= 0 ? 1 : -1) * Math.sqrt(disc)) * size;
  if (q === 0) return [0, 0];
  return [q / a, c / q];
}
