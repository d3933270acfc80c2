// Public exports of eos/multiparameter/: reference-quality Helmholtz equations of state.
export { referenceFluidIds, referenceFluidData } from "./referenceFluids.js";
export type {
  ReferenceFluid,
  FluidPoint,
  SaturationEstimate,
  ValidityStatus,
} from "./referenceFluid.js";
export { buildReferenceEquation } from "./referenceFluid.js";
export type { ReferenceDensitySolver } from "./referenceFluid.js";
export { checkReferenceFluidData } from "./fluidData.js";
export { referenceIdealGasPure, referenceIdealGasMixture } from "./referenceIdealGas.js";
export type { ReferenceFluidData, AncillaryData } from "./fluidData.js";
export type { ReducedHelmholtz, ResidualPartData } from "./residualPart.js";
export type { IdealPartData } from "./idealPart.js";
