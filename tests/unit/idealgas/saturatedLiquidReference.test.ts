// The saturated-liquid reference states of the trade (fluid/saturatedLiquidReference.ts): the
// convention itself is the check (h and s of the saturated liquid at the stated temperature), plus
// the invariance of every difference between states, and the refusals.
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { saturationAtTemperature } from "../../../kernel-lib/src/phase/saturation.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { describeReferenceState } from "../../../kernel-lib/src/idealgas/referenceState.js";

function saturatedLiquid(fluid: ReturnType<typeof defineFluid>, T: number) {
  const sat = saturationAtTemperature(fluid.model, T);
  return fluid.stateAtTRho(T, sat.liquidDensityMolPerM3);
}

describe("saturated-liquid reference states", () => {
  it('"0 degC": h = 200 kJ/kg and s = 1 kJ/(kg K) for saturated liquid propane at 0 degC', () => {
    // The convention (common practice of refrigeration tables, no single source).
    const fluid = defineFluid({
      components: ["propane"],
      referenceState: { kind: "saturated-liquid", at: "0 degC" },
    });
    const liquid = saturatedLiquid(fluid, 273.15);
    expect(liquid.mass.h / 200e3 - 1).toBeCloseTo(0, 9);
    expect(liquid.mass.s / 1e3 - 1).toBeCloseTo(0, 9);
    // Latent heat of propane at 0 degC, about 375 kJ/kg (from memory of propane
    // saturation tables; 5 %: Peng-Robinson's latent heats are good to a few per cent).
    const sat = saturationAtTemperature(fluid.model, 273.15);
    const vapor = fluid.stateAtTRho(273.15, sat.vaporDensityMolPerM3);
    expect(Math.abs((vapor.mass.h - liquid.mass.h) / 375e3 - 1)).toBeLessThan(0.05);
    expect(liquid.referenceState.kind).toBe("saturated-liquid");
    expect(describeReferenceState(liquid.referenceState)).toMatch(/0 degC.*200 kJ\/kg/);
  });

  it('"-40 degC" and "normal-boiling-point": h = s = 0 for the saturated liquid there', () => {
    const minus40 = defineFluid({
      components: ["propane"],
      referenceState: { kind: "saturated-liquid", at: "-40 degC" },
    });
    const l40 = saturatedLiquid(minus40, 233.15);
    expect(Math.abs(l40.molar.h)).toBeLessThan(1e-6);
    expect(Math.abs(l40.molar.s)).toBeLessThan(1e-9);
    const nbp = defineFluid({
      components: ["propane"],
      referenceState: { kind: "saturated-liquid", at: "normal-boiling-point" },
    });
    // Propane's normal boiling point 231.0 K (from memory of handbook tables, e.g. Perry's;
    // 1.5 K: Peng-Robinson's vapour pressure near 1 atm is within a few per cent).
    const Tb = nbp.temperatureAtPS(101325, 0).temperatureK; // s = 0: the saturated liquid
    expect(Math.abs(Tb - 231.0)).toBeLessThan(1.5);
  });

  it("moves only the zero: differences between states equal those of the formation basis", () => {
    const formation = defineFluid({ components: ["propane", "n-butane"] });
    const shifted = defineFluid({
      components: ["propane", "n-butane"],
      referenceState: { kind: "saturated-liquid", at: "-40 degC" },
    });
    const x = [0.4, 0.6];
    const pairs: Array<[number, number, number, number]> = [
      [300, 1e5, 420, 20e5],
      [250, 5e5, 380, 40e5],
    ];
    for (const [T1, P1, T2, P2] of pairs) {
      const dh = (f: typeof formation) =>
        f.stateAtTP(T2, P2, x).molar.h - f.stateAtTP(T1, P1, x).molar.h;
      const ds = (f: typeof formation) =>
        f.stateAtTP(T2, P2, x).molar.s - f.stateAtTP(T1, P1, x).molar.s;
      expect(Math.abs(dh(shifted) - dh(formation))).toBeLessThan(
        1e-9 * Math.abs(dh(formation)) + 1e-8,
      );
      expect(Math.abs(ds(shifted) - ds(formation))).toBeLessThan(
        1e-9 * Math.abs(ds(formation)) + 1e-10,
      );
    }
  });

  it("refuses a convention temperature above a component's critical temperature, naming it", () => {
    expect(() =>
      defineFluid({
        components: ["methane", "propane"],
        referenceState: { kind: "saturated-liquid", at: "0 degC" },
      }),
    ).toThrow(/Methane|methane/);
    expect(() =>
      defineFluid({
        components: ["methane"],
        referenceState: { kind: "saturated-liquid", at: "0 degC" },
      }),
    ).toThrow(InputError);
    expect(() =>
      defineFluid({
        components: ["propane"],
        referenceState: { kind: "saturated-liquid", at: -5 },
      }),
    ).toThrow(InputError);
    // methane's normal boiling point exists: the convention works there
    const methane = defineFluid({
      components: ["methane"],
      referenceState: { kind: "saturated-liquid", at: "normal-boiling-point" },
    });
    expect(methane.idealGas.referenceState.kind).toBe("saturated-liquid");
    // Methane's normal boiling point 111.67 K (from memory of Setzmann and Wagner 1991; 1.5 K
    // for Peng-Robinson): the saturated liquid there has h = 0.
    const Tb = methane.temperatureAtPS(101325, 0).temperatureK;
    expect(Math.abs(Tb - 111.67)).toBeLessThan(1.5);
  });
});
