/**
 * Model results against published numbers (each source named; "from memory" where recalled).
 */
import { describe, expect, it } from "vitest";
import { createVirialModel } from "../../../kernel-lib/src/eos/virial/virialModel.js";
import {
  createLeeKeslerModel,
  LEE_KESLER_REFERENCE_OMEGA,
} from "../../../kernel-lib/src/eos/leeKesler/leeKeslerModel.js";
import { createModel } from "../../../kernel-lib/src/eos/createModel.js";
import { stateAtTP } from "../../../kernel-lib/src/state/stateAt.js";
import { residualProperties } from "../../../kernel-lib/src/state/properties.js";
import { R } from "../../../kernel-lib/src/constants.js";
import type { ResidualModel } from "../../../kernel-lib/src/eos/types.js";
import { comps } from "./helpers.js";
import {
  expectReference,
  referenceValue,
  referenceValues,
} from "../../fixtures/referenceValues.js";

const SVNA = "smith-van-ness-abbott-7th.json";
const svna = (key: string) => referenceValue(SVNA, key);

/** Z at (T, P) from a model's own density roots (the stable one by lowest g_r). */
function zAt(model: ResidualModel, T: number, P: number, x: number[] = [1]): number {
  const roots = model.densityRoots
    ? model.densityRoots(T, P, x)
    : // fall back to the state layer's numerical search through a minimal binding
      [];
  const rhos =
    roots.length > 0
      ? roots
      : [
          stateAtTP(
            {
              model,
              idealGas: {
                components: [],
                referenceState: { kind: "formation" },
                at: () => ({
                  temperatureK: T,
                  pressurePa: P,
                  h: 0,
                  s: 0,
                  u: 0,
                  a: 0,
                  g: 0,
                  cp: 30,
                  cv: 30 - R,
                  referenceState: { kind: "formation" },
                  warnings: [],
                }),
              },
              molarMassesKgPerMol: x.map(() => 0.016),
            },
            T,
            P,
            x,
          ).densityMolPerM3,
        ];
  let best = rhos[0];
  let bestG = Infinity;
  for (const rho of rhos) {
    const r = model.residual(T, rho, x);
    const g = r.a + r.aD - Math.log(1 + r.aD);
    if (g < bestG) {
      bestG = g;
      best = rho;
    }
  }
  return P / (best * R * T);
}

describe("second virial coefficients (Tsonopoulos) against Dymond & Smith", () => {
  // B at 300 K in cm3/mol: tests/fixtures/dymond-smith-1980.json (from memory of J. H. Dymond &
  // E. B. Smith, The Virial Coefficients of Pure Gases and Mixtures: A Critical Compilation, 1980),
  // with the tolerance max(3 cm3/mol, 5 %) and its reason.
  const data = [...referenceValues("dymond-smith-1980.json").values()];
  it("has the five gases", () => {
    expect(data).toHaveLength(5);
  });
  for (const ref of data) {
    const id = ref.key.slice(0, ref.key.indexOf("/"));
    it(`${id}: B(300 K) = ${ref.printed} cm3/mol`, () => {
      const model = createVirialModel(comps(id));
      expectReference(model.secondVirial(300, [1]).b * 1e6, ref);
    });
  }
  it("mixture B is the quadratic sum with the Tsonopoulos cross rules (B_12 between B_1 and B_2 for similar molecules)", () => {
    const model = createVirialModel(comps("methane", "ethane"));
    const b11 = model.secondVirial(300, [1, 0]).b;
    const b22 = model.secondVirial(300, [0, 1]).b;
    const bMix = model.secondVirial(300, [0.5, 0.5]).b;
    const b12 = (bMix - 0.25 * b11 - 0.25 * b22) / 0.5;
    expect(b12).toBeLessThan(b11);
    expect(b12).toBeGreaterThan(b22);
  });
});

describe("Lee-Kesler compressibility factors", () => {
  // A Lee-Kesler model of a component with omega = 0 is the simple fluid alone, one with
  // omega = omega_R the reference fluid alone; Z1 = (Z_R - Z0)/omega_R.
  const fake = (omega: number) => ({
    id: "fake",
    criticalTemperatureK: 100,
    criticalPressurePa: 1e6,
    acentricFactor: omega,
    molarMassKgPerMol: 0.1,
    criticalVolumeM3PerMol: NaN,
  });
  const simple = createLeeKeslerModel([fake(0)]);
  const reference = createLeeKeslerModel([fake(LEE_KESLER_REFERENCE_OMEGA)]);
  const z0z1 = (tr: number, pr: number) => {
    const z0 = zAt(simple, 100 * tr, 1e6 * pr);
    const zr = zAt(reference, 100 * tr, 1e6 * pr);
    return { z0, z1: (zr - z0) / LEE_KESLER_REFERENCE_OMEGA };
  };
  it("Tr = 1.2, Pr = 0.659: Z0 = 0.865, Z1 = 0.038 (Smith, Van Ness & Abbott, 7th ed., Example 3.10, interpolated in the Lee-Kesler tables of App. E; from memory)", () => {
    const { z0, z1 } = z0z1(1.2, 0.659);
    expectReference(z0, svna("ex3.10/Z0"));
    expectReference(z1, svna("ex3.10/Z1"));
  });
  it("Tr = 1.0, Pr = 1.0: Z0 = 0.2901, Z1 = -0.0879 (Lee & Kesler 1975, Tables 3 and 4; from memory)", () => {
    const { z0, z1 } = z0z1(1.0, 1.0);
    expectReference(z0, referenceValue("lee-kesler-1975.json", "Z0/Tr1.0-Pr1.0"));
    expectReference(z1, referenceValue("lee-kesler-1975.json", "Z1/Tr1.0-Pr1.0"));
  });
  it("ideal-gas limit at Pr = 0.01, Tr = 2: Z within 2e-3 of 1", () => {
    const { z0 } = z0z1(2, 0.01);
    expect(Math.abs(z0 - 1)).toBeLessThan(2e-3);
  });
  it("n-butane at 510 K, 25 bar (omega = 0.200): Z = 0.873 (same example), Helmholtz interpolation within 0.003", () => {
    // constants of the example: SVNA 7th ed. App. B (from memory), in the fixture
    const butane = createLeeKeslerModel([
      {
        ...fake(svna("appB/n-butane/omega").value),
        criticalTemperatureK: svna("appB/n-butane/Tc").value,
        criticalPressurePa: svna("appB/n-butane/Pc").value * 1e5,
        molarMassKgPerMol: 0.05812,
      },
    ]);
    expectReference(zAt(butane, 510, 25e5), svna("ex3.10/n-butane/Z"));
  });
});

describe("Lee-Kesler: Helmholtz interpolation at (Tr, rho_r) against the paper's Z interpolation at (Tr, Pr)", () => {
  // The paper: Z = Z0(Tr, Pr) + (omega/omega_R)(Z_R(Tr, Pr) - Z0(Tr, Pr)). This model interpolates
  // alpha_r at the same reduced density instead (leeKeslerModel.ts header). The bound is set from
  // outside the code: the change of interpolation must stay well inside the method's own error
  // against measured Z of non-polar gases, a few per cent (common practice, no source; from memory
  // of Poling, Prausnitz & O'Connell 2001, ch. 4, which puts corresponding-states Z within 1-3 %
  // away from the critical point), so 1 % of Z at every grid state. (The deviation measured when
  // this was written is below 0.5 %; the bound is not that number.)
  const fake = (omega: number) => ({
    id: "fake",
    criticalTemperatureK: 100,
    criticalPressurePa: 1e6,
    acentricFactor: omega,
    molarMassKgPerMol: 0.1,
    criticalVolumeM3PerMol: NaN,
  });
  it("|Z_model / Z_paper - 1| < 1 % for 1.1 <= Tr <= 3, 0.1 <= Pr <= 5 at omega = 0.2", () => {
    const simple = createLeeKeslerModel([fake(0)]);
    const reference = createLeeKeslerModel([fake(LEE_KESLER_REFERENCE_OMEGA)]);
    const mid = createLeeKeslerModel([fake(0.2)]);
    let worst = 0;
    for (const tr of [1.1, 1.3, 1.6, 2, 3]) {
      for (const pr of [0.1, 0.5, 1, 2, 5]) {
        const z0 = zAt(simple, 100 * tr, 1e6 * pr);
        const zr = zAt(reference, 100 * tr, 1e6 * pr);
        const paper = z0 + (0.2 / LEE_KESLER_REFERENCE_OMEGA) * (zr - z0);
        worst = Math.max(worst, Math.abs(zAt(mid, 100 * tr, 1e6 * pr) / paper - 1));
      }
    }
    expect(worst).toBeLessThan(0.01);
  });
  it("alpha_r and its density derivative are linear in omega at the same (Tr, rho_r) (Lee & Kesler 1975, eq. 1, applied to alpha_r as the header states)", () => {
    // With Tc and Pc held, rho_r = rho R Tc / Pc does not depend on omega, so the same rho is the
    // same reduced density for the three fluids; the weight must be omega / omega_R exactly.
    const simple = createLeeKeslerModel([fake(0)]);
    const reference = createLeeKeslerModel([fake(LEE_KESLER_REFERENCE_OMEGA)]);
    const mid = createLeeKeslerModel([fake(0.2)]);
    const w = 0.2 / LEE_KESLER_REFERENCE_OMEGA;
    for (const [T, rho] of [
      [110, 100],
      [130, 600],
      [200, 1500],
      [70, 3000],
    ]) {
      const r0 = simple.residual(T, rho, [1]);
      const rR = reference.residual(T, rho, [1]);
      const rm = mid.residual(T, rho, [1]);
      expect(Math.abs(rm.a - (r0.a + w * (rR.a - r0.a)))).toBeLessThan(1e-12);
      expect(Math.abs(rm.aD - (r0.aD + w * (rR.aD - r0.aD)))).toBeLessThan(1e-12);
    }
  });
});

describe("textbook worked example: Redlich-Kwong departures", () => {
  it("n-butane gas at 500 K and 50 bar: Z = 0.6850, H_R = -4505 J/mol, S_R = -6.546 J/(mol K) (Smith, Van Ness & Abbott, Introduction to Chemical Engineering Thermodynamics, 7th ed., Example 6.9; from memory)", () => {
    const butane = {
      id: "n-butane",
      criticalTemperatureK: svna("appB/n-butane/Tc").value, // SVNA App. B (from memory)
      criticalPressurePa: svna("appB/n-butane/Pc").value * 1e5,
      acentricFactor: svna("appB/n-butane/omega").value,
      molarMassKgPerMol: 0.05812,
      criticalVolumeM3PerMol: NaN,
    };
    const rk = createModel("redlich-kwong", [butane]);
    const rhos = rk.densityRoots!(500, 50e5, [1]);
    const rho = rhos[0];
    const r = rk.residual(500, rho, [1], { composition: true });
    const props = residualProperties(500, r);
    const Z = 1 + r.aD;
    expectReference(Z, svna("ex6.9/n-butane/Z"));
    // the book rounds intermediate values; 0.3 % on the departures (reasons in the fixture)
    expectReference(props.TP.h, svna("ex6.9/n-butane/HR"));
    expectReference(props.TP.s, svna("ex6.9/n-butane/SR"));
  });
});

describe("virial model warnings", () => {
  it("warns for polar components (no polar term) and above half the critical density", () => {
    const model = createVirialModel(comps("methane", "water"));
    const w = model.checkValidity!(400, 10, [0.9, 0.1]);
    expect(w.some((m) => /water/.test(m.message))).toBe(true);
    const pure = createVirialModel(comps("methane"));
    expect(pure.checkValidity!(300, 10, [1])).toHaveLength(0);
    // methane rho_c = 1 / Vc, about 10 kmol/m3; 8000 mol/m3 is far beyond half of it
    expect(pure.checkValidity!(300, 8000, [1]).some((m) => m.code === "outside-validity")).toBe(
      true,
    );
  });
});
