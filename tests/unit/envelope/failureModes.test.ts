/**
 * Failure modes (5) and (6) of issue 12's "Why", each as a named test (modes (1)-(4) are in
 * tests/unit/flash/flashTP.test.ts "failure modes engineers report", (4) also in
 * tests/unit/flash/singlePhaseInDome.test.ts):
 *  (5) an envelope that stops near the cricondentherm or runs on past the critical point with
 *      nonsense;
 *  (6) any water in the stream breaking the envelope.
 * The checks are internal consistency (no external values): every point an equilibrium of the
 * feed with its incipient phase (ln f recomputed here), the kinds switching from dew to bubble
 * exactly once, at the critical point found on its own by the Heidemann-Khalil criteria.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { phaseEnvelope, type PhaseEnvelope } from "../../../kernel-lib/src/phase/envelope/index.js";
import { saturationAtTemperature } from "../../../kernel-lib/src/phase/saturation.js";
import { phaseFugacityAtTP } from "../../../kernel-lib/src/state/fugacity.js";
import type { ResidualModel } from "../../../kernel-lib/src/eos/types.js";

/** max |ln f_i(feed) - ln f_i(incipient)| and max |ln K_i| at an envelope point. */
function pointResidual(
  model: ResidualModel,
  z: readonly number[],
  p: PhaseEnvelope["points"][number],
): { gap: number; maxLnK: number } {
  const feed = phaseFugacityAtTP(model, p.T, p.P, z);
  const inc = phaseFugacityAtTP(model, p.T, p.P, p.incipient);
  let gap = 0;
  let maxLnK = 0;
  z.forEach((zi, i) => {
    if (!(zi > 0)) return;
    const d = Math.log(zi) + feed.lnPhi[i] - Math.log(p.incipient[i]) - inc.lnPhi[i];
    gap = Math.max(gap, Math.abs(d));
    maxLnK = Math.max(maxLnK, Math.abs(Math.log(p.incipient[i] / zi)));
  });
  return { gap, maxLnK };
}

describe("failure modes of issue 12 (envelopes)", () => {
  it("(5) the envelope goes round the cricondentherm and through the critical point, no nonsense past it", () => {
    // a gas-condensate-like feed (invented demo composition): dew branch, cricondentherm,
    // critical point, bubble branch
    const ids = ["methane", "ethane", "propane", "n-butane", "n-hexane", "n-decane"];
    const z = [0.75, 0.08, 0.06, 0.05, 0.04, 0.02];
    const fluid = defineFluid({ components: ids, model: "peng-robinson" });
    const env = phaseEnvelope(fluid, z);
    expect(env.complete).toBe(true);
    expect(env.stoppedBecause).toBeUndefined();
    // the cricondentherm is passed: dew points on both sides of it, at lower and higher pressure
    const ct = env.cricondentherm!;
    expect(ct).toBeDefined();
    const dew = env.points.filter((p) => p.kind === "dew");
    expect(dew.some((p) => p.P < ct.P && p.T < ct.T - 1)).toBe(true);
    expect(dew.some((p) => p.P > ct.P && p.T < ct.T - 1)).toBe(true);
    // the kinds switch once, dew to bubble, at the one critical point, which agrees with the
    // Heidemann-Khalil point solved on its own
    let switches = 0;
    for (let k = 1; k < env.points.length; k++)
      if (env.points[k].kind !== env.points[k - 1].kind) switches++;
    expect(switches).toBe(1);
    expect(env.critical).toHaveLength(1);
    const hk = fluid.mixtureCriticalPoint(z);
    expect(env.critical[0].T / hk.temperatureK).toBeCloseTo(1, 6);
    expect(env.critical[0].P / hk.pressurePa).toBeCloseTo(1, 6);
    // every point, on both sides of the critical point, is a non-trivial equilibrium
    for (const p of env.points) {
      const r = pointResidual(fluid.model, z, p);
      expect(r.gap).toBeLessThan(1e-9);
      expect(r.maxLnK).toBeGreaterThan(1e-4);
      expect(p.P).toBeGreaterThan(0);
      expect(p.P).toBeLessThanOrEqual(env.cricondenbar!.P * (1 + 1e-9));
      expect(p.T).toBeLessThanOrEqual(ct.T * (1 + 1e-9));
    }
  });

  it("(6) water in the stream does not break the envelope: it closes or says where it stopped", () => {
    // the wet gas of a compressor suction (invented): water condenses first, so the dew line of
    // the envelope is the water dew line. Before, the trace started at the hydrocarbon dew point
    // at 1 bar, found water unstable there, and returned no point at all; a hydrocarbon liquid
    // beside the water makes three phases, where a two-phase line has to stop and say so
    const ids = ["nitrogen", "carbon-dioxide", "methane", "ethane", "propane", "n-butane", "water"];
    const fluid = defineFluid({ components: ids, model: "peng-robinson" });
    const pureWater = defineFluid({ components: ["water"], model: "peng-robinson" });
    for (const water of [1e-4, 0.003, 0.05]) {
      const dry = [0.01, 0.02, 0.85, 0.07, 0.035, 0.015];
      const z = [...dry.map((v) => v * (1 - water)), water];
      let env: PhaseEnvelope | undefined;
      expect(() => {
        env = phaseEnvelope(fluid, z);
      }, `water ${water}`).not.toThrow();
      const e = env!;
      expect(e.points.length, `water ${water}`).toBeGreaterThan(5);
      if (!e.complete) {
        expect(e.stoppedBecause).toMatch(/T = [0-9.]+ K, P = [0-9.e+]+ Pa/);
        expect(e.warnings.length).toBeGreaterThan(0);
      }
      for (const p of e.points) expect(pointResidual(fluid.model, z, p).gap).toBeLessThan(1e-9);
      // the line starts at the water dew point: a nearly pure water drop, where the water
      // partial pressure is close to pure water's vapour pressure of the same model (ideal gas,
      // pure liquid: within 5 %, common practice, no source)
      const first = e.points[0];
      expect(first.kind).toBe("dew");
      expect(first.incipient[6]).toBeGreaterThan(0.99);
      const psat = saturationAtTemperature(pureWater.model, first.T).pressurePa;
      expect((water * first.P) / psat).toBeGreaterThan(0.95);
      expect((water * first.P) / psat).toBeLessThan(1.05);
    }
  });
});
