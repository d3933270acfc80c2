/**
 * The persistent pool of sweep worker threads (Node side). Starting a worker costs loading the
 * library and compiling the sweep's code again (about a third of a one-million-state sweep of a
 * ten-component gas on one core), so workers are started once per process and reused by later
 * sweeps:
 *  - a worker is taken by one sweep at a time and returned idle afterwards; an idle worker is
 *    `unref()`ed, so an idle pool never keeps Node alive, and `ref()`ed again while it works;
 *  - the fluids it was sent stay defined in it under their key (specKey.ts), the last
 *    {@link MAX_FLUIDS_PER_WORKER} of them (the pool mirrors the worker's cache and says which to
 *    forget), so a repeated sweep of the same fluid sends no definition;
 *  - a worker that crashes, exits, or is terminated (cancellation) leaves the pool at once and the
 *    next sweep starts a new one in its place; idle workers beyond max(cores, the most any sweep
 *    asked for) are terminated when returned;
 *  - {@link closeSweepWorkers} terminates them all (a later sweep starts new ones);
 *  - startSweepWorkers (sweepOnWorkers.ts) starts them ahead of need, idle and unref()ed.
 */
import * as os from "node:os";
import { Worker } from "node:worker_threads";
import { IsochorError } from "../errors.js";
import type { FluidSpec } from "../fluid/defineFluid.js";
import type { FromWorker, ToWorker } from "./messages.js";

/** Fluid definitions each worker keeps (least recently used dropped first). */
export const MAX_FLUIDS_PER_WORKER = 8;

/** One worker thread of the pool. */
export interface PoolWorker {
  readonly worker: Worker;
  readonly script: string;
  /** Keys of the fluids defined in the worker, least recently used first. */
  readonly keys: Map<string, true>;
  /** False once it crashed, exited or was terminated (it is then out of the pool). */
  alive: boolean;
  /** Taken by a sweep. */
  busy: boolean;
  /** The taking sweep's handlers. */
  onMessage?: (m: FromWorker) => void;
  onDeath?: (error: Error) => void;
}

const pools = new Map<string, Set<PoolWorker>>();
let keep = 0;
let started = 0;
let definitions = 0;

function cores(): number {
  return typeof os.availableParallelism === "function"
    ? os.availableParallelism()
    : os.cpus().length;
}

function poolOf(script: string): Set<PoolWorker> {
  let pool = pools.get(script);
  if (pool === undefined) {
    pool = new Set();
    pools.set(script, pool);
  }
  return pool;
}

function leave(w: PoolWorker): void {
  w.alive = false;
  pools.get(w.script)?.delete(w);
}

function startWorker(script: string): PoolWorker {
  const worker = new Worker(script);
  started++;
  const w: PoolWorker = { worker, script, keys: new Map(), alive: true, busy: false };
  worker.on("message", (m: FromWorker) => w.onMessage?.(m));
  worker.on("error", (e) => {
    if (!w.alive) return;
    leave(w);
    w.onDeath?.(e instanceof Error ? e : new Error(String(e)));
  });
  worker.on("exit", (code) => {
    if (!w.alive) return;
    leave(w);
    w.onDeath?.(
      new IsochorError("runner-failed", `a sweep worker thread exited with code ${code}`),
    );
  });
  poolOf(script).add(w);
  return w;
}

/**
 * Takes `n` workers of `script` for one sweep: idle ones first (those that already hold the
 * fluid under `key` before others), then new ones. They are ref()ed while taken.
 */
export function takeWorkers(script: string, n: number, key: string): PoolWorker[] {
  keep = Math.max(keep, n);
  const idle = [...poolOf(script)].filter((w) => w.alive && !w.busy);
  idle.sort((a, b) => Number(b.keys.has(key)) - Number(a.keys.has(key)));
  const taken = idle.slice(0, n);
  while (taken.length < n) taken.push(startWorker(script));
  for (const w of taken) {
    w.busy = true;
    w.worker.ref();
  }
  return taken;
}

/**
 * Starts workers of `script` ahead of need until the pool holds `n` idle ones; they load the
 * script at once but stay idle and unref()ed (they never keep Node alive). Returns them.
 */
export function prestartWorkers(script: string, n: number): PoolWorker[] {
  keep = Math.max(keep, n);
  const idle = [...poolOf(script)].filter((w) => w.alive && !w.busy);
  while (idle.length < n) {
    const w = startWorker(script);
    w.worker.unref();
    idle.push(w);
  }
  return idle.slice(0, n);
}

/** Sends a message to a worker of the pool. */
export function send(w: PoolWorker, message: ToWorker): void {
  if (w.alive) w.worker.postMessage(message);
}

/** Makes sure the worker holds the fluid `spec` under `key` (sent once; least recently used forgotten). */
export function defineIn(w: PoolWorker, key: string, spec: FluidSpec): void {
  if (w.keys.has(key)) {
    w.keys.delete(key);
    w.keys.set(key, true);
    return;
  }
  send(w, { type: "define", key, spec });
  definitions++;
  w.keys.set(key, true);
  while (w.keys.size > MAX_FLUIDS_PER_WORKER) forget(w, w.keys.keys().next().value as string);
}

/** Tells the worker to drop the fluid kept under `key`. */
export function forget(w: PoolWorker, key: string): void {
  if (!w.keys.delete(key)) return;
  send(w, { type: "forget", key });
}

/** Gives a worker back to the pool after a sweep (idle, unref()ed; terminated beyond the limit). */
export function returnWorker(w: PoolWorker): void {
  w.onMessage = undefined;
  w.onDeath = undefined;
  if (!w.alive) return;
  w.busy = false;
  const idle = [...poolOf(w.script)].filter((q) => !q.busy).length;
  if (idle > Math.max(keep, cores())) {
    void discardWorker(w);
    return;
  }
  w.worker.unref();
}

/** Terminates a worker and takes it out of the pool (its exit is then not a crash). */
export function discardWorker(w: PoolWorker): Promise<number> {
  w.onMessage = undefined;
  w.onDeath = undefined;
  leave(w);
  return w.worker.terminate();
}

/**
 * Terminates every worker thread of the sweep pool (idle or busy: a running sweep then rejects).
 * A later sweep starts new workers. Not needed before Node exits (idle workers do not keep it
 * alive); useful to free their memory, or to start from cold workers (benchmarks).
 *
 * @example
 * ```ts
 * const r = await sweepOnWorkers(gas, request);
 * await closeSweepWorkers();
 * ```
 */
export async function closeSweepWorkers(): Promise<void> {
  const all = [...pools.values()].flatMap((p) => [...p]);
  await Promise.all(
    all.map((w) => {
      const onDeath = w.onDeath;
      const done = discardWorker(w);
      onDeath?.(
        new IsochorError("runner-failed", "the sweep workers were closed (closeSweepWorkers)"),
      );
      return done;
    }),
  );
  keep = 0;
}

/** What the pool holds now, and what it has done since the process started. */
export interface SweepWorkerStats {
  /** Worker threads alive in the pool. */
  readonly workers: number;
  /** Of those, taken by a running sweep. */
  readonly busy: number;
  /** Worker threads started since the process started. */
  readonly started: number;
  /** Fluid definitions sent to workers since the process started. */
  readonly definitions: number;
}

/** The pool's counts (e.g. to see that repeated sweeps reuse their workers and fluids). */
export function sweepWorkerStats(): SweepWorkerStats {
  const all = [...pools.values()].flatMap((p) => [...p]);
  return {
    workers: all.length,
    busy: all.filter((w) => w.busy).length,
    started,
    definitions,
  };
}
