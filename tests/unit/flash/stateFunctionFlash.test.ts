/**
 * State-function flashes (phase/flash/stateFunctionFlash.ts): round trips from the isothermal
 * flash (T, P) -> h, s, u, v -> back, inside and outside the two-phase region and with three
 * phases; a pure component through the saturation route against the pure-fluid (P, h) state of
 * phase/twoPhaseState.ts; the specification residual is reported and verified.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { overallProperty } from "../../../kernel-lib/src/phase/flash/stateFunctionFlash.js";
import { stateAtPressureEnthalpy } from "../../../kernel-lib/src/phase/twoPhaseState.js";
import { saturationAtPressure } from "../../../kernel-lib/src/phase/saturation.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { expectVerified } from "./helpers.js";

const c1c4 = defineFluid({ components: ["methane", "n-butane"] });

describe("round trips through the (P, h), (P, s), (T, s) and (u, v) flashes", () => {
  const cases: [string, number, number, number[]][] = [
    ["two-phase", 280, 40e5, [0.7, 0.3]],
    ["two-phase, mostly liquid", 240, 20e5, [0.3, 0.7]],
    ["one phase, gas", 350, 40e5, [0.7, 0.3]],
    ["one phase, liquid", 250, 60e5, [0.2, 0.8]],
  ];
  for (const [label, T, P, z] of cases) {
    it(`${label}: T = ${T} K, P = ${P} Pa`, () => {
      const eq = c1c4.flashTP(T, P, z);
      const h = overallProperty(eq, "h");
      const s = overallProperty(eq, "s");
      const u = overallProperty(eq, "u");
      const v = overallProperty(eq, "v");
      const ph = c1c4.flashPH(P, h, z, { initialGuessK: T + 37 });
      expect(Math.abs(ph.temperatureK - T)).toBeLessThan(1e-6);
      expect(ph.phases.length).toBe(eq.phases.length);
      expect(ph.specification[0].relativeError).toBeLessThanOrEqual(1e-9);
      expectVerified(c1c4, ph, { stability: false });
      const ps = c1c4.flashPS(P, s, z, { initialGuessK: T - 23 });
      expect(Math.abs(ps.temperatureK - T)).toBeLessThan(1e-6);
      const ts = c1c4.flashTS(T, s, z);
      expect(Math.abs(ts.pressurePa / P - 1)).toBeLessThan(1e-8);
      const uv = c1c4.flashUV(u, 1 / v, z);
      expect(Math.abs(uv.temperatureK - T)).toBeLessThan(1e-6);
      expect(Math.abs(uv.pressurePa / P - 1)).toBeLessThan(1e-8);
      expect(uv.specification.map((r) => r.property)).toEqual(["u", "v"]);
    });
  }
  it("three phases: water/propane/methane through (P, h)", () => {
    const fluid = defineFluid({ components: ["water", "propane", "methane"] });
    const z = [0.5, 0.3, 0.2];
    const eq = fluid.flashTP(300, 20e5, z);
    expect(eq.phases).toHaveLength(3);
    const ph = fluid.flashPH(20e5, overallProperty(eq, "h"), z, { initialGuessK: 330 });
    expect(Math.abs(ph.temperatureK - 300)).toBeLessThan(1e-6);
    expect(ph.phases).toHaveLength(3);
    expectVerified(fluid, ph);
  });
  it("a valve: a rich gas let down from 80 bar into the two-phase region is reported as two phases", () => {
    const gas = defineFluid({ components: ["methane", "ethane", "propane", "n-butane"] });
    const z = [0.8, 0.1, 0.06, 0.04];
    const inlet = gas.flashTP(300, 80e5, z);
    expect(inlet.phases).toHaveLength(1);
    const outlet = gas.flashPH(20e5, overallProperty(inlet, "h"), z);
    expect(outlet.temperatureK).toBeLessThan(300); // Joule-Thomson cooling
    expect(outlet.specification[0].relativeError).toBeLessThanOrEqual(1e-9);
    expectVerified(gas, outlet, { stability: false });
  });
});

describe("one present component: the saturation route", () => {
  const methane = defineFluid({ components: ["methane"] });
  it("z = [1, 0] at (P, h) inside the dome equals the pure fluid's saturated state", () => {
    const P = 20e5;
    const sat = saturationAtPressure(methane.model, P);
    const hL = methane.stateAtTRho(sat.temperatureK, sat.liquidDensityMolPerM3).molar.h;
    const hV = methane.stateAtTRho(sat.temperatureK, sat.vaporDensityMolPerM3).molar.h;
    const h = 0.3 * hL + 0.7 * hV;
    const pure = stateAtPressureEnthalpy(methane, P, h);
    expect(pure.kind).toBe("two-phase");
    if (pure.kind !== "two-phase") return;
    const eq = c1c4.flashPH(P, h, [1, 0]);
    expect(eq.phases).toHaveLength(2);
    expect(eq.temperatureK).toBeCloseTo(pure.temperatureK, 9);
    expect(eq.phases[0].kind).toBe("vapor");
    expect(eq.phases[0].amount).toBeCloseTo(pure.quality, 9);
    expect(eq.check.maxLnFugacityDifference).toBeLessThan(1e-10);
    // and the single-component fluid through the same function
    const own = methane.flashPH(P, h);
    expect(own.temperatureK).toBeCloseTo(pure.temperatureK, 9);
    expect(own.phases[0].amount).toBeCloseTo(pure.quality, 9);
  });
  it("z = [0, 1] outside the dome: a single phase on the right side", () => {
    const eq = c1c4.flashTP(250, 5e5, [0, 1]);
    const h = overallProperty(eq, "h");
    const back = c1c4.flashPH(5e5, h, [0, 1]);
    expect(back.phases).toHaveLength(1);
    expect(Math.abs(back.temperatureK - 250)).toBeLessThan(1e-6);
  });
});

describe("bad input", () => {
  it("names the input", () => {
    expect(() => c1c4.flashPH(NaN, 0, [0.5, 0.5])).toThrow(InputError);
    expect(() => c1c4.flashPH(1e5, NaN, [0.5, 0.5])).toThrow(InputError);
    expect(() => c1c4.flashUV(0, -1, [0.5, 0.5])).toThrow(InputError);
    expect(() => c1c4.flashTS(300, 0, [0.5, 0.5], { specTolerance: -1 })).toThrow(InputError);
  });
});
