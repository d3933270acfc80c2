import { describe, expect, it } from "vitest";
import { createExplorerState } from "../../../kernel-lib/src/explorers/createExplorerState.js";
import {
  EXPLORER_REFERENCE_TEXT,
  ExplorerFluids,
} from "../../../kernel-lib/src/explorers/explorerFluids.js";
import type { PressureEnthalpyExplorerState } from "../../../kernel-lib/src/explorers/explorerState.js";
import {
  pointState,
  pressureEnthalpyExplorer,
} from "../../../kernel-lib/src/explorers/pressureEnthalpyExplorer.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import type { FluidBinding } from "../../../kernel-lib/src/state/types.js";
import { stateAtTP } from "../../../kernel-lib/src/state/stateAt.js";

const explorer = (components: string): PressureEnthalpyExplorerState =>
  createExplorerState("pressure-enthalpy", { components }) as PressureEnthalpyExplorerState;

describe("one reference state for every model of an explorer", () => {
  it("gives the same vapour state nearly the same h under two models (not thousands of kJ/kg apart)", () => {
    // Before the shared basis, CO2 moved from about -21 to -8916 kJ/kg on switching to
    // Peng-Robinson. What remains is the models' own difference: for a vapour well below its
    // critical pressure a cubic equation's residual enthalpy is within a few kJ/kg of a reference
    // equation's (common practice, no source); 5 kJ/kg is the bound asserted here.
    for (const fluid of ["carbon dioxide", "methane"]) {
      const state = explorer(fluid);
      const fluids = new ExplorerFluids(state.components);
      const M = state.components[0].molarMassKgPerMol;
      const pr = pressureEnthalpyExplorer.update(state, "model", "peng-robinson", fluids);
      const a = pointState(state, fluids);
      const b = pointState(pr, fluids);
      expect(a.kind, fluid).toBe("single-phase");
      expect(b.kind, fluid).toBe("single-phase");
      if (a.kind === "single-phase" && b.kind === "single-phase") {
        expect(b.state.temperatureK).toBeCloseTo(a.state.temperatureK, 6);
        expect(Math.abs(b.state.molar.h - a.state.molar.h) / M, fluid).toBeLessThan(5e3);
        expect(Math.abs(b.state.molar.s - a.state.molar.s) / M, fluid).toBeLessThan(20);
      }
    }
  });

  it("puts h = s = 0 at the stated state (the nearly ideal gas at 25 degC) for every model", () => {
    // At 1 kPa the residual part is P (B - T dB/dT) ~ 1e3 Pa x 4e-4 m3/mol = 0.4 J/mol for CO2
    // (second virial coefficient about -120 cm3/mol at 298 K, from memory of Dymond and Smith,
    // The Virial Coefficients of Pure Gases and Mixtures, 1980): zero within 2 J/mol.
    const fluids = new ExplorerFluids(explorer("carbon dioxide").components);
    for (const model of ["reference", "peng-robinson", "soave-redlich-kwong"] as const) {
      const s = stateAtTP(fluids.fluid(model).binding, 298.15, 1e3, [1]);
      expect(Math.abs(s.molar.h), model).toBeLessThan(2);
      // s at 1 kPa is s(1 bar) + R ln(100) = 38.29 J/(mol K) for the ideal gas
      expect(s.molar.s, model).toBeCloseTo(8.314462618 * Math.log(100), 1);
    }
  });

  it("moves only the zero: differences between states of one model are unchanged", () => {
    const components = explorer("carbon dioxide").components;
    const fluids = new ExplorerFluids(components);
    const shared = fluids.fluid("peng-robinson").binding;
    const own = defineFluid({ components, model: "peng-robinson" }); // its own (formation) basis
    const states: [number, number][] = [
      [250, 3e6],
      [320, 1e7],
      [400, 2e5],
    ];
    const h = (b: FluidBinding) => states.map(([T, P]) => stateAtTP(b, T, P, [1]).molar);
    const [a, b] = [h(shared), h(own)];
    for (let i = 1; i < states.length; i++) {
      expect(a[i].h - a[0].h).toBeCloseTo(b[i].h - b[0].h, 6);
      expect(a[i].s - a[0].s).toBeCloseTo(b[i].s - b[0].s, 9);
    }
    expect(Math.abs(a[0].h - b[0].h)).toBeGreaterThan(1e5); // the zero did move (formation: -393.5 kJ/mol)
  });

  it("states the basis in the chart subtitle, the table note and the status line", () => {
    const state = explorer("carbon dioxide");
    const fluids = new ExplorerFluids(state.components);
    expect(pressureEnthalpyExplorer.status!(state, fluids)).toContain(EXPLORER_REFERENCE_TEXT);
    expect(pressureEnthalpyExplorer.table!(state, fluids)).toContain(EXPLORER_REFERENCE_TEXT);
    expect(JSON.stringify(pressureEnthalpyExplorer.chart(state, fluids))).toContain(
      "h = 0 for the ideal gas at 25 degC, 1 bar",
    );
  });
});
