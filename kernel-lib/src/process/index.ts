// Public exports of process/: streams and process steps on real fluids.
export {
  defineStream,
  streamFromEquilibrium,
  massFlowKgPerS,
  streamEnthalpyJPerMol,
  streamEntropyJPerMolK,
  streamVaporFraction,
  streamFlowIn,
  molarFlowOf,
  molarMassOf,
} from "./stream.js";
export type { Stream, StreamSpec, FlowSpec, GivenFlow, StandardVolumeBasis } from "./stream.js";
export { PROCESS_CAUTION } from "./types.js";
export type { StepResult, StepCheck, ProcessWarning, ProcessCondition } from "./types.js";
export { closeBalances, BALANCE_TOLERANCE } from "./balance.js";
export { heatCurve, saturationOfFeed } from "./heatCurve.js";
export type {
  HeatCurve,
  HeatCurveMarker,
  HeatCurveOptions,
  HeatCurvePoint,
  HeatCurveSaturationPoint,
} from "./heatCurve.js";
export { heater, cooler } from "./heater.js";
export type { HeaterResult, HeaterSpec } from "./heater.js";
export { exchanger } from "./exchanger.js";
export type {
  ExchangerCurvePoint,
  ExchangerResult,
  ExchangerSpec,
  MinimumApproach,
} from "./exchanger.js";
export { mixer } from "./mixer.js";
export type { MixerResult, MixerSpec } from "./mixer.js";
export { separator } from "./separator.js";
export type { SeparatorResult, SeparatorSpec } from "./separator.js";
