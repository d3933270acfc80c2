// Public exports of process/: streams and process steps on real fluids.
export {
  defineStream,
  streamFromEquilibrium,
  massFlowKgPerS,
  streamEnthalpyJPerMol,
  streamEntropyJPerMolK,
  streamVaporFraction,
  streamFlowIn,
  molarFlowOf,
  molarMassOf,
} from "./stream.js";
export type { Stream, StreamSpec, FlowSpec, GivenFlow, StandardVolumeBasis } from "./stream.js";
export { PROCESS_CAUTION } from "./types.js";
export type { StepResult, StepCheck, ProcessWarning, ProcessCondition } from "./types.js";
export { closeBalances, BALANCE_TOLERANCE } from "./balance.js";
