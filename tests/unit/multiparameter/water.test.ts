/**
 * IAPWS-95 for water against the verification tables of the IAPWS release.
 *
 * Reference values: tests/fixtures/iapws-r6-95-table6.json, iapws-r6-95-table7.json and
 * iapws-r6-95-constants.json (IAPWS R6-95(2018), Tables 6 and 7 and eqs. (1)-(3), from memory of
 * the release; each value with where it is printed and its tolerance with the reason: nine printed
 * significant digits, so 1e-8 relative; 1e-8 absolute for the exact zero phi0_dt).
 */
import { describe, expect, it } from "vitest";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { referenceStateTRho } from "../../../kernel-lib/src/state/referenceStates.js";
import { emptyReducedHelmholtz } from "../../../kernel-lib/src/eos/multiparameter/residualPart.js";
import {
  expectReference,
  referenceValue,
  referenceValues,
} from "../../fixtures/referenceValues.js";

const TABLE6 = "iapws-r6-95-table6.json";
const TABLE7 = "iapws-r6-95-table7.json";
const CONSTANTS = "iapws-r6-95-constants.json";
const constant = (key: string): number => referenceValue(CONSTANTS, key).value;

const water = referenceFluid("water");
const M = constant("M") / 1000; // kg/mol (molar mass used with R = 0.46151805 kJ/(kg K))

describe("IAPWS-95: R6-95(2018) Table 6 (T = 500 K, rho = 838.025 kg/m3)", () => {
  const tau = constant("Tc") / 500;
  const delta = 838.025 / constant("rhoc");
  const o = water.idealReduced(tau, delta, emptyReducedHelmholtz());
  const r = water.residualReduced(tau, delta, emptyReducedHelmholtz());
  const t6 = (key: string) => referenceValue(TABLE6, key);
  it("ideal part and derivatives", () => {
    expectReference(o.f, t6("phi0"));
    expectReference(o.fD / delta, t6("phi0_delta"));
    expectReference(o.fDD / (delta * delta), t6("phi0_deltadelta"));
    expectReference(o.fT / tau, t6("phi0_tau"));
    expectReference(o.fTT / (tau * tau), t6("phi0_tautau"));
    expectReference(o.fDT / (tau * delta), t6("phi0_deltatau"));
  });
  it("residual part and derivatives", () => {
    expectReference(r.f, t6("phir"));
    expectReference(r.fD / delta, t6("phir_delta"));
    expectReference(r.fDD / (delta * delta), t6("phir_deltadelta"));
    expectReference(r.fT / tau, t6("phir_tau"));
    expectReference(r.fTT / (tau * tau), t6("phir_tautau"));
    expectReference(r.fDT / (tau * delta), t6("phir_deltatau"));
  });
});

describe("IAPWS-95: R6-95(2018) Table 7 (single-phase region)", () => {
  // the states of the table: every "<state>/rho" entry, with T in the key
  const states = [...referenceValues(TABLE7).keys()]
    .filter((k) => k.endsWith("/rho"))
    .map((k) => k.slice(0, -"/rho".length));
  it("has the eleven rows of the table", () => {
    expect(states).toHaveLength(11);
  });
  for (const state of states) {
    const T = Number(/^T(\d+)-/.exec(state)?.[1]);
    const rho = referenceValue(TABLE7, `${state}/rho`).value;
    it(`T = ${T} K, rho = ${rho} kg/m3`, () => {
      const props = referenceStateTRho(water, T, rho / M);
      expectReference(props.pressurePa / 1e6, referenceValue(TABLE7, `${state}/p`));
      expectReference(props.molar.cv / M / 1e3, referenceValue(TABLE7, `${state}/cv`));
      expectReference(props.speedOfSoundMPerS, referenceValue(TABLE7, `${state}/w`));
      expectReference(props.molar.s / M / 1e3, referenceValue(TABLE7, `${state}/s`));
      expect(props.referenceState.kind).toBe("fluid-convention");
    });
  }
});

describe("IAPWS-95: published constants", () => {
  it("uses the published gas constant and critical point", () => {
    // R (kJ/(kg K)) times M (kg/mol) in J/(mol K)
    expectReference(water.gasConstant / M / 1000, referenceValue(CONSTANTS, "R"));
    expectReference(water.critical.temperatureK, referenceValue(CONSTANTS, "Tc"));
    expectReference(water.critical.densityMolPerM3 * M, referenceValue(CONSTANTS, "rhoc"));
    expectReference(water.critical.pressurePa / 1e6, referenceValue(CONSTANTS, "pc"));
  });
  it("reproduces the critical pressure at (Tc, rhoc)", () => {
    // Non-analytic terms are singular exactly at the critical point, so the evaluation nudges
    // delta by 1e-12; the pressure is still continuous (tolerance and reason in the fixture).
    const props = referenceStateTRho(water, constant("Tc"), constant("rhoc") / M);
    expectReference(props.pressurePa / 1e6, referenceValue(CONSTANTS, "pc-at-Tc-rhoc"));
    expect(Math.abs(props.dPdRhoPaM3PerMol)).toBeLessThan(
      1e-3 * (props.pressurePa / props.densityMolPerM3),
    );
  });
});
