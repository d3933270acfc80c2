import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  compileCorrelation,
  correlationCp,
  correlationCpIntegral,
  correlationCpOverTIntegral,
  type CpAndIntegrals,
} from "../../../kernel-lib/src/idealgas/cpCorrelation.js";
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
