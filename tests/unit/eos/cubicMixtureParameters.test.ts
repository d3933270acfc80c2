/**
 * The cubic model's mixture parameters a(T), da/dT, d2a/dT2 and b (eos/cubic/cubicModel.ts) against
 * the one-fluid rule written out here from evaluatePsi (eos/cubic/alphaFunctions.ts, the alpha
 * functions as published: Soave 1972 eq. 13, Peng & Robinson 1976 eqs. 17-18) and the double sum
 * a = sum_i sum_j x_i x_j sqrt(a_c,i a_c,j) psi_i psi_j (1 - k_ij). The model takes the Soave-type
 * psi with one square root of T for all components (sqrt(T) / sqrt(Tc) for sqrt(T / Tc)) and
 * keeps x_j (1 - k_ij) between temperatures at one composition: rearrangements that change a few
 * units in the last place, so the tolerance is 1e-13 relative (common practice, no source).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { createCubicModel, type CubicModel } from "../../../kernel-lib/src/eos/cubic/cubicModel.js";
import {
  alphaSlope,
  evaluatePsi,
  type PsiValues,
} from "../../../kernel-lib/src/eos/cubic/alphaFunctions.js";
import type { CubicModelId } from "../../../kernel-lib/src/eos/cubic/cubicFamilies.js";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import { R } from "../../../kernel-lib/src/constants.js";

const IDS = ["nitrogen", "carbon-dioxide", "methane", "ethane", "propane", "n-butane", "n-hexane"];

function written(model: CubicModel, T: number, x: readonly number[]) {
  const n = x.length;
  const f = model.family;
  const s: number[] = [];
  const ds: number[] = [];
  const d2s: number[] = [];
  const out: PsiValues = { psi: 0, dPsi: 0, d2Psi: 0 };
  model.components.forEach((c, i) => {
    const Tc = c.criticalTemperatureK;
    const sqrtAc = Math.sqrt((f.omegaA * R * R * Tc * Tc) / c.criticalPressurePa);
    evaluatePsi(f.alpha, alphaSlope(f.alpha, c.acentricFactor), T, Tc, out);
    s[i] = sqrtAc * out.psi;
    ds[i] = sqrtAc * out.dPsi;
    d2s[i] = sqrtAc * out.d2Psi;
  });
  let a = 0;
  let aT = 0;
  let aTT = 0;
  let b = 0;
  // sums of the terms' magnitudes: the scale of the rounding of each sum
  let sizeA = 0;
  let sizeT = 0;
  let sizeTT = 0;
  for (let i = 0; i < n; i++) {
    const c = model.components[i];
    b += (x[i] * f.omegaB * R * c.criticalTemperatureK) / c.criticalPressurePa;
    for (let j = 0; j < n; j++) {
      const k = 1 - model.interactions.kij[i][j];
      a += x[i] * x[j] * k * s[i] * s[j];
      aT += x[i] * x[j] * k * (ds[i] * s[j] + s[i] * ds[j]);
      aTT += x[i] * x[j] * k * (d2s[i] * s[j] + 2 * ds[i] * ds[j] + s[i] * d2s[j]);
      const w = Math.abs(x[i] * x[j] * k);
      sizeA += w * Math.abs(s[i] * s[j]);
      sizeT += w * (Math.abs(ds[i] * s[j]) + Math.abs(s[i] * ds[j]));
      sizeTT +=
        w * (Math.abs(d2s[i] * s[j]) + 2 * Math.abs(ds[i] * ds[j]) + Math.abs(s[i] * d2s[j]));
    }
  }
  return { a, aT, aTT, b, sizeA, sizeT, sizeTT };
}

describe("cubic mixture parameters equal the one-fluid rule written out", () => {
  const families: CubicModelId[] = ["peng-robinson", "soave-redlich-kwong", "redlich-kwong"];
  for (const id of families) {
    it(`${id}: random T and compositions, and a new T at the same composition`, () => {
      const model = createCubicModel(
        id,
        IDS.map((c) => getComponent(c)),
      );
      fc.assert(
        fc.property(
          fc.array(fc.double({ min: 0.01, max: 1, noNaN: true }), { minLength: 7, maxLength: 7 }),
          fc.array(fc.double({ min: 100, max: 1500, noNaN: true }), { minLength: 3, maxLength: 3 }),
          (weights, temperatures) => {
            const sum = weights.reduce((p, q) => p + q, 0);
            const x = weights.map((v) => v / sum);
            // several temperatures at one composition (the kept x_j (1 - k_ij)), then the next x
            for (const T of temperatures) {
              const got = model.mixtureParameters(T, x);
              const want = written(model, T, x);
              // relative to the size of the terms of each sum (da/dT and d2a/dT2 have terms of
              // either sign, and psi passes zero at high T for the Soave forms)
              expect(Math.abs(got.a - want.a)).toBeLessThanOrEqual(1e-13 * want.sizeA);
              expect(Math.abs(got.aT - want.aT)).toBeLessThanOrEqual(1e-13 * want.sizeT);
              expect(Math.abs(got.aTT - want.aTT)).toBeLessThanOrEqual(1e-13 * want.sizeTT);
              expect(Math.abs(got.b - want.b)).toBeLessThanOrEqual(1e-14 * want.b);
            }
          },
        ),
        { numRuns: 100 },
      );
    });
  }
});
