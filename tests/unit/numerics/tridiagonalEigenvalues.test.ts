import { describe, expect, it } from "vitest";
import { tridiagonalEigenvalues } from "../../../kernel-lib/src/numerics/tridiagonalEigenvalues.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

describe("tridiagonalEigenvalues (implicit QL)", () => {
  it("Toeplitz tridiagonal: lambda_k = a + 2 b cos(k pi / (n + 1)) (closed form)", () => {
    // Closed form for constant diagonal a and off-diagonal b: e.g. Smith, Numerical Solution of
    // Partial Differential Equations (1985), sec. on matrix eigenvalues; from memory.
    for (const n of [1, 2, 7, 50, 200]) {
      const a = 3;
      const b = -1.25;
      const { values, iterations } = tridiagonalEigenvalues(
        new Array(n).fill(a),
        new Array(n - 1).fill(b),
      );
      const expected = Array.from(
        { length: n },
        (_, k) => a + 2 * b * Math.cos(((k + 1) * Math.PI) / (n + 1)),
      ).sort((x, y) => x - y);
      expected.forEach((e, i) => expect(values[i]).toBeCloseTo(e, 10));
      expect(iterations).toBeGreaterThanOrEqual(0);
    }
  });

  it("trace and sum of squares are preserved on a random-looking matrix", () => {
    const n = 40;
    const d = Array.from({ length: n }, (_, i) => Math.sin(i * 1.7) * 10 + i);
    const e = Array.from({ length: n - 1 }, (_, i) => Math.cos(i * 0.3) * 3);
    const { values } = tridiagonalEigenvalues(d, e);
    const trace = d.reduce((s, x) => s + x, 0);
    const frob = d.reduce((s, x) => s + x * x, 0) + 2 * e.reduce((s, x) => s + x * x, 0);
    expect(values.reduce((s, x) => s + x, 0)).toBeCloseTo(trace, 9);
    expect(values.reduce((s, x) => s + x * x, 0) / frob).toBeCloseTo(1, 12);
  });

  it("already diagonal and widely scaled entries", () => {
    const { values } = tridiagonalEigenvalues([1e8, -2, 1e-8], [0, 0]);
    expect(Array.from(values)).toEqual([-2, 1e-8, 1e8]);
    expect(tridiagonalEigenvalues([], []).values.length).toBe(0);
  });

  it("refuses mismatched lengths and non-finite entries", () => {
    expect(() => tridiagonalEigenvalues([1, 2, 3], [1])).toThrow(InputError);
    expect(() => tridiagonalEigenvalues([1, NaN], [1])).toThrow(/finite/);
    expect(() => tridiagonalEigenvalues([1, 2], [Infinity])).toThrow(/finite/);
  });
});
