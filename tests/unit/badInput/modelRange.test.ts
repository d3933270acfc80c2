/**
 * Bad-input issue items 6 and 7: every model states where it is meaningful, warns outside it and
 * refuses beyond physical sense (limits and their basis: kernel-lib/src/state/physicalLimits.ts);
 * extreme temperatures are refused naming the temperature, not internal coefficients.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { OutOfRangeError, InputError } from "../../../kernel-lib/src/errors.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { referenceStateTP } from "../../../kernel-lib/src/state/referenceStates.js";

const models = [
  "peng-robinson",
  "soave-redlich-kwong",
  "redlich-kwong",
  "van-der-waals",
  "virial",
  "lee-kesler",
  "ideal-gas",
] as const;

function thrown(f: () => unknown): Error {
  try {
    f();
  } catch (e) {
    return e as Error;
  }
  throw new Error("expected a throw");
}

describe("beyond physical sense: refused for every model", () => {
  for (const model of models) {
    const fluid = defineFluid({ components: ["methane"], model });
    it(`${model}: P = 1e15 Pa`, () => {
      const e = thrown(() => fluid.stateAtTP(300, 1e15));
      expect(e).toBeInstanceOf(OutOfRangeError);
      expect((e as OutOfRangeError).input).toBe("pressurePa");
      expect(e.message).toMatch(/1e\+?10|10 GPa/);
    });
    for (const T of [1e6, 1e308, 5e-324, 0.5]) {
      it(`${model}: T = ${T} K names the temperature`, () => {
        const e = thrown(() => fluid.stateAtTP(T, 1e5));
        expect(e).toBeInstanceOf(InputError);
        expect((e as InputError).input).toBe("temperatureK");
        expect(e.message).not.toMatch(/\bc1\b|\bc2\b/);
      });
    }
  }
  it("reference water at 1e15 Pa", () => {
    const e = thrown(() => referenceStateTP(referenceFluid("water"), 300, 1e15));
    expect(e).toBeInstanceOf(OutOfRangeError);
    expect(e.message).toMatch(/pressure/i);
  });
  it("a (T, rho) state whose pressure is beyond physical sense", () => {
    const pr = defineFluid({ components: ["methane"] });
    const bMax = pr.model.maxDensity(300, [1]);
    const e = thrown(() => pr.stateAtTRho(300, bMax * (1 - 1e-12)));
    expect(e).toBeInstanceOf(OutOfRangeError);
    expect((e as OutOfRangeError).input).toBe("densityMolPerM3");
  });
});

describe("outside the stated range of a cubic: a warning", () => {
  const pr = defineFluid({ components: ["methane"] });
  it("P = 1 GPa (above the cubics' 100 MPa)", () => {
    const s = pr.stateAtTP(300, 1e9);
    expect(s.warnings.some((w) => w.code === "outside-validity" && /100 MPa/.test(w.message))).toBe(
      true,
    );
  });
  it("T below 0.3 Tc of a component present", () => {
    const s = defineFluid({ components: ["n-decane"] }).stateAtTP(182, 1e6);
    expect(s.warnings.some((w) => w.code === "outside-validity" && /0\.3 Tc/.test(w.message))).toBe(
      true,
    );
  });
  it("Lee-Kesler above Pr = 10 (its fitted range)", () => {
    // 100 MPa is more than 20 times the critical pressure of methane in the component table
    const lk = defineFluid({ components: ["methane"], model: "lee-kesler" });
    expect(1e8 / lk.components[0].criticalPressurePa).toBeGreaterThan(20);
    const s = lk.stateAtTP(300, 1e8);
    expect(s.warnings.some((w) => w.code === "outside-validity" && /Pr = /.test(w.message))).toBe(
      true,
    );
    expect(lk.stateAtTP(300, 5e6).warnings).toEqual([]);
  });
  it("an ordinary state has no range warning", () => {
    expect(pr.stateAtTP(300, 5e6).warnings).toEqual([]);
  });
});
