/**
 * The chart samplers on the sweep path (charts/sample/sampleSweep.ts) give the numbers of one
 * state per point (state/stateAtTP), to the last bit: Peng-Robinson ethane across its dome, the
 * CO2 reference equation (the sweep's per-state path), and a mixture whose split points are
 * left blank as before. Bad input still throws the single state's typed error.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { referenceFluidBinding } from "../../../kernel-lib/src/state/referenceStates.js";
import { stateAtTP } from "../../../kernel-lib/src/state/stateAt.js";
import type { FluidBinding, FluidState } from "../../../kernel-lib/src/state/types.js";
import { locateCriticalPoint } from "../../../kernel-lib/src/phase/criticalPoint.js";
import { mixtureSplitsAt } from "../../../kernel-lib/src/charts/sample/sampleGuard.js";
import {
  compressibilityFromFluid,
  departuresFromFluid,
  isobarOnTemperatureEntropy,
  isothermOnPressureEnthalpy,
  surfaceFromFluid,
} from "../../../kernel-lib/src/charts/sample/index.js";
import { linearGrid, logGrid } from "../../../kernel-lib/src/charts/sampling.js";
import { InputError, OutOfRangeError } from "../../../kernel-lib/src/errors.js";

/** The value of one state per point, as the samplers computed it before the sweep path. */
function perState(
  b: FluidBinding,
  T: number,
  P: number,
  x: readonly number[],
  pick: (s: FluidState) => number,
): number {
  let s: FluidState;
  try {
    s = stateAtTP(b, T, P, x);
  } catch {
    return NaN;
  }
  return mixtureSplitsAt(b.model, T, P, x) ? NaN : pick(s);
}

function expectSame(actual: number, expected: number, where: string): void {
  // Object.is: the same bits (and NaN where the per-state path has no value)
  if (!Object.is(actual, expected)) throw new Error(`${where}: ${actual} !== ${expected}`);
}

// ethane (Tc 305.3 K): isotherms below and above Tc, pressures across the vapour pressure
const ethane = defineFluid({
  components: ["ethane"],
  model: "peng-robinson",
  idealGas: "molecular",
});
const TS = [200, 250, 290, 320, 400];
const PS = logGrid(1e4, 2e7, 23);

describe("samplers on the sweep path equal one state per point", () => {
  it("departures (same T and P): h, s, u, a, g, density, and P exactly as given", () => {
    const curves = departuresFromFluid(ethane, TS, PS);
    for (const c of curves) {
      const points = c.points.filter((p) => PS.includes(p.pressurePa as number));
      expect(points.length).toBe(PS.length);
      points.forEach((p, j) => {
        const where = `T = ${c.temperatureK}, P = ${PS[j]}`;
        expect(p.pressurePa).toBe(PS[j]);
        const s = stateAtTP(ethane, c.temperatureK, PS[j], [1]);
        expectSame(p.h as number, s.residual.h, `${where} h`);
        expectSame(p.s as number, s.residual.s, `${where} s`);
        expectSame(p.u as number, s.residual.u, `${where} u`);
        expectSame(p.a as number, s.residual.a, `${where} a`);
        expectSame(p.g as number, s.residual.g, `${where} g`);
        expectSame(p.densityMolPerM3 as number, s.densityMolPerM3, `${where} rho`);
      });
    }
  });

  it("a property surface by sweep property equals the same surface picked from states", () => {
    const temps = linearGrid(200, 400, 9);
    const swept = surfaceFromFluid(ethane, temps, PS, {
      name: "Enthalpy",
      kind: "molarEnergy",
      property: "h",
    });
    const picked = surfaceFromFluid(ethane, temps, PS, {
      name: "Enthalpy",
      kind: "molarEnergy",
      pick: (s) => s.molar.h,
    });
    temps.forEach((T, i) =>
      PS.forEach((P, j) => {
        expectSame(swept.values[i][j], picked.values[i][j], `T = ${T}, P = ${P}`);
        expect(Number.isFinite(swept.values[i][j])).toBe(true);
      }),
    );
    expect(swept.domeWarnings).toEqual([]);
  });

  it("compressibility Z and the P-h and T-s lines", () => {
    const cp = locateCriticalPoint(ethane.model);
    const z = compressibilityFromFluid(ethane, [0.8, 1.05, 2], linearGrid(0.05, 5, 12));
    for (const curve of z) {
      for (const p of curve.points) {
        const T = curve.reducedTemperature * cp.temperatureK;
        const P = p.reducedPressure * cp.pressurePa;
        expectSame(p.z, stateAtTP(ethane, T, P, [1]).Z, `Z at Tr ${curve.reducedTemperature}`);
      }
    }
    const iso = isothermOnPressureEnthalpy(ethane, 250, PS);
    for (const p of iso.points.filter((q) => PS.includes(q.pressurePa))) {
      expectSame(p.enthalpyJPerMol, stateAtTP(ethane, 250, p.pressurePa, [1]).molar.h, "P-h");
    }
    const isobar = isobarOnTemperatureEntropy(ethane, 2e6, TS);
    for (const p of isobar.points.filter((q) => TS.includes(q.temperatureK))) {
      expectSame(p.entropyJPerMolK, stateAtTP(ethane, p.temperatureK, 2e6, [1]).molar.s, "T-s");
    }
  });

  it("the CO2 reference equation (the sweep's per-state path)", () => {
    const co2 = referenceFluidBinding(referenceFluid("carbon-dioxide"));
    const temps = [250, 300, 310];
    const ps = logGrid(5e5, 1.5e7, 9);
    const dep = departuresFromFluid(co2, temps, ps);
    dep.forEach((c) =>
      c.points
        .filter((p) => ps.includes(p.pressurePa as number))
        .forEach((p) => {
          const s = stateAtTP(co2, c.temperatureK, p.pressurePa as number, [1]);
          expectSame(p.h as number, s.residual.h, `CO2 ${c.temperatureK} K h`);
          expectSame(p.s as number, s.residual.s, `CO2 ${c.temperatureK} K s`);
        }),
    );
  });

  it("a mixture: split points blank and counted as before, the rest equal", () => {
    // methane + n-butane 50/50 splits at 300 K between roughly 0.3 and 10 MPa (Peng-Robinson)
    const gas = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
    const x = [0.5, 0.5];
    const temps = [280, 330, 420];
    const ps = logGrid(1e5, 1.5e7, 7);
    const swept = surfaceFromFluid(
      gas,
      temps,
      ps,
      { name: "Z", kind: "dimensionless", property: "Z" },
      { x },
    );
    const picked = surfaceFromFluid(
      gas,
      temps,
      ps,
      { name: "Z", kind: "dimensionless", pick: (s) => s.Z },
      { x },
    );
    let blank = 0;
    temps.forEach((T, i) =>
      ps.forEach((P, j) => {
        const v = swept.values[i][j];
        expectSame(v, picked.values[i][j], `T = ${T}, P = ${P}`);
        expectSame(
          v,
          perState(gas, T, P, x, (s) => s.Z),
          `T = ${T}, P = ${P} per state`,
        );
        if (Number.isNaN(v)) blank++;
      }),
    );
    expect(blank).toBeGreaterThan(0);
    expect(swept.domeWarnings).toEqual(picked.domeWarnings);
    expect(swept.domeWarnings[0]).toMatch(new RegExp(`^${blank} of ${temps.length * ps.length}`));
  });

  it("bad input still throws the typed error; a quantity needs a property or a pick", () => {
    expect(() =>
      surfaceFromFluid(ethane, [300], [1e5, 2e10], {
        name: "h",
        kind: "molarEnergy",
        property: "h",
      }),
    ).toThrow(OutOfRangeError);
    expect(() =>
      surfaceFromFluid(ethane, [300], [1e5], {
        name: "h",
        kind: "molarEnergy",
        property: "enthalpy" as never,
      }),
    ).toThrow(InputError);
    expect(() =>
      surfaceFromFluid(ethane, [300], [1e5], { name: "h", kind: "molarEnergy" }),
    ).toThrow(InputError);
  });

  it("progress is reported once per point", () => {
    let calls = 0;
    let last = 0;
    surfaceFromFluid(
      ethane,
      [250, 300],
      PS,
      { name: "h", kind: "molarEnergy", property: "h" },
      {
        onProgress: (done, total) => {
          calls++;
          last = done;
          expect(total).toBe(2 * PS.length);
        },
      },
    );
    expect(calls).toBe(2 * PS.length);
    expect(last).toBe(2 * PS.length);
  });
});
