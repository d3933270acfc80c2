/**
 * `npm run bench`: prints one JSON line per case,
 *   {"case", "secondsPerCall", "wallSecondsPerCall", "minSecondsPerCall", "targetSecondsPerCall",
 *    "meetsTarget", "loadAverage1m"}
 * (medians of repeated batches; secondsPerCall is process CPU time, see harness.ts; the load
 * average is read after the case, so a reader can tell a loaded machine from a slow case), then one
 * line per ratio of a case to its baseline measured in the same run (numeric / closed-form
 * departures; a state with the ideal-gas correlations / the same state with a constant-cp ideal
 * gas), and a last line with the machine's load before and after. Ratios carry over between
 * machines and loads better than absolute times. Optional argument: a substring to select cases.
 */
import * as os from "node:os";
import { measure, consumed } from "./harness.js";
import { allCases } from "./cases/index.js";

/** Case / baseline pairs reported as ratios (both must have run). */
const RATIOS: readonly { case: string; baseline: string; meaning: string }[] = [
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
    case: "pr-mix10-TP",
    baseline: "pr-mix10-TP-residual-only",
    meaning: "cost of the state with the ideal-gas correlations over the engine alone",
  },
];

const round3 = (v: number) => Math.round(v * 1000) / 1000;
const loadBefore = os.loadavg().map(round3);
const filter = process.argv[2];
const results = new Map<string, number>();
for (const c of allCases) {
  if (filter && !c.name.includes(filter)) continue;
  const fn = c.setup();
  const timing = measure(fn);
  const secondsPerCall = timing.cpu;
  results.set(c.name, secondsPerCall);
  const meets = c.targetSeconds === undefined ? undefined : secondsPerCall <= c.targetSeconds;
  process.stdout.write(
    JSON.stringify({
      case: c.name,
      secondsPerCall,
      wallSecondsPerCall: timing.wall,
      minSecondsPerCall: timing.cpuMin,
      targetSecondsPerCall: c.targetSeconds ?? null,
      meetsTarget: meets ?? null,
      loadAverage1m: round3(os.loadavg()[0]),
    }) + "\n",
  );
  if (c.targetSeconds !== undefined) {
    process.stderr.write(
      `  ${c.name}: ${(secondsPerCall * 1e6).toPrecision(4)} us per call (median CPU), target ${(c.targetSeconds * 1e6).toPrecision(3)} us: ${meets ? "meets" : "MISSES"}\n`,
    );
  }
}
for (const r of RATIOS) {
  const value = results.get(r.case);
  const base = results.get(r.baseline);
  if (value === undefined || base === undefined) continue;
  process.stdout.write(
    JSON.stringify({
      ratio: `${r.case} / ${r.baseline}`,
      value: value / base,
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
    },
  }) + "\n",
);
void consumed();
