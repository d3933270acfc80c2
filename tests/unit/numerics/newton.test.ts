import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { solveNewtonSystem } from "../../../kernel-lib/src/numerics/newton.js";
import { InputError, SolverError } from "../../../kernel-lib/src/errors.js";

describe("solveNewtonSystem", () => {
  it("solves x^2 + y^2 = 4, x y = 1 (closed form: x^2 = 2 + sqrt 3, y = 1/x)", () => {
    const r = solveNewtonSystem(([x, y]) => [x * x + y * y - 4, x * y - 1], [2, 0.5]);
    const xExact = Math.sqrt(2 + Math.sqrt(3));
    // Residual tolerance 1e-10 bounds the error in x to ~1e-10 / min singular value of J.
    expect(r.value[0]).toBeCloseTo(xExact, 10);
    expect(r.value[1]).toBeCloseTo(1 / xExact, 10);
    expect(r.residualNorm).toBeLessThanOrEqual(1e-10);
    expect(r.iterations).toBeGreaterThan(0);
  });

  it("uses an analytic Jacobian when given", () => {
    let calls = 0;
    const r = solveNewtonSystem(([x, y]) => [x * x + y * y - 4, x * y - 1], [2, 0.5], {
      jacobian: ([x, y]) => {
        calls++;
        return [
          [2 * x, 2 * y],
          [y, x],
        ];
      },
      tolerance: 1e-14,
    });
    expect(calls).toBe(r.iterations);
    expect(r.residualNorm).toBeLessThanOrEqual(1e-14);
  });

  it("converges on the Rosenbrock system from the standard start (-1.2, 1), root (1, 1)", () => {
    // F = (10 (x2 - x1^2), 1 - x1): Dennis & Schnabel (1983) test problem (from memory of its
    // appendix B); closed-form root (1, 1). Plain Newton overshoots; the line search controls it.
    const r = solveNewtonSystem(([a, b]) => [10 * (b - a * a), 1 - a], [-1.2, 1]);
    expect(r.value[0]).toBeCloseTo(1, 10);
    expect(r.value[1]).toBeCloseTo(1, 10);
  });

  it("needs damping where the full Newton step diverges: atan(x) = 0 from x0 = 3 (root 0)", () => {
    // Undamped Newton on atan diverges for |x0| > 1.39 (closed-form analysis, common practice, no
    // source); the backtracking line search must bring it in.
    const r = solveNewtonSystem(([x]) => [Math.atan(x)], [3]);
    expect(Math.abs(r.value[0])).toBeLessThan(1e-10);
    let x = 3;
    for (let k = 0; k < 5; k++) x -= Math.atan(x) * (1 + x * x);
    expect(Math.abs(x)).toBeGreaterThan(100);
  });

  it("solves random diagonal-plus-coupling systems with known roots (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        (r1, r2, r3) => {
          const root = [r1, r2, r3];
          // F_i = (x_i - r_i) + 0.3 (x_i - r_i)^3 + 0.2 sum_j (x_j - r_j): unique root x = r
          // (closed form: F is a strongly monotone map).
          const F = (x: number[]) => {
            const d = x.map((v, i) => v - root[i]);
            const sum = d[0] + d[1] + d[2];
            return d.map((di) => di + 0.3 * di * di * di + 0.2 * sum);
          };
          const r = solveNewtonSystem(F, [0, 0, 0]);
          r.value.forEach((v, i) => expect(Math.abs(v - root[i])).toBeLessThan(1e-9));
        },
      ),
      { numRuns: 100 },
    );
  });

  it("reports a singular Jacobian with the start and residual", () => {
    // F = (x + y - 1, 2x + 2y - 3) has a singular Jacobian everywhere and no solution.
    try {
      solveNewtonSystem(([x, y]) => [x + y - 1, 2 * x + 2 * y - 3], [0, 0]);
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(SolverError);
      expect((err as Error).message).toMatch(/singular/);
      expect((err as Error).message).toContain("x0 = [0, 0]");
    }
  });

  it("reports a local minimum of ||F|| that is not a root", () => {
    // F(x) = x^2 + 1 has no real root; ||F|| is minimal at x = 0 where J = 0.
    expect(() => solveNewtonSystem(([x]) => [x * x + 1], [1])).toThrow(SolverError);
  });

  it("reports running out of iterations", () => {
    expect(() => solveNewtonSystem(([x]) => [Math.exp(x) - 2], [5], { maxIterations: 1 })).toThrow(
      /no convergence .* in 1 iterations/,
    );
  });

  it("refuses bad input", () => {
    expect(() => solveNewtonSystem(([x]) => [x], [])).toThrow(InputError);
    expect(() => solveNewtonSystem(([x]) => [x], [NaN])).toThrow(InputError);
    expect(() => solveNewtonSystem(([x]) => [x, x], [1])).toThrow(InputError);
    expect(() => solveNewtonSystem(([x]) => [x], [1], { tolerance: 0 })).toThrow(InputError);
    expect(() => solveNewtonSystem(() => [NaN], [1])).toThrow(SolverError);
  });
});
