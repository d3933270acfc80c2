/**
 * The isothermal flash (phase/flash/flashTP.ts): limits with known answers (Raoult's law, a pure
 * component), published binary VLE, consistency (equal fugacity, Gibbs energy minimum against a
 * brute-force scan, continuity), three phases, and the four failure modes engineers report of
 * flash programs, each as a named test.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { flashTP } from "../../../kernel-lib/src/phase/flash/flashTP.js";
import { solveRachfordRice } from "../../../kernel-lib/src/phase/flash/rachfordRice.js";
import { saturationAtTemperature } from "../../../kernel-lib/src/phase/saturation.js";
import { phaseFugacityAtTP } from "../../../kernel-lib/src/state/fugacity.js";
import { InputError, SolverError } from "../../../kernel-lib/src/errors.js";
import type { ResidualModel } from "../../../kernel-lib/src/eos/types.js";
import { expectVerified } from "./helpers.js";

const c1c4 = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });

/**
 * Brute-force Gibbs energy of a binary: g(x1) = sum x_i (ln x_i + ln phi_i) on a fine grid (each
 * composition in its root of lowest Gibbs energy), and the lowest two-phase value at z from every
 * chord between grid points on either side of z (the lower convex envelope at z). Independent of
 * the tangent-plane test and of the flash's iteration.
 */
function bruteForceBinary(model: ResidualModel, T: number, P: number, z1: number, points = 1500) {
  const xs: number[] = [];
  const gs: number[] = [];
  for (let k = 1; k < points; k++) {
    // denser near the edges (dilute phases)
    const u = k / points;
    const x1 = 0.5 - 0.5 * Math.cos(Math.PI * u);
    const x = [x1, 1 - x1];
    const f = phaseFugacityAtTP(model, T, P, x, "stable");
    xs.push(x1);
    gs.push(x[0] * (Math.log(x[0]) + f.lnPhi[0]) + x[1] * (Math.log(x[1]) + f.lnPhi[1]));
  }
  const fz = phaseFugacityAtTP(model, T, P, [z1, 1 - z1], "stable");
  const gFeed = z1 * (Math.log(z1) + fz.lnPhi[0]) + (1 - z1) * (Math.log(1 - z1) + fz.lnPhi[1]);
  let best = gFeed;
  for (let a = 0; a < xs.length; a++) {
    if (!(xs[a] < z1)) continue;
    for (let b = xs.length - 1; b > a; b--) {
      if (!(xs[b] > z1)) break;
      const beta = (z1 - xs[a]) / (xs[b] - xs[a]);
      const g = (1 - beta) * gs[a] + beta * gs[b];
      if (g < best) best = g;
    }
  }
  return { gFeed, best, splits: best < gFeed - 1e-9 };
}

describe("Raoult's-law limit", () => {
  // n-pentane/n-hexane near 1 bar: a near-ideal pair (k_ij = 0) with a nearly ideal vapour. Raoult
  // K_i = Psat_i(T) / P with the model's own vapour pressures (e.g. Smith, Van Ness & Abbott,
  // Introduction to Chemical Engineering Thermodynamics, 7th ed., section 10.4); the flash's
  // K-values may differ by the vapour non-ideality, of order B P / (R T), a few per cent at 1 bar
  // (common practice, no source): K within 5 %, the vapour amount within 0.05.
  const mixture = defineFluid({ components: ["n-pentane", "n-hexane"], model: "peng-robinson" });
  const T = 325;
  const P = 1.01325e5;
  const psat = ["n-pentane", "n-hexane"].map(
    (id) => saturationAtTemperature(defineFluid({ components: [id] }).model, T).pressurePa,
  );
  it("two phases with K and amounts near Raoult's", () => {
    const z = [0.5, 0.5];
    const eq = flashTP(mixture, T, P, z);
    expect(expectVerified(mixture, eq)).toBe(2);
    const raoult = solveRachfordRice(
      z,
      psat.map((p) => p / P),
    );
    const [V, L] = eq.phases;
    expect(V.kind).toBe("vapor");
    expect(Math.abs(V.amount - raoult.beta)).toBeLessThan(0.05);
    for (let i = 0; i < 2; i++) {
      const K = V.state.x[i] / L.state.x[i];
      expect(Math.abs(K / (psat[i] / P) - 1)).toBeLessThan(0.05);
    }
  });
  it("at 0.2 bar (a nearly ideal vapour) the agreement tightens to 1 %", () => {
    const T2 = 285;
    const ps = ["n-pentane", "n-hexane"].map(
      (id) => saturationAtTemperature(defineFluid({ components: [id] }).model, T2).pressurePa,
    );
    // between Raoult's bubble (mean of the vapour pressures at z = 0.5) and dew pressures
    const P2 = Math.sqrt(0.5 * (ps[0] + ps[1]) * (1 / (0.5 / ps[0] + 0.5 / ps[1])));
    const eq = flashTP(mixture, T2, P2, [0.5, 0.5]);
    expect(expectVerified(mixture, eq)).toBe(2);
    const [V, L] = eq.phases;
    for (let i = 0; i < 2; i++) {
      expect(Math.abs(V.state.x[i] / L.state.x[i] / (ps[i] / P2) - 1)).toBeLessThan(0.01);
    }
  });
});

describe("a pure component through the mixture flash", () => {
  const methane = defineFluid({ components: ["methane"] });
  it("z = [1, 0] gives the pure fluid's single phase on either side of saturation", () => {
    const sat = saturationAtTemperature(methane.model, 150);
    for (const P of [0.9 * sat.pressurePa, 1.1 * sat.pressurePa]) {
      const eq = flashTP(c1c4, 150, P, [1, 0]);
      expect(eq.phases).toHaveLength(1);
      const pure = methane.stateAtTP(150, P);
      expect(eq.phases[0].state.densityMolPerM3 / pure.densityMolPerM3 - 1).toBeCloseTo(0, 10);
      expect(eq.phases[0].kind).toBe(P < sat.pressurePa ? "vapor" : "liquid");
      expect(eq.stability).toBeUndefined();
    }
  });
});

describe("published binary VLE (Peng-Robinson with the source's k_ij)", () => {
  it("methane/n-butane at 310.93 K (100 F) and 6.895 MPa (1000 psia)", () => {
    // From memory of B. H. Sage, R. A. Budenholzer and W. N. Lacey, Ind. Eng. Chem. 32 (1940)
    // 1262 (methane-n-butane): liquid x(methane) about 0.29, vapour y(methane) about 0.88 at this
    // point. k_ij = 0.0133 for methane/n-butane in Peng-Robinson, from memory of Knapp, Doering,
    // Oellrich, Ploecker and Prausnitz, DECHEMA Chemistry Data Series Vol. VI (1982). Tolerance:
    // 0.04 in x and 0.02 in y (the uncertainty of the recollection plus Peng-Robinson's usual
    // bubble-point error for this pair, a few per cent; common practice, no source).
    const fluid = defineFluid({
      components: ["methane", "n-butane"],
      kij: [
        [0, 0.0133],
        [0.0133, 0],
      ],
    });
    const eq = fluid.flashTP(310.93, 6.895e6, [0.5, 0.5]);
    expect(expectVerified(fluid, eq)).toBe(2);
    const [V, L] = eq.phases;
    expect(Math.abs(L.state.x[0] - 0.29)).toBeLessThan(0.04);
    expect(Math.abs(V.state.x[0] - 0.88)).toBeLessThan(0.02);
  });
  it("carbon dioxide/ethane has its azeotrope near 70 % CO2 (table k_ij 0.13)", () => {
    // The CO2-ethane azeotrope lies at x(CO2) of about 0.67-0.72 between 220 and 290 K (from memory
    // of A. Fredenslund and J. Mollerup, J. Chem. Soc. Faraday Trans. 1, 70 (1974) 1653); the
    // table's k_ij = 0.13 (eos/data/kij.json). At 250 K the flash's K(CO2) must cross 1 between
    // x(CO2) = 0.55 and 0.85 (tolerance: the spread of the recollection, widened).
    const fluid = defineFluid({ components: ["carbon-dioxide", "ethane"] });
    const T = 250;
    const kAt = (z1: number): number => {
      // the bubble region: the pressure where the flash splits, found by a short scan
      for (let P = 10e5; P < 40e5; P *= 1.01) {
        const eq = fluid.flashTP(T, P, [z1, 1 - z1]);
        if (eq.phases.length === 2) return eq.phases[0].state.x[0] / eq.phases[1].state.x[0];
      }
      throw new Error(`no split found for z(CO2) = ${z1}`);
    };
    expect(kAt(0.55)).toBeGreaterThan(1);
    expect(kAt(0.85)).toBeLessThan(1);
  });
});

describe("consistency", () => {
  it("equal fugacity to 1e-10 and no lower split in a brute-force scan (methane/n-butane)", () => {
    for (const [T, P, z1] of [
      [280, 40e5, 0.7],
      [250, 20e5, 0.3],
      [330, 80e5, 0.6],
    ]) {
      const eq = flashTP(c1c4, T, P, [z1, 1 - z1]);
      expect(expectVerified(c1c4, eq)).toBe(2);
      const scan = bruteForceBinary(c1c4.model, T, P, z1);
      const gFlash = scan.gFeed + eq.check.gibbsChangeOverRT;
      // the scan's best chord is on a grid: it may come close to the flash, never below it
      expect(scan.best).toBeGreaterThanOrEqual(gFlash - 1e-9);
      expect(scan.best - gFlash).toBeLessThan(1e-3);
    }
  });
  it("one phase where the brute-force scan finds no split", () => {
    for (const [T, P, z1] of [
      [400, 40e5, 0.7],
      [300, 200e5, 0.7],
      [250, 5e5, 0.95],
    ]) {
      const scan = bruteForceBinary(c1c4.model, T, P, z1);
      const eq = flashTP(c1c4, T, P, [z1, 1 - z1]);
      expect(eq.phases.length === 2).toBe(scan.splits);
      expect(eq.stability?.stable).toBe(!scan.splits);
    }
  });
  it("phase amounts are continuous along an isobar and an isotherm", () => {
    const z = [0.7, 0.3];
    const vaporAmount = (T: number, P: number): number => {
      const eq = flashTP(c1c4, T, P, z);
      expectVerified(c1c4, eq, { stability: false });
      const v = eq.phases.find((p) => p.kind === "vapor");
      return v === undefined
        ? eq.phases[0].kind === "liquid" && eq.phases.length === 1
          ? 0
          : 1
        : v.amount;
    };
    // along each path: a fine step changes the amount little, and midpoints lie near the chord
    // (a jump or a wrong branch would break both; thresholds: common practice, no source)
    const check = (values: number[]): void => {
      for (let k = 1; k < values.length; k++)
        expect(Math.abs(values[k] - values[k - 1])).toBeLessThan(0.08);
      for (let k = 1; k < values.length - 1; k++) {
        expect(Math.abs(values[k] - 0.5 * (values[k - 1] + values[k + 1]))).toBeLessThan(0.02);
      }
    };
    check(Array.from({ length: 31 }, (_, k) => vaporAmount(240 + 2 * k, 40e5)));
    check(Array.from({ length: 31 }, (_, k) => vaporAmount(280, 10e5 + 2e5 * k)));
  });
});

describe("three phases", () => {
  it("water/propane/methane (PR, table k_ij): vapour, hydrocarbon liquid and nearly pure water", () => {
    const fluid = defineFluid({ components: ["water", "propane", "methane"] });
    const eq = fluid.flashTP(300, 20e5, [0.5, 0.3, 0.2]);
    expect(expectVerified(fluid, eq)).toBe(3);
    expect(eq.phases.map((p) => p.kind)).toEqual(["vapor", "liquid", "liquid-2"]);
    const aqueous = eq.phases[2];
    // water's mutual solubility with light hydrocarbons is of order 1e-4 mole fraction (from
    // memory of common solubility tables); with k_ij = 0 the equation gives more, but the aqueous
    // phase must stay nearly pure water
    expect(aqueous.state.x[0]).toBeGreaterThan(0.99);
    expect(eq.phases[1].state.x[1]).toBeGreaterThan(0.5); // the hydrocarbon liquid is mostly propane
  });
  it("water/n-hexane at 1 bar, 300 K: two liquids, no vapour (both vapour pressures add to below 1 bar)", () => {
    // water about 3.5 kPa and n-hexane about 21 kPa at 300 K (from memory of the CRC Handbook)
    const fluid = defineFluid({ components: ["water", "n-hexane"] });
    const eq = fluid.flashTP(300, 1e5, [0.5, 0.5]);
    expect(expectVerified(fluid, eq)).toBe(2);
    expect(eq.phases.map((p) => p.kind)).toEqual(["liquid", "liquid-2"]);
    expect(eq.phases[1].state.x[0]).toBeGreaterThan(0.99);
  });
  it("water/n-hexane at 0.6 bar, 340 K: vapour and liquid water only (phase rule: a binary has three phases on a line)", () => {
    // vapour pressures at 340 K about 27 kPa (water) and 91 kPa (n-hexane) (from memory of the CRC
    // Handbook): at 60 kPa all the n-hexane can stay in the vapour, y(water) = 27/60, and the rest
    // of the water condenses
    const fluid = defineFluid({ components: ["water", "n-hexane"] });
    const eq = fluid.flashTP(340, 0.6e5, [0.5, 0.5]);
    expect(expectVerified(fluid, eq)).toBe(2);
    expect(eq.phases.map((p) => p.kind)).toEqual(["vapor", "liquid"]);
    expect(eq.phases[1].state.x[0]).toBeGreaterThan(0.99);
    expect(Math.abs(eq.phases[0].state.x[0] - 27 / 60)).toBeLessThan(0.05);
  });
});

describe("failure modes engineers report", () => {
  it("(1) never a split returned as converged with unequal fugacities: an iteration cap throws", () => {
    // with two iterations the split cannot converge: a typed error, not a result
    expect(() => flashTP(c1c4, 280, 40e5, [0.7, 0.3], { maxIterations: 2 })).toThrow(SolverError);
    try {
      flashTP(c1c4, 280, 40e5, [0.7, 0.3], { maxIterations: 2 });
    } catch (e) {
      expect((e as SolverError).message).toMatch(/T = 280 K, P = 4000000 Pa/);
    }
    // and the split that is returned satisfies equal fugacity, recomputed from its states
    const eq = flashTP(c1c4, 280, 40e5, [0.7, 0.3]);
    expect(expectVerified(c1c4, eq)).toBe(2);
    expect(eq.check.maxLnFugacityDifference).toBeLessThanOrEqual(1e-10);
  });
  it("(2) a single liquid is one liquid, and no vapour is denser than a liquid", () => {
    const liquidPair = defineFluid({ components: ["n-pentane", "n-hexane"] });
    const eq = liquidPair.flashTP(300, 50e5, [0.5, 0.5]);
    expect(eq.phases).toHaveLength(1);
    expect(eq.phases[0].kind).toBe("liquid");
    // a compressed rich gas at 60 barg is one vapour-like phase, not "supercritical" (PIP label)
    const gas = defineFluid({ components: ["methane", "ethane", "propane"] });
    const g = gas.flashTP(300, 61.01325e5, [0.9, 0.07, 0.03]);
    expect(g.phases).toHaveLength(1);
    expect(g.phases[0].kind).toBe("vapor");
    expect(g.phases[0].state.phase).toBe("vapor");
    // over a grid of two-phase states the vapour is always the lightest phase
    for (let T = 200; T <= 340; T += 20) {
      for (const P of [5e5, 20e5, 50e5, 90e5]) {
        const e = flashTP(c1c4, T, P, [0.6, 0.4]);
        expectVerified(c1c4, e, { stability: false });
      }
    }
  });
  it("(3) a split near the cricondenbar is found without any option", () => {
    // the highest pressure at which the brute-force scan of the Gibbs energy (above) finds a
    // split, on a few isotherms around the cricondenbar of a 95/5 methane/n-butane gas; the
    // default flash must split there too
    const z1 = 0.95;
    let best = { T: 0, P: 0 };
    for (const T of [220, 235, 250, 265]) {
      let lo = 20e5;
      let hi = 200e5;
      if (!bruteForceBinary(c1c4.model, T, lo, z1, 600).splits) continue;
      for (let k = 0; k < 14; k++) {
        const mid = Math.sqrt(lo * hi);
        if (bruteForceBinary(c1c4.model, T, mid, z1, 600).splits) lo = mid;
        else hi = mid;
      }
      if (lo > best.P) best = { T, P: lo };
    }
    expect(best.P).toBeGreaterThan(50e5);
    const eq = flashTP(c1c4, best.T, best.P * 0.999, [z1, 1 - z1]);
    expect(expectVerified(c1c4, eq)).toBe(2);
  });
  it("(4) the (P, h) flash meets h to 1e-9 relative or throws (see stateFunctionFlash.test.ts)", () => {
    const eq = c1c4.flashTP(280, 40e5, [0.7, 0.3]);
    const h = eq.phases.reduce((s, p) => s + p.amount * p.state.molar.h, 0);
    const ph = c1c4.flashPH(40e5, h, [0.7, 0.3], { initialGuessK: 250 });
    expect(Math.abs(ph.temperatureK - 280)).toBeLessThan(1e-6);
    expect(ph.specification[0].relativeError).toBeLessThanOrEqual(1e-9);
  });
});

describe("bad input", () => {
  it("names the input", () => {
    expect(() => flashTP(c1c4, NaN, 1e5, [0.5, 0.5])).toThrow(InputError);
    expect(() => flashTP(c1c4, 300, -1, [0.5, 0.5])).toThrow(InputError);
    expect(() => flashTP(c1c4, 300, 1e5, [0.5, 0.6])).toThrow(InputError);
    expect(() => flashTP(c1c4, 300, 1e5, [0.5, 0.5], { tolerance: 0 })).toThrow(InputError);
  });
});
