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
      for (const joint of joints) {
        // Stop a hair short of the joint so that every node uses this segment's polynomial
        // (the segments of a fit may differ by ~1e-4 at the joint; cp is taken from the upper one there).
        const hi = joint * (1 - 1e-14);
        hq += simpson(f, lo, hi);
        // ... and start a hair above the lower joint: exp(ln 200) = 199.99999999999997 would take
        // the end node from the segment below.
        const loU = lo === a ? Math.log(lo) : Math.log(lo * (1 + 1e-14));
        sq += simpson((u) => f(Math.exp(u)), loU, Math.log(hi));
        lo = joint;
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

describe("short temperature steps (where a naive hi^n - lo^n loses digits)", () => {
  it("int cp dT over [T, T + 1e-7 K] equals cp(T) * 1e-7 to 1e-8 relative (methane, degree-6 fit)", () => {
    // Mean-value theorem, closed form: the integral over a tiny step is cp times the step (the cp
    // change over 1e-7 K is ~1e-10 relative). Computing T2^7 - T1^7 directly cancels ~15 digits.
    const cp = listComponents().find((c) => c.id === "methane")!.idealGasCp;
    for (const t of [300, 800, 1400]) {
      const d = t + 1e-7 - t; // the step actually represented in floating point
      const exact = correlationCp(cp, t + d / 2) * d;
      expect(Math.abs(correlationCpIntegral(cp, t, t + d) / exact - 1)).toBeLessThan(1e-8);
      const sExact = (correlationCp(cp, t + d / 2) / (t + d / 2)) * d;
      expect(Math.abs(correlationCpOverTIntegral(cp, t, t + d) / sExact - 1)).toBeLessThan(1e-8);
    }
  });
});
