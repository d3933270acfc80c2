/**
 * Sweeps give the numbers of the single-state API. Stated tolerance: exact (Object.is, to the
 * last bit) for every path, because the lean path runs the same steps and formulas as stateAtTP
 * (state/stateValuesAt.ts) and the other paths call the single-state functions themselves.
 * Random grids and point lists (fast-check) over every built-in model, pure and mixed.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { defineFluid, type Fluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { MODEL_IDS } from "../../../kernel-lib/src/eos/createModel.js";
import type { FluidState } from "../../../kernel-lib/src/state/types.js";
import type { SweepProperty, SweepResult } from "../../../kernel-lib/src/sweep/types.js";
import { overallProperty } from "../../../kernel-lib/src/phase/flash/stateFunctionFlash.js";

const SINGLE: readonly [SweepProperty, (s: FluidState) => number][] = [
  ["rho", (s) => s.densityMolPerM3],
  ["Z", (s) => s.Z],
  ["h", (s) => s.molar.h],
  ["s", (s) => s.molar.s],
  ["u", (s) => s.molar.u],
  ["a", (s) => s.molar.a],
  ["g", (s) => s.molar.g],
  ["cp", (s) => s.molar.cp],
  ["cv", (s) => s.molar.cv],
  ["w", (s) => s.speedOfSoundMPerS],
  ["jt", (s) => s.jouleThomsonKPerPa],
  ["kappaT", (s) => s.isothermalCompressibilityPerPa],
  ["beta", (s) => s.thermalExpansionPerK],
  ["hRes", (s) => s.residual.h],
  ["sRes", (s) => s.residual.s],
  ["uRes", (s) => s.residual.u],
  ["aRes", (s) => s.residual.a],
  ["gRes", (s) => s.residual.g],
  ["cpRes", (s) => s.residual.cp],
  ["cvRes", (s) => s.residual.cv],
];

/** Sorted distinct values in [lo, hi] (a random axis). */
const axis = (lo: number, hi: number, max: number) =>
  fc
    .uniqueArray(fc.double({ min: lo, max: hi, noNaN: true }), { minLength: 1, maxLength: max })
    .map((v) => v.sort((p, q) => p - q));

function compareSingle(
  r: SweepResult,
  k: number,
  st: FluidState,
  props: readonly [SweepProperty, (s: FluidState) => number][],
) {
  expect(r.errorCode[k]).toBe(0);
  expect(r.phaseCount[k]).toBe(1);
  for (const [p, get] of props) {
    expect(Object.is(r.values[p]![k], get(st)), `${p} at point ${k}`).toBe(true);
  }
}

const fluids = new Map<string, Fluid>();
function fluidOf(model: string, components: string[]): Fluid {
  const key = `${model}/${components.join(",")}`;
  let f = fluids.get(key);
  if (!f) {
    f = defineFluid({ components, model: model as never });
    fluids.set(key, f);
  }
  return f;
}

describe("a (T, P) sweep equals stateAtTP point by point", () => {
  for (const model of MODEL_IDS) {
    it(`${model}, pure methane, every property`, () => {
      const fluid = fluidOf(model, ["methane"]);
      const few = model === "lee-kesler" ? 3 : 6;
      fc.assert(
        fc.property(axis(150, 600, few), axis(1e4, 30e6, few), (Ts, Ps) => {
          const r = fluid.sweep({
            specification: "TP",
            first: Ts,
            second: Ps,
            properties: SINGLE.map(([p]) => p),
          });
          expect(r.count).toBe(Ts.length * Ps.length);
          for (let i = 0; i < Ts.length; i++) {
            for (let j = 0; j < Ps.length; j++) {
              const k = i * Ps.length + j;
              let st: FluidState;
              try {
                st = fluid.stateAtTP(Ts[i], Ps[j]);
              } catch (e) {
                // where the single state fails, the point carries the code of that failure
                expect(r.errorCode[k]).toBe(
                  (e as { code?: string }).code === "phase-unavailable" ? 2 : 1,
                );
                expect(Number.isNaN(r.values.h![k])).toBe(true);
                continue;
              }
              compareSingle(r, k, st, SINGLE);
            }
          }
        }),
        { numRuns: model === "lee-kesler" ? 3 : 10 },
      );
    });
  }

  it("Peng-Robinson and SRK mixtures, points proven one phase: the lean path is exact", () => {
    for (const model of ["peng-robinson", "soave-redlich-kwong"]) {
      const fluid = fluidOf(model, ["methane", "ethane", "propane"]);
      const x = [0.8, 0.15, 0.05];
      fc.assert(
        fc.property(axis(330, 600, 4), axis(1e5, 20e6, 4), (Ts, Ps) => {
          const r = fluid.sweep({
            specification: "TP",
            first: Ts,
            second: Ps,
            x,
            phaseCheck: "stability",
            properties: SINGLE.map(([p]) => p),
          });
          for (let i = 0; i < Ts.length; i++) {
            for (let j = 0; j < Ps.length; j++) {
              const k = i * Ps.length + j;
              expect(fluid.stabilityAtTP(Ts[i], Ps[j], x).stable).toBe(true);
              compareSingle(r, k, fluid.stateAtTP(Ts[i], Ps[j], x), SINGLE);
            }
          }
        }),
        { numRuns: 5 },
      );
    }
  });
});

describe("mixture points that split are flashed, never silently one phase", () => {
  it("methane + n-butane across its two-phase region: phases, quality and overall h equal flashTP", () => {
    const fluid = fluidOf("peng-robinson", ["methane", "n-butane"]);
    const x = [0.7, 0.3];
    const Ts = [250.5, 280.5, 320.5, 420.5];
    const Ps = [5e5, 20e5, 60e5];
    const r = fluid.sweep({
      specification: "TP",
      first: Ts,
      second: Ps,
      x,
      properties: ["h", "s", "rho", "quality", "cp"],
    });
    let split = 0;
    for (let i = 0; i < Ts.length; i++) {
      for (let j = 0; j < Ps.length; j++) {
        const k = i * Ps.length + j;
        const eq = fluid.flashTP(Ts[i], Ps[j], x);
        expect(r.phaseCount[k]).toBe(eq.phases.length);
        expect(Object.is(r.values.h![k], overallProperty(eq, "h"))).toBe(true);
        expect(Object.is(r.values.s![k], overallProperty(eq, "s"))).toBe(true);
        expect(r.values.rho![k]).toBeCloseTo(1 / overallProperty(eq, "v"), 9);
        if (eq.phases.length > 1) {
          split++;
          expect(r.phaseKind[k]).toBe(4); // vapour + liquid
          const vapor = eq.phases.find((p) => p.kind === "vapor")!;
          expect(r.values.quality![k]).toBe(vapor.amount);
          expect(Number.isNaN(r.values.cp![k])).toBe(true);
        }
      }
    }
    // 280 K, 20 bar lies inside the envelope of this mixture (Peng-Robinson; common practice
    // for methane/butane mixtures, checked by the flash above): some points must split
    expect(split).toBeGreaterThan(0);
  });
});

describe("(T, rho), (P, h) and (P, s) sweeps", () => {
  it("(T, rho) of pure methane: one phase equals stateAtTRho, inside the dome the lever rule", () => {
    const fluid = fluidOf("peng-robinson", ["methane"]);
    const Ts = [150.5, 170.5, 250.5];
    const rhos = [100, 5000, 20000];
    const r = fluid.sweep({
      specification: "TRho",
      first: Ts,
      second: rhos,
      properties: ["h", "P", "quality"],
    });
    for (let i = 0; i < Ts.length; i++) {
      for (let j = 0; j < rhos.length; j++) {
        const k = i * rhos.length + j;
        expect(r.errorCode[k]).toBe(0);
        if (r.phaseCount[k] === 1) {
          const st = fluid.stateAtTRho(Ts[i], rhos[j]);
          expect(Object.is(r.values.h![k], st.molar.h)).toBe(true);
        } else {
          expect(r.phaseCount[k]).toBe(2);
          const q = r.values.quality![k];
          expect(q > 0 && q < 1).toBe(true);
        }
      }
    }
    // 150.5 K, 5000 mol/m3 is inside the methane dome (Tc 190.6 K; saturated liquid about
    // 24,000 and vapour about 1,600 mol/m3 at 150 K, from memory of the NIST Webbook)
    expect(r.phaseCount[1]).toBe(2);
  });

  it("(P, h) and (P, s) of pure methane and a mixture equal flashPH and flashPS", () => {
    for (const [components, x] of [
      [["methane"], [1]],
      [
        ["methane", "propane"],
        [0.9, 0.1],
      ],
    ] as const) {
      const fluid = fluidOf("peng-robinson", [...components]);
      const P = [20e5, 50e5];
      const hs = [300.5, 200.5].map((T) => fluid.stateAtTP(T, 10e5, [...x]).molar);
      const rh = fluid.sweep({
        specification: "PH",
        layout: "pairs",
        first: P,
        second: hs.map((m) => m.h),
        x: [...x],
        properties: ["T", "h"],
      });
      const rs = fluid.sweep({
        specification: "PS",
        layout: "pairs",
        first: P,
        second: hs.map((m) => m.s),
        x: [...x],
        properties: ["T", "s"],
      });
      for (let k = 0; k < P.length; k++) {
        const eh = fluid.flashPH(P[k], hs[k].h, [...x]);
        const es = fluid.flashPS(P[k], hs[k].s, [...x]);
        expect(rh.errorCode[k]).toBe(0);
        expect(Object.is(rh.values.T![k], eh.temperatureK)).toBe(true);
        expect(Object.is(rs.values.T![k], es.temperatureK)).toBe(true);
        expect(rh.phaseCount[k]).toBe(eh.phases.length);
      }
    }
  });
});

describe("per-point errors never stop a sweep", () => {
  it("a negative temperature and an impossible pressure are coded, the rest computed", () => {
    const fluid = fluidOf("peng-robinson", ["methane"]);
    const r = fluid.sweep({
      specification: "TP",
      layout: "pairs",
      first: [300, -5, 300],
      second: [1e6, 1e6, 1e12],
      properties: ["h"],
    });
    expect(Array.from(r.errorCode)).toEqual([0, 1, 1]);
    expect(r.failed).toBe(2);
    expect(Number.isNaN(r.values.h![1])).toBe(true);
    expect(r.values.h![0]).toBe(fluid.stateAtTP(300, 1e6).molar.h);
    expect(r.errors.map((e) => e.index)).toEqual([1, 2]);
    expect(r.errors[0].message).toMatch(/temperature/i);
  });

  it("a malformed request is refused as a whole with the field named", () => {
    const fluid = fluidOf("peng-robinson", ["methane"]);
    expect(() =>
      fluid.sweep({
        specification: "TP",
        first: [300],
        second: [1e5],
        properties: ["hh" as never],
      }),
    ).toThrow(/properties\[0\]/);
    expect(() =>
      fluid.sweep({
        specification: "TP",
        layout: "pairs",
        first: [300, 310],
        second: [1e5],
        properties: ["h"],
      }),
    ).toThrow(/second/);
  });

  it("mass basis divides energies by the molar mass and leaves densities per volume", () => {
    const fluid = fluidOf("peng-robinson", ["methane"]);
    const r = fluid.sweep({
      specification: "TP",
      first: [300.5],
      second: [5e6],
      basis: "mass",
      properties: ["h", "rhoMass", "T"],
    });
    const st = fluid.stateAtTP(300.5, 5e6);
    expect(r.values.h![0]).toBeCloseTo(st.mass.h, 9);
    expect(r.values.rhoMass![0]).toBe(st.densityKgPerM3);
    expect(r.units.h).toBe("J/kg");
  });
});

describe("the property ids of the write loop", () => {
  it("follow SWEEP_PROPERTIES", async () => {
    const { PROPERTY_ID } = await import("../../../kernel-lib/src/sweep/runSweep.js");
    const { SWEEP_PROPERTIES } = await import("../../../kernel-lib/src/sweep/types.js");
    expect(Object.keys(PROPERTY_ID)).toEqual(SWEEP_PROPERTIES);
    expect(Object.values(PROPERTY_ID)).toEqual(SWEEP_PROPERTIES.map((_, i) => i));
  });
});
