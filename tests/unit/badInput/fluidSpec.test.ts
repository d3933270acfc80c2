/**
 * Bad-input issue items 3, 4 and 5: duplicate components, a non-object fluid spec, and a huge
 * component name. Each is refused with a typed error that names the input.
 */
import { describe, expect, it } from "vitest";
import { defineFluid, type FluidSpec } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import { InputError, UnknownNameError } from "../../../kernel-lib/src/errors.js";
import { runEvalRequest } from "../../../kernel-lib/src/cli/eval.js";

function thrown(f: () => unknown): Error {
  try {
    f();
  } catch (e) {
    return e as Error;
  }
  throw new Error("expected a throw");
}

describe("duplicate components are refused, naming both entries", () => {
  const cases: [string, (string | object)[]][] = [
    ["the same id twice", ["methane", "methane"]],
    ["id and formula", ["methane", "CH4"]],
    ["id and CAS number", ["methane", "74-82-8"]],
    ["id and synonym", ["methane", "C1"]],
    ["two spellings of one name", ["n-butane", "N Butane"]],
  ];
  for (const [label, components] of cases) {
    it(label, () => {
      const e = thrown(() => defineFluid({ components: components as FluidSpec["components"] }));
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).input).toBe("components[1]");
      const [a, b] = components.map((c) => (typeof c === "string" ? c : ""));
      expect(e.message).toContain(JSON.stringify(a));
      expect(e.message).toContain(JSON.stringify(b));
      expect(e.message).toMatch(/components\[0\]/);
    });
  }
  it("a record with the id of a table entry given by name", () => {
    const methane = getComponent("methane");
    const e = thrown(() => defineFluid({ components: ["methane", { ...methane }] }));
    expect(e).toBeInstanceOf(InputError);
    expect(e.message).toMatch(/components\[0\].*methane/);
  });
  it("isomers (same formula, different CAS) are not duplicates", () => {
    expect(defineFluid({ components: ["n-butane", "isobutane"] }).componentIds).toEqual([
      "n-butane",
      "isobutane",
    ]);
  });
  it("the entropy of 'methane, methane' is never R ln 2 above pure methane", () => {
    // the defect: s(x = [0.5, 0.5]) - s(pure) = R ln 2 = 5.763 J/(mol K)
    expect(() => defineFluid({ components: ["methane", "methane"] })).toThrow(/same component/);
  });
  it("isochor eval reports the duplicate with the JSON path of the second entry", () => {
    const e = thrown(() =>
      runEvalRequest({
        model: "peng-robinson",
        components: ["methane", "methane"],
        x: [0.5, 0.5],
        states: [{ T: 300, P: 1e5 }],
      }),
    ) as Error & { code: string; path: string };
    expect(e.code).toBe("bad-request");
    expect(e.path).toBe("$.components[1]");
  });
});

describe("a fluid spec that is not an object", () => {
  for (const spec of [null, undefined, 42, "methane", ["methane"], true]) {
    it(`defineFluid(${JSON.stringify(spec)})`, () => {
      const e = thrown(() => defineFluid(spec as unknown as FluidSpec));
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).input).toBe("spec");
      expect(e.message).toMatch(/defineFluid/);
    });
  }
  for (const bad of [null, 42, [], ["methane"]]) {
    it(`a component entry ${JSON.stringify(bad)}`, () => {
      const e = thrown(() =>
        defineFluid({ components: ["ethane", bad] as unknown as FluidSpec["components"] }),
      );
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).input).toBe("components[1]");
    });
  }
});

describe("a huge component name", () => {
  it("1 MB is refused quickly with the name cut short in the message", () => {
    const huge = "q".repeat(1 << 20);
    const e = thrown(() => getComponent(huge));
    expect(e).toBeInstanceOf(UnknownNameError);
    expect(e.message.length).toBeLessThan(400);
    expect(e.message).toMatch(/1048576 characters/);
  });
  it("through defineFluid and isochor eval the message stays short", () => {
    const huge = "methane".repeat(150_000);
    const e = thrown(() =>
      runEvalRequest({ model: "peng-robinson", components: [huge], states: [{ T: 300, P: 1e5 }] }),
    ) as Error & { path: string };
    expect(e.message.length).toBeLessThan(600);
    expect(e.path).toBe("$.components[0]");
  });
  it("a long but plausible misspelling still gets suggestions", () => {
    const e = thrown(() => getComponent("methanee")) as UnknownNameError;
    expect(e.suggestions).toContain("methane");
  });
});
