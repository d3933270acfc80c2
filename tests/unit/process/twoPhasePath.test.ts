/**
 * A polytropic path into the two-phase region: the single-phase integration finds a node with two
 * phases and the path is integrated again on the equilibrium route (dh / d ln P = k P v(P, h)
 * with (P, h) flashes). Checked: the route, the warning, the end state against the path's own
 * head, and the energy balance. Also the warning for liquid at a compressor suction.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { defineStream } from "../../../kernel-lib/src/process/stream.js";
import { turbine } from "../../../kernel-lib/src/process/turbine.js";
import { compressorStage } from "../../../kernel-lib/src/process/compressor.js";
import { pathStates } from "../../../kernel-lib/src/process/pathStates.js";
import { overallProperty } from "../../../kernel-lib/src/phase/flash/stateFunctionFlash.js";

const gas = defineFluid({
  components: ["methane", "propane", "n-pentane"],
  model: "peng-robinson",
});
const z = [0.8, 0.12, 0.08];

describe("polytropic path through the two-phase region", () => {
  it("an expander whose path crosses the dew line", () => {
    const hp = defineStream({
      fluid: gas,
      z,
      T: 345,
      P: 60e5,
      flow: { value: 100, unit: "kmol/h" },
    });
    expect(hp.state.phases.length).toBe(1);
    const r = turbine(hp, {
      outletPressurePa: 15e5,
      polytropicEfficiency: 0.8,
      polytropic: { tolerance: 1e-7, pathPoints: 5 },
    });
    const p = r.polytropicPath!;
    expect(p.route).toBe("equilibrium");
    expect(p.crossedTwoPhase).toBe(true);
    expect(r.outlet.state.phases.length).toBe(2);
    expect(r.exitVaporFraction).toBeLessThan(1);
    expect(p.errorEstimate).toBeLessThan(1e-7);
    // the end state's enthalpy change equals eta_p times the integral of v dP along the path
    expect(p.headConsistency).toBeLessThan(1e-5);
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    // isentropic efficiency of an expansion is above its polytropic efficiency
    expect(r.isentropicEfficiency).toBeGreaterThan(0.8);
    const states = pathStates(r);
    expect(states.length).toBe(r.path.length);
    expect(states[0].label).toBe("inlet");
    expect(states[states.length - 1].enthalpyJPerMol).toBeCloseTo(
      overallProperty(r.outlet.state, "h"),
      6,
    );
  });

  it("liquid at the compressor suction is warned about with its basis", () => {
    const wet = defineStream({
      fluid: gas,
      z,
      T: 280,
      P: 30e5,
      flow: { value: 100, unit: "kmol/h" },
    });
    expect(wet.state.phases.length).toBe(2);
    const r = compressorStage(wet, { outletPressurePa: 45e5, isentropicEfficiency: 0.75 });
    const w = r.warnings.find(
      (x) => (x as { condition?: string }).condition === "liquid-at-suction",
    );
    expect(w).toBeDefined();
    expect((w as { basis?: string } | undefined)?.basis).toMatch(/knock-out/);
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
  });
});
