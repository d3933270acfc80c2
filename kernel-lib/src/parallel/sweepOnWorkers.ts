/**
 * Sweeps on all cores (Node side): a sweep above a size threshold is split into contiguous
 * ranges of points, one per worker thread (node:worker_threads); each worker builds the fluid
 * from its definition once (fluid.spec) and runs the same engine as the single-thread sweep, so
 * the arrays are equal to those of fluid.sweep exactly. Progress goes through progress/, and an
 * AbortSignal stops the workers (terminated at once) and rejects with the signal's reason.
 * The workers run the built JavaScript of kernel-lib/dist (`npm run build`).
 */
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { Worker } from "node:worker_threads";
import { InputError, IsochorError, type ResultWarning } from "../errors.js";
import type { Fluid, FluidSpec } from "../fluid/defineFluid.js";
import {
  allocateColumns,
  planSweep,
  runSweep,
  sweepResult,
  type SweepColumns,
} from "../sweep/runSweep.js";
import {
  MAX_ERROR_MESSAGES,
  type SweepPointError,
  type SweepRequest,
  type SweepResult,
} from "../sweep/types.js";
import { startProgress, type ProgressOptions, type ProgressTracker } from "../progress/progress.js";
import type { FromWorker, ToWorker } from "./messages.js";

/** Options of {@link sweepOnWorkers}. */
export interface ParallelSweepOptions {
  /** Worker threads. Default: the number of cores (os.availableParallelism). */
  workers?: number;
  /**
   * Sweeps with fewer points run in this thread (starting a worker costs tens of ms).
   * Default 20,000 points.
   */
  threshold?: number;
  /** Stops the sweep: the workers are terminated and the promise rejects with the reason. */
  signal?: AbortSignal;
  /** Progress display (progress/): its options, or false for none. Default: label "sweep", unit "states". */
  progress?: ProgressOptions | false;
  /** Points between progress messages of a worker. Default 2,000. */
  chunk?: number;
  /** The worker's built script. Default: dist/parallel/sweepWorker.js of this package. */
  workerScript?: string;
}

const WORKER_FILE = "sweepWorker.js";

/** The built worker script: beside this file when it runs from dist, else kernel-lib/dist. */
export function defaultWorkerScript(): string {
  const candidates = [
    path.join(__dirname, WORKER_FILE),
    path.resolve(__dirname, "..", "..", "dist", "parallel", WORKER_FILE),
    path.resolve(process.cwd(), "kernel-lib", "dist", "parallel", WORKER_FILE),
  ];
  for (const c of candidates) if (fs.existsSync(c)) return c;
  throw new IsochorError(
    "runner-failed",
    `the sweep worker script was not found (looked at ${candidates.join(", ")}): run \`npm run build\` first, or pass options.workerScript`,
  );
}

/** Whether a fluid's definition can be sent to a worker (plain data, built-in model). */
function transferableSpec(spec: FluidSpec): boolean {
  if (spec.model !== undefined && typeof spec.model !== "string") return false;
  if (spec.idealGas !== undefined && typeof spec.idealGas !== "string") return false;
  try {
    structuredClone(spec);
    return true;
  } catch {
    return false;
  }
}

function abortReason(signal: AbortSignal): unknown {
  return signal.reason ?? new Error("the sweep was aborted");
}

/**
 * Runs `request` on `fluid` across worker threads and resolves with the same result as
 * `fluid.sweep(request)`.
 *
 * @example
 * ```ts
 * const controller = new AbortController();
 * const r = await sweepOnWorkers(gas, { specification: "TP", first: Ts, second: Ps, x,
 *   properties: ["h", "s", "rho"], phaseCheck: "none" }, { signal: controller.signal });
 * ```
 * @throws InputError for a malformed request or options (before any work).
 */
export async function sweepOnWorkers(
  fluid: Fluid,
  request: SweepRequest,
  options: ParallelSweepOptions = {},
): Promise<SweepResult> {
  const plan = planSweep(request, fluid.componentIds.length);
  const threshold = options.threshold ?? 20_000;
  const cores =
    typeof os.availableParallelism === "function" ? os.availableParallelism() : os.cpus().length;
  const workers = options.workers ?? cores;
  if (!(Number.isInteger(workers) && workers >= 1)) {
    throw new InputError({
      input: "options.workers",
      unit: "-",
      validRange: "an integer >= 1",
      received: workers,
    });
  }
  const chunk = options.chunk ?? 2000;
  if (!(Number.isInteger(chunk) && chunk >= 1)) {
    throw new InputError({
      input: "options.chunk",
      unit: "points",
      validRange: "an integer >= 1",
      received: chunk,
    });
  }
  const signal = options.signal;
  if (signal?.aborted) throw abortReason(signal);
  const sweepFluid = { binding: fluid, constants: fluid.components };
  const progress: ProgressTracker | undefined =
    options.progress === false
      ? undefined
      : startProgress({ label: "sweep", unit: "states", ...options.progress, total: plan.count });
  const warnings: ResultWarning[] = [];
  if (plan.count < threshold || !transferableSpec(fluid.spec)) {
    if (plan.count >= threshold) {
      warnings.push({
        code: "model-limitation",
        message:
          "the fluid's definition holds objects that cannot be sent to a worker thread (a user's model or ideal gas): the sweep ran in this thread",
      });
    }
    const r = runSweep(sweepFluid, request);
    progress?.set(plan.count);
    progress?.finish();
    return warnings.length === 0 ? r : { ...r, warnings: r.warnings.concat(warnings) };
  }
  const script = options.workerScript ?? defaultWorkerScript();
  const n = Math.min(workers, plan.count);
  const columns = allocateColumns(plan, plan.count);
  const errors: SweepPointError[] = [];
  let failed = 0;
  const pool: Worker[] = [];
  const doneBy = new Float64Array(n);
  // a worker whose job is done is terminated, which exits it with code 1: not a failure
  const jobDone = new Uint8Array(n);
  try {
    await new Promise<void>((resolve, reject) => {
      let finished = 0;
      let settled = false;
      const stop = (error: unknown) => {
        if (settled) return;
        settled = true;
        for (const w of pool) void w.terminate();
        reject(error);
      };
      const onAbort = () => stop(abortReason(signal!));
      signal?.addEventListener("abort", onAbort, { once: true });
      for (let k = 0; k < n; k++) {
        const start = Math.floor((plan.count * k) / n);
        const end = Math.floor((plan.count * (k + 1)) / n);
        const w = new Worker(script);
        pool.push(w);
        w.on("message", (m: FromWorker) => {
          if (settled) return;
          if (m.type === "progress") {
            doneBy[k] = m.done;
            let total = 0;
            for (let q = 0; q < n; q++) total += doneBy[q];
            progress?.set(total);
          } else if (m.type === "fail") {
            stop(new IsochorError("runner-failed", `sweep worker ${k + 1} of ${n}: ${m.message}`));
          } else {
            jobDone[k] = 1;
            copyInto(columns, m, m.start);
            failed += m.failed;
            errors.push(...m.errors);
            void w.terminate();
            if (++finished === n) {
              settled = true;
              signal?.removeEventListener("abort", onAbort);
              resolve();
            }
          }
        });
        w.on("error", (e) => stop(e));
        w.on("exit", (code) => {
          if (!settled && jobDone[k] === 0) {
            stop(new IsochorError("runner-failed", `sweep worker ${k + 1} exited with ${code}`));
          }
        });
        w.postMessage({ type: "init", spec: fluid.spec } satisfies ToWorker);
        w.postMessage({ type: "job", request, start, end, chunk } satisfies ToWorker);
      }
    });
  } catch (e) {
    progress?.fail(e);
    throw e;
  }
  progress?.set(plan.count);
  progress?.finish();
  errors.sort((p, q) => p.index - q.index);
  errors.length = Math.min(errors.length, MAX_ERROR_MESSAGES);
  return sweepResult(sweepFluid, plan, columns, errors, failed);
}

function copyInto(columns: SweepColumns, m: Extract<FromWorker, { type: "done" }>, at: number) {
  for (let k = 0; k < columns.values.length; k++) columns.values[k].set(m.values[k], at);
  columns.phaseCount.set(m.phaseCount, at);
  columns.phaseKind.set(m.phaseKind, at);
  columns.errorCode.set(m.errorCode, at);
}
