import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  correlationCp,
  correlationCpIntegral,
  correlationCpOverTIntegral,
} from "../../../kernel-lib/src/idealgas/cpCorrelation.js";
import type { AlyLeeCp, CpCorrelation } from "../../../kernel-lib/src/components/types.js";
import { listComponents } from "../../../kernel-lib/src/components/getComponent.js";

/** Composite Simpson rule with n (even) panels: an independent check of the closed forms. */
function simpson(f: (t: number) => number, a: number, b: number, n = 2000): number {
  const h = (b - a) / n;
  let sum = f(a) + f(b);
  for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (sum * h) / 3;
}

describe("closed-form integrals of every table correlation agree with Simpson quadrature", () => {
  for (const c of listComponents()) {
    it(c.id, () => {
      const cp = c.idealGasCp;
      const a = cp.minTemperatureK;
      const b = cp.maxTemperatureK;
      const f = (t: number) => correlationCp(cp, t);
      // Quadrature piece by piece between segment joints (cp is smooth only inside a segment);
      // the cp/T integral is done in u = ln T, where its integrand cp(e^u) is smooth.
      const joints = cp.form === "polynomial" ? cp.segments.map((g) => g.maxTemperatureK) : [b];
      let hq = 0;
      let sq = 0;
      let lo = a;
      for (const hi of joints) {
        hq += simpson(f, lo, hi);
        sq += simpson((u) => f(Math.exp(u)), Math.log(lo), Math.log(hi));
        lo = hi;
      }
      const h = correlationCpIntegral(cp, a, b);
      const s = correlationCpOverTIntegral(cp, a, b);
      expect(Math.abs(h - hq) / Math.abs(h)).toBeLessThan(1e-9);
      expect(Math.abs(s - sq) / Math.abs(s)).toBeLessThan(1e-9);
    });
  }
});

describe("Aly-Lee edge cases", () => {
  const constant: AlyLeeCp = {
    form: "aly-lee",
    aJPerMolK: 20,
    bJPerMolK: 10,
    cK: 0,
    dJPerMolK: 5,
    eK: 0,
    minTemperatureK: 100,
    maxTemperatureK: 1000,
  };
  it("C = 0 makes the B term a constant B and E = 0 removes the D term (limits of the form)", () => {
    expect(correlationCp(constant, 300)).toBeCloseTo(30, 12);
    expect(correlationCpIntegral(constant, 300, 600)).toBeCloseTo(30 * 300, 9);
    expect(correlationCpOverTIntegral(constant, 300, 600)).toBeCloseTo(30 * Math.log(2), 12);
  });
  it("stays finite where sinh(C/T) overflows a naive evaluation (C/T = 1000)", () => {
    const steep: AlyLeeCp = { ...constant, cK: 200000, eK: 300 };
    const v = correlationCpOverTIntegral(steep, 200, 400);
    expect(Number.isFinite(v)).toBe(true);
    expect(Math.abs(v - simpson((t) => correlationCp(steep, t) / t, 200, 400))).toBeLessThan(1e-8);
  });
  it("integrals are antisymmetric and additive (fast-check)", () => {
    const poly: CpCorrelation = {
      form: "polynomial",
      minTemperatureK: 200,
      maxTemperatureK: 3000,
      segments: [
        { minTemperatureK: 200, maxTemperatureK: 1000, coefficients: [3.5, 1e-3, -2e-7] },
        { minTemperatureK: 1000, maxTemperatureK: 3000, coefficients: [3.7, 8e-4, -1e-7] },
      ],
    };
    fc.assert(
      fc.property(
        fc.double({ min: 150, max: 3300, noNaN: true }),
        fc.double({ min: 150, max: 3300, noNaN: true }),
        fc.double({ min: 150, max: 3300, noNaN: true }),
        (a, b, m) => {
          for (const f of [correlationCpIntegral, correlationCpOverTIntegral]) {
            const ab = f(poly, a, b);
            expect(ab).toBeCloseTo(-f(poly, b, a), 8);
            expect(ab).toBeCloseTo(f(poly, a, m) + f(poly, m, b), 8);
          }
        },
      ),
    );
  });
});
