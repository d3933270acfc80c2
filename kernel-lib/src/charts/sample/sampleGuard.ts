/**
 * Sampling a model for a chart (internal): a point the engine cannot compute (no saturation
 * state found, no phase there) becomes a gap in the curve (NaN), which the chart builders leave
 * out and report in the chart's warnings. Bad input still throws: only solver and phase
 * failures are turned into gaps.
 */
import { PhaseUnavailableError, SolverError } from "../../errors.js";

/** Runs `compute`; returns undefined for a solver or phase failure, rethrows anything else. */
export function tryPoint<T>(compute: () => T): T | undefined {
  try {
    return compute();
  } catch (error) {
    if (error instanceof SolverError || error instanceof PhaseUnavailableError) return undefined;
    throw error;
  }
}

/** Optional progress callback of the samplers: items done and in all. */
export type SampleProgress = (done: number, total: number) => void;
