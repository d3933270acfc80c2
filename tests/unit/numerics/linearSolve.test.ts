import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { solveLinear } from "../../../kernel-lib/src/numerics/linearSolve.js";
import { InputError, SolverError } from "../../../kernel-lib/src/errors.js";

describe("solveLinear", () => {
  it("solves a 2x2 system (closed form by Cramer's rule: x = 0.8, y = 1.4)", () => {
    const x = solveLinear(
      [
        [2, 1],
        [1, 3],
      ],
      [3, 5],
    );
    expect(x[0]).toBeCloseTo(0.8, 15);
    expect(x[1]).toBeCloseTo(1.4, 15);
  });

  it("needs pivoting: zero leading entry (closed form x = [1, 2])", () => {
    const x = solveLinear(
      [
        [0, 1],
        [1, 0],
      ],
      [2, 1],
    );
    expect(x).toEqual([1, 2]);
  });

  it("pivoting keeps accuracy on [[1e-20, 1], [1, 1]] (closed form x ~ [1, 1]; small-pivot example of the kind in Golub & Van Loan §3.3, from memory)", () => {
    // Without pivoting the multiplier 1e20 wipes out the second row: x1 comes out 0.
    const x = solveLinear(
      [
        [1e-20, 1],
        [1, 1],
      ],
      [1, 2],
    );
    expect(x[0]).toBeCloseTo(1, 14);
    expect(x[1]).toBeCloseTo(1, 14);
  });

  it("does not modify its inputs", () => {
    const A = [
      [4, 1],
      [2, 3],
    ];
    const b = [1, 2];
    solveLinear(A, b);
    expect(A).toEqual([
      [4, 1],
      [2, 3],
    ]);
    expect(b).toEqual([1, 2]);
  });

  it("reproduces A x for random well-conditioned systems (property: residual identity)", () => {
    const n = 4;
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1, max: 1, noNaN: true }), {
          minLength: n * n,
          maxLength: n * n,
        }),
        fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: n, maxLength: n }),
        (entries, xTrue) => {
          // Diagonally dominant, hence nonsingular and well conditioned.
          const A = Array.from({ length: n }, (_, i) =>
            Array.from({ length: n }, (_, j) => entries[i * n + j] + (i === j ? 5 : 0)),
          );
          const b = A.map((row) => row.reduce((s, a, j) => s + a * xTrue[j], 0));
          const x = solveLinear(A, b);
          x.forEach((xi, i) => expect(Math.abs(xi - xTrue[i])).toBeLessThan(1e-12));
        },
      ),
      { numRuns: 300 },
    );
  });

  it("refuses singular matrices, bad shapes and NaN", () => {
    expect(() =>
      solveLinear(
        [
          [1, 2],
          [2, 4],
        ],
        [1, 2],
      ),
    ).toThrow(SolverError);
    expect(() => solveLinear([[1, 2]], [1, 2])).toThrow(InputError);
    expect(() => solveLinear([[NaN]], [1])).toThrow(InputError);
    expect(() => solveLinear([[1]], [Infinity])).toThrow(InputError);
    expect(() => solveLinear([], [])).toThrow(InputError);
  });
});
