/**
 * Sweeps on all cores (Node side): a sweep above a size threshold is split into ranges of
 * points handed out on demand (a worker that finishes one takes the next, so a slower or busier
 * core takes fewer) to worker threads of a persistent pool (workerPool.ts: started once per
 * process, the fluid defined once per worker and kept by the key of its definition). Each
 * worker runs the same engine as the single-thread sweep and writes its range in place into the
 * result arrays, which live on SharedArrayBuffers (no copy or transfer on the main thread), so
 * the arrays are equal to those of fluid.sweep exactly. With precision "fast" on a
 * grid the ranges start at row starts (the fast route starts each point from the previous points
 * of its temperature row). Progress goes through progress/; an AbortSignal terminates the
 * sweep's workers at once (the pool replaces them in the next sweep) and rejects with the
 * signal's reason. The workers run the built JavaScript of kernel-lib/dist (`npm run build`),
 * bundled into one file by the build so that a worker starts by loading one file;
 * startSweepWorkers starts them ahead of need (optionally warming their code up).
 */
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { InputError, IsochorError, type ResultWarning } from "../errors.js";
import type { Fluid, FluidSpec } from "../fluid/defineFluid.js";
import { planSweep, runSweep, sweepResult, type SweepPlan } from "../sweep/runSweep.js";
import {
  MAX_ERROR_MESSAGES,
  type SweepPointError,
  type SweepRequest,
  type SweepResult,
} from "../sweep/types.js";
import { startProgress, type ProgressOptions, type ProgressTracker } from "../progress/progress.js";
import type { FromWorker, SharedColumns } from "./messages.js";
import { specKey } from "./specKey.js";
import {
  defineIn,
  discardWorker,
  forget,
  prestartWorkers,
  returnWorker,
  send,
  takeWorkers,
} from "./workerPool.js";

export { closeSweepWorkers, sweepWorkerStats, type SweepWorkerStats } from "./workerPool.js";

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
  /**
   * Points per range handed to a worker at a time (on demand), all ranges alike. Default:
   * decreasing ranges (guided self-scheduling), each a quarter of the points left per worker,
   * down to 1/256 of the points per worker and at least 64, so the first ranges are large and
   * the last ones small (the workers finish together). With precision "fast" on a grid, ranges
   * are rounded to whole rows.
   */
  rangeSize?: number;
  /**
   * The worker's built script. Default: dist/parallel/sweepWorker.bundle.js of this package (the
   * build's one-file bundle), or dist/parallel/sweepWorker.js when there is no current bundle.
   */
  workerScript?: string;
}

const WORKER_FILE = "sweepWorker.js";
/** The same entry bundled into one file by the build (kernel-lib/bundleWorker.js). */
const WORKER_BUNDLE = "sweepWorker.bundle.js";

let nextSweepId = 1;

/**
 * The worker script in a folder of built files: the bundle when it is there and not older than
 * the entry (a tsc-only build after it leaves it stale), else the entry, else undefined.
 */
export function workerScriptIn(dir: string): string | undefined {
  const entry = path.join(dir, WORKER_FILE);
  const bundle = path.join(dir, WORKER_BUNDLE);
  const entryStat = fs.statSync(entry, { throwIfNoEntry: false });
  const bundleStat = fs.statSync(bundle, { throwIfNoEntry: false });
  if (
    bundleStat !== undefined &&
    (entryStat === undefined || bundleStat.mtimeMs >= entryStat.mtimeMs)
  ) {
    return bundle;
  }
  return entryStat !== undefined ? entry : undefined;
}

/**
 * The built worker script: beside this file when it runs from dist, else kernel-lib/dist; the
 * one-file bundle of the build (one file to load: a worker starts faster) when it is current.
 */
export function defaultWorkerScript(): string {
  const candidates = [
    __dirname,
    path.resolve(__dirname, "..", "..", "dist", "parallel"),
    path.resolve(process.cwd(), "kernel-lib", "dist", "parallel"),
  ];
  for (const dir of candidates) {
    const script = workerScriptIn(dir);
    if (script !== undefined) return script;
  }
  throw new IsochorError(
    "runner-failed",
    `the sweep worker script was not found (looked for ${WORKER_BUNDLE} or ${WORKER_FILE} in ${candidates.join(", ")}): run \`npm run build\` first, or pass options.workerScript`,
  );
}

/** Options of {@link startSweepWorkers}. */
export interface StartSweepWorkersOptions {
  /** Worker threads to have ready. Default: the number of cores (os.availableParallelism). */
  workers?: number;
  /** Fluids to define in every worker ahead of their sweeps (those with plain-data definitions). */
  fluids?: readonly Fluid[];
  /** The worker's built script. Default: {@link defaultWorkerScript}. */
  workerScript?: string;
  /**
   * A sweep to run the first `points` points of (default 20,000) in every worker, results
   * dropped, so that the code it takes is compiled before the first real sweep (a cold worker
   * spends about as long again compiling as loading). Its fluid is defined in the workers too.
   */
  warmUp?: { fluid: Fluid; request: SweepRequest; points?: number };
}

/** The `workers` option: an integer >= 1 (InputError otherwise). */
function checkWorkers(workers: number): void {
  if (!(Number.isInteger(workers) && workers >= 1)) {
    throw new InputError({
      input: "options.workers",
      unit: "-",
      validRange: "an integer >= 1",
      received: workers,
    });
  }
}

/**
 * Starts the sweep pool's worker threads ahead of need (and defines `fluids` in them), so that
 * the first parallel sweep finds them loaded instead of waiting for each to start (a worker
 * costs about a tenth of a second of one core to start). The workers are idle and unref()ed from
 * the start: they never keep Node alive, and a process that never sweeps simply exits. Workers
 * already idle in the pool count. Returns the number of workers ready or starting.
 *
 * @example
 * ```ts
 * startSweepWorkers({ fluids: [gas] }); // early in a notebook: the threads load meanwhile
 * // ... later cells ...
 * const r = await sweepOnWorkers(gas, request);
 * ```
 * @throws InputError for a workers option that is not an integer >= 1.
 */
export function startSweepWorkers(options: StartSweepWorkersOptions = {}): number {
  const workers = options.workers ?? cores();
  checkWorkers(workers);
  const warmUp = options.warmUp;
  const warmPlan =
    warmUp === undefined ? undefined : planSweep(warmUp.request, warmUp.fluid.componentIds.length);
  const points = warmUp?.points ?? 20_000;
  if (!(Number.isInteger(points) && points >= 1)) {
    throw new InputError({
      input: "options.warmUp.points",
      unit: "points",
      validRange: "an integer >= 1",
      received: points,
    });
  }
  const ready = prestartWorkers(options.workerScript ?? defaultWorkerScript(), workers);
  for (const fluid of options.fluids ?? []) {
    const key = specKey(fluid.spec);
    if (key === undefined || !transferableSpec(fluid.spec)) continue;
    for (const w of ready) defineIn(w, key, fluid.spec);
  }
  const warmKey = warmUp === undefined ? undefined : specKey(warmUp.fluid.spec);
  if (
    warmUp !== undefined &&
    warmPlan !== undefined &&
    warmKey !== undefined &&
    transferableSpec(warmUp.fluid.spec)
  ) {
    const end = Math.min(points, warmPlan.count);
    for (const w of ready) {
      // the worker answers "done" (or "fail") to no one: the sweep id is this warm-up's own
      const id = nextSweepId++;
      defineIn(w, warmKey, warmUp.fluid.spec);
      const columns = sharedColumns(warmPlan, end);
      send(w, { type: "sweep", id, key: warmKey, request: warmUp.request, columns, chunk: 0 });
      send(w, { type: "range", id, start: 0, end });
      send(w, { type: "end", id });
    }
  }
  return ready.length;
}

function cores(): number {
  return typeof os.availableParallelism === "function"
    ? os.availableParallelism()
    : os.cpus().length;
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
 * Range boundaries [0, b1, ..., count]: about `size` points each, multiples of `align` (the
 * row length for a fast grid, else 1) except the last.
 */
export function rangeBounds(count: number, size: number, align: number): number[] {
  const step = Math.max(align, Math.round(size / align) * align);
  const bounds = [0];
  for (let b = step; b < count; b += step) bounds.push(b);
  bounds.push(count);
  return bounds;
}

/**
 * Guided self-scheduling (Polychronopoulos and Kuck, 1987, IEEE Trans. Computers 36(12),
 * 1425-1439, with a quarter instead of all of the share left): range boundaries of `count`
 * points for `workers` workers, each range max(minSize, ceil(left / (4 workers))) points,
 * multiples of `align` except the last.
 */
export function guidedBounds(
  count: number,
  workers: number,
  minSize: number,
  align: number,
): number[] {
  const bounds = [0];
  let b = 0;
  while (b < count) {
    const size = Math.max(minSize, Math.ceil((count - b) / (4 * workers)));
    b = Math.min(count, b + Math.max(align, Math.round(size / align) * align));
    bounds.push(b);
  }
  if (count === 0) bounds.push(0);
  return bounds;
}

/**
 * Runs `request` on `fluid` across worker threads and resolves with the same result as
 * `fluid.sweep(request)`. The workers stay in a pool for later sweeps (idle workers do not keep
 * Node alive; {@link closeSweepWorkers} ends them). The result's typed arrays are views of
 * SharedArrayBuffers (the workers wrote them in place): they read and write like any typed
 * array, but a structuredClone or postMessage of one shares its memory instead of copying it.
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
  const workers = options.workers ?? cores();
  checkWorkers(workers);
  const chunk = options.chunk ?? 2000;
  if (!(Number.isInteger(chunk) && chunk >= 1)) {
    throw new InputError({
      input: "options.chunk",
      unit: "points",
      validRange: "an integer >= 1",
      received: chunk,
    });
  }
  const rangeSize = options.rangeSize;
  if (rangeSize !== undefined && !(Number.isInteger(rangeSize) && rangeSize >= 1)) {
    throw new InputError({
      input: "options.rangeSize",
      unit: "points",
      validRange: "an integer >= 1",
      received: rangeSize,
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
  // the fast route starts each point from the previous points of its row: ranges of whole rows
  const align =
    plan.precision === "fast" && plan.layout === "grid" ? Math.max(1, plan.secondAxis.length) : 1;
  const bounds =
    rangeSize !== undefined
      ? rangeBounds(plan.count, rangeSize, align)
      : guidedBounds(
          plan.count,
          workers,
          Math.max(64, Math.ceil(plan.count / (256 * workers))),
          align,
        );
  const ranges = bounds.length - 1;
  const n = Math.min(workers, ranges);
  const columns = sharedColumns(plan);
  const errors: SweepPointError[] = [];
  let failed = 0;
  const id = nextSweepId++;
  // a definition with no canonical key is sent with this sweep and forgotten after it
  const canonicalKey = specKey(fluid.spec);
  const key = canonicalKey ?? `sweep-${id}`;
  const taken = takeWorkers(script, n, key);
  try {
    await new Promise<void>((resolve, reject) => {
      let next = 0;
      let completed = 0;
      let settled = false;
      const inFlight = new Float64Array(n);
      // held[k]: worker k still belongs to this sweep; working[k]: it has a range in flight
      const held = new Uint8Array(n).fill(1);
      const working = new Uint8Array(n);
      const release = (k: number) => {
        if (held[k] === 0) return;
        held[k] = 0;
        working[k] = 0;
        const w = taken[k];
        if (w.alive) {
          if (canonicalKey === undefined) forget(w, key);
          send(w, { type: "end", id });
        }
        returnWorker(w);
      };
      const stop = (error: unknown) => {
        if (settled) return;
        settled = true;
        signal?.removeEventListener("abort", onAbort);
        // a worker with a range in flight cannot be interrupted otherwise: it is terminated,
        // and the pool starts a new one for a later sweep
        for (let k = 0; k < n; k++) {
          if (held[k] === 1 && working[k] === 1) {
            held[k] = 0;
            void discardWorker(taken[k]);
          } else release(k);
        }
        reject(error);
      };
      const onAbort = () => stop(abortReason(signal!));
      signal?.addEventListener("abort", onAbort, { once: true });
      const handOut = (k: number) => {
        if (next < ranges) {
          working[k] = 1;
          send(taken[k], { type: "range", id, start: bounds[next], end: bounds[next + 1] });
          next++;
        } else release(k);
      };
      const onMessage = (k: number, m: FromWorker) => {
        if (settled) return;
        // a failed definition (id -1) fails the sweep that sent it
        if (m.type === "fail") {
          if (m.id === id || m.id === -1) {
            stop(new IsochorError("runner-failed", `sweep worker ${k + 1} of ${n}: ${m.message}`));
          }
          return;
        }
        if (m.id !== id) return;
        if (m.type === "progress") {
          inFlight[k] = m.done;
          let total = completed;
          for (let q = 0; q < n; q++) total += inFlight[q];
          progress?.set(total);
          return;
        }
        // pairs with the worker's Atomics.add after its writes: they are visible from here on
        Atomics.load(columns.written, 0);
        failed += m.failed;
        // ranges come back in any order: keep every message, the first by index are kept below
        for (const e of m.errors) errors.push(e);
        if (errors.length > 4 * MAX_ERROR_MESSAGES) firstErrors(errors);
        completed += m.end - m.start;
        inFlight[k] = 0;
        working[k] = 0;
        if (completed === plan.count) {
          settled = true;
          signal?.removeEventListener("abort", onAbort);
          for (let q = 0; q < n; q++) release(q);
          resolve();
          return;
        }
        handOut(k);
      };
      taken.forEach((w, k) => {
        w.onDeath = (e) => {
          working[k] = 0;
          stop(new IsochorError("runner-failed", `sweep worker ${k + 1} of ${n}: ${e.message}`));
        };
        w.onMessage = (m) => onMessage(k, m);
      });
      try {
        for (const w of taken) {
          defineIn(w, key, fluid.spec);
          send(w, {
            type: "sweep",
            id,
            key,
            request,
            columns,
            chunk: progress === undefined ? 0 : chunk,
          });
        }
        for (let k = 0; k < n; k++) handOut(k);
      } catch (e) {
        // e.g. a request option that cannot be cloned to a thread: the workers go back
        stop(e);
      }
    });
  } catch (e) {
    progress?.fail(e);
    throw e;
  }
  progress?.set(plan.count);
  progress?.finish();
  firstErrors(errors);
  return sweepResult(sweepFluid, plan, columns, errors, failed);
}

/** Keeps the first MAX_ERROR_MESSAGES messages by point index (as the single-thread sweep). */
function firstErrors(errors: SweepPointError[]): void {
  errors.sort((p, q) => p.index - q.index);
  errors.length = Math.min(errors.length, MAX_ERROR_MESSAGES);
}

/**
 * The result arrays on SharedArrayBuffers (the workers write their ranges in place; the arrays
 * read and write as any typed array, and a structuredClone of one shares its memory).
 */
function sharedColumns(plan: SweepPlan, n = plan.count): SharedColumns {
  return {
    values: plan.properties.map(() => new Float64Array(new SharedArrayBuffer(8 * n))),
    phaseCount: new Uint8Array(new SharedArrayBuffer(n)),
    phaseKind: new Uint8Array(new SharedArrayBuffer(n)),
    errorCode: new Uint8Array(new SharedArrayBuffer(n)),
    written: new Int32Array(new SharedArrayBuffer(4)),
  };
}
