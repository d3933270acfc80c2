import { afterEach, describe, expect, it } from "vitest";
import fc from "fast-check";
import { convertUnit, fromSI, toSI } from "../../../kernel-lib/src/units/convert.js";
import {
  getDefaultAtmosphericPressure,
  resetDefaultAtmosphericPressure,
  setDefaultAtmosphericPressure,
} from "../../../kernel-lib/src/units/atmosphericPressure.js";
import { UNIT_TABLE } from "../../../kernel-lib/src/units/unitTable.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { expectReference, referenceValue } from "../../fixtures/referenceValues.js";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

afterEach(() => resetDefaultAtmosphericPressure());

describe("conversion factors against NIST SP 811 (2008), Appendix B.8", () => {
  // The factors as printed in NIST SP 811 (2008) App. B.8 (from memory of that table):
  // tests/fixtures/nist-sp811-2008.json, exact ones (printed in bold) with tolerance 0, the others
  // half a unit in the last printed digit.
  const sp811 = (key: string) => referenceValue("nist-sp811-2008.json", key);
  const direct: [string, string][] = [
    // [unit of the library, key of the factor]
    ["atm", "atm"],
    ["bar", "bar"],
    ["psia", "psi"],
    ["torr", "torr"],
    ["mmHg", "mmHg"],
    ["ft/s", "ft/s"],
    ["Btu/h", "Btu_IT/h"],
  ];
  for (const [unit, key] of direct) {
    it(`1 ${unit} = ${sp811(key).printed} ${sp811(key).unit}`, () => {
      expectReference(toSI(1, unit), sp811(key));
    });
  }
  // closed forms from the definitions: the exact pound and foot, prefixes, the psi factor
  const pound = sp811("lb").value;
  const ft3Exact = 0.3048 ** 3; // the foot is exact (0.3048 m), so the cubic foot is exact too
  const cases: [string, number, string, number, number][] = [
    // [unit, value, SI unit, expected SI value, relative tolerance]
    ["km/h", 3.6, "m/s", 1, 1e-15], // 1 km/h = 1000 m / 3600 s
    ["lbmol", 1, "mol", 1000 * pound, 1e-15], // 1000 x the pound (exact)
    ["ft3/lbmol", 1, "m3/mol", ft3Exact / (1000 * pound), 1e-15],
    ["kJ/mol", 1, "J/mol", 1000, 0],
    ["cm3/mol", 1, "m3/mol", 1e-6, 0],
    ["K/bar", 1, "K/Pa", 1e-5, 0],
    ["degF/psi", 1, "K/Pa", 5 / 9 / sp811("psi").value, sp811("psi").tolerance.relative!],
  ];
  for (const [unit, value, si, expected, tol] of cases) {
    it(`${value} ${unit} = ${expected} ${si}`, () => {
      const got = toSI(value, unit);
      if (tol === 0) expect(got).toBe(expected);
      else expect(rel(got, expected)).toBeLessThanOrEqual(tol);
    });
  }
  it("the cubic foot of the table is the exact one rounded", () => {
    expectReference(ft3Exact, sp811("ft3"));
  });

  it("mass-based units use the exact pound and Btu_IT (NIST SP 811 B.8)", () => {
    const M = 1; // kg/mol, so per-kg and per-mol values coincide numerically
    expectReference(toSI(1, "Btu/lb", { molarMassKgPerMol: M }), sp811("Btu_IT/lb"));
    expectReference(toSI(1, "Btu/(lb degF)", { molarMassKgPerMol: M }), sp811("Btu_IT/(lb degF)"));
    expectReference(toSI(1, "lb/ft3", { molarMassKgPerMol: M }), sp811("lb/ft3"));
    expectReference(toSI(1, "lb", { molarMassKgPerMol: M }), sp811("lb"));
    // per lbmol: the per-lb factors divided by 1000 (closed form)
    expect(rel(toSI(1, "Btu/(lbmol degR)"), sp811("Btu_IT/(lb degF)").value / 1000)).toBeLessThan(
      1e-15,
    );
    expect(rel(toSI(1, "Btu/lbmol"), sp811("Btu_IT/lb").value / 1000)).toBeLessThan(1e-15);
  });

  it("mass-based units convert through the molar mass (closed form: x J/kg * M kg/mol)", () => {
    // CO2, M = 44.0095 g/mol (from memory of CIAAW standard atomic weights).
    const M = 0.0440095;
    expect(toSI(100, "kJ/kg", { molarMassKgPerMol: M })).toBeCloseTo(100e3 * M, 9);
    expect(toSI(2, "kJ/(kg K)", { molarMassKgPerMol: M })).toBeCloseTo(2e3 * M, 9);
    expect(toSI(800, "kg/m3", { molarMassKgPerMol: M })).toBeCloseTo(800 / M, 9);
    expect(toSI(1, "m3/kg", { molarMassKgPerMol: M })).toBeCloseTo(M, 15);
    expect(toSI(1, "kg", { molarMassKgPerMol: M })).toBeCloseTo(1 / M, 9);
    expect(fromSI(4400.95, "kJ/kg", { molarMassKgPerMol: M })).toBeCloseTo(100, 12);
  });
});

describe("temperatures: absolute values versus differences", () => {
  it("converts the fixed points of the scales (NIST SP 811 B.8 definitions)", () => {
    // T/K = t/°C + 273.15; T/K = (t/°F + 459.67) / 1.8; T/K = (T/°R) / 1.8.
    expect(toSI(25, "degC")).toBeCloseTo(298.15, 12);
    expect(toSI(25, "°C")).toBeCloseTo(298.15, 12);
    expect(toSI(-40, "degF")).toBeCloseTo(233.15, 12); // -40 °F = -40 °C
    expect(toSI(32, "degF")).toBeCloseTo(273.15, 12);
    expect(toSI(212, "°F")).toBeCloseTo(373.15, 12);
    expect(toSI(491.67, "degR")).toBeCloseTo(273.15, 12);
    expect(toSI(0, "K")).toBe(0);
    expect(fromSI(298.15, "degC")).toBeCloseTo(25, 12);
    expect(fromSI(233.15, "degF")).toBeCloseTo(-40, 12);
  });

  it("a difference of 1 degC is 1 K and of 1 degF is 5/9 K (definitions)", () => {
    expect(toSI(1, "degC", { difference: true })).toBe(1);
    expect(toSI(1, "degF", { difference: true })).toBeCloseTo(5 / 9, 15);
    expect(toSI(9, "degR", { difference: true })).toBeCloseTo(5, 14);
    expect(fromSI(5, "degF", { difference: true })).toBeCloseTo(9, 14);
    expect(toSI(-30, "degC", { difference: true })).toBe(-30);
  });

  it("refuses temperatures below absolute zero, naming the limit in the unit", () => {
    expect(() => toSI(-300, "degC")).toThrow(InputError);
    expect(() => toSI(-300, "degC")).toThrow(/absolute zero \(0 K = -273.15 degC\)/);
    expect(() => toSI(-500, "degF")).toThrow(/-459.67 degF/);
    expect(() => toSI(-1, "K")).toThrow(InputError);
    expect(() => toSI(-1, "degR")).toThrow(InputError);
    expect(() => fromSI(-1, "degC")).toThrow(InputError);
  });
});

describe("gauge pressures", () => {
  it("add the standard atmosphere by default (101325 Pa, exact)", () => {
    expect(toSI(10, "barg")).toBe(1_101_325);
    expect(toSI(0, "psig")).toBe(101_325);
    expect(toSI(100, "kPa(g)")).toBe(201_325);
    expect(toSI(100, "kPag")).toBe(201_325);
    expect(toSI(1, "MPa(g)")).toBe(1_101_325);
    expect(toSI(2, "bar(g)")).toBe(301_325);
    expect(fromSI(1_101_325, "barg")).toBeCloseTo(10, 12);
    // 100 psig = 100 x 6894.757 Pa + 101325 Pa (NIST SP 811 B.8 psi factor, in the fixture).
    const psi = referenceValue("nist-sp811-2008.json", "psi");
    expect(rel(toSI(100, "psig"), 100 * psi.value + 101325)).toBeLessThan(psi.tolerance.relative!);
  });

  it("use a per-call atmospheric pressure, then the notebook default", () => {
    expect(toSI(10, "barg", { atmosphericPressurePa: 95_000 })).toBe(1_095_000);
    const previous = setDefaultAtmosphericPressure(90_000);
    expect(previous).toBe(101_325);
    expect(getDefaultAtmosphericPressure()).toBe(90_000);
    expect(toSI(10, "barg")).toBe(1_090_000);
    expect(toSI(10, "barg", { atmosphericPressurePa: 95_000 })).toBe(1_095_000); // explicit wins
    expect(toSI(10, "bar")).toBe(1_000_000); // absolute units ignore it
    resetDefaultAtmosphericPressure();
    expect(toSI(10, "barg")).toBe(1_101_325);
  });

  it("treat a gauge difference as a plain pressure difference", () => {
    expect(toSI(2, "barg", { difference: true })).toBe(200_000);
    expect(toSI(-3, "bar", { difference: true })).toBe(-300_000);
  });

  it("refuse gauge pressures below vacuum and negative absolute pressures", () => {
    expect(() => toSI(-2, "barg")).toThrow(/cannot be below vacuum/);
    expect(() => toSI(-15, "psig")).toThrow(InputError);
    expect(toSI(-14, "psig")).toBeGreaterThan(0); // -14 psig is above vacuum (14.696 psi atm)
    expect(() => toSI(-1, "kPa")).toThrow(InputError);
    expect(() => toSI(-1, "psia")).toThrow(InputError);
    // Equation-of-state output may be negative (liquid under tension): fromSI converts it.
    expect(fromSI(-1e5, "bar")).toBe(-1);
  });

  it("refuse an implausible atmospheric pressure", () => {
    expect(() => toSI(1, "barg", { atmosphericPressurePa: 1.01325 })).toThrow(InputError);
    expect(() => setDefaultAtmosphericPressure(NaN)).toThrow(InputError);
    expect(getDefaultAtmosphericPressure()).toBe(101_325);
  });
});

describe("conversion round trips and bad input", () => {
  it("fromSI inverts toSI for every unit (property)", () => {
    for (const def of UNIT_TABLE) {
      fc.assert(
        fc.property(fc.double({ min: 0, max: 1e4, noNaN: true }), (value) => {
          const options = { molarMassKgPerMol: 0.05 };
          const si = toSI(value, def.symbol, options);
          const back = fromSI(si, def.symbol, options);
          expect(Math.abs(back - value)).toBeLessThanOrEqual(
            1e-12 * Math.max(1, Math.abs(value)) * 1e3,
          );
        }),
        { numRuns: 30 },
      );
    }
  });

  it("convertUnit goes through SI (closed forms)", () => {
    expect(convertUnit(100, "degC", "degF")).toBeCloseTo(212, 12);
    expect(convertUnit(1, "atm", "kPa")).toBeCloseTo(101.325, 12);
    expect(convertUnit(0, "barg", "psia")).toBeCloseTo(101325 / 6894.757293168361, 12);
    expect(() => convertUnit(1, "K", "Pa")).toThrow(InputError);
  });

  it("refuses NaN and infinite values", () => {
    expect(() => toSI(NaN, "K")).toThrow(InputError);
    expect(() => toSI(Infinity, "bar")).toThrow(InputError);
    expect(() => fromSI(-Infinity, "bar")).toThrow(InputError);
    expect(() => toSI(NaN, "K", { input: "feed temperature" })).toThrow(/feed temperature/);
  });

  it("requires a molar mass for mass-based units and catches g/mol given as kg/mol", () => {
    expect(() => toSI(100, "kJ/kg")).toThrow(/molarMassKgPerMol/);
    expect(() => toSI(800, "kg/m3")).toThrow(InputError);
    expect(() => toSI(100, "kJ/kg", { molarMassKgPerMol: 44.01 })).toThrow(/0.04401 kg\/mol/);
    expect(() => toSI(100, "kJ/kg", { molarMassKgPerMol: -1 })).toThrow(InputError);
  });

  it("refuses a unit of the wrong dimension when a dimension is expected", () => {
    expect(() => toSI(300, "K", { dimension: "pressure" })).toThrow(/a pressure unit/);
    expect(toSI(300, "K", { dimension: "temperature" })).toBe(300);
  });
});
