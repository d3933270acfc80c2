// Public exports of parallel/ (Node side): sweeps split across worker threads.
export { sweepOnWorkers, defaultWorkerScript } from "./sweepOnWorkers.js";
export { startSweepWorkers } from "./sweepOnWorkers.js";
export type { StartSweepWorkersOptions } from "./sweepOnWorkers.js";
export { closeSweepWorkers, sweepWorkerStats } from "./workerPool.js";
export type { SweepWorkerStats } from "./workerPool.js";
export type { ParallelSweepOptions } from "./sweepOnWorkers.js";
