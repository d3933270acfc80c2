/**
 * Steam turbine and throttling against steam-table values. Reference values are from memory of
 * Y. A. Cengel and M. A. Boles, "Thermodynamics: An Engineering Approach", 7th ed. (2011),
 * Table A-5 (saturated water, pressure table) and Table A-6 (superheated water), which are
 * computed from IAPWS-95; printed to 0.1 kJ/kg and 0.0001 kJ/(kg K), so the tolerances are a few
 * units in the last printed digit. The fluid here is water on IAPWS-95 (eos/multiparameter) with
 * IAPWS-95's own ideal part and reference state (u = s = 0 for the saturated liquid at the
 * triple point), the convention of those tables.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { referenceFluidBinding } from "../../../kernel-lib/src/state/referenceStates.js";
import { defineStream, massFlowKgPerS } from "../../../kernel-lib/src/process/stream.js";
import { turbine } from "../../../kernel-lib/src/process/turbine.js";
import { valve } from "../../../kernel-lib/src/process/valve.js";
import { pump } from "../../../kernel-lib/src/process/pump.js";

const water = referenceFluid("water");
const steam = defineFluid({
  components: ["water"],
  model: water,
  idealGas: referenceFluidBinding(water).idealGas,
});
// 4 MPa, 400 degC (Table A-6): h = 3214.5 kJ/kg, s = 6.7714 kJ/(kg K)
const header = defineStream({
  fluid: steam,
  T: 673.15,
  P: 40e5,
  flow: { value: 1, unit: "kg/s" },
  name: "HP steam",
});
// 10 kPa saturated (Table A-5): Tsat 45.81 degC, hf 191.81, hfg 2392.1 kJ/kg, sf 0.6492,
// sfg 7.4996 kJ/(kg K)
const hf = 191.81;
const hfg = 2392.1;
const sf = 0.6492;
const sfg = 7.4996;

describe("steam turbine (IAPWS-95) against the steam table", () => {
  it("the inlet state is the table's", () => {
    const s = header.state.phases[0].state;
    expect(Math.abs(s.mass.h / 1e3 - 3214.5)).toBeLessThan(0.15);
    expect(Math.abs(s.mass.s / 1e3 - 6.7714)).toBeLessThan(0.0002);
    expect(massFlowKgPerS(header)).toBeCloseTo(1, 12);
  });

  it("isentropic expansion to 10 kPa: quality and work", () => {
    const r = turbine(header, { outletPressurePa: 10e3, isentropicEfficiency: 1 });
    // hand calculation from the table: x = (6.7714 - 0.6492) / 7.4996 = 0.81634,
    // h2s = 191.81 + x 2392.1 = 2144.6 kJ/kg, w = 3214.5 - 2144.6 = 1069.9 kJ/kg
    const x = (6.7714 - sf) / sfg;
    expect(Math.abs(r.exitVaporFraction - x)).toBeLessThan(5e-5);
    expect(Math.abs(-r.powerW! / 1e3 - (3214.5 - (hf + x * hfg)))).toBeLessThan(0.4);
    expect(Math.abs(r.outletTemperatureK - (45.81 + 273.15))).toBeLessThan(0.01);
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
  });

  it("eta_s = 0.85: wet exit quality, liquid flow and the warning", () => {
    const r = turbine(header, { outletPressurePa: 10e3, isentropicEfficiency: 0.85 });
    // hand calculation: h2 = 3214.5 - 0.85 x 1069.9 = 2305.1 kJ/kg, x2 = (2305.1 - 191.81) / 2392.1
    const h2 = 3214.5 - 0.85 * (3214.5 - (hf + ((6.7714 - sf) / sfg) * hfg));
    const x2 = (h2 - hf) / hfg;
    expect(Math.abs(r.exitVaporFraction - x2)).toBeLessThan(2e-4);
    expect(r.exitLiquidMassFlowKgPerS).toBeCloseTo(1 - r.exitVaporFraction, 9);
    expect(r.isentropicEfficiency).toBe(0.85);
    // x2 = 0.883 > 0.88: a two-phase exit, not below the default minimum
    expect(r.warnings.map((w) => (w as { condition?: string }).condition)).toContain(
      "two-phase-outlet",
    );
    // the isentropic exit (x = 0.816) is below the default minimum 0.88
    const wetter = turbine(header, { outletPressurePa: 10e3, isentropicEfficiency: 1 });
    expect(wetter.warnings.map((w) => (w as { condition?: string }).condition)).toContain(
      "wet-expander-exit",
    );
    expect(wetter.caution).toMatch(/screening/);
  });

  it("throttling to 100 kPa: isenthalpic, superheated, about 368.6 degC", () => {
    const r = valve(header, { outletPressurePa: 1e5 });
    // Table A-6 at 0.1 MPa: 300 degC h = 3074.5, 400 degC h = 3278.6 kJ/kg; linear
    // interpolation at h = 3214.5 gives 368.6 degC (the interpolation itself is good to ~0.5 K)
    const Tinterp = 300 + (100 * (3214.5 - 3074.5)) / (3278.6 - 3074.5);
    expect(Math.abs(r.outlet.state.temperatureK - 273.15 - Tinterp)).toBeLessThan(1);
    expect(r.outletVaporFraction).toBe(1);
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    expect(r.path.length).toBe(6);
  });

  it("boiler feed pump: 10 kPa saturated liquid to 4 MPa", () => {
    // saturated liquid at 10 kPa, slightly subcooled so the inlet is one liquid phase
    const cond = defineStream({
      fluid: steam,
      T: 45.0 + 273.15,
      P: 10e3 + 1,
      flow: { value: 1, unit: "kg/s" },
    });
    const r = pump(cond, { outletPressurePa: 40e5, efficiency: 1 });
    // hand calculation: w = v dP = 0.00101 m3/kg x (4000 - 10) kPa = 4.03 kJ/kg (vf at 10 kPa
    // from Table A-5: 0.001010 m3/kg)
    expect(Math.abs(r.powerW! / 1e3 - 0.00101 * 3990)).toBeLessThan(0.02);
    // isentropic compression of a liquid warms it by a few hundredths of a kelvin
    expect(r.temperatureRiseK).toBeGreaterThan(0);
    expect(r.temperatureRiseK).toBeLessThan(0.2);
    const real = pump(cond, { outletPressurePa: 40e5, efficiency: 0.7 });
    // the lost work heats the liquid: about (1/0.7 - 1) 4.03 / 4.18 = 0.41 K more
    expect(real.temperatureRiseK - r.temperatureRiseK).toBeGreaterThan(0.35);
    expect(real.temperatureRiseK - r.temperatureRiseK).toBeLessThan(0.47);
    expect(real.check.energyBalanceRelativeError).toBeLessThan(1e-9);
  });
});
