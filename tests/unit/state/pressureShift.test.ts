/**
 * The absolute s, a and g of a state add the ideal gas moved from its evaluation pressure P_ig to
 * the state's density: -R ln(rho R T / P_ig) for s, +R T ln(rho R T / P_ig) for a and g
 * (state/properties.ts, header). A (T, P) state takes the logarithm as ln(P / P_ig) - ln Z
 * (rho R T Z = P) where Z > 1/2, one logarithm fewer per state; this holds it to the density
 * form, computed here from the same ideal gas and the state's own TV departures, within 1e-13 of
 * max(|value|, R) for s and max(|value|, R T) for a and g (the rounding of rho and of Z = 1 + aD;
 * common practice, no source). Dense states (Z <= 1/2, where 1 + aD cancels) and (T, rho) states
 * keep the density form: equal to the last bit.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { idealGasMixture } from "../../../kernel-lib/src/idealgas/mixture.js";
import { idealGasFromCorrelation } from "../../../kernel-lib/src/idealgas/correlationPure.js";
import { R } from "../../../kernel-lib/src/constants.js";
import type { FluidState } from "../../../kernel-lib/src/state/types.js";

const IDEAL_GAS_PRESSURE_PA = 1e5; // the state layer's evaluation pressure (state/stateAt.ts)

const cases = [
  { ids: ["methane"], x: [1] },
  { ids: ["methane", "ethane", "propane"], x: [0.8, 0.15, 0.05] },
];

function densityForm(gas: ReturnType<typeof idealGasMixture>, st: FluidState, x: number[]) {
  const T = st.temperatureK;
  const ig = gas.at(T, IDEAL_GAS_PRESSURE_PA, x);
  // the operations of state/properties.ts in their order
  const RT = R * T;
  const shift = Math.log((st.densityMolPerM3 * RT) / IDEAL_GAS_PRESSURE_PA);
  return {
    s: ig.s - R * shift + st.residualTV.s,
    a: ig.a + RT * shift + st.residualTV.a,
    g: ig.g + RT * shift + st.residualTV.g,
  };
}

describe("ln(P / P_ig) - ln Z for the ideal gas's move to the state's density", () => {
  for (const { ids, x } of cases) {
    const gas = idealGasMixture(ids.map((id) => idealGasFromCorrelation(id)));
    const fluid = defineFluid({ components: ids, model: "peng-robinson", idealGas: gas });
    it(`${ids.join(", ")}: (T, P) states, vapour and liquid, agree with the density form`, () => {
      let liquids = 0;
      fc.assert(
        fc.property(
          fc.double({ min: 110, max: 600, noNaN: true }),
          fc.double({ min: 1e4, max: 3e7, noNaN: true }),
          (T, P) => {
            const st = fluid.stateAtTP(T, P, x, { checkStability: false });
            if (st.Z < 0.3) liquids++;
            const ref = densityForm(gas, st, x);
            if (st.Z <= 0.5) {
              expect(st.molar.s).toBe(ref.s);
              expect(st.molar.g).toBe(ref.g);
              return;
            }
            const RT = R * T;
            expect(Math.abs(st.molar.s - ref.s)).toBeLessThanOrEqual(
              1e-13 * Math.max(Math.abs(ref.s), R),
            );
            expect(Math.abs(st.molar.a - ref.a)).toBeLessThanOrEqual(
              1e-13 * Math.max(Math.abs(ref.a), RT),
            );
            expect(Math.abs(st.molar.g - ref.g)).toBeLessThanOrEqual(
              1e-13 * Math.max(Math.abs(ref.g), RT),
            );
          },
        ),
        { numRuns: 300 },
      );
      // the random (T, P) reached dense states too, where Z = 1 + aD carries the largest rounding
      expect(liquids).toBeGreaterThan(5);
    });
    it(`${ids.join(", ")}: (T, rho) states keep the density form to the last bit`, () => {
      for (const [T, rho] of [
        [150.5, 20000.25],
        [300.5, 500.125],
        [450.25, 8000.5],
      ]) {
        const st = fluid.stateAtTRho(T, rho, x);
        const ref = densityForm(gas, st, x);
        expect(st.molar.s).toBe(ref.s);
        expect(st.molar.a).toBe(ref.a);
        expect(st.molar.g).toBe(ref.g);
      }
    });
  }
});
