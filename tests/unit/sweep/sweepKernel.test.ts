/**
 * The row kernel of cubic (T, P) sweeps (sweep/leanRows.ts) and its box-free cubic solver
 * (numerics/cubicRoots.ts, monicCubicRootsInto). Stated tolerance: exact (Object.is, to the last
 * bit), because the kernel runs the expressions of the cubic model, the root choice and the
 * property formulas of the single state in the same order on the same numbers. Each extent of the
 * kernel (departures only, energies, everything) is checked with the property sets that select
 * it, over grids that cross the three-root region of methane (T below Tc = 190.56 K) and the
 * supercritical region, with the phase kind and the quality of the single state's label.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { defineFluid, type Fluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import {
  monicCubicRootsInto,
  realCubicRootsInto,
} from "../../../kernel-lib/src/numerics/cubicRoots.js";
import type { FluidState } from "../../../kernel-lib/src/state/types.js";
import type { SweepProperty } from "../../../kernel-lib/src/sweep/types.js";
import { axis, fiveComponentGas, kindOf, sweepGridAgainstStates } from "./fixtures.js";

const GET: Partial<Record<SweepProperty, (s: FluidState) => number>> = {
  T: (s) => s.temperatureK,
  rho: (s) => s.densityMolPerM3,
  rhoMass: (s) => s.densityKgPerM3,
  Z: (s) => s.Z,
  h: (s) => s.molar.h,
  s: (s) => s.molar.s,
  u: (s) => s.molar.u,
  a: (s) => s.molar.a,
  g: (s) => s.molar.g,
  cp: (s) => s.molar.cp,
  w: (s) => s.speedOfSoundMPerS,
  hRes: (s) => s.residual.h,
  sRes: (s) => s.residual.s,
  uRes: (s) => s.residual.u,
  aRes: (s) => s.residual.a,
  gRes: (s) => s.residual.g,
  cpRes: (s) => s.residual.cp,
  cvRes: (s) => s.residual.cv,
};

// one property set per extent of the kernel
const SETS: readonly (readonly SweepProperty[])[] = [
  ["hRes", "sRes"],
  ["rho", "Z", "hRes", "sRes", "uRes", "aRes", "gRes", "quality", "T", "P"],
  ["h", "s"],
  ["h", "s", "rho", "u", "a", "g", "rhoMass"],
  ["h", "s", "cp", "w", "cpRes", "cvRes", "hRes"],
];

const qualityOf = (label: string) => (label === "vapor" ? 1 : label === "liquid" ? 0 : NaN);

function checkGrid(
  fluid: Fluid,
  Ts: readonly number[],
  Ps: readonly number[],
  x: number[] | undefined,
  properties: readonly SweepProperty[],
) {
  sweepGridAgainstStates(fluid, Ts, Ps, x, properties, undefined, (values, k, st, T, P) => {
    for (const p of properties) {
      const expected = p === "P" ? P : p === "quality" ? qualityOf(st.phase) : GET[p]!(st);
      expect(Object.is(values[p]![k], expected), `${p} at ${T} K, ${P} Pa`).toBe(true);
    }
  });
}

describe("monicCubicRootsInto equals realCubicRootsInto to the last bit", () => {
  const a = new Float64Array(3);
  const b = new Float64Array(3);
  const c = new Float64Array(3);
  function same(c2: number, c1: number, c0: number) {
    a.fill(-7);
    b.fill(-7);
    const n = realCubicRootsInto(1, c2, c1, c0, a);
    c[0] = c2;
    c[1] = c1;
    c[2] = c0;
    const m = monicCubicRootsInto(c, b);
    expect(m).toBe(n);
    for (let k = 0; k < n; k++) expect(Object.is(b[k], a[k])).toBe(true);
  }

  it("random coefficients, and cubics with three chosen real roots", () => {
    const num = fc.double({ min: -1e3, max: 1e3, noNaN: true });
    fc.assert(
      fc.property(num, num, num, (c2, c1, c0) => same(c2, c1, c0)),
      { numRuns: 500 },
    );
    const root = fc.double({ min: -10, max: 10, noNaN: true });
    fc.assert(
      fc.property(root, root, root, (r1, r2, r3) =>
        same(-(r1 + r2 + r3), r1 * r2 + r1 * r3 + r2 * r3, -(r1 * r2 * r3)),
      ),
      { numRuns: 500 },
    );
    // near-double roots (the middle root's magnitude close to the largest), double and triple
    // roots, all zero, a rescaled cubic
    for (const [r1, r2, r3] of [
      [-2, 1, 1 + 1e-9],
      [-2, 1 - 1e-7, 1],
      [-1, -1 + 1e-10, 2],
      [0.5, 0.5 + 1e-12, -1],
    ]) {
      same(-(r1 + r2 + r3), r1 * r2 + r1 * r3 + r2 * r3, -(r1 * r2 * r3));
    }
    same(-3, 3, -1);
    same(-4, 5, -2);
    same(0, 0, 0);
    same(-3e6, 2e12, -1e17);
  });

  it("refuses a non-finite coefficient as realCubicRootsInto does", () => {
    c[0] = 1;
    c[1] = NaN;
    c[2] = 0;
    expect(() => monicCubicRootsInto(c, b)).toThrow(/c1/);
  });
});

describe("the cubic row kernel equals stateAtTP for every extent", () => {
  for (const model of ["peng-robinson", "soave-redlich-kwong"] as const) {
    const fluid = defineFluid({ components: ["methane"], model });
    it(`${model} methane: three-root region, supercritical, every property set`, () => {
      // 100-190 K below Tc (three roots at moderate P), 150-600 K above
      const Ts = [100, 120.5, 150, 170.25, 185, 190.56, 200, 350.5, 600];
      const Ps = [1e4, 2e5, 1e6, 2.5e6, 4.599e6, 1e7, 3e7];
      for (const set of SETS) checkGrid(fluid, Ts, Ps, undefined, set);
      fc.assert(
        fc.property(axis(95, 620, 5), axis(1e3, 40e6, 5), fc.constantFrom(...SETS), (T, P, set) =>
          checkGrid(fluid, T, P, undefined, set),
        ),
        { numRuns: 25 },
      );
    });
  }

  it("a ten-component-like mixture without a phase check (labels by the PIP)", () => {
    const { fluid, x } = fiveComponentGas();
    for (const set of SETS) checkGrid(fluid, [150, 240.5, 340.25], [1e5, 3e6, 12e6], x, set);
  });

  it("point lists (a new temperature at every point) equal stateAtTP", () => {
    const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
    const pair = fc.tuple(
      fc.double({ min: 95, max: 620, noNaN: true }),
      fc.double({ min: 1e3, max: 40e6, noNaN: true }),
    );
    fc.assert(
      fc.property(
        fc.array(pair, { minLength: 1, maxLength: 12 }),
        fc.constantFrom(...SETS),
        (pts, set) => {
          const r = fluid.sweep({
            specification: "TP",
            layout: "pairs",
            first: pts.map((p) => p[0]),
            second: pts.map((p) => p[1]),
            properties: [...set],
          });
          pts.forEach(([T, P], k) => {
            const st = fluid.stateAtTP(T, P);
            expect(r.errorCode[k]).toBe(0);
            expect(r.phaseKind[k]).toBe(kindOf(st.phase));
            for (const p of set) {
              const expected = p === "P" ? P : p === "quality" ? qualityOf(st.phase) : GET[p]!(st);
              expect(Object.is(r.values[p]![k], expected), `${p} at ${T} K, ${P} Pa`).toBe(true);
            }
          });
        },
      ),
      { numRuns: 30 },
    );
  });

  it("mass basis and failing points inside a row", () => {
    const fluid = defineFluid({ components: ["methane"], model: "peng-robinson" });
    const r = fluid.sweep({
      specification: "TP",
      layout: "pairs",
      first: [300, 300, 300, -1, 300, 0.5],
      second: [1e6, -5, 1e12, 1e6, 2e6, 1e6],
      basis: "mass",
      properties: ["h", "sRes", "rhoMass"],
    });
    expect(Array.from(r.errorCode)).toEqual([0, 1, 1, 1, 0, 1]);
    expect(r.errors.map((e) => e.index)).toEqual([1, 2, 3, 5]);
    for (const k of [0, 4]) {
      const st = fluid.stateAtTP(300, k === 0 ? 1e6 : 2e6);
      expect(Object.is(r.values.h![k], st.molar.h * (1 / st.molarMassKgPerMol))).toBe(true);
      expect(Object.is(r.values.sRes![k], st.residual.s * (1 / st.molarMassKgPerMol))).toBe(true);
      expect(Object.is(r.values.rhoMass![k], st.densityKgPerM3)).toBe(true);
    }
    expect(Number.isNaN(r.values.h![1])).toBe(true);
    expect(r.errors[0].message).toMatch(/pressure/i);
  });
});
