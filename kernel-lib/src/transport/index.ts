// Public exports of transport/: viscosity and thermal conductivity of gases and dense fluids.
export { transportAtTRho, transportOfState, isIapws95Water } from "./transportAt.js";
export type {
  TransportFluid,
  TransportMethod,
  TransportOfState,
  TransportOptions,
  TransportProperties,
} from "./types.js";
export {
  chungParameters,
  chungViscosity,
  chungDiluteViscosity,
  chungThermalConductivity,
} from "./chung.js";
export type { ChungComponent, ChungParameters } from "./chung.js";
export {
  iapwsBackgroundViscosity,
  iapwsViscosityEnhancement,
  iapwsCorrelationLengthNm,
  iapwsCriticalEnhancement,
  iapwsDiluteViscosity,
  iapwsDiluteConductivity,
  iapwsBackgroundConductivity,
} from "./iapwsWater.js";
