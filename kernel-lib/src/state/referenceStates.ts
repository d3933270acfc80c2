/**
 * States of a reference fluid in its publication's reference state: the engine's own state
 * functions (state/stateAt.ts, properties from state/properties.ts, the one place where property
 * formulas live) bound to the fluid's residual part and its own ideal part phi_0, plus the
 * validity policy of the equation: inside the published range, silent; outside it but inside the
 * extrapolation range, a warning naming the range; beyond that, refused unless the caller opts in.
 */
import { OutOfRangeError } from "../errors.js";
import { pressureFromResidual } from "../eos/residualRelations.js";
import type { ReferenceFluid } from "../eos/multiparameter/referenceFluid.js";
import { referenceIdealGasMixture } from "../eos/multiparameter/referenceIdealGas.js";
import { stateAtTP, stateAtTRho, type StateAtTPOptions } from "./stateAt.js";
import type { FluidBinding, FluidState } from "./types.js";
import { requirePositive } from "../validate.js";

/** Options of {@link referenceStateTRho} and {@link referenceStateTP}. */
export interface ReferenceStateOptions {
  /**
   * Evaluate states beyond the equation's extrapolation range instead of refusing them (they still
   * carry a warning). Default false.
   */
  allowOutsideRange?: boolean;
}

const bindings = new WeakMap<ReferenceFluid, FluidBinding>();

/**
 * The fluid bound to its own ideal part (publication's reference state), for every state function
 * of the engine (stateAtTP, stateAtTRho, temperatureAtPH, ...).
 */
export function referenceFluidBinding(fluid: ReferenceFluid): FluidBinding {
  let b = bindings.get(fluid);
  if (!b) {
    b = {
      model: fluid,
      idealGas: referenceIdealGasMixture(fluid),
      molarMassesKgPerMol: [fluid.molarMassKgPerMol],
    };
    bindings.set(fluid, b);
  }
  return b;
}

function refuseOutside(
  fluid: ReferenceFluid,
  temperatureK: number,
  pressurePa: number,
  received: Record<string, number>,
  options: ReferenceStateOptions,
): void {
  if (options.allowOutsideRange) return;
  if (fluid.validityStatus(temperatureK, pressurePa) === "outside") {
    throw new OutOfRangeError({
      input: `state (${Object.keys(received).join(", ")})`,
      unit: "K, Pa, mol/m3",
      validRange: fluid.validityDescription,
      received: { ...received, pressurePa },
      hint: "pass { allowOutsideRange: true } to evaluate the equation there anyway",
    });
  }
}

/**
 * The state of a reference fluid at T (K) and molar density rho (mol/m3), in the fluid's own
 * reference state (see `referenceState` of the result).
 *
 * @example
 * ```ts
 * const s = referenceStateTRho(referenceFluid("water"), 500, 838.025 / 0.018015268);
 * s.pressurePa; // 10000385.8 (IAPWS R6-95 Table 7: 0.100003858e2 MPa)
 * ```
 * @throws InputError for bad T or rho; OutOfRangeError beyond the extrapolation range.
 */
export function referenceStateTRho(
  fluid: ReferenceFluid,
  temperatureK: number,
  densityMolPerM3: number,
  options: ReferenceStateOptions = {},
): FluidState {
  requirePositive("temperatureK", temperatureK, "K");
  requirePositive("densityMolPerM3", densityMolPerM3, "mol/m3");
  const aD = fluid.residual(temperatureK, densityMolPerM3, [1]).aD;
  const pressurePa = pressureFromResidual(temperatureK, densityMolPerM3, aD, fluid.gasConstant);
  refuseOutside(fluid, temperatureK, pressurePa, { temperatureK, densityMolPerM3 }, options);
  return stateAtTRho(referenceFluidBinding(fluid), temperatureK, densityMolPerM3, [1]);
}

/**
 * The state of a reference fluid at T (K) and P (Pa), in its stable phase (or the requested one
 * where it exists), in the fluid's own reference state. Exactly at the saturation pressure, the
 * vapour root is returned: use phase/pureFluidPhase.ts to classify (T, P) and refuse the dome.
 *
 * @throws InputError for bad T or P; OutOfRangeError beyond the extrapolation range;
 *   PhaseUnavailableError when the requested phase does not exist there.
 */
export function referenceStateTP(
  fluid: ReferenceFluid,
  temperatureK: number,
  pressurePa: number,
  options: ReferenceStateOptions & StateAtTPOptions = {},
): FluidState {
  requirePositive("temperatureK", temperatureK, "K");
  requirePositive("pressurePa", pressurePa, "Pa");
  refuseOutside(fluid, temperatureK, pressurePa, { temperatureK }, options);
  return stateAtTP(referenceFluidBinding(fluid), temperatureK, pressurePa, [1], options);
}
