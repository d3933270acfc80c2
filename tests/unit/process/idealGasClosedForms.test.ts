/**
 * Ideal-gas limits in closed form (constant cp, P v = R T): for a pressure ratio r,
 *   isentropic:  T2s / T1 = r^(R/cp),            isentropic head cp (T2s - T1);
 *   polytropic:  T2 / T1  = r^(R/(cp eta_p)),     head eta_p cp (T2 - T1) = n/(n-1) R (T2 - T1),
 *                n = 1 / (1 - R/(cp eta_p));
 * and the expander's polytropic path T2 / T1 = r^(R eta_p / cp). These follow from dh = cp dT
 * and dh = v dP / eta_p (any thermodynamics text, e.g. the derivation in Schultz 1962, J. Eng.
 * Power 84, 69-82, eqs. for the perfect gas); written out here, not looked up.
 */
import { describe, expect, it } from "vitest";
import { R } from "../../../kernel-lib/src/constants.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import type { Component } from "../../../kernel-lib/src/components/types.js";
import { defineStream } from "../../../kernel-lib/src/process/stream.js";
import { compressorStage } from "../../../kernel-lib/src/process/compressor.js";
import { integratePolytropicPath } from "../../../kernel-lib/src/process/polytropicPath.js";
import { overallProperty } from "../../../kernel-lib/src/phase/flash/stateFunctionFlash.js";

/** Nitrogen with cp = 3.5 R at every temperature (a one-term polynomial in units of R). */
function constantCpNitrogen(): Component {
  const c = getComponent("nitrogen");
  const range = { minTemperatureK: 1, maxTemperatureK: 1e5 };
  return {
    ...c,
    idealGasCp: { form: "polynomial", ...range, segments: [{ ...range, coefficients: [3.5] }] },
  };
}

/** Oxygen's record with cp = 3.5 R as well: a second ideal gas of the same cp. */
function constantCpPartner(): Component {
  const c = getComponent("oxygen");
  const range = { minTemperatureK: 1, maxTemperatureK: 1e5 };
  return {
    ...c,
    idealGasCp: { form: "polynomial", ...range, segments: [{ ...range, coefficients: [3.5] }] },
  };
}

// Two components, not one: the pure-fluid branch of the (P, h) and (P, s) flashes looks for a
// critical point, which the ideal-gas model does not have. Equal cp, so the mixture's cp is 3.5 R.
const gas = defineFluid({
  components: [constantCpNitrogen(), constantCpPartner()],
  model: "ideal-gas",
});
const cp = 3.5 * R;
const T1 = 300;
const P1 = 1e5;
const r = 4;
const z = [0.5, 0.5];
const feed = defineStream({ fluid: gas, z, T: T1, P: P1, flow: { value: 1, unit: "mol/s" } });
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("compressor stage, ideal gas with constant cp: closed forms", () => {
  it("the fluid has cp = 3.5 R", () => {
    expect(rel(feed.state.phases[0].state.molar.cp, cp)).toBeLessThan(1e-12);
  });

  it("isentropic efficiency: T2s, head, work, T2", () => {
    const eta = 0.8;
    const res = compressorStage(feed, { outletPressurePa: r * P1, isentropicEfficiency: eta });
    const T2s = T1 * r ** (R / cp);
    expect(rel(res.isentropicDischargeTemperatureK, T2s)).toBeLessThan(1e-9);
    expect(rel(res.isentropicHeadJPerMol, cp * (T2s - T1))).toBeLessThan(1e-8);
    const w = (cp * (T2s - T1)) / eta;
    expect(rel(res.specificWorkJPerMol!, w)).toBeLessThan(1e-8);
    expect(rel(res.dischargeTemperatureK, T1 + w / cp)).toBeLessThan(1e-9);
    expect(rel(res.powerW!, w)).toBeLessThan(1e-8);
    expect(res.check.energyBalanceRelativeError).toBeLessThan(1e-9);
  });

  it("polytropic efficiency: the exact path reproduces T2, head and exponent to 1e-8", () => {
    const eta = 0.75;
    const res = compressorStage(feed, {
      outletPressurePa: r * P1,
      polytropicEfficiency: eta,
      polytropic: { tolerance: 1e-11 },
    });
    const T2 = T1 * r ** (R / (cp * eta));
    expect(rel(res.dischargeTemperatureK, T2)).toBeLessThan(1e-8);
    const n = 1 / (1 - R / (cp * eta));
    expect(rel(res.polytropicExponent, n)).toBeLessThan(1e-8);
    expect(rel(res.polytropicHeadJPerMol!, (n / (n - 1)) * R * (T2 - T1))).toBeLessThan(1e-8);
    expect(rel(res.specificWorkJPerMol!, cp * (T2 - T1))).toBeLessThan(1e-8);
    expect(res.polytropicPath!.headConsistency).toBeLessThan(1e-8);
    // Schultz's method is exact for the perfect gas: f = 1
    expect(Math.abs(res.schultz!.correctionFactor - 1)).toBeLessThan(1e-8);
    expect(Math.abs(res.schultz!.headRelativeError)).toBeLessThan(1e-8);
    expect(Math.abs(res.schultz!.dischargeTemperatureDifferenceK)).toBeLessThan(1e-6);
    // the isentropic efficiency implied by the polytropic discharge
    const T2s = T1 * r ** (R / cp);
    expect(rel(res.isentropicEfficiency, (T2s - T1) / (T2 - T1))).toBeLessThan(1e-8);
  });

  it("the expansion path (k = eta_p) reproduces T2/T1 = r^(R eta_p/cp)", () => {
    const hot = defineStream({ fluid: gas, z, T: 600, P: 20e5, flow: { value: 1, unit: "mol/s" } });
    const eta = 0.85;
    const p = integratePolytropicPath(gas, z, hot.state, 5e5, eta, { tolerance: 1e-11 });
    expect(rel(p.outlet.temperatureK, 600 * 0.25 ** ((R * eta) / cp))).toBeLessThan(1e-9);
  });
});

describe("exact polytropic path with a temperature-dependent ideal-gas cp", () => {
  // For an ideal gas the polytropic path obeys s°(T2) - s°(T1) = (R / eta_p) ln(P2/P1) (from
  // cp dT / T = R dP / (eta_p P)): a condition on the end state the RK4 path does not use.
  const methane = defineFluid({ components: ["methane"], model: "ideal-gas" });
  it("meets s°(T2) - s°(T1) = (R/eta_p) ln r to the tolerance", () => {
    const inlet = methane.flashTP(290, 20e5);
    const eta = 0.8;
    const p = integratePolytropicPath(methane, [1], inlet, 3 * 20e5, 1 / eta, { tolerance: 1e-10 });
    const s1 = overallProperty(inlet, "s");
    const s2 = overallProperty(p.outlet, "s");
    // s = s°(T) - R ln(P/P°): so s°(T2) - s°(T1) = s2 - s1 + R ln r
    const lhs = s2 - s1 + R * Math.log(3);
    expect(Math.abs(lhs - (R / eta) * Math.log(3)) / ((R / eta) * Math.log(3))).toBeLessThan(1e-8);
    expect(p.steps).toBeGreaterThanOrEqual(4);
    expect(p.route).toBe("single-phase");
  });
});
