import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  compileCorrelation,
  correlationCp,
  correlationCpIntegral,
  correlationCpOverTIntegral,
  type CpAndIntegrals,
} from "../../../kernel-lib/src/idealgas/cpCorrelation.js";
import type { AlyLeeCp } from "../../../kernel-lib/src/components/types.js";
import { listComponents } from "../../../kernel-lib/src/components/getComponent.js";

// The compiled evaluator (the mixture's hot path) must give the same cp, h - h(298.15 K) and
// s - s(298.15 K) as the reference functions, which are checked against Simpson quadrature in
// cpCorrelation.test.ts. Tolerance: rounding of the rearranged hyperbolic functions (Aly-Lee),
// relative 1e-12 of the magnitude of the antiderivative terms (common practice, no source).
describe("compileCorrelation agrees with correlationCp and its integrals", () => {
  for (const c of listComponents()) {
    it(c.id, () => {
      const cp = c.idealGasCp;
      const compiled = compileCorrelation(cp);
      const out: CpAndIntegrals = { cp: 0, hFrom298: 0, sFrom298: 0 };
      fc.assert(
        fc.property(
          fc.double({
            min: cp.minTemperatureK * 0.9,
            max: cp.maxTemperatureK * 1.1,
            noNaN: true,
          }),
          (t) => {
            compiled.evaluate(t, out);
            const cpRef = correlationCp(cp, t);
            const hRef = correlationCpIntegral(cp, 298.15, t);
            const sRef = correlationCpOverTIntegral(cp, 298.15, t);
            expect(Math.abs(out.cp - cpRef)).toBeLessThanOrEqual(1e-12 * Math.abs(cpRef));
            // the h and s integrals are differences of antiderivatives of size cp T and cp ln T
            expect(Math.abs(out.hFrom298 - hRef)).toBeLessThanOrEqual(1e-12 * cpRef * (t + 298.15));
            expect(Math.abs(out.sFrom298 - sRef)).toBeLessThanOrEqual(1e-12 * cpRef * 10);
          },
        ),
        { numRuns: 100 },
      );
      compiled.evaluate(298.15, out);
      expect(out.hFrom298).toBe(0);
      expect(out.sFrom298).toBe(0);
    });
  }
});

// The compiled Aly-Lee evaluator as it was before 2026-12-04 (separate exp and expm1 of -u and
// -2u, a logarithm of T of its own), kept here to hold the one-exponential form of
// cpCorrelation.ts to it: the same formulas rearranged, so they agree to rounding. Tolerance
// 1e-13 relative to the size of each quantity (cp; the antiderivative terms cp T and cp ln T of
// h and s), common practice for a rearrangement that changes a few units in the last place.
function previousAlyLee(c: AlyLeeCp): (t: number) => CpAndIntegrals {
  const all = (t: number, h0: number, s0: number): CpAndIntegrals => {
    const ax = Math.abs(c.cK / t);
    const ex = Math.exp(-ax);
    const mx = -Math.expm1(-2 * ax);
    const xOverSinhX = ax === 0 ? 1 : (2 * ax * ex) / mx;
    const xCothX = ax === 0 ? 1 : (ax * (1 + ex * ex)) / mx;
    const ay = Math.abs(c.eK / t);
    const ey = Math.exp(-ay);
    const py = 1 + ey * ey;
    const yOverCoshY = (2 * ay * ey) / py;
    const yTanhY = (ay * -Math.expm1(-2 * ay)) / py;
    const lnT = Math.log(t);
    const bPart = c.cK === 0 ? lnT : xCothX - (ax + Math.log(mx / 2));
    const dPart = yTanhY - (ay + Math.log(py / 2));
    return {
      cp:
        c.aJPerMolK + c.bJPerMolK * xOverSinhX * xOverSinhX + c.dJPerMolK * yOverCoshY * yOverCoshY,
      hFrom298: c.aJPerMolK * t + c.bJPerMolK * t * xCothX - c.dJPerMolK * t * yTanhY - h0,
      sFrom298: c.aJPerMolK * lnT + c.bJPerMolK * bPart - c.dJPerMolK * dPart - s0,
    };
  };
  const at298 = all(298.15, 0, 0);
  return (t) => all(t, at298.hFrom298, at298.sFrom298);
}

function expectClose(out: CpAndIntegrals, ref: CpAndIntegrals, t: number, rel: number): void {
  const size = Math.abs(ref.cp);
  expect(Math.abs(out.cp - ref.cp)).toBeLessThanOrEqual(rel * size);
  expect(Math.abs(out.hFrom298 - ref.hFrom298)).toBeLessThanOrEqual(rel * size * (t + 298.15));
  expect(Math.abs(out.sFrom298 - ref.sFrom298)).toBeLessThanOrEqual(
    rel * size * (Math.abs(Math.log(t)) + Math.log(298.15)),
  );
}

describe("the one-exponential Aly-Lee form agrees with the previous compiled form", () => {
  // every Aly-Lee component of the table, plus invented correlations with small C and E (so that
  // u = C/T and E/T fall on both sides of the split at 1/2, and C = 0), over 0.9 Tmin to 1.1 Tmax
  const invented: AlyLeeCp[] = [
    {
      form: "aly-lee",
      aJPerMolK: 30,
      bJPerMolK: 60,
      cK: 120,
      dJPerMolK: 40,
      eK: 80,
      minTemperatureK: 50,
      maxTemperatureK: 1500,
    },
    {
      form: "aly-lee",
      aJPerMolK: 30,
      bJPerMolK: 60,
      cK: 0,
      dJPerMolK: 40,
      eK: -300,
      minTemperatureK: 50,
      maxTemperatureK: 1500,
    },
  ];
  const table = listComponents()
    .map((c) => c.idealGasCp)
    .filter((cp): cp is AlyLeeCp => cp.form === "aly-lee");
  it(`covers ${table.length} components of the table`, () => {
    expect(table.length).toBeGreaterThan(5);
  });
  [...table, ...invented].forEach((cp, k) => {
    it(`correlation ${k} (C = ${cp.cK} K, E = ${cp.eK} K)`, () => {
      const previous = previousAlyLee(cp);
      const compiled = compileCorrelation(cp);
      const out: CpAndIntegrals = { cp: 0, hFrom298: 0, sFrom298: 0 };
      const outLog: CpAndIntegrals = { cp: 0, hFrom298: 0, sFrom298: 0 };
      fc.assert(
        fc.property(
          fc.double({ min: cp.minTemperatureK * 0.9, max: cp.maxTemperatureK * 1.1, noNaN: true }),
          (t) => {
            const ref = previous(t);
            compiled.evaluate(t, out);
            compiled.evaluateWithLog(t, Math.log(t), outLog);
            expectClose(out, ref, t, 1e-13);
            // the two entries are one formula
            expect(outLog).toEqual(out);
          },
        ),
        { numRuns: 300 },
      );
    });
  });
});

describe("evaluateWithLog of a polynomial (ln T - ln c) agrees with evaluate (log1p)", () => {
  for (const c of listComponents().filter((k) => k.idealGasCp.form === "polynomial")) {
    it(c.id, () => {
      const cp = c.idealGasCp;
      const compiled = compileCorrelation(cp);
      const out: CpAndIntegrals = { cp: 0, hFrom298: 0, sFrom298: 0 };
      const outLog: CpAndIntegrals = { cp: 0, hFrom298: 0, sFrom298: 0 };
      fc.assert(
        fc.property(
          fc.double({ min: cp.minTemperatureK * 0.9, max: cp.maxTemperatureK * 1.1, noNaN: true }),
          (t) => {
            compiled.evaluate(t, out);
            compiled.evaluateWithLog(t, Math.log(t), outLog);
            expect(outLog.cp).toBe(out.cp);
            expect(outLog.hFrom298).toBe(out.hFrom298);
            expectClose(outLog, out, t, 1e-13);
          },
        ),
        { numRuns: 100 },
      );
      compiled.evaluateWithLog(298.15, Math.log(298.15), outLog);
      expect(outLog.hFrom298).toBe(0);
      expect(outLog.sFrom298).toBe(0);
    });
  }
});
