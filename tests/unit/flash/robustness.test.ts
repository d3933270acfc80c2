/**
 * Robustness slice of the isothermal flash: 10,000 random flashes (2-6 components from the table,
 * random compositions with traces down to 1e-8, 150-600 K, 0.05-30 MPa, Peng-Robinson with the
 * table's k_ij). Each must either return an equilibrium that passes independent checks (ln f
 * recomputed from the returned states equal to 1e-10, material balance to 1e-12, densities and
 * labels in order, and a tangent-plane test with Wilson and nearly pure trials run again on every
 * returned phase finding it stable) or throw a typed error of the library. Both are counted; a
 * returned result that fails a check (a silent failure) or an untyped exception fails the test.
 */
import { describe, expect, it } from "vitest";
import { defineFluid, type Fluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { IsochorError } from "../../../kernel-lib/src/errors.js";
import { stabilityAtTP } from "../../../kernel-lib/src/phase/stability.js";
import { recomputedFugacityGap } from "./helpers.js";

const TABLE = [
  "nitrogen",
  "carbon-dioxide",
  "hydrogen-sulfide",
  "water",
  "hydrogen",
  "methane",
  "ethane",
  "propane",
  "isobutane",
  "n-butane",
  "n-pentane",
  "n-hexane",
  "n-heptane",
  "n-octane",
  "n-decane",
  "ethylene",
  "propylene",
  "benzene",
  "toluene",
  "cyclohexane",
];

function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    // mulberry32 (a small public-domain generator), reproducible across runs
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** The independent checks; returns a description of the first failure, or undefined. */
function silentFailure(fluid: Fluid, eq: ReturnType<Fluid["flashTP"]>): string | undefined {
  const gap = recomputedFugacityGap(eq);
  if (!(gap <= 1e-10)) return `fugacity gap ${gap}`;
  for (let i = 0; i < eq.z.length; i++) {
    let s = 0;
    for (const p of eq.phases) s += p.amount * p.state.x[i];
    if (!(Math.abs(s - eq.z[i]) <= 1e-12))
      return `material balance of component ${i}: ${s - eq.z[i]}`;
  }
  for (let k = 1; k < eq.phases.length; k++) {
    if (!(eq.phases[k].state.densityMolPerM3 > eq.phases[k - 1].state.densityMolPerM3))
      return "phases not ordered by density";
    if (eq.phases[k].kind === "vapor") return "a vapour denser than another phase";
  }
  if (!(eq.check.gibbsChangeOverRT <= 1e-12)) return `Gibbs change ${eq.check.gibbsChangeOverRT}`;
  // every returned phase, of two or three, must be stable
  for (const p of eq.phases) {
    const x = p.state.x.slice();
    const present = x.map((v, i) => (v > 0 ? i : -1)).filter((i) => i >= 0);
    const t = stabilityAtTP(fluid.model, eq.temperatureK, eq.pressurePa, x, {
      constants: fluid.components,
      extraTrials: present,
    });
    if (!t.stable)
      return `returned ${p.kind} phase is unstable (tm = ${t.minimumTangentPlaneDistance})`;
  }
  return undefined;
}

describe("robustness: 10,000 random flashes", () => {
  it("each converges with verified equal fugacity or throws a typed error; no silent failure", () => {
    const random = rng(20261204);
    const fluids = new Map<string, Fluid>();
    const counts = {
      one: 0,
      two: 0,
      three: 0,
      typed: new Map<string, number>(),
      silent: [] as string[],
    };
    const N = 10000;
    for (let c = 0; c < N; c++) {
      const size = 2 + Math.floor(random() * 5);
      const pool = TABLE.slice();
      const ids: string[] = [];
      for (let k = 0; k < size; k++)
        ids.push(pool.splice(Math.floor(random() * pool.length), 1)[0]);
      ids.sort();
      const key = ids.join("+");
      let fluid = fluids.get(key);
      if (fluid === undefined) {
        fluid = defineFluid({ components: ids });
        fluids.set(key, fluid);
      }
      const raw = ids.map(() => (random() < 0.15 ? 1e-8 * (1 + random()) : random() + 0.01));
      const sum = raw.reduce((a, b) => a + b, 0);
      const z = raw.map((v) => v / sum);
      const T = 150 + 450 * random();
      const P = Math.exp(Math.log(0.05e6) + (Math.log(30e6) - Math.log(0.05e6)) * random());
      try {
        const eq = fluid.flashTP(T, P, z);
        const problem = silentFailure(fluid, eq);
        if (problem !== undefined) counts.silent.push(`${key} T=${T} P=${P} z=${z}: ${problem}`);
        else if (eq.phases.length === 1) counts.one++;
        else if (eq.phases.length === 2) counts.two++;
        else counts.three++;
      } catch (e) {
        if (!(e instanceof IsochorError)) throw e;
        if (e.code !== "out-of-range")
          console.log(
            `typed error (not a correlation range): ${key} T=${T} P=${P} z=${z}: ${e.message}`,
          );
        const name = `${e.name} (${e.code})`;
        counts.typed.set(name, (counts.typed.get(name) ?? 0) + 1);
      }
    }
    const typed = [...counts.typed.values()].reduce((a, b) => a + b, 0);
    console.log(
      `robustness: ${N} flashes: ${counts.one} one-phase, ${counts.two} two-phase, ${counts.three} three-phase verified; ${typed} typed errors ${JSON.stringify([...counts.typed])}; ${counts.silent.length} silent failures`,
    );
    expect(counts.silent).toEqual([]);
    expect(counts.one + counts.two + counts.three + typed).toBe(N);
    // the slice must exercise splits, not only single phases
    expect(counts.two).toBeGreaterThan(500);
    // about 10 s of CPU on an idle machine; the allowance is for a loaded one
  }, 300_000);
});
