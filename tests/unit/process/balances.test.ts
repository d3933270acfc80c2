/**
 * Energy balances of every step close to 1e-9 relative (the outlets are the flashed states, the
 * power and duty those of the specification), and the mass balance of a train with knock-out is
 * exact to the flash's material balance.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { massFlowKgPerS, streamEnthalpyJPerMol } from "../../../kernel-lib/src/process/stream.js";
import { valve } from "../../../kernel-lib/src/process/valve.js";
import { compressorStage } from "../../../kernel-lib/src/process/compressor.js";
import { compressorTrain } from "../../../kernel-lib/src/process/compressorTrain.js";
import { turbine } from "../../../kernel-lib/src/process/turbine.js";
import { pump } from "../../../kernel-lib/src/process/pump.js";
import { streamAt } from "./fixtures.js";

// an invented Corvid Point recycle gas with enough heavy ends to condense in the intercoolers
const gas = defineFluid({
  components: ["methane", "ethane", "propane", "n-butane", "n-pentane"],
  model: "peng-robinson",
});
const z = [0.7, 0.12, 0.09, 0.05, 0.04];
const suction = streamAt(gas, z, 313.15, 5e5, { value: 1000, unit: "kmol/h" }, "recycle gas");

describe("energy balances of the steps", () => {
  it("valve to two phases: balance, JT cooling, liquid", () => {
    const hp = streamAt(gas, z, 313.15, 60e5, { value: 100, unit: "kmol/h" });
    // an MDMT of 310 K (invented, above the outlet temperature) must raise its warning
    const r = valve(hp, { outletPressurePa: 5e5, minimumDesignMetalTemperatureK: 310 });
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    expect(r.temperatureDropK).toBeGreaterThan(5);
    expect(Math.abs(streamEnthalpyJPerMol(r.outlet) - streamEnthalpyJPerMol(hp))).toBeLessThan(
      1e-9 * Math.abs(streamEnthalpyJPerMol(hp)),
    );
    expect(r.powerW).toBe(0);
    expect(r.outlet.state.phases.length).toBe(2);
    const mdmt = r.warnings.find(
      (w) => (w as { condition?: string }).condition === "below-minimum-design-metal-temperature",
    );
    expect((mdmt as { basis?: string } | undefined)?.basis).toMatch(/310 K given by the caller/);
    expect(r.outlet.state.temperatureK < 273.15).toBe(
      r.warnings.some((w) => (w as { condition?: string }).condition === "low-temperature"),
    );
    expect(r.liquidMolarFlowMolPerS).toBeGreaterThan(0);
    expect(
      r.warnings.some((w) => (w as { condition?: string }).condition === "two-phase-outlet"),
    ).toBe(true);
  });

  it("compressor stage, both efficiency bases", () => {
    const a = compressorStage(suction, { outletPressurePa: 15e5, isentropicEfficiency: 0.78 });
    expect(a.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    const b = compressorStage(suction, {
      outletPressurePa: 15e5,
      polytropicEfficiency: 0.78,
      dischargeTemperatureLimitK: 350,
    });
    expect(b.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    expect(b.polytropicPath!.headConsistency).toBeLessThan(1e-6);
    expect(b.polytropicPath!.errorEstimate).toBeLessThan(1e-9);
    // polytropic efficiency above the isentropic one for the same machine (compression,
    // reheat effect): eta_s < eta_p
    expect(b.isentropicEfficiency).toBeLessThan(0.78);
    expect(b.dischargeTemperatureK).toBeGreaterThan(350);
    expect(
      b.warnings.some(
        (w) => (w as { condition?: string }).condition === "high-discharge-temperature",
      ),
    ).toBe(true);
    expect(b.path.length).toBeGreaterThan(2);
    expect(b.method).toMatch(/Schultz/);
  });

  it("two-stage train with intercooler and knock-out: power, duty, mass balance exact", () => {
    const t = compressorTrain(suction, {
      outletPressurePa: 40e5,
      stages: 2,
      polytropicEfficiency: 0.78,
      intercoolerTemperatureK: 308.15,
      aftercoolerTemperatureK: 308.15,
    });
    expect(t.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    expect(t.check.massBalanceRelativeError).toBeLessThan(1e-12);
    expect(t.stagePressuresPa[0]).toBeCloseTo(Math.sqrt(5e5 * 40e5), 6);
    expect(t.knockOutLiquids.length).toBeGreaterThan(0);
    const massIn = massFlowKgPerS(suction);
    const massOut = t.outlets.reduce((s, o) => s + massFlowKgPerS(o), 0);
    expect(Math.abs(massOut - massIn) / massIn).toBeLessThan(1e-12);
    // per component
    for (let i = 0; i < z.length; i++) {
      const out = t.outlets.reduce((s, o) => s + o.molarFlowMolPerS * o.z[i], 0);
      expect(Math.abs(out - suction.molarFlowMolPerS * z[i])).toBeLessThan(
        1e-12 * suction.molarFlowMolPerS,
      );
    }
    expect(t.powerW).toBeCloseTo(t.stages[0].powerW! + t.stages[1].powerW!, 6);
    expect(t.dutyW!).toBeLessThan(0);
    expect(
      t.warnings.some((w) => (w as { condition?: string }).condition === "knock-out-liquid"),
    ).toBe(true);
  });

  it("given interstage pressures and isentropic stages", () => {
    const t = compressorTrain(suction, {
      outletPressurePa: 30e5,
      interstagePressuresPa: [12e5],
      isentropicEfficiency: [0.75, 0.8],
      intercoolerTemperatureK: 313.15,
    });
    expect(t.stages.length).toBe(2);
    expect(t.stages[0].outlet.state.pressurePa).toBe(12e5);
    expect(t.check.energyBalanceRelativeError).toBeLessThan(1e-9);
  });

  it("expander and pump", () => {
    const hp = streamAt(gas, z, 313.15, 60e5, { value: 100, unit: "kmol/h" });
    const e = turbine(hp, { outletPressurePa: 20e5, isentropicEfficiency: 0.85 });
    expect(e.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    expect(e.powerW!).toBeLessThan(0);
    const ep = turbine(hp, { outletPressurePa: 20e5, polytropicEfficiency: 0.85 });
    expect(ep.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    // expansion: eta_s > eta_p
    expect(ep.isentropicEfficiency).toBeGreaterThan(0.85);
    const liquid = streamAt(gas, [0, 0, 0.2, 0.4, 0.4], 300, 10e5, { value: 10, unit: "m3/h" });
    const p = pump(liquid, { outletPressurePa: 30e5, efficiency: 0.65 });
    expect(p.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    expect(p.temperatureRiseK).toBeGreaterThan(0);
  });
});
