/**
 * The vessel model against closed forms of a perfect gas (the ideal-gas model with a constant
 * heat capacity cp = 3.5 R, gamma = 1.4): the isentropic blowdown pressure history, the choked
 * and unchoked orifice fluxes, filling to a pressure, and the closure of the balances.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import type { Component } from "../../../kernel-lib/src/components/types.js";
import { R } from "../../../kernel-lib/src/constants.js";
import { simulateVessel } from "../../../kernel-lib/src/process/vessel/simulateVessel.js";
import {
  idealGasChokedMassFlux,
  orificeMassFlux,
} from "../../../kernel-lib/src/process/vessel/orifice.js";

const GAMMA = 1.4;
const base = getComponent("nitrogen");
const range = { minTemperatureK: 1, maxTemperatureK: 1e5 };
const perfectN2: Component = {
  ...base,
  idealGasCp: { form: "polynomial", ...range, segments: [{ ...range, coefficients: [3.5] }] },
};
const gas = defineFluid({ components: [perfectN2], model: "ideal-gas" });
const M = base.molarMassKgPerMol;

function stagnation(T: number, P: number) {
  const st = gas.stateAtTP(T, P);
  return {
    pressurePa: P,
    temperatureK: T,
    x: [1],
    enthalpyJPerMol: st.molar.h,
    entropyJPerMolK: st.molar.s,
    molarMassKgPerMol: M,
  };
}

describe("orifice flux of a perfect gas", () => {
  it("choked: equals the closed-form choked flux and the critical pressure ratio", () => {
    // closed forms: G* = P0 sqrt(gamma M/(R T0)) (2/(gamma+1))^((gamma+1)/(2(gamma-1))),
    // P*/P0 = (2/(gamma+1))^(gamma/(gamma-1)) (A. H. Shapiro, The Dynamics and Thermodynamics
    // of Compressible Fluid Flow, 1953, ch. 4)
    const f = orificeMassFlux(gas, stagnation(300, 10e5), 1e5);
    const closed = idealGasChokedMassFlux(10e5, 300, GAMMA, M);
    expect(f.choked).toBe(true);
    expect(Math.abs(f.massFluxKgPerM2S / closed - 1)).toBeLessThan(1e-9);
    expect(f.throatPressurePa / 10e5).toBeCloseTo((2 / 2.4) ** 3.5, 6);
    expect(f.throatTemperatureK).toBeCloseTo(300 / 1.2, 4);
  });

  it("unchoked: equals the closed-form subsonic nozzle flux", () => {
    // G = P0 sqrt(2 gamma M / ((gamma - 1) R T0)) sqrt(r^(2/gamma) - r^((gamma+1)/gamma)),
    // r = Pb/P0 (Shapiro 1953, ch. 4)
    const r = 0.8;
    const f = orificeMassFlux(gas, stagnation(320, 5e5), r * 5e5);
    const closed =
      5e5 *
      Math.sqrt((2 * GAMMA * M) / ((GAMMA - 1) * R * 320)) *
      Math.sqrt(r ** (2 / GAMMA) - r ** ((GAMMA + 1) / GAMMA));
    expect(f.choked).toBe(false);
    expect(f.throatPressurePa).toBe(r * 5e5);
    expect(Math.abs(f.massFluxKgPerM2S / closed - 1)).toBeLessThan(1e-9);
  });
});

describe("blowdown of a perfect gas", () => {
  const volume = 1;
  const D = Math.cbrt((6 * volume) / Math.PI);
  const d = 0.01;
  const Cd = 0.8;
  const P0 = 50e5;
  const T0 = 300;

  it("adiabatic, choked throughout: the closed-form pressure history to the integrator's tolerance", () => {
    const run = simulateVessel(
      {
        fluid: gas,
        shape: { kind: "sphere", diameterM: D },
        initial: { temperatureK: T0, pressurePa: P0 },
        outlets: [{ diameterM: d, dischargeCoefficient: Cd, backPressurePa: 1e5 }],
        until: { pressurePa: 2e5 },
      },
      { relativeTolerance: 1e-8 },
    );
    // the closed form (isentropic contents, choked orifice):
    // P/P0 = [1 + (gamma-1)/2 Cd A c0/V (2/(gamma+1))^((gamma+1)/(2(gamma-1))) t]^(-2 gamma/(gamma-1))
    const c0 = Math.sqrt((GAMMA * R * T0) / M);
    const A = (Math.PI * d * d) / 4;
    const k =
      ((GAMMA - 1) / 2) *
      ((Cd * A * c0) / volume) *
      (2 / (GAMMA + 1)) ** ((GAMMA + 1) / (2 * (GAMMA - 1)));
    let worst = 0;
    run.series.timeS.forEach((t, i) => {
      const ratio = (1 + k * t) ** ((-2 * GAMMA) / (GAMMA - 1));
      worst = Math.max(worst, Math.abs(run.series.pressurePa[i] / P0 / ratio - 1));
      // isentropic contents: T/T0 = (P/P0)^((gamma-1)/gamma)
      const tRatio = ratio ** ((GAMMA - 1) / GAMMA);
      expect(Math.abs(run.series.temperatureK[i] / (T0 * tRatio) - 1)).toBeLessThan(1e-6);
    });
    expect(run.series.timeS.length).toBeGreaterThan(10);
    expect(worst).toBeLessThan(1e-6);
    expect(run.stoppedBecause).toBe("target-pressure");
    const tTarget = ((2e5 / P0) ** (-(GAMMA - 1) / (2 * GAMMA)) - 1) / k;
    expect(Math.abs(run.timeToTargetS! / tTarget - 1)).toBeLessThan(1e-6);
    expect(run.series.choked.every((c) => c)).toBe(true);
    expect(run.cautions.join(" ")).toMatch(/licensed engineers/);
    expect(run.notModelled.length).toBeGreaterThan(3);
  });

  it("conserves mass and energy of contents + wall + outflow to 1e-8 with wall heat transfer", () => {
    const run = simulateVessel({
      fluid: gas,
      shape: { kind: "vertical-cylinder", diameterM: 0.8, lengthM: 2, heads: "hemispherical" },
      wall: { thicknessM: 0.02 },
      initial: { temperatureK: T0, pressurePa: P0 },
      outlets: [{ diameterM: 0.015, dischargeCoefficient: 0.8 }],
      heat: {
        kind: "wall",
        inside: { coefficientWPerM2K: 150 },
        outside: { kind: "air", ambientK: 295 },
      },
      until: { timeS: 60 },
    });
    expect(run.stoppedBecause).toBe("time");
    expect(run.balance.massRelativeError).toBeLessThan(1e-8);
    expect(run.balance.energyRelativeError).toBeLessThan(1e-8);
    // the wall cools and warms the gas: contents warmer than the isentrope, wall below its start
    const last = run.series.timeS.length - 1;
    expect(run.wallModelled).toBe(true);
    expect(run.series.wallTemperatureK![last]).toBeLessThan(T0);
    const P = run.series.pressurePa[last];
    expect(run.series.temperatureK[last]).toBeGreaterThan(T0 * (P / P0) ** (1 / 3.5));
    expect(run.massReleasedKg).toBeGreaterThan(0);
  });

  it("filling: the closed-form final temperature of adiabatic filling", () => {
    // energy balance of a rigid adiabatic tank filled from a supply at Ts (perfect gas):
    // n_f cv T_f = n_1 cv T_1 + (n_f - n_1) cp Ts with n_f = P_f V / (R T_f) (closed form)
    const V = (Math.PI * D ** 3) / 6;
    const P1 = 1e5;
    const T1 = 290;
    const Ts = 300;
    const Pf = 30e5;
    const run = simulateVessel({
      fluid: gas,
      shape: { kind: "sphere", diameterM: D },
      initial: { temperatureK: T1, pressurePa: P1 },
      supply: { temperatureK: Ts, pressurePa: 60e5, diameterM: 0.01, dischargeCoefficient: 0.8 },
      until: { pressurePa: Pf },
    });
    const cv = 2.5 * R;
    const cp = 3.5 * R;
    const n1 = (P1 * V) / (R * T1);
    const dn = ((Pf * V * cv) / R - n1 * cv * T1) / (cp * Ts);
    const Tf = (Pf * V) / (R * (n1 + dn));
    const last = run.series.timeS.length - 1;
    expect(run.kind).toBe("filling");
    expect(run.stoppedBecause).toBe("target-pressure");
    expect(run.series.pressurePa[last]).toBeCloseTo(Pf, -1);
    expect(Math.abs(run.series.temperatureK[last] - Tf)).toBeLessThan(1e-4);
    expect(run.massReleasedKg).toBeLessThan(0);
    expect(run.maximum.temperatureK).toBeGreaterThan(Ts);
  });
});
