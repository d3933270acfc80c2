import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  monicCubicRootsInto,
  realCubicRoots,
  realCubicRootsInto,
} from "../../../kernel-lib/src/numerics/cubicRoots.js";
import {
  InputError,
  IsochorError,
  OutOfRangeError,
  SolverError,
} from "../../../kernel-lib/src/errors.js";

/** Relative difference, guarded for zero. */
function rel(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(b), Number.MIN_VALUE);
}

/**
 * The textbook trigonometric / Cardano formula with no rescaling and no polishing (Numerical
 * Recipes 3rd ed. eq. 5.6.12 used as is): the "naive" method this module improves on.
 */
function naiveTrigRoots(a: number, b: number, c: number): number[] {
  const Q = (a * a - 3 * b) / 9;
  const R = (2 * a * a * a - 9 * a * b + 27 * c) / 54;
  const theta = Math.acos(R / Math.sqrt(Q * Q * Q));
  const sq = Math.sqrt(Q);
  return [
    -2 * sq * Math.cos(theta / 3) - a / 3,
    -2 * sq * Math.cos((theta + 2 * Math.PI) / 3) - a / 3,
    -2 * sq * Math.cos((theta - 2 * Math.PI) / 3) - a / 3,
  ].sort((x, y) => x - y);
}

describe("realCubicRoots", () => {
  it("solves (x-1)(x-2)(x-3) (closed form: expanded by hand)", () => {
    const r = realCubicRoots(1, -6, 11, -6);
    expect(r.roots).toHaveLength(3);
    r.roots.forEach((x, i) => expect(x).toBeCloseTo(i + 1, 14));
    r.residuals.forEach((p) => expect(Math.abs(p)).toBeLessThan(1e-13));
  });

  it("recovers tiny roots next to a root near 1 to full relative accuracy where the naive formula does not", () => {
    // Exactly representable roots 2^-30, 3*2^-30 and 1 (closed form: (x-1)(x-e)(x-3e), e = 2^-30);
    // every coefficient below is exact in binary64, so the exact roots are known. This is the
    // shape of the cubic EOS in Z at low pressure.
    const e = 2 ** -30;
    const c2 = -(1 + 4 * e);
    const c1 = 4 * e + 3 * e * e;
    const c0 = -3 * e * e;
    const careful = realCubicRoots(1, c2, c1, c0).roots;
    expect(rel(careful[0], e)).toBeLessThan(1e-14);
    expect(rel(careful[1], 3 * e)).toBeLessThan(1e-14);
    expect(rel(careful[2], 1)).toBeLessThan(1e-15);
    const naive = naiveTrigRoots(c2, c1, c0);
    // The naive formula has absolute error ~ eps: relative error on the 1e-9 roots ~ 1e-7.
    expect(Math.max(rel(naive[0], e), rel(naive[1], 3 * e))).toBeGreaterThan(1e-10);
  });

  it("handles coefficients whose scale would overflow the unscaled formula", () => {
    // Roots 1e100, 2e100, 3e100: a^3 ~ 2e302 and 2 a^3 overflows without rescaling.
    const r = realCubicRoots(1, -6e100, 11e200, -6e300).roots;
    expect(r).toHaveLength(3);
    [1e100, 2e100, 3e100].forEach((x, i) => expect(rel(r[i], x)).toBeLessThan(1e-12));
    // Roots -2e-100, 1e-100, 4e-100 (closed form: sum 3e-100, pair sum -6e-200, product -8e-300):
    // Q^3 and R^2 (~1e-600) would underflow to zero without rescaling.
    const s = realCubicRoots(1, -3e-100, -6e-200, 8e-300).roots;
    expect(s).toHaveLength(3);
    [-2e-100, 1e-100, 4e-100].forEach((x, i) => expect(rel(s[i], x)).toBeLessThan(1e-12));
  });

  it("returns a double root twice and a triple root three times", () => {
    // (x-1)^2 (x-2) = x^3 - 4x^2 + 5x - 2 (closed form)
    const d = realCubicRoots(1, -4, 5, -2).roots;
    expect(d).toHaveLength(3);
    expect(d[0]).toBeCloseTo(1, 7);
    expect(d[1]).toBeCloseTo(1, 7);
    expect(d[2]).toBeCloseTo(2, 14);
    // (x-1)^3 = x^3 - 3x^2 + 3x - 1
    const t = realCubicRoots(1, -3, 3, -1).roots;
    expect(t).toEqual([1, 1, 1]);
    // x^3 = 0
    expect(realCubicRoots(2, 0, 0, 0).roots).toEqual([0, 0, 0]);
  });

  it("a double root beside a root at zero: x (x + 10)^2, as a random test met it (no NaN)", () => {
    // x (x + 10)^2 = x^3 + 20 x^2 + 100 x (closed form), with the coefficients a property test
    // formed for roots near -10, -10 and 0; polishing the double root once stepped onto the root
    // 0 and the deflation divided 0 by it (NaN roots; a SolverError since roots are verified)
    for (const [c2, c1] of [
      [20, 100],
      [19.999999999998586, 99.99999999998585],
    ]) {
      const r = realCubicRoots(1, c2, c1, 0).roots;
      expect(r).toHaveLength(3);
      expect(r[0]).toBeCloseTo(-10, 5);
      expect(r[1]).toBeCloseTo(-10, 5);
      expect(Math.abs(r[2])).toBe(0);
      const monic = new Float64Array(3);
      const n = monicCubicRootsInto(Float64Array.from([c2, c1, 0]), monic);
      expect(n).toBe(3);
      for (let k = 0; k < 3; k++) expect(Object.is(monic[k], r[k])).toBe(true);
    }
  });

  it("separates nearly coincident distinct roots (1, 1 + 1e-6, 3)", () => {
    // Roots of a double-root-like cubic are determined only to ~ sqrt(eps) * spread: 1e-6 apart is
    // resolvable. Coefficients formed from the roots (closed form of Vieta's relations).
    const r1 = 1,
      r2 = 1 + 1e-6,
      r3 = 3;
    const res = realCubicRoots(1, -(r1 + r2 + r3), r1 * r2 + r1 * r3 + r2 * r3, -r1 * r2 * r3);
    expect(res.roots).toHaveLength(3);
    expect(Math.abs(res.roots[0] - r1)).toBeLessThan(1e-9);
    expect(Math.abs(res.roots[1] - r2)).toBeLessThan(1e-9);
    expect(res.roots[2]).toBeCloseTo(3, 13);
  });

  it("returns one real root when the other two are complex", () => {
    // (x - 2)(x^2 + 1) = x^3 - 2x^2 + x - 2 (closed form)
    const r = realCubicRoots(1, -2, 1, -2);
    expect(r.roots).toHaveLength(1);
    expect(r.roots[0]).toBeCloseTo(2, 15);
  });

  it("does not invent a double root when the closed-form discriminant is zero within rounding", () => {
    // 1e-6 x^3 + 9e-33 x^2 + 1e-100 (found by the property test below): one real root near
    // -c2/c3 = -9e-27 and a complex pair near 0 (f(0) = c0 > 0 is a local minimum), by hand.
    const r = realCubicRoots(1e-6, 9e-33, 0, 1e-100);
    expect(r.roots).toHaveLength(1);
    expect(rel(r.roots[0], -9e-27)).toBeLessThan(1e-14);
  });

  it("solves quadratics, linear and constant cases", () => {
    // 0 x^3 + x^2 - 3x + 2 = (x-1)(x-2)
    expect(realCubicRoots(0, 1, -3, 2).roots).toEqual([1, 2]);
    // Catastrophic-cancellation quadratic: x^2 - 1e8 x + 1 has roots ~1e8 and ~1e-8 (closed form:
    // product of the roots = 1, so the small root is 1 / large root).
    const q = realCubicRoots(0, 1, -1e8, 1).roots;
    expect(rel(q[0], 1 / q[1])).toBeLessThan(1e-15);
    expect(rel(q[0], 1e-8)).toBeLessThan(1e-15);
    expect(realCubicRoots(0, 1, 0, 1).roots).toEqual([]);
    expect(realCubicRoots(0, 1, -2, 1).roots).toEqual([1, 1]);
    expect(realCubicRoots(0, 0, 2, -3).roots).toEqual([1.5]);
    expect(realCubicRoots(0, 0, 0, 5).roots).toEqual([]);
  });

  it("refuses NaN, infinite and all-zero coefficients", () => {
    expect(() => realCubicRoots(NaN, 1, 1, 1)).toThrow(InputError);
    expect(() => realCubicRoots(1, Infinity, 1, 1)).toThrow(/c2/);
    expect(() => realCubicRoots(0, 0, 0, 0)).toThrow(InputError);
    expect(() => realCubicRoots(1, 0, 0, 1, { maxPolishSteps: -1 })).toThrow(InputError);
  });

  it("recovers random integer roots exactly (property)", () => {
    // Integer roots in [-1000, 1000]: the expanded coefficients are exact integers.
    fc.assert(
      fc.property(
        fc.integer({ min: -1000, max: 1000 }),
        fc.integer({ min: -1000, max: 1000 }),
        fc.integer({ min: -1000, max: 1000 }),
        fc.integer({ min: 1, max: 7 }),
        (p, q, r, lead) => {
          const sorted = [p, q, r].sort((x, y) => x - y);
          const res = realCubicRoots(
            lead,
            -lead * (p + q + r),
            lead * (p * q + p * r + q * r),
            -lead * p * q * r,
          );
          expect(res.roots).toHaveLength(3);
          const distinct = sorted[0] !== sorted[1] && sorted[1] !== sorted[2];
          // Distinct integer roots are well separated: near machine precision. Repeated ones are
          // limited to ~sqrt(eps) (double) or eps^(1/3) (triple) relative to the root scale.
          const scale = Math.max(1, ...sorted.map(Math.abs));
          const tol = distinct ? 1e-9 * scale : 1e-4 * scale;
          res.roots.forEach((x, i) => expect(Math.abs(x - sorted[i])).toBeLessThan(tol));
        },
      ),
      { numRuns: 500 },
    );
  });

  it("returns roots that are backward stable for random coefficients (property)", () => {
    // Backward-stability bound (closed form of rounding analysis, common practice, no source):
    // |p(x)| <= k eps sum |c_i x^i| for each returned root.
    // Zero or a normal-range magnitude (subnormal coefficients are outside any physical use).
    const coef = fc.oneof(
      fc.constant(0),
      fc.double({ min: -1e6, max: 1e6, noNaN: true }).filter((c) => Math.abs(c) > 1e-100),
    );
    fc.assert(
      fc.property(
        coef.filter((c) => Math.abs(c) > 1e-6),
        coef,
        coef,
        coef,
        (c3, c2, c1, c0) => {
          const res = realCubicRoots(c3, c2, c1, c0);
          expect(res.roots.length === 1 || res.roots.length === 3).toBe(true);
          res.roots.forEach((x, i) => {
            const magnitude =
              Math.abs(c3 * x * x * x) + Math.abs(c2 * x * x) + Math.abs(c1 * x) + Math.abs(c0);
            expect(Math.abs(res.residuals[i])).toBeLessThanOrEqual(64 * Number.EPSILON * magnitude);
          });
        },
      ),
      { numRuns: 2000 },
    );
  });

  it("keeps full relative accuracy for roots spanning many decades (property via Vieta's relations)", () => {
    // Roots 1, 10^-u and +-10^-v (the Z-cubic shape at low pressure). Vieta (closed form): for
    // the polynomial actually given, x1 x2 x3 = -c0 and x1 x2 + x1 x3 + x2 x3 = c1 (monic). A
    // root with only absolute accuracy ~eps would spoil the product by a relative 10^(u - 16).
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 12, noNaN: true }),
        fc.double({ min: 2, max: 12, noNaN: true }),
        fc.boolean(),
        (u, v, negative) => {
          const r1 = 1;
          const r2 = 10 ** -u;
          const r3 = (negative ? -1 : 1) * 10 ** -v;
          if (Math.abs(r2 - r3) < 1e-3 * Math.abs(r2)) return; // near-double: other test
          const c2 = -(r1 + r2 + r3);
          const c1 = r1 * r2 + r1 * r3 + r2 * r3;
          const c0 = -r1 * r2 * r3;
          const res = realCubicRoots(1, c2, c1, c0);
          expect(res.roots).toHaveLength(3);
          const [x1, x2, x3] = res.roots;
          expect(rel(x1 * x2 * x3, -c0)).toBeLessThan(1e-12);
          // The pair sum can cancel (r3 ~ -r2), so it is compared on the scale of its terms.
          const terms = Math.abs(x1 * x2) + Math.abs(x1 * x3) + Math.abs(x2 * x3);
          expect(Math.abs(x1 * x2 + x1 * x3 + x2 * x3 - c1)).toBeLessThan(1e-12 * terms);
        },
      ),
      { numRuns: 1000 },
    );
  });
});

describe("realCubicRootsInto (allocation-free form)", () => {
  it("solves (x - 1)(x - 2)(x - 3) = x^3 - 6x^2 + 11x - 6 (closed form: roots 1, 2, 3)", () => {
    const out = new Float64Array(3);
    expect(realCubicRootsInto(1, -6, 11, -6, out)).toBe(3);
    // factored form above, so the roots are exact; polishing leaves them within a few ulps
    for (let i = 0; i < 3; i++) expect(rel(out[i], i + 1)).toBeLessThan(4 * Number.EPSILON);
  });

  it("returns the very same roots as realCubicRoots for random cubics, quadratics and lines", () => {
    const coefficient = fc.oneof(
      fc.constant(0),
      fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }),
    );
    const out = new Float64Array(3);
    fc.assert(
      fc.property(coefficient, coefficient, coefficient, coefficient, (c3, c2, c1, c0) => {
        if (c3 === 0 && c2 === 0 && c1 === 0 && c0 === 0) return;
        let roots: number[];
        try {
          roots = realCubicRoots(c3, c2, c1, c0).roots;
        } catch (e) {
          // a root beyond the doubles (e.g. -5e-324 x^2 + 2^-50 x: 2^1024; a subnormal c3
          // beside ordinary c2, c1, c0) is a typed error in both forms, with the same message
          expect(e).toBeInstanceOf(IsochorError);
          expect(() => realCubicRootsInto(c3, c2, c1, c0, out)).toThrow((e as Error).message);
          return;
        }
        const count = realCubicRootsInto(c3, c2, c1, c0, out);
        // one shared algorithm, so identical numbers (not merely close ones)
        expect(Array.from(out.subarray(0, count))).toEqual(roots);
      }),
      { numRuns: 2000 },
    );
  });

  it("rejects NaN or infinite coefficients, the zero polynomial and a short output array", () => {
    const out = new Float64Array(3);
    expect(() => realCubicRootsInto(1, NaN, 0, 0, out)).toThrow(InputError);
    expect(() => realCubicRootsInto(1, 0, 0, -Infinity, out)).toThrow(InputError);
    expect(() => realCubicRootsInto(0, 0, 0, 0, out)).toThrow(InputError);
    expect(() => realCubicRootsInto(1, -6, 11, -6, new Float64Array(2))).toThrow(InputError);
  });
});

describe("coefficients near the smallest doubles (never NaN)", () => {
  // every solver of the module on one cubic: realCubicRoots, realCubicRootsInto and, for c3 = 1,
  // monicCubicRootsInto; the three must agree to the last bit
  function allForms(c3: number, c2: number, c1: number, c0: number): number[] {
    const { roots } = realCubicRoots(c3, c2, c1, c0);
    const out = new Float64Array(3);
    const n = realCubicRootsInto(c3, c2, c1, c0, out);
    expect(Array.from(out.subarray(0, n))).toEqual(roots);
    if (c3 === 1) {
      const m = monicCubicRootsInto(Float64Array.of(c2, c1, c0), out);
      expect(Array.from(out.subarray(0, m))).toEqual(roots);
    }
    return roots;
  }

  it("x^3 - 5e-324 x, x^3 + 5e-324 x^2 and x^2 + 1e-308 x have their exact roots", () => {
    // 5e-324 is 2^-1074, the smallest double, so x (x^2 - 2^-1074) has the roots 0 and
    // +-2^-537 exactly (closed form: factored by hand); before the guard these gave NaN
    // (the rescaling's s^3 = 2^-1611 underflowed to 0 and C = 0 / 0)
    expect(Number.MIN_VALUE).toBe(2 ** -1074);
    expect(allForms(1, 0, -Number.MIN_VALUE, 0)).toEqual([-(2 ** -537), 0, 2 ** -537]);
    // x^2 (x + 2^-1074): s^2 underflowed (B = 0 / 0)
    expect(allForms(1, Number.MIN_VALUE, 0, 0)).toEqual([-Number.MIN_VALUE, 0, 0]);
    // a quadratic: 4 a / size overflowed and met c = 0 (Infinity * 0)
    expect(allForms(0, 1, 1e-308, 0).map((x) => (x === 0 ? 0 : x))).toEqual([-1e-308, 0]);
  });

  it("recovers roots of order 2^-350 exactly from coefficients down to the subnormals", () => {
    // roots p 2^-350, q 2^-350, r 2^-350 with small integers: c0 = -p q r 2^-1050 is subnormal
    // and exact (p q r < 2^24), so the roots are exact multiples of 2^-350 (Vieta, exact)
    const unit = 2 ** -350;
    fc.assert(
      fc.property(
        fc.integer({ min: -40, max: 40 }),
        fc.integer({ min: -40, max: 40 }),
        fc.integer({ min: -40, max: 40 }),
        (p, q, r) => {
          const roots = allForms(
            1,
            -(p + q + r) * unit,
            (p * q + p * r + q * r) * unit * unit,
            -p * q * r * unit * unit * unit,
          );
          const sorted = [p, q, r].sort((x, y) => x - y).map((v) => v * unit);
          expect(roots).toHaveLength(3);
          const distinct = sorted[0] !== sorted[1] && sorted[1] !== sorted[2];
          // distinct: to rounding; repeated: to about sqrt(eps) (triple: eps^(1/3)) of the scale
          const scale = 40 * unit;
          const tol = distinct ? 1e-12 * scale : 1e-4 * scale;
          roots.forEach((x, i) => expect(Math.abs(x - sorted[i])).toBeLessThan(tol));
        },
      ),
      { numRuns: 300 },
    );
  });

  it("random tiny and subnormal coefficients: finite roots, each a root to rounding", () => {
    const tiny = fc.oneof(
      fc.constant(0),
      fc.double({ min: -1e-290, max: 1e-290, noNaN: true }),
      fc.integer({ min: -1000, max: 1000 }).map((k) => k * Number.MIN_VALUE),
    );
    fc.assert(
      fc.property(tiny, tiny, tiny, (c2, c1, c0) => {
        const res = realCubicRoots(1, c2, c1, c0);
        allForms(1, c2, c1, c0);
        expect(res.roots.length === 1 || res.roots.length === 3).toBe(true);
        res.roots.forEach((x, i) => {
          expect(Number.isFinite(x)).toBe(true);
          // backward error (common practice, no source) with a floor of a few subnormal units,
          // where the terms themselves underflow
          const magnitude =
            Math.abs(x * x * x) + Math.abs(c2 * x * x) + Math.abs(c1 * x) + Math.abs(c0);
          expect(Math.abs(res.residuals[i])).toBeLessThanOrEqual(
            64 * Number.EPSILON * magnitude + 64 * Number.MIN_VALUE,
          );
        });
      }),
      { numRuns: 3000 },
    );
  });

  it("refuses a cubic the monic form cannot hold, and one whose sizes span beyond the doubles", () => {
    // 5e-324 x^3 + x^2 - 3x + 2: c2/c3 = 2^1074 is not a double (a root near -2^1074)
    expect(() => realCubicRoots(Number.MIN_VALUE, 1, -3, 2)).toThrow(OutOfRangeError);
    expect(() => realCubicRoots(Number.MIN_VALUE, 1, -3, 2)).toThrow(/c3/);
    expect(() => realCubicRootsInto(Number.MIN_VALUE, 1, -3, 2, new Float64Array(3))).toThrow(
      OutOfRangeError,
    );
    // 1e-300 x^3 + x^2 + x + 1: one real root near -1e300 (x^2 + x + 1 has none); the rescaled
    // coefficients of x and 1 underflow, and before the guard the roots -1 and 0 (p = 1) came
    // back beside it
    expect(() => realCubicRoots(1e-300, 1, 1, 1)).toThrow(SolverError);
    // x^3 - 1e308 x^2 + 1e308 x - 1e308: one real root near 1e308; before, NaN or 0 and 1 beside it
    expect(() => realCubicRoots(1, -1e308, 1e308, -1e308)).toThrow(SolverError);
    // every failure is a typed error, never NaN: wide random exponents
    const wide = fc.oneof(fc.constant(0), fc.double({ noNaN: true, noDefaultInfinity: true }));
    fc.assert(
      fc.property(wide, wide, wide, wide, (c3, c2, c1, c0) => {
        if (c3 === 0 && c2 === 0 && c1 === 0 && c0 === 0) return;
        try {
          for (const x of realCubicRoots(c3, c2, c1, c0).roots) expect(Number.isNaN(x)).toBe(false);
        } catch (e) {
          expect(e).toBeInstanceOf(IsochorError);
        }
      }),
      { numRuns: 3000 },
    );
  });
});
