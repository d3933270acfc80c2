/**
 * Phase labels of mixture states by the phase identification parameter (Venkatarathnam and
 * Oellrich, Fluid Phase Equilib. 301 (2011) 225-233; state/phaseLabel.ts): the ideal-gas limit,
 * a liquid, a compressed natural gas that Kay's pseudo-critical rule called "supercritical", and
 * the aDDD route against the central-difference route.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { phaseIdentificationParameter } from "../../../kernel-lib/src/state/phaseLabel.js";
import type { ResidualModel } from "../../../kernel-lib/src/eos/types.js";

describe("phase identification parameter", () => {
  const gas = defineFluid({ components: ["methane", "ethane", "propane"] });
  const z = [0.9, 0.07, 0.03];
  it("tends to 1 at vanishing density (the ideal gas has PIP = 1 exactly, from its definition)", () => {
    const pip = phaseIdentificationParameter(gas.model, 300, 1e-3, z);
    expect(Math.abs(pip - 1)).toBeLessThan(1e-6);
  });
  it("a natural gas at 60 barg and 300 K is a vapour, not supercritical", () => {
    // Kay's rule puts this gas's pseudo-critical point at about 204 K and 46 bar (mole-fraction
    // averages of the table's Tc and Pc, hand calculation), so T and P are both above it and the
    // old label was "supercritical"; PIP says vapour-like
    const s = gas.stateAtTP(300, 61.01325e5, z);
    expect(s.phase).toBe("vapor");
    expect(phaseIdentificationParameter(gas.model, 300, s.densityMolPerM3, z)).toBeLessThan(1);
  });
  it("a hydrocarbon liquid is liquid-like", () => {
    const oil = defineFluid({ components: ["n-hexane", "n-heptane"] });
    const s = oil.stateAtTP(300, 1e5, [0.5, 0.5]);
    expect(s.phase).toBe("liquid");
    expect(
      phaseIdentificationParameter(oil.model, 300, s.densityMolPerM3, [0.5, 0.5]),
    ).toBeGreaterThan(1);
  });
  it("the closed-form aDDD and the central difference agree", () => {
    const model = gas.model;
    const withoutAddd: ResidualModel = {
      info: model.info,
      residual: (T, rho, x, req) => ({ ...model.residual(T, rho, x, req), aDDD: undefined }),
      maxDensity: (T, x) => model.maxDensity(T, x),
    };
    for (const rho of [100, 3000, 12000]) {
      const a = phaseIdentificationParameter(model, 250, rho, z);
      const b = phaseIdentificationParameter(withoutAddd, 250, rho, z);
      expect(Math.abs(a - b)).toBeLessThan(1e-6 * Math.max(1, Math.abs(a)));
    }
  });
});
