/**
 * Benchmark harness: each case's function is called in batches; a batch is sized to take about
 * 20 ms, the batch time divided by its calls is one sample, and the reported secondsPerCall is the
 * median of the samples (after warm-up batches, so the JIT has settled).
 */
import { performance } from "node:perf_hooks";

/** One benchmark case: `setup` runs once and returns the function timed per call. */
export interface BenchCase {
  readonly name: string;
  /** What one call does, for the reader. */
  readonly description: string;
  /** Target in seconds per call, when the issue sets one. */
  readonly targetSeconds?: number;
  setup(): () => unknown;
}

/** Result line of one case. */
export interface BenchResult {
  case: string;
  secondsPerCall: number;
}

let sink: unknown;

/** Median seconds per call of `fn`. */
export function measure(
  fn: () => unknown,
  options: { samples?: number; batchSeconds?: number } = {},
): number {
  const samples = options.samples ?? 15;
  const batchSeconds = options.batchSeconds ?? 0.02;
  // size the batch
  let calls = 1;
  for (;;) {
    const t0 = performance.now();
    for (let i = 0; i < calls; i++) sink = fn();
    const dt = (performance.now() - t0) / 1000;
    if (dt >= batchSeconds || calls > 1e8) break;
    calls = Math.max(calls * 2, Math.ceil((calls * batchSeconds) / Math.max(dt, 1e-6)));
  }
  // warm-up
  for (let w = 0; w < 3; w++) for (let i = 0; i < calls; i++) sink = fn();
  const times: number[] = [];
  for (let s = 0; s < samples; s++) {
    const t0 = performance.now();
    for (let i = 0; i < calls; i++) sink = fn();
    times.push((performance.now() - t0) / 1000 / calls);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

/** Keeps results alive so the optimiser cannot drop the work. */
export function consumed(): unknown {
  return sink;
}
