/**
 * Generic saturation, critical point and equal-area construction on the van der Waals equation,
 * whose critical point and coexistence curve are known in closed or tabulated form.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { locateCriticalPoint } from "../../../kernel-lib/src/phase/criticalPoint.js";
import {
  saturationAtPressure,
  saturationAtTemperature,
} from "../../../kernel-lib/src/phase/saturation.js";
import { equalAreaIsotherm } from "../../../kernel-lib/src/phase/equalAreaIsotherm.js";
import { InputError, PhaseUnavailableError } from "../../../kernel-lib/src/errors.js";
import { vanDerWaals, VDW_R } from "./vanDerWaalsFixture.js";
import { expectReference, referenceValue } from "../../fixtures/referenceValues.js";

// Parameters of the order of methane's (a in Pa m6/mol2, b in m3/mol); any positive values work.
const a = 0.2303;
const b = 4.31e-5;
const model = vanDerWaals(a, b);
const Tc = (8 * a) / (27 * VDW_R * b); // closed form: Tc = 8a/(27 R b) (van der Waals 1873)
const Pc = a / (27 * b * b); // Pc = a/(27 b^2)
const rhoC = 1 / (3 * b); // vc = 3 b

function lnPhi(T: number, rho: number): number {
  const d = model.residual(T, rho, [1]);
  return d.dnA![0] - Math.log(1 + d.aD);
}

describe("critical point located from the equations (van der Waals closed form)", () => {
  it("matches Tc = 8a/27Rb, Pc = a/27b^2, vc = 3b from a perturbed guess", () => {
    const c = locateCriticalPoint(model);
    expect(Math.abs(c.temperatureK / Tc - 1)).toBeLessThan(1e-12);
    expect(Math.abs(c.pressurePa / Pc - 1)).toBeLessThan(1e-10);
    expect(Math.abs(c.densityMolPerM3 / rhoC - 1)).toBeLessThan(1e-7);
  });
});

describe("van der Waals saturation", () => {
  it("reduced coexistence at Tr = 0.9: Pr = 0.6470, vr_L = 0.6034, vr_V = 2.3488", () => {
    // From memory of the tabulated van der Waals coexistence curve (e.g. D. C. Johnston, Advances
    // in Thermodynamics of the van der Waals Fluid, Morgan & Claypool, 2014); four digits printed,
    // so the tolerance is half a unit in the fourth decimal.
    const s = saturationAtTemperature(model, 0.9 * Tc);
    expect(s.start).toBe("spinodals"); // the fixture has no densityRoots
    // (tests/fixtures/johnston-2014-vdw.json)
    const vdw = (key: string) => referenceValue("johnston-2014-vdw.json", key);
    expectReference(s.pressurePa / Pc, vdw("Tr0.9/Pr"));
    expectReference(1 / s.liquidDensityMolPerM3 / (3 * b), vdw("Tr0.9/vrL"));
    expectReference(1 / s.vaporDensityMolPerM3 / (3 * b), vdw("Tr0.9/vrV"));
  });

  it("equal fugacity within 1e-10 and equal pressure from 0.35 Tc to Tc - 1e-4 K", () => {
    for (const tr of [0.35, 0.5, 0.7, 0.9, 0.99, 0.9999, 1 - 1e-4 / Tc]) {
      const T = tr * Tc;
      const s = saturationAtTemperature(model, T);
      const lnPhiL = lnPhi(T, s.liquidDensityMolPerM3);
      const lnPhiV = lnPhi(T, s.vaporDensityMolPerM3);
      // equal fugacity f = phi P: ln phi_L = ln phi_V at the common pressure
      expect(Math.abs(lnPhiL - lnPhiV)).toBeLessThan(1e-10);
      expect(s.liquidDensityMolPerM3).toBeGreaterThan(s.vaporDensityMolPerM3);
      expect(s.enthalpyOfVaporizationJPerMol).toBeGreaterThan(0);
    }
  });

  it("obeys the equal-area rule (Maxwell 1875) by independent quadrature", () => {
    for (const tr of [0.6, 0.85, 0.98]) {
      const iso = equalAreaIsotherm(model, tr * Tc);
      const scale = iso.areas.aboveTieLineJPerMol;
      expect(scale).toBeGreaterThan(0);
      expect(Math.abs(iso.areas.netJPerMol)).toBeLessThan(
        1e-8 * scale + iso.areas.errorEstimateJPerMol,
      );
      expect(iso.points.some((p) => p.region === "unstable")).toBe(true);
      const vs = iso.points.map((p) => p.molarVolumeM3PerMol);
      for (let i = 1; i < vs.length; i++) expect(vs[i]).toBeGreaterThan(vs[i - 1]);
    }
  });

  it("Clausius-Clapeyron: dP/dT = h_vap / (T (v_V - v_L)) (exact thermodynamic identity)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.45, max: 0.97, noNaN: true }), (tr) => {
        const T = tr * Tc;
        const h = 1e-4 * T;
        const up = saturationAtTemperature(model, T + h);
        const dn = saturationAtTemperature(model, T - h);
        const s = saturationAtTemperature(model, T);
        const slope = (up.pressurePa - dn.pressurePa) / (2 * h);
        const dv = 1 / s.vaporDensityMolPerM3 - 1 / s.liquidDensityMolPerM3;
        const clapeyron = s.enthalpyOfVaporizationJPerMol / (T * dv);
        expect(Math.abs(slope / clapeyron - 1)).toBeLessThan(1e-6);
      }),
      { numRuns: 20 },
    );
  });

  it("saturation at given pressure inverts saturation at given temperature", () => {
    const s = saturationAtTemperature(model, 0.8 * Tc);
    const p = saturationAtPressure(model, s.pressurePa);
    expect(Math.abs(p.temperatureK / (0.8 * Tc) - 1)).toBeLessThan(1e-11);
  });

  it("refuses T >= Tc, P >= Pc and bad input", () => {
    expect(() => saturationAtTemperature(model, 1.0001 * Tc)).toThrow(PhaseUnavailableError);
    expect(() => saturationAtPressure(model, 1.01 * Pc)).toThrow(PhaseUnavailableError);
    for (const bad of [NaN, -1, 0, Infinity]) {
      expect(() => saturationAtTemperature(model, bad)).toThrow(InputError);
      expect(() => saturationAtPressure(model, bad)).toThrow(InputError);
    }
    expect(() => saturationAtTemperature(model, 0.8 * Tc, { tolerance: NaN })).toThrow(InputError);
    const mix = { ...model, info: { ...model.info, componentIds: ["a", "b"] } };
    expect(() => saturationAtTemperature(mix, 0.8 * Tc)).toThrow(InputError);
  });
});
