/**
 * Reference fluids through the engine's state functions: density at given (T, P) on the stable
 * branch (IAPWS R6-95 Table 7 inverted), the ideal part through the IdealGasPure contract, the
 * registry, and the validity policy.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { referenceFluidIds } from "../../../kernel-lib/src/eos/multiparameter/referenceFluids.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import {
  referenceStateTP,
  referenceStateTRho,
} from "../../../kernel-lib/src/state/referenceStates.js";
import { referenceIdealGasPure } from "../../../kernel-lib/src/eos/multiparameter/referenceIdealGas.js";
import { buildReferenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { saturationAtTemperature } from "../../../kernel-lib/src/phase/saturation.js";
import { InputError, OutOfRangeError, UnknownNameError } from "../../../kernel-lib/src/errors.js";
import {
  expectReference,
  referenceValue,
  referenceValues,
} from "../../fixtures/referenceValues.js";

const water = referenceFluid("water");

describe("density at given (T, P): IAPWS R6-95(2018) Table 7 inverted", () => {
  // tests/fixtures/iapws-r6-95-table7.json (from memory of R6-95(2018) Table 7): each row's (T, p)
  // must give its density within the "density-from-p" tolerance of the fixture (1e-7 relative;
  // 2e-6 at 647 K next to the saturation pressure; reasons there).
  const table7 = referenceValues("iapws-r6-95-table7.json");
  const states = [...table7.keys()].filter((k) => k.endsWith("/rho")).map((k) => k.slice(0, -4));
  it("has the eleven rows of the table", () => {
    expect(states).toHaveLength(11);
  });
  for (const state of states) {
    const T = Number(/^T(\d+)-/.exec(state)?.[1]);
    const p = table7.get(`${state}/p`)!;
    const rho = table7.get(`${state}/rho`)!;
    it(`T = ${T} K, p = ${p.printed} MPa -> ${rho.printed} kg/m3`, () => {
      const s = referenceStateTP(water, T, p.value * 1e6);
      expectReference(s.densityKgPerM3, rho, "density-from-p");
      expect(s.referenceState.kind).toBe("fluid-convention");
    });
  }

  it("picks the stable branch on both sides of the saturation pressure (no spurious roots)", () => {
    for (const T of [300, 400, 550, 640, 647.09]) {
      const sat = saturationAtTemperature(water, T);
      const above = referenceStateTP(water, T, sat.pressurePa * 1.001);
      const below = referenceStateTP(water, T, sat.pressurePa * 0.999);
      expect(above.densityMolPerM3).toBeGreaterThanOrEqual(sat.liquidDensityMolPerM3);
      expect(below.densityMolPerM3).toBeLessThanOrEqual(sat.vaporDensityMolPerM3);
      expect(above.phase).toBe("liquid");
      expect(below.phase).toBe("vapor");
    }
  });

  it("round trip (T, rho) -> P -> rho over random single-phase states", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 280, max: 1200, noNaN: true }),
        fc.double({ min: 1e3, max: 5e8, noNaN: true }),
        (T, P) => {
          const s = referenceStateTP(water, T, P);
          const back = referenceStateTRho(water, T, s.densityMolPerM3);
          // A liquid's pressure is a small difference of large terms (rho R T (1 + aD), 1 + aD near
          // 0), so the round trip is judged on the scale rho R T, not on P.
          const scale = Math.max(P, s.densityMolPerM3 * water.gasConstant * T);
          expect(Math.abs(back.pressurePa - P)).toBeLessThan(1e-9 * scale);
          expect(s.dPdRhoPaM3PerMol).toBeGreaterThan(0);
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe("ideal part through the IdealGasPure contract", () => {
  it("water: cp(298.15 K) = 33.58 J/(mol K), S(298.15 K, 1 bar) = 188.835 J/(mol K)", () => {
    // cp: NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998), H2O(g) at 298.15 K: 33.590
    // J/(mol K) (from memory); IAPWS-95's ideal part (Cooper 1982 form) agrees within 0.1 %.
    // S: CODATA Key Values (Cox, Wagman and Medvedev 1989), the anchor of the entropy.
    const ig = referenceIdealGasPure(water);
    expectReference(
      ig.cp(298.15),
      referenceValue("janaf.json", "water/298.15/Cp"),
      "iapws-95-ideal-part",
    );
    expectReference(
      ig.entropyStandard(298.15),
      referenceValue("codata-1989.json", "water-gas/298.15/S"),
    );
    expect(ig.enthalpyFrom298(298.15)).toBe(0);
  });

  it("dh/dT = cp and ds/dT = cp/T (identities, central differences)", () => {
    for (const id of referenceFluidIds()) {
      const ig = referenceIdealGasPure(referenceFluid(id));
      for (const T of [250, 400, 800]) {
        const h = 1e-3;
        const dh = (ig.enthalpyFrom298(T + h) - ig.enthalpyFrom298(T - h)) / (2 * h);
        const ds = (ig.entropyStandard(T + h) - ig.entropyStandard(T - h)) / (2 * h);
        expect(Math.abs(dh / ig.cp(T) - 1)).toBeLessThan(1e-7);
        expect(Math.abs((ds * T) / ig.cp(T) - 1)).toBeLessThan(1e-7);
      }
    }
  });

  it("refuses a bad temperature", () => {
    const ig = referenceIdealGasPure(water);
    for (const bad of [NaN, 0, -5, Infinity]) expect(() => ig.cp(bad)).toThrow(InputError);
  });
});

describe("registry and validity policy", () => {
  it("ships water, carbon dioxide, methane and nitrogen", () => {
    expect(referenceFluidIds().sort()).toEqual(["carbon-dioxide", "methane", "nitrogen", "water"]);
    expect(() => referenceFluid("steam")).toThrow(UnknownNameError);
    expect(() => referenceFluid("carbon dioxide")).toThrow(UnknownNameError);
  });

  it("warns outside the published range and refuses beyond the extrapolation range", () => {
    // IAPWS-95 is valid to 1273 K; 2000 K is inside the extrapolation range (to 5000 K).
    const hot = referenceStateTRho(water, 2000, 100);
    expect(hot.warnings.some((w) => w.code === "outside-validity" && /1273/.test(w.message))).toBe(
      true,
    );
    expect(() => referenceStateTRho(water, 6000, 100)).toThrow(OutOfRangeError);
    expect(() => referenceStateTP(water, 6000, 1e5)).toThrow(/allowOutsideRange/);
    const forced = referenceStateTRho(water, 6000, 100, { allowOutsideRange: true });
    expect(forced.warnings.some((w) => /not trustworthy/.test(w.message))).toBe(true);
    const inside = referenceStateTP(water, 400, 1e6);
    expect(inside.warnings.filter((w) => w.code === "outside-validity")).toEqual([]);
  });

  it("refuses NaN, zero, negative and infinite inputs", () => {
    for (const bad of [NaN, 0, -1, Infinity]) {
      expect(() => referenceStateTRho(water, bad, 100)).toThrow(InputError);
      expect(() => referenceStateTRho(water, 300, bad)).toThrow(InputError);
      expect(() => referenceStateTP(water, bad, 1e5)).toThrow(InputError);
      expect(() => referenceStateTP(water, 300, bad)).toThrow(InputError);
    }
  });
});

describe("data-file checks (buildReferenceFluid)", () => {
  const good = water.data;
  it("every shipped file passes", () => {
    for (const id of referenceFluidIds()) {
      expect(() => buildReferenceFluid(referenceFluid(id).data)).not.toThrow();
    }
  });
  it("a malformed record fails with the path of the field", () => {
    const badTerm = {
      ...good,
      residual: {
        ...good.residual,
        polynomialExponential: good.residual.polynomialExponential.map((t, i) =>
          i === 3 ? { ...t, d: 1.5 } : t,
        ),
      },
    };
    expect(() => buildReferenceFluid(badTerm)).toThrow(
      /data\.residual\.polynomialExponential\[3\]\.d/,
    );
    expect(() => buildReferenceFluid({ ...good, molarMassKgPerMol: NaN })).toThrow(InputError);
    expect(() =>
      buildReferenceFluid({
        ...good,
        gasConstantJPerMolK: undefined,
        specificGasConstantJPerKgK: undefined,
      }),
    ).toThrow(/gasConstant/);
    expect(() => buildReferenceFluid({ ...good, id: "Water Vapour" })).toThrow(/data\.id/);
  });
});
