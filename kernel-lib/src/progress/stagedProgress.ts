/**
 * Progress of an analysis that runs in named stages and reports through a plain callback
 * ({ stage, done, total, unit }), as the browser-safe P-V-T route does (departuresFromPvt's
 * `onProgress`): one progress display per stage (startProgress), the previous one finished when the
 * next stage starts, so each stage ends as a one-line summary with its time.
 */
import { startProgress } from "./progress.js";
import type { ProgressOptions, ProgressTracker } from "./progress.js";

/** One report of a staged analysis. */
export interface StageReport {
  readonly stage: string;
  readonly done: number;
  readonly total: number;
  readonly unit: string;
}

/** Options of {@link stagedProgress}: those of startProgress except the per-stage ones. */
export type StagedProgressOptions = Omit<ProgressOptions, "total" | "unit">;

/** The callback to pass to the analysis, and the end of the display. */
export interface StagedProgress {
  /** Pass as the analysis's progress callback (e.g. `{ onProgress: progress.onProgress }`). */
  readonly onProgress: (report: StageReport) => void;
  /** Ends the last stage's display. */
  finish(): void;
  /** Ends the current stage's display with a failure. */
  fail(error: unknown): void;
}

/**
 * Starts a staged progress display.
 * @example
 * const progress = stagedProgress({ label: "P-V-T route" });
 * const result = departuresFromPvt(data, { onProgress: progress.onProgress });
 * progress.finish();
 */
export function stagedProgress(options: StagedProgressOptions = {}): StagedProgress {
  const prefix = options.label ?? "Analysis";
  let stage: string | undefined;
  let tracker: ProgressTracker | undefined;
  return {
    onProgress(report: StageReport) {
      if (report.stage !== stage || !tracker) {
        tracker?.finish();
        stage = report.stage;
        tracker = startProgress({
          ...options,
          label: `${prefix}: ${report.stage}`,
          total: report.total,
          unit: report.unit,
        });
      }
      tracker.set(report.done);
    },
    finish() {
      tracker?.finish();
    },
    fail(error: unknown) {
      tracker?.fail(error);
    },
  };
}
