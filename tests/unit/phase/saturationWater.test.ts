/**
 * Saturation of water with IAPWS-95, against IAPWS R6-95(2018) Table 8 and the fixed points of
 * Wagner and Pruss (2002). Reference values are from memory of those publications (named per
 * value). Table 8 prints nine significant digits: tolerance relative 1e-8 (half a unit in the
 * ninth digit is at most 5e-9 relative); h and s in Table 8 are in the IAPWS-95 reference state
 * (u = s = 0 for the saturated liquid at the triple point), which is the direct path's state.
 */
import { describe, expect, it } from "vitest";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { referenceStateTRho } from "../../../kernel-lib/src/state/referenceStates.js";
import { locateCriticalPoint } from "../../../kernel-lib/src/phase/criticalPoint.js";
import {
  saturationAtPressure,
  saturationAtTemperature,
} from "../../../kernel-lib/src/phase/saturation.js";
import { equalAreaIsotherm } from "../../../kernel-lib/src/phase/equalAreaIsotherm.js";
import { OutOfRangeError, PhaseUnavailableError } from "../../../kernel-lib/src/errors.js";
import { expectReference, referenceValue } from "../../fixtures/referenceValues.js";

// tests/fixtures/iapws-r6-95-table8.json, iapws-r6-95-constants.json, wagner-pruss-2002-water.json
const t8 = (key: string) => referenceValue("iapws-r6-95-table8.json", key);
const constant = (key: string) => referenceValue("iapws-r6-95-constants.json", key);
const wp = (key: string) => referenceValue("wagner-pruss-2002-water.json", key);

const water = referenceFluid("water");
const M = constant("M").value / 1000; // kg/mol (IAPWS R6-95(2018))

function expectRel(actual: number, expected: number, rel: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

describe("IAPWS R6-95(2018) Table 8: saturation at 275, 450 and 625 K", () => {
  for (const T of [275, 450, 625]) {
    it(`T = ${T} K`, () => {
      const sat = saturationAtTemperature(water, T);
      expect(sat.start).toBe("ancillary equations");
      expectReference(sat.pressurePa / 1e6, t8(`T${T}/ps`));
      expectReference(sat.liquidDensityMolPerM3 * M, t8(`T${T}/rhoL`));
      expectReference(sat.vaporDensityMolPerM3 * M, t8(`T${T}/rhoV`));
      const L = referenceStateTRho(water, T, sat.liquidDensityMolPerM3);
      const V = referenceStateTRho(water, T, sat.vaporDensityMolPerM3);
      expectReference(L.molar.h / M / 1e3, t8(`T${T}/hL`));
      expectReference(V.molar.h / M / 1e3, t8(`T${T}/hV`));
      expectReference(L.molar.s / M / 1e3, t8(`T${T}/sL`));
      expectReference(V.molar.s / M / 1e3, t8(`T${T}/sV`));
      // h_vap from alpha_r alone equals the difference of the absolute enthalpies (two rounded
      // table values, so twice the table's 1e-8).
      const [hL, hV] = [t8(`T${T}/hL`).value, t8(`T${T}/hV`).value];
      const [sL, sV] = [t8(`T${T}/sL`).value, t8(`T${T}/sV`).value];
      expectRel(sat.enthalpyOfVaporizationJPerMol / M / 1e3, hV - hL, 2e-8);
      expectRel(sat.entropyOfVaporizationJPerMolK / M / 1e3, sV - sL, 2e-8);
    });
  }
});

describe("IAPWS-95 fixed points", () => {
  it("critical point from the equation's own conditions: 647.096 K, 322 kg/m3, 22.064 MPa", () => {
    // IAPWS R6-95(2018) eqs. (1)-(3) (from memory); the equation was constrained to this point.
    // Tolerances: T and P to 1e-9 relative; the density, fixed by a very flat (dP/drho) near
    // the critical point, to 1e-6 relative.
    const c = locateCriticalPoint(water);
    expectReference(c.temperatureK, constant("Tc"), "critical-point-search");
    expectReference(c.pressurePa / 1e6, constant("pc"), "critical-point-search");
    expectReference(c.densityMolPerM3 * M, constant("rhoc"), "critical-point-search");
  });

  it("triple point: p = 611.654771 Pa, rho' = 999.793 kg/m3, rho'' = 0.00485458 kg/m3", () => {
    // From memory of Wagner and Pruss, J. Phys. Chem. Ref. Data 31, 387 (2002), section 2.3 and
    // Table 13.1 (values computed from IAPWS-95 at 273.16 K); tolerance half a unit in the last
    // printed digit.
    const s = saturationAtTemperature(water, 273.16);
    expectReference(s.pressurePa, wp("triple/p"));
    expectReference(s.liquidDensityMolPerM3 * M, wp("triple/rhoL"));
    expectReference(s.vaporDensityMolPerM3 * M, wp("triple/rhoV"));
    // The reference state: u' = 0 and s' = 0 at the triple point (IAPWS-95 convention).
    const L = referenceStateTRho(water, 273.16, s.liquidDensityMolPerM3);
    expect(Math.abs(L.molar.u)).toBeLessThan(1e-6);
    expect(Math.abs(L.molar.s)).toBeLessThan(1e-9);
  });

  it("normal boiling point 373.124 K at 101325 Pa", () => {
    // From memory of Wagner and Pruss (2002), section 2.3 (normal boiling temperature on ITS-90
    // computed from IAPWS-95: 373.124 K); tolerance half a unit in the third decimal.
    const s = saturationAtPressure(water, 101325);
    expectReference(s.temperatureK, wp("normal-boiling/T"));
    expect(Math.abs(s.pressurePa / 101325 - 1)).toBeLessThan(1e-11);
  });
});

describe("IAPWS-95 saturation: robustness", () => {
  it("converges from the triple point to within 1e-4 K of the critical temperature", () => {
    let previous = 0;
    for (const T of [273.16, 300, 400, 500, 600, 640, 646, 647, 647.09, 647.096 - 1e-4]) {
      const s = saturationAtTemperature(water, T);
      expect(s.residual.gibbs).toBeLessThan(1e-12);
      expect(s.residual.pressure).toBeLessThan(1e-12);
      expect(s.pressurePa).toBeGreaterThan(previous);
      expect(s.liquidDensityMolPerM3).toBeGreaterThan(water.critical.densityMolPerM3);
      expect(s.vaporDensityMolPerM3).toBeLessThan(water.critical.densityMolPerM3);
      previous = s.pressurePa;
    }
  });

  it("the spinodal route (no ancillaries) agrees with the ancillary route", () => {
    // Strip the ancillary equations: only the ResidualModel interface remains.
    const bare = {
      info: water.info,
      gasConstant: water.gasConstant,
      residual: water.residual.bind(water),
      maxDensity: water.maxDensity.bind(water),
      pseudoCritical: () => ({ ...water.critical, rule: "published" }),
    };
    for (const T of [400, 600, 645]) {
      const a = saturationAtTemperature(water, T);
      const b = saturationAtTemperature(bare, T);
      expect(b.start).toBe("spinodals");
      expectRel(b.pressurePa, a.pressurePa, 1e-10);
      expectRel(b.liquidDensityMolPerM3, a.liquidDensityMolPerM3, 1e-10);
      expectRel(b.vaporDensityMolPerM3, a.vaporDensityMolPerM3, 1e-10);
    }
  });

  it("equal areas on the IAPWS-95 isotherm at 600 K", () => {
    const iso = equalAreaIsotherm(water, 600);
    expect(Math.abs(iso.areas.netJPerMol)).toBeLessThan(
      1e-8 * iso.areas.aboveTieLineJPerMol + iso.areas.errorEstimateJPerMol,
    );
  });

  it("refuses temperatures at or above the critical point", () => {
    expect(() => saturationAtTemperature(water, 647.096)).toThrow(PhaseUnavailableError);
    expect(() => saturationAtTemperature(water, 700)).toThrow(/critical temperature/);
    expect(() => saturationAtPressure(water, 22.1e6)).toThrow(PhaseUnavailableError);
  });
});

describe("IAPWS-95 saturation: validity range", () => {
  it("warns below the triple point, refuses below the extrapolation range unless asked", () => {
    // 260 K: supercooled liquid, inside this library's extrapolation range (200 K) for IAPWS-95.
    const cold = saturationAtTemperature(water, 260);
    expect(cold.warnings.some((w) => /triple point/.test(w.message))).toBe(true);
    expect(cold.warnings.some((w) => w.code === "outside-validity")).toBe(true);
    expect(() => saturationAtTemperature(water, 150)).toThrow(OutOfRangeError);
    expect(() => saturationAtTemperature(water, 150)).toThrow(/allowOutsideRange/);
    const inside = saturationAtTemperature(water, 400);
    expect(inside.warnings).toEqual([]);
  });
});
