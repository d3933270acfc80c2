/**
 * progress/: progress displays for long grid and sweep work (Node side: tslab display or stderr).
 *
 *   startProgress --tick/set--> throttled snapshots --sink--> tslab newDisplay() (in place) | stderr
 *                 --finish/fail--> one-line summary
 */
export { startProgress, mapWithProgress } from "./progress.js";
export type { ProgressOptions, ProgressTracker } from "./progress.js";
export type { ProgressSnapshot, ProgressSink } from "./progressTypes.js";
export { progressLine, progressHtml, formatDuration } from "./formatProgress.js";
export { streamSink, silentSink, tslabSink } from "./progressSinks.js";
export { stagedProgress } from "./stagedProgress.js";
export type { StagedProgress, StagedProgressOptions, StageReport } from "./stagedProgress.js";
