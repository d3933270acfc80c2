/**
 * The screened choke search of the equilibrium (HEM) orifice route (orifice.ts, SCREEN_AGREEMENT):
 * interior points with Wilson-start stability tests only, the returned throat with all trial
 * phases. Checked against the unscreened search (explicit trial phases, which turn screening
 * off) and against G = rho w from the (P, s) flash, computed independently of the orifice code.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { orificeMassFlux } from "../../../kernel-lib/src/process/vessel/orifice.js";

const gas = defineFluid({ components: ["methane", "ethane", "propane"], model: "peng-robinson" });
const z = [0.8, 0.12, 0.08];

describe("screened HEM choke search", () => {
  it("gives the throat of the unscreened search, and G there from the (P, s) flash", () => {
    const dew = gas.dewPointAtPressure(30e5, z);
    const st = gas.stateAtTP(dew.temperatureK * (1 + 1e-6), 30e5, z);
    const stag = {
      pressurePa: 30e5,
      temperatureK: st.temperatureK,
      x: z,
      enthalpyJPerMol: st.molar.h,
      entropyJPerMolK: st.molar.s,
      molarMassKgPerMol: st.molarMassKgPerMol,
    };
    const screened = orificeMassFlux(gas, stag, 1e5, { route: "equilibrium" });
    const full = orificeMassFlux(gas, stag, 1e5, {
      route: "equilibrium",
      flash: { extraTrials: [0, 1, 2] },
    });
    expect(screened.choked).toBe(true);
    expect(screened.twoPhaseThroat).toBe(full.twoPhaseThroat);
    expect(Math.abs(screened.massFluxKgPerM2S / full.massFluxKgPerM2S - 1)).toBeLessThan(1e-9);
    expect(Math.abs(screened.throatPressurePa / full.throatPressurePa - 1)).toBeLessThan(1e-4);
    const eq = gas.flashPS(screened.throatPressurePa, stag.entropyJPerMolK, z);
    let h = 0;
    let vol = 0;
    for (const p of eq.phases) {
      h += p.amount * p.state.molar.h;
      vol += p.amount / p.state.densityMolPerM3;
    }
    const G =
      (stag.molarMassKgPerMol / vol) *
      Math.sqrt((2 * (stag.enthalpyJPerMol - h)) / stag.molarMassKgPerMol);
    expect(Math.abs(G / screened.massFluxKgPerM2S - 1)).toBeLessThan(1e-9);
  });
});
