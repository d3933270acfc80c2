/**
 * Engine cases of issue 4: all properties at (T, P) for pure and ten-component PR, one state's
 * departures by numerical integration and in closed form (same model and state), and an h-s
 * surface on a 200 x 200 T-P grid.
 */
import { defineFluid } from "../../src/fluid/defineFluid.js";
import { createModel } from "../../src/eos/createModel.js";
import { modelFromPressure } from "../../src/departure/pressureModel.js";
import { residualProperties } from "../../src/state/properties.js";
import { getComponent } from "../../src/components/getComponent.js";
import type { BenchCase } from "../harness.js";
import { TEN, X10 } from "./richGas.js";
import type { Component } from "../../src/components/types.js";

/**
 * The component with its cp correlation replaced by a constant cp = 4R (a one-term polynomial,
 * valid 1-100000 K), for the diagnostic "-residual-only" cases: the state goes through the same
 * ideal-gas machinery (mixture, reference state, cache), so the ratio of a case to its
 * residual-only twin is the cost of evaluating the real correlations, and the residual-only time
 * is the engine's own cost (roots, residual model, properties).
 */
function withConstantCp(id: string): Component {
  const c = getComponent(id);
  const range = { minTemperatureK: 1, maxTemperatureK: 1e5 };
  return {
    ...c,
    idealGasCp: { form: "polynomial", ...range, segments: [{ ...range, coefficients: [4] }] },
  };
}

// states cycled through so no cache sees the same temperature twice in a row. None is a whole
// number: V8 keeps whole numbers as small integers, and a mix of small-integer and fractional
// temperatures made the optimised library code deoptimise ("not a Smi") in the bench only.
const TEMPERATURES = Float64Array.from({ length: 16 }, (_, i) => 290.25 + 2.5 * i);
// the ten-component gas at 5 MPa is two-phase in Peng-Robinson below about 325 K (the tangent-plane
// test, phase/stability.ts), so its states are taken from 340 to 378 K, where it is one phase
const MIX10_TEMPERATURES = Float64Array.from({ length: 16 }, (_, i) => 340.25 + 2.5 * i);

export const engineCases: BenchCase[] = [
  {
    name: "pr-pure-TP",
    description: "all properties of pure methane (PR) at given T, P (16 states cycled)",
    targetSeconds: 0.5e-6,
    setup() {
      const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
      let k = 0;
      return function prPureTP() {
        return fluid.stateAtTP(TEMPERATURES[k++ & 15], 5e6);
      };
    },
  },
  {
    name: "pr-mix10-TP",
    description: "all properties of a ten-component natural gas (PR) at given T, P",
    targetSeconds: 5e-6,
    setup() {
      const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
      let k = 0;
      return function prMix10TP() {
        return fluid.stateAtTP(MIX10_TEMPERATURES[k++ & 15], 5e6, X10);
      };
    },
  },
  {
    name: "pr-mix10-TP-no-stability",
    description:
      "pr-mix10-TP without the tangent-plane test ({ checkStability: false }): the state alone, as stateAtTP was before the test became the default",
    setup() {
      const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
      const options = { checkStability: false };
      let k = 0;
      return function prMix10TPNoStability() {
        return fluid.stateAtTP(MIX10_TEMPERATURES[k++ & 15], 5e6, X10, options);
      };
    },
  },
  {
    name: "pr-pure-TP-residual-only",
    description:
      "diagnostic: pr-pure-TP with cp = 4R in place of the correlation (engine cost without the cp correlations)",
    setup() {
      const fluid = defineFluid({
        components: [withConstantCp("methane")],
        model: "peng-robinson",
      });
      let k = 0;
      return function prPureTPResidualOnly() {
        return fluid.stateAtTP(TEMPERATURES[k++ & 15], 5e6);
      };
    },
  },
  {
    name: "pr-mix10-TP-residual-only",
    description: "diagnostic: pr-mix10-TP with cp = 4R for every component",
    setup() {
      const fluid = defineFluid({ components: TEN.map(withConstantCp), model: "peng-robinson" });
      let k = 0;
      return function prMix10TPResidualOnly() {
        return fluid.stateAtTP(MIX10_TEMPERATURES[k++ & 15], 5e6, X10);
      };
    },
  },
  {
    name: "stability-mix10-TP",
    description:
      "tangent-plane stability test of the ten-component gas (PR) at the pr-mix10-TP states (one phase: both trials return to the feed)",
    setup() {
      const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
      let k = 0;
      return function stabilityMix10TP() {
        return fluid.stabilityAtTP(MIX10_TEMPERATURES[k++ & 15], 5e6, X10);
      };
    },
  },
  {
    name: "departure-numeric",
    description:
      "residual alpha_r, T and T^2 derivatives (h, s, u, a, g, ln phi) of methane (PR) at 300 K, 5 MPa by adaptive quadrature of the hyper-dual pressure, relTolerance 1e-10",
    targetSeconds: 30e-6,
    setup() {
      const pr = createModel("peng-robinson", [getComponent("methane")]);
      const rho = pr.densityRoots!(300, 5e6, [1])[0];
      const numeric = modelFromPressure({
        name: "PR methane, numeric",
        components: ["methane"],
        pressure: pr.pressureFunction,
        maxDensity: (T, x) => pr.maxDensity(T, x),
        integration: { relTolerance: 1e-10 },
      });
      return function departureNumeric() {
        return residualProperties(300, numeric.residual(300, rho, [1], { composition: true }));
      };
    },
  },
  {
    name: "departure-closed-form",
    description: "the same departures from the closed-form PR alpha_r",
    setup() {
      const pr = createModel("peng-robinson", [getComponent("methane")]);
      const rho = pr.densityRoots!(300, 5e6, [1])[0];
      return function departureClosedForm() {
        return residualProperties(300, pr.residual(300, rho, [1], { composition: true }));
      };
    },
  },
  {
    name: "surface-200x200",
    description: "h and s of methane (PR) on a 200 x 200 grid, 200-500 K, 0.1-20 MPa",
    targetSeconds: 40e-3,
    setup() {
      const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
      const h = new Float64Array(200 * 200);
      const s = new Float64Array(200 * 200);
      return function surface200x200() {
        for (let i = 0; i < 200; i++) {
          const T = 200 + (300 * i) / 199;
          for (let j = 0; j < 200; j++) {
            const P = 1e5 + ((20e6 - 1e5) * j) / 199;
            const st = fluid.stateAtTP(T, P);
            h[i * 200 + j] = st.molar.h;
            s[i * 200 + j] = st.molar.s;
          }
        }
        return h[0] + s[0];
      };
    },
  },
];
