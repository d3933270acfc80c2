/**
 * Progress of long grid and sweep computations: counts items, measures the rate, estimates the
 * time left, and shows it through a sink at most `maxUpdatesPerSecond` times a second (default
 * 10), plus the first and the final state. When the work ends, the display collapses to a
 * one-line summary ("... 40,000 states in 3.2 s (12,500/s)").
 */
import { InputError } from "../errors.js";
import { autoSink, silentSink, streamSink } from "./progressSinks.js";
import type { ProgressSink, ProgressSnapshot } from "./progressTypes.js";

/** Options of {@link startProgress}. */
export interface ProgressOptions {
  /** What is being computed (plain text). Default "Computing". */
  label?: string;
  /** Number of items, when known (enables per cent and time left). Default: unknown. */
  total?: number;
  /** Name of the items. Default "items". */
  unit?: string;
  /**
   * Where to show progress: "auto" (tslab display in a kernel, else stderr; default), "stderr",
   * "none", or a custom sink (tests, widgets).
   */
  sink?: "auto" | "stderr" | "none" | ProgressSink;
  /** Most updates per second shown while running. Default 10. */
  maxUpdatesPerSecond?: number;
  /** Clock in milliseconds (tests). Default `performance.now()`. */
  now?: () => number;
}

/** A running progress display. */
export interface ProgressTracker {
  /** Adds `count` finished items (default 1). */
  tick(count?: number): void;
  /** Sets the number of finished items. */
  set(done: number): void;
  /** Ends the work: shows the one-line summary. Calls after the end are ignored. */
  finish(): void;
  /** Ends the work with a failure (shown in the summary). */
  fail(error: unknown): void;
  /** The current state. */
  snapshot(): ProgressSnapshot;
}

/**
 * Starts a progress display.
 * @example
 * const progress = startProgress({ label: "h on the T-P grid", total: temps.length * pressures.length, unit: "states" });
 * for (const T of temps) for (const P of pressures) { compute(T, P); progress.tick(); }
 * progress.finish();
 */
export function startProgress(options: ProgressOptions = {}): ProgressTracker {
  const label = options.label ?? "Computing";
  const unit = options.unit ?? "items";
  const total = options.total;
  if (total !== undefined && !(Number.isInteger(total) && total >= 0)) {
    throw new InputError({
      input: "total",
      unit: "-",
      validRange: "an integer >= 0",
      received: total,
    });
  }
  const perSecond = options.maxUpdatesPerSecond ?? 10;
  if (!(perSecond > 0 && perSecond <= 1000)) {
    throw new InputError({
      input: "maxUpdatesPerSecond",
      unit: "1/s",
      validRange: "> 0 and <= 1000",
      received: perSecond,
    });
  }
  const minIntervalMs = 1000 / perSecond;
  const now = options.now ?? (() => performance.now());
  const sink = resolveSink(options.sink ?? "auto");
  const start = now();
  let done = 0;
  let status: ProgressSnapshot["status"] = "running";
  let failure: string | undefined;
  let lastShown = -Infinity;

  const snapshot = (): ProgressSnapshot => {
    const elapsedSeconds = Math.max(0, (now() - start) / 1000);
    const ratePerSecond = elapsedSeconds > 0 ? done / elapsedSeconds : 0;
    const remainingSeconds =
      total !== undefined && ratePerSecond > 0 && status === "running"
        ? Math.max(0, (total - done) / ratePerSecond)
        : undefined;
    return {
      label,
      done,
      total,
      unit,
      elapsedSeconds,
      ratePerSecond,
      remainingSeconds,
      status,
      failure,
    };
  };
  const maybeShow = () => {
    const t = now();
    if (t - lastShown >= minIntervalMs) {
      lastShown = t;
      sink.show(snapshot());
    }
  };
  const end = (s: ProgressSnapshot["status"], message?: string) => {
    if (status !== "running") return;
    status = s;
    failure = message;
    sink.show(snapshot());
  };
  maybeShow();
  return {
    tick(count = 1) {
      if (status !== "running") return;
      if (!(Number.isFinite(count) && count >= 0)) {
        throw new InputError({
          input: "count",
          unit: "-",
          validRange: "a finite number >= 0",
          received: count,
        });
      }
      done += count;
      maybeShow();
    },
    set(value: number) {
      if (status !== "running") return;
      if (!(Number.isFinite(value) && value >= 0)) {
        throw new InputError({
          input: "done",
          unit: "-",
          validRange: "a finite number >= 0",
          received: value,
        });
      }
      done = value;
      maybeShow();
    },
    finish: () => end("done"),
    fail: (error: unknown) => end("failed", error instanceof Error ? error.message : String(error)),
    snapshot,
  };
}

/**
 * Runs `work` on every item with a progress display, finishing (or failing) it at the end; the
 * results come back in order. Errors are shown in the summary and rethrown.
 * @example const rows = await mapWithProgress(states, (s) => stateAt(model, s), { label: "Feed states" });
 */
export async function mapWithProgress<T, R>(
  items: readonly T[],
  work: (item: T, index: number) => R | Promise<R>,
  options: Omit<ProgressOptions, "total"> = {},
): Promise<R[]> {
  const progress = startProgress({ ...options, total: items.length });
  const out: R[] = [];
  try {
    for (let i = 0; i < items.length; i++) {
      out.push(await work(items[i], i));
      progress.tick();
    }
  } catch (error) {
    progress.fail(error);
    throw error;
  }
  progress.finish();
  return out;
}

function resolveSink(sink: NonNullable<ProgressOptions["sink"]>): ProgressSink {
  if (sink === "auto") return autoSink();
  if (sink === "stderr") return streamSink();
  if (sink === "none") return silentSink();
  if (sink && typeof sink.show === "function") return sink;
  throw new InputError({
    input: "sink",
    unit: "-",
    validRange: '"auto", "stderr", "none" or { show(snapshot) }',
    received: sink,
  });
}
