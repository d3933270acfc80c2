// Public exports of phase/: pure-fluid phase equilibrium (saturation, critical point, phase of a
// state) and the stability test of mixtures. Mixture flash calculations will live here too.
export { saturationAtTemperature, saturationAtPressure } from "./saturation.js";
export type {
  SaturationOptions,
  SaturationAtPressureOptions,
  SaturationResult,
} from "./saturation.js";
export { locateCriticalPoint } from "./criticalPoint.js";
export type { CriticalPointOptions, CriticalPointResult } from "./criticalPoint.js";
export { equalAreaIsotherm } from "./equalAreaIsotherm.js";
export type {
  EqualAreaIsotherm,
  EqualAreaOptions,
  IsothermLoopPoint,
  IsothermRegion,
} from "./equalAreaIsotherm.js";
export type { SaturationHints } from "./pureFluid.js";
export { pureFluidPhaseAt, pureFluidStateTP } from "./pureFluidPhase.js";
export type { PhaseAtOptions, PurePhaseResult } from "./pureFluidPhase.js";
export {
  stateAtTemperatureQuality,
  stateAtPressureQuality,
  stateAtPressureEnthalpy,
  stateAtPressureEntropy,
  stateAtTemperatureDensity,
} from "./twoPhaseState.js";
export type {
  TwoPhaseState,
  TwoPhaseEnergies,
  SinglePhaseResult,
  PureFluidStateResult,
  DomeInversionOptions,
} from "./twoPhaseState.js";
export { stabilityAtTP } from "./stability.js";
export type {
  StabilityOptions,
  StabilityResult,
  StabilityTrial,
  TrialOutcome,
  TrialStart,
  WilsonConstants,
} from "./stability.js";
export * from "./envelope/index.js";
// mixture flashes (phase/flash/)
export * from "./flash/index.js";
