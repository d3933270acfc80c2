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
  phaseAsEquilibrium,
  splitPhases,
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
export { valve } from "./valve.js";
export type { ValveSpec, ValveResult } from "./valve.js";
export { compressorStage } from "./compressor.js";
export type { CompressorSpec, CompressorStageResult } from "./compressor.js";
export { integratePolytropicPath } from "./polytropicPath.js";
export type { PolytropicPathOptions, PolytropicPath } from "./polytropicPath.js";
export { schultzCompression } from "./schultz.js";
export type { SchultzResult } from "./schultz.js";
export { turbine } from "./turbine.js";
export type { TurbineSpec, TurbineResult } from "./turbine.js";
export { pump } from "./pump.js";
export type { PumpSpec, PumpResult } from "./pump.js";
export { compressorTrain } from "./compressorTrain.js";
export type { CompressorTrainSpec, CompressorTrainResult, TrainCooler } from "./compressorTrain.js";
export { processWarning, temperatureWarnings, liquidFraction } from "./warnings.js";
export { pathStates } from "./pathStates.js";
export type { PathState } from "./pathStates.js";
