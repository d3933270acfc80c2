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
import { expectReference, referenceValue } from "../../fixtures/referenceValues.js";

describe("enthalpy of vaporisation at the normal boiling point", () => {
  // tests/fixtures/crc-handbook.json (from memory of the CRC Handbook, tolerance 0.5 %)
  for (const id of ["water", "methane", "nitrogen"]) {
    const ref = referenceValue("crc-handbook.json", `${id}/hvap-nbp`);
    it(`${id}: ${ref.printed} kJ/mol (CRC Handbook, from memory)`, () => {
      const s = saturationAtPressure(referenceFluid(id), 101325);
      expectReference(s.enthalpyOfVaporizationJPerMol / 1000, ref);
      expect(s.entropyOfVaporizationJPerMolK).toBeCloseTo(
        s.enthalpyOfVaporizationJPerMol / s.temperatureK,
        12,
      );
    });
  }
});
