import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  checkMoleFractions,
  moleFractionsFromAmounts,
  normalizeMoleFractions,
} from "../../../kernel-lib/src/components/composition.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

describe("checkMoleFractions", () => {
  it("accepts fractions summing to 1 within 1e-9 and returns them unchanged", () => {
    const x = [0.7, 0.2, 0.1];
    expect(checkMoleFractions(x, 3)).toBe(x);
    expect(() => checkMoleFractions([0.5, 0.5 + 9e-10], 2)).not.toThrow();
    expect(() => checkMoleFractions([1], 1)).not.toThrow();
  });
  it("refuses negative, NaN, infinite, >1, wrong length and bad sums, naming the entry", () => {
    for (const [x, re] of [
      [[-0.1, 1.1], /x\[0\]/],
      [[NaN, 1], /x\[0\]/],
      [[0.5, Infinity], /x\[1\]/],
      [[0.5, 0.5, 0], /x.length/],
      [[0.5, 0.5 + 2e-9], /sum of x/],
      [[0.3, 0.3], /sum of x/],
    ] as const) {
      expect(() => checkMoleFractions(x as unknown as number[], 2), String(x)).toThrow(re);
    }
    expect(() => checkMoleFractions("0.5" as unknown as number[], 1)).toThrow(InputError);
    expect(() =>
      checkMoleFractions([0.5, 0.5 + 2e-9], 2, { tolerance: 1e-6, input: "y" }),
    ).not.toThrow();
    expect(() => checkMoleFractions([0.3, 0.3], 2, { input: "y" })).toThrow(/sum of y/);
  });
});

describe("normalizeMoleFractions and moleFractionsFromAmounts", () => {
  it("divide by the sum (fast-check: result sums to 1 within 1e-12 and keeps ratios)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 20 }),
        (w) => {
          fc.pre(w.some((v) => v > 1e-300));
          const x = normalizeMoleFractions(w);
          expect(Math.abs(x.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-12);
          expect(() => checkMoleFractions(x, w.length)).not.toThrow();
        },
      ),
    );
    expect(moleFractionsFromAmounts([3, 1])).toEqual([0.75, 0.25]);
  });
  it("refuse negative, NaN, infinite, empty or all-zero input", () => {
    for (const bad of [[-1, 2], [NaN, 1], [Infinity, 1], [], [0, 0]]) {
      expect(() => normalizeMoleFractions(bad)).toThrow(InputError);
      expect(() => moleFractionsFromAmounts(bad)).toThrow(InputError);
    }
  });
});
