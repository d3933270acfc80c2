// Public exports of state/: properties, states at (T, rho) and (T, P), inversions, fluids.
export {
  assembleState,
  residualProperties,
  residualGibbsTP,
  pressureFromResidual,
  dPdRho,
} from "./properties.js";
export type { StateInputs, ResidualSets } from "./properties.js";
export { phaseFugacityAtTP, fugacityDerivatives } from "./fugacity.js";
export type { PhaseFugacity, FugacityDerivatives, CompositionHessian } from "./fugacity.js";
export { stateAtTP, stateAtTRho, densityRootsAtTP } from "./stateAt.js";
export type { StateAtTPOptions, DensityRoot } from "./stateAt.js";
export { findDensityRoots } from "./findDensityRoots.js";
export type { DensityRootOptions } from "./findDensityRoots.js";
export { phaseLabel } from "./phaseLabel.js";
export { temperatureAtPH, temperatureAtPS } from "./inversions.js";
export { referenceStateTRho, referenceStateTP, referenceFluidBinding } from "./referenceStates.js";
export type { ReferenceStateOptions } from "./referenceStates.js";
export { departureFunctions } from "./departureFunctions.js";
export type { DepartureResult, DepartureFunctionOptions } from "./departureFunctions.js";
export { isothermDepartures } from "./isothermDepartures.js";
export type { IsothermDepartureResult, IsothermDeparturePoint } from "./isothermDepartures.js";
export type { InversionOptions, InversionResult } from "./inversions.js";
export type {
  FluidBinding,
  FluidState,
  PhaseLabel,
  PhaseRequest,
  EnergySet,
  PropertySet,
  DepartureMethod,
} from "./types.js";
