/**
 * Enthalpy of vaporisation at the normal boiling point from the reference equations against
 * handbook values: CRC Handbook of Chemistry and Physics, "Enthalpy of vaporization" table, at the
 * normal boiling point (from memory of the CRC Handbook, 3-4 significant digits: water 40.65,
 * methane 8.19, nitrogen 5.57 kJ/mol). The handbook values are calorimetric, with uncertainties of
 * a few tenths of a percent; tolerance 0.5 %.
 */
import { describe, expect, it } from "vitest";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { saturationAtPressure } from "../../../kernel-lib/src/phase/saturation.js";

describe("enthalpy of vaporisation at the normal boiling point", () => {
  const cases: [string, number][] = [
    ["water", 40650],
    ["methane", 8190],
    ["nitrogen", 5570],
  ];
  for (const [id, hvap] of cases) {
    it(`${id}: ${hvap / 1000} kJ/mol (CRC Handbook, from memory)`, () => {
      const s = saturationAtPressure(referenceFluid(id), 101325);
      expect(Math.abs(s.enthalpyOfVaporizationJPerMol / hvap - 1)).toBeLessThan(5e-3);
      expect(s.entropyOfVaporizationJPerMolK).toBeCloseTo(
        s.enthalpyOfVaporizationJPerMol / s.temperatureK,
        12,
      );
    });
  }
});
