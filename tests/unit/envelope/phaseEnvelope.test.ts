/**
 * The phase envelope (phase/envelope/phaseEnvelope.ts, traceLine.ts): internal consistency on the
 * ten-component rich gas of the benchmarks (every point a verified equilibrium, the crossing at
 * the Heidemann-Khalil critical point, cricondenbar and cricondentherm the extremes, the stability
 * test unstable just inside and stable just outside, continuity), quality lines, a binary against
 * its bubble and dew points, a water-containing stream that must stop with a reason, and input.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import {
  phaseEnvelope,
  saturationPointAtPressure,
  saturationPointAtTemperature,
  type PhaseEnvelope,
} from "../../../kernel-lib/src/phase/envelope/index.js";
import { stabilityAtTP } from "../../../kernel-lib/src/phase/stability.js";
import { phaseFugacityAtTP } from "../../../kernel-lib/src/state/fugacity.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import type { ResidualModel } from "../../../kernel-lib/src/eos/types.js";

const TEN = [
  "nitrogen",
  "carbon-dioxide",
  "methane",
  "ethane",
  "propane",
  "isobutane",
  "n-butane",
  "isopentane",
  "n-pentane",
  "n-hexane",
];
const X10 = [0.02, 0.03, 0.7, 0.1, 0.06, 0.02, 0.03, 0.015, 0.015, 0.01];
const gas = defineFluid({ components: TEN, model: "peng-robinson" });
const env = phaseEnvelope(gas, X10, { vaporFractions: [0.1, 0.5, 0.9] });

/** max |ln f_i(feed) - ln f_i(incipient)| at an envelope point, each in its stable root. */
function gap(
  model: ResidualModel,
  z: readonly number[],
  p: PhaseEnvelope["points"][number],
): number {
  const feed = phaseFugacityAtTP(model, p.T, p.P, z);
  const inc = phaseFugacityAtTP(model, p.T, p.P, p.incipient);
  let g = 0;
  z.forEach((zi, i) => {
    if (zi > 0) {
      const d = Math.log(zi) + feed.lnPhi[i] - Math.log(p.incipient[i]) - inc.lnPhi[i];
      g = Math.max(g, Math.abs(d));
    }
  });
  return g;
}

describe("envelope of the ten-component rich gas (PR)", () => {
  it("closes from 1 bar to 1 bar without warnings", () => {
    expect(env.complete).toBe(true);
    expect(env.stoppedBecause).toBeUndefined();
    expect(env.warnings).toEqual([]);
    const first = env.points[0];
    const last = env.points[env.points.length - 1];
    expect(first.kind).toBe("dew");
    expect(last.kind).toBe("bubble");
    expect(first.P).toBeCloseTo(1e5, 3);
    expect(last.P).toBeCloseTo(1e5, 3);
    expect(first.T).toBeGreaterThan(last.T);
  });

  it("every point is a verified equilibrium (equal fugacity recomputed independently)", () => {
    for (const p of env.points) {
      expect(gap(gas.model, X10, p)).toBeLessThan(1e-9);
      expect(p.incipient.reduce((s, v) => s + v, 0)).toBeCloseTo(1, 12);
      expect(p.vaporFraction).toBe(p.kind === "dew" ? 1 : 0);
    }
  });

  it("passes through the Heidemann-Khalil critical point where dew turns to bubble", () => {
    expect(env.critical).toHaveLength(1);
    // the crossing interpolated along the line (independent of Heidemann-Khalil) agrees with the
    // criteria solved on their own from the pseudo-critical start, to the interpolation's
    // accuracy (steps of at most 0.04 in ln K across the crossing: 1e-4, common practice, no source)
    const crossing = env.criticalCrossings[0];
    const hk = gas.mixtureCriticalPoint(X10);
    expect(Math.abs(crossing.T / hk.temperatureK - 1)).toBeLessThan(1e-4);
    expect(Math.abs(crossing.P / hk.pressurePa - 1)).toBeLessThan(1e-4);
    const c = env.critical[0];
    expect(c.T / hk.temperatureK).toBeCloseTo(1, 6);
    expect(c.P / hk.pressurePa).toBeCloseTo(1, 6);
    // it lies between the last dew and the first bubble point
    const k = env.points.findIndex((p) => p.kind === "bubble");
    expect(k).toBeGreaterThan(0);
    const a = env.points[k - 1];
    const b = env.points[k];
    expect(c.T).toBeGreaterThan(Math.min(a.T, b.T) - 1e-9);
    expect(c.T).toBeLessThan(Math.max(a.T, b.T) + 1e-9);
  });

  it("the cricondenbar is the highest pressure, the cricondentherm the highest temperature", () => {
    const cb = env.cricondenbar!;
    const ct = env.cricondentherm!;
    for (const p of env.points) {
      expect(p.P).toBeLessThanOrEqual(cb.P * (1 + 1e-10));
      expect(p.T).toBeLessThanOrEqual(ct.T * (1 + 1e-10));
    }
    // both are equilibrium points of the envelope: a dew or bubble point at their pressure
    const atCt = saturationPointAtPressure(gas, ct.P, X10, {
      vaporFraction: 1,
      start: { temperatureK: ct.T },
    });
    expect(atCt.temperatureK / ct.T).toBeCloseTo(1, 8);
    // the retrograde region: the cricondentherm lies above the critical temperature here
    expect(ct.T).toBeGreaterThan(env.critical[0].T);
    expect(cb.P).toBeGreaterThan(env.critical[0].P);
  });

  it("the extremes are stationary: neighbouring points on either side lie below them", () => {
    const ct = env.cricondentherm!;
    for (const f of [0.98, 1.02]) {
      const p = saturationPointAtPressure(gas, ct.P * f, X10, {
        vaporFraction: 1,
        start: { temperatureK: ct.T },
      });
      expect(p.temperatureK).toBeLessThan(ct.T);
      // quadratic near the maximum: 2 % in P moves T by far less than 1 K
      expect(ct.T - p.temperatureK).toBeLessThan(1);
    }
    const cb = env.cricondenbar!;
    // the cricondenbar of this gas lies above its critical temperature, on the dew line
    expect(cb.T).toBeGreaterThan(env.critical[0].T);
    // started from the envelope point nearest to it (K = y/x = z / incipient liquid): Wilson's
    // K-factors at 125 bar are too crude to pick the upper dew point
    let near = env.points[0];
    for (const q of env.points) if (Math.abs(q.P - cb.P) < Math.abs(near.P - cb.P)) near = q;
    const kFactors = X10.map((zi, i) => zi / near.incipient[i]);
    for (const dT of [-1, 1]) {
      const p = saturationPointAtTemperature(gas, cb.T + dT, X10, {
        vaporFraction: 1,
        start: { pressurePa: cb.P, kFactors },
      });
      expect(p.kind).toBe("dew");
      expect(p.pressurePa).toBeLessThan(cb.P);
      expect(cb.P - p.pressurePa).toBeLessThan(0.01 * cb.P);
    }
  });

  it("the stability test says unstable a few K inside and stable a few K outside", () => {
    // on the dew branch below the cricondentherm's pressure the inside is colder; on the bubble
    // branch the inside is warmer (lines far from the critical region, 3 K off the line)
    const ctP = env.cricondentherm!.P;
    const dew = env.points.filter((p) => p.kind === "dew" && p.P < 0.5 * ctP);
    const bubble = env.points.filter((p) => p.kind === "bubble" && p.P < 0.5 * env.critical[0].P);
    expect(dew.length).toBeGreaterThan(3);
    expect(bubble.length).toBeGreaterThan(3);
    for (const p of [dew[1], dew[Math.floor(dew.length / 2)], dew[dew.length - 1]]) {
      expect(stabilityAtTP(gas.model, p.T - 3, p.P, X10).stable).toBe(false);
      expect(stabilityAtTP(gas.model, p.T + 3, p.P, X10).stable).toBe(true);
    }
    for (const p of [bubble[1], bubble[Math.floor(bubble.length / 2)], bubble[bubble.length - 1]]) {
      expect(stabilityAtTP(gas.model, p.T + 3, p.P, X10).stable).toBe(false);
      expect(stabilityAtTP(gas.model, p.T - 3, p.P, X10).stable).toBe(true);
    }
  });

  it("is continuous: neighbouring points within 1.5 x the default step limits", () => {
    // the limits (0.03 in ln T, 0.15 in ln P) cap the predicted step; Newton's correction may
    // move a little further, a jump to another branch much further
    for (let k = 1; k < env.points.length; k++) {
      const a = env.points[k - 1];
      const b = env.points[k];
      expect(Math.abs(Math.log(b.T / a.T))).toBeLessThan(1.5 * 0.03);
      expect(Math.abs(Math.log(b.P / a.P))).toBeLessThan(1.5 * 0.15);
    }
  });

  it("lines of vapour fraction 0.1, 0.5 and 0.9 lie inside and are equilibria", () => {
    const lines = env.qualityLines!;
    expect(lines.map((l) => l.vaporFraction).sort()).toEqual([0.1, 0.5, 0.9]);
    const q = lines.find((l) => l.vaporFraction === 0.5)!;
    const mid = q.points[Math.floor(q.points.length / 3)];
    // the same point from a quality point at that pressure
    const again = saturationPointAtPressure(gas, mid.P, X10, {
      vaporFraction: 0.5,
      start: { temperatureK: mid.T },
    });
    expect(again.temperatureK / mid.T).toBeCloseTo(1, 7);
    // away from the critical point, where every quality line ends and the tangent-plane test's
    // successive substitution cannot decide within its iteration cap
    const c = env.critical[0];
    for (const l of lines) {
      const away = l.points.filter((p) => Math.abs(p.T - c.T) > 5 || Math.abs(p.P / c.P - 1) > 0.1);
      expect(away.length).toBeGreaterThan(5);
      for (const p of away.filter((_, i) => i % 3 === 0)) {
        expect(stabilityAtTP(gas.model, p.T, p.P, X10).stable).toBe(false);
      }
    }
  });
});

describe("a binary envelope against its own bubble and dew points", () => {
  const c1c3 = defineFluid({ components: ["methane", "propane"], model: "peng-robinson" });
  const z = [0.5, 0.5];
  const e = phaseEnvelope(c1c3, z);
  it("closes and its points are the bubble and dew points at their pressures", () => {
    expect(e.complete).toBe(true);
    // (points above 200 K: the phases come back as full states, and the ideal-gas cp
    // correlations of the table start at 200 K)
    const dew = e.points.filter((p) => p.kind === "dew" && p.P < 20e5 && p.T > 205);
    const bubble = e.points.filter(
      (p) => p.kind === "bubble" && p.P < 0.8 * e.critical[0].P && p.T > 205,
    );
    const d = dew[dew.length - 1];
    const b = bubble[Math.floor(bubble.length / 2)];
    expect(c1c3.dewPointAtPressure(d.P, z).temperatureK / d.T).toBeCloseTo(1, 8);
    expect(c1c3.bubblePointAtPressure(b.P, z).temperatureK / b.T).toBeCloseTo(1, 8);
  });
  it("the fluid method is the same envelope", () => {
    const f = c1c3.envelope(z);
    expect(f.points.length).toBe(e.points.length);
    expect(f.critical[0].T).toBe(e.critical[0].T);
  });
});

describe("water in the stream", () => {
  // a wet rich gas (PR with the table's k_ij; methane/water defaulted to zero): the first liquid
  // at low pressure is water, and a second (hydrocarbon) liquid makes three phases. The envelope
  // must not throw: either it closes or it says where and why it stopped.
  const wet = defineFluid({
    components: ["methane", "propane", "n-butane", "water"],
    model: "peng-robinson",
  });
  for (const z of [
    [0.8, 0.1, 0.05, 0.05],
    [0.85, 0.1, 0.049, 0.001],
  ]) {
    it(`z = [${z.join(", ")}] gives a precise stop reason and only verified points`, () => {
      const e = phaseEnvelope(wet, z);
      if (!e.complete) {
        expect(e.stoppedBecause).toMatch(/T = [0-9.]+ K, P = [0-9.e+]+ Pa/);
        expect(e.warnings.some((w) => w.message.includes("incomplete"))).toBe(true);
      }
      for (const p of e.points) expect(gap(wet.model, z, p)).toBeLessThan(1e-9);
      // the water-rich liquid is detected as a third phase somewhere on the bubble side
      expect(e.stoppedBecause ?? "").toMatch(/third phase \(water/);
    });
  }
});

describe("degenerate and bad input", () => {
  it("a single component present: no envelope, a stated reason", () => {
    const f = defineFluid({ components: ["methane", "ethane"], model: "peng-robinson" });
    const e = phaseEnvelope(f, [1, 0]);
    expect(e.complete).toBe(false);
    expect(e.points).toEqual([]);
    expect(e.stoppedBecause).toMatch(/fewer than two components/);
  });
  it("refuses bad options", () => {
    const f = defineFluid({ components: ["methane", "ethane"], model: "peng-robinson" });
    expect(() => phaseEnvelope(f, [0.5, 0.5], { minimumPressurePa: 0 })).toThrow(InputError);
    expect(() => phaseEnvelope(f, [0.5, 0.5], { vaporFractions: [1] })).toThrow(InputError);
    expect(() => phaseEnvelope(f, [0.5, 0.5], { stabilityStride: 0.5 })).toThrow(InputError);
    expect(() => phaseEnvelope(f, [0.5, 0.4])).toThrow(InputError);
  });
});
