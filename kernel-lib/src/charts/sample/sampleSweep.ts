/**
 * The samplers' (T, P) grids through the sweep engine (sweep/runSweep.ts): typed-array sweeps of
 * whole temperature rows instead of one state object per point, with the same numbers (the sweep
 * equals stateAtTP to the last bit, tests/unit/sweep) and the samplers' own rules kept:
 *  - a point without a state (no density root, a solver that gave up) is NaN, as tryPoint made it;
 *  - a point refused for its input (bad-input, other) is recomputed by stateAtTP, which throws the
 *    typed error the sampler threw before (bad input is never turned into a gap);
 *  - mixtures are swept without the sweep's phase test (phaseCheck "none") and each computed
 *    point is given the tangent-plane test of sampleGuard.ts, as before: a point where the
 *    mixture splits has no single-phase value and is left blank (NaN), which the charts report.
 */
import { stateAtTP } from "../../state/stateAt.js";
import type { FluidBinding } from "../../state/types.js";
import { runSweep } from "../../sweep/runSweep.js";
import { SWEEP_ERROR_CODES, type SweepProperty } from "../../sweep/types.js";
import { mixtureSplitsAt } from "./sampleGuard.js";

/** One temperature row of a (T, P) grid: the asked properties, NaN where there is no value. */
export type SweptRow<K extends SweepProperty> = Record<K, Float64Array>;

/** Options of {@link sweepTPRows}. */
export interface SweepRowsOptions {
  /** Called once per point, after the point's chunk of rows is swept (the samplers' progress count). */
  onPoint?: () => void;
  /** Mixtures: blank the points where the feed splits (tangent-plane test). Default true. */
  checkStability?: boolean;
}

/** The result of {@link sweepTPRows}: rows in the order of the temperatures, and split points. */
export interface SweptRows<K extends SweepProperty> {
  readonly rows: SweptRow<K>[];
  /** Points left blank because the mixture splits there. */
  readonly split: number;
}

const NO_PHASE = SWEEP_ERROR_CODES["no-phase"];
const SOLVER_FAILED = SWEEP_ERROR_CODES["solver-failed"];
const CHUNK_POINTS = 2048;

/**
 * Sweeps every (T, P) pair of the two lists, a row per temperature, for the asked properties of
 * the stable single phase at the composition x (see the header for gaps, refusals and splits).
 */
export function sweepTPRows<K extends SweepProperty>(
  binding: FluidBinding,
  temperaturesK: readonly number[],
  pressuresPa: readonly number[],
  x: readonly number[],
  properties: readonly K[],
  options: SweepRowsOptions = {},
): SweptRows<K> {
  let present = 0;
  for (const v of x) if (v > 0) present++;
  const testSplit = present >= 2 && options.checkStability !== false;
  // the Wilson constants serve the sweep's own phase tests only, which phaseCheck "none" skips
  const fluid = { binding, constants: [] };
  const second = Float64Array.from(pressuresPa);
  const n = second.length;
  const rows: SweptRow<K>[] = [];
  let split = 0;
  if (n === 0) {
    // no pressures: empty rows (a sweep needs at least one value per axis)
    for (let i = 0; i < temperaturesK.length; i++) {
      const row = {} as SweptRow<K>;
      for (const p of properties) row[p] = new Float64Array(0);
      rows.push(row);
    }
    return { rows, split };
  }
  // rows are swept in chunks of at least CHUNK_POINTS points (one sweep for a short line, a
  // progress report every chunk for a large surface)
  const rowsPerChunk = Math.max(1, Math.ceil(CHUNK_POINTS / n));
  for (let i0 = 0; i0 < temperaturesK.length; i0 += rowsPerChunk) {
    const i1 = Math.min(temperaturesK.length, i0 + rowsPerChunk);
    const r = runSweep(fluid, {
      specification: "TP",
      first: temperaturesK.slice(i0, i1),
      second,
      properties,
      x,
      phaseCheck: "none",
    });
    for (let i = i0; i < i1; i++) {
      const T = temperaturesK[i];
      const offset = (i - i0) * n;
      const row = {} as SweptRow<K>;
      for (const p of properties) {
        row[p] = (r.values[p] as Float64Array).subarray(offset, offset + n);
      }
      for (let j = 0; j < n; j++) {
        const code = r.errorCode[offset + j];
        if (code === 0) {
          if (testSplit && mixtureSplitsAt(binding.model, T, second[j], x)) {
            split++;
            for (const p of properties) row[p][j] = NaN;
          }
        } else if (code !== NO_PHASE && code !== SOLVER_FAILED) {
          // throws the typed error of the single state (bad input is not a gap)
          stateAtTP(binding, T, second[j], x);
        }
        options.onPoint?.();
      }
      rows.push(row);
    }
  }
  return { rows, split };
}
