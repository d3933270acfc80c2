// Public exports of process/vessel/: vessel depressurisation and filling.
export { simulateVessel } from "./simulateVessel.js";
export type * from "./types.js";
export { vesselGeometry } from "./geometry.js";
export type { HeadKind, VesselGeometry, VesselShape } from "./geometry.js";
export { orificeMassFlux, idealGasChokedMassFlux, isStableSinglePhase } from "./orifice.js";
export type { OrificeFlux, OrificeFluxOptions, StagnationState } from "./orifice.js";
export {
  naturalConvectionCoefficient,
  naturalConvectionNusselt,
  rayleighNumber,
  airAt,
} from "./heatTransfer.js";
export type { ConvectionFluid, ConvectionSurface, ContentsTransport } from "./heatTransfer.js";
export { VESSEL_CAUTIONS, VESSEL_NOT_MODELLED } from "./cautions.js";
