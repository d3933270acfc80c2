/**
 * `npm run bench:scaling [-- --rounds N] [--cold]`: the scaling of the parallel sweep from one
 * worker to all cores, measured the way a notebook user meets repeated sweeps. The sweep is that
 * of the `sweep-1e6-mix10` case (h, s and rho of the ten-component gas at 1e6 (T, P) points). In
 * one process: the pool is warmed by one sweep on all cores, then each round runs the sweep on 1
 * worker and on all cores, in alternating order (swapped every round), so both see the same
 * machine load within seconds of each other. With `--cold` the pool's workers are ended after
 * every sweep (each sweep starts its workers, loads the library and defines the fluid).
 *
 * A control runs beside it in every round: the same amount of plain arithmetic (a loop of
 * multiply-adds, sized to take as long as one sweep on one worker) on 1 thread and split over all
 * cores, on threads started once. Its scaling is what the machine gave a process at that moment:
 * with other work running, Linux's autogroup scheduling (sched_autogroup_enabled) shares the
 * cores between sessions, not threads, so a second thread may add little; the sweep's scaling
 * over the control's says how much of what was available the sweep used.
 *
 * On Linux the time each thread of the process spent on a CPU and waiting for one is read from
 * /proc/self/task/<tid>/schedstat around every sweep: the longest on-CPU time of one thread is
 * the sweep's critical path, what its wall time would be if no other work waited for the cores.
 * `onCpuScaling` is the median per round of the 1-worker critical path over the all-cores one:
 * the scaling the code reaches on an idle machine, apart from the slowing of a core by work on
 * the other (shared caches, memory bandwidth), which this does not see.
 *
 * Prints one JSON line per sweep (workers, wall and CPU seconds, 1-minute load average) and a
 * summary line: per worker count the median wall and CPU seconds, states per second per core
 * (1e6 / CPU seconds: the CPU time counts every thread of the process), the scaling (median of
 * the per-round ratios wall(1) / wall(all)) and the fraction of linear (scaling / cores), with
 * the load before and after. On a shared machine the load says how much of the cores the sweep
 * could have had. The workers run kernel-lib/dist (`npm run build` first).
 */
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { performance } from "node:perf_hooks";
import { Worker } from "node:worker_threads";
import { defineFluid } from "../src/fluid/defineFluid.js";
import {
  closeSweepWorkers,
  sweepOnWorkers,
  workerScriptIn,
} from "../src/parallel/sweepOnWorkers.js";
import type { SweepRequest } from "../src/sweep/types.js";
import { median } from "./harness.js";
import { TEN, X10 } from "./cases/richGas.js";

const request: SweepRequest = {
  specification: "TP",
  first: { from: 340.25, to: 600.25, count: 1000 },
  second: { from: 1e6, to: 10e6, count: 1000 },
  x: X10,
  phaseCheck: "none",
  properties: ["h", "s", "rho"],
};

function cpuSeconds(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
}

const round3 = (v: number) => Math.round(v * 1000) / 1000;

// the control's thread: runs `n` multiply-adds per message and answers with the result
const CONTROL_SOURCE = `
const { parentPort } = require("node:worker_threads");
parentPort.on("message", (n) => {
  let x = 0.5;
  for (let i = 0; i < n; i++) x = x * 0.999999 + 1e-7;
  parentPort.postMessage(x);
});`;

/** Per thread of this process: ns on a CPU and ns waiting for one (Linux), else undefined. */
function threadTimes(): Map<string, [number, number]> | undefined {
  const dir = "/proc/self/task";
  if (!fs.existsSync(dir)) return undefined;
  const times = new Map<string, [number, number]>();
  for (const tid of fs.readdirSync(dir)) {
    try {
      const [run, wait] = fs.readFileSync(`${dir}/${tid}/schedstat`, "utf8").split(" ").map(Number);
      times.set(tid, [run, wait]);
    } catch {
      // a thread that ended meanwhile
    }
  }
  return times;
}

/** The longest on-CPU time of one thread between two readings (s), and the summed waiting (s). */
function criticalPath(
  before: Map<string, [number, number]> | undefined,
  after: Map<string, [number, number]> | undefined,
): { run: number; wait: number } | undefined {
  if (before === undefined || after === undefined) return undefined;
  let run = 0;
  let wait = 0;
  for (const [tid, [r1, w1]] of after) {
    const [r0, w0] = before.get(tid) ?? [0, 0];
    run = Math.max(run, (r1 - r0) / 1e9);
    wait += (w1 - w0) / 1e9;
  }
  return { run, wait };
}

/** Threads for the control, started once; run(k, n) splits n iterations over k of them. */
function controlThreads(count: number) {
  const threads = Array.from({ length: count }, () => new Worker(CONTROL_SOURCE, { eval: true }));
  const once = (w: Worker, n: number) =>
    new Promise<number>((resolve) => {
      w.once("message", resolve);
      w.postMessage(n);
    });
  return {
    async run(k: number, n: number): Promise<number> {
      const t0 = performance.now();
      await Promise.all(threads.slice(0, k).map((w) => once(w, Math.round(n / k))));
      return (performance.now() - t0) / 1000;
    },
    close: () => Promise.all(threads.map((w) => w.terminate())),
  };
}

async function main(): Promise<void> {
  const argv = process.argv.slice(2);
  const at = argv.indexOf("--rounds");
  const rounds = at >= 0 ? Number(argv[at + 1]) : 6;
  if (!(Number.isInteger(rounds) && rounds >= 1))
    throw new Error("--rounds expects an integer >= 1");
  const cold = argv.includes("--cold");
  const dir = path.resolve(process.cwd(), "kernel-lib", "dist", "parallel");
  const script = workerScriptIn(dir);
  if (script === undefined) throw new Error(`no worker in ${dir}: run \`npm run build\` first`);
  const cores = os.availableParallelism();
  const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
  const loadBefore = os.loadavg().map(round3);
  const sweep = async (workers: number) => {
    const s0 = threadTimes();
    const c0 = cpuSeconds();
    const t0 = performance.now();
    const r = await sweepOnWorkers(fluid, request, {
      workers,
      threshold: 1,
      progress: false,
      workerScript: script,
    });
    const wall = (performance.now() - t0) / 1000;
    const cpu = cpuSeconds() - c0;
    const crit = criticalPath(s0, threadTimes());
    if (r.failed !== 0) throw new Error(`${r.failed} points failed`);
    if (cold) await closeSweepWorkers();
    return { wall, cpu, count: r.count, runMax: crit?.run ?? NaN, wait: crit?.wait ?? NaN };
  };
  // the warm-up: one sweep on all cores (starts the pool, defines the fluid, compiles the code)
  const warm = await sweep(cores);
  process.stdout.write(JSON.stringify({ warmUp: true, workers: cores, ...warm }) + "\n");
  const counts = [1, cores];
  // the control, sized in each round to take as long on one thread as that round's sweep on
  // one worker (from the rate of a probe run)
  const control = controlThreads(cores);
  await control.run(cores, 2e7);
  const probe = await control.run(1, 2e7);
  const controlRatios: number[] = [];
  const runs = new Map<number, { wall: number; cpu: number }[]>(counts.map((n) => [n, []]));
  const onCpuRatios: number[] = [];
  const ratios: number[] = [];
  for (let round = 0; round < rounds; round++) {
    const order = round % 2 === 0 ? counts : [...counts].reverse();
    const wallOf = new Map<number, number>();
    const runMaxOf = new Map<number, number>();
    for (const n of order) {
      const t = await sweep(n);
      runs.get(n)!.push(t);
      wallOf.set(n, t.wall);
      runMaxOf.set(n, t.runMax);
      process.stdout.write(
        JSON.stringify({
          round,
          workers: n,
          wallSeconds: round3(t.wall),
          cpuSeconds: round3(t.cpu),
          onCpuCriticalSeconds: round3(t.runMax),
          waitSeconds: round3(t.wait),
          loadAverage1m: round3(os.loadavg()[0]),
        }) + "\n",
      );
    }
    ratios.push(wallOf.get(1)! / wallOf.get(cores)!);
    onCpuRatios.push(runMaxOf.get(1)! / runMaxOf.get(cores)!);
    const c = [0, 0];
    const iterations = Math.round((2e7 * wallOf.get(1)!) / Math.max(probe, 1e-3));
    for (const n of order) c[n === 1 ? 0 : 1] = await control.run(n, iterations);
    controlRatios.push(c[0] / c[1]);
    process.stdout.write(
      JSON.stringify({
        round,
        control: true,
        wallSeconds1: round3(c[0]),
        wallSecondsAll: round3(c[1]),
        loadAverage1m: round3(os.loadavg()[0]),
      }) + "\n",
    );
  }
  const count = warm.count;
  const perWorkers = counts.map((n) => {
    const ts = runs.get(n)!;
    const cpu = median(ts.map((t) => t.cpu));
    return {
      workers: n,
      wallSeconds: round3(median(ts.map((t) => t.wall))),
      cpuSeconds: round3(cpu),
      statesPerSecondPerCore: Math.round(count / cpu),
    };
  });
  const scaling = median(ratios);
  process.stdout.write(
    JSON.stringify({
      summary: cold ? "cold (workers started per sweep)" : "warm pool",
      states: count,
      cores,
      rounds,
      perWorkers,
      scaling: round3(scaling),
      scalingSpread: [round3(Math.min(...ratios)), round3(Math.max(...ratios))],
      fractionOfLinear: round3(scaling / cores),
      controlScaling: round3(median(controlRatios)),
      controlSpread: [round3(Math.min(...controlRatios)), round3(Math.max(...controlRatios))],
      overControl: round3(median(ratios.map((r, i) => r / controlRatios[i]))),
      onCpuScaling: round3(median(onCpuRatios)),
      onCpuSpread: [round3(Math.min(...onCpuRatios)), round3(Math.max(...onCpuRatios))],
      onCpuFractionOfLinear: round3(median(onCpuRatios) / cores),
      loadAverageBefore: loadBefore,
      loadAverageAfter: os.loadavg().map(round3),
    }) + "\n",
  );
  await closeSweepWorkers();
  await control.close();
}

main().catch((e) => {
  process.stderr.write(`${e instanceof Error ? e.stack : String(e)}\n`);
  process.exit(1);
});
