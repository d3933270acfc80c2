import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { simulateVessel } from "../../../kernel-lib/src/process/vessel/simulateVessel.js";

// methane + n-butane (PR): at 300 K and 30 bar a gas over a butane-rich liquid
const mix = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
const eq = mix.flashTP(300, 30e5, [0.5, 0.5]);
const gasPhase = eq.phases.find((p) => p.kind === "vapor")!;
const liquidPhase = eq.phases.find((p) => p.kind === "liquid")!;

describe("a vessel with a liquid layer", () => {
  it("starts from the given equilibrium phases and level, stays two-phase, balances close", () => {
    const run = simulateVessel({
      fluid: mix,
      shape: { kind: "horizontal-cylinder", diameterM: 1.2, lengthM: 3 },
      initial: {
        temperatureK: 300,
        pressurePa: 30e5,
        vapor: { y: gasPhase.state.x },
        liquid: { x: liquidPhase.state.x, levelM: 0.4 },
      },
      outlets: [{ diameterM: 0.02, dischargeCoefficient: 0.8 }],
      until: { pressurePa: 20e5 },
    });
    // the phases given are the flash's own: the equilibrated start is the given state
    expect(Math.abs(run.series.pressurePa[0] / 30e5 - 1)).toBeLessThan(1e-6);
    expect(Math.abs(run.series.temperatureK[0] - 300)).toBeLessThan(1e-5);
    expect(run.warnings.some((w) => /not in equilibrium/.test(w.message))).toBe(false);
    expect(run.series.phaseCount.every((n) => n === 2)).toBe(true);
    // the liquid volume at the start is that of the 0.4 m level
    const D = 1.2;
    const R = D / 2;
    const h = 0.4;
    const segment = R * R * Math.acos((R - h) / R) - (R - h) * Math.sqrt(2 * R * h - h * h);
    const heads = ((Math.PI * h * h * (3 * R - h)) / 3) * (D / 4 / R); // two 2:1 heads
    expect(run.series.liquidVolumeM3[0]).toBeCloseTo(segment * 3 + heads, 6);
    // the gas leaves from the top: the liquid fraction rises as the gas is drawn off and cools
    const last = run.series.timeS.length - 1;
    expect(run.series.liquidFraction[last]).toBeGreaterThan(run.series.liquidFraction[0]);
    expect(run.balance.massRelativeError).toBeLessThan(1e-8);
    expect(run.balance.energyRelativeError).toBeLessThan(1e-8);
  });
});
