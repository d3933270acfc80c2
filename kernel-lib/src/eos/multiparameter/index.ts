// Public exports of eos/multiparameter/: reference-quality Helmholtz equations of state.
export { referenceFluid, referenceFluidIds } from "./referenceFluids.js";
export type {
  ReferenceFluid,
  FluidPoint,
  SaturationEstimate,
  ValidityStatus,
} from "./referenceFluid.js";
export { buildReferenceFluid } from "./referenceFluid.js";
export { checkReferenceFluidData } from "./fluidData.js";
export { referenceStateTRho, referenceStateTP, referenceFluidBinding } from "./referenceStates.js";
export type { ReferenceStateOptions } from "./referenceStates.js";
export { referenceIdealGasPure, referenceIdealGasMixture } from "./referenceIdealGas.js";
export type { ReferenceFluidData, AncillaryData } from "./fluidData.js";
export type { ReducedHelmholtz, ResidualPartData } from "./residualPart.js";
export type { IdealPartData } from "./idealPart.js";
