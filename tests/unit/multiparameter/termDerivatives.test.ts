/**
 * The term engine's analytic derivatives against central differences of the next-lower derivative
 * (an identity, no external reference), for every shipped equation over random (tau, delta), and
 * the engine's edge cases. Central differences with step h = 1e-5 x have truncation error ~h^2
 * and rounding ~eps/h: agreement to 1e-6 relative (of the larger of the value and 1) is expected.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  referenceFluid,
  referenceFluidIds,
} from "../../../kernel-lib/src/eos/multiparameter/referenceFluids.js";
import {
  compileResidualPart,
  emptyReducedHelmholtz,
} from "../../../kernel-lib/src/eos/multiparameter/residualPart.js";

type Part = (tau: number, delta: number) => ReturnType<typeof emptyReducedHelmholtz>;

function check(name: string, analytic: number, numeric: number): void {
  const tol = 1e-6 * Math.max(1, Math.abs(analytic));
  if (!(Math.abs(analytic - numeric) <= tol)) {
    throw new Error(`${name}: analytic ${analytic}, central difference ${numeric}`);
  }
}

function checkAll(part: Part, tau: number, delta: number): void {
  const at = part(tau, delta);
  const raw = {
    d: at.fD / delta,
    dd: at.fDD / (delta * delta),
    ddd: at.fDDD / (delta * delta * delta),
    t: at.fT / tau,
    tt: at.fTT / (tau * tau),
    dt: at.fDT / (delta * tau),
  };
  const hd = 1e-5 * delta;
  const ht = 1e-5 * tau;
  const dp = part(tau, delta + hd);
  const dm = part(tau, delta - hd);
  const tp = part(tau + ht, delta);
  const tm = part(tau - ht, delta);
  check("phi_d", raw.d, (dp.f - dm.f) / (2 * hd));
  check("phi_dd", raw.dd, (dp.fD / (delta + hd) - dm.fD / (delta - hd)) / (2 * hd));
  check("phi_ddd", raw.ddd, (dp.fDD / (delta + hd) ** 2 - dm.fDD / (delta - hd) ** 2) / (2 * hd));
  check("phi_t", raw.t, (tp.f - tm.f) / (2 * ht));
  check("phi_tt", raw.tt, (tp.fT / (tau + ht) - tm.fT / (tau - ht)) / (2 * ht));
  check("phi_dt", raw.dt, (tp.fD / delta - tm.fD / delta) / (2 * ht));
}

describe("analytic derivatives = central differences", () => {
  for (const id of referenceFluidIds()) {
    it(`${id}: residual part over random states (third derivative included)`, () => {
      const fluid = referenceFluid(id);
      const part: Part = (tau, delta) =>
        fluid.residualReduced(tau, delta, emptyReducedHelmholtz(), true);
      fc.assert(
        fc.property(
          fc.double({ min: 0.3, max: 2.5, noNaN: true }),
          fc.double({ min: 0.01, max: 3.2, noNaN: true }),
          (tau, delta) => {
            // keep away from the non-analytic point tau = delta = 1 (singular derivatives)
            fc.pre(Math.abs(delta - 1) > 0.05 || Math.abs(tau - 1) > 0.05);
            checkAll(part, tau, delta);
          },
        ),
        { numRuns: 150 },
      );
    });
    it(`${id}: ideal part`, () => {
      const fluid = referenceFluid(id);
      const part: Part = (tau, delta) => fluid.idealReduced(tau, delta, emptyReducedHelmholtz());
      for (const [tau, delta] of [
        [0.5, 0.1],
        [1.3, 2.5],
        [2.2, 1e-4],
      ]) {
        checkAll(part, tau, delta);
      }
    });
  }

  it("residual() conversion: aT = T d(alpha_r)/dT, aTT, aDT = rho T d2(alpha_r)/drho dT", () => {
    const water = referenceFluid("water");
    const T = 450;
    const rho = 50000; // compressed liquid (900 kg/m3), a stable state
    const h = 1e-4;
    const d = water.residual(T, rho, [1]);
    const up = water.residual(T + h, rho, [1]);
    const dn = water.residual(T - h, rho, [1]);
    check("aT", d.aT, (T * (up.a - dn.a)) / (2 * h));
    // aTT = T^2 a'' = T d(aT)/dT - aT
    check("aTT", d.aTT, (T * (up.aT - dn.aT)) / (2 * h) - d.aT);
    check("aDT", d.aDT, (T * (up.aD - dn.aD)) / (2 * h));
  });
});

describe("term engine edge cases", () => {
  it("an empty equation is zero", () => {
    const p = compileResidualPart({ power: [], gaussian: [], nonAnalytic: [] });
    const r = p.evaluate(1.1, 0.7, emptyReducedHelmholtz());
    expect([r.f, r.fD, r.fDD, r.fDDD, r.fT, r.fTT, r.fDT]).toEqual([0, 0, 0, 0, 0, 0, 0]);
  });

  it("a single polynomial term n delta^d tau^t matches its closed form", () => {
    const p = compileResidualPart({
      power: [{ n: 0.7, d: 3, t: 1.5, l: 0 }],
      gaussian: [],
      nonAnalytic: [],
    });
    const r = p.evaluate(1.2, 0.4, emptyReducedHelmholtz());
    const f = 0.7 * 0.4 ** 3 * 1.2 ** 1.5;
    expect(r.f).toBeCloseTo(f, 15);
    expect(r.fD).toBeCloseTo(3 * f, 15);
    expect(r.fDD).toBeCloseTo(6 * f, 15);
    expect(r.fDDD).toBeCloseTo(6 * f, 15);
    expect(r.fT).toBeCloseTo(1.5 * f, 15);
    expect(r.fTT).toBeCloseTo(1.5 * 0.5 * f, 15);
    expect(r.fDT).toBeCloseTo(4.5 * f, 15);
  });

  it("rejects a non-integer density exponent", () => {
    expect(() =>
      compileResidualPart({ power: [{ n: 1, d: 1.5, t: 1, l: 0 }], gaussian: [], nonAnalytic: [] }),
    ).toThrow(RangeError);
  });

  it("water at exactly (tau, delta) = (1, 1) stays finite (non-analytic terms nudged)", () => {
    const r = referenceFluid("water").residualReduced(1, 1, emptyReducedHelmholtz());
    for (const v of [r.f, r.fD, r.fDD, r.fT, r.fTT, r.fDT]) expect(Number.isFinite(v)).toBe(true);
  });

  it("without `third`, fDDD is NaN for an equation with non-analytic terms and aDDD absent", () => {
    const water = referenceFluid("water");
    expect(Number.isNaN(water.residualReduced(1.2, 2, emptyReducedHelmholtz()).fDDD)).toBe(true);
    expect(water.residual(500, 30000, [1]).aDDD).toBeUndefined();
    expect(referenceFluid("methane").residual(150, 20000, [1]).aDDD).toBeDefined();
  });
});
