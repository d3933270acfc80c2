/**
 * The one state API (fluid/phaseState.ts, `fluid.state`): requests refused with a named
 * InputError, pure-fluid quality states equal to the saturation functions (and to IAPWS-95's
 * saturation table), mixture saturation and quality points with both phases, two-phase mixture
 * states found from (P, h) and (T, rho) where the single-phase routes miss the split.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import type { StateRequest } from "../../../kernel-lib/src/fluid/phaseState.js";
import { referenceFluidBinding } from "../../../kernel-lib/src/state/referenceStates.js";
import {
  stateAtPressureEnthalpy,
  stateAtPressureQuality,
  stateAtTemperatureDensity,
  stateAtTemperatureQuality,
} from "../../../kernel-lib/src/phase/twoPhaseState.js";
import { saturationAtTemperature } from "../../../kernel-lib/src/phase/saturation.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { referenceValue } from "../../fixtures/referenceValues.js";
import { expectConsistent, expectRoundTrips } from "./helpers.js";

const water = defineFluid({ components: ["water"], model: referenceFluid("water") });
const steam = referenceFluidBinding(referenceFluid("water"));
const propane = defineFluid({ components: ["propane"], model: "peng-robinson" });
const gas = defineFluid({
  components: ["methane", "ethane", "propane", "n-butane", "nitrogen", "carbon-dioxide"],
  model: "peng-robinson",
});
// invented Corvid Point sales-gas-like feed (demo scenario)
const gasX = [0.82, 0.07, 0.04, 0.02, 0.02, 0.03];

function rel(a: number, b: number): number {
  return Math.abs(a / b - 1);
}

describe("requests that are not one valid pair are refused, naming the fields", () => {
  const bad: [string, StateRequest][] = [
    ["one specification", { T: 300 }],
    ["three specifications", { T: 300, P: 1e5, h: 0 }],
    ["(P, rho) is not a pair", { P: 1e5, rho: 40 }],
    ["(h, s) is not a pair", { h: 0, s: 0 }],
    ["nothing", {}],
  ];
  for (const [what, request] of bad) {
    it(what, () => {
      let error: unknown;
      try {
        water.state(request);
      } catch (e) {
        error = e;
      }
      expect(error).toBeInstanceOf(InputError);
      const message = (error as InputError).message;
      // names the valid pairs and what was given
      expect(message).toContain("(T, P)");
      expect(message).toContain("(P, h)");
      expect(message).toContain("(rho, u)");
      expect(message).toContain("(T, vaporFraction)");
      expect(message).toContain(
        `given: ${Object.keys(request).length > 0 ? `(${Object.keys(request).join(", ")})` : "none"}`,
      );
    });
  }
  it("a specification that is not a finite number, or options that are not objects", () => {
    const text = { T: "300", P: 1e5 } as unknown as StateRequest;
    expect(() => water.state(text)).toThrow(/^T must be a finite number/);
    expect(() => water.state({ T: 300, P: Number.POSITIVE_INFINITY })).toThrow(InputError);
    const badOptions = { T: 300, P: 1e5, flash: 3 } as unknown as StateRequest;
    expect(() => water.state(badOptions)).toThrow(/flash/);
  });
  it("an unknown field (a misspelt name) is named", () => {
    const request = { T: 300, pressure: 1e5 } as unknown as StateRequest;
    expect(() => water.state(request)).toThrow(/pressure/);
    expect(() => water.state(request)).toThrow(InputError);
  });
  it("a mixture without x, a vapour fraction outside [0, 1], phase with another pair", () => {
    expect(() => gas.state({ T: 300, P: 1e5 })).toThrow(InputError);
    expect(() => propane.state({ T: 300, vaporFraction: 1.5 })).toThrow(InputError);
    expect(() => propane.state({ T: 300, vaporFraction: Number.NaN })).toThrow(InputError);
    expect(() => propane.state({ P: 1e5, h: 0, phase: "liquid" })).toThrow(InputError);
    expect(() => water.state({ T: -1, P: 1e5 })).toThrow(InputError);
  });
});

describe("pure fluid: quality states equal the saturation functions", () => {
  // IAPWS R6-95(2018) Table 8, T = 450 K (tests/fixtures/iapws-r6-95-table8.json, from memory of
  // the release): ps MPa, h', h'' kJ/kg, s', s'' kJ/(kg K)
  const t8 = (q: string): number => referenceValue("iapws-r6-95-table8.json", `T450/${q}`).value;
  it("(T, vaporFraction) of water at 450 K: both saturated phases absolute, as in Table 8", () => {
    const st = water.state({ T: 450, vaporFraction: 0.3 });
    expect(rel(st.pressurePa, t8("ps") * 1e6)).toBeLessThan(1e-8);
    expect(st.phase).toBe("two-phase");
    const [V, L] = st.phases;
    expect(V.kind).toBe("vapor");
    expect(L.kind).toBe("liquid");
    expect(rel(V.state.mass.h, t8("hV") * 1e3)).toBeLessThan(1e-8);
    expect(rel(L.state.mass.h, t8("hL") * 1e3)).toBeLessThan(1e-8);
    expect(rel(V.state.mass.s, t8("sV") * 1e3)).toBeLessThan(1e-8);
    expect(rel(L.state.mass.s, t8("sL") * 1e3)).toBeLessThan(1e-8);
    // lever rule (derived)
    expect(rel(st.mass.h, 0.7 * t8("hL") * 1e3 + 0.3 * t8("hV") * 1e3)).toBeLessThan(1e-8);
    expectConsistent(st);
  });
  it("equals stateAtTemperatureQuality and stateAtPressureQuality to round-off", () => {
    for (const q of [0, 0.25, 1]) {
      const a = water.state({ T: 450, vaporFraction: q });
      const b = stateAtTemperatureQuality(steam, 450, q);
      expect(rel(a.pressurePa, b.pressurePa)).toBeLessThan(1e-12);
      expect(rel(a.molar.h, b.molar.h)).toBeLessThan(1e-12);
      expect(rel(a.molar.s, b.molar.s)).toBeLessThan(1e-12);
      expect(rel(a.densityMolPerM3, b.densityMolPerM3)).toBeLessThan(1e-12);
      expect(rel(a.phases[0].state.molar.h, b.vapor.molar.h)).toBeLessThan(1e-12);
      expect(rel(a.phases[1].state.molar.h, b.liquid.molar.h)).toBeLessThan(1e-12);
      const c = water.state({ P: 1e6, vaporFraction: q });
      const d = stateAtPressureQuality(steam, 1e6, q);
      expect(rel(c.temperatureK, d.temperatureK)).toBeLessThan(1e-12);
      expect(rel(c.molar.h, d.molar.h)).toBeLessThan(1e-12);
    }
  });
  it("a saturated end state keeps both phases, the incipient one with amount 0", () => {
    const liquid = propane.state({ T: 300, vaporFraction: 0 });
    expect(liquid.phase).toBe("liquid");
    expect(liquid.phases.map((p) => p.amount)).toEqual([0, 1]);
    expect(Number.isFinite(liquid.molar.cp)).toBe(true);
    const sat = saturationAtTemperature(propane.model, 300);
    expect(rel(liquid.pressurePa, sat.pressurePa)).toBeLessThan(1e-12);
    expect(rel(liquid.phases[0].densityMolPerM3, sat.vaporDensityMolPerM3)).toBeLessThan(1e-12);
    expect(liquid.check!.maxLnFugacityDifference).toBeLessThanOrEqual(1e-10);
    expectConsistent(liquid);
  });
  it("(P, h) and (T, rho) inside the dome equal the pure-fluid dome functions", () => {
    const wet = water.state({ T: 450, vaporFraction: 0.3 });
    const ph = water.state({ P: wet.pressurePa, h: wet.molar.h });
    const old = stateAtPressureEnthalpy(steam, wet.pressurePa, wet.molar.h);
    expect(old.kind).toBe("two-phase");
    expect(Math.abs(ph.vaporFraction - (old.quality ?? NaN))).toBeLessThan(1e-9);
    expect(Math.abs(ph.temperatureK - 450)).toBeLessThan(1e-9);
    const trho = water.state({ T: 450, rho: wet.densityMolPerM3 });
    const old2 = stateAtTemperatureDensity(steam, 450, wet.densityMolPerM3);
    expect(Math.abs(trho.vaporFraction - (old2.quality ?? NaN))).toBeLessThan(1e-12);
    expect(rel(trho.pressurePa, wet.pressurePa)).toBeLessThan(1e-12);
  });
  it("(T, P) of a pure fluid is its stable phase, with cp, w and JT", () => {
    const st = water.state({ T: 300, P: 1e5 });
    expect(st.phase).toBe("liquid");
    expect(st.phases).toHaveLength(1);
    // IAPWS-95 liquid water at 300 K, 0.1 MPa: about 996.5 kg/m3 (from memory of the IAPWS-95
    // tables; R6-95 Table 7 prints 996.556 kg/m3 at 300 K and 0.0992 MPa)
    expect(Math.abs(st.densityKgPerM3 - 996.5)).toBeLessThan(0.2);
    expect(Number.isFinite(st.speedOfSoundMPerS)).toBe(true);
    expectConsistent(st);
  });
});

describe("mixtures: never single-phase inside the two-phase region", () => {
  it("a natural gas let down from 80 to 10 barg comes back two-phase with its liquid", () => {
    // the case of issue 12: the single-phase (P, h) inversion answers about -47 degC "vapor"
    // without a warning; the flash finds about 1.6 % liquid at about -40 degC
    const feed = gas.state({ T: 280, P: 81.01325e5, x: gasX });
    expect(feed.phase).toBe("vapor");
    const out = gas.state({ P: 11.01325e5, h: feed.molar.h, x: gasX });
    expect(out.phase).toBe("two-phase");
    expect(out.vaporFraction).toBeGreaterThan(0.9);
    expect(out.vaporFraction).toBeLessThan(1);
    const oldT = gas.temperatureAtPH(11.01325e5, feed.molar.h, gasX).state.temperatureK;
    expect(out.temperatureK - oldT).toBeGreaterThan(1);
    expect(out.specification[0].property).toBe("h");
    expect(out.specification[0].relativeError).toBeLessThanOrEqual(1e-9);
    expectConsistent(out);
  });
  it("(T, rho) of a mixture inside the envelope is split, at the overall density", () => {
    const split = gas.state({ T: 230, P: 30e5, x: gasX });
    expect(split.phase).toBe("two-phase");
    const again = gas.state({ T: 230, rho: split.densityMolPerM3, x: gasX });
    expect(again.phase).toBe("two-phase");
    expect(rel(again.densityMolPerM3, split.densityMolPerM3)).toBeLessThan(1e-9);
    expect(rel(again.pressurePa, 30e5)).toBeLessThan(1e-6);
    expectConsistent(again);
  });
  it("(T, P) with a requested root warns when the mixture splits there", () => {
    const st = gas.state({ T: 230, P: 30e5, x: gasX, phase: "vapor" });
    expect(st.phases).toHaveLength(1);
    expect(st.check).toBeUndefined();
    expect(st.warnings.some((w) => w.code === "phase-split")).toBe(true);
  });
  it("three phases (vapour, oil, water) come back labelled, verified and round-trip by (P, h)", () => {
    // methane / n-decane / water at 320 K, 3 MPa: a gas, a decane-rich liquid and an aqueous
    // liquid (derived: the mutual solubility of water and alkanes is small; no value checked)
    const oilWater = defineFluid({
      components: ["methane", "n-decane", "water"],
      model: "peng-robinson",
    });
    const z = [0.3, 0.3, 0.4];
    const st = oilWater.state({ T: 320, P: 30e5, x: z });
    expect(st.phase).toBe("three-phase");
    expect(st.phases.map((p) => p.kind)).toEqual(["vapor", "liquid", "liquid-2"]);
    expect(st.phases[2].x[2]).toBeGreaterThan(0.99); // the aqueous phase is the densest
    expectConsistent(st);
    const again = oilWater.state({ P: 30e5, h: st.molar.h, x: z });
    expect(again.phase).toBe("three-phase");
    expect(Math.abs(again.temperatureK - 320)).toBeLessThan(1e-6);
  });
  it("a two-phase natural gas round-trips through every pair", () => {
    const st = expectRoundTrips(gas, 230, 30e5, gasX);
    expect(st.phase).toBe("two-phase");
  });
  it("dew point and a quality point at given P carry both phases", () => {
    const dew = gas.state({ P: 30e5, vaporFraction: 1, x: gasX });
    expect(dew.phase).toBe("vapor");
    expect(dew.phases.map((p) => p.amount)).toEqual([1, 0]);
    expect(dew.check!.maxLnFugacityDifference).toBeLessThanOrEqual(1e-10);
    const half = gas.state({ T: dew.temperatureK - 20, vaporFraction: 0.95, x: gasX });
    expect(half.phase).toBe("two-phase");
    expect(Math.abs(half.vaporFraction - 0.95)).toBeLessThan(1e-12);
    expectConsistent(half);
    // the flash at that point returns the same split (derived: same equilibrium)
    const flash = gas.state({ T: half.temperatureK, P: half.pressurePa, x: gasX });
    expect(Math.abs(flash.vaporFraction - 0.95)).toBeLessThan(1e-7);
  });
});
