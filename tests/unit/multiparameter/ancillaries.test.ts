/**
 * The published ancillary equations (starting values only) against the saturation state solved
 * from each equation of state, from the triple point to 0.99 Tc. Each paper fits its ancillaries
 * to the equation (or its data) to about 0.01-0.1 %; a mistyped coefficient shows up as a
 * deviation of percent or more. Tolerance 0.1 % (common practice for starting values, no source;
 * measured maximum deviations 2e-5 to 7e-4).
 */
import { describe, expect, it } from "vitest";
import { referenceFluidIds } from "../../../kernel-lib/src/eos/multiparameter/referenceFluids.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { saturationAtTemperature } from "../../../kernel-lib/src/phase/saturation.js";

describe("ancillary equations agree with the solved saturation within 0.1 %", () => {
  for (const id of referenceFluidIds()) {
    it(id, () => {
      const f = referenceFluid(id);
      const Tt = f.triple.temperatureK;
      const Tc = f.critical.temperatureK;
      for (let i = 0; i <= 25; i++) {
        const T = Tt + ((0.99 * Tc - Tt) * i) / 25;
        const s = saturationAtTemperature(f, T);
        const a = f.saturationEstimate(T);
        expect(Math.abs(a.pressurePa / s.pressurePa - 1)).toBeLessThan(1e-3);
        expect(Math.abs(a.liquidDensityMolPerM3 / s.liquidDensityMolPerM3 - 1)).toBeLessThan(1e-3);
        expect(Math.abs(a.vaporDensityMolPerM3 / s.vaporDensityMolPerM3 - 1)).toBeLessThan(1e-3);
      }
    });
  }
});
