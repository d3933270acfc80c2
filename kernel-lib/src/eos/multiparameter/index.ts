// Public exports of eos/multiparameter/: reference-quality Helmholtz equations of state.
export { referenceFluid, referenceFluidIds } from "./referenceFluids.js";
export type {
  ReferenceFluid,
  FluidPoint,
  SaturationEstimate,
  ValidityStatus,
} from "./referenceFluid.js";
export { buildReferenceFluid } from "./referenceFluid.js";
export { referencePropertiesTRho } from "./referenceProperties.js";
export type { ReferenceProperties, ReferencePropertiesOptions } from "./referenceProperties.js";
export type { ReferenceFluidData, AncillaryData } from "./fluidData.js";
export type { ReducedHelmholtz, ResidualPartData } from "./residualPart.js";
export type { IdealPartData } from "./idealPart.js";
