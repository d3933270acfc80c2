/**
 * The cubic model's closed-form composition Hessian (eos/cubic/cubicModel.ts, Michelsen and
 * Mollerup 2007 ch. 3) against central differences of its own dnA (the fallback of
 * state/fugacity.ts), through fugacityDerivatives, for three cubic families, a gas-like and a
 * liquid-like density, and a composition with a trace component.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { fugacityDerivatives } from "../../../kernel-lib/src/state/fugacity.js";
import type { ResidualModel } from "../../../kernel-lib/src/eos/types.js";

describe("closed-form composition Hessian of the cubics", () => {
  for (const id of ["peng-robinson", "soave-redlich-kwong", "van-der-waals"] as const) {
    it(`${id}: d ln phi / dT, dP, dn agree with central differences`, () => {
      const fluid = defineFluid({
        components: ["methane", "carbon-dioxide", "n-hexane"],
        model: id,
      });
      const model = fluid.model;
      expect(typeof model.compositionHessian).toBe("function");
      const numeric: ResidualModel = {
        info: model.info,
        residual: (T, rho, x, request) => model.residual(T, rho, x, request),
        maxDensity: (T, x) => model.maxDensity(T, x),
      };
      for (const [T, rho, x] of [
        [250, 300, [0.5, 0.2, 0.3]],
        [300, 8000, [0.5, 0.2, 0.3]],
        [280, 5000, [0.7, 1e-8, 0.3 - 1e-8]],
      ] as [number, number, number[]][]) {
        const a = fugacityDerivatives(model, T, rho, x);
        const b = fugacityDerivatives(numeric, T, rho, x);
        // central differences with relative steps 1e-5 carry errors of about 1e-9 relative
        // (h^2 + eps/h); the liquid-like van der Waals state is stiffer (1e-8)
        for (let i = 0; i < 3; i++) {
          expect(Math.abs(a.dLnPhiDT[i] - b.dLnPhiDT[i])).toBeLessThan(
            1e-7 * (Math.abs(b.dLnPhiDT[i]) + 1e-3),
          );
          expect(Math.abs(a.dLnPhiDP[i] / b.dLnPhiDP[i] - 1)).toBeLessThan(1e-7);
          for (let j = 0; j < 3; j++) {
            expect(Math.abs(a.dLnPhiDn[i][j] - b.dLnPhiDn[i][j])).toBeLessThan(
              1e-7 * (1 + Math.abs(b.dLnPhiDn[i][j])),
            );
          }
        }
      }
    });
  }
});
