/**
 * Robustness campaign of the mixture flashes (issue 12, item 10):
 * `npm run campaign -- [--count N] [--seed S] [--from K] [--progress M] [--examples E]
 * [--max-seconds S]` (S > 0: stop after S seconds of wall time and report the cases done).
 *
 * Runs N random isothermal flashes (default 100,000) of Peng-Robinson mixtures with the table's
 * k_ij: 2-12 components drawn from the refinery and gas-plant set below (light hydrocarbons to
 * n-decane, N2, CO2, H2S, H2, water), random compositions in which any component may be a trace
 * of about 1e-8, 100-600 K and 0.05-30 MPa (log-uniform). The cases are of four kinds:
 *   - "random": T and P drawn over the whole range;
 *   - "near-saturation": P drawn, the bubble or dew temperature found by
 *     saturationPointAtPressure (phase/envelope/), the flash placed within 0.1 K of it (exactly on
 *     it, uniformly within +-0.1 K, or log-uniformly 1e-6 to 0.1 K away);
 *   - "near-critical": the mixture critical point (Heidemann-Khalil, phase/envelope/) and the flash
 *     at T_c (1 + e1), P_c (1 + e2), |e| log-uniform 1e-6 to 1e-2;
 *   - "water": water forced into the mixture (mole fraction 1e-3 to 0.9), T and P random.
 * When a saturation or critical point cannot be found the case falls back to a random point (and
 * the setup failure is counted). One case in ten also runs the (P, h) round trip: h of the
 * verified equilibrium, then flashPH at the same P must return T within 1e-6 K.
 *
 * Each flash either returns an equilibrium, which is then re-checked here independently of the
 * library's own verification, or throws; a typed error (errors.ts) is a refusal and is counted by
 * kind, an untyped exception is a failure. The re-check of a returned equilibrium:
 *   - ln phi of every phase recomputed at (T, P, x) in its most stable root by
 *     state/fugacity.ts phaseFugacityAtTP: the returned density must be that root (relative
 *     1e-7) and max |ln f_i(a) - ln f_i(b)| <= 1e-10 from the recomputed values;
 *   - material balance sum_k amount_k x_ik = z_i to 1e-12, amounts in (0, 1] summing to 1;
 *   - Gibbs energy of the split below the feed's single phase (recomputed, <= 1e-12 in G/RT);
 *   - phases ordered by density, labels "vapor" | "liquid" | "liquid-2" in the allowed order,
 *     compositions distinct (1e-6);
 *   - a tangent-plane test (phase/stability.ts) of every returned phase with Wilson and nearly pure
 *     trials of every present component finds it stable;
 *   - near a saturation line, a one-phase answer is tested against the incipient phase the
 *     saturation function found (tm of that composition, after a few substitution steps from it,
 *     must not be below -1e-8).
 * A returned result that fails any of these is a silent failure; the campaign exits 1 if there is
 * one (or an untyped exception). Random numbers: numerics/seededRandom.ts, one generator per case
 * seeded from (seed, case index), so `--from K --count 1` repeats case K alone.
 *
 * Prints progress to stderr, then a summary (counts by outcome, phases, kinds, error kinds with
 * reproducible examples, worst residuals, time per flash) and one JSON line.
 */
import * as os from "node:os";
import { performance } from "node:perf_hooks";
import { R as R_CODATA } from "../src/constants.js";
import { IsochorError } from "../src/errors.js";
import { defineFluid, type Fluid } from "../src/fluid/defineFluid.js";
import { idealGasFromCorrelation } from "../src/idealgas/correlationPure.js";
import { idealGasMixture } from "../src/idealgas/mixture.js";
import { seededRandom, type SeededRandom } from "../src/numerics/seededRandom.js";
import { mixtureCriticalPoint } from "../src/phase/envelope/mixtureCriticalPoint.js";
import { saturationPointAtPressure } from "../src/phase/envelope/saturationPoint.js";
import { overallProperty } from "../src/phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../src/phase/flash/types.js";
import { stabilityAtTP } from "../src/phase/stability.js";
import { phaseFugacityAtTP } from "../src/state/fugacity.js";

const TABLE = [
  "methane",
  "ethane",
  "propane",
  "isobutane",
  "n-butane",
  "isopentane",
  "n-pentane",
  "n-hexane",
  "n-heptane",
  "n-octane",
  "n-nonane",
  "n-decane",
  "nitrogen",
  "carbon-dioxide",
  "hydrogen-sulfide",
  "hydrogen",
  "water",
];
const T_MIN = 100;
const T_MAX = 600;
const P_MIN = 0.05e6;
const P_MAX = 30e6;

// independent re-check thresholds (the issue's figures)
const FUGACITY_GAP = 1e-10;
const MATERIAL_BALANCE = 1e-12;
const GIBBS_ALLOWANCE = 1e-12;
const DENSITY_ROOT = 1e-7;
const TM_THRESHOLD = 1e-8;
/** Relative extrapolation of the ideal-gas cp correlations allowed (200 K * (1 - 0.6) = 80 K). */
const CP_MARGIN = 0.6;
const ROUND_TRIP_K = 1e-6;

interface Args {
  count: number;
  seed: number;
  from: number;
  progress: number;
  examples: number;
  maxSeconds: number;
}

function parseArgs(argv: readonly string[]): Args {
  const args: Args = {
    count: 100_000,
    seed: 20261204,
    from: 0,
    progress: 1000,
    examples: 3,
    maxSeconds: 0,
  };
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === "--") continue;
    const [flag, inline] = argv[i].split("=", 2);
    const text = inline ?? argv[++i];
    const n = Number(text);
    if (!(Number.isInteger(n) && n >= 0))
      throw new Error(`${flag} expects an integer >= 0, got ${text}`);
    if (flag === "--count") args.count = n;
    else if (flag === "--seed") args.seed = n;
    else if (flag === "--from") args.from = n;
    else if (flag === "--progress") args.progress = n;
    else if (flag === "--examples") args.examples = n;
    else if (flag === "--max-seconds") args.maxSeconds = n;
    else throw new Error(`unknown option ${flag}`);
  }
  return args;
}

type CaseKind = "random" | "near-saturation" | "near-critical" | "water";

interface Case {
  index: number;
  kind: CaseKind;
  ids: string[];
  z: number[];
  T: number;
  P: number;
  roundTrip: boolean;
  /** Incipient phase of the saturation point the case was placed near. */
  incipient?: readonly number[];
  /** What the placement was (for the report of a failure). */
  placement: string;
  setupFailure?: string;
}

const logUniform = (r: SeededRandom, lo: number, hi: number): number =>
  Math.exp(Math.log(lo) + (Math.log(hi) - Math.log(lo)) * r.uniform());

const fluids = new Map<string, Fluid>();
function fluidOf(ids: readonly string[]): Fluid {
  const key = ids.join("+");
  let f = fluids.get(key);
  if (f === undefined) {
    if (fluids.size > 2000) fluids.clear();
    // the ideal-gas cp correlations start at about 200 K and refuse below 180 K (a typed error,
    // by design: idealgas/temperatureRange.ts); the phase split does not depend on them, so the
    // campaign extrapolates them (with the warning) to reach the flash itself down to 100 K
    const idealGas = idealGasMixture(
      ids.map((id) => idealGasFromCorrelation(id, { extrapolationMargin: CP_MARGIN })),
      { extrapolationMargin: CP_MARGIN },
    );
    f = defineFluid({ components: [...ids], model: "peng-robinson", idealGas });
    fluids.set(key, f);
  }
  return f;
}

function errorKey(e: unknown): string {
  if (!(e instanceof Error)) return `non-Error ${String(e)}`;
  const name = e instanceof IsochorError ? `${e.name} (${e.code})` : `UNTYPED ${e.name}`;
  const text = e.message
    .replace(/T = [^:]*?\(Peng-Robinson[^)]*\)/g, "<state>")
    .replace(/z = \{[^}]*\}/g, "z")
    .replace(/-?\d+(\.\d+)?(e[-+]?\d+)?/gi, "#")
    .slice(0, 160);
  // the refusals of an unstable three-phase split, by what the four-phase split from it did
  const four = e.message.includes("four-phase split")
    ? e.message.includes("each of its phases is stable")
      ? " [four phases, converged and stable]"
      : e.message.includes("is itself not stable")
        ? " [four-phase split converged, not stable]"
        : " [four-phase split not converged]"
    : "";
  return `${name}: ${text}${four}`;
}

function makeCase(seed: number, index: number): Case {
  // one generator per case: (seed, index) mixed so neighbouring cases are unrelated
  const r = seededRandom(
    (Math.imul(seed ^ 0x5bd1e995, 0x01000193) + Math.imul(index, 0x9e3779b1)) >>> 0,
  );
  const roll = r.uniform();
  const kind: CaseKind =
    roll < 0.5
      ? "random"
      : roll < 0.75
        ? "near-saturation"
        : roll < 0.83
          ? "near-critical"
          : "water";
  const size = 2 + Math.floor(r.uniform() * 11);
  const pool = TABLE.slice();
  const ids: string[] = [];
  if (kind === "water") ids.push(pool.splice(pool.indexOf("water"), 1)[0]);
  while (ids.length < size) ids.push(pool.splice(Math.floor(r.uniform() * pool.length), 1)[0]);
  ids.sort();
  const raw = ids.map(() => (r.uniform() < 0.12 ? 1e-8 * (1 + r.uniform()) : r.uniform() + 0.01));
  if (kind === "water") {
    // water at 1e-3 to 0.9 of the feed
    const w = logUniform(r, 1e-3, 0.9);
    const iw = ids.indexOf("water");
    let rest = 0;
    raw.forEach((v, i) => {
      if (i !== iw) rest += v;
    });
    raw.forEach((v, i) => {
      raw[i] = i === iw ? w : ((1 - w) * v) / rest;
    });
  }
  const sum = raw.reduce((a, b) => a + b, 0);
  const z = raw.map((v) => v / sum);
  const T = T_MIN + (T_MAX - T_MIN) * r.uniform();
  const P = logUniform(r, P_MIN, P_MAX);
  const roundTrip = r.uniform() < 0.1;
  const c: Case = { index, kind, ids, z, T, P, roundTrip, placement: "random T, P" };
  // the placement draws are made in every case so the sequence does not depend on success
  const dewOrBubble = r.uniform() < 0.5 ? 0 : 1;
  const offsetRoll = r.uniform();
  const sign = r.uniform() < 0.5 ? -1 : 1;
  const offsetU = r.uniform();
  const e1 = (r.uniform() < 0.5 ? -1 : 1) * logUniform(r, 1e-6, 1e-2);
  const e2 = (r.uniform() < 0.5 ? -1 : 1) * logUniform(r, 1e-6, 1e-2);
  if (kind === "near-saturation") {
    try {
      const fluid = fluidOf(ids);
      const s = saturationPointAtPressure(fluid, P, z, { vaporFraction: dewOrBubble });
      const offset =
        offsetRoll < 0.1
          ? 0
          : offsetRoll < 0.55
            ? sign * 0.1 * offsetU
            : sign * Math.exp(Math.log(1e-6) + (Math.log(0.1) - Math.log(1e-6)) * offsetU);
      c.T = s.temperatureK + offset;
      c.incipient = s.incipient;
      c.placement = `${s.kind} point at ${s.temperatureK} K ${offset >= 0 ? "+" : "-"} ${Math.abs(offset)} K`;
    } catch (e) {
      c.setupFailure = `no ${dewOrBubble === 0 ? "bubble" : "dew"} point: ${errorKey(e)}`;
    }
  } else if (kind === "near-critical") {
    try {
      const fluid = fluidOf(ids);
      const cp = mixtureCriticalPoint(fluid.model, z);
      c.T = cp.temperatureK * (1 + e1);
      c.P = cp.pressurePa * (1 + e2);
      c.placement = `critical point ${cp.temperatureK} K, ${cp.pressurePa} Pa, offsets ${e1}, ${e2}`;
    } catch (e) {
      c.setupFailure = `no critical point: ${errorKey(e)}`;
    }
  }
  return c;
}

/** Worst residuals met by the re-check of returned results. */
const worst = {
  fugacityGap: 0,
  materialBalance: 0,
  gibbsChange: -Infinity,
  densityRoot: 0,
  rootPressure: 0,
  minPhaseTm: Infinity,
  roundTripK: 0,
};

/** tm of trial w against feed z at (T, P), after a few substitution steps from w. */
function tangentPlaneFrom(
  fluid: Fluid,
  T: number,
  P: number,
  z: readonly number[],
  w0: readonly number[],
): number {
  const n = z.length;
  const fz = phaseFugacityAtTP(fluid.model, T, P, z, "stable");
  const d = z.map((v, i) => (v > 0 ? Math.log(v) + fz.lnPhi[i] : -Infinity));
  let W = w0.map((v, i) => (z[i] > 0 ? Math.max(v, 1e-300) : 0));
  let best = Infinity;
  for (let it = 0; it < 30; it++) {
    const sw = W.reduce((a, b) => a + b, 0);
    const w = W.map((v) => v / sw);
    const fw = phaseFugacityAtTP(fluid.model, T, P, w, "stable");
    let tm = 1;
    for (let i = 0; i < n; i++)
      if (W[i] > 0) tm += W[i] * (Math.log(W[i]) + fw.lnPhi[i] - d[i] - 1);
    best = Math.min(best, tm);
    W = W.map((_, i) => (z[i] > 0 ? Math.exp(d[i] - fw.lnPhi[i]) : 0));
  }
  return best;
}

const KIND_ORDERS = ["vapor", "liquid", "vapor,liquid", "liquid,liquid-2", "vapor,liquid,liquid-2"];

/** The independent re-check; the first problem found, or undefined. */
function recheck(fluid: Fluid, eq: Equilibrium, z: readonly number[], c: Case): string | undefined {
  const T = eq.temperatureK;
  const P = eq.pressurePa;
  const ps = eq.phases;
  const R = fluid.model.gasConstant ?? R_CODATA;
  if (!(ps.length >= 1 && ps.length <= 3)) return `${ps.length} phases`;
  if (!(T === c.T && P === c.P)) return `returned at T = ${T}, P = ${P}`;
  const present: number[] = [];
  z.forEach((v, i) => {
    if (v > 0) present.push(i);
  });
  const kinds = ps.map((p) => p.kind).join(",");
  if (!KIND_ORDERS.includes(kinds)) return `phase labels ${kinds}`;
  let total = 0;
  for (const p of ps) {
    if (!(p.amount > 0 && p.amount <= 1)) return `phase amount ${p.amount}`;
    total += p.amount;
  }
  if (!(Math.abs(total - 1) <= 1e-12)) return `amounts sum to ${total}`;
  for (let k = 1; k < ps.length; k++) {
    if (!(ps[k].state.densityMolPerM3 > ps[k - 1].state.densityMolPerM3))
      return "phases not ordered by density";
  }
  // ln phi recomputed in each phase's most stable root at (T, P, x)
  const lnPhi: number[][] = [];
  for (const p of ps) {
    const f = phaseFugacityAtTP(fluid.model, T, P, p.state.x, "stable");
    const dr = Math.abs(f.densityMolPerM3 - p.state.densityMolPerM3) / f.densityMolPerM3;
    worst.densityRoot = Math.max(worst.densityRoot, dr);
    if (!(dr <= DENSITY_ROOT)) {
      return `${p.kind} phase at ${p.state.densityMolPerM3} mol/m3 is not the most stable root of its composition (${f.densityMolPerM3})`;
    }
    // ln phi at the root's own density, ln f_i = ln(x_i rho R T) + dnA_i: ln phi = dnA_i - ln Z
    // + ln(P(rho) / P); the last term is the rounding of the density root (up to 1e-10 for a
    // stiff liquid at low pressure), which must not be charged to the split
    const lnPRatio = Math.log((f.Z * f.densityMolPerM3 * R * T) / P);
    worst.rootPressure = Math.max(worst.rootPressure, Math.abs(lnPRatio));
    if (!(Math.abs(lnPRatio) <= 1e-8)) {
      return `${p.kind} phase: the pressure at its density root differs from P by ${lnPRatio.toExponential(3)} (log)`;
    }
    lnPhi.push(f.lnPhi.map((v) => v + lnPRatio));
  }
  let gap = 0;
  for (let a = 0; a < ps.length; a++) {
    for (let b = a + 1; b < ps.length; b++) {
      let distance = 0;
      for (const i of present) {
        const fa = Math.log(ps[a].state.x[i]) + lnPhi[a][i];
        const fb = Math.log(ps[b].state.x[i]) + lnPhi[b][i];
        const g = Math.abs(fa - fb);
        gap = Number.isNaN(g) ? Infinity : Math.max(gap, g);
        distance = Math.max(distance, Math.abs(ps[a].state.x[i] - ps[b].state.x[i]));
      }
      if (!(distance > 1e-6)) return "two phases of the same composition (trivial split)";
    }
  }
  worst.fugacityGap = Math.max(worst.fugacityGap, gap);
  if (!(gap <= FUGACITY_GAP)) return `recomputed fugacity gap ${gap.toExponential(3)}`;
  let balance = 0;
  for (let i = 0; i < z.length; i++) {
    let s = 0;
    for (const p of ps) s += p.amount * p.state.x[i];
    balance = Math.max(balance, Math.abs(s - z[i]));
  }
  worst.materialBalance = Math.max(worst.materialBalance, balance);
  if (!(balance <= MATERIAL_BALANCE)) return `material balance ${balance.toExponential(3)}`;
  if (ps.length > 1) {
    const fz = phaseFugacityAtTP(fluid.model, T, P, z, "stable");
    let gFeed = 0;
    const feedShift = Math.log((fz.Z * fz.densityMolPerM3 * R * T) / P);
    for (const i of present) gFeed += z[i] * (Math.log(z[i]) + fz.lnPhi[i] + feedShift);
    let gSplit = 0;
    ps.forEach((p, k) => {
      for (const i of present)
        gSplit += p.amount * p.state.x[i] * (Math.log(p.state.x[i]) + lnPhi[k][i]);
    });
    const dG = gSplit - gFeed;
    worst.gibbsChange = Math.max(worst.gibbsChange, dG);
    if (!(dG <= GIBBS_ALLOWANCE)) return `Gibbs change of the split ${dG.toExponential(3)}`;
  }
  // every returned phase stable against Wilson and nearly pure trials
  for (const p of ps) {
    const t = stabilityAtTP(fluid.model, T, P, p.state.x.slice(), { extraTrials: present });
    worst.minPhaseTm = Math.min(worst.minPhaseTm, t.minimumTangentPlaneDistance);
    if (!t.stable)
      return `returned ${p.kind} phase is unstable (tm = ${t.minimumTangentPlaneDistance.toExponential(3)})`;
  }
  // a one-phase answer next to a saturation line against the incipient phase found there
  if (ps.length === 1 && c.incipient !== undefined) {
    const tm = tangentPlaneFrom(fluid, T, P, z, c.incipient);
    worst.minPhaseTm = Math.min(worst.minPhaseTm, tm);
    if (!(tm >= -TM_THRESHOLD))
      return `one phase returned, but the saturation point's incipient phase gives tm = ${tm.toExponential(3)}`;
  }
  return undefined;
}

interface Tally {
  [key: string]: number;
}
const bump = (t: Tally, key: string, by = 1): void => {
  t[key] = (t[key] ?? 0) + by;
};

function main(): void {
  const args = parseArgs(process.argv.slice(2));
  const load0 = os.loadavg();
  const started = new Date();
  const outcomes: Tally = {};
  const byKind: Record<string, Tally> = {};
  const phasesBySize: Record<string, Tally> = {};
  const errorKinds: Tally = {};
  const setupFailures: Tally = {};
  const examples: Record<string, string[]> = {};
  const silent: string[] = [];
  const untyped: string[] = [];
  const roundTrip = { run: 0, recovered: 0, refused: 0, off: 0, refusedKinds: {} as Tally };
  const times: number[] = [];
  const describe = (c: Case): string =>
    `case ${c.index} (${c.kind}; ${c.placement}): {${c.ids.map((id, i) => `${id}: ${c.z[i].toPrecision(6)}`).join(", ")}} T = ${c.T} K, P = ${c.P} Pa`;
  const addExample = (key: string, c: Case): void => {
    const list = (examples[key] ??= []);
    if (list.length < args.examples) list.push(describe(c));
  };
  const wall0 = performance.now();
  let done = 0;
  for (let k = 0; k < args.count; k++) {
    if (args.maxSeconds > 0 && performance.now() - wall0 > 1000 * args.maxSeconds) break;
    done++;
    const c = makeCase(args.seed, args.from + k);
    if (c.setupFailure !== undefined) bump(setupFailures, `${c.kind}: ${c.setupFailure}`);
    const fluid = fluidOf(c.ids);
    byKind[c.kind] ??= {};
    let eq: Equilibrium | undefined;
    const t0 = performance.now();
    try {
      eq = fluid.flashTP(c.T, c.P, c.z);
      times.push(performance.now() - t0);
    } catch (e) {
      times.push(performance.now() - t0);
      const key = errorKey(e);
      if (!(e instanceof IsochorError)) {
        untyped.push(`${describe(c)}: ${String((e as Error)?.stack ?? e)}`);
        bump(outcomes, "untyped exception");
      } else {
        bump(outcomes, "typed error");
        bump(byKind[c.kind], "typed error");
        bump(errorKinds, key);
        addExample(key, c);
      }
    }
    if (eq !== undefined) {
      const problem = recheck(fluid, eq, eq.z, c);
      if (problem !== undefined) {
        silent.push(`${describe(c)}: [${eq.phases.map((q) => q.kind).join(", ")}] ${problem}`);
        bump(outcomes, "SILENT FAILURE");
        bump(byKind[c.kind], "silent failure");
      } else {
        const n = `${eq.phases.length} phase${eq.phases.length > 1 ? "s" : ""}`;
        bump(outcomes, `verified, ${n}`);
        bump(byKind[c.kind], n);
        phasesBySize[`${c.ids.length} components`] ??= {};
        bump(phasesBySize[`${c.ids.length} components`], n);
        if (c.roundTrip) {
          roundTrip.run++;
          const h = overallProperty(eq, "h");
          try {
            const back = fluid.flashPH(c.P, h, eq.z);
            const dT = Math.abs(back.temperatureK - c.T);
            worst.roundTripK = Math.max(worst.roundTripK, dT);
            const p2 = recheck(fluid, back, eq.z, {
              ...c,
              T: back.temperatureK,
              incipient: undefined,
            });
            if (p2 !== undefined) {
              silent.push(`${describe(c)}: (P, h) flash result: ${p2}`);
              roundTrip.off++;
            } else if (!(dT <= ROUND_TRIP_K)) {
              silent.push(
                `${describe(c)}: (P, h) round trip returned T = ${back.temperatureK} K (off by ${dT} K)`,
              );
              roundTrip.off++;
            } else roundTrip.recovered++;
          } catch (e) {
            if (!(e instanceof IsochorError))
              untyped.push(`${describe(c)}: (P, h): ${String((e as Error)?.stack ?? e)}`);
            roundTrip.refused++;
            const key = errorKey(e);
            bump(roundTrip.refusedKinds, key);
            addExample(`(P, h) ${key}`, c);
          }
        }
      }
    }
    if (args.progress > 0 && (k + 1) % args.progress === 0) {
      const s = (performance.now() - wall0) / 1000;
      process.stderr.write(
        `${k + 1}/${args.count} after ${s.toFixed(0)} s: ${JSON.stringify(outcomes)} silent ${silent.length}, untyped ${untyped.length}, round trips ${roundTrip.recovered}/${roundTrip.run}\n`,
      );
      for (const line of silent.slice(-3))
        if (silent.length <= 20) process.stderr.write(`  ${line}\n`);
    }
  }
  const wallSeconds = (performance.now() - wall0) / 1000;
  const sorted = Float64Array.from(times).sort();
  const q = (p: number): number =>
    sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];
  const mean = times.reduce((a, b) => a + b, 0) / Math.max(1, times.length);
  const load1 = os.loadavg();
  const lines: string[] = [];
  const show = (title: string, t: Tally): void => {
    lines.push(title);
    for (const [k, v] of Object.entries(t).sort((a, b) => b[1] - a[1]))
      lines.push(`  ${String(v).padStart(7)}  ${k}`);
  };
  lines.push(
    `flash campaign: ${done} flashes from case ${args.from}${done < args.count ? ` (stopped by --max-seconds; ${args.count} asked)` : ""}, seed ${args.seed}, started ${started.toISOString()}, ${wallSeconds.toFixed(0)} s wall`,
  );
  lines.push(
    `machine: ${os.cpus().length} cores (${os.cpus()[0]?.model ?? "?"}), load average 1/5/15 min before ${load0.map((v) => v.toFixed(2)).join("/")}, after ${load1.map((v) => v.toFixed(2)).join("/")}; node ${process.version}`,
  );
  show("outcomes:", outcomes);
  for (const [k, t] of Object.entries(byKind)) show(`  ${k}:`, t);
  lines.push("phases by number of components (verified):");
  for (const [k, t] of Object.entries(phasesBySize).sort((a, b) => parseInt(a[0]) - parseInt(b[0])))
    lines.push(`  ${k.padEnd(14)} ${JSON.stringify(t)}`);
  show("typed errors of the flash by kind:", errorKinds);
  show("setup failures (case fell back to a random T, P):", setupFailures);
  lines.push(
    `(P, h) round trips: ${roundTrip.run} run, ${roundTrip.recovered} recovered T within ${ROUND_TRIP_K} K, ${roundTrip.refused} refused (typed), ${roundTrip.off} off or failing the re-check`,
  );
  show("  (P, h) refusals by kind:", roundTrip.refusedKinds);
  lines.push(
    `worst residuals of verified results: recomputed fugacity gap ${worst.fugacityGap.toExponential(2)}, material balance ${worst.materialBalance.toExponential(2)}, largest Gibbs change of a split ${worst.gibbsChange.toExponential(2)}, density vs most stable root ${worst.densityRoot.toExponential(2)}, |ln(P(rho)/P)| of a phase ${worst.rootPressure.toExponential(2)}, lowest tm of a returned phase ${worst.minPhaseTm.toExponential(2)}, (P, h) round trip |dT| ${worst.roundTripK.toExponential(2)} K`,
  );
  lines.push(
    `time per flashTP (wall, ms): mean ${mean.toFixed(3)}, median ${q(0.5).toFixed(3)}, 99th percentile ${q(0.99).toFixed(2)}, max ${q(1).toFixed(1)}`,
  );
  lines.push(`silent failures: ${silent.length}; untyped exceptions: ${untyped.length}`);
  for (const s of silent.slice(0, 50)) lines.push(`  SILENT ${s}`);
  for (const s of untyped.slice(0, 20)) lines.push(`  UNTYPED ${s}`);
  if (args.examples > 0) {
    lines.push("examples (repeat one with --from <case> --count 1):");
    for (const [k, v] of Object.entries(examples)) {
      lines.push(`  ${k}`);
      for (const e of v) lines.push(`    ${e}`);
    }
  }
  console.log(lines.join("\n"));
  console.log(
    JSON.stringify({
      campaign: "flash",
      count: done,
      asked: args.count,
      from: args.from,
      seed: args.seed,
      started: started.toISOString(),
      wallSeconds: Math.round(wallSeconds),
      loadBefore: load0,
      loadAfter: load1,
      outcomes,
      errorKinds,
      setupFailures,
      roundTrip,
      worst,
      msPerFlash: { mean, median: q(0.5), p99: q(0.99), max: q(1) },
      silent: silent.length,
      untyped: untyped.length,
    }),
  );
  process.exitCode = silent.length + untyped.length > 0 ? 1 : 0;
}

main();
