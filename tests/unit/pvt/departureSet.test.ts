import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { departuresFromIntegrals } from "../../../kernel-lib/src/pvt/departureSet.js";
import { departuresFromPvt } from "../../../kernel-lib/src/pvt/index.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { R } from "../../../kernel-lib/src/constants.js";
import { campaign, geometric, range } from "./campaign.js";
import { pressurePR } from "./pengRobinsonTruth.js";

describe("departuresFromIntegrals: the residual-property identities (closed forms)", () => {
  it("G = H - T S at the same T and P (s_TP = s_TV + R ln Z), H = U + P v - R T, U = A + T S, over random states", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 1000, noNaN: true }),
        fc.double({ min: 0.05, max: 3, noNaN: true }),
        fc.double({ min: -20000, max: 2000, noNaN: true }),
        fc.double({ min: -40, max: 5, noNaN: true }),
        (T, Z, a, s) => {
          const d = departuresFromIntegrals(T, Z, a, s, R);
          const RT = R * T;
          const tol = 1e-9 * (Math.abs(a) + T * Math.abs(s) + RT);
          expect(Math.abs(d.u - (a + T * s))).toBeLessThan(tol);
          expect(Math.abs(d.h - (d.u + RT * (Z - 1)))).toBeLessThan(tol);
          expect(Math.abs(d.g - (d.h - T * (s + R * Math.log(Z))))).toBeLessThan(tol);
          expect(Math.abs(d.lnPhi - d.g / RT)).toBeLessThan(1e-12 * (1 + Math.abs(d.lnPhi)));
        },
      ),
    );
  });

  it("all departures vanish in the ideal-gas limit (a = s = 0, Z = 1)", () => {
    const d = departuresFromIntegrals(300, 1, 0, 0, R);
    // (+ 0 folds a negative zero, which is still zero)
    expect([d.a, d.s, d.u, d.h, d.g, d.lnPhi].map((v) => v + 0)).toEqual([0, 0, 0, 0, 0, 0]);
  });
});

describe("departuresFromPvt option checks", () => {
  const ds = campaign({
    densities: geometric(200, 2000, 4),
    temperatures: range(310, 340, 4),
    pressure: pressurePR,
  });
  it.each([
    ["isothermsK", { isothermsK: [300, Number.NaN] }],
    ["isothermToleranceK", { isothermToleranceK: -1 }],
    ["isochoreTolerance", { isochoreTolerance: Number.NaN }],
    ["monteCarloSamples", { monteCarloSamples: 1.5 }],
    ["seed", { seed: -3 }],
    ["outlierThreshold", { outlierThreshold: 0 }],
    ["gasConstant", { gasConstant: Infinity }],
    ["minIsothermNodes", { minIsothermNodes: 1 }],
    ["route", { route: "sideways" as "auto" }],
  ])("refuses a bad %s naming it", (name, options) => {
    expect(() => departuresFromPvt(ds, options)).toThrow(InputError);
    expect(() => departuresFromPvt(ds, options)).toThrow(new RegExp(`options\\.${name}`));
  });
});
