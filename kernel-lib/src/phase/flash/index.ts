// Public exports of phase/flash/: mixture flashes (T-P, P-h, P-s, T-s, u-v) and their building blocks.
export { flashTP } from "./flashTP.js";
export type { FlashOptions } from "./flashTP.js";
export { flashPH, flashPS, flashTS, flashUV, overallProperty } from "./stateFunctionFlash.js";
export type { StateFlashOptions } from "./stateFunctionFlash.js";
export { flashTV } from "./flashTV.js";
export { solveRachfordRice } from "./rachfordRice.js";
export type { RachfordRiceOptions, RachfordRiceResult } from "./rachfordRice.js";
export { solveMultiphaseSplit } from "./multiphaseRachfordRice.js";
export type { MultiphaseSplitOptions, MultiphaseSplit } from "./multiphaseRachfordRice.js";
export type {
  PhaseKind,
  EquilibriumPhase,
  EquilibriumCheck,
  Equilibrium,
  SpecificationResidual,
  StateFunctionEquilibrium,
} from "./types.js";
