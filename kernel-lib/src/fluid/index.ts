// Public exports of fluid/: the fluid object binds model, ideal gas and reference state over the
// state functions (state/) and the phase tests (phase/).
export { defineFluid } from "./defineFluid.js";
export type { Fluid, FluidSpec, ConstantOverrides, FluidStateAtTPOptions } from "./defineFluid.js";
export type { FluidTransportOptions } from "./defineFluid.js";
export { referenceFluid, buildReferenceFluid } from "./referenceFluids.js";
export { sharedReferenceState } from "./sharedReferenceState.js";
export type { SharedReference, SharedReferenceOptions } from "./sharedReferenceState.js";
export { phaseStateOf, specifiedPair, STATE_PAIRS } from "./phaseState.js";
export type {
  PhaseState,
  StatePhase,
  StateRequest,
  StateVariable,
  OverallPhase,
  OverallProperties,
} from "./phaseState.js";
