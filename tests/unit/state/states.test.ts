/**
 * States at (T, P) and (T, rho): roots and phases, requested phases, inversions at (P, h) and
 * (P, s), volume translation, bad input.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import {
  InputError,
  OutOfRangeError,
  PhaseUnavailableError,
  SolverError,
  UnknownNameError,
} from "../../../kernel-lib/src/errors.js";
import { R } from "../../../kernel-lib/src/constants.js";
import { createModel } from "../../../kernel-lib/src/eos/createModel.js";
import { comps } from "../eos/helpers.js";
import { saturationAtTemperature } from "../../../kernel-lib/src/phase/saturation.js";
import { expectReference, referenceValue } from "../../fixtures/referenceValues.js";

describe("roots and phases (pure propane, Peng-Robinson)", () => {
  const propane = defineFluid({ components: ["propane"], model: "peng-robinson" });
  it("below the saturation pressure at 300 K: three roots, the vapor is stable; the liquid can be requested", () => {
    // PR saturation pressure of propane at 300 K is near 10 bar (experimental 9.98 bar, from
    // memory of NIST Chemistry WebBook / Lemmon et al. propane data); 5 bar is well inside the vapor.
    const roots = propane.densityRoots(300, 5e5);
    expect(roots.length).toBe(3);
    expect(roots[1].mechanicallyStable).toBe(false);
    const stable = propane.stateAtTP(300, 5e5);
    expect(stable.phase).toBe("vapor");
    expect(stable.densityMolPerM3).toBeCloseTo(roots[0].densityMolPerM3, 8);
    const liquid = propane.stateAtTP(300, 5e5, undefined, { phase: "liquid" });
    expect(liquid.phase).toBe("liquid");
    expect(liquid.molar.g).toBeGreaterThan(stable.molar.g); // metastable liquid
    // stable root = lowest Gibbs energy
    expect(roots[0].gibbsResidualOverRT).toBeLessThan(roots[2].gibbsResidualOverRT);
  });
  it("above the saturation pressure the liquid is stable", () => {
    const s = propane.stateAtTP(300, 30e5);
    expect(s.phase).toBe("liquid");
    expect(s.Z).toBeLessThan(0.2);
  });
  it("on the saturation line the two roots tie: the state says so and names the way out", () => {
    // at the model's own saturation pressure the liquid and vapour roots have equal Gibbs energy
    // (the equal-fugacity condition of saturationAtTemperature, tested in tests/unit/phase)
    const psat = saturationAtTemperature(propane.model, 300).pressurePa;
    const on = propane.stateAtTP(300, psat);
    const tie = on.warnings.find((w) => /on the phase boundary/.test(w.message));
    expect(tie?.code).toBe("accuracy");
    expect(tie?.message).toMatch(/ask for phase "liquid" or "vapor", or give a quality/);
    for (const P of [0.999 * psat, 1.001 * psat]) {
      expect(propane.stateAtTP(300, P).warnings).toEqual([]);
    }
    expect(propane.stateAtTP(300, psat, [1], { phase: "liquid" }).warnings).toEqual([]);
  });
  it("a requested phase that does not exist is refused with the reason", () => {
    // at 300 K and 80 bar PR has a single (liquid) root
    expect(() => propane.stateAtTP(300, 80e5, undefined, { phase: "vapor" })).toThrow(
      PhaseUnavailableError,
    );
    try {
      propane.stateAtTP(300, 80e5, undefined, { phase: "vapor" });
    } catch (e) {
      expect((e as Error).message).toMatch(/single stable density root/);
    }
    // at 1 bar and 500 K a single vapor root: no liquid
    expect(() => propane.stateAtTP(500, 1e5, undefined, { phase: "liquid" })).toThrow(
      PhaseUnavailableError,
    );
  });
  it("supercritical label above Tc and Pc; (T, rho) states agree with (T, P) states", () => {
    const s = propane.stateAtTP(400, 60e5);
    expect(s.phase).toBe("supercritical");
    const back = propane.stateAtTRho(400, s.densityMolPerM3);
    expect(back.pressurePa).toBeCloseTo(60e5, 3);
    expect(back.molar.h).toBeCloseTo(s.molar.h, 8);
  });
  it("the ideal-gas limit: departures vanish at low pressure", () => {
    const s = propane.stateAtTP(400, 1);
    expect(Math.abs(s.Z - 1)).toBeLessThan(1e-5);
    expect(Math.abs(s.residual.h)).toBeLessThan(0.01);
    expect(Math.abs(s.lnPhi[0])).toBeLessThan(1e-5);
  });
  it("absolute = ideal gas at the same T and P + departure at the same T and P (h, s, g)", () => {
    for (const [T, P] of [
      [300, 5e5],
      [300, 30e5],
      [420, 60e5],
    ]) {
      const s = propane.stateAtTP(T, P);
      const ig = propane.idealGas.at(T, P, [1]);
      expect(s.molar.h).toBeCloseTo(ig.h + s.residual.h, 7);
      expect(s.molar.s).toBeCloseTo(ig.s + s.residual.s, 9);
      expect(s.molar.g).toBeCloseTo(ig.g + s.residual.g, 7);
    }
  });
  it("carries model, reference state, mass properties and warnings", () => {
    const s = propane.stateAtTP(350, 10e5);
    expect(s.model.id).toBe("peng-robinson");
    expect(s.referenceState.kind).toBe("formation");
    expect(s.mass.h).toBeCloseTo(s.molar.h / s.molarMassKgPerMol, 6);
    expect(s.densityKgPerM3).toBeCloseTo(s.densityMolPerM3 * s.molarMassKgPerMol, 10);
    expect(s.departureMethod).toBe("closed-form");
    // inside every range: no warning; 1600 K is past the propane cp correlation's 1500 K (its
    // extrapolation margin reaches 1650 K), so that state carries an "extrapolated" warning
    expect(s.warnings).toEqual([]);
    const hot = propane.stateAtTP(1600, 10e5);
    expect(hot.warnings.map((w) => w.code)).toContain("extrapolated");
    expect(hot.warnings.some((w) => /propane/.test(w.message))).toBe(true);
  });
});

describe("numeric departure route through the fluid", () => {
  it("gives the same state as the closed form to 1e-9", () => {
    const ids = ["hydrogen", "methane", "ethane"];
    const x = [0.6, 0.3, 0.1];
    const a = defineFluid({ components: ids, model: "peng-robinson" }).stateAtTP(313.15, 25e5, x);
    const b = defineFluid({
      components: ids,
      model: "peng-robinson",
      departure: "numeric",
    }).stateAtTP(313.15, 25e5, x);
    expect(b.departureMethod).toBe("numeric");
    expect(Math.abs(a.residual.h - b.residual.h)).toBeLessThan(1e-9 * R * 313.15);
    expect(Math.abs(a.residual.s - b.residual.s)).toBeLessThan(1e-9 * R);
    expect(Math.abs(a.molar.cp - b.molar.cp)).toBeLessThan(1e-8 * a.molar.cp);
    expect(Math.abs(a.speedOfSoundMPerS - b.speedOfSoundMPerS)).toBeLessThan(
      1e-8 * a.speedOfSoundMPerS,
    );
    b.lnPhi.forEach((l, i) => expect(Math.abs(l - a.lnPhi[i])).toBeLessThan(1e-8));
  });
});

describe("inversions for valves and compressors", () => {
  const gas = defineFluid({ components: ["methane", "ethane", "propane"], model: "peng-robinson" });
  const x = [0.85, 0.1, 0.05];
  it("T at (P, h) and (P, s) round-trip to 1e-8 K", () => {
    const s = gas.stateAtTP(320, 50e5, x);
    const th = gas.temperatureAtPH(50e5, s.molar.h, x);
    expect(th.temperatureK).toBeCloseTo(320, 7);
    const ts = gas.temperatureAtPS(50e5, s.molar.s, x);
    expect(ts.temperatureK).toBeCloseTo(320, 7);
    expect(th.iterations).toBeGreaterThan(0);
  });
  it("a throttle cools natural gas (positive Joule-Thomson coefficient), consistent with mu_JT", () => {
    const inlet = gas.stateAtTP(300, 70e5, x);
    const out = gas.temperatureAtPH(69e5, inlet.molar.h, x);
    // over 1 bar the temperature drop is mu_JT * dP to first order
    const predicted = inlet.jouleThomsonKPerPa * 1e5;
    expect(300 - out.temperatureK).toBeGreaterThan(0);
    expect(Math.abs(300 - out.temperatureK - predicted) / predicted).toBeLessThan(0.01);
  });
  it("isentropic compression heats the gas; a target inside the dome is refused", () => {
    const suction = gas.stateAtTP(300, 20e5, x);
    const discharge = gas.temperatureAtPS(60e5, suction.molar.s, x);
    expect(discharge.temperatureK).toBeGreaterThan(330);
    const propane = defineFluid({ components: ["propane"], model: "peng-robinson" });
    // propane boils near 331 K at 20 bar
    const liquid = propane.stateAtTP(290, 20e5);
    const vapor = propane.stateAtTP(370, 20e5);
    expect(liquid.phase).toBe("liquid");
    expect(vapor.phase).toBe("vapor");
    // an enthalpy halfway between liquid and vapor at 20 bar lies in the two-phase region
    expect(() => propane.temperatureAtPH(20e5, 0.5 * (liquid.molar.h + vapor.molar.h))).toThrow(
      SolverError,
    );
  });
});

describe("Peneloux volume translation", () => {
  it("shifts ln phi by -c P / RT and h by -c P; leaves s and cp; improves liquid density of n-decane (PR)", () => {
    const plain = defineFluid({ components: ["n-decane"], model: "peng-robinson" });
    const shifted = defineFluid({
      components: ["n-decane"],
      model: "peng-robinson",
      volumeTranslation: "peneloux",
    });
    const a = plain.stateAtTP(298.15, 1e5, undefined, { phase: "liquid" });
    const b = shifted.stateAtTP(298.15, 1e5, undefined, { phase: "liquid" });
    const c = 1 / a.densityMolPerM3 - 1 / b.densityMolPerM3;
    expect(c).toBeGreaterThan(0);
    expect(b.lnPhi[0] - a.lnPhi[0]).toBeCloseTo((-c * 1e5) / (R * 298.15), 10);
    expect(b.molar.h - a.molar.h).toBeCloseTo(-c * 1e5, 6);
    expect(b.molar.s).toBeCloseTo(a.molar.s, 9);
    expect(b.molar.cp).toBeCloseTo(a.molar.cp, 8);
    // n-decane liquid at 25 C: about 726 kg/m3 (from memory of the CRC Handbook of Chemistry and
    // Physics): tests/fixtures/crc-handbook.json
    const ref = referenceValue("crc-handbook.json", "n-decane/liquid-density-25C");
    expect(Math.abs(b.densityKgPerM3 - ref.value)).toBeLessThan(
      Math.abs(a.densityKgPerM3 - ref.value),
    );
    expectReference(b.densityKgPerM3, ref);
  });
  it("SRK with Peneloux (the original paper's correlation) brings n-hexane liquid near 655 kg/m3", () => {
    // n-hexane liquid at 25 C: about 655 kg/m3 (from memory of the CRC Handbook); plain SRK is ~10 % low
    const plain = defineFluid({ components: ["n-hexane"], model: "soave-redlich-kwong" });
    const shifted = defineFluid({
      components: ["n-hexane"],
      model: "soave-redlich-kwong",
      volumeTranslation: "peneloux",
    });
    const a = plain.stateAtTP(298.15, 1e5, undefined, { phase: "liquid" });
    const b = shifted.stateAtTP(298.15, 1e5, undefined, { phase: "liquid" });
    const ref = referenceValue("crc-handbook.json", "n-hexane/liquid-density-25C");
    expect(Math.abs(a.densityKgPerM3 - ref.value) / ref.value).toBeGreaterThan(0.05);
    expectReference(b.densityKgPerM3, ref);
  });
});

describe("bad input is refused with typed errors", () => {
  const gas = defineFluid({ components: ["methane", "ethane"], model: "soave-redlich-kwong" });
  it("NaN, negative and infinite T, P, rho", () => {
    for (const T of [NaN, -5, 0, Infinity])
      expect(() => gas.stateAtTP(T, 1e5, [0.5, 0.5])).toThrow(InputError);
    for (const P of [NaN, -1, 0, Infinity])
      expect(() => gas.stateAtTP(300, P, [0.5, 0.5])).toThrow(InputError);
    for (const rho of [NaN, -1, 0])
      expect(() => gas.stateAtTRho(300, rho, [0.5, 0.5])).toThrow(InputError);
  });
  it("bad mole fractions", () => {
    expect(() => gas.stateAtTP(300, 1e5, [0.5, 0.6])).toThrow(InputError);
    expect(() => gas.stateAtTP(300, 1e5, [1])).toThrow(InputError);
    expect(() => gas.stateAtTP(300, 1e5, [1.2, -0.2])).toThrow(InputError);
    expect(() => gas.stateAtTP(300, 1e5, [NaN, 1])).toThrow(InputError);
    expect(() => gas.stateAtTP(300, 1e5)).toThrow(InputError);
  });
  it("a density at or above close packing (1/b)", () => {
    const model = createModel("soave-redlich-kwong", comps("methane", "ethane"));
    const limit = model.maxDensity(300, [0.5, 0.5]);
    expect(() => gas.stateAtTRho(300, limit, [0.5, 0.5])).toThrow(OutOfRangeError);
    expect(() => gas.stateAtTRho(300, 2 * limit, [0.5, 0.5])).toThrow(OutOfRangeError);
  });
  it("an unknown model name, with suggestions", () => {
    expect(() => defineFluid({ components: ["methane"], model: "peng-robinsn" as never })).toThrow(
      UnknownNameError,
    );
    try {
      defineFluid({ components: ["methane"], model: "peng-robinsn" as never });
    } catch (e) {
      expect((e as UnknownNameError).suggestions[0]).toBe("peng-robinson");
    }
  });
  it("bad k_ij matrices", () => {
    expect(() =>
      defineFluid({
        components: ["methane", "ethane"],
        kij: [
          [0, 0.1],
          [0.2, 0],
        ],
      }),
    ).toThrow(InputError);
    expect(() =>
      defineFluid({
        components: ["methane", "ethane"],
        kij: [
          [0, NaN],
          [NaN, 0],
        ],
      }),
    ).toThrow(InputError);
    expect(() => defineFluid({ components: ["methane", "ethane"], kij: [[0, 0.1]] })).toThrow(
      InputError,
    );
  });
  it("pairs without a tabulated k_ij are reported as defaulted", () => {
    const f = defineFluid({
      components: ["hydrogen", "methane", "carbon-dioxide"],
      model: "peng-robinson",
    });
    expect(f.defaultedPairs).toContain("hydrogen/methane");
    expect(f.defaultedPairs).not.toContain("methane/carbon-dioxide");
    const note = f.interactionNotes.find(
      (n) => n.pair.includes("carbon-dioxide") && n.pair.includes("methane"),
    );
    expect(note!.source).toMatch(/from memory/);
  });
});

describe("states of a user pressure-function model (numerical root search)", () => {
  it("finds all three roots, picks the stable one, and matches the closed-form fluid", async () => {
    const { modelFromPressure } =
      await import("../../../kernel-lib/src/departure/pressureModel.js");
    const closed = defineFluid({ components: ["propane"], model: "peng-robinson" });
    const pr = createModel("peng-robinson", comps("propane"));
    const user = defineFluid({
      components: ["propane"],
      model: modelFromPressure({
        name: "PR typed by hand",
        components: ["propane"],
        pressure: pr.pressureFunction,
        maxDensity: (T, x) => pr.maxDensity(T, x),
      }),
    });
    const rootsUser = user.densityRoots(300, 5e5);
    const rootsClosed = closed.densityRoots(300, 5e5);
    expect(rootsUser.length).toBe(3);
    rootsUser.forEach((r, i) =>
      expect(r.densityMolPerM3 / rootsClosed[i].densityMolPerM3).toBeCloseTo(1, 10),
    );
    for (const [T, P] of [
      [300, 5e5],
      [300, 30e5],
      [400, 60e5],
    ]) {
      const a = closed.stateAtTP(T, P);
      const b = user.stateAtTP(T, P);
      expect(b.departureMethod).toBe("numeric");
      expect(b.phase).toBe(a.phase);
      expect(Math.abs(b.molar.h - a.molar.h)).toBeLessThan(1e-6 * R * T);
      expect(Math.abs(b.molar.s - a.molar.s)).toBeLessThan(1e-8 * R * 10);
    }
  });
});
