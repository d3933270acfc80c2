// Samplers that turn a model or fluid into chart data (browser-safe: they call the engine only).
export { saturationFromModel } from "./saturationFromModel.js";
export type { SaturationSampleOptions, SampledDome } from "./saturationFromModel.js";
export { isothermsFromModel } from "./isothermsFromModel.js";
export type { IsothermSampleOptions } from "./isothermsFromModel.js";
export { departuresFromFluid } from "./departuresFromFluid.js";
export type { DepartureSampleOptions } from "./departuresFromFluid.js";
export { compressibilityFromFluid } from "./compressibilityFromFluid.js";
export type { CompressibilitySampleOptions } from "./compressibilityFromFluid.js";
export {
  isothermOnPressureEnthalpy,
  isobarOnTemperatureEntropy,
  isentropeOnPressureEnthalpy,
} from "./diagramLinesFromFluid.js";
export { surfaceFromFluid } from "./surfaceFromFluid.js";
export type { SurfaceSampleOptions, SurfaceQuantity } from "./surfaceFromFluid.js";
export type { DisplayQuantityKindInput } from "./surfaceTypes.js";
export type { SampleProgress } from "./sampleGuard.js";
export { mixtureDomeFromFluid } from "./mixtureDomeFromFluid.js";
export type { MixtureDomeSampleOptions, SampledMixtureDome } from "./mixtureDomeFromFluid.js";
