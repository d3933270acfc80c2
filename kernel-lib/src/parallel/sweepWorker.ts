/**
 * Worker-thread entry of the parallel sweep (loaded from kernel-lib/dist by the pool of
 * workerPool.ts): keeps the fluids it was sent by key, plans each sweep once, then evaluates the
 * ranges it is handed with the same engine as the single-thread sweep (sweep/runSweep.ts) and
 * sends the arrays back. The thread lives across sweeps, so its compiled code stays warm.
 */
import { parentPort } from "node:worker_threads";
import { defineFluid, type Fluid } from "../fluid/defineFluid.js";
import {
  allocateColumns,
  evaluateSweepRange,
  planSweep,
  type SweepPlan,
} from "../sweep/runSweep.js";
import type { SweepPointError } from "../sweep/types.js";
import type { FromWorker, ToWorker } from "./messages.js";

const fluids = new Map<string, Fluid>();
let current: { id: number; fluid: Fluid; plan: SweepPlan; chunk: number } | undefined;

function post(message: FromWorker, transfer: ArrayBuffer[] = []): void {
  parentPort!.postMessage(message, transfer);
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
        chunk: message.chunk,
      };
      return;
    }
    case "range": {
      if (current?.id !== message.id) {
        throw new Error(`sweep worker: a range of sweep ${message.id} before its request`);
      }
      const { id, fluid, plan, chunk } = current;
      const { start, end } = message;
      const columns = allocateColumns(plan, end - start);
      const errors: SweepPointError[] = [];
      const failed = evaluateSweepRange(
        { binding: fluid, constants: fluid.components },
        plan,
        start,
        end,
        columns,
        errors,
        (done) => post({ type: "progress", id, done }),
        chunk,
      );
      post(
        {
          type: "done",
          id,
          start,
          end,
          values: columns.values,
          phaseCount: columns.phaseCount,
          phaseKind: columns.phaseKind,
          errorCode: columns.errorCode,
          errors,
          failed,
        },
        [
          ...columns.values.map((v) => v.buffer as ArrayBuffer),
          columns.phaseCount.buffer as ArrayBuffer,
          columns.phaseKind.buffer as ArrayBuffer,
          columns.errorCode.buffer as ArrayBuffer,
        ],
      );
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
