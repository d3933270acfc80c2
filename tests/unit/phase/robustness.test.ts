/**
 * Robustness over random states for every shipped reference equation: the phase implied at
 * (T, P) and the state returned agree (liquid above the saturation pressure, vapour below,
 * supercritical above both critical values), and the state's pressure is the one asked for.
 * Identities only (no external reference values).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { referenceFluidIds } from "../../../kernel-lib/src/eos/multiparameter/referenceFluids.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { referenceFluidBinding } from "../../../kernel-lib/src/state/referenceStates.js";
import { locateCriticalPoint } from "../../../kernel-lib/src/phase/criticalPoint.js";
import {
  pureFluidPhaseAt,
  pureFluidStateTP,
} from "../../../kernel-lib/src/phase/pureFluidPhase.js";
import {
  saturationAtPressure,
  saturationAtTemperature,
} from "../../../kernel-lib/src/phase/saturation.js";

describe("phase at (T, P) and the state found there agree", () => {
  for (const id of referenceFluidIds()) {
    it(id, () => {
      const fluid = referenceFluid(id);
      const binding = referenceFluidBinding(fluid);
      const Tt = fluid.triple.temperatureK;
      const Tc = fluid.critical.temperatureK;
      fc.assert(
        fc.property(
          fc.double({ min: Tt * 1.001, max: Tc * 2, noNaN: true }),
          fc.double({ min: -3, max: 1.5, noNaN: true }),
          (T, logPr) => {
            const P = fluid.critical.pressurePa * Math.pow(10, logPr);
            const label = pureFluidPhaseAt(fluid, T, P);
            const s = pureFluidStateTP(binding, T, P);
            expect(Math.abs(s.pressurePa / P - 1)).toBeLessThan(1e-8);
            if (label.phase === "liquid" && T < Tc) {
              const sat = saturationAtTemperature(fluid, T);
              expect(s.densityMolPerM3).toBeGreaterThanOrEqual(
                sat.liquidDensityMolPerM3 * (1 - 1e-9),
              );
            }
            if (label.phase === "vapor" && T < Tc) {
              const sat = saturationAtTemperature(fluid, T);
              expect(s.densityMolPerM3).toBeLessThanOrEqual(sat.vaporDensityMolPerM3 * (1 + 1e-9));
            }
            expect(s.dPdRhoPaM3PerMol).toBeGreaterThan(0);
          },
        ),
        { numRuns: 80 },
      );
    });
  }
});

describe("saturation at given P inverts saturation at given T", () => {
  for (const id of referenceFluidIds()) {
    it(id, () => {
      const fluid = referenceFluid(id);
      const Tt = fluid.triple.temperatureK;
      const Tc = fluid.critical.temperatureK;
      fc.assert(
        fc.property(fc.double({ min: 0, max: 1, noNaN: true }), (u) => {
          const T = Tt + u * (Tc - 0.01 - Tt);
          const p = saturationAtTemperature(fluid, T).pressurePa;
          const back = saturationAtPressure(fluid, p);
          expect(Math.abs(back.temperatureK - T)).toBeLessThan(1e-9 * T);
        }),
        { numRuns: 20 },
      );
    });
  }
});

describe("near the critical point", () => {
  for (const id of referenceFluidIds()) {
    it(`${id}: saturation at Tc - 1e-6 K and at P = Pc (1 - 1e-7)`, () => {
      const fluid = referenceFluid(id);
      const c = locateCriticalPoint(fluid);
      const s = saturationAtTemperature(fluid, c.temperatureK - 1e-6);
      expect(s.liquidDensityMolPerM3).toBeGreaterThan(s.vaporDensityMolPerM3 * (1 + 1e-5));
      expect(s.residual.gibbs).toBeLessThan(1e-12);
      const p = saturationAtPressure(fluid, c.pressurePa * (1 - 1e-7));
      expect(p.temperatureK).toBeLessThan(c.temperatureK);
      expect(c.temperatureK - p.temperatureK).toBeLessThan(1e-4);
    });
  }
});
