/**
 * Fugacity of a phase and its derivatives (state/fugacity.ts): the derivatives against central
 * differences of ln phi re-solved at (T, P), the Gibbs-Duhem identity sum_i x_i n d ln phi_i/dn_j = 0
 * and the symmetry of n d ln phi_i / dn_j (both exact consequences of ln phi_i = d(n g_r/RT)/dn_i;
 * Michelsen & Mollerup, Thermodynamic Models, 2nd ed. 2007, ch. 2), the ideal-gas limit, and the
 * root choice.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { fugacityDerivatives, phaseFugacityAtTP } from "../../../kernel-lib/src/state/fugacity.js";
import { PhaseUnavailableError } from "../../../kernel-lib/src/errors.js";

const gas = defineFluid({
  components: ["methane", "ethane", "propane", "n-butane"],
  model: "peng-robinson",
});
const x = [0.7, 0.15, 0.1, 0.05];

describe("phase fugacity at (T, P)", () => {
  it("takes the same root and ln phi as the full state", () => {
    for (const [T, P] of [
      [300, 50e5],
      [250, 20e5],
      [200, 60e5],
    ]) {
      const f = phaseFugacityAtTP(gas.model, T, P, x, "stable");
      const s = gas.stateAtTP(T, P, x);
      expect(f.densityMolPerM3).toBe(s.densityMolPerM3);
      f.lnPhi.forEach((v, i) => expect(v).toBe(s.lnPhi[i]));
    }
  });

  it("gives the liquid and the vapour roots where both exist", () => {
    // propane-rich liquid at 250 K, 5 bar: a gas-like and a liquid-like root (a cubic has both
    // below the spinodal pressures); the liquid is the denser
    const lean = [0.01, 0.04, 0.9, 0.05];
    const v = phaseFugacityAtTP(gas.model, 250, 2e5, lean, "vapor");
    const l = phaseFugacityAtTP(gas.model, 250, 2e5, lean, "liquid");
    expect(l.stableRootCount).toBe(2);
    expect(l.densityMolPerM3).toBeGreaterThan(10 * v.densityMolPerM3);
  });

  it("refuses a model without a stable root with a typed error", () => {
    const fake = {
      ...gas.model,
      densityRoots: () => [],
    };
    expect(() => phaseFugacityAtTP(fake, 300, 1e5, x)).toThrow(PhaseUnavailableError);
  });
});

describe("fugacity derivatives", () => {
  const cases: [string, number, number, readonly number[], "vapor" | "liquid"][] = [
    ["gas", 300, 50e5, x, "vapor"],
    ["liquid", 220, 40e5, [0.2, 0.2, 0.4, 0.2], "liquid"],
    ["trace component", 280, 30e5, [0.9, 0.0999, 1e-4, 0], "vapor"],
  ];
  for (const [name, T, P, z, phase] of cases) {
    it(`${name}: T and P derivatives match central differences of re-solved ln phi`, () => {
      const f = phaseFugacityAtTP(gas.model, T, P, z, phase);
      const d = fugacityDerivatives(gas.model, T, f.densityMolPerM3, z);
      const hT = 1e-3;
      const tUp = phaseFugacityAtTP(gas.model, T + hT, P, z, phase).lnPhi;
      const tDn = phaseFugacityAtTP(gas.model, T - hT, P, z, phase).lnPhi;
      const hP = P * 1e-5;
      const pUp = phaseFugacityAtTP(gas.model, T, P + hP, z, phase).lnPhi;
      const pDn = phaseFugacityAtTP(gas.model, T, P - hP, z, phase).lnPhi;
      for (let i = 0; i < z.length; i++) {
        const numT = (tUp[i] - tDn[i]) / (2 * hT);
        const numP = (pUp[i] - pDn[i]) / (2 * hP);
        expect(Math.abs(d.dLnPhiDT[i] - numT)).toBeLessThan(1e-6 * Math.max(1e-3, Math.abs(numT)));
        expect(Math.abs(d.dLnPhiDP[i] - numP)).toBeLessThan(1e-6 * Math.max(1e-9, Math.abs(numP)));
        expect(d.lnPhi[i]).toBeCloseTo(f.lnPhi[i], 12);
      }
    });

    it(`${name}: composition derivatives match re-solved ln phi, are symmetric and obey Gibbs-Duhem`, () => {
      const f = phaseFugacityAtTP(gas.model, T, P, z, phase);
      const d = fugacityDerivatives(gas.model, T, f.densityMolPerM3, z);
      const n = z.length;
      for (let j = 0; j < n; j++) {
        let gd = 0;
        for (let i = 0; i < n; i++) {
          gd += z[i] * d.dLnPhiDn[i][j];
          expect(d.dLnPhiDn[i][j]).toBeCloseTo(d.dLnPhiDn[j][i], 10);
        }
        expect(Math.abs(gd)).toBeLessThan(1e-7);
        // add h moles of j to one mole at constant T and P and re-solve
        const h = 1e-6;
        const up = z.map((v, k) => (v + (k === j ? h : 0)) / (1 + h));
        const lnUp = phaseFugacityAtTP(gas.model, T, P, up, phase).lnPhi;
        for (let i = 0; i < n; i++) {
          const num = (lnUp[i] - f.lnPhi[i]) / h;
          expect(Math.abs(d.dLnPhiDn[i][j] - num)).toBeLessThan(1e-4 * Math.max(1, Math.abs(num)));
        }
      }
    });
  }

  it("vanishes in the ideal-gas limit", () => {
    const f = phaseFugacityAtTP(gas.model, 400, 1, x, "vapor");
    const d = fugacityDerivatives(gas.model, 400, f.densityMolPerM3, x);
    for (let i = 0; i < x.length; i++) {
      expect(Math.abs(d.lnPhi[i])).toBeLessThan(1e-5);
      for (let j = 0; j < x.length; j++) expect(Math.abs(d.dLnPhiDn[i][j])).toBeLessThan(1e-5);
      // v_i -> R T / P
      expect((d.partialMolarVolume[i] * 1) / (8.314462618 * 400)).toBeCloseTo(1, 4);
    }
  });
});
