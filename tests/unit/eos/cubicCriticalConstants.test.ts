import { describe, expect, it } from "vitest";
import { CUBIC_FAMILIES } from "../../../kernel-lib/src/eos/cubic/cubicFamilies.js";
import { createCubicModel } from "../../../kernel-lib/src/eos/cubic/cubicModel.js";
import { R } from "../../../kernel-lib/src/constants.js";
import { comps } from "./helpers.js";

describe("cubic critical constants", () => {
  it("van der Waals: Omega_a = 27/64, Omega_b = 1/8, Zc = 3/8 (closed form of the critical conditions)", () => {
    const f = CUBIC_FAMILIES["van-der-waals"];
    expect(f.omegaA).toBeCloseTo(27 / 64, 14);
    expect(f.omegaB).toBeCloseTo(1 / 8, 14);
    expect(f.criticalZ).toBeCloseTo(3 / 8, 14);
  });
  it("Redlich-Kwong and SRK: Omega_a = 0.42748, Omega_b = 0.08664, Zc = 1/3 (Redlich & Kwong 1949; Soave 1972)", () => {
    for (const id of ["redlich-kwong", "soave-redlich-kwong"] as const) {
      const f = CUBIC_FAMILIES[id];
      expect(f.omegaA).toBeCloseTo(0.42748, 5);
      expect(f.omegaB).toBeCloseTo(0.08664, 5);
      expect(f.criticalZ).toBeCloseTo(1 / 3, 12);
      // exact forms: Omega_b = (2^(1/3) - 1)/3, Omega_a = 1/(9 (2^(1/3) - 1))
      expect(f.omegaB).toBeCloseTo((Math.cbrt(2) - 1) / 3, 14);
      expect(f.omegaA).toBeCloseTo(1 / (9 * (Math.cbrt(2) - 1)), 13);
    }
  });
  it("Peng-Robinson: Omega_a = 0.45724, Omega_b = 0.07780, Zc = 0.3074 (Peng & Robinson 1976, eqs. 9-11)", () => {
    const f = CUBIC_FAMILIES["peng-robinson"];
    expect(f.omegaA).toBeCloseTo(0.45724, 5);
    expect(f.omegaB).toBeCloseTo(0.0778, 5);
    expect(f.criticalZ).toBeCloseTo(0.3074, 4);
  });
  it("at (Tc, Pc) the pure-fluid cubic has a triple root at rho_c = Pc / (Zc R Tc)", () => {
    for (const id of Object.keys(CUBIC_FAMILIES) as (keyof typeof CUBIC_FAMILIES)[]) {
      const [m] = comps("methane");
      const model = createCubicModel(id, [m]);
      const rhoC =
        m.criticalPressurePa / (CUBIC_FAMILIES[id].criticalZ * R * m.criticalTemperatureK);
      const r = model.residual(m.criticalTemperatureK, rhoC, [1]);
      // P = Pc, dP/drho = 0, d2P/drho2 = 0 at the critical point
      const P = rhoC * R * m.criticalTemperatureK * (1 + r.aD);
      expect(P / m.criticalPressurePa).toBeCloseTo(1, 10);
      expect(1 + 2 * r.aD + r.aDD).toBeCloseTo(0, 9);
      // d2P/drho2 ~ (2 aD + 4 aDD + aDDD)/rho
      expect(2 * r.aD + 4 * r.aDD + r.aDDD!).toBeCloseTo(0, 8);
    }
  });
});
