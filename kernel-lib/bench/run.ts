/**
 * `npm run bench [-- [filter] [--processes N] [--samples N]]`: runs every case (or those whose name
 * contains `filter`) in N fresh Node processes (default 3; `--samples`: timed 20 ms batches per
 * process, default 41), round-robin over the cases so a change of machine load spreads over all of
 * them, and prints one JSON line per case:
 *   {"case", "secondsPerCall", "wallSecondsPerCall", "minSecondsPerCall", "targetSecondsPerCall",
 *    "meetsTarget", "loadAverage1m", "processes", "spreadMinSecondsPerCall",
 *    "spreadMaxSecondsPerCall", "perProcessSecondsPerCall", "samplesPerProcess", "unsettledProcesses"}
 * Each process warms the case up until batch times settle (harness.ts) and takes the median of its
 * samples (process CPU time); `secondsPerCall` is the median over processes of those per-process
 * medians, the spread fields are their minimum and maximum, `wallSecondsPerCall` the same median of
 * wall-clock medians, `minSecondsPerCall` the fastest single sample seen, `unsettledProcesses` how
 * many processes hit the warm-up cap, and `loadAverage1m` is read after the case's last process.
 * Several processes are needed because a fresh V8 process can settle into a faster or a slower
 * optimisation state for the same code and stay there; a wide spread says so.
 *
 * Then one line per ratio of a case to its baseline measured in the same run (numeric /
 * closed-form departures; a state with the ideal-gas correlations / the same state with a
 * constant-cp ideal gas): `value` is the ratio of the two `secondsPerCall`, the spread the minimum
 * and maximum of the ratios within one round. A last line gives the machine's load before and
 * after. Ratios carry over between machines and loads better than absolute times. Progress goes to
 * stderr.
 *
 * Internal: `--worker <case>` measures one case in this process and prints its timing as JSON.
 */
import * as os from "node:os";
import { spawnSync } from "node:child_process";
import { measure, measureAsync, consumed, median, type Timing } from "./harness.js";
import { allCases } from "./cases/index.js";

/** Case / baseline pairs reported as ratios (both must have run). */
const RATIOS: readonly {
  case: string;
  baseline: string;
  meaning: string;
  /** Which clock the ratio compares (default "cpu"; "wall" for work spread over threads). */
  clock?: "cpu" | "wall";
}[] = [
  {
    case: "departure-numeric",
    baseline: "departure-closed-form",
    meaning: "cost of integrating the pressure function instead of the closed-form alpha_r",
  },
  {
    case: "pr-pure-TP",
    baseline: "pr-pure-TP-residual-only",
    meaning: "cost of the state with the ideal-gas correlations over the engine alone",
  },
  {
    case: "stability-mix10-TP",
    baseline: "pr-mix10-TP",
    meaning: "cost of the tangent-plane stability test in single-phase states of the same gas",
  },
  {
    case: "pr-mix10-TP",
    baseline: "pr-mix10-TP-residual-only",
    meaning: "cost of the state with the ideal-gas correlations over the engine alone",
  },
  {
    case: "grid-residual-200x200-per-state",
    baseline: "grid-residual-200x200",
    meaning: "speed-up of fluid.sweep over one stateAtTP per point (residual h, s grid)",
  },
  {
    case: "surface-200x200",
    baseline: "surface-200x200-sweep",
    meaning: "speed-up of fluid.sweep over one stateAtTP per point (h, s surface)",
  },
  {
    case: "grid-residual-200x200-per-state",
    baseline: "grid-residual-200x200-fast",
    meaning:
      'speed-up of fluid.sweep precision "fast" over one stateAtTP per point (residual grid)',
  },
  {
    case: "grid-residual-200x200",
    baseline: "grid-residual-200x200-fast",
    meaning: 'precision "fast" over the exact route of fluid.sweep (residual h, s grid)',
  },
  {
    case: "surface-200x200",
    baseline: "surface-200x200-sweep-fast",
    meaning: 'speed-up of fluid.sweep precision "fast" over one stateAtTP per point (h, s surface)',
  },
  {
    case: "sweep-1e6-mix10-1worker",
    baseline: "sweep-1e6-mix10",
    meaning: "scaling from 1 worker to all cores (wall clock; ideal: the number of cores)",
    clock: "wall",
  },
  {
    case: "sweep-1e6-mix10-1worker-cold",
    baseline: "sweep-1e6-mix10-cold",
    meaning: "scaling from 1 worker to all cores, workers started per sweep (wall clock)",
    clock: "wall",
  },
  {
    case: "sampler-surface-200x200-pick",
    baseline: "sampler-surface-200x200",
    meaning: "speed-up of the chart sampler on the sweep path over one stateAtTP per point",
  },
  {
    case: "transport-mix10-TRho",
    baseline: "pr-mix10-TP",
    meaning: "cost of viscosity and conductivity (Chung) over the state of the same gas",
  },
];

const round3 = (v: number) => Math.round(v * 1000) / 1000;

interface Args {
  filter?: string;
  processes: number;
  samples: number;
  worker?: string;
}

function parseArgs(argv: readonly string[]): Args {
  const args: Args = { processes: 3, samples: 41 };
  const positiveInt = (flag: string, text: string | undefined): number => {
    const n = Number(text);
    if (!(Number.isInteger(n) && n >= 1)) {
      throw new Error(`${flag} expects a positive integer, received ${String(text)}`);
    }
    return n;
  };
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === "--") continue;
    const [flag, inline] = argv[i].startsWith("--") ? argv[i].split("=", 2) : [argv[i], undefined];
    const value = () => inline ?? argv[++i];
    if (flag === "--processes") args.processes = positiveInt(flag, value());
    else if (flag === "--samples") args.samples = positiveInt(flag, value());
    else if (flag === "--worker") args.worker = value();
    else if (flag.startsWith("--")) throw new Error(`unknown option ${flag}`);
    else args.filter = flag;
  }
  return args;
}

async function runWorker(name: string, samples: number): Promise<void> {
  const c = allCases.find((k) => k.name === name);
  if (!c) throw new Error(`no bench case named ${name}`);
  const timing = c.setupAsync
    ? await measureAsync(c.setupAsync(), { samples, ...c.measure })
    : measure(c.setup(), { samples, ...c.measure });
  process.stdout.write(JSON.stringify(timing) + "\n");
  void consumed();
}

/** Runs one case in a fresh process; returns its timing, or an error text. */
function runInFreshProcess(name: string, samples: number): Timing | string {
  const r = spawnSync(
    process.execPath,
    [process.argv[1], "--worker", name, "--samples", String(samples)],
    { encoding: "utf8", stdio: ["ignore", "pipe", "pipe"], maxBuffer: 1 << 20 },
  );
  if (r.status !== 0) {
    return `worker exited with ${r.status ?? r.signal}: ${(r.stderr || "").trim().slice(-500)}`;
  }
  try {
    return JSON.parse(r.stdout.trim().split("\n").pop() ?? "") as Timing;
  } catch {
    return `worker printed no timing: ${r.stdout.slice(-200)}`;
  }
}

function runAll(args: Args): void {
  const loadBefore = os.loadavg().map(round3);
  const cases = allCases.filter((c) => !args.filter || c.name.includes(args.filter));
  const timings = new Map<string, Timing[]>(cases.map((c) => [c.name, []]));
  const errors = new Map<string, string>();
  const loadAfterCase = new Map<string, number>();
  const started = Date.now();
  for (let round = 0; round < args.processes; round++) {
    for (const c of cases) {
      if (errors.has(c.name)) continue;
      const t = runInFreshProcess(c.name, args.samples);
      loadAfterCase.set(c.name, round3(os.loadavg()[0]));
      if (typeof t === "string") {
        errors.set(c.name, t);
        process.stderr.write(`  [${round + 1}/${args.processes}] ${c.name}: FAILED ${t}\n`);
        continue;
      }
      timings.get(c.name)!.push(t);
      process.stderr.write(
        `  [${round + 1}/${args.processes}] ${c.name}: ${(t.cpu * 1e6).toPrecision(4)} us per call` +
          ` (warm-up ${t.warmupSeconds.toFixed(2)} s${t.settled ? "" : ", not settled"};` +
          ` ${((Date.now() - started) / 1000).toFixed(0)} s elapsed)\n`,
      );
    }
  }
  const results = new Map<string, number>();
  for (const c of cases) {
    const error = errors.get(c.name);
    if (error !== undefined) {
      process.stdout.write(JSON.stringify({ case: c.name, error }) + "\n");
      continue;
    }
    const ts = timings.get(c.name)!;
    const perProcess = ts.map((t) => t.cpu);
    const secondsPerCall = median(perProcess);
    results.set(c.name, secondsPerCall);
    const meets = c.targetSeconds === undefined ? undefined : secondsPerCall <= c.targetSeconds;
    process.stdout.write(
      JSON.stringify({
        case: c.name,
        secondsPerCall,
        wallSecondsPerCall: median(ts.map((t) => t.wall)),
        minSecondsPerCall: Math.min(...ts.map((t) => t.cpuMin)),
        targetSecondsPerCall: c.targetSeconds ?? null,
        meetsTarget: meets ?? null,
        loadAverage1m: loadAfterCase.get(c.name),
        processes: ts.length,
        spreadMinSecondsPerCall: Math.min(...perProcess),
        spreadMaxSecondsPerCall: Math.max(...perProcess),
        perProcessSecondsPerCall: perProcess,
        samplesPerProcess: args.samples,
        unsettledProcesses: ts.filter((t) => !t.settled).length,
      }) + "\n",
    );
    const us = (v: number) => (v * 1e6).toPrecision(4);
    const target =
      c.targetSeconds === undefined
        ? ""
        : `, target ${us(c.targetSeconds)} us: ${meets ? "meets" : "MISSES"}`;
    process.stderr.write(
      `  ${c.name}: ${us(secondsPerCall)} us per call (median of ${ts.length} processes,` +
        ` ${us(Math.min(...perProcess))}-${us(Math.max(...perProcess))})${target}\n`,
    );
  }
  for (const r of RATIOS) {
    const value = results.get(r.case);
    const base = results.get(r.baseline);
    if (value === undefined || base === undefined) continue;
    const a = timings.get(r.case)!;
    const b = timings.get(r.baseline)!;
    const wall = r.clock === "wall";
    const perRound = a
      .slice(0, b.length)
      .map((t, i) => (wall ? t.wall / b[i].wall : t.cpu / b[i].cpu));
    const ratio = wall ? median(a.map((t) => t.wall)) / median(b.map((t) => t.wall)) : value / base;
    process.stdout.write(
      JSON.stringify({
        ratio: `${r.case} / ${r.baseline}`,
        clock: r.clock ?? "cpu",
        value: ratio,
        spreadMin: Math.min(...perRound),
        spreadMax: Math.max(...perRound),
        meaning: r.meaning,
      }) + "\n",
    );
  }
  process.stdout.write(
    JSON.stringify({
      machine: {
        cpus: os.cpus().length,
        loadAverageBefore: loadBefore,
        loadAverageAfter: os.loadavg().map(round3),
        processesPerCase: args.processes,
        totalSeconds: round3((Date.now() - started) / 1000),
      },
    }) + "\n",
  );
}

const args = parseArgs(process.argv.slice(2));
if (args.worker !== undefined) void runWorker(args.worker, args.samples);
else runAll(args);
