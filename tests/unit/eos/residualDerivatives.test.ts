/**
 * Every closed-form model's reduced derivatives against central differences of its own alpha_r
 * (a closed-form consistency check: the derivatives are written by hand, the differences are not),
 * and its composition derivatives d(n alpha_r)/dn_i against differences in mole numbers at
 * constant T and V.
 */
import { describe, expect, it } from "vitest";
import { createModel, MODEL_IDS } from "../../../kernel-lib/src/eos/createModel.js";
import type { ResidualModel } from "../../../kernel-lib/src/eos/types.js";
import { comps } from "./helpers.js";

const MIX = ["methane", "ethane", "propane", "carbon-dioxide"];
const XMIX = [0.7, 0.15, 0.1, 0.05];

// central difference of f at v with relative step h; O(h^2) truncation
function d1(f: (v: number) => number, v: number, h = 1e-5): number {
  const dv = v * h;
  return (f(v + dv) - f(v - dv)) / (2 * dv);
}

function checkDerivatives(model: ResidualModel, T: number, rho: number, x: number[]): void {
  const r = model.residual(T, rho, x, { composition: true });
  const a = (t: number, d: number) => model.residual(t, d, x).a;
  const tol = 2e-7;
  const scale = (v: number) => Math.max(Math.abs(v), 1e-3);
  const aD = rho * d1((d) => a(T, d), rho);
  const aT = T * d1((t) => a(t, rho), T);
  const aDD = rho * d1((d) => model.residual(T, d, x).aD, rho) - r.aD;
  const aTT = T * d1((t) => model.residual(t, rho, x).aT, T) - r.aT;
  const aDT = T * d1((t) => model.residual(t, rho, x).aD, T);
  expect(Math.abs(aD - r.aD) / scale(r.aD)).toBeLessThan(tol);
  expect(Math.abs(aT - r.aT) / scale(r.aT)).toBeLessThan(tol);
  expect(Math.abs(aDD - r.aDD) / scale(r.aDD)).toBeLessThan(tol);
  expect(Math.abs(aTT - r.aTT) / scale(r.aTT)).toBeLessThan(tol);
  expect(Math.abs(aDT - r.aDT) / scale(r.aDT)).toBeLessThan(tol);
  if (r.aDDT !== undefined) {
    // T d(aDD)/dT at constant rho (the cubics give it in closed form)
    const aDDT = T * d1((t) => model.residual(t, rho, x).aDD, T);
    expect(Math.abs(aDDT - r.aDDT) / scale(r.aDDT)).toBeLessThan(tol);
  }
  if (r.aDDD !== undefined) {
    const aDDD = rho * d1((d) => model.residual(T, d, x).aDD, rho) - 2 * r.aDD;
    expect(Math.abs(aDDD - r.aDDD) / scale(r.aDDD)).toBeLessThan(tol);
  }
  // composition: n alpha_r(T, V, n) with rho = n/V, x = n_i/n; V = 1/rho for n = 1
  const V = 1 / rho;
  const nA = (n: number[]) => {
    const tot = n.reduce((p, q) => p + q, 0);
    return (
      tot *
      model.residual(
        T,
        tot / V,
        n.map((ni) => ni / tot),
      ).a
    );
  };
  for (let i = 0; i < x.length; i++) {
    const h = 1e-6;
    const np = x.slice();
    const nm = x.slice();
    np[i] += h;
    nm[i] -= h;
    const numeric = (nA(np) - nA(nm)) / (2 * h);
    expect(Math.abs(numeric - r.dnA![i]) / scale(r.dnA![i])).toBeLessThan(1e-6);
  }
}

describe("closed-form residual derivatives match differences of alpha_r", () => {
  for (const id of MODEL_IDS) {
    it(`${id}: pure methane (gas 250 K, 2000 mol/m3) and a 4-component gas (320 K, 3000 mol/m3)`, () => {
      checkDerivatives(createModel(id, comps("methane")), 250, 2000, [1]);
      checkDerivatives(createModel(id, comps(...MIX)), 320, 3000, XMIX);
    });
  }
  for (const id of ["soave-redlich-kwong", "peng-robinson", "peng-robinson-1978", "lee-kesler"]) {
    it(`${id}: dense liquid n-decane-rich mixture (400 K, 4500 mol/m3)`, () => {
      checkDerivatives(createModel(id, comps("n-decane", "methane")), 400, 4500, [0.8, 0.2]);
    });
  }
  it("Peneloux-translated PR: derivatives and dnA stay consistent", () => {
    const model = createModel("peng-robinson", comps("methane", "n-decane"), {
      volumeTranslation: "peneloux",
    });
    checkDerivatives(model, 400, 4000, [0.3, 0.7]);
  });
  it("user k_ij enters the mixture and composition derivatives", () => {
    const kij = [
      [0, 0.05, 0.02, 0.1],
      [0.05, 0, 0.01, 0.13],
      [0.02, 0.01, 0, 0.13],
      [0.1, 0.13, 0.13, 0],
    ];
    checkDerivatives(createModel("peng-robinson", comps(...MIX), { kij }), 300, 5000, XMIX);
  });
});

describe("departures vanish as the density goes to zero (every model)", () => {
  for (const id of MODEL_IDS) {
    it(`${id}: alpha_r and its derivatives scale like rho (ratio of values at rho and rho/10 is 10)`, () => {
      const model = createModel(id, comps(...MIX));
      const a = model.residual(300, 1e-3, XMIX, { composition: true });
      const b = model.residual(300, 1e-4, XMIX, { composition: true });
      for (const k of ["a", "aD", "aT", "aTT", "aDT"] as const) {
        if (a[k] === 0) {
          expect(b[k]).toBe(0); // the ideal gas
          continue;
        }
        expect(a[k] / b[k]).toBeCloseTo(10, 4);
        expect(Math.abs(a[k])).toBeLessThan(1e-3);
      }
      a.dnA!.forEach((d) => expect(Math.abs(d)).toBeLessThan(1e-3));
    });
  }
});
