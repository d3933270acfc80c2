import { describe, expect, it } from "vitest";
import { extent, maxOf, minOf } from "../../../kernel-lib/src/numerics/extent.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

describe("extent, minOf, maxOf", () => {
  it("agree with Math.min/Math.max on small lists (edge cases included)", () => {
    const lists = [[3, -1, 2], [-0, 0], [0, -0], [-5, -0], [Infinity, -Infinity, 1], [5]];
    for (const l of lists) {
      expect(minOf(l)).toBe(Math.min(...l));
      expect(maxOf(l)).toBe(Math.max(...l));
      expect(extent(l)).toEqual({ min: Math.min(...l), max: Math.max(...l) });
    }
    expect(minOf([])).toBe(Math.min());
    expect(maxOf([])).toBe(Math.max());
    expect(maxOf([1, NaN, 2])).toBeNaN();
  });

  it("work on 500,000 values, where a spread into Math.max overflows the call stack", () => {
    const big = Float64Array.from({ length: 500_000 }, (_, i) => Math.sin(i));
    expect(() => Math.max(...big)).toThrow(RangeError);
    const e = extent(big);
    expect(e.max).toBe(maxOf(big));
    expect(e.min).toBe(minOf(big));
    expect(e.max).toBeLessThanOrEqual(1);
    expect(e.max).toBeGreaterThan(0.99999);
  });

  it("extent refuses an empty list and NaN, naming the element", () => {
    expect(() => extent([])).toThrow(InputError);
    expect(() => extent([1, NaN])).toThrow(/values\[1\]/);
  });
});
