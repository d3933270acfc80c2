import { describe, expect, it } from "vitest";
import {
  lookupFlowUnit,
  molarFlowFromSI,
  molarFlowToSI,
  resolveReferenceConditions,
  idealGasMolarVolumeM3PerMol,
  NAMED_REFERENCE_CONDITIONS,
  FLOW_UNITS,
} from "../../../kernel-lib/src/units/flow.js";
import { toSI } from "../../../kernel-lib/src/units/convert.js";
import { InputError, UnknownNameError } from "../../../kernel-lib/src/errors.js";

describe("flow units (factors exact: NIST SP 811 (2008) App. B.8)", () => {
  it("molar and mass units", () => {
    expect(molarFlowToSI(3600, "kmol/h")).toBeCloseTo(1000, 12);
    expect(molarFlowToSI(1, "lbmol/h")).toBeCloseTo(453.59237 / 3600, 14);
    expect(molarFlowToSI(36, "t/h", { molarMassKgPerMol: 0.018 })).toBeCloseTo(10 / 0.018, 9);
    expect(molarFlowToSI(3600, "kg/h", { molarMassKgPerMol: 0.5 })).toBeCloseTo(2, 12);
  });

  it("standard volumes: the ideal-gas molar volume at 0 degC, 1 atm is 22.413969 L/mol", () => {
    // from memory of CODATA 2018: V_m (273.15 K, 101.325 kPa) = 22.413 969 54 L/mol
    const normal = NAMED_REFERENCE_CONDITIONS["normal (0 degC, 101.325 kPa)"];
    expect(idealGasMolarVolumeM3PerMol(normal)).toBeCloseTo(22.41396954e-3, 11);
    // 1 MMSCFD at 60 degF, 14.696 psia on the ideal-gas basis: about 1.1953 kmol/h x 1000 / 3600...
    // common practice, no source: 1 MMSCFD is about 49.8 kmol/h (ideal gas at 60 degF, 14.696 psia)
    const ref = resolveReferenceConditions("60 degF, 14.696 psia");
    const v = idealGasMolarVolumeM3PerMol(ref);
    const kmolh = molarFlowToSI(1, "MMSCFD", { standardMolarVolumeM3PerMol: v }) * 3.6;
    expect(kmolh).toBeGreaterThan(49.7);
    expect(kmolh).toBeLessThan(49.9);
    expect(ref.temperatureK).toBeCloseTo(288.705555556, 8);
    expect(ref.pressurePa).toBeCloseTo(toSI(14.696, "psia"), 9);
  });

  it("round trips every unit", () => {
    const ctx = {
      molarMassKgPerMol: 0.02,
      standardMolarVolumeM3PerMol: 0.0236,
      actualMolarVolumeM3PerMol: 1e-4,
    };
    for (const u of FLOW_UNITS) {
      const si = molarFlowToSI(123.4, u.symbol, ctx);
      expect(molarFlowFromSI(si, u.symbol, ctx)).toBeCloseTo(123.4, 9);
    }
  });

  it("refuses a standard volume without reference conditions, a missing unit, bad values", () => {
    expect(() => resolveReferenceConditions(undefined)).toThrow(InputError);
    expect(() => resolveReferenceConditions(undefined)).toThrow(/flow.reference/);
    expect(() => resolveReferenceConditions("standard")).toThrow(InputError);
    expect(() => resolveReferenceConditions({ temperatureK: 15, pressurePa: 101325 })).toThrow(
      /temperatureK/,
    );
    expect(() => molarFlowToSI(1, "Sm3/h")).toThrow(/reference conditions/);
    expect(() => molarFlowToSI(1, "kg/h")).toThrow(/molar mass/);
    expect(() => lookupFlowUnit(undefined as unknown as string)).toThrow(/no default unit/);
    expect(() => lookupFlowUnit("kmol/hour")).toThrow(UnknownNameError);
    expect(() => molarFlowToSI(-1, "mol/s")).toThrow(InputError);
    expect(() => molarFlowToSI(NaN, "mol/s")).toThrow(InputError);
  });

  it("horsepower is 550 ft lbf/s = 745.69987 W (NIST SP 811 B.8)", () => {
    // from memory of NIST SP 811 (2008) B.8: horsepower (550 ft lbf/s) = 7.456 999 E+02 W
    expect(toSI(1, "hp")).toBeCloseTo(745.6999, 3);
    // from memory of NIST SP 811 (2008) B.8: horsepower (metric) = 7.354 988 E+02 W
    expect(toSI(1, "hp(metric)")).toBeCloseTo(735.4988, 3);
  });
});
