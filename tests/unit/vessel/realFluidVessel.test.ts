/**
 * The vessel model with a real fluid (Peng-Robinson methane): adiabatic contents on the
 * isentrope of the initial state (checked against the (P, s) flash), the dew line crossed with
 * the liquid amount shown, the balances with natural convection at the wall, and the orifice
 * routes agreeing with each other.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { simulateVessel } from "../../../kernel-lib/src/process/vessel/simulateVessel.js";
import { saturationAtPressure } from "../../../kernel-lib/src/phase/saturation.js";
import { orificeMassFlux } from "../../../kernel-lib/src/process/vessel/orifice.js";

const methane = defineFluid({ components: ["methane"], model: "peng-robinson" });
const shape = { kind: "vertical-cylinder", diameterM: 1, lengthM: 3 } as const;
const outlet = { diameterM: 0.02, dischargeCoefficient: 0.8, backPressurePa: 1e5 };

describe("adiabatic blowdown of methane (PR) from 100 bar, 25 degC", () => {
  it("single phase: the contents follow the (P, s0) isentrope of the initial state", () => {
    const run = simulateVessel({
      fluid: methane,
      shape,
      initial: { temperatureK: 298.15, pressurePa: 100e5 },
      outlets: [outlet],
      until: { pressurePa: 30e5 },
    });
    const s0 = methane.stateAtTP(298.15, 100e5).molar.s;
    expect(run.series.phaseCount.every((n) => n === 1)).toBe(true);
    const n = run.series.timeS.length;
    expect(n).toBeGreaterThan(6);
    for (const k of [1, Math.floor(n / 3), Math.floor((2 * n) / 3), n - 1]) {
      const P = run.series.pressurePa[k];
      const ref = methane.flashPS(P, s0); // the (P, s) flash, independent of the vessel model
      expect(Math.abs(run.series.temperatureK[k] - ref.temperatureK)).toBeLessThan(2e-3);
    }
    expect(run.series.pressurePa[n - 1]).toBeCloseTo(30e5, -1);
    expect(run.minimum.temperatureK).toBe(run.series.temperatureK[n - 1]);
  });

  it("reaches the dew line and becomes two-phase, with the liquid amount shown", () => {
    const run = simulateVessel({
      fluid: methane,
      shape,
      initial: { temperatureK: 298.15, pressurePa: 100e5 },
      outlets: [outlet],
      until: { pressurePa: 3e5 },
    });
    expect(run.phaseChanges.length).toBeGreaterThanOrEqual(1);
    const change = run.phaseChanges[0];
    expect(change.from).toBe(1);
    expect(change.to).toBe(2);
    const last = run.series.timeS.length - 1;
    expect(run.series.phaseCount[last]).toBe(2);
    expect(run.series.liquidFraction[last]).toBeGreaterThan(0);
    expect(run.series.liquidVolumeM3[last]).toBeGreaterThan(0);
    // two phases of a pure fluid: the contents sit on the saturation line
    const sat = saturationAtPressure(methane.model, run.series.pressurePa[last]);
    expect(Math.abs(sat.temperatureK - run.series.temperatureK[last])).toBeLessThan(1e-6);
    expect(run.balance.massRelativeError).toBeLessThan(1e-8);
    expect(run.balance.energyRelativeError).toBeLessThan(1e-8);
  });

  it("balances close to 1e-8 with natural convection inside and still air outside", () => {
    // transport properties injected (constant, typical of methane gas; only the balance is checked)
    const run = simulateVessel({
      fluid: methane,
      shape,
      wall: { thicknessM: 0.03 },
      initial: { temperatureK: 298.15, pressurePa: 100e5 },
      outlets: [outlet],
      heat: {
        kind: "wall",
        outside: { kind: "air", ambientK: 288.15 },
        transport: () => ({ viscosityPaS: 1.2e-5, thermalConductivityWPerMK: 0.035 }),
      },
      minimumDesignMetalTemperatureK: 273.15,
      until: { pressurePa: 20e5 },
    });
    expect(run.balance.massRelativeError).toBeLessThan(1e-8);
    expect(run.balance.energyRelativeError).toBeLessThan(1e-8);
    const last = run.series.timeS.length - 1;
    expect(run.wallModelled).toBe(true);
    expect(run.series.wallTemperatureK![last]).toBeLessThan(298.15);
    // the gas falls below the MDMT: the result says so first
    expect(run.minimum.temperatureK).toBeLessThan(273.15);
    expect(run.cautions[0]).toMatch(/BELOW the minimum design metal temperature/);
  });

  it("wall heat transfer with the fluid's own transport properties warms the gas above the adiabatic run", () => {
    const common = {
      fluid: methane,
      shape,
      initial: { temperatureK: 298.15, pressurePa: 100e5 },
      outlets: [outlet],
      until: { pressurePa: 40e5 },
    };
    const adiabatic = simulateVessel(common);
    const walled = simulateVessel({
      ...common,
      wall: { thicknessM: 0.03 },
      heat: { kind: "wall", outside: { kind: "air", ambientK: 298.15 } },
    });
    expect(walled.warnings.map((w) => w.message).join(" ")).toMatch(/Chung/);
    expect(walled.minimum.temperatureK).toBeGreaterThan(adiabatic.minimum.temperatureK);
    expect(walled.minimum.wallTemperatureK).toBeLessThan(298.15);
    expect(walled.minimum.wallTemperatureK).toBeGreaterThan(walled.minimum.temperatureK);
    expect(walled.balance.energyRelativeError).toBeLessThan(1e-8);
  });
});

describe("orifice flux of methane", () => {
  it("the single-phase and equilibrium routes agree where the throat is one phase", () => {
    const st = methane.stateAtTP(298.15, 100e5);
    const stag = {
      pressurePa: 100e5,
      temperatureK: 298.15,
      x: [1],
      enthalpyJPerMol: st.molar.h,
      entropyJPerMolK: st.molar.s,
      molarMassKgPerMol: st.molarMassKgPerMol,
    };
    const a = orificeMassFlux(methane, stag, 1e5, { route: "single-phase" });
    const b = orificeMassFlux(methane, stag, 1e5, { route: "equilibrium" });
    expect(a.choked && b.choked).toBe(true);
    expect(Math.abs(a.massFluxKgPerM2S / b.massFluxKgPerM2S - 1)).toBeLessThan(1e-9);
    // at the choke of the single-phase route the velocity equals the speed of sound
    const throat = methane.stateAtTP(a.throatTemperatureK, a.throatPressurePa);
    expect(Math.abs(a.throatVelocityMPerS / throat.speedOfSoundMPerS - 1)).toBeLessThan(1e-5);
  });

  it("from saturated vapour the throat is two-phase (HEM) and G is largest at the throat found", () => {
    // saturated methane vapour at 30 bar: the isentrope enters the dome at once
    const sat = saturationAtPressure(methane.model, 30e5);
    const v = methane.stateAtTRho(sat.temperatureK, sat.vaporDensityMolPerM3);
    const stag = {
      pressurePa: sat.pressurePa,
      temperatureK: sat.temperatureK,
      x: [1],
      enthalpyJPerMol: v.molar.h,
      entropyJPerMolK: v.molar.s,
      molarMassKgPerMol: v.molarMassKgPerMol,
    };
    const f = orificeMassFlux(methane, stag, 1e5);
    expect(f.route).toBe("equilibrium");
    expect(f.choked).toBe(true);
    expect(f.twoPhaseThroat).toBe(true);
    expect(f.throatVaporFraction).toBeLessThan(1);
    // G = rho w along the isentrope from the (P, s) flash, independently, 1 % either side
    const G = (P: number): number => {
      const eq = methane.flashPS(P, stag.entropyJPerMolK);
      let h = 0;
      let vol = 0;
      for (const p of eq.phases) {
        h += p.amount * p.state.molar.h;
        vol += p.amount / p.state.densityMolPerM3;
      }
      return (
        (stag.molarMassKgPerMol / vol) *
        Math.sqrt((2 * (stag.enthalpyJPerMol - h)) / stag.molarMassKgPerMol)
      );
    };
    expect(Math.abs(G(f.throatPressurePa) / f.massFluxKgPerM2S - 1)).toBeLessThan(1e-9);
    expect(G(f.throatPressurePa * 1.01)).toBeLessThan(f.massFluxKgPerM2S);
    expect(G(f.throatPressurePa * 0.99)).toBeLessThan(f.massFluxKgPerM2S);
  });
});
