/**
 * Benchmark harness: each case's function is called in batches; a batch is sized to take about
 * 20 ms, the batch time divided by its calls is one sample, and the reported value is the median of
 * the samples (after warm-up batches, so the JIT has settled). Two clocks: the process CPU time
 * (user + system, process.cpuUsage) is `secondsPerCall`, because on a shared machine wall time
 * also counts the time other processes hold the cores; the wall-clock median is reported beside it.
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

/** Medians of one case, seconds per call. */
export interface Timing {
  /** Process CPU time per call. */
  cpu: number;
  /** Wall-clock time per call. */
  wall: number;
  /** Fastest sample of process CPU time per call (least disturbed by other processes). */
  cpuMin: number;
  /** Number of samples behind the medians. */
  samples: number;
}

function cpuSeconds(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
}

let sink: unknown;

/** Median seconds per call of `fn` (CPU and wall clock). */
export function measure(
  fn: () => unknown,
  options: { samples?: number; batchSeconds?: number } = {},
): Timing {
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
  // warm-up: about 0.3 s, so optimised code is in place and background compilation is done
  const warmBatches = Math.max(3, Math.ceil(0.3 / batchSeconds));
  for (let w = 0; w < warmBatches; w++) for (let i = 0; i < calls; i++) sink = fn();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let s = 0; s < samples; s++) {
    const c0 = cpuSeconds();
    const t0 = performance.now();
    for (let i = 0; i < calls; i++) sink = fn();
    wall.push((performance.now() - t0) / 1000 / calls);
    cpu.push((cpuSeconds() - c0) / calls);
  }
  const median = (v: number[]) => v.sort((a, b) => a - b)[Math.floor(v.length / 2)];
  const cpuMin = Math.min(...cpu);
  return { cpu: median(cpu), wall: median(wall), cpuMin, samples };
}

/** Keeps results alive so the optimiser cannot drop the work. */
export function consumed(): unknown {
  return sink;
}
