/**
 * Phase at (T, P) and states across the dome for water (IAPWS-95, its own reference state).
 * Reference values: IAPWS R6-95(2018) Table 8 at 450 K (from memory of the release), nine digits:
 * tolerance relative 1e-8 on values computed from them by the lever rule.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { referenceFluidBinding } from "../../../kernel-lib/src/state/referenceStates.js";
import {
  pureFluidPhaseAt,
  pureFluidStateTP,
} from "../../../kernel-lib/src/phase/pureFluidPhase.js";
import {
  stateAtPressureEnthalpy,
  stateAtPressureEntropy,
  stateAtPressureQuality,
  stateAtTemperatureDensity,
  stateAtTemperatureQuality,
} from "../../../kernel-lib/src/phase/twoPhaseState.js";
import { saturationAtTemperature } from "../../../kernel-lib/src/phase/saturation.js";
import { InputError, PhaseUnavailableError } from "../../../kernel-lib/src/errors.js";
import { referenceValue } from "../../fixtures/referenceValues.js";

const water = referenceFluid("water");
const steam = referenceFluidBinding(water);
const M = referenceValue("iapws-r6-95-constants.json", "M").value / 1000;
// IAPWS R6-95(2018) Table 8, T = 450 K (tests/fixtures/iapws-r6-95-table8.json, from memory):
// ps MPa, rho' kg/m3, rho'' kg/m3, h', h'' kJ/kg, s', s'' kJ/(kg K)
const t8 = (q: string): number => referenceValue("iapws-r6-95-table8.json", `T450/${q}`).value;
const ps450 = t8("ps");
const rhoL450 = t8("rhoL");
const rhoV450 = t8("rhoV");
const hL450 = t8("hL");
const hV450 = t8("hV");
const sL450 = t8("sL");
const sV450 = t8("sV");

function rel(a: number, b: number): number {
  return Math.abs(a / b - 1);
}

describe("phase at (T, P)", () => {
  it("labels liquid, vapour, supercritical and gas above Tc", () => {
    expect(pureFluidPhaseAt(water, 450, 2e6).phase).toBe("liquid");
    expect(pureFluidPhaseAt(water, 450, 5e5).phase).toBe("vapor");
    expect(pureFluidPhaseAt(water, 700, 30e6).phase).toBe("supercritical");
    expect(pureFluidPhaseAt(water, 700, 10e6).phase).toBe("vapor");
    expect(pureFluidPhaseAt(water, 600, 30e6).phase).toBe("liquid");
  });

  it("refuses (T, P) on the saturation line with an explanation", () => {
    const psat = saturationAtTemperature(water, 450).pressurePa;
    expect(() => pureFluidPhaseAt(water, 450, psat)).toThrow(PhaseUnavailableError);
    expect(() => pureFluidStateTP(steam, 450, psat)).toThrow(/quality/);
    // just off the line: fine, and in the right phase
    expect(pureFluidStateTP(steam, 450, psat * (1 + 1e-6)).phase).toBe("liquid");
    expect(pureFluidStateTP(steam, 450, psat * (1 - 1e-6)).phase).toBe("vapor");
  });

  it("refuses bad input", () => {
    for (const bad of [NaN, -1, 0, Infinity]) {
      expect(() => pureFluidPhaseAt(water, bad, 1e5)).toThrow(InputError);
      expect(() => pureFluidPhaseAt(water, 300, bad)).toThrow(InputError);
    }
  });
});

describe("states at given quality (lever rule on IAPWS R6-95 Table 8, 450 K)", () => {
  it("(T, q) and (P, q) agree with the table", () => {
    const q = 0.3;
    const a = stateAtTemperatureQuality(steam, 450, q);
    expect(rel(a.pressurePa / 1e6, ps450)).toBeLessThan(1e-8);
    expect(rel(a.mass.h / 1e3, (1 - q) * hL450 + q * hV450)).toBeLessThan(1e-8);
    expect(rel(a.mass.s / 1e3, (1 - q) * sL450 + q * sV450)).toBeLessThan(1e-8);
    expect(a.quality).toBe(q);
    const b = stateAtPressureQuality(steam, ps450 * 1e6, q);
    expect(Math.abs(b.temperatureK - 450)).toBeLessThan(1e-6);
    expect(rel(b.mass.h, a.mass.h)).toBeLessThan(1e-8);
  });

  it("saturated ends: q = 0 is the saturated liquid, q = 1 the saturated vapour", () => {
    const l = stateAtTemperatureQuality(steam, 450, 0);
    const v = stateAtTemperatureQuality(steam, 450, 1);
    expect(rel(l.mass.h / 1e3, hL450)).toBeLessThan(1e-8);
    expect(rel(v.mass.h / 1e3, hV450)).toBeLessThan(1e-8);
    expect(rel(l.densityKgPerM3, rhoL450)).toBeLessThan(1e-8);
  });

  it("g = h - T s is the same in both saturated phases", () => {
    const w = stateAtTemperatureQuality(steam, 400, 0.5);
    expect(Math.abs(w.liquid.molar.g - w.vapor.molar.g)).toBeLessThan(
      1e-7 * Math.abs(w.vapor.molar.h),
    );
  });

  it("refuses a quality outside 0..1 and T above Tc", () => {
    for (const bad of [-0.1, 1.1, NaN, Infinity]) {
      expect(() => stateAtTemperatureQuality(steam, 450, bad)).toThrow(InputError);
    }
    expect(() => stateAtTemperatureQuality(steam, 700, 0.5)).toThrow(PhaseUnavailableError);
  });
});

describe("(P, h) and (P, s) across the dome", () => {
  const P = ps450 * 1e6;
  it("returns the two-phase state and its quality between h' and h''", () => {
    const h = (0.25 * hL450 + 0.75 * hV450) * 1e3 * M;
    const r = stateAtPressureEnthalpy(steam, P, h);
    expect(r.kind).toBe("two-phase");
    if (r.kind === "two-phase") {
      expect(Math.abs(r.quality - 0.75)).toBeLessThan(1e-7);
      expect(Math.abs(r.temperatureK - 450)).toBeLessThan(1e-6);
    }
  });

  it("returns single-phase states on both sides, continuous with the dome", () => {
    const hL = hL450 * 1e3 * M;
    const hV = hV450 * 1e3 * M;
    const liquid = stateAtPressureEnthalpy(steam, P, hL - 500);
    const vapor = stateAtPressureEnthalpy(steam, P, hV + 500);
    expect(liquid.kind).toBe("single-phase");
    expect(vapor.kind).toBe("single-phase");
    if (liquid.kind === "single-phase" && vapor.kind === "single-phase") {
      expect(liquid.state.temperatureK).toBeLessThan(450);
      expect(vapor.state.temperatureK).toBeGreaterThan(450);
      expect(Math.abs(liquid.state.molar.h - (hL - 500))).toBeLessThan(1e-5);
      expect(liquid.state.phase).toBe("liquid");
      expect(vapor.state.phase).toBe("vapor");
    }
  });

  it("isentropic expansion of superheated steam into the dome (P, s)", () => {
    // 4 MPa, 700 K steam expanded to 0.1 MPa at constant entropy ends wet.
    const inlet = pureFluidStateTP(steam, 700, 4e6);
    const out = stateAtPressureEntropy(steam, 1e5, inlet.molar.s);
    expect(out.kind).toBe("two-phase");
    if (out.kind === "two-phase") {
      expect(out.quality).toBeGreaterThan(0.8);
      expect(out.quality).toBeLessThan(1);
      expect(Math.abs(out.molar.s - inlet.molar.s)).toBeLessThan(
        1e-9 * Math.abs(inlet.molar.s) + 1e-9,
      );
    }
  });

  it("(P, h) inverts (T, q) over random wet states", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 300, max: 640, noNaN: true }),
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        (T, q) => {
          const wet = stateAtTemperatureQuality(steam, T, q);
          const back = stateAtPressureEnthalpy(steam, wet.pressurePa, wet.molar.h);
          expect(back.kind).toBe("two-phase");
          if (back.kind === "two-phase") {
            expect(Math.abs(back.quality - q)).toBeLessThan(1e-8);
            expect(Math.abs(back.temperatureK - T)).toBeLessThan(1e-7 * T);
          }
        },
      ),
      { numRuns: 15 },
    );
  });

  it("supercritical pressure: a single phase", () => {
    const s = pureFluidStateTP(steam, 800, 30e6);
    const r = stateAtPressureEnthalpy(steam, 30e6, s.molar.h);
    expect(r.kind).toBe("single-phase");
    if (r.kind === "single-phase") expect(Math.abs(r.state.temperatureK - 800)).toBeLessThan(1e-6);
  });
});

describe("(T, rho): a closed vessel", () => {
  it("inside the dome: quality from the lever rule on volumes (R6-95 Table 8 densities, 450 K)", () => {
    // v = (1 - q)/rho' + q/rho'' with rho' = 890.341250, rho'' = 4.81200360 kg/m3 (Table 8)
    const q = 0.2;
    const v = (1 - q) / rhoL450 + q / rhoV450;
    const r = stateAtTemperatureDensity(steam, 450, 1 / v / M);
    expect(r.kind).toBe("two-phase");
    if (r.kind === "two-phase") {
      expect(Math.abs(r.quality - q)).toBeLessThan(1e-8);
      expect(rel(r.pressurePa / 1e6, ps450)).toBeLessThan(1e-8);
    }
  });
  it("outside the dome or above Tc: the single-phase state", () => {
    const liquid = stateAtTemperatureDensity(steam, 450, 950 / M);
    const hot = stateAtTemperatureDensity(steam, 700, 300 / M);
    expect(liquid.kind).toBe("single-phase");
    expect(hot.kind).toBe("single-phase");
    expect(() => stateAtTemperatureDensity(steam, 450, NaN)).toThrow(InputError);
  });
});
