/**
 * Benchmark harness for one case in one process. The case's function is called in batches; a batch
 * is sized to take about `batchSeconds` from the call rate (the first call, which may carry one-off
 * set-up, is left out: it once made batches of a single call whose CPU times were mostly clock
 * granularity), sized again after warm-up, and the batch time divided by its calls is one sample.
 *
 * Warm-up runs batches until the batch times settle: after `minWarmupSeconds`, the median of the
 * last `settleWindow` batches must agree with the median of the window before it within
 * `settleTolerance` (relative); it stops at `maxWarmupSeconds` in any case and says whether it
 * settled. Then `samples` batches are timed and their medians reported.
 *
 * Two clocks: the process CPU time (user + system, process.cpuUsage) is `cpu`, because on a shared
 * machine wall time also counts the time other processes hold the cores; the wall-clock median is
 * reported beside it.
 *
 * A fresh V8 process can settle into a faster or a slower optimisation state for the same code
 * (different inlining and deoptimisation histories), and stays there; one process cannot tell the
 * states apart, so run.ts runs every case in several fresh processes and reports the spread.
 */
import { performance } from "node:perf_hooks";

/** One benchmark case: `setup` runs once and returns the function timed per call. */
export interface BenchCase {
  readonly name: string;
  /** What one call does, for the reader. */
  readonly description: string;
  /** Target in seconds per call, when the issue sets one. */
  readonly targetSeconds?: number;
  /** Measurement options of this case (they win over the command line's), e.g. few samples for slow calls. */
  readonly measure?: MeasureOptions;
  setup(): () => unknown;
  /**
   * Instead of `setup`, for work that ends asynchronously (worker threads): the function timed
   * per call returns a promise; measured by {@link measureAsync} (one warm-up call, then
   * `measure.samples` calls). `setup` is then never called.
   */
  setupAsync?(): () => Promise<unknown>;
}

/** Options of {@link measure}. */
export interface MeasureOptions {
  /** Timed batches after warm-up. Default 41. */
  samples?: number;
  /** Target duration of one batch, s. Default 0.02. */
  batchSeconds?: number;
  /** Warm-up always lasts at least this long, s. Default 0.5. */
  minWarmupSeconds?: number;
  /** Warm-up stops here even if batch times have not settled, s. Default 3. */
  maxWarmupSeconds?: number;
  /** Batches per window in the settling test. Default 5. */
  settleWindow?: number;
  /** Relative agreement of consecutive window medians that counts as settled. Default 0.02. */
  settleTolerance?: number;
}

/** Timing of one case in one process, seconds per call. */
export interface Timing {
  /** Median process CPU time per call. */
  cpu: number;
  /** Median wall-clock time per call. */
  wall: number;
  /** Fastest sample of process CPU time per call (least disturbed by other processes). */
  cpuMin: number;
  /** Number of samples behind the medians. */
  samples: number;
  /** Calls per batch. */
  callsPerBatch: number;
  /** Warm-up duration, s (wall clock). */
  warmupSeconds: number;
  /** Whether the warm-up ended because batch times settled (false: it hit the cap). */
  settled: boolean;
}

function cpuSeconds(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
}

/** Median of a list (mean of the middle two for an even count); sorts a copy. */
export function median(values: readonly number[]): number {
  const v = [...values].sort((a, b) => a - b);
  const m = v.length >> 1;
  return v.length % 2 === 1 ? v[m] : (v[m - 1] + v[m]) / 2;
}

let sink: unknown;

function runBatch(fn: () => unknown, calls: number): void {
  for (let i = 0; i < calls; i++) sink = fn();
}

/** Median seconds per call of `fn` (CPU and wall clock), after a warm-up that waits for settling. */
export function measure(fn: () => unknown, options: MeasureOptions = {}): Timing {
  const samples = options.samples ?? 41;
  const batchSeconds = options.batchSeconds ?? 0.02;
  const minWarmup = options.minWarmupSeconds ?? 0.5;
  const maxWarmup = options.maxWarmupSeconds ?? 3;
  const window = options.settleWindow ?? 5;
  const tolerance = options.settleTolerance ?? 0.02;
  const warmStart = performance.now();
  // size the batch from the call rate over about 0.1 s, not counting the first call (which
  // may carry one-off set-up costs and would otherwise leave batches of a single call)
  sink = fn();
  let calls = 1;
  let done = 0;
  const r0 = performance.now();
  while (performance.now() - r0 < 100) {
    runBatch(fn, calls);
    done += calls;
    calls *= 2;
  }
  const rate = done / ((performance.now() - r0) / 1000);
  calls = Math.max(1, Math.round(rate * batchSeconds));
  // warm-up until two consecutive windows of batch CPU times agree
  const warm: number[] = [];
  let settled = false;
  for (;;) {
    const c0 = cpuSeconds();
    runBatch(fn, calls);
    warm.push(cpuSeconds() - c0);
    const elapsed = (performance.now() - warmStart) / 1000;
    if (elapsed >= minWarmup && warm.length >= 2 * window) {
      const last = median(warm.slice(-window));
      const before = median(warm.slice(-2 * window, -window));
      if (Math.abs(last - before) <= tolerance * Math.max(last, before)) {
        settled = true;
        break;
      }
    }
    if (elapsed >= maxWarmup) break;
  }
  const warmupSeconds = (performance.now() - warmStart) / 1000;
  // re-size the batch from the settled batch time (the code is faster now than while sizing)
  const settledBatch = median(warm.slice(-window));
  if (settledBatch > 0) calls = Math.max(1, Math.round((calls * batchSeconds) / settledBatch));
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let s = 0; s < samples; s++) {
    const c0 = cpuSeconds();
    const t0 = performance.now();
    runBatch(fn, calls);
    wall.push((performance.now() - t0) / 1000 / calls);
    cpu.push((cpuSeconds() - c0) / calls);
  }
  return {
    cpu: median(cpu),
    wall: median(wall),
    cpuMin: Math.min(...cpu),
    samples,
    callsPerBatch: calls,
    warmupSeconds,
    settled,
  };
}

/** Keeps results alive so the optimiser cannot drop the work. */
export function consumed(): unknown {
  return sink;
}

/**
 * Median seconds per call of an asynchronous `fn` (e.g. a sweep on worker threads): one warm-up
 * call, then `samples` calls, each timed alone. The process CPU time counts every thread of the
 * process (workers included), so `cpu` is the total work and `wall` the elapsed time.
 */
export async function measureAsync(
  fn: () => Promise<unknown>,
  options: MeasureOptions = {},
): Promise<Timing> {
  const samples = options.samples ?? 3;
  const w0 = performance.now();
  sink = await fn();
  const warmupSeconds = (performance.now() - w0) / 1000;
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let s = 0; s < samples; s++) {
    const c0 = cpuSeconds();
    const t0 = performance.now();
    sink = await fn();
    wall.push((performance.now() - t0) / 1000);
    cpu.push(cpuSeconds() - c0);
  }
  return {
    cpu: median(cpu),
    wall: median(wall),
    cpuMin: Math.min(...cpu),
    samples,
    callsPerBatch: 1,
    warmupSeconds,
    settled: true,
  };
}
