// Public exports of sweep/: many states of a fluid at once into typed arrays (fluid.sweep).
export {
  runSweep,
  planSweep,
  evaluateSweepRange,
  allocateColumns,
  sweepResult,
} from "./runSweep.js";
export type { SweepFluid, SweepPlan, SweepColumns } from "./runSweep.js";
export { axisValues } from "./axes.js";
export {
  SWEEP_PROPERTIES,
  SWEEP_UNITS,
  SWEEP_ERROR_CODES,
  SWEEP_PHASE_KINDS,
  MAX_ERROR_MESSAGES,
  sweepUnit,
} from "./types.js";
export type {
  SweepSpecification,
  SweepProperty,
  SweepRange,
  SweepAxis,
  SweepPhaseCheck,
  SweepRequest,
  SweepErrorName,
  SweepPhaseKindName,
  SweepPointError,
  SweepResult,
} from "./types.js";
