// Public exports of idealgas/: cp correlations, the correlation route, reference states, mixtures.
export {
  correlationCp,
  correlationCpIntegral,
  correlationCpOverTIntegral,
} from "./cpCorrelation.js";
export { idealGasFromCorrelation } from "./correlationPure.js";
export type { CorrelationIdealGas } from "./correlationPure.js";
export { idealGasMixture } from "./mixture.js";
export type { IdealGasMixtureOptions } from "./mixture.js";
export {
  formationReferenceState,
  zeroAtReferenceState,
  describeReferenceState,
  pureReferenceValues,
} from "./referenceState.js";
export type { PureReferenceValues } from "./referenceState.js";
export type { SaturatedLiquidReference } from "./types.js";
export { checkTemperatureRange, DEFAULT_EXTRAPOLATION_MARGIN } from "./temperatureRange.js";
export type { TemperatureRangeOptions } from "./temperatureRange.js";
// The statistical-mechanics route (written in idealgas/molecular/ by its owner), same IdealGasPure contract.
export * from "./molecular/index.js";
