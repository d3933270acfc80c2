/**
 * The fast route of the cubic row kernel (sweep request `precision: "fast"`, sweep/leanRows.ts
 * fastPoint): a Newton root of the Z-cubic started from the previous point of the row and one
 * logarithm ln(Z - B) in place of ln(1 - b rho) + ln Z. Stated tolerance (DEVELOPERS.md "Sweep
 * benchmarks"): every property within 1e-10 of the single state (stateAtTP) relative to
 * max(|value|, floor), floor R T for energies (J/mol), R for entropies (J/(mol K)), 1 for Z and
 * the value itself for densities; the phase kind and the error code equal. The largest
 * differences (about 6e-12) are liquids at low pressure, Z about 1e-3, where the single state's
 * ln Z = ln(1 + alpha_r,delta) loses digits to cancellation; the fast route takes ln(Z - B) from
 * the root itself. The exact route
 * (default) keeps its bit-equality tests in sweepKernel.test.ts. The grids cross the three-root
 * region of methane (below Tc = 190.56 K), where the fast route hands points to the exact route,
 * and the critical neighbourhood, where the discriminant guard does.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { defineFluid, type Fluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { R } from "../../../kernel-lib/src/constants.js";
import type { FluidState } from "../../../kernel-lib/src/state/types.js";
import type { SweepProperty } from "../../../kernel-lib/src/sweep/types.js";
import { axis, fiveComponentGas, sweepGridAgainstStates } from "./fixtures.js";
import {
  allocateColumns,
  evaluateSweepRange,
  planSweep,
} from "../../../kernel-lib/src/sweep/runSweep.js";

const TOLERANCE = 1e-10;

type Get = (s: FluidState) => number;
// property, value of the single state, floor of the relative scale (T in K)
const GET: Partial<Record<SweepProperty, [Get, (T: number) => number]>> = {
  T: [(s) => s.temperatureK, () => 0],
  rho: [(s) => s.densityMolPerM3, () => 0],
  rhoMass: [(s) => s.densityKgPerM3, () => 0],
  Z: [(s) => s.Z, () => 1],
  h: [(s) => s.molar.h, (T) => R * T],
  s: [(s) => s.molar.s, () => R],
  u: [(s) => s.molar.u, (T) => R * T],
  a: [(s) => s.molar.a, (T) => R * T],
  g: [(s) => s.molar.g, (T) => R * T],
  hRes: [(s) => s.residual.h, (T) => R * T],
  sRes: [(s) => s.residual.s, () => R],
  uRes: [(s) => s.residual.u, (T) => R * T],
  aRes: [(s) => s.residual.a, (T) => R * T],
  gRes: [(s) => s.residual.g, (T) => R * T],
};

const SETS: readonly (readonly SweepProperty[])[] = [
  ["hRes", "sRes"],
  ["rho", "Z", "hRes", "sRes", "uRes", "aRes", "gRes", "T", "rhoMass"],
  ["h", "s"],
  ["h", "s", "rho", "u", "a", "g"],
];

/** The largest scaled difference over the grid (and the checks of kinds and error codes). */
function checkGrid(
  fluid: Fluid,
  Ts: readonly number[],
  Ps: readonly number[],
  x: number[] | undefined,
  properties: readonly SweepProperty[],
): number {
  let worst = 0;
  sweepGridAgainstStates(fluid, Ts, Ps, x, properties, "fast", (values, k, st, T, P) => {
    for (const p of properties) {
      const [get, floor] = GET[p]!;
      const expected = get(st);
      const diff = Math.abs(values[p]![k] - expected) / Math.max(Math.abs(expected), floor(T));
      expect(diff, `${p} at ${T} K, ${P} Pa`).toBeLessThanOrEqual(TOLERANCE);
      worst = Math.max(worst, diff);
    }
  });
  return worst;
}

describe('sweep precision "fast" equals stateAtTP within 1e-10', () => {
  for (const model of ["peng-robinson", "soave-redlich-kwong"] as const) {
    const fluid = defineFluid({ components: ["methane"], model });
    it(`${model} methane: the benchmark grid, three-root and critical regions, random grids`, () => {
      const N = 60;
      const Ts = Array.from({ length: N }, (_, i) => 100 + (500 * i) / (N - 1));
      const Ps = Array.from({ length: N }, (_, j) => 1e4 + ((30e6 - 1e4) * j) / (N - 1));
      const worst = checkGrid(fluid, Ts, Ps, undefined, ["hRes", "sRes", "Z", "rho"]);
      // the fast route changed the rounding somewhere (otherwise it did not run)
      expect(worst).toBeGreaterThan(0);
      const near = [186, 190, 190.5, 190.56, 190.6, 191, 195];
      const nearP = [4.4e6, 4.55e6, 4.59e6, 4.599e6, 4.6e6, 4.65e6, 4.8e6, 5e6];
      for (const set of SETS) checkGrid(fluid, near, nearP, undefined, set);
      fc.assert(
        fc.property(axis(95, 620, 6), axis(1e3, 40e6, 8), fc.constantFrom(...SETS), (T, P, set) => {
          checkGrid(fluid, T, P, undefined, set);
        }),
        { numRuns: 25 },
      );
    });
  }

  it("a five-component mixture without a phase check (labels by the PIP)", () => {
    const { fluid, x } = fiveComponentGas();
    const Ps = Array.from({ length: 12 }, (_, j) => 1e5 + 1e6 * j);
    for (const set of SETS) checkGrid(fluid, [150, 240.5, 340.25], Ps, x, set);
  });

  it("rows with repeated, unordered and refused pressures (the runs stop and go on)", () => {
    // fastRun's cubic start has no weights where pressures repeat (linear start or the closed
    // form instead); a refused pressure ends a run and the next point starts a new one
    const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
    const Ps = [1e5, 2e5, 2e5, 3e5, 5e5, 4e5, 6e5, 7e5, 7e5, 7e5, 8e5, 9e5, 1e6, 2e6];
    const withBad = [...Ps.slice(0, 7), -1, ...Ps.slice(7), 0, 3e6, 4e6, 5e6, 6e6, 7e6];
    for (const set of SETS) {
      checkGrid(fluid, [120, 180, 250.5, 400], Ps, undefined, set);
      checkGrid(fluid, [120, 250.5], withBad, undefined, set);
    }
  });

  it("a mass basis divides the amount-specific columns by M and leaves the others", () => {
    const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
    const base = {
      specification: "TP" as const,
      first: { from: 150, to: 450, count: 5 },
      second: { from: 1e5, to: 20e6, count: 30 },
      properties: ["h", "s", "u", "a", "g", "hRes", "sRes", "rho", "rhoMass", "Z", "T", "P"],
      precision: "fast" as const,
    } satisfies Parameters<Fluid["sweep"]>[0];
    const molar = fluid.sweep(base);
    const mass = fluid.sweep({ ...base, basis: "mass" });
    // methane, 16.043 g/mol (from memory of the NIST Chemistry WebBook; the component table's M)
    const M = molar.values.rhoMass![0] / molar.values.rho![0];
    expect(M).toBeCloseTo(0.016043, 5);
    for (const p of base.properties) {
      const perAmount = !["rho", "rhoMass", "Z", "T", "P"].includes(p);
      for (let k = 0; k < 150; k++) {
        const expected = perAmount ? molar.values[p]![k] / M : molar.values[p]![k];
        const got = mass.values[p]![k];
        expect(Math.abs(got - expected), `${p} at ${k}`).toBeLessThanOrEqual(
          1e-14 * Math.abs(expected),
        );
      }
    }
  });

  it("a range evaluated in progress chunks equals the whole sweep to the last bit", () => {
    // fastRun's runs end at every chunk; the start's history carries over, so the Newton
    // iterates and the numbers are the same as in one pass
    const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
    const request = {
      specification: "TP" as const,
      first: { from: 150, to: 450, count: 7 },
      second: { from: 1e5, to: 20e6, count: 53 },
      properties: ["h", "s", "Z", "rho"] as SweepProperty[],
      precision: "fast" as const,
    };
    const whole = fluid.sweep(request);
    const plan = planSweep(request, 1);
    const start = 11;
    const columns = allocateColumns(plan, plan.count - start);
    const done: number[] = [];
    const failed = evaluateSweepRange(
      { binding: fluid, constants: fluid.components },
      plan,
      start,
      plan.count,
      columns,
      [],
      (n) => done.push(n),
      17,
    );
    expect(failed).toBe(0);
    expect(done[0]).toBe(17);
    expect(done.at(-1)).toBe(plan.count - start);
    for (let m = 0; m < plan.properties.length; m++) {
      const p = plan.properties[m];
      // after the range's first row the history is the same as in the whole sweep
      const from = 53 - start;
      expect(Array.from(columns.values[m].subarray(from))).toEqual(
        Array.from(whole.values[p]!.subarray(start + from)),
      );
    }
    expect(Array.from(columns.phaseKind)).toEqual(Array.from(whole.phaseKind.subarray(start)));
  });

  it('refuses an unknown precision with a typed error naming "precision"', () => {
    const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
    expect(() =>
      fluid.sweep({
        specification: "TP",
        first: [300],
        second: [1e5],
        properties: ["h"],
        precision: "quick" as "fast",
      }),
    ).toThrow(/precision/);
  });
});
