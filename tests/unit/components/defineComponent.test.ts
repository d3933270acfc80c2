import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  defineComponent,
  type ComponentSpec,
} from "../../../kernel-lib/src/components/defineComponent.js";
import { parseFormula } from "../../../kernel-lib/src/components/formula.js";
import { R } from "../../../kernel-lib/src/constants.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

const base: ComponentSpec = {
  id: "corvid-fuel-gas-x",
  molarMassKgPerMol: 0.02,
  criticalTemperatureK: 250,
  criticalPressurePa: 4.5e6,
  criticalVolumeM3PerMol: 1e-4,
  acentricFactor: 0.05,
  normalBoilingPointK: 150,
  idealGasCp: {
    form: "aly-lee",
    aJPerMolK: 33,
    bJPerMolK: 80,
    cK: 2000,
    dJPerMolK: 40,
    eK: 1000,
    minTemperatureK: 100,
    maxTemperatureK: 1500,
  },
};

describe("defineComponent", () => {
  it("builds a frozen component with Zc = Pc Vc / (R Tc) and user-supplied sources", () => {
    const c = defineComponent(base);
    expect(c.criticalCompressibility).toBeCloseTo((4.5e6 * 1e-4) / (R * 250), 14);
    expect(c.sources.critical).toBe("user-supplied");
    expect(c.origin).toBe("user");
    expect(Number.isNaN(c.enthalpyOfFormationJPerMol)).toBe(true);
    expect(Object.isFrozen(c)).toBe(true);
    expect(Object.isFrozen(c.idealGasCp)).toBe(true);
  });

  it("refuses non-positive, NaN or infinite constants, naming the field, unit and value", () => {
    const fields: [keyof ComponentSpec, string][] = [
      ["molarMassKgPerMol", "kg/mol"],
      ["criticalTemperatureK", "K"],
      ["criticalPressurePa", "Pa"],
      ["criticalVolumeM3PerMol", "m3/mol"],
      ["normalBoilingPointK", "K"],
    ];
    for (const [field, unit] of fields) {
      for (const bad of [0, -1, Infinity]) {
        try {
          defineComponent({ ...base, [field]: bad });
          expect.unreachable(`${field} = ${bad}`);
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
          expect((e as InputError).input).toContain(field);
          expect((e as InputError).unit).toBe(unit);
          expect((e as InputError).received).toBe(bad);
        }
      }
    }
    for (const field of [
      "molarMassKgPerMol",
      "criticalTemperatureK",
      "criticalPressurePa",
    ] as const) {
      expect(() => defineComponent({ ...base, [field]: NaN })).toThrow(InputError);
    }
    expect(() => defineComponent({ ...base, acentricFactor: NaN })).toThrow(InputError);
    expect(() => defineComponent({ ...base, acentricFactor: 5 })).toThrow(InputError);
    expect(() => defineComponent({ ...base, normalBoilingPointK: 300 })).toThrow(
      /below the critical temperature/,
    );
    expect(() => defineComponent({ ...base, id: " " })).toThrow(InputError);
    expect(() => defineComponent({ ...base, synonyms: "x" as never })).toThrow(/synonyms/);
    expect(() => defineComponent({ ...base, formula: 12 as never })).toThrow(/formula/);
    expect(() => defineComponent(null as never)).toThrow(InputError);
    expect(() => defineComponent({ ...base, enthalpyOfFormationJPerMol: Infinity })).toThrow(
      InputError,
    );
  });

  it("refuses malformed cp correlations", () => {
    const poly = (
      segments: { minTemperatureK: number; maxTemperatureK: number; coefficients: number[] }[],
      lo = 200,
      hi = 1000,
    ) =>
      ({
        ...base,
        idealGasCp: { form: "polynomial", minTemperatureK: lo, maxTemperatureK: hi, segments },
      }) as ComponentSpec;
    expect(() => defineComponent(poly([]))).toThrow(InputError);
    expect(() =>
      defineComponent(poly([{ minTemperatureK: 200, maxTemperatureK: 1000, coefficients: [NaN] }])),
    ).toThrow(InputError);
    expect(() =>
      defineComponent(
        poly([
          { minTemperatureK: 200, maxTemperatureK: 500, coefficients: [4] },
          { minTemperatureK: 600, maxTemperatureK: 1000, coefficients: [4] },
        ]),
      ),
    ).toThrow(/contiguous/);
    expect(() =>
      defineComponent(poly([{ minTemperatureK: 200, maxTemperatureK: 1000, coefficients: [-1] }])),
    ).toThrow(/positive cp/);
    expect(() =>
      defineComponent(
        poly([{ minTemperatureK: 200, maxTemperatureK: 1000, coefficients: [4] }], 200, 900),
      ),
    ).toThrow(InputError);
    expect(() =>
      defineComponent({
        ...base,
        idealGasCp: { ...base.idealGasCp, minTemperatureK: NaN } as never,
      }),
    ).toThrow(InputError);
    expect(() => defineComponent({ ...base, idealGasCp: { form: "shomate" } as never })).toThrow(
      InputError,
    );
  });

  it("accepts any valid constants (fast-check)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        fc.double({ min: 5, max: 1500, noNaN: true }),
        fc.double({ min: 1e5, max: 1e8, noNaN: true }),
        fc.double({ min: -0.5, max: 2, noNaN: true }),
        (m, tc, pc, w) => {
          const c = defineComponent({
            ...base,
            molarMassKgPerMol: m,
            criticalTemperatureK: tc,
            criticalPressurePa: pc,
            acentricFactor: w,
            normalBoilingPointK: undefined,
          });
          expect(c.criticalTemperatureK).toBe(tc);
        },
      ),
      { numRuns: 100 },
    );
  });
});

describe("parseFormula", () => {
  it("counts atoms and refuses malformed formulas", () => {
    expect(parseFormula("C2H6O")).toEqual({ C: 2, H: 6, O: 1 });
    expect(parseFormula("ClH")).toEqual({ Cl: 1, H: 1 });
    expect(() => parseFormula("")).toThrow(InputError);
    expect(() => parseFormula("c2h6")).toThrow(InputError);
    expect(() => parseFormula("C2(H6)")).toThrow(InputError);
  });
});
