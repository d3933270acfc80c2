/**
 * Sampling a model for a chart (internal): a point the engine cannot compute (no saturation
 * state found, no phase there) becomes a gap in the curve (NaN), which the chart builders leave
 * out and report in the chart's warnings. Bad input still throws: only solver and phase
 * failures are turned into gaps.
 */
import { PhaseUnavailableError, SolverError } from "../../errors.js";
import type { ResidualModel } from "../../eos/types.js";
import { stabilityAtTP } from "../../phase/stability.js";

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

/**
 * Whether a mixture (two or more components present) splits into phases at (T, P): the
 * tangent-plane test (phase/stability.ts). The samplers leave such a point out (NaN): it has no
 * single-phase value, and the chart reports the gap in its warnings. A pure fluid, or a test that
 * cannot be made, counts as no split (the state layer handles pure fluids' phases itself).
 */
export function mixtureSplitsAt(
  model: ResidualModel,
  T: number,
  P: number,
  x: readonly number[],
): boolean {
  let present = 0;
  for (const v of x) if (v > 0) present++;
  if (present < 2) return false;
  return tryPoint(() => !stabilityAtTP(model, T, P, x).stable) ?? false;
}
