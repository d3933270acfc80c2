/**
 * The shared arrange steps of the process-step tests: the light-hydrocarbon gas (methane,
 * propane, n-butane on Peng-Robinson) of the heat-exchange, mixer/separator and record tests with
 * its usual feed, water on its reference equation (IAPWS-95), and a stream at given T, P and flow.
 * Only set-up: each test keeps its own assertions.
 */
import { defineFluid, type Fluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { defineStream, type FlowSpec } from "../../../kernel-lib/src/process/stream.js";

/** Methane, propane and n-butane on Peng-Robinson (a new fluid per call). */
export const lightGas = () =>
  defineFluid({ components: ["methane", "propane", "n-butane"], model: "peng-robinson" });

/** The feed of `lightGas` in most tests: 50 % methane, 30 % propane, 20 % n-butane. */
export const LIGHT_GAS_Z = [0.5, 0.3, 0.2];

/** Water by its reference equation (IAPWS-95): the saturation line is the equation's own. */
export const iapwsWater = () =>
  defineFluid({ components: ["water"], model: referenceFluid("water") });

/** 1 mol/s, the flow of most tests. */
export const ONE_MOL_PER_S: FlowSpec = { value: 1, unit: "mol/s" };

/**
 * A stream of `fluid` with feed z (undefined for a pure fluid) at T (K) and P (Pa), flow 1 mol/s
 * unless given, and a name when given.
 */
export function streamAt(
  fluid: Fluid,
  z: readonly number[] | undefined,
  T: number,
  P: number,
  flow: FlowSpec = ONE_MOL_PER_S,
  name?: string,
) {
  return defineStream({
    fluid,
    ...(z === undefined ? {} : { z }),
    T,
    P,
    flow,
    ...(name === undefined ? {} : { name }),
  });
}
