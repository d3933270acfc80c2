import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import {
  defineStream,
  massFlowKgPerS,
  streamFlowIn,
  streamEnthalpyJPerMol,
  streamVaporFraction,
} from "../../../kernel-lib/src/process/stream.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

const gas = defineFluid({ components: ["methane", "ethane", "propane"], model: "peng-robinson" });
const z = [0.85, 0.1, 0.05];

describe("streams", () => {
  it("a stream carries its flash, flow and molar mass", () => {
    const s = defineStream({
      fluid: gas,
      z,
      T: 303.15,
      P: 30e5,
      flow: { value: 1200, unit: "kmol/h" },
    });
    expect(s.molarFlowMolPerS).toBeCloseTo(1200 / 3.6, 10);
    expect(s.state.phases.length).toBe(1);
    expect(streamVaporFraction(s)).toBe(1);
    const M = 0.85 * 0.0160425 + 0.1 * 0.030069 + 0.05 * 0.0440956; // from memory of IUPAC atomic weights
    expect(s.molarMassKgPerMol).toBeCloseTo(M, 5);
    expect(massFlowKgPerS(s)).toBeCloseTo((1200 / 3.6) * s.molarMassKgPerMol, 9);
    expect(streamFlowIn(s, "kg/h")).toBeCloseTo(massFlowKgPerS(s) * 3600, 6);
    expect(Number.isFinite(streamEnthalpyJPerMol(s))).toBe(true);
  });

  it("standard volume flows: reference explicit, ideal or real basis stated", () => {
    const ideal = defineStream({
      fluid: gas,
      z,
      T: 303.15,
      P: 30e5,
      flow: { value: 10000, unit: "Sm3/h", reference: "ISO 13443 (15 degC, 101.325 kPa)" },
    });
    // ideal gas at 15 degC, 101.325 kPa: 23.6446 m3/kmol (R T / P, CODATA 2018 R)
    expect(ideal.molarFlowMolPerS).toBeCloseTo(10000 / 3600 / 0.0236446, 1);
    expect(ideal.givenFlow?.description).toMatch(/ISO 13443.*ideal-gas/);
    const real = defineStream({
      fluid: gas,
      z,
      T: 303.15,
      P: 30e5,
      flow: {
        value: 10000,
        unit: "Sm3/h",
        reference: "ISO 13443 (15 degC, 101.325 kPa)",
        basis: "real-gas",
      },
    });
    // a natural gas has Z about 0.997 at standard conditions (common practice, no source)
    expect(real.molarFlowMolPerS / ideal.molarFlowMolPerS).toBeGreaterThan(1.001);
    expect(real.molarFlowMolPerS / ideal.molarFlowMolPerS).toBeLessThan(1.006);
    expect(real.givenFlow?.description).toMatch(/Z = /);
    expect(
      streamFlowIn(real, "Sm3/h", {
        reference: "ISO 13443 (15 degC, 101.325 kPa)",
        basis: "real-gas",
      }),
    ).toBeCloseTo(10000, 6);
  });

  it("refuses a flow without units or reference, and a missing flow", () => {
    const base = { fluid: gas, z, T: 303.15, P: 30e5 };
    expect(() => defineStream({ ...base, flow: { value: 10, unit: "MMSCFD" } })).toThrow(
      /reference/,
    );
    expect(() => defineStream({ ...base, flow: { value: 10 } as never })).toThrow(InputError);
    expect(() => defineStream({ ...base } as never)).toThrow(/flow/);
    expect(() => defineStream({ ...base, flow: { value: 0, unit: "kmol/h" } })).toThrow(InputError);
    expect(() =>
      defineStream({ ...base, z: undefined, flow: { value: 1, unit: "kmol/h" } }),
    ).toThrow(/mole fractions/);
  });

  it("a liquid volume flow at stated conditions", () => {
    const propane = defineFluid({ components: ["propane"], model: "peng-robinson" });
    const s = defineStream({
      fluid: propane,
      T: 293.15,
      P: 20e5,
      flow: { value: 10, unit: "m3/h", conditions: { temperatureK: 288.15, pressurePa: 20e5 } },
    });
    const rho = propane.stateAtTP(288.15, 20e5).densityMolPerM3;
    expect(s.molarFlowMolPerS).toBeCloseTo((10 / 3600) * rho, 6);
  });
});
