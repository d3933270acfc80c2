import { describe, expect, it } from "vitest";
import { getComponent, listComponents } from "../../../kernel-lib/src/components/getComponent.js";
import { AmbiguousNameError } from "../../../kernel-lib/src/components/ambiguousNameError.js";
import { defineComponent } from "../../../kernel-lib/src/components/defineComponent.js";
import { UnknownNameError } from "../../../kernel-lib/src/errors.js";
import { editDistance } from "../../../kernel-lib/src/numerics/editDistance.js";

describe("getComponent", () => {
  it("finds by id, name, formula, CAS number and synonym, ignoring case, spaces and hyphens", () => {
    expect(getComponent("n-butane").id).toBe("n-butane");
    expect(getComponent("N Butane").id).toBe("n-butane");
    expect(getComponent("nC4").id).toBe("n-butane");
    expect(getComponent("CH4").id).toBe("methane");
    expect(getComponent("ch4").id).toBe("methane");
    expect(getComponent("74-82-8").id).toBe("methane"); // CAS of methane, common knowledge
    expect(getComponent("7783-06-4").id).toBe("hydrogen-sulfide");
    expect(getComponent("H2S").id).toBe("hydrogen-sulfide");
    expect(getComponent("Hydrogen Sulfide").id).toBe("hydrogen-sulfide");
    expect(getComponent("isobutylene").id).toBe("isobutene");
    expect(getComponent("steam").id).toBe("water");
    expect(getComponent("SO2").id).toBe("sulfur-dioxide");
    expect(getComponent("2,2-Dimethylbutane").id).toBe("2,2-dimethylbutane");
  });

  it("refuses an unknown name with the closest matches", () => {
    let error: unknown;
    try {
      getComponent("metane");
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(UnknownNameError);
    const u = error as UnknownNameError;
    expect(u.code).toBe("unknown-name");
    expect(u.suggestions[0]).toBe("methane");
    expect(u.message).toContain("methane");
    expect(() => getComponent("")).toThrow(UnknownNameError);
    expect(() => getComponent(undefined as unknown as string)).toThrow(UnknownNameError);
  });

  it("refuses a formula shared by isomers with the choices", () => {
    try {
      getComponent("C4H10");
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(AmbiguousNameError);
      expect(e).toBeInstanceOf(UnknownNameError);
      expect([...(e as AmbiguousNameError).choices].sort()).toEqual(["isobutane", "n-butane"]);
    }
    try {
      getComponent("c8h10");
      expect.unreachable();
    } catch (e) {
      expect([...(e as AmbiguousNameError).choices].sort()).toEqual([
        "ethylbenzene",
        "m-xylene",
        "o-xylene",
        "p-xylene",
      ]);
    }
  });

  it("finds user components passed in `include`, and they win over table ids", () => {
    const mine = defineComponent({
      id: "corvid-light-ends",
      synonyms: ["CLE"],
      molarMassKgPerMol: 0.05,
      criticalTemperatureK: 400,
      criticalPressurePa: 4e6,
      acentricFactor: 0.15,
      idealGasCp: {
        form: "polynomial",
        minTemperatureK: 200,
        maxTemperatureK: 1000,
        segments: [{ minTemperatureK: 200, maxTemperatureK: 1000, coefficients: [10] }],
      },
    });
    expect(getComponent("cle", { include: [mine] })).toBe(mine);
    expect(() => getComponent("cle")).toThrow(UnknownNameError);
    expect(listComponents({ include: [mine] }).length).toBe(listComponents().length + 1);
  });

  it("has unique ids and no key shared by two components except isomer formulas", () => {
    const ids = listComponents().map((c) => c.id);
    expect(new Set(ids).size).toBe(ids.length);
    const cas = listComponents().map((c) => c.casNumber);
    expect(new Set(cas).size).toBe(cas.length);
  });
});

describe("editDistance", () => {
  it("counts insertions, deletions, substitutions and adjacent transpositions", () => {
    expect(editDistance("", "")).toBe(0);
    expect(editDistance("abc", "")).toBe(3);
    expect(editDistance("kitten", "sitting")).toBe(3); // classic Levenshtein example
    expect(editDistance("ethnae", "ethane")).toBe(1);
    expect(editDistance("methane", "methane")).toBe(0);
  });
});
