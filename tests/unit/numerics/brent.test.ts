import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { findRootBrent } from "../../../kernel-lib/src/numerics/brent.js";
import { InputError, SolverError } from "../../../kernel-lib/src/errors.js";

describe("findRootBrent", () => {
  it("finds sqrt(2) to full precision (closed form)", () => {
    const r = findRootBrent((x) => x * x - 2, 0, 2);
    expect(Math.abs(r.value - Math.SQRT2)).toBeLessThanOrEqual(4 * Number.EPSILON);
    expect(r.errorEstimate).toBeLessThanOrEqual(8 * Number.EPSILON);
    expect(Math.abs(r.value - Math.SQRT2)).toBeLessThanOrEqual(r.errorEstimate + 1e-16);
    expect(r.iterations).toBeLessThan(20);
  });

  it("solves Kepler's equation x - 0.9 sin x = 0.5 (residual checked, closed form has none)", () => {
    const f = (x: number) => x - 0.9 * Math.sin(x) - 0.5;
    const r = findRootBrent(f, 0, 3);
    expect(Math.abs(f(r.value))).toBeLessThan(1e-15);
    expect(r.residual).toBe(f(r.value));
  });

  it("stays fast where bisection-free secant methods stall: x^9 (flat root, closed form x = 0)", () => {
    // Brent (1973) ch. 4 guarantees at most ~ (log2 (width/tol))^2 evaluations; a flat root
    // makes interpolation poor and the bisection safeguard must take over.
    const r = findRootBrent((x) => Math.pow(x, 9), -1, 1.5, { tolerance: 1e-12 });
    expect(Math.abs(r.value)).toBeLessThan(1e-12);
    expect(r.iterations).toBeLessThan(200);
  });

  it("handles a discontinuous sign change (closed form: the jump at x = 1/3)", () => {
    const r = findRootBrent((x) => (x < 1 / 3 ? -1 : 1), 0, 1);
    expect(Math.abs(r.value - 1 / 3)).toBeLessThanOrEqual(r.errorEstimate * 2 + 1e-15);
  });

  it("accepts the bracket in either order (closed form: root ln 3)", () => {
    const r = findRootBrent((x) => Math.exp(x) - 3, 4, -1);
    expect(Math.abs(r.value - Math.log(3))).toBeLessThanOrEqual(4 * Number.EPSILON);
  });

  it("returns an end point that is already a root", () => {
    expect(findRootBrent((x) => x - 1, 1, 2)).toEqual({
      value: 1,
      residual: 0,
      iterations: 0,
      errorEstimate: 0,
    });
  });

  it("respects an absolute tolerance", () => {
    const r = findRootBrent((x) => Math.exp(x) - 10, 0, 5, { tolerance: 1e-3 });
    expect(Math.abs(r.value - Math.log(10))).toBeLessThan(1e-3);
  });

  it("finds the root of random linear-cubic functions (property, closed form roots)", () => {
    fc.assert(
      fc.property(fc.double({ min: -100, max: 100, noNaN: true }), (root) => {
        const f = (x: number) => (x - root) * (1 + (x - root) * (x - root));
        const r = findRootBrent(f, -200, 200);
        expect(Math.abs(r.value - root)).toBeLessThanOrEqual(1e-13 * Math.max(1, Math.abs(root)));
      }),
      { numRuns: 300 },
    );
  });

  it("refuses a bracket without a sign change, naming the bracket and the f values", () => {
    try {
      findRootBrent((x) => x * x + 1, -1, 2);
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(SolverError);
      expect((err as Error).message).toContain("[-1, 2]");
      expect((err as Error).message).toContain("f(-1) = 2");
      expect((err as Error).message).toContain("f(2) = 5");
    }
  });

  it("reports running out of iterations with the remaining bracket", () => {
    expect(() => findRootBrent((x) => Math.exp(x) - 2, 0, 1, { maxIterations: 2 })).toThrow(
      /no convergence in 2 iterations on the bracket \[0, 1\]/,
    );
  });

  it("refuses NaN or infinite input and f values", () => {
    expect(() => findRootBrent((x) => x, NaN, 1)).toThrow(InputError);
    expect(() => findRootBrent((x) => x, -1, Infinity)).toThrow(InputError);
    expect(() => findRootBrent((x) => x, -1, 1, { tolerance: -1 })).toThrow(InputError);
    expect(() => findRootBrent((x) => x, -1, 1, { maxIterations: 0 })).toThrow(InputError);
    expect(() => findRootBrent((x) => (x > 0.5 ? NaN : x - 0.7), 0, 1)).toThrow(SolverError);
    expect(() => findRootBrent(() => NaN, 0, 1)).toThrow(/returned NaN/);
  });
});
