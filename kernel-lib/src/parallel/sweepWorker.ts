/**
 * Worker-thread entry of the parallel sweep (loaded from kernel-lib/dist by the pool of
 * workerPool.ts): keeps the fluids it was sent by key, plans each sweep once, then evaluates the
 * ranges it is handed with the same engine as the single-thread sweep (sweep/runSweep.ts),
 * writing them in place into the sweep's shared arrays. The thread lives across sweeps, so its
 * compiled code stays warm.
 */
import { performance } from "node:perf_hooks";
import { parentPort } from "node:worker_threads";
import { defineFluid, type Fluid } from "../fluid/defineFluid.js";
import { evaluateSweepRange, planSweep, type SweepPlan } from "../sweep/runSweep.js";
import type { SweepPointError } from "../sweep/types.js";
import type { FromWorker, SharedColumns, ToWorker } from "./messages.js";

const fluids = new Map<string, Fluid>();
let current:
  { id: number; fluid: Fluid; plan: SweepPlan; columns: SharedColumns; chunk: number } | undefined;

// progress messages at most this often (ms): a message costs tens of microseconds
const PROGRESS_INTERVAL_MS = 25;

function post(message: FromWorker): void {
  parentPort!.postMessage(message);
}

function serve(message: ToWorker): void {
  switch (message.type) {
    case "define":
      fluids.set(message.key, defineFluid(message.spec));
      return;
    case "forget":
      fluids.delete(message.key);
      return;
    case "end":
      if (current?.id === message.id) current = undefined;
      return;
    case "sweep": {
      const fluid = fluids.get(message.key);
      if (fluid === undefined) throw new Error(`sweep worker: no fluid under key ${message.key}`);
      current = {
        id: message.id,
        fluid,
        plan: planSweep(message.request, fluid.componentIds.length),
        columns: message.columns,
        chunk: message.chunk,
      };
      return;
    }
    case "range": {
      if (current?.id !== message.id) {
        throw new Error(`sweep worker: a range of sweep ${message.id} before its request`);
      }
      const { id, fluid, plan, columns, chunk } = current;
      const { start, end } = message;
      // views of the shared arrays: index 0 is point `start`
      const range = {
        values: columns.values.map((v) => v.subarray(start, end)),
        phaseCount: columns.phaseCount.subarray(start, end),
        phaseKind: columns.phaseKind.subarray(start, end),
        errorCode: columns.errorCode.subarray(start, end),
      };
      const errors: SweepPointError[] = [];
      let last = -Infinity;
      const failed = evaluateSweepRange(
        { binding: fluid, constants: fluid.components },
        plan,
        start,
        end,
        range,
        errors,
        chunk > 0
          ? (done) => {
              const now = performance.now();
              if (now - last < PROGRESS_INTERVAL_MS) return;
              last = now;
              post({ type: "progress", id, done });
            }
          : undefined,
        chunk > 0 ? chunk : undefined,
      );
      // the writes above happen before the main thread's Atomics.load of this count
      Atomics.add(columns.written, 0, end - start);
      post({ type: "done", id, start, end, errors, failed });
    }
  }
}

parentPort?.on("message", (message: ToWorker) => {
  try {
    serve(message);
  } catch (e) {
    const id = message.type === "sweep" || message.type === "range" ? message.id : -1;
    post({ type: "fail", id, message: e instanceof Error ? e.message : String(e) });
  }
});
