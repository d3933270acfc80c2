/**
 * The departure-function integrator (numeric) against the closed-form alpha_r of every cubic model,
 * pure and mixed, in gas, liquid and supercritical states: agreement to 1e-9 relative (the issue's
 * requirement). The reference is a closed form, so this is an external check of the integrator and
 * of the hyper-dual pressure functions, which are written independently of the alpha_r formulas.
 * Relative is taken against the size of the quantity or RT (resp. R), whichever is larger, so a
 * departure that passes through zero is not divided by zero.
 */
import { describe, expect, it } from "vitest";
import { createModel } from "../../../kernel-lib/src/eos/createModel.js";
import {
  CUBIC_FAMILIES,
  type CubicModelId,
} from "../../../kernel-lib/src/eos/cubic/cubicFamilies.js";
import { modelFromPressure } from "../../../kernel-lib/src/departure/pressureModel.js";
import { residualProperties } from "../../../kernel-lib/src/state/properties.js";
import { R } from "../../../kernel-lib/src/constants.js";
import { comps } from "../eos/helpers.js";

// rhoFraction: fraction of the close-packing density; a negative value -P asks for the densest
// root at pressure P (liquids, where a fixed fraction could land at negative pressure)
const cases: { label: string; ids: string[]; x: number[]; T: number; rhoFraction: number }[] = [
  { label: "pure methane gas", ids: ["methane"], x: [1], T: 250, rhoFraction: 0.05 },
  { label: "pure n-butane liquid", ids: ["n-butane"], x: [1], T: 300, rhoFraction: -20e5 },
  { label: "pure CO2 supercritical", ids: ["carbon-dioxide"], x: [1], T: 320, rhoFraction: 0.35 },
  {
    label: "fuel gas mixture",
    ids: ["hydrogen", "methane", "ethane"],
    x: [0.5, 0.4, 0.1],
    T: 310,
    rhoFraction: 0.08,
  },
  {
    label: "liquid mixture",
    ids: ["propane", "n-hexane"],
    x: [0.3, 0.7],
    T: 320,
    rhoFraction: -50e5,
  },
  {
    label: "supercritical mixture",
    ids: ["methane", "carbon-dioxide"],
    x: [0.6, 0.4],
    T: 350,
    rhoFraction: 0.3,
  },
];

describe("numeric departures agree with the closed forms to 1e-9", () => {
  for (const id of Object.keys(CUBIC_FAMILIES) as CubicModelId[]) {
    for (const c of cases) {
      it(`${id}: ${c.label}`, () => {
        const closed = createModel(id, comps(...c.ids));
        const numeric = modelFromPressure({
          name: "numeric",
          components: c.ids,
          pressure: closed.pressureFunction,
          maxDensity: (T, x) => closed.maxDensity(T, x),
        });
        const rho =
          c.rhoFraction > 0
            ? c.rhoFraction * closed.maxDensity(c.T, c.x)
            : Math.max(...closed.densityRoots!(c.T, -c.rhoFraction, c.x));
        expect(rho / closed.maxDensity(c.T, c.x)).toBeLessThan(1);
        const a = closed.residual(c.T, rho, c.x, { composition: true });
        const integ = numeric.integrate(c.T, rho, c.x, { composition: true });
        const b = integ.derivatives;
        const RT = R * c.T;
        const pa = residualProperties(c.T, a);
        const pb = residualProperties(c.T, b);
        for (const conv of ["TV", "TP"] as const) {
          for (const k of ["h", "u", "a", "g"] as const) {
            const scale = Math.max(Math.abs(pa[conv][k]), RT);
            expect(Math.abs(pa[conv][k] - pb[conv][k]) / scale).toBeLessThan(1e-9);
          }
          const sScale = Math.max(Math.abs(pa[conv].s), R);
          expect(Math.abs(pa[conv].s - pb[conv].s) / sScale).toBeLessThan(1e-9);
        }
        for (const k of ["aD", "aDD", "aDT", "aTT"] as const) {
          expect(Math.abs(a[k] - b[k]) / Math.max(Math.abs(a[k]), 1)).toBeLessThan(1e-9);
        }
        for (let i = 0; i < c.x.length; i++) {
          // ln phi: differencing in x for mixtures (stated error ~1e-9)
          expect(
            Math.abs(pa.lnPhi[i] - pb.lnPhi[i]) / Math.max(Math.abs(pa.lnPhi[i]), 1),
          ).toBeLessThan(c.x.length > 1 ? 1e-8 : 1e-9);
        }
        // the reported error estimate bounds the actual error
        expect(Math.abs(a.a - b.a)).toBeLessThanOrEqual(
          Math.max(integ.errorEstimate.a, 1e-13) * 10,
        );
      });
    }
  }
});

describe("numeric departures agree with the closed forms of the virial and Lee-Kesler models", () => {
  for (const id of ["virial", "lee-kesler"] as const) {
    for (const c of [
      { ids: ["methane"], x: [1], T: 300, rho: 1500 },
      { ids: ["methane", "ethane", "nitrogen"], x: [0.8, 0.15, 0.05], T: 320, rho: 2500 },
    ]) {
      it(`${id}: ${c.ids.join("+")} at ${c.T} K, ${c.rho} mol/m3`, () => {
        const closed = createModel(id, comps(...c.ids));
        const numeric = modelFromPressure({
          name: "numeric",
          components: c.ids,
          pressure: closed.pressureFunction,
        });
        const a = residualProperties(c.T, closed.residual(c.T, c.rho, c.x, { composition: true }));
        const b = residualProperties(c.T, numeric.residual(c.T, c.rho, c.x, { composition: true }));
        const RT = R * c.T;
        for (const k of ["h", "u", "a", "g"] as const) {
          expect(Math.abs(a.TP[k] - b.TP[k]) / Math.max(Math.abs(a.TP[k]), RT)).toBeLessThan(1e-9);
        }
        expect(Math.abs(a.TP.s - b.TP.s) / Math.max(Math.abs(a.TP.s), R)).toBeLessThan(1e-9);
        a.lnPhi.forEach((l, i) => expect(Math.abs(l - b.lnPhi[i])).toBeLessThan(1e-8));
      });
    }
  }
});
