/**
 * No mixture state is reported single-phase inside the two-phase region without a warning
 * (issue 12, "Done when"), and failure mode (4) of its "Why": a (P, h) calculation of a mixture
 * returning a temperature off by kelvins without saying so. The gas is the ten-component rich
 * gas of the benchmarks (invented demo composition), let down through a valve from 80 barg and
 * 60 degC to 10 barg: the flash finds gas and condensate at about 19.6 degC; the single-phase
 * inversion finds about 14.2 degC on the metastable vapour branch, which must carry a warning.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import {
  PHASE_SPLIT_NOT_TESTED,
  temperatureAtPH,
  temperatureAtPS,
} from "../../../kernel-lib/src/state/inversions.js";
import { runEvalRequest } from "../../../kernel-lib/src/cli/eval.js";
import { surfaceFromFluid } from "../../../kernel-lib/src/charts/sample/surfaceFromFluid.js";
import {
  compressibilityFromFluid,
  departuresFromFluid,
} from "../../../kernel-lib/src/charts/sample/index.js";
import { departureChart } from "../../../kernel-lib/src/charts/departures.js";
import { propertySurfaceChart } from "../../../kernel-lib/src/charts/propertySurface.js";
import { chartMeta } from "../../../kernel-lib/src/charts/chartSpec.js";

const TEN = [
  "nitrogen",
  "carbon-dioxide",
  "methane",
  "ethane",
  "propane",
  "isobutane",
  "n-butane",
  "isopentane",
  "n-pentane",
  "n-hexane",
];
const X10 = [0.02, 0.03, 0.7, 0.1, 0.06, 0.02, 0.03, 0.015, 0.015, 0.01];
const gas = defineFluid({ components: TEN, model: "peng-robinson" });
const P_ATM = 101325;
const inlet = gas.stateAtTP(333.15, 80e5 + P_ATM, X10);
const P_OUT = 10e5 + P_ATM;
const codes = (ws: readonly { code: string }[]) => ws.map((w) => w.code);

describe("(P, h) and (P, s) of a mixture inside the two-phase region", () => {
  it("(4) the valve outlet: the flash splits, and the single-phase inversion says it is not the answer", () => {
    expect(codes(inlet.warnings)).not.toContain("phase-split");
    const flash = gas.flashPH(P_OUT, inlet.molar.h, X10);
    expect(flash.phases.map((p) => p.kind)).toEqual(["vapor", "liquid"]);
    const single = gas.temperatureAtPH(P_OUT, inlet.molar.h, X10);
    // the metastable vapour branch is kelvins away from the equilibrium temperature ...
    expect(Math.abs(single.temperatureK - flash.temperatureK)).toBeGreaterThan(2);
    // ... and says so: a "phase-split" warning naming the flash, no untested note left
    expect(codes(single.state.warnings)).toContain("phase-split");
    expect(single.state.warnings.find((w) => w.code === "phase-split")!.message).toMatch(
      /not stable as one phase.*flashTP/,
    );
    expect(single.state.warnings.map((w) => w.message)).not.toContain(PHASE_SPLIT_NOT_TESTED);
  });

  it("an isentropic expansion into the dome warns the same way", () => {
    const flash = gas.flashPS(P_OUT, inlet.molar.s, X10);
    expect(flash.phases.length).toBe(2);
    const single = gas.temperatureAtPS(P_OUT, inlet.molar.s, X10);
    expect(codes(single.state.warnings)).toContain("phase-split");
  });

  it("outside the dome the inversion carries no phase-split warning", () => {
    const hot = gas.stateAtTP(400, 30e5, X10);
    const back = gas.temperatureAtPH(30e5, hot.molar.h, X10);
    expect(Math.abs(back.temperatureK - 400)).toBeLessThan(1e-6);
    expect(codes(back.state.warnings)).not.toContain("phase-split");
    expect(back.state.warnings.map((w) => w.message)).not.toContain(PHASE_SPLIT_NOT_TESTED);
  });

  it("the state layer's inversion of a mixture says that it did not test the split", () => {
    const r = temperatureAtPH(gas, P_OUT, inlet.molar.h, X10);
    expect(r.state.warnings.map((w) => w.message)).toContain(PHASE_SPLIT_NOT_TESTED);
    const s = temperatureAtPS(gas, P_OUT, inlet.molar.s, X10);
    expect(s.state.warnings.map((w) => w.message)).toContain(PHASE_SPLIT_NOT_TESTED);
    // a pure fluid has nothing to split at a single-phase result: no note
    const methane = defineFluid({ components: ["methane"], model: "peng-robinson" });
    const h = methane.stateAtTP(300, 50e5).molar.h;
    expect(temperatureAtPH(methane, 50e5, h, [1]).state.warnings).toEqual([]);
  });
});

describe("stateAtTP of a mixture inside the two-phase region", () => {
  it("warns phase-split by default; checkStability: false skips the test", () => {
    const inside = gas.stateAtTP(250, 50e5, X10);
    expect(codes(inside.warnings)).toContain("phase-split");
    const skipped = gas.stateAtTP(250, 50e5, X10, { checkStability: false });
    expect(codes(skipped.warnings)).not.toContain("phase-split");
    // a trace of a second component is still a mixture
    const c1c4 = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
    expect(codes(c1c4.stateAtTP(280, 20e5, [0.7, 0.3]).warnings)).toContain("phase-split");
    // one component present: the state layer's own phase logic, no mixture test
    expect(codes(c1c4.stateAtTP(280, 20e5, [1, 0]).warnings)).not.toContain("phase-split");
  });

  it("isochor eval: a (T, P) state of a mixture inside the dome carries the warning by default", () => {
    const response = runEvalRequest({
      model: "peng-robinson",
      components: TEN,
      x: X10,
      states: [{ T: 250, P: 50e5 }],
    });
    const st = response.states[0] as { warnings?: string[] };
    expect(st.warnings?.some((w) => /not stable as one phase/.test(w))).toBe(true);
  });
});

describe("the property-surface sampler of a mixture", () => {
  const c1c4 = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
  const Z = {
    name: "Compressibility factor Z",
    kind: "dimensionless" as const,
    pick: (st: { Z: number }) => st.Z,
  };
  const temps = [250, 280, 310, 340, 370, 400];
  const pressures = [5e5, 10e5, 20e5, 40e5, 60e5];
  it("blanks the cells inside the two-phase region and says so in the chart's warnings", () => {
    const surf = surfaceFromFluid(c1c4, temps, pressures, Z, { x: [0.7, 0.3] });
    let blank = 0;
    surf.values.forEach((row, i) =>
      row.forEach((v, j) => {
        // every blank cell is one the flash splits, every filled one a single phase
        const phases = c1c4.flashTP(temps[i], pressures[j], [0.7, 0.3]).phases.length;
        if (Number.isNaN(v)) {
          blank++;
          expect(phases, `${temps[i]} K, ${pressures[j]} Pa`).toBeGreaterThan(1);
        } else expect(phases, `${temps[i]} K, ${pressures[j]} Pa`).toBe(1);
      }),
    );
    expect(blank).toBeGreaterThan(0);
    expect(surf.domeWarnings.join(" ")).toMatch(
      new RegExp(`^${blank} of 30 grid points lie in the two-phase region`),
    );
    const spec = propertySurfaceChart(surf, { levels: 4 });
    expect(chartMeta(spec)!.warnings.join(" ")).toMatch(/two-phase region of this mixture/);
  });
  it("without the test the cells are filled and the warning says the split was not tested", () => {
    const surf = surfaceFromFluid(c1c4, temps, pressures, Z, {
      x: [0.7, 0.3],
      checkStability: false,
    });
    expect(surf.values.flat().every((v) => Number.isFinite(v))).toBe(true);
    expect(surf.domeWarnings.join(" ")).toMatch(/without the stability test/);
  });
  it("a pure fluid has no such warning", () => {
    const surf = surfaceFromFluid(c1c4, [300, 400], [1e5, 2e5], Z, { x: [1, 0] });
    expect(surf.domeWarnings).toEqual([]);
  });
});

describe("the departure and compressibility samplers of a mixture", () => {
  const c1c4 = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
  const x = [0.7, 0.3];
  const pressures = [5e5, 20e5, 40e5];
  it("leave out the points where the mixture splits, and the chart says points were left out", () => {
    const curves = departuresFromFluid(c1c4, [280, 400], pressures, { x });
    pressures.forEach((P, j) => {
      const split = c1c4.flashTP(280, P, x).phases.length > 1;
      expect(Number.isNaN(curves[0].points[j].h), `280 K, ${P} Pa`).toBe(split);
    });
    expect(curves[0].points.some((p) => Number.isNaN(p.h))).toBe(true);
    expect(curves[1].points.every((p) => Number.isFinite(p.h))).toBe(true);
    const spec = departureChart(curves, { property: "h" });
    expect(chartMeta(spec)!.warnings.join(" ")).toMatch(/left out/);
    // reduced isotherms with given pseudo-critical constants (invented round values)
    const z = compressibilityFromFluid(c1c4, [280 / 250], [5e5 / 50e5, 20e5 / 50e5, 40e5 / 50e5], {
      x,
      criticalTemperatureK: 250,
      criticalPressurePa: 50e5,
    });
    pressures.forEach((P, j) => {
      const split = c1c4.flashTP(280, P, x).phases.length > 1;
      expect(Number.isNaN(z[0].points[j].z), `280 K, ${P} Pa`).toBe(split);
    });
  });
});
