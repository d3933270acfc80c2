/**
 * Mixer and separator (process/mixer.ts, separator.ts): balances closed (energy to 1e-9
 * relative; component and mass flows to round-off), the outlet pressure rule of the mixer,
 * three outlet phases of a separator with water, and refused input.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { massFlowKgPerS } from "../../../kernel-lib/src/process/stream.js";
import { mixer } from "../../../kernel-lib/src/process/mixer.js";
import { separator } from "../../../kernel-lib/src/process/separator.js";
import { overallProperty } from "../../../kernel-lib/src/phase/flash/stateFunctionFlash.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { LIGHT_GAS_Z, lightGas, streamAt } from "./fixtures.js";

const gas = lightGas();

describe("mixer", () => {
  const a = streamAt(gas, [0.9, 0.08, 0.02], 310, 30e5, { value: 2, unit: "mol/s" });
  const b = streamAt(gas, [0.3, 0.4, 0.3], 250, 25e5, { value: 360, unit: "kg/h" });

  it("closes the energy and component balances at the lowest inlet pressure", () => {
    const r = mixer([a, b]);
    const F = a.molarFlowMolPerS + b.molarFlowMolPerS;
    expect(r.outlet.molarFlowMolPerS).toBeCloseTo(F, 12);
    expect(r.outlet.state.pressurePa).toBe(25e5);
    const Hin =
      a.molarFlowMolPerS * overallProperty(a.state, "h") +
      b.molarFlowMolPerS * overallProperty(b.state, "h");
    const Hout = F * overallProperty(r.outlet.state, "h");
    expect(Math.abs(Hout - Hin) / Math.abs(Hin)).toBeLessThan(1e-9);
    for (let i = 0; i < 3; i++) {
      const nin = a.molarFlowMolPerS * a.z[i] + b.molarFlowMolPerS * b.z[i];
      expect(Math.abs(F * r.outlet.z[i] - nin)).toBeLessThan(1e-14 * F);
    }
    expect(Math.abs(massFlowKgPerS(r.outlet) - massFlowKgPerS(a) - massFlowKgPerS(b))).toBeLessThan(
      1e-14,
    );
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    // the outlet lies between the inlet temperatures (no phase change drives it outside here)
    expect(r.outlet.state.temperatureK).toBeGreaterThan(250);
    expect(r.outlet.state.temperatureK).toBeLessThan(310);
  });

  it("a stream mixed with itself leaves at its own temperature", () => {
    const r = mixer([a, a]);
    expect(Math.abs(r.outlet.state.temperatureK - 310)).toBeLessThan(1e-6);
  });

  it("refuses an outlet pressure above the lowest inlet, and an empty list", () => {
    expect(() => mixer([a, b], { outletPressurePa: 26e5 })).toThrow(/spec\.outletPressurePa/);
    expect(() => mixer([])).toThrow(InputError);
    const other = defineFluid({
      components: ["methane", "ethane", "n-butane"],
      model: "peng-robinson",
    });
    const c = streamAt(other, [0.5, 0.3, 0.2], 300, 25e5);
    expect(() => mixer([a, c])).toThrow(/inlets\[1\]\.fluid/);
  });
});

describe("separator", () => {
  const feed = streamAt(
    gas,
    LIGHT_GAS_Z,
    320,
    20e5,
    { value: 100, unit: "kmol/h" },
    "KO drum feed",
  );

  it("at given T and P: vapour and liquid, component and mass balances to round-off", () => {
    const r = separator(feed, { temperatureK: 260 });
    expect(r.vapor).toBeDefined();
    expect(r.liquid).toBeDefined();
    expect(r.liquid2).toBeUndefined();
    expect(r.outlet).toBe(r.vapor);
    const F = feed.molarFlowMolPerS;
    for (let i = 0; i < 3; i++) {
      let out = 0;
      for (const s of r.outlets) out += s.molarFlowMolPerS * s.z[i];
      expect(Math.abs(out - F * feed.z[i]) / F).toBeLessThan(1e-12);
    }
    const mOut = r.outlets.reduce((m, s) => m + massFlowKgPerS(s), 0);
    expect(Math.abs(mOut - massFlowKgPerS(feed)) / massFlowKgPerS(feed)).toBeLessThan(1e-12);
    expect(r.materialBalanceError).toBeLessThan(1e-12);
    // duty equals the enthalpy change of the whole stream
    const Q = F * (overallProperty(r.equilibrium, "h") - overallProperty(feed.state, "h"));
    expect(Math.abs(r.dutyW - Q) / Math.abs(Q)).toBeLessThan(1e-12);
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    // each outlet is one phase at the drum's T and P
    for (const s of r.outlets) {
      expect(s.state.phases.length).toBe(1);
      expect(s.state.temperatureK).toBe(260);
    }
  });

  it("adiabatic at a lower pressure: zero duty, the drum at the (P, h) flash temperature", () => {
    const cold = separator(feed, { temperatureK: 280 }).liquid!;
    const r = separator(cold, { pressurePa: 5e5 });
    expect(r.dutyW).toBe(0);
    const eq = gas.flashPH(5e5, overallProperty(cold.state, "h"), cold.z);
    expect(Math.abs(r.equilibrium.temperatureK - eq.temperatureK)).toBeLessThan(1e-6);
    expect(r.vapor).toBeDefined();
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
  });

  it("three phases with water: vapour, hydrocarbon liquid and water leave separately", () => {
    const wet = defineFluid({
      components: ["methane", "n-hexane", "water"],
      model: "peng-robinson",
    });
    const s = streamAt(wet, [0.3, 0.3, 0.4], 310, 10e5);
    const r = separator(s, { temperatureK: 310 });
    expect(r.outlets.length).toBe(3);
    expect(r.liquid2).toBeDefined();
    // the second (denser) liquid is mostly water
    expect(r.liquid2!.z[2]).toBeGreaterThan(0.99);
    for (let i = 0; i < 3; i++) {
      const out = r.outlets.reduce((m, o) => m + o.molarFlowMolPerS * o.z[i], 0);
      expect(Math.abs(out - s.z[i])).toBeLessThan(1e-12);
    }
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
  });

  it("refuses a bad drum pressure or temperature", () => {
    expect(() => separator(feed, { pressurePa: 0 })).toThrow(/spec\.pressurePa/);
    expect(() => separator(feed, { temperatureK: Number.NaN })).toThrow(/spec\.temperatureK/);
  });
});
