import { describe, expect, it } from "vitest";
import { formatQuantity, parseQuantity } from "../../../kernel-lib/src/units/quantity.js";
import { closestUnits, listUnits, lookupUnit } from "../../../kernel-lib/src/units/lookupUnit.js";
import { DIMENSIONS, SI_UNITS, isDimension } from "../../../kernel-lib/src/units/dimension.js";
import {
  AmbiguousUnitError,
  InputError,
  UnknownNameError,
} from "../../../kernel-lib/src/errors.js";

describe("lookupUnit", () => {
  it("reads the ways engineers write the same unit", () => {
    for (const u of ["J/(mol K)", "J/(mol·K)", "J/mol/K", "J/(mol*K)", "J / (mol K)"]) {
      expect(lookupUnit(u).symbol).toBe("J/(mol K)");
    }
    for (const u of ["°C", "degC", "deg C", "℃", "celsius"])
      expect(lookupUnit(u).symbol).toBe("degC");
    for (const u of ["kPa(g)", "kPag", "kPa g", "kPa (g)", "kPa(gauge)"]) {
      expect(lookupUnit(u).symbol).toBe("kPa(g)");
    }
    for (const u of ["barg", "bar(g)", "bar g"]) expect(lookupUnit(u).symbol).toBe("barg");
    for (const u of ["bar", "bara", "bar(a)"]) expect(lookupUnit(u).symbol).toBe("bar");
    for (const u of ["psia", "psi(a)"]) expect(lookupUnit(u).symbol).toBe("psia");
    expect(lookupUnit("m³/mol").symbol).toBe("m3/mol");
    expect(lookupUnit("Btu/(lb °F)").symbol).toBe("Btu/(lb degR)");
  });

  it("is case-sensitive (MPa is not mPa) and suggests the intended unit", () => {
    try {
      lookupUnit("mpa");
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(UnknownNameError);
      expect((err as UnknownNameError).suggestions).toContain("MPa");
    }
    expect(() => lookupUnit("KPA")).toThrow(/closest: .*kPa/);
  });

  it("refuses a bare psi and a bare g as ambiguous, naming the choices", () => {
    try {
      lookupUnit("psi");
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(AmbiguousUnitError);
      expect((err as AmbiguousUnitError).choices).toEqual(["psia", "psig"]);
    }
    expect(() => lookupUnit("g")).toThrow(AmbiguousUnitError);
    expect(() => lookupUnit("g")).toThrow(/barg, psig or kPa\(g\)/);
    expect(() => lookupUnit("deg")).toThrow(/degC, degF, degR/);
    expect(() => lookupUnit("C")).toThrow(AmbiguousUnitError);
  });

  it("refuses unknown units with the closest matches", () => {
    expect(() => lookupUnit("barr")).toThrow(UnknownNameError);
    expect(closestUnits("barr")).toContain("bar");
    expect(closestUnits("kj/kg")).toContain("kJ/kg");
    expect(() => lookupUnit("")).toThrow(InputError);
    expect(() => lookupUnit(undefined as unknown as string)).toThrow(InputError);
  });

  it("lists units by dimension, each dimension with its SI unit among them", () => {
    for (const d of DIMENSIONS) {
      expect(isDimension(d)).toBe(true);
      const units = listUnits(d);
      expect(units.length).toBeGreaterThan(0);
      const si = lookupUnit(SI_UNITS[d]);
      expect(si.dimension).toBe(d);
      expect(si.factor).toBe(1);
    }
    expect(isDimension("colour")).toBe(false);
  });
});

describe("parseQuantity", () => {
  it("reads number and unit to SI", () => {
    expect(parseQuantity("25 barg")).toEqual({
      value: 2_601_325,
      unit: "Pa",
      dimension: "pressure",
      givenValue: 25,
      givenUnit: "barg",
    });
    expect(parseQuantity("150 degC").value).toBeCloseTo(423.15, 12);
    expect(parseQuantity("-40 °F").value).toBeCloseTo(233.15, 12);
    expect(parseQuantity("−40 degF").value).toBeCloseTo(233.15, 12); // Unicode minus
    expect(parseQuantity("1.5e3kPa").value).toBe(1.5e6);
    expect(parseQuantity(".5 MPa").value).toBe(5e5);
    expect(parseQuantity("2.1 kJ/(kg K)", { molarMassKgPerMol: 0.016043 }).dimension).toBe(
      "molar-entropy",
    );
  });

  it("refuses text that is not a number followed by a unit", () => {
    expect(() => parseQuantity("barg 25")).toThrow(InputError);
    expect(() => parseQuantity("25")).toThrow(InputError);
    expect(() => parseQuantity("1,5 bar")).toThrow(InputError);
    expect(() => parseQuantity("NaN K")).toThrow(InputError);
    expect(() => parseQuantity("25 psi")).toThrow(AmbiguousUnitError);
    expect(() => parseQuantity("-300 degC")).toThrow(/absolute zero/);
    expect(() => parseQuantity("25 degC", { dimension: "pressure" })).toThrow(InputError);
  });
});

describe("formatQuantity", () => {
  it("writes SI values in the requested unit", () => {
    // 1 atm = 101325 Pa exactly; 1 psi = 6894.757 Pa (from memory of NIST SP 811, 2008, App. B.8),
    // so 1 atm = 14.6959 psia; 77 degF = 298.15 K by the exact Fahrenheit definition.
    expect(formatQuantity(2_601_325, "barg")).toBe("25 barg");
    expect(formatQuantity(298.15, "degF", { significantDigits: 4 })).toBe("77 degF");
    expect(formatQuantity(273.15, "degC")).toBe("0 degC");
    expect(formatQuantity(1234.5678, "J/mol", { significantDigits: 3 })).toBe("1230 J/mol");
    expect(formatQuantity(101_325, "psia", { significantDigits: 6 })).toBe("14.6959 psia");
  });

  it("refuses bad options", () => {
    expect(() => formatQuantity(1, "K", { significantDigits: 0 })).toThrow(InputError);
    expect(() => formatQuantity(1, "K", { significantDigits: 2.5 })).toThrow(InputError);
    expect(() => formatQuantity(NaN, "K")).toThrow(InputError);
  });
});
