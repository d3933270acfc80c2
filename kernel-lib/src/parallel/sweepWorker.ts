/**
 * Worker-thread entry of the parallel sweep (loaded from kernel-lib/dist by sweepOnWorkers.ts):
 * builds the fluid from its definition once, then evaluates each job's range of points with the
 * same engine as the single-thread sweep (sweep/runSweep.ts) and sends the arrays back.
 */
import { parentPort } from "node:worker_threads";
import { defineFluid, type Fluid } from "../fluid/defineFluid.js";
import { allocateColumns, evaluateSweepRange, planSweep } from "../sweep/runSweep.js";
import type { SweepPointError } from "../sweep/types.js";
import type { FromWorker, ToWorker } from "./messages.js";

let fluid: Fluid | undefined;

function post(message: FromWorker, transfer: ArrayBuffer[] = []): void {
  parentPort!.postMessage(message, transfer);
}

parentPort?.on("message", (message: ToWorker) => {
  try {
    if (message.type === "init") {
      fluid = defineFluid(message.spec);
      return;
    }
    if (fluid === undefined) throw new Error("sweep worker: job before init");
    const { request, start, end, chunk } = message;
    const plan = planSweep(request, fluid.componentIds.length);
    const columns = allocateColumns(plan, end - start);
    const errors: SweepPointError[] = [];
    const failed = evaluateSweepRange(
      { binding: fluid, constants: fluid.components },
      plan,
      start,
      end,
      columns,
      errors,
      (done) => post({ type: "progress", done }),
      chunk,
    );
    post(
      {
        type: "done",
        start,
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
  } catch (e) {
    post({ type: "fail", message: e instanceof Error ? e.message : String(e) });
  }
});
