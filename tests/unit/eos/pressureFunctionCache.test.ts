/**
 * The cubic models keep a(T, x) of the last hyper-dual pressure-function call (the numeric
 * departure integration calls it at one T and x for every node of an isotherm). The cache must
 * never hand out a stale a: every call, in any order of temperatures, seeds and compositions
 * (including a composition array changed in place between calls), must give the numbers of a
 * model built fresh for that one call, and the value must be the pressure of the closed-form
 * alpha_r (P = rho R T (1 + aD), the model's own relation; no external reference needed).
 */
import { describe, expect, it } from "vitest";
import { createCubicModel } from "../../../kernel-lib/src/eos/cubic/cubicModel.js";
import { HyperDual } from "../../../kernel-lib/src/numerics/hyperDual.js";
import { R } from "../../../kernel-lib/src/constants.js";
import { comps } from "./helpers.js";

const IDS = ["methane", "ethane", "carbon-dioxide"];

describe("cubic pressure function with its a(T, x) cache", () => {
  it("equals a fresh model's value for every call of a mixed sequence", () => {
    for (const id of ["peng-robinson", "soave-redlich-kwong", "redlich-kwong"] as const) {
      const model = createCubicModel(id, comps(...IDS));
      const x = [0.8, 0.15, 0.05];
      type Call = { T: HyperDual; rho: HyperDual; x: number[]; mutate?: () => void };
      const calls: Call[] = [
        { T: new HyperDual(300), rho: new HyperDual(4000, 1, 1, 0), x },
        { T: new HyperDual(300, 1, 1, 0), rho: new HyperDual(2000), x },
        { T: new HyperDual(300, 1, 1, 0), rho: new HyperDual(4000), x },
        // the same array, changed in place: the cache must see the new numbers
        {
          T: new HyperDual(300, 1, 1, 0),
          rho: new HyperDual(4000),
          x,
          mutate: () => x.splice(0, 3, 0.5, 0.3, 0.2),
        },
        { T: new HyperDual(300, 1, 1, 0), rho: new HyperDual(4000), x: [0.5, 0.3, 0.2] },
        { T: new HyperDual(320, 1, 1, 0), rho: new HyperDual(4000), x: [0.5, 0.3, 0.2] },
        { T: new HyperDual(320, 1, 0, 0), rho: new HyperDual(4000), x: [0.5, 0.3, 0.2] },
        { T: new HyperDual(320), rho: new HyperDual(4000), x: [0.5, 0.3, 0.2] },
      ];
      for (const c of calls) {
        c.mutate?.();
        const got = model.pressureFunction(c.T, c.rho, c.x);
        const fresh = createCubicModel(id, comps(...IDS)).pressureFunction(c.T, c.rho, c.x);
        expect([got.re, got.e1, got.e2, got.e12]).toEqual([
          fresh.re,
          fresh.e1,
          fresh.e2,
          fresh.e12,
        ]);
        const closed = c.rho.re * R * c.T.re * (1 + model.residual(c.T.re, c.rho.re, c.x).aD);
        expect(Math.abs(got.re / closed - 1)).toBeLessThan(1e-12);
      }
    }
  });
});
