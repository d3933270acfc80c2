import { describe, expect, it } from "vitest";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import { idealGasFromCorrelation } from "../../../kernel-lib/src/idealgas/correlationPure.js";
import { InputError, OutOfRangeError } from "../../../kernel-lib/src/errors.js";
import { expectReference, referenceValues } from "../../fixtures/referenceValues.js";

const pure = (name: string) => idealGasFromCorrelation(getComponent(name));

// NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998), ideal gas at 1 bar, from memory of the
// tables: tests/fixtures/janaf.json, every value this route is checked against carrying the
// "correlation-route" tolerance (cp and S 0.15 %, H - H298 0.3 %, reasons there). Argon at 1000 K
// is the closed form of a monatomic gas; the NO cp at 1000 K is marked disputed there and skipped.
const ROUTE = "correlation-route";
const rows = [...referenceValues("janaf.json").values()].filter((r) => r.uses?.[ROUTE]);

describe("correlation route against NIST-JANAF (Chase 1998, from memory)", () => {
  const ids = [...new Set(rows.map((r) => r.key.slice(0, r.key.indexOf("/"))))];
  it("covers the 14 gases and 76 values of the fixture (one disputed)", () => {
    expect(ids).toHaveLength(14);
    expect(rows).toHaveLength(76);
    expect(rows.filter((r) => r.disputed).map((r) => r.key)).toEqual(["nitric-oxide/1000/Cp"]);
  });
  for (const id of ids) {
    it(`${id}: cp and S within 0.15 %, H - H298 within 0.3 %`, () => {
      const g = pure(id);
      for (const ref of rows.filter((r) => r.key.startsWith(`${id}/`) && !r.disputed)) {
        const [, t, q] = ref.key.split("/");
        const T = Number(t);
        if (q === "Cp") expectReference(g.cp(T), ref, ROUTE);
        else if (q === "S") expectReference(g.entropyStandard(T), ref, ROUTE);
        else expectReference(g.enthalpyFrom298(T) / 1000, ref, ROUTE);
      }
      expect(g.enthalpyFrom298(298.15)).toBe(0);
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
