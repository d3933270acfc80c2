/**
 * The warm-started (u, v) solve of the vessel contents (contentsFlash.ts with warmSplit.ts):
 * along a path that crosses the dew line of a gas, each result must be the equilibrium the cold
 * nested (u, v) flash (flashUV, phase/flash) finds from no start, meet u and v to 1e-9, and be
 * a full isothermal flash (all stability tests); the warm route must carry the path without the
 * nested flash. The trial splits of warmSplit.ts are checked against the full flash too.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { overallProperty } from "../../../kernel-lib/src/phase/flash/stateFunctionFlash.js";
import { contentsFlash } from "../../../kernel-lib/src/process/vessel/contentsFlash.js";
import { lnKOf, warmSplit } from "../../../kernel-lib/src/process/vessel/warmSplit.js";

const gas = defineFluid({
  components: ["methane", "ethane", "propane", "n-butane", "n-hexane"],
  model: "peng-robinson",
});
const z = [0.86, 0.07, 0.04, 0.02, 0.01];

describe("warm-started contents solve", () => {
  it("follows the path across the dew line with the cold flash's answers", () => {
    // states along a cooling, expanding path: (T, P) -> (u, rho) of the equilibrium there
    const path: [number, number][] = [];
    for (let k = 0; k <= 8; k++) path.push([340 - 10 * k, 60e5 - 4e5 * k]);
    const targets = path.map(([T, P]) => {
      const eq = gas.flashTP(T, P, z);
      return {
        u: overallProperty(eq, "u"),
        rho: 1 / overallProperty(eq, "v"),
        phases: eq.phases.length,
      };
    });
    expect(targets[0].phases).toBe(1);
    expect(targets[targets.length - 1].phases).toBe(2);
    const solver = contentsFlash(gas);
    let guessT = path[0][0] + 3;
    let guessP = path[0][1] * 1.05;
    for (const t of targets) {
      const eq = solver.solve(t.u, t.rho, z, guessT, guessP);
      const cold = gas.flashUV(t.u, t.rho, z);
      expect(eq.phases.length).toBe(cold.phases.length);
      expect(Math.abs(eq.temperatureK / cold.temperatureK - 1)).toBeLessThan(1e-7);
      expect(Math.abs(eq.pressurePa / cold.pressurePa - 1)).toBeLessThan(1e-6);
      const uScale = Math.max(Math.abs(t.u), 8.314 * eq.temperatureK);
      expect(Math.abs(overallProperty(eq, "u") - t.u) / uScale).toBeLessThanOrEqual(1e-9);
      expect(Math.abs(overallProperty(eq, "v") * t.rho - 1)).toBeLessThanOrEqual(1e-9);
      // a full flash: its stability verdict is there (the trial splits carry none)
      expect(eq.stability).toBeDefined();
      guessT = eq.temperatureK;
      guessP = eq.pressurePa;
    }
    expect(solver.fallbacks).toBe(0);
  });

  it("trial splits from nearby K-values equal the full flash's split", () => {
    const near = gas.flashTP(240, 30e5, z);
    const lnK = lnKOf(near);
    expect(lnK).toBeDefined();
    const trial = warmSplit(gas, 244, 31e5, z, lnK!);
    const full = gas.flashTP(244, 31e5, z);
    expect(trial).toBeDefined();
    expect(full.phases.length).toBe(2);
    expect(Math.abs(trial!.phases[0].amount - full.phases[0].amount)).toBeLessThan(1e-9);
    // where the feed is one phase the trial gives no split (the caller takes the full flash)
    expect(warmSplit(gas, 320, 31e5, z, lnK!)).toBeUndefined();
  });
});
