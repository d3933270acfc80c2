/**
 * The warm start of the isothermal flash (FlashOptions.initialLnK): the split converged from
 * nearby K-values skips the feed's stability test but not the tests of its phases, so the answer
 * must be the cold flash's (the same phases, amounts and compositions; a missed third phase still
 * found; a stable feed still one phase), only reached with less work. Checked against the flash
 * without the warm start, which is checked against published data elsewhere (flashTP.test.ts).
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { InputError, SolverError } from "../../../kernel-lib/src/errors.js";
import type { Equilibrium } from "../../../kernel-lib/src/phase/flash/types.js";

const gas = defineFluid({ components: ["methane", "ethane", "propane", "n-butane"] });
const z = [0.7, 0.12, 0.1, 0.08];

function lnK(eq: Equilibrium): number[] {
  const y = eq.phases[0].state.x;
  const x = eq.phases[1].state.x;
  return y.map((v, i) => Math.log(v / x[i]));
}

function expectSame(a: Equilibrium, b: Equilibrium): void {
  expect(a.phases.length).toBe(b.phases.length);
  for (let k = 0; k < a.phases.length; k++) {
    expect(a.phases[k].kind).toBe(b.phases[k].kind);
    expect(Math.abs(a.phases[k].amount - b.phases[k].amount)).toBeLessThan(1e-9);
    a.phases[k].state.x.forEach((v, i) =>
      expect(Math.abs(v - b.phases[k].state.x[i])).toBeLessThan(1e-9),
    );
  }
}

describe("flashTP warm start (options.initialLnK)", () => {
  const near = gas.flashTP(235, 40e5, z);

  it("gives the cold flash's split from a nearby state's K-values, by the warm route", () => {
    expect(near.phases.length).toBe(2);
    const cold = gas.flashTP(240, 42e5, z);
    const warm = gas.flashTP(240, 42e5, z, { initialLnK: lnK(near) });
    expect(cold.phases.length).toBe(2);
    expectSame(warm, cold);
    expect(warm.check.method).toMatch(/initialLnK/);
    expect(cold.check.method).not.toMatch(/initialLnK/);
  });

  it("still finds one phase where the feed is stable", () => {
    const cold = gas.flashTP(320, 42e5, z);
    const warm = gas.flashTP(320, 42e5, z, { initialLnK: lnK(near) });
    expect(cold.phases.length).toBe(1);
    expectSame(warm, cold);
  });

  it("ends in the cold answer from K-values of another split (a split Wilson's starts miss)", () => {
    // the missed second liquid of missedLiquid.test.ts (ethylene, H2S, n-butane, n-decane,
    // n-hexane at 185 K, 67 kPa), started from an arbitrary vapour-over-liquid guess of ln K:
    // whatever split that converges to, the tests of its phases must lead to the cold answer
    const fluid = defineFluid({
      components: ["ethylene", "hydrogen-sulfide", "n-butane", "n-decane", "n-hexane"],
    });
    const T = 185.21456761518493;
    const P = 66878.04842359781;
    const zz = [
      0.11488552092459564, 0.5338139580917703, 0.1109572902174243, 0.11656839417908156,
      0.12377483658712816,
    ];
    const guess = [3, 1, -2, -8, -5];
    let cold: Equilibrium;
    try {
      cold = fluid.flashTP(T, P, zz);
    } catch (e) {
      expect(e).toBeInstanceOf(SolverError);
      expect(() => fluid.flashTP(T, P, zz, { initialLnK: guess })).toThrow(SolverError);
      return;
    }
    // Wilson's starts alone miss this split (the reason for the nearly pure trials)
    expect(fluid.flashTP(T, P, zz, { extraTrials: "none" }).phases.length).toBeLessThan(
      cold.phases.length,
    );
    expectSame(fluid.flashTP(T, P, zz, { initialLnK: guess }), cold);
  });

  it("refuses K-values of the wrong length, naming the option", () => {
    expect(() => gas.flashTP(240, 42e5, z, { initialLnK: [1, 0] })).toThrow(InputError);
    expect(() => gas.flashTP(240, 42e5, z, { initialLnK: [1, 0] })).toThrow(/initialLnK/);
  });
});
