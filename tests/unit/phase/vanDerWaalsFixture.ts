/**
 * Test fixture: the van der Waals equation as a ResidualModel, written here from its closed form
 * so the generic saturation code can be checked against textbook results without depending on
 * the engine's cubic models. alpha_r = -ln(1 - b rho) - a rho / (R T) (J. D. van der Waals, 1873;
 * e.g. Michelsen & Mollerup, Thermodynamic Models, 2nd ed. (2007), ch. 3).
 */
import type { ResidualModel } from "../../../kernel-lib/src/eos/types.js";

export const VDW_R = 8.314462618;

/** van der Waals model with a (Pa m6/mol2) and b (m3/mol), critical guess from the closed form. */
export function vanDerWaals(a: number, b: number): ResidualModel {
  const Tc = (8 * a) / (27 * VDW_R * b);
  return {
    info: {
      id: "vdw-fixture",
      name: "van der Waals (test fixture)",
      citation: "van der Waals (1873)",
      componentIds: ["fixture"],
    },
    residual(T: number, rho: number) {
      const e = b * rho;
      const F = a / (VDW_R * T); // m3/mol
      const om = 1 - e;
      return {
        a: -Math.log(om) - F * rho,
        aD: e / om - F * rho,
        aDD: (e * e) / (om * om),
        aDDD: (2 * e * e * e) / (om * om * om),
        aT: F * rho,
        aTT: -2 * F * rho,
        aDT: F * rho,
        dnA: [-Math.log(om) + e / om - 2 * F * rho],
      };
    },
    maxDensity: () => 1 / b,
    pseudoCritical: () => ({
      temperatureK: Tc * 1.01,
      pressurePa: a / (27 * b * b),
      densityMolPerM3: (1 / (3 * b)) * 0.97,
      rule: "perturbed closed form (test)",
    }),
  };
}
