/**
 * A missed second liquid (found by the robustness slice): ethylene, H2S, n-butane, n-decane and
 * n-hexane at 185 K and 67 kPa with the table's k_ij. Five components, so the flash's "auto" rule
 * tried only water and the heaviest component as nearly pure trials; the phase it returned was
 * unstable against a nearly pure trial of another component (tm about -0.17). The flash must test
 * its returned phases with nearly pure trials of every present component and either add the
 * phase or throw a typed error: never return the unstable split.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { SolverError } from "../../../kernel-lib/src/errors.js";
import { stabilityAtTP } from "../../../kernel-lib/src/phase/stability.js";
import { recomputedFugacityGap } from "./helpers.js";

describe("flashTP: missed second liquid in a five-component feed", () => {
  it("ethylene+H2S+n-butane+n-decane+n-hexane at 185 K: stable phases or a SolverError", () => {
    const fluid = defineFluid({
      components: ["ethylene", "hydrogen-sulfide", "n-butane", "n-decane", "n-hexane"],
    });
    const T = 185.21456761518493;
    const P = 66878.04842359781;
    const z = [
      0.11488552092459564, 0.5338139580917703, 0.1109572902174243, 0.11656839417908156,
      0.12377483658712816,
    ];
    let eq: ReturnType<typeof fluid.flashTP>;
    try {
      eq = fluid.flashTP(T, P, z);
    } catch (e) {
      // a typed refusal is acceptable; it must say what failed
      expect(e).toBeInstanceOf(SolverError);
      return;
    }
    expect(recomputedFugacityGap(eq)).toBeLessThanOrEqual(1e-10);
    if (eq.phases.length < 3) {
      for (const p of eq.phases) {
        const x = p.state.x.slice();
        const t = stabilityAtTP(fluid.model, T, P, x, {
          constants: fluid.components,
          extraTrials: [0, 1, 2, 3, 4],
        });
        expect(t.minimumTangentPlaneDistance, `${p.kind} phase`).toBeGreaterThan(-1e-8);
        expect(t.stable, `${p.kind} phase`).toBe(true);
      }
    }
  });
});
