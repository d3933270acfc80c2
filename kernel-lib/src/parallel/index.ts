// Public exports of parallel/ (Node side): sweeps split across worker threads.
export { sweepOnWorkers, defaultWorkerScript } from "./sweepOnWorkers.js";
export type { ParallelSweepOptions } from "./sweepOnWorkers.js";
