// Public exports of phase/envelope/: mixture bubble, dew and quality points at given T or P, the
// phase envelope by continuation, and the mixture critical point (Heidemann-Khalil).
export { saturationPointAtTemperature, saturationPointAtPressure } from "./saturationPoint.js";
export type {
  SaturationPointOptions,
  MixtureSaturationPoint,
  SaturationKind,
} from "./saturationPoint.js";
export {
  bubblePointAtTemperature,
  bubblePointAtPressure,
  dewPointAtTemperature,
  dewPointAtPressure,
} from "./bubbleDew.js";
export type { BubbleDewOptions } from "./bubbleDew.js";
export { phaseEnvelope } from "./phaseEnvelope.js";
export type {
  PhaseEnvelope,
  PhaseEnvelopeOptions,
  EnvelopePoint,
  EnvelopeLandmark,
  QualityLine,
} from "./phaseEnvelope.js";
export { mixtureCriticalPoint } from "./mixtureCriticalPoint.js";
export type { MixtureCriticalPoint, MixtureCriticalOptions } from "./mixtureCriticalPoint.js";
export { wetGasEnvelope } from "./wetGasEnvelope.js";
export type {
  WetGasEnvelope,
  WetGasEnvelopeOptions,
  WaterDewPoint,
  BracketFlash,
} from "./wetGasEnvelope.js";
