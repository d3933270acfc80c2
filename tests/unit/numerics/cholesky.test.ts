import { describe, expect, it } from "vitest";
import { choleskySemidefinite } from "../../../kernel-lib/src/numerics/cholesky.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

function product(L: number[][]): number[][] {
  return L.map((ri) => L.map((rj) => ri.reduce((s, v, k) => s + v * rj[k], 0)));
}

describe("choleskySemidefinite", () => {
  it("reproduces a positive-definite matrix whose diagonal spans 24 decades (L L^T = A)", () => {
    // A = D C D with C a correlation matrix and D = diag(1e-12, 1, 1e12): a covariance of
    // coefficients of very different sizes (where a pivot test relative to the largest
    // diagonal element would drop the small column)
    const d = [1e-12, 1, 1e12];
    const C = [
      [1, 0.5, 0.2],
      [0.5, 1, 0.3],
      [0.2, 0.3, 1],
    ];
    const A = C.map((row, i) => row.map((v, j) => d[i] * v * d[j]));
    const back = product(choleskySemidefinite(A));
    A.forEach((row, i) =>
      row.forEach((v, j) => expect(back[i][j]).toBeCloseTo(v, 12 - Math.log10(Math.abs(v)))),
    );
    expect(Math.abs(back[0][0] / A[0][0] - 1)).toBeLessThan(1e-14);
  });

  it("gives a zero column for a singular (rank-1) covariance", () => {
    const v = [1, 2, 3];
    const A = v.map((a) => v.map((b) => a * b));
    const L = choleskySemidefinite(A);
    const back = product(L);
    A.forEach((row, i) => row.forEach((x, j) => expect(back[i][j]).toBeCloseTo(x, 12)));
    expect(L[1][1]).toBe(0);
    expect(L[2][2]).toBe(0);
  });

  it("refuses an indefinite matrix", () => {
    expect(() =>
      choleskySemidefinite([
        [1, 2],
        [2, 1],
      ]),
    ).toThrow(InputError);
    expect(() => choleskySemidefinite([[-1]])).toThrow(InputError);
  });
});
