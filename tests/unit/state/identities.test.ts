/**
 * Thermodynamic identities over random states (fast-check): they hold exactly for any consistent
 * model, so a violation means a wrong formula in state/properties.ts or a wrong derivative in a
 * model. Sources: the identities are textbook thermodynamics (e.g. Callen, Thermodynamics and an
 * Introduction to Thermostatistics, 2nd ed. 1985, ch. 3 and 7; Michelsen & Mollerup 2007, ch. 2).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { R } from "../../../kernel-lib/src/constants.js";

const mixIds = ["methane", "ethane", "propane", "nitrogen", "carbon-dioxide"];
const models = [
  "peng-robinson",
  "soave-redlich-kwong",
  "lee-kesler",
  "virial",
  "van-der-waals",
] as const;

const fluids = models.map((m) => defineFluid({ components: mixIds, model: m }));

const stateArb = fc.record({
  model: fc.integer({ min: 0, max: models.length - 1 }),
  T: fc.double({ min: 275, max: 600, noNaN: true }), // propane cp correlation: 300-5000 K (270 K with extrapolation)
  P: fc.double({ min: 1e4, max: 6e6, noNaN: true }),
  w: fc.array(fc.double({ min: 0.01, max: 1, noNaN: true }), { minLength: 5, maxLength: 5 }),
});

function norm(w: number[]): number[] {
  const s = w.reduce((p, q) => p + q, 0);
  return w.map((v) => v / s);
}

// count the states that were actually checked, so a property cannot pass by refusing every state
// (a refused state returns early; each property asserts a minimum count after its run)
let checked = 0;
let checkedLnPhi = 0;
let checkedMaxwell = 0;

describe("identities over random states", () => {
  it("G = H - TS, H = U + Pv, A = U - TS, sum x ln phi = g_r/RT, cp - cv = T v beta^2 / kappa_T, cp >= cv > 0", () => {
    fc.assert(
      fc.property(stateArb, ({ model, T, P, w }) => {
        const fluid = fluids[model];
        const x = norm(w);
        let s;
        try {
          s = fluid.stateAtTP(T, P, x);
        } catch {
          return; // e.g. the truncated virial has no root at high pressure: refused, not wrong
        }
        const m = s.molar;
        const v = 1 / s.densityMolPerM3;
        const scale = Math.max(Math.abs(m.h), R * T);
        expect(Math.abs(m.g - (m.h - T * m.s)) / scale).toBeLessThan(1e-10);
        expect(Math.abs(m.h - (m.u + s.pressurePa * v)) / scale).toBeLessThan(1e-10);
        expect(Math.abs(m.a - (m.u - T * m.s)) / scale).toBeLessThan(1e-10);
        const sumLnPhi = s.lnPhi.reduce((p, l, i) => p + x[i] * l, 0);
        expect(Math.abs(sumLnPhi - s.residual.g / (R * T))).toBeLessThan(
          1e-10 * Math.max(1, Math.abs(sumLnPhi)),
        );
        const diff = (T * v * s.thermalExpansionPerK ** 2) / s.isothermalCompressibilityPerPa;
        expect(Math.abs(m.cp - m.cv - diff) / m.cp).toBeLessThan(1e-10);
        expect(m.cv).toBeGreaterThan(0);
        expect(m.cp).toBeGreaterThanOrEqual(m.cv);
        // the residual parts are the absolute values minus the fluid's ideal gas at the same T
        // and P, and the two residual conventions differ by R ln Z in s (Z = P v / RT)
        const ig = fluid.idealGas.at(T, P, x);
        expect(Math.abs(m.h - ig.h - s.residual.h) / scale).toBeLessThan(1e-9);
        expect(Math.abs(m.g - ig.g - s.residual.g) / scale).toBeLessThan(1e-9);
        expect(Math.abs(m.s - ig.s - s.residual.s) / R).toBeLessThan(
          1e-9 * Math.max(1, scale / (R * T)),
        );
        const lnZ = Math.log((P * v) / (R * T));
        expect(Math.abs(s.residual.s - s.residualTV.s - R * lnZ) / R).toBeLessThan(1e-9);
        checked++;
      }),
      { numRuns: 150, seed: 42 },
    );
    expect(checked).toBeGreaterThan(120);
  });

  it("ln phi_i equals the mole-number derivative of n g_r/RT at constant T and P (numerically)", () => {
    fc.assert(
      fc.property(stateArb, ({ model, T, P, w }) => {
        const fluid = fluids[model];
        const x = norm(w);
        let s;
        try {
          s = fluid.stateAtTP(T, P, x, { phase: "vapor" });
        } catch {
          return;
        }
        const nG = (n: number[]) => {
          const tot = n.reduce((p, q) => p + q, 0);
          return (
            (tot *
              fluid.stateAtTP(
                T,
                P,
                n.map((ni) => ni / tot),
                { phase: "vapor" },
              ).residual.g) /
            (R * T)
          );
        };
        for (let i = 0; i < x.length; i++) {
          const h = 1e-6;
          const np = x.slice();
          const nm = x.slice();
          np[i] += h;
          nm[i] -= h;
          const d = (nG(np) - nG(nm)) / (2 * h);
          expect(Math.abs(d - s.lnPhi[i])).toBeLessThan(1e-6 * Math.max(1, Math.abs(d)));
        }
        checkedLnPhi++;
      }),
      { numRuns: 40, seed: 7 },
    );
    expect(checkedLnPhi).toBeGreaterThan(30);
  });

  it("Maxwell: (dS/dV)_T = (dP/dT)_V, and (dP/dT)_V matches a difference of P(T, rho)", () => {
    fc.assert(
      fc.property(stateArb, ({ model, T, P, w }) => {
        const fluid = fluids[model];
        const x = norm(w);
        let s;
        try {
          s = fluid.stateAtTP(T, P, x);
        } catch {
          return;
        }
        const rho = s.densityMolPerM3;
        const v = 1 / rho;
        const hv = v * 1e-6;
        const sAt = (vv: number) => fluid.stateAtTRho(T, 1 / vv, x).molar.s;
        const dSdV = (sAt(v + hv) - sAt(v - hv)) / (2 * hv);
        expect(Math.abs(dSdV - s.dPdTPaPerK) / Math.abs(s.dPdTPaPerK)).toBeLessThan(1e-6);
        const hT = T * 1e-6;
        const pAt = (t: number) => fluid.stateAtTRho(t, rho, x).pressurePa;
        const dPdT = (pAt(T + hT) - pAt(T - hT)) / (2 * hT);
        expect(Math.abs(dPdT - s.dPdTPaPerK) / Math.abs(s.dPdTPaPerK)).toBeLessThan(1e-6);
        // and cv = (dU/dT)_V, cp = (dH/dT)_P
        const uAt = (t: number) => fluid.stateAtTRho(t, rho, x).molar.u;
        const cv = (uAt(T + hT) - uAt(T - hT)) / (2 * hT);
        expect(Math.abs(cv - s.molar.cv) / s.molar.cv).toBeLessThan(1e-5);
        checkedMaxwell++;
      }),
      { numRuns: 60, seed: 3 },
    );
    expect(checkedMaxwell).toBeGreaterThan(45);
  });
});
