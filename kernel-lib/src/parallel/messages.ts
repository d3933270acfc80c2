/**
 * The messages between the sweep runner (sweepOnWorkers.ts) and its worker threads
 * (sweepWorker.ts): the fluid definition once, then one range of points per job; the worker
 * answers with progress counts and the range's typed arrays (transferred, not copied).
 */
import type { FluidSpec } from "../fluid/defineFluid.js";
import type { SweepPointError, SweepRequest } from "../sweep/types.js";

/** Main -> worker: build the fluid (once per worker). */
export interface InitMessage {
  readonly type: "init";
  readonly spec: FluidSpec;
}

/** Main -> worker: evaluate points [start, end) of the request. */
export interface JobMessage {
  readonly type: "job";
  readonly request: SweepRequest;
  readonly start: number;
  readonly end: number;
  /** Points between progress messages. */
  readonly chunk: number;
}

export type ToWorker = InitMessage | JobMessage;

/** Worker -> main: points done so far in the current job. */
export interface ProgressMessage {
  readonly type: "progress";
  readonly done: number;
}

/** Worker -> main: the job's arrays. */
export interface DoneMessage {
  readonly type: "done";
  readonly start: number;
  readonly values: Float64Array[];
  readonly phaseCount: Uint8Array;
  readonly phaseKind: Uint8Array;
  readonly errorCode: Uint8Array;
  readonly errors: SweepPointError[];
  readonly failed: number;
}

/** Worker -> main: the job could not run at all (e.g. the fluid could not be built). */
export interface FailMessage {
  readonly type: "fail";
  readonly message: string;
}

export type FromWorker = ProgressMessage | DoneMessage | FailMessage;
