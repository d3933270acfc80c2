/**
 * The messages between the sweep runner (sweepOnWorkers.ts, through the pool of workerPool.ts)
 * and its worker threads (sweepWorker.ts). A worker lives across sweeps: a fluid definition is
 * sent once per worker and kept under its key (specKey.ts) until the runner says to forget it;
 * a sweep's request is sent once per worker that takes part, then ranges of points are handed
 * out one at a time as workers finish their last (on demand). The result arrays live on
 * SharedArrayBuffers sent with the request: a worker writes each range in place (no copy, no
 * transfer) and answers with progress counts and the range's error messages.
 */
import type { FluidSpec } from "../fluid/defineFluid.js";
import type { SweepPointError, SweepRequest } from "../sweep/types.js";

/** Main -> worker: build the fluid and keep it under `key`. */
export interface DefineMessage {
  readonly type: "define";
  readonly key: string;
  readonly spec: FluidSpec;
}

/** Main -> worker: drop the fluid kept under `key` (the runner's cache is full). */
export interface ForgetMessage {
  readonly type: "forget";
  readonly key: string;
}

/** The result arrays of a sweep on SharedArrayBuffers: each worker writes its ranges in place. */
export interface SharedColumns {
  readonly values: Float64Array[];
  readonly phaseCount: Uint8Array;
  readonly phaseKind: Uint8Array;
  readonly errorCode: Uint8Array;
  /** [0]: points written; a worker adds its range's count atomically before it says "done". */
  readonly written: Int32Array;
}

/** Main -> worker: the request of sweep `id`, on the fluid kept under `key`. */
export interface SweepMessage {
  readonly type: "sweep";
  readonly id: number;
  readonly key: string;
  readonly request: SweepRequest;
  readonly columns: SharedColumns;
  /** Points between progress checks; 0: no progress messages. */
  readonly chunk: number;
}

/** Main -> worker: evaluate points [start, end) of sweep `id`. */
export interface RangeMessage {
  readonly type: "range";
  readonly id: number;
  readonly start: number;
  readonly end: number;
}

/** Main -> worker: sweep `id` is over (its plan may be dropped). */
export interface EndMessage {
  readonly type: "end";
  readonly id: number;
}

export type ToWorker = DefineMessage | ForgetMessage | SweepMessage | RangeMessage | EndMessage;

/** Worker -> main: points of the current range done so far. */
export interface ProgressMessage {
  readonly type: "progress";
  readonly id: number;
  readonly done: number;
}

/** Worker -> main: a range is written into the shared arrays. */
export interface DoneMessage {
  readonly type: "done";
  readonly id: number;
  readonly start: number;
  readonly end: number;
  readonly errors: SweepPointError[];
  readonly failed: number;
}

/** Worker -> main: a message could not be served (e.g. the fluid could not be built). */
export interface FailMessage {
  readonly type: "fail";
  /** The sweep concerned; -1 for a definition. */
  readonly id: number;
  readonly message: string;
}

export type FromWorker = ProgressMessage | DoneMessage | FailMessage;
