/**
 * Bad-input issue item 2: (P, h) and (P, s) states recover the temperature of every single-phase
 * state they are given, for several models (Peng-Robinson, Soave-Redlich-Kwong, the virial
 * equation, and the reference equations of water and CO2), through the dome-aware functions
 * (phase/twoPhaseState.ts) and the plain single-phase inversions (state/inversions.ts) with
 * their default start. The states are random (fast-check) within each model's evaluable range:
 * the whole ideal-gas heat-capacity range of the component (the virial inversions once stopped at
 * a fixed 3000 K) and, for the reference equations, the
 * published range; pressures from 1 kPa to 3 Pc.
 */
import { afterAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { referenceFluidBinding } from "../../../kernel-lib/src/state/referenceStates.js";
import { pureFluidStateTP } from "../../../kernel-lib/src/phase/pureFluidPhase.js";
import {
  stateAtPressureEnthalpy,
  stateAtPressureEntropy,
} from "../../../kernel-lib/src/phase/twoPhaseState.js";
import { temperatureAtPH, temperatureAtPS } from "../../../kernel-lib/src/state/inversions.js";
import { stateAtTP } from "../../../kernel-lib/src/state/stateAt.js";
import type { FluidBinding, FluidState } from "../../../kernel-lib/src/state/types.js";
import { PhaseUnavailableError } from "../../../kernel-lib/src/errors.js";

interface Case {
  label: string;
  binding: FluidBinding;
  tMin: number;
  tMax: number;
  pc: number;
  /** The model has a vapour-liquid dome (the dome-aware functions apply). */
  dome: boolean;
}

function engineCase(model: "peng-robinson" | "soave-redlich-kwong" | "virial", id: string): Case {
  const fluid = defineFluid({ components: [id], model });
  const range = fluid.idealGas.components[0].validTemperatureK;
  const c = fluid.components[0];
  return {
    label: `${model} ${id}`,
    binding: fluid,
    tMin: range.min,
    tMax: range.max,
    pc: c.criticalPressurePa,
    dome: model !== "virial",
  };
}

function referenceCase(id: string): Case {
  const fluid = referenceFluid(id);
  const v = fluid.data.validity.temperatureK;
  return {
    label: `reference ${id}`,
    binding: referenceFluidBinding(fluid),
    tMin: v.min,
    tMax: v.max,
    pc: fluid.critical.pressurePa,
    dome: true,
  };
}

const cases: Case[] = [
  engineCase("peng-robinson", "n-pentane"),
  engineCase("peng-robinson", "hydrogen"),
  engineCase("peng-robinson", "methane"),
  engineCase("soave-redlich-kwong", "propane"),
  engineCase("virial", "methane"),
  engineCase("virial", "ethane"),
  engineCase("virial", "nitrogen"),
  referenceCase("water"),
  referenceCase("carbon-dioxide"),
];

let checked = 0;
afterAll(() => {
  // how many random single-phase states went through the round trips
  console.log(`(P, h) and (P, s) round trips: ${checked} states checked`);
});

function stateOf(c: Case, T: number, P: number): FluidState | undefined {
  try {
    return c.dome ? pureFluidStateTP(c.binding, T, P) : stateAtTP(c.binding, T, P, [1]);
  } catch (e) {
    // on the saturation line (T, P) does not fix the state; the virial equation has no root at
    // some (T, P) (truncated after B): not a single-phase state, so nothing to invert
    if (e instanceof PhaseUnavailableError || (!c.dome && e instanceof Error)) return undefined;
    throw e;
  }
}

const RUNS = 100;

describe("(P, h) and (P, s) round trips over random single-phase states", () => {
  for (const c of cases) {
    it(c.label, () => {
      let here = 0;
      fc.assert(
        fc.property(
          fc.double({ min: 0, max: 1, noNaN: true }),
          fc.double({ min: 0, max: 1, noNaN: true }),
          (u, v) => {
            const T = c.tMin * Math.pow(c.tMax / c.tMin, u);
            const P = 1e3 * Math.pow((3 * c.pc) / 1e3, v);
            const s = stateOf(c, T, P);
            if (!s) return;
            here++;
            const tol = 1e-6;
            if (c.dome) {
              const rh = stateAtPressureEnthalpy(c.binding, P, s.molar.h);
              const rs = stateAtPressureEntropy(c.binding, P, s.molar.s);
              expect(rh.kind).toBe("single-phase");
              expect(rs.kind).toBe("single-phase");
              if (rh.kind === "single-phase") {
                expect(Math.abs(rh.state.temperatureK - T)).toBeLessThan(tol);
              }
              if (rs.kind === "single-phase") {
                expect(Math.abs(rs.state.temperatureK - T)).toBeLessThan(tol);
              }
            }
            const ph = temperatureAtPH(c.binding, P, s.molar.h, [1]);
            const ps = temperatureAtPS(c.binding, P, s.molar.s, [1]);
            expect(Math.abs(ph.temperatureK - T)).toBeLessThan(tol);
            expect(Math.abs(ps.temperatureK - T)).toBeLessThan(tol);
          },
        ),
        { numRuns: RUNS, seed: 20261204 },
      );
      checked += here;
      // most draws are single-phase states (a draw on the saturation line is skipped)
      expect(here).toBeGreaterThan(RUNS / 2);
    });
  }
});

describe("the states of the bad-input report", () => {
  it("Peng-Robinson n-pentane, compressed liquid at 201.07 K, 1.83 MPa", () => {
    const pent = defineFluid({ components: ["n-pentane"] });
    const T = 201.07346089789644;
    const P = 1827762.7682123152;
    const r = stateAtPressureEnthalpy(pent, P, pent.stateAtTP(T, P).molar.h);
    expect(r.kind === "single-phase" && Math.abs(r.state.temperatureK - T)).toBeLessThan(1e-6);
  });
  it("reference water, liquid at 290.83 K, 1.87 MPa", () => {
    const water = referenceFluid("water");
    const b = referenceFluidBinding(water);
    const T = 290.83173425853255;
    const P = 1865573.7474181454;
    const r = stateAtPressureEnthalpy(b, P, pureFluidStateTP(b, T, P).molar.h);
    expect(r.kind === "single-phase" && Math.abs(r.state.temperatureK - T)).toBeLessThan(1e-6);
  });
  it("Peng-Robinson hydrogen at 500 K, 1 MPa (saturation at 31 K is outside its cp range)", () => {
    const h2 = defineFluid({ components: ["hydrogen"] });
    const r = stateAtPressureEnthalpy(h2, 1e6, h2.stateAtTP(500, 1e6).molar.h);
    expect(r.kind === "single-phase" && Math.abs(r.state.temperatureK - 500)).toBeLessThan(1e-6);
  });
  it("a target beyond every evaluable temperature fails naming why", () => {
    const pr = defineFluid({ components: ["methane"] });
    expect(() => temperatureAtPH(pr, 1e5, 1e9, [1])).toThrow(/above|range/);
  });
});
