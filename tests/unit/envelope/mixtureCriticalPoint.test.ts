/**
 * Mixture critical points by the Heidemann-Khalil criteria (phase/envelope/mixtureCriticalPoint.ts):
 * the pure-component limit, a published critical locus, and the cyclic Jacobi eigen-solver it uses.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { mixtureCriticalPoint } from "../../../kernel-lib/src/phase/envelope/index.js";
import { symmetricEigen } from "../../../kernel-lib/src/numerics/symmetricEigen.js";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { expectReference, referenceValue } from "../../fixtures/referenceValues.js";

describe("symmetricEigen (cyclic Jacobi)", () => {
  it("reproduces a matrix built from known eigenpairs", () => {
    // A = Q diag(l) Q^T with an orthogonal Q (a Householder reflection I - 2 v v^T / v^T v)
    const v = [1, 2, -1, 0.5];
    const vv = v.reduce((s, a) => s + a * a, 0);
    const Q = v.map((a, i) => v.map((b, j) => (i === j ? 1 : 0) - (2 * a * b) / vv));
    const l = [-0.3, 1e-3, 2, 7];
    const A = Q.map((_, i) =>
      Q.map((__, j) => l.reduce((s, lk, k) => s + Q[i][k] * lk * Q[j][k], 0)),
    );
    const e = symmetricEigen(A);
    e.values.forEach((val, k) => expect(val).toBeCloseTo(l[k], 12));
    // each vector satisfies A u = lambda u
    e.vectors.forEach((u, k) => {
      A.forEach((row, i) => {
        const Au = row.reduce((s, a, j) => s + a * u[j], 0);
        expect(Au).toBeCloseTo(e.values[k] * u[i], 12);
      });
    });
  });
  it("refuses a non-square or non-finite matrix", () => {
    expect(() => symmetricEigen([[1, 2]])).toThrow(InputError);
    expect(() => symmetricEigen([[NaN]])).toThrow(InputError);
  });
});

describe("Heidemann-Khalil critical points (Peng-Robinson)", () => {
  it("a nearly pure component has the component's own critical point", () => {
    // Peng-Robinson reproduces the Tc and Pc it is given (Peng & Robinson, Ind. Eng. Chem.
    // Fundam. 15 (1976) 59: a and b are fixed by the two critical conditions), so the mixture
    // criteria at z -> (1, 0) must return the table's ethane values; 1e-5 of n-heptane moves the
    // point by about 1e-4 (relative) by the initial slope of the locus.
    const f = defineFluid({ components: ["ethane", "n-heptane"], model: "peng-robinson" });
    const c = mixtureCriticalPoint(f.model, [1 - 1e-6, 1e-6]);
    const ethane = getComponent("ethane");
    expect(Math.abs(c.temperatureK / ethane.criticalTemperatureK - 1)).toBeLessThan(1e-4);
    expect(Math.abs(c.pressurePa / ethane.criticalPressurePa - 1)).toBeLessThan(1e-4);
    expect(Math.abs(c.residual.eigenvalue)).toBeLessThan(1e-8);
  });

  it("the ethane/n-heptane critical locus rises to Kay's maximum pressure", () => {
    // tests/fixtures/kay-1938-ethane-heptane.json (from memory; tolerance and reason there)
    const f = defineFluid({ components: ["ethane", "n-heptane"], model: "peng-robinson" });
    const pressures = [0.7, 0.75, 0.8, 0.85].map(
      (x) => mixtureCriticalPoint(f.model, [x, 1 - x]).pressurePa,
    );
    const top = Math.max(...pressures);
    // psia = 6894.757 Pa (NIST SP 811 (2008), App. B)
    expectReference(
      top / 6894.757,
      referenceValue("kay-1938-ethane-heptane.json", "critical-locus/maximum-pressure"),
    );
    // and the locus lies between the pure critical temperatures
    const mid = mixtureCriticalPoint(f.model, [0.5, 0.5]);
    expect(mid.temperatureK).toBeGreaterThan(getComponent("ethane").criticalTemperatureK);
    expect(mid.temperatureK).toBeLessThan(getComponent("n-heptane").criticalTemperatureK);
  });

  it("ethane/n-heptane on the heptane-rich side: no spurious negative-pressure root", () => {
    // a critical point of a liquid-vapour pair has P > 0 and, for this type I system, a
    // temperature between the pure critical temperatures (Kay 1938, as above); the scan once
    // bracketed a sign change of the cubic form near 130 K with P < -90 MPa here
    const f = defineFluid({ components: ["ethane", "n-heptane"], model: "peng-robinson" });
    for (const x of [0.3, 0.4, 0.5]) {
      const c = mixtureCriticalPoint(f.model, [x, 1 - x]);
      expect(c.pressurePa).toBeGreaterThan(0);
      expect(c.temperatureK).toBeGreaterThan(getComponent("ethane").criticalTemperatureK);
      expect(c.temperatureK).toBeLessThan(getComponent("n-heptane").criticalTemperatureK);
      expect(Math.abs(c.residual.eigenvalue)).toBeLessThan(1e-8);
    }
  });

  it("methane/ethane: the critical temperature falls monotonically with methane", () => {
    // a type I system with a continuous locus between the pure critical points (e.g. Michelsen
    // & Mollerup, Thermodynamic Models, 2nd ed. (2007), ch. 12)
    const f = defineFluid({ components: ["methane", "ethane"], model: "peng-robinson" });
    const temps = [0.2, 0.4, 0.6, 0.8].map(
      (x) => mixtureCriticalPoint(f.model, [x, 1 - x]).temperatureK,
    );
    for (let k = 1; k < temps.length; k++) expect(temps[k]).toBeLessThan(temps[k - 1]);
  });

  it("refuses a bad composition", () => {
    const f = defineFluid({ components: ["methane", "ethane"], model: "peng-robinson" });
    expect(() => mixtureCriticalPoint(f.model, [0.5, 0.6])).toThrow(InputError);
  });
});
