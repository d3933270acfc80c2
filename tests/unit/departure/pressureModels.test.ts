/**
 * User-defined pressure functions: a non-cubic equation with a known closed-form alpha_r
 * (Carnahan-Starling hard spheres plus a van der Waals attraction), the plain-number route with
 * finite differences, the zero-density limit, the cumulative isotherm, and bad input.
 */
import { describe, expect, it } from "vitest";
import { HyperDual } from "../../../kernel-lib/src/numerics/hyperDual.js";
import {
  modelFromPlainPressure,
  modelFromPressure,
} from "../../../kernel-lib/src/departure/pressureModel.js";
import { departureFunctions } from "../../../kernel-lib/src/state/departureFunctions.js";
import { isothermDepartures } from "../../../kernel-lib/src/state/isothermDepartures.js";
import { createModel } from "../../../kernel-lib/src/eos/createModel.js";
import { R } from "../../../kernel-lib/src/constants.js";
import { InputError, OutOfRangeError } from "../../../kernel-lib/src/errors.js";
import { comps } from "../eos/helpers.js";

// Carnahan & Starling, J. Chem. Phys. 51 (1969) 635: Z_hs = (1 + y + y^2 - y^3)/(1 - y)^3 with
// y = b rho / 4, whose residual Helmholtz energy is (4y - 3y^2)/(1 - y)^2 (closed form, same paper).
// Add a temperature-dependent attraction -a(T) rho^2 with a = a0 (1 + c/T): alpha_att = -a rho/(RT).
const b = 1.2e-4; // m3/mol (illustrative)
const a0 = 0.4; // Pa m6/mol2
const c = 150; // K
const pressure = (T: HyperDual, rho: HyperDual): HyperDual => {
  const y = rho.mul(b / 4);
  const one = y.neg().add(1);
  const zhs = y.add(1).add(y.mul(y)).sub(y.mul(y).mul(y)).div(one.mul(one).mul(one));
  const a = T.inv().mul(c).add(1).mul(a0);
  return rho.mul(R).mul(T).mul(zhs).sub(a.mul(rho).mul(rho));
};
const exact = (T: number, rho: number) => {
  const y = (b * rho) / 4;
  const aT = a0 * (1 + c / T);
  const alpha = (4 * y - 3 * y * y) / ((1 - y) * (1 - y)) - (aT * rho) / (R * T);
  // T d/dT of -a(T) rho/(RT) = -(rho/R) T d/dT (a0/T + a0 c/T^2) = (rho/R)(a0/T + 2 a0 c/T^2)
  const alphaT = (rho / R) * (a0 / T + (2 * a0 * c) / (T * T));
  return { alpha, alphaT };
};

describe("a user-typed pressure function becomes a full model", () => {
  const model = modelFromPressure({
    name: "Carnahan-Starling + vdW attraction",
    components: ["argon"],
    pressure,
    maxDensity: 4 / b,
  });
  it("alpha_r and T dalpha_r/dT match the closed form to 1e-10 (gas and dense fluid)", () => {
    for (const [T, rho] of [
      [300, 100],
      [300, 5000],
      [200, 20000],
    ]) {
      const r = model.residual(T, rho, [1]);
      const e = exact(T, rho);
      expect(Math.abs(r.a - e.alpha)).toBeLessThan(1e-10 * Math.max(1, Math.abs(e.alpha)));
      expect(Math.abs(r.aT - e.alphaT)).toBeLessThan(1e-10 * Math.max(1, Math.abs(e.alphaT)));
    }
  });
  it("departures vanish as rho -> 0 like the second virial term (alpha_r -> B rho)", () => {
    const T = 300;
    // B = b - a/(RT) for this equation
    const B = b - (a0 * (1 + c / T)) / (R * T);
    for (const rho of [1e-2, 1e-5, 1e-8]) {
      const r = model.residual(T, rho, [1]);
      expect(Math.abs(r.a - B * rho)).toBeLessThan(1e-6 * Math.abs(B * rho));
      // h_r / RT -> (B - T dB/dT) rho, with T dB/dT = (a0/R)(1/T + 2c/T^2)
      const TdB = (a0 / R) * (1 / T + (2 * c) / (T * T));
      const d = departureFunctions(model, T, rho, [1]);
      const hExpected = R * T * (B - TdB) * rho;
      expect(Math.abs(d.sameTemperatureAndPressure.h - hExpected)).toBeLessThan(
        1e-6 * Math.abs(hExpected),
      );
    }
  });
  it("reports an error estimate and the evaluation count", () => {
    const d = departureFunctions(model, 250, 8000, [1]);
    expect(d.errorEstimate.h).toBeGreaterThanOrEqual(0);
    expect(d.errorEstimate.h).toBeLessThan(1e-6);
    expect(d.evaluations).toBeGreaterThan(10);
    expect(d.derivativeMethod).toMatch(/hyper-dual/);
  });
  it("the cumulative isotherm equals point-by-point integration", () => {
    const grid = [50, 200, 1000, 4000, 12000];
    const line = isothermDepartures(model, 280, grid, [1]);
    grid.forEach((rho, k) => {
      const point = departureFunctions(model, 280, rho, [1], { composition: false });
      const h1 = line.points[k].sameTemperatureAndPressure.h;
      const h2 = point.sameTemperatureAndPressure.h;
      expect(Math.abs(h1 - h2)).toBeLessThan(1e-8 * Math.max(Math.abs(h2), R * 280));
    });
  });
  it("refuses a density at or above maxDensity, and a non-ascending grid", () => {
    expect(() => model.residual(300, 4 / b, [1])).toThrow(OutOfRangeError);
    expect(() => isothermDepartures(model, 300, [100, 50], [1])).toThrow(InputError);
    expect(() => departureFunctions(model, NaN, 100, [1])).toThrow(InputError);
    expect(() => departureFunctions(model, 300, -1, [1])).toThrow(InputError);
  });
});

describe("plain-number pressure functions (finite differences, less exact)", () => {
  const pr = createModel("peng-robinson", comps("propane"));
  const plain = modelFromPlainPressure({
    name: "PR propane, plain numbers",
    components: ["propane"],
    pressure: (T, rho, x) => pr.pressureFunction(new HyperDual(T), new HyperDual(rho), x).re,
    maxDensity: (T, x) => pr.maxDensity(T, x),
  });
  it("agrees with the closed form to the accuracy it reports (about 1e-7)", () => {
    const T = 350;
    const rho = 3000;
    const exactR = pr.residual(T, rho, [1]);
    const res = plain.integrate(T, rho, [1]);
    expect(Math.abs(res.derivatives.a - exactR.a)).toBeLessThan(1e-10);
    expect(Math.abs(res.derivatives.aT - exactR.aT)).toBeLessThan(1e-6);
    expect(Math.abs(res.derivatives.aTT - exactR.aTT)).toBeLessThan(1e-5);
    // the reported estimate bounds the actual error
    expect(Math.abs(res.derivatives.aT - exactR.aT)).toBeLessThanOrEqual(res.errorEstimate.aT);
    expect(res.derivativeMethod).toMatch(/finite differences/);
    const warnings = plain.checkValidity!(T, rho, [1]);
    expect(warnings.some((w) => w.code === "accuracy")).toBe(true);
  });
});

describe("mixture pressure functions: composition derivatives", () => {
  it("ln phi from mole-fraction differencing matches the closed form of a virial mixture", () => {
    const closed = createModel("virial", comps("methane", "ethane", "nitrogen"));
    const numeric = modelFromPressure({
      name: "virial, numeric",
      components: ["methane", "ethane", "nitrogen"],
      pressure: closed.pressureFunction,
    });
    const x = [0.8, 0.15, 0.05];
    const a = closed.residual(300, 800, x, { composition: true });
    const b2 = numeric.integrate(300, 800, x, { composition: true });
    for (let i = 0; i < 3; i++) {
      expect(Math.abs(a.dnA![i] - b2.derivatives.dnA![i])).toBeLessThan(1e-9);
      expect(b2.errorEstimate.dnA![i]).toBeGreaterThan(0);
    }
    // a trace component (x_i < 2h) uses the one-sided formula
    const xt = [0.999995, 0.000004, 0.000001];
    const at = closed.residual(300, 800, xt, { composition: true });
    const bt = numeric.integrate(300, 800, xt, { composition: true });
    for (let i = 0; i < 3; i++)
      expect(Math.abs(at.dnA![i] - bt.derivatives.dnA![i])).toBeLessThan(1e-8);
  });
});

describe("departures of closed-form models through the same functions", () => {
  it("departureFunctions and isothermDepartures accept any model (closed form, zero error)", () => {
    const pr = createModel("peng-robinson", comps("methane"));
    const numeric = modelFromPressure({
      name: "PR numeric",
      components: ["methane"],
      pressure: pr.pressureFunction,
      maxDensity: (T, x) => pr.maxDensity(T, x),
    });
    const a = departureFunctions(pr, 250, 5000, [1]);
    const b = departureFunctions(numeric, 250, 5000, [1]);
    expect(a.errorEstimate.h).toBe(0);
    expect(a.derivativeMethod).toMatch(/closed form/);
    expect(Math.abs(a.sameTemperatureAndPressure.h - b.sameTemperatureAndPressure.h)).toBeLessThan(
      1e-9 * R * 250,
    );
    const la = isothermDepartures(pr, 250, [100, 1000, 5000], [1]);
    const lb = isothermDepartures(numeric, 250, [100, 1000, 5000], [1]);
    la.points.forEach((p, k) =>
      expect(
        Math.abs(p.sameTemperatureAndDensity.s - lb.points[k].sameTemperatureAndDensity.s),
      ).toBeLessThan(1e-9 * R),
    );
  });
});
