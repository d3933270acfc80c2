import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  isothermDensityGrid,
  linearGrid,
  logGrid,
  thinCurve,
} from "../../../kernel-lib/src/charts/sampling.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

describe("grids", () => {
  it("hit both ends exactly and are monotone", () => {
    expect(linearGrid(0, 1, 5)).toEqual([0, 0.25, 0.5, 0.75, 1]);
    const g = logGrid(1e3, 1e7, 5);
    expect(g[0]).toBe(1e3);
    expect(g[4]).toBe(1e7);
    g.forEach((v, i) => expect(v).toBeCloseTo(10 ** (3 + i), 6 - i));
  });

  it("density grid: ascending, bounded, geometric then uniform", () => {
    const rhoMax = 1 / 2.68e-5; // any positive scale
    const g = isothermDensityGrid(rhoMax, { points: 300 });
    expect(g.length).toBe(300);
    for (let i = 1; i < g.length; i++) expect(g[i]).toBeGreaterThan(g[i - 1]);
    expect(g[0]).toBeCloseTo(1e-4 * rhoMax, 9);
    expect(g[g.length - 1]).toBeCloseTo(0.96 * rhoMax, 6);
    // Low-density part: constant ratio; high-density part: constant step.
    expect(g[2] / g[1]).toBeCloseTo(g[1] / g[0], 9);
    expect(g[299] - g[298]).toBeCloseTo(g[250] - g[249], 6);
  });

  it("refuses bad input", () => {
    expect(() => isothermDensityGrid(NaN)).toThrow(InputError);
    expect(() => isothermDensityGrid(100, { minFraction: 0.5 })).toThrow(/minFraction/);
    expect(() => logGrid(0, 1, 3)).toThrow(InputError);
    expect(() => linearGrid(0, 1, 1)).toThrow(InputError);
    expect(() => linearGrid(0, Infinity, 3)).toThrow(InputError);
  });
});

describe("thinCurve (LTTB)", () => {
  it("keeps the ends and a sharp peak", () => {
    const pts = Array.from({ length: 1001 }, (_, i) => ({
      x: i,
      y: i === 437 ? 100 : Math.sin(i / 50),
    }));
    const out = thinCurve(
      pts,
      60,
      (p) => p.x,
      (p) => p.y,
    );
    expect(out.length).toBe(60);
    expect(out[0]).toBe(pts[0]);
    expect(out[59]).toBe(pts[1000]);
    expect(out.some((p) => p.x === 437)).toBe(true);
  });

  it("is a subsequence in order, never longer than asked", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 0, maxLength: 300 }),
        fc.integer({ min: 3, max: 50 }),
        (ys, m) => {
          const pts = ys.map((y, i) => ({ x: i, y }));
          const out = thinCurve(
            pts,
            m,
            (p) => p.x,
            (p) => p.y,
          );
          expect(out.length).toBe(Math.min(m, pts.length));
          for (let i = 1; i < out.length; i++) expect(out[i].x).toBeGreaterThan(out[i - 1].x);
        },
      ),
      { numRuns: 200 },
    );
  });
});
