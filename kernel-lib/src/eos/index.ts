// Public exports of eos/: the residual-Helmholtz models and their parts.
export { createModel, isModelId, MODEL_IDS } from "./createModel.js";
export type { ModelId, CreateModelOptions } from "./createModel.js";
export { createCubicModel } from "./cubic/cubicModel.js";
export type { CubicModel, CubicModelOptions, CubicMixtureParameters } from "./cubic/cubicModel.js";
export { CUBIC_FAMILIES, criticalConstantsOfCubic, isCubicModelId } from "./cubic/cubicFamilies.js";
export type { CubicFamily, CubicModelId } from "./cubic/cubicFamilies.js";
export { alphaSlope, evaluatePsi } from "./cubic/alphaFunctions.js";
export type { AlphaKind, PsiValues } from "./cubic/alphaFunctions.js";
export { createIdealGasModel } from "./idealGasModel.js";
export { createVirialModel } from "./virial/virialModel.js";
export type { VirialModel, VirialModelOptions } from "./virial/virialModel.js";
export { tsonopoulosB } from "./virial/tsonopoulos.js";
export type { SecondVirial } from "./virial/tsonopoulos.js";
export {
  createLeeKeslerModel,
  LEE_KESLER_SIMPLE,
  LEE_KESLER_REFERENCE,
  LEE_KESLER_REFERENCE_OMEGA,
} from "./leeKesler/leeKeslerModel.js";
export type {
  LeeKeslerModel,
  LeeKeslerModelOptions,
  LeeKeslerPseudoCritical,
} from "./leeKesler/leeKeslerModel.js";
export { leeKeslerFluid } from "./leeKesler/leeKeslerFluid.js";
export type { LeeKeslerConstants, FluidDerivatives } from "./leeKesler/leeKeslerFluid.js";
export { penelouxShift, withVolumeTranslation } from "./volumeTranslation.js";
export {
  rackettShift,
  RACKETT_SHIFT_REDUCED_TEMPERATURE,
  RACKETT_TRANSLATION_LABEL,
} from "./volumeTranslation.js";
export type { VolumeTranslationLabel } from "./volumeTranslation.js";
export { resolveInteractions } from "./interaction/interactionTable.js";
export { chuehPrausnitzKij } from "./interaction/interactionTable.js";
export type {
  InteractionMatrix,
  InteractionNote,
  InteractionFamily,
} from "./interaction/interactionTable.js";
export type { InteractionBasis } from "./interaction/interactionTable.js";
export { checkModelComponents } from "./modelComponent.js";
export type { ModelComponent } from "./modelComponent.js";
export { hasPressureFunction } from "./pressureFunction.js";
export type { HyperDualPressure, ModelWithPressure } from "./pressureFunction.js";
// reference-quality multiparameter equations (IAPWS-95, Span-Wagner, ...)
export * from "./multiparameter/index.js";
