import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { weightedLeastSquares } from "../../../kernel-lib/src/numerics/weightedLeastSquares.js";
import { singularValues } from "../../../kernel-lib/src/numerics/singularValues.js";
import { InputError, SolverError } from "../../../kernel-lib/src/errors.js";

describe("weightedLeastSquares (Householder QR)", () => {
  it("recovers an exact cubic from noise-free data (closed form)", () => {
    const xs = [-2, -1.3, -0.2, 0.4, 1.1, 1.9, 2.5];
    const c = [1.5, -0.7, 0.25, 0.125];
    const y = xs.map((x) => c[0]! + c[1]! * x + c[2]! * x * x + c[3]! * x ** 3);
    const fit = weightedLeastSquares(
      xs.map((x) => [1, x, x * x, x ** 3]),
      y,
      xs.map(() => 0.1),
    );
    fit.coefficients.forEach((v, j) => expect(v).toBeCloseTo(c[j]!, 12));
    expect(fit.chiSquare).toBeLessThan(1e-20);
    expect(fit.degreesOfFreedom).toBe(3);
  });

  it("gives the straight-line covariance of Bevington & Robinson (3rd ed., eqs. 6.12 and 6.21)", () => {
    const xs = [1, 2, 3, 5, 8];
    const sig = [0.5, 0.2, 0.3, 0.4, 1.0];
    const y = [1.1, 2.3, 2.8, 5.4, 7.6];
    const fit = weightedLeastSquares(
      xs.map((x) => [1, x]),
      y,
      sig,
    );
    let S = 0,
      Sx = 0,
      Sxx = 0,
      Sy = 0,
      Sxy = 0;
    xs.forEach((x, i) => {
      const w = 1 / sig[i]! ** 2;
      S += w;
      Sx += w * x;
      Sxx += w * x * x;
      Sy += w * y[i]!;
      Sxy += w * x * y[i]!;
    });
    const D = S * Sxx - Sx * Sx;
    expect(fit.coefficients[0]).toBeCloseTo((Sxx * Sy - Sx * Sxy) / D, 12);
    expect(fit.coefficients[1]).toBeCloseTo((S * Sxy - Sx * Sy) / D, 12);
    expect(fit.covariance[0]![0]).toBeCloseTo(Sxx / D, 12);
    expect(fit.covariance[1]![1]).toBeCloseTo(S / D, 12);
    expect(fit.covariance[0]![1]).toBeCloseTo(-Sx / D, 12);
  });

  it("residuals are orthogonal to the weighted columns (normal equations), over random problems", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 6, maxLength: 12 }),
        (ys) => {
          const xs = ys.map((_, i) => i / ys.length);
          const fit = weightedLeastSquares(
            xs.map((x) => [1, x, x * x]),
            ys,
            ys.map(() => 1),
          );
          for (let j = 0; j < 3; j++) {
            const dot = xs.reduce((s, x, i) => s + x ** j * fit.residuals[i]!, 0);
            expect(Math.abs(dot)).toBeLessThan(1e-9 * (1 + Math.max(...ys.map(Math.abs))));
          }
        },
      ),
    );
  });

  it("refuses a rank-deficient design, saying what to do", () => {
    expect(() =>
      weightedLeastSquares(
        [
          [1, 2],
          [2, 4],
          [3, 6],
        ],
        [1, 2, 3],
        [1, 1, 1],
      ),
    ).toThrow(SolverError);
    expect(() =>
      weightedLeastSquares(
        [
          [1, 2],
          [2, 4],
          [3, 6],
        ],
        [1, 2, 3],
        [1, 1, 1],
      ),
    ).toThrow(/lower the order/);
  });

  it("refuses NaN, zero and negative sigmas and too few rows", () => {
    expect(() => weightedLeastSquares([[1], [1]], [1, 2], [1, Number.NaN])).toThrow(InputError);
    expect(() => weightedLeastSquares([[1], [1]], [1, 2], [1, 0])).toThrow(InputError);
    expect(() => weightedLeastSquares([[1, 2]], [1], [1])).toThrow(InputError);
  });

  it("singular values by one-sided Jacobi: [[3,0],[4,5]] has sqrt(45) and sqrt(5) (A^T A eigenvalues, closed form)", () => {
    const sv = singularValues([
      [3, 0],
      [4, 5],
    ]).sort((a, b) => b - a);
    expect(sv[0]).toBeCloseTo(Math.sqrt(45), 13);
    expect(sv[1]).toBeCloseTo(Math.sqrt(5), 13);
  });
});
