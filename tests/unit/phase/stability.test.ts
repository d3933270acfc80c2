/**
 * The tangent-plane stability test of mixtures (phase/stability.ts): against Raoult's law for a
 * near-ideal pair, against a vapour-pressure argument for a gas that must drop liquid, over random
 * supercritical mixtures that cannot split, through stateAtTP's "phase-split" warning, and on bad
 * input.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { stabilityAtTP } from "../../../kernel-lib/src/phase/stability.js";
import { saturationAtTemperature } from "../../../kernel-lib/src/phase/saturation.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import type { ResidualModel } from "../../../kernel-lib/src/eos/types.js";

/** The pressure in [lo, hi] where the verdict changes (bisection in ln P to 1e-6 relative). */
function stabilityBoundary(stableAt: (P: number) => boolean, lo: number, hi: number): number {
  const atLo = stableAt(lo);
  expect(stableAt(hi)).toBe(!atLo);
  while (hi / lo - 1 > 1e-6) {
    const mid = Math.sqrt(lo * hi);
    if (stableAt(mid) === atLo) lo = mid;
    else hi = mid;
  }
  return Math.sqrt(lo * hi);
}

describe("stability against Raoult's law (near-ideal pair at about 1 bar)", () => {
  // Raoult's law, P_bubble = sum x_i Psat_i and 1/P_dew = sum x_i / Psat_i (e.g. Smith, Van Ness &
  // Abbott, Introduction to Chemical Engineering Thermodynamics, 7th ed., section 10.4), with the
  // pure vapour pressures of the same equation. n-pentane/n-hexane is a near-ideal pair of
  // neighbouring alkanes (k_ij = 0 here) and at about 1 bar the vapour is nearly ideal, so the
  // edges of the unstable range must sit within 2 % of Raoult's bubble and dew pressures
  // (tolerance: common practice, no source; the measured gaps are under 1 %).
  const T = 320;
  const mixture = defineFluid({ components: ["n-pentane", "n-hexane"], model: "peng-robinson" });
  const psat = ["n-pentane", "n-hexane"].map(
    (id) =>
      saturationAtTemperature(defineFluid({ components: [id], model: "peng-robinson" }).model, T)
        .pressurePa,
  );
  for (const z1 of [0.2, 0.5, 0.8]) {
    it(`x(n-pentane) = ${z1} at ${T} K`, () => {
      const z = [z1, 1 - z1];
      const bubble = z[0] * psat[0] + z[1] * psat[1];
      const dew = 1 / (z[0] / psat[0] + z[1] / psat[1]);
      const stableAt = (P: number) => mixture.stabilityAtTP(T, P, z).stable;
      const inside = Math.sqrt(bubble * dew);
      expect(stableAt(inside)).toBe(false);
      const modelBubble = stabilityBoundary(stableAt, inside, 1.5 * bubble);
      const modelDew = stabilityBoundary(stableAt, dew / 1.5, inside);
      expect(Math.abs(modelBubble / bubble - 1)).toBeLessThan(0.02);
      expect(Math.abs(modelDew / dew - 1)).toBeLessThan(0.02);
    });
  }
});

describe("a gas that must drop liquid, and the same gas hot", () => {
  // 70 % methane, 30 % n-butane at 280 K and 20 bar: the n-butane partial pressure, 6 bar, is far
  // above its vapour pressure at 280 K, about 1.3 bar (n-butane boils at 272.7 K at 1 atm, from
  // memory of the CRC Handbook of Chemistry and Physics), so part of it must condense. At 400 K
  // (reduced temperature 0.94 for n-butane, Tc 425.1 K) its vapour pressure is well above 10 bar,
  // far above its 1.5 bar partial pressure at 5 bar, so the same mixture is a gas far from any dew
  // point (common practice, no source).
  const gas = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
  const feed = [0.7, 0.3];

  it("splits at 280 K, 20 bar: a liquid-like trial richer in n-butane than the feed", () => {
    const t = gas.stabilityAtTP(280, 20e5, feed);
    expect(t.stable).toBe(false);
    expect(t.minimumTangentPlaneDistance).toBeLessThan(-1e-3);
    const liquid = t.trials.find((trial) => trial.start === "liquid-like");
    expect(liquid?.outcome).toBe("split");
    expect(t.incipientComposition?.[1]).toBeGreaterThan(feed[1]);
    expect(t.incipientComposition?.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    expect(t.method).toMatch(/Michelsen/);
    expect(t.model.id).toBe("peng-robinson");
  });

  it("is stable at 400 K, 5 bar: every trial returns to the feed", () => {
    const t = gas.stabilityAtTP(400, 5e5, feed);
    expect(t.stable).toBe(true);
    expect(t.incipientComposition).toBeUndefined();
    for (const trial of t.trials) expect(trial.outcome).toBe("trivial");
    expect(t.minimumTangentPlaneDistance).toBeGreaterThan(-1e-8);
  });

  it("stateAtTP warns 'phase-split' by default where it splits; checkStability: false skips it", () => {
    const inside = gas.stateAtTP(280, 20e5, feed, { checkStability: true });
    expect(inside.warnings.map((w) => w.code)).toContain("phase-split");
    expect(inside.warnings.find((w) => w.code === "phase-split")?.message).toMatch(
      /not stable as one phase/,
    );
    const byDefault = gas.stateAtTP(280, 20e5, feed);
    expect(byDefault.warnings.map((w) => w.code)).toContain("phase-split");
    const unchecked = gas.stateAtTP(280, 20e5, feed, { checkStability: false });
    expect(unchecked.warnings.map((w) => w.code)).not.toContain("phase-split");
    const hot = gas.stateAtTP(400, 5e5, feed, { checkStability: true });
    expect(hot.warnings).toEqual([]);
  });

  it("a model without critical constants uses nearly pure trials and reaches the same verdicts", () => {
    const m = gas.model;
    const bare: ResidualModel = {
      info: m.info,
      residual: (T, rho, x, request) => m.residual(T, rho, x, request),
      maxDensity: (T, x) => m.maxDensity(T, x),
      densityRoots: (T, P, x) => m.densityRoots!(T, P, x),
    };
    const cold = stabilityAtTP(bare, 280, 20e5, feed);
    expect(cold.stable).toBe(false);
    expect(cold.trials.map((t) => t.start)).toEqual([
      "nearly pure methane",
      "nearly pure n-butane",
    ]);
    expect(stabilityAtTP(bare, 400, 5e5, feed).stable).toBe(true);
  });

  it("a trial stopped by the iteration cap is reported, with a warning on a 'stable' verdict", () => {
    const t = gas.stabilityAtTP(400, 5e5, feed, { maxIterations: 1 });
    expect(t.stable).toBe(true);
    expect(t.trials.every((trial) => trial.outcome === "not-converged")).toBe(true);
    expect(t.warnings.map((w) => w.code)).toEqual(["accuracy"]);
    expect(t.warnings[0].message).toMatch(/trials did not converge in 1 iteration without/);
    expect(t.warnings[0].message).toMatch(/not proven: raise options\.maxIterations/);
    // a split found on the way is proof enough, converged or not
    const cold = gas.stabilityAtTP(280, 20e5, feed, { maxIterations: 3 });
    expect(cold.stable).toBe(false);
    expect(cold.warnings).toEqual([]);
  });

  it("a pure fluid, or a mixture with one component present, is stable with nothing to test", () => {
    const pure = defineFluid({ components: ["methane"], model: "peng-robinson" });
    const t = pure.stabilityAtTP(150, 10e5);
    expect(t.stable).toBe(true);
    expect(t.trials).toEqual([]);
    expect(gas.stabilityAtTP(280, 20e5, [0, 1]).trials).toEqual([]);
  });
});

describe("random mixtures of two supercritical gases never split", () => {
  // Nitrogen (Tc 126.2 K) and methane (Tc 190.6 K) are both far above their critical temperatures
  // at 250-400 K; their vapour-liquid region lies below about 190 K (common practice, no source),
  // so every state here must test stable.
  const gas = defineFluid({ components: ["nitrogen", "methane"], model: "peng-robinson" });
  it("tm >= 0 within the threshold at every state", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 250, max: 400, noNaN: true }),
        fc.double({ min: 1e5, max: 80e5, noNaN: true }),
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        (T, P, z1) => {
          const t = gas.stabilityAtTP(T, P, [z1, 1 - z1]);
          expect(t.stable).toBe(true);
          expect(t.minimumTangentPlaneDistance).toBeGreaterThan(-1e-8);
        },
      ),
      { numRuns: 60, seed: 20261202 },
    );
  });
});

describe("bad input is refused with the input named", () => {
  const gas = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
  const feed = [0.7, 0.3];
  const cases: [string, () => unknown, RegExp][] = [
    ["temperature NaN", () => gas.stabilityAtTP(NaN, 20e5, feed), /temperatureK/],
    ["negative pressure", () => gas.stabilityAtTP(280, -1, feed), /pressurePa/],
    ["fractions not summing to 1", () => gas.stabilityAtTP(280, 20e5, [0.7, 0.2]), /sum of x/],
    ["one fraction for two components", () => gas.stabilityAtTP(280, 20e5, [1]), /x\.length/],
    [
      "zero iterations",
      () => gas.stabilityAtTP(280, 20e5, feed, { maxIterations: 0 }),
      /options\.maxIterations/,
    ],
    [
      "negative tolerance",
      () => gas.stabilityAtTP(280, 20e5, feed, { tolerance: -1 }),
      /options\.tolerance/,
    ],
    [
      "constants for one component",
      () =>
        gas.stabilityAtTP(280, 20e5, feed, {
          constants: [{ criticalTemperatureK: 190, criticalPressurePa: 46e5, acentricFactor: 0 }],
        }),
      /options\.constants\.length/,
    ],
    [
      "a NaN acentric factor",
      () =>
        gas.stabilityAtTP(280, 20e5, feed, {
          constants: [
            { criticalTemperatureK: 190, criticalPressurePa: 46e5, acentricFactor: 0 },
            { criticalTemperatureK: 425, criticalPressurePa: 38e5, acentricFactor: NaN },
          ],
        }),
      /options\.constants\[1\]\.acentricFactor/,
    ],
  ];
  for (const [name, call, input] of cases) {
    it(name, () => {
      expect(call).toThrow(InputError);
      expect(call).toThrow(input);
    });
  }
});
