import { describe, expect, it } from "vitest";
import { cumulativeIrregular } from "../../../kernel-lib/src/numerics/cumulativeIrregular.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

describe("cumulativeIrregular", () => {
  it("is exact for a quadratic on irregular nodes (local parabolas are exact; closed form x^3/3 - x)", () => {
    const x = [0, 0.13, 0.4, 0.45, 1.1, 1.7, 2.0];
    const r = cumulativeIrregular(
      x,
      x.map((v) => v * v - 1),
    );
    x.forEach((v, k) => expect(r.values[k]).toBeCloseTo(v ** 3 / 3 - v, 13));
  });

  it("on equal spacing integrates a cubic exactly over the interior intervals (Gill & Miller 1972 weights -1,13,13,-1 /24)", () => {
    const x = [0, 0.5, 1, 1.5, 2, 2.5];
    const f = x.map((v) => v ** 3);
    const r = cumulativeIrregular(x, f);
    // interior intervals [0.5,1] ... [1.5,2]: exact pieces
    for (let k = 1; k < 4; k++) {
      const piece = r.values[k + 1]! - r.values[k]!;
      expect(piece).toBeCloseTo((x[k + 1]! ** 4 - x[k]! ** 4) / 4, 13);
    }
  });

  it("converges at third order or better for sin on irregular nodes, and its error estimate bounds the error", () => {
    const errs: number[] = [];
    for (const n of [10, 20, 40]) {
      const x = Array.from({ length: n + 1 }, (_, i) => {
        const t = i / n;
        // smooth stretching plus a jitter of a quarter spacing: irregular but increasing
        return 2 * (t + 0.4 * t * (1 - t)) + (i > 0 && i < n ? (0.25 / n) * Math.sin(37 * i) : 0);
      });
      const r = cumulativeIrregular(x, x.map(Math.sin));
      const exact = 1 - Math.cos(x[n]!);
      const err = Math.abs(r.values[n]! - exact);
      errs.push(err);
      expect(err).toBeLessThanOrEqual(r.errorEstimates[n]! * 2 + 1e-15);
    }
    expect(errs[0]! / errs[1]!).toBeGreaterThan(6);
    expect(errs[1]! / errs[2]!).toBeGreaterThan(6);
  });

  it("refuses nodes that do not increase and mismatched lengths", () => {
    expect(() => cumulativeIrregular([0, 1, 1], [0, 1, 2])).toThrow(InputError);
    expect(() => cumulativeIrregular([0, Number.NaN, 2], [0, 1, 2])).toThrow(InputError);
    expect(() => cumulativeIrregular([0, 1], [0])).toThrow(InputError);
  });
});
