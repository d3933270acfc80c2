// Public exports of departure/: the departure-function integrator and pressure-function models.
export { integrateResidual, isothermIntegrands, endpointDerivatives } from "./integrateIsotherm.js";
export type {
  IntegrationOptions,
  IntegrationErrors,
  IntegratedResidual,
  IsothermIntegrands,
  EndpointDerivatives,
} from "./integrateIsotherm.js";
export { hyperDualEvaluator, finiteDifferenceEvaluator } from "./pressureEvaluator.js";
export type {
  PlainPressure,
  PressureEvaluator,
  PressureSeries,
  FiniteDifferenceOptions,
} from "./pressureEvaluator.js";
export { modelFromPressure, modelFromPlainPressure } from "./pressureModel.js";
export type {
  PressureModel,
  PressureModelSpec,
  PlainPressureModelSpec,
  PressureModelSpecBase,
} from "./pressureModel.js";
export { isPressureModel } from "./pressureModel.js";
