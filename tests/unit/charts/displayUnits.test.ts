/* eslint-disable @typescript-eslint/no-explicit-any -- the tests read into plain JSON specs */
import { describe, expect, it } from "vitest";
import {
  DISPLAY_UNITS,
  fromDisplay,
  quantityTitle,
  resolveUnit,
  toDisplay,
} from "../../../kernel-lib/src/charts/displayUnits.js";
import { UnknownNameError } from "../../../kernel-lib/src/errors.js";
import { referenceValue } from "../../fixtures/referenceValues.js";

describe("display units", () => {
  it("convert with the units/ table: known values", () => {
    // -40 degF = -40 degC = 233.15 K (the two scales cross at -40; definition of both scales)
    expect(toDisplay(233.15, resolveUnit("temperature", "field"))).toBeCloseTo(-40, 10);
    expect(toDisplay(233.15, resolveUnit("temperature", { temperature: "degC" }))).toBeCloseTo(
      -40,
      10,
    );
    // 1 atm = 101325 Pa = 14.69595 psi (NIST SP 811, App. B.8: 1 psi = 6.894757 E+03 Pa, in
    // tests/fixtures/nist-sp811-2008.json; the factor's rounding, 1e-7 relative, is 1.5e-6 psi)
    const sp811 = (key: string) => referenceValue("nist-sp811-2008.json", key);
    expect(toDisplay(101325, resolveUnit("pressure", "field"))).toBeCloseTo(
      sp811("atm").value / sp811("psi").value,
      5,
    );
    // 1 Btu/lbmol = 2.326 J/mol (the Btu_IT per pound, 2.326 E+03 J/kg exact, over 1000)
    expect(
      toDisplay(sp811("Btu_IT/lb").value / 1000, resolveUnit("molarEnergy", "field")),
    ).toBeCloseTo(1, 12);
    // kJ/kmol is J/mol
    expect(toDisplay(123, resolveUnit("molarEnergy", { molarEnergy: "kJ/kmol" }))).toBeCloseTo(
      123,
      12,
    );
  });

  it("round-trips every unit", () => {
    for (const list of Object.values(DISPLAY_UNITS)) {
      for (const u of list) expect(fromDisplay(toDisplay(321.5, u), u)).toBeCloseTo(321.5, 9);
    }
  });

  it("SI system defaults and per-quantity overrides", () => {
    expect(resolveUnit("pressure").id).toBe("MPa");
    expect(resolveUnit("pressure", { system: "field", pressure: "bar" }).id).toBe("bar");
    expect(resolveUnit("temperature", { system: "field", pressure: "bar" }).id).toBe("degF");
  });

  it("writes quantity / unit titles", () => {
    expect(quantityTitle("Pressure P", resolveUnit("pressure", "field"))).toBe("Pressure P / psia");
    expect(quantityTitle("Z", resolveUnit("dimensionless"))).toBe("Z");
  });

  it("refuses unknown units and systems with the choices", () => {
    expect(() => resolveUnit("pressure", { pressure: "psi" })).toThrow(UnknownNameError);
    expect(() => resolveUnit("pressure", "metric" as any)).toThrow(/SI, field/);
  });
});
