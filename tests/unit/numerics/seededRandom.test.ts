import { describe, expect, it } from "vitest";
import { seededRandom } from "../../../kernel-lib/src/numerics/seededRandom.js";
import { runsTest } from "../../../kernel-lib/src/numerics/runsTest.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

describe("seededRandom (xoshiro128**, Marsaglia polar)", () => {
  it("reproduces the same sequence from the same seed, and a different one from another", () => {
    const a = seededRandom(42);
    const b = seededRandom(42);
    const c = seededRandom(43);
    const sa = Array.from({ length: 5 }, () => a.uniform());
    expect(Array.from({ length: 5 }, () => b.uniform())).toEqual(sa);
    expect(Array.from({ length: 5 }, () => c.uniform())).not.toEqual(sa);
  });

  it("normal deviates have mean 0 and variance 1 within 5 standard errors (n = 100000)", () => {
    const r = seededRandom(7);
    const n = 100000;
    let s = 0;
    let s2 = 0;
    for (let i = 0; i < n; i++) {
      const z = r.normal();
      s += z;
      s2 += z * z;
    }
    const mean = s / n;
    const variance = s2 / n - mean * mean;
    // standard error of the mean 1/sqrt(n); of the variance sqrt(2/n) (normal theory)
    expect(Math.abs(mean)).toBeLessThan(5 / Math.sqrt(n));
    expect(Math.abs(variance - 1)).toBeLessThan(5 * Math.sqrt(2 / n));
  });

  it("uniform deviates stay in [0, 1) with mean 1/2 within 5 standard errors (sd 1/sqrt(12 n))", () => {
    const r = seededRandom(2026);
    const n = 50000;
    let s = 0;
    let inside = 0;
    for (let i = 0; i < n; i++) {
      const u = r.uniform();
      if (u >= 0 && u < 1) inside++;
      s += u;
    }
    expect(inside).toBe(n);
    expect(Math.abs(s / n - 0.5)).toBeLessThan(5 / Math.sqrt(12 * n));
  });

  it("refuses non-integer, negative and NaN seeds", () => {
    expect(() => seededRandom(1.5)).toThrow(InputError);
    expect(() => seededRandom(-1)).toThrow(InputError);
    expect(() => seededRandom(Number.NaN)).toThrow(InputError);
    expect(() => seededRandom(2 ** 32)).toThrow(InputError);
  });
});

describe("runsTest (Wald & Wolfowitz 1940)", () => {
  it("expected runs 2 n1 n2 / n + 1 = 11 for 10 + 10 signs; alternating signs give z > 0, two blocks z < 0", () => {
    const alt = Array.from({ length: 20 }, (_, i) => (i % 2 ? 1 : -1));
    const r1 = runsTest(alt);
    expect(r1.expected).toBe(11);
    expect(r1.runs).toBe(20);
    expect(r1.z).toBeGreaterThan(3);
    const blocks = Array.from({ length: 20 }, (_, i) => (i < 10 ? 1 : -1));
    const r2 = runsTest(blocks);
    expect(r2.runs).toBe(2);
    // Wald-Wolfowitz runs test (Wald & Wolfowitz 1940, Ann. Math. Stat. 11:147), mean 2 n1 n2 / n + 1,
    // variance 2 n1 n2 (2 n1 n2 - n) / (n^2 (n - 1)) = 200*180/(400*19) = 4.7368
    expect(r2.z).toBeCloseTo((2 - 11) / Math.sqrt(36000 / 7600), 12);
  });

  it("returns NaN z when a sign occurs fewer than twice", () => {
    expect(Number.isNaN(runsTest([1, 1, 1, -1]).z)).toBe(true);
  });
});
