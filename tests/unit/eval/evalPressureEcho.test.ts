/**
 * A state given at (T, P) carries P exactly as given (issue 16: "inputs come back with round-off
 * noise (P = 3999999.9999999995)"): the model's rho R T Z at the density root equals P only to
 * round-off, so the state reports the given pressure, in the library (stateAtTP, fluid.stateAtTP,
 * fluid.state) and in `isochor eval` (SI and with units). (The phases inside a PhaseState are
 * (T, rho) states of the flash, whose verification reads their own pressure: not checked here.) 60 barg = 6,101,325 Pa with the
 * standard atmosphere 101325 Pa (NIST SP 811, App. B).
 */
import { describe, expect, it } from "vitest";
import { evalCommand } from "../../../kernel-lib/src/cli/eval.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { pressureFromResidual } from "../../../kernel-lib/src/state/properties.js";
import { stateAtTP } from "../../../kernel-lib/src/state/stateAt.js";
import { fakeIo } from "./fakeIo.js";

const T = 300;
// round pressures an engineer types, 1 to 100 bar
const PRESSURES = Array.from({ length: 100 }, (_, i) => (i + 1) * 1e5);

describe("a (T, P) state reports P as given", () => {
  const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });

  it("the round-off exists (the model's own P differs from the given one somewhere)", () => {
    // guards the checks below: without it they could not fail
    const off = PRESSURES.filter((P) => {
      const s = stateAtTP(fluid, T, P, [1]);
      const aD = fluid.model.residual(T, s.densityMolPerM3, [1]).aD;
      return pressureFromResidual(T, s.densityMolPerM3, aD, fluid.model.gasConstant) !== P;
    });
    expect(off.length).toBeGreaterThan(0);
  });

  it("stateAtTP, fluid.stateAtTP and fluid.state (pure and mixture)", () => {
    const gas = defineFluid({ components: ["methane", "ethane"], model: "peng-robinson" });
    for (const P of PRESSURES) {
      expect(stateAtTP(fluid, T, P, [1]).pressurePa).toBe(P);
      expect(fluid.stateAtTP(T, P).pressurePa).toBe(P);
      const ps = fluid.state({ T, P });
      expect(ps.pressurePa).toBe(P);
      expect(gas.stateAtTP(T, P, [0.9, 0.1]).pressurePa).toBe(P);
      expect(gas.state({ T, P, x: [0.9, 0.1] }).pressurePa).toBe(P);
    }
  });

  it("isochor eval echoes P (SI and given with units)", async () => {
    const states = [
      ...PRESSURES.map((P) => ({ T, P })),
      { T: "30 degC", P: "60 barg" },
      { T: 300, P: "40 bar" },
    ];
    const io = fakeIo(JSON.stringify({ model: "peng-robinson", components: ["methane"], states }));
    expect(await evalCommand([], io)).toBe(0);
    const out = JSON.parse(io.out).states as { P: number }[];
    PRESSURES.forEach((P, i) => expect(out[i].P).toBe(P));
    expect(out[PRESSURES.length].P).toBe(6101325);
    expect(out[PRESSURES.length + 1].P).toBe(4e6);
    // a flash entry (phase "equilibrium") of a mixture
    const eq = fakeIo(
      JSON.stringify({
        model: "peng-robinson",
        components: ["methane", "ethane"],
        x: [0.9, 0.1],
        phase: "equilibrium",
        states: PRESSURES.map((P) => ({ T, P })),
      }),
    );
    expect(await evalCommand([], eq)).toBe(0);
    const outEq = JSON.parse(eq.out).states as { P: number }[];
    PRESSURES.forEach((P, i) => expect(outEq[i].P).toBe(P));
  });
});
