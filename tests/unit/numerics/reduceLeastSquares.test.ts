import { describe, expect, it } from "vitest";
import { seededRandom } from "../../../kernel-lib/src/numerics/seededRandom.js";
import {
  reduceLeastSquares,
  weightedLeastSquaresColumns,
} from "../../../kernel-lib/src/numerics/weightedLeastSquares.js";

describe("reduceLeastSquares", () => {
  it("gives every column subset the chi-square of the full weighted fit (to 1e-9)", () => {
    // a badly scaled polynomial basis on 3000 points, noisy data, unequal weights
    const rng = seededRandom(5);
    const m = 3000;
    const x = Array.from({ length: m }, (_, i) => 0.1 + (2 * i) / m);
    const columns = [0, 1, 2, 3, 4, 5].map((k) => Float64Array.from(x, (v) => 10 ** k * v ** k));
    const sigma = x.map((v) => 0.01 * (1 + v));
    const y = x.map((v, i) => Math.exp(-v) + sigma[i] * rng.normal());
    const reduced = reduceLeastSquares(columns, y, sigma);
    const ones = new Float64Array(columns.length).fill(1);
    for (const subset of [[0], [0, 1], [0, 2, 4], [1, 2, 3], [0, 1, 2, 3, 4, 5]]) {
      const full = weightedLeastSquaresColumns(
        subset.map((k) => columns[k]),
        y,
        sigma,
      );
      const small = weightedLeastSquaresColumns(
        subset.map((k) => reduced.columns[k]),
        reduced.qtb,
        ones,
      );
      const chi2 = small.chiSquare + reduced.residualSquare;
      expect(Math.abs(chi2 / full.chiSquare - 1)).toBeLessThan(1e-9);
      small.coefficients.forEach((c, j) =>
        expect(Math.abs(c / full.coefficients[j] - 1)).toBeLessThan(1e-7),
      );
    }
  });
});
