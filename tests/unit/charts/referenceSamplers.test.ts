/**
 * The samplers on a multiparameter reference equation (Span and Wagner 1996 for CO2): no finite
 * maximum density (isotherms sample to a liquid density instead) and a lower temperature limit
 * (the dome starts at the triple point, and the chart says so).
 */
import { describe, expect, it } from "vitest";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { referenceFluidBinding } from "../../../kernel-lib/src/state/referenceStates.js";
import {
  isobarOnTemperatureEntropy,
  isothermOnPressureEnthalpy,
  isothermsFromModel,
  saturationFromModel,
} from "../../../kernel-lib/src/charts/sample/index.js";
import { linearGrid, logGrid } from "../../../kernel-lib/src/charts/sampling.js";
import { isothermChart } from "../../../kernel-lib/src/charts/isotherms.js";
import { temperatureEntropyChart } from "../../../kernel-lib/src/charts/temperatureEntropy.js";
import { chartMeta } from "../../../kernel-lib/src/charts/chartSpec.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { schemaErrors } from "./specCheck.js";
import { expectReference, referenceValue } from "../../fixtures/referenceValues.js";

// CO2 triple point 216.592 K, 0.51795 MPa, saturated liquid 1178.46 kg/m3 (from memory of Span
// and Wagner, J. Phys. Chem. Ref. Data 25 (1996) 1509); M = 44.0098 g/mol (same paper):
// tests/fixtures/span-wagner-1996-co2.json, with the "chart-sampler" tolerance of these checks.
const sw = (key: string) => referenceValue("span-wagner-1996-co2.json", key);
const M_CO2 = sw("M").value / 1000;
const T_TRIPLE = sw("triple/T").value;
const RHO_L_TRIPLE = sw("triple/rhoL").value / M_CO2; // mol/m3
const PC = sw("critical/p").value * 1e6; // Pa

describe("isothermsFromModel on the CO2 reference equation", () => {
  const co2 = referenceFluid("carbon-dioxide");

  it("samples without a finite maximum density, into the compressed liquid", () => {
    expect(co2.maxDensity(250, [1])).toBe(Infinity); // the premise of this test
    const curves = isothermsFromModel(co2, [250, 320], { points: 120 });
    for (const c of curves) {
      const rhos = c.points.map((p) => p.densityMolPerM3);
      expect(rhos.every(Number.isFinite)).toBe(true);
      // Reaches at least the triple-point liquid density: every liquid state of the chart.
      expect(Math.max(...rhos)).toBeGreaterThanOrEqual(RHO_L_TRIPLE);
      expect(Math.max(...rhos)).toBeLessThan(1.1 * RHO_L_TRIPLE);
      // The densest point is a compressed liquid above the chart's default pressure cap (2 Pc),
      // so the liquid branch runs off the top of the chart instead of stopping inside it.
      const top = c.points.reduce((a, b) => (b.densityMolPerM3 > a.densityMolPerM3 ? b : a));
      expect(top.pressurePa).toBeGreaterThan(2 * PC);
    }
    // 250 K: vapour pressure 1.7850 MPa (from memory of Span and Wagner 1996, Table 34).
    expectReference(
      curves[0].equalArea!.pressurePa / 1e6,
      sw("saturation/T250/p"),
      "chart-sampler",
    );
    expect(curves[1].equalArea).toBeUndefined(); // supercritical
  });

  it("an explicit density limit wins; a bad one is refused", () => {
    const c = isothermsFromModel(co2, [300], { points: 30, maxDensityMolPerM3: 20000 });
    expect(Math.max(...c[0].points.map((p) => p.densityMolPerM3))).toBeCloseTo(0.96 * 20000, 6);
    for (const bad of [NaN, -1, 0, Infinity]) {
      expect(() => isothermsFromModel(co2, [300], { maxDensityMolPerM3: bad })).toThrow(InputError);
    }
  });
});

describe("saturationFromModel on the CO2 reference equation", () => {
  const co2 = referenceFluid("carbon-dioxide");

  it("starts the dome at the triple point, and says so", () => {
    const dome = saturationFromModel(co2, { points: 15 });
    expect(dome.saturation.length).toBe(15);
    expect(dome.skippedTemperaturesK).toEqual([]);
    expect(dome.saturation[0].temperatureK).toBe(T_TRIPLE);
    expectReference(dome.saturation[0].pressurePa / 1e6, sw("triple/p"), "chart-sampler");
    expectReference(
      dome.saturation[0].liquid.densityMolPerM3! * M_CO2,
      sw("triple/rhoL"),
      "chart-sampler",
    );
    expect(dome.domeWarnings).toHaveLength(1);
    expect(dome.domeWarnings[0]).toMatch(/starts at 216\.59 K/);
    const spec = isothermChart({ isotherms: isothermsFromModel(co2, [250]), ...dome });
    expect(schemaErrors(spec)).toEqual([]);
    expect(chartMeta(spec)!.warnings).toEqual(dome.domeWarnings);
  });

  it("reaches the triple point of water too (below 0.55 Tc = 83 degC)", () => {
    // IAPWS-95 (Wagner and Pruss 2002): triple point 273.16 K, 611.655 Pa (from memory of the
    // release's section 2; 1e-3 relative, the saturation solver's tolerance is far tighter).
    const dome = saturationFromModel(referenceFluid("water"), { points: 12 });
    expect(dome.saturation[0].temperatureK).toBe(273.16);
    expect(Math.abs(dome.saturation[0].pressurePa / 611.655 - 1)).toBeLessThan(1e-3);
    expect(dome.domeWarnings[0]).toMatch(/starts at 273\.16 K/);
  });

  it("with energies (T-s), the warning reaches the chart", () => {
    const dome = saturationFromModel(referenceFluidBinding(co2), { points: 8 });
    expect(dome.saturation[0].liquid.entropyJPerMolK).toBeDefined();
    const spec = temperatureEntropyChart(dome);
    expect(chartMeta(spec)!.warnings.some((w) => /216\.59 K/.test(w))).toBe(true);
  });

  it("an explicit start below the equation's range: refused points are left out and reported", () => {
    // 0.55 Tc = 167 K is below the 190 K extrapolation limit of this library's CO2 data file.
    const dome = saturationFromModel(co2, { points: 12, fromReducedTemperature: 0.55 });
    expect(dome.skippedTemperaturesK.length).toBeGreaterThan(0);
    expect(Math.max(...dome.skippedTemperaturesK)).toBeLessThan(190);
    expect(dome.saturation.length + dome.skippedTemperaturesK.length).toBe(12);
    expect(dome.domeWarnings.some((w) => /left out of the dome/.test(w))).toBe(true);
  });
});

describe("isotherms of a reference equation inside the dome", () => {
  const co2 = referenceFluid("carbon-dioxide");

  it("run flat at the vapour pressure by default (no wild loop), the loop on request", () => {
    const [flat] = isothermsFromModel(co2, [270], { points: 150 });
    const tie = flat.equalArea!;
    // 270 K: vapour pressure 3.2033 MPa (from memory of Span and Wagner 1996, Table 34).
    expectReference(tie.pressurePa / 1e6, sw("saturation/T270/p"));
    const inside = flat.points.filter(
      (p) =>
        p.densityMolPerM3 > tie.vaporDensityMolPerM3 &&
        p.densityMolPerM3 < tie.liquidDensityMolPerM3,
    );
    expect(inside).toEqual([]);
    const atTie = flat.points.filter((p) => p.pressurePa === tie.pressurePa);
    expect(atTie.map((p) => p.densityMolPerM3)).toEqual([
      tie.vaporDensityMolPerM3,
      tie.liquidDensityMolPerM3,
    ]);
    // Stable branches only: pressure rises with density along the whole isotherm.
    for (let i = 1; i < flat.points.length; i++) {
      expect(flat.points[i].pressurePa).toBeGreaterThanOrEqual(flat.points[i - 1].pressurePa);
    }
    const [loop] = isothermsFromModel(co2, [270], { points: 150, insideDome: "loop" });
    const loopInside = loop.points.filter(
      (p) =>
        p.densityMolPerM3 > tie.vaporDensityMolPerM3 &&
        p.densityMolPerM3 < tie.liquidDensityMolPerM3,
    );
    expect(loopInside.length).toBeGreaterThan(10);
    expect(Math.min(...loopInside.map((p) => p.pressurePa))).toBeLessThan(tie.pressurePa);
    expect(() =>
      isothermsFromModel(co2, [270], { insideDome: "wiggle" as unknown as "loop" }),
    ).toThrow(InputError);
  });
});

describe("P-h and T-s lines of CO2 below its triple point", () => {
  const binding = referenceFluidBinding(referenceFluid("carbon-dioxide"));
  const flatSteps = (ts: number[]) => ts.filter((t, i) => i > 0 && t === ts[i - 1]).length;

  it("an isobar below the triple-point pressure (0.518 MPa) gets no two-phase step", () => {
    const low = isobarOnTemperatureEntropy(binding, 1e5, linearGrid(220, 400, 19));
    expect(flatSteps(low.points.map((p) => p.temperatureK))).toBe(0);
    const high = isobarOnTemperatureEntropy(binding, 1e6, linearGrid(220, 400, 19));
    expect(flatSteps(high.points.map((p) => p.temperatureK))).toBe(1);
    // 1 MPa boils at 233.03 K (from memory of Span and Wagner 1996, Table 34).
    const tSat = high.points.find(
      (p, i, all) => i > 0 && p.temperatureK === all[i - 1].temperatureK,
    )!;
    expectReference(tSat.temperatureK, sw("saturation/p1MPa/T"));
  });

  it("an isotherm below the triple-point temperature gets no two-phase step", () => {
    const iso = isothermOnPressureEnthalpy(binding, 210, logGrid(1e5, 1e7, 12));
    const ps = iso.points.map((p) => p.pressurePa);
    expect(ps.filter((p, i) => i > 0 && p === ps[i - 1]).length).toBe(0);
  });
});
