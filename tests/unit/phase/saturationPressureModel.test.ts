/**
 * Saturation of a user's pressure-function model (departure/pressureModel.ts): the van der Waals
 * pressure P = rho R T / (1 - b rho) - a rho^2 typed as a hyper-dual function, integrated by the
 * engine, against the closed-form van der Waals results (Tc = 8a/27Rb, Pc = a/27b^2; reduced
 * coexistence at Tr = 0.9: Pr = 0.6470, from memory of the tabulated vdW coexistence curve,
 * D. C. Johnston, Advances in Thermodynamics of the van der Waals Fluid, 2014). The model offers
 * no critical point, so the caller gives a guess.
 */
import { describe, expect, it } from "vitest";
import { modelFromPressure } from "../../../kernel-lib/src/departure/pressureModel.js";
import { HyperDual } from "../../../kernel-lib/src/numerics/hyperDual.js";
import { saturationAtTemperature } from "../../../kernel-lib/src/phase/saturation.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { expectReference, referenceValue } from "../../fixtures/referenceValues.js";

const R = 8.314462618;
const a = 0.2303; // Pa m6/mol2
const b = 4.31e-5; // m3/mol
const Tc = (8 * a) / (27 * R * b);
const Pc = a / (27 * b * b);

describe("saturation of a pressure-function model", () => {
  const model = modelFromPressure({
    name: "van der Waals typed as a pressure function (test)",
    components: ["methane"],
    // P = rho R T / (1 - b rho) - a rho^2, in hyper-dual arithmetic (exact T derivatives)
    pressure: (T: HyperDual, rho: HyperDual) =>
      rho.mul(R).mul(T).div(rho.mul(-b).add(1)).sub(rho.mul(rho).mul(a)),
    maxDensity: 1 / b,
  });
  it("needs a critical guess when the model offers none, and says so", () => {
    expect(() => saturationAtTemperature(model, 0.9 * Tc)).toThrow(InputError);
  });
  it("with a guess: the closed-form critical point and Pr(0.9) = 0.6470", () => {
    const s = saturationAtTemperature(model, 0.9 * Tc, {
      criticalGuess: { temperatureK: 1.05 * Tc, densityMolPerM3: 0.9 / (3 * b) },
      tolerance: 1e-9,
    });
    expect(Math.abs(s.critical.temperatureK / Tc - 1)).toBeLessThan(1e-6);
    expectReference(s.pressurePa / Pc, referenceValue("johnston-2014-vdw.json", "Tr0.9/Pr"));
  });
});
