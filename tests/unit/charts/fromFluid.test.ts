import { beforeAll, describe, expect, it } from "vitest";
import { defineFluid, type Fluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { saturationAtTemperature } from "../../../kernel-lib/src/phase/saturation.js";
import {
  compressibilityFromFluid,
  departuresFromFluid,
  isentropeOnPressureEnthalpy,
  isobarOnTemperatureEntropy,
  isothermOnPressureEnthalpy,
  isothermsFromModel,
  saturationFromModel,
  surfaceFromFluid,
} from "../../../kernel-lib/src/charts/sample/index.js";
import { isothermChart } from "../../../kernel-lib/src/charts/isotherms.js";
import { pressureEnthalpyChart } from "../../../kernel-lib/src/charts/pressureEnthalpy.js";
import { temperatureEntropyChart } from "../../../kernel-lib/src/charts/temperatureEntropy.js";
import { departureChart } from "../../../kernel-lib/src/charts/departures.js";
import { compressibilityChart } from "../../../kernel-lib/src/charts/compressibility.js";
import { propertySurfaceChart } from "../../../kernel-lib/src/charts/propertySurface.js";
import { linearGrid, logGrid } from "../../../kernel-lib/src/charts/sampling.js";
import { chartMeta } from "../../../kernel-lib/src/charts/chartSpec.js";
import { compileSpec, schemaErrors } from "./specCheck.js";

let fluid: Fluid;
beforeAll(() => {
  // The molecular ideal gas (partition functions) is valid down to the low end of the dome; the
  // cp correlation of the component table starts at 270 K and would refuse it (OutOfRangeError).
  fluid = defineFluid({ components: ["ethane"], model: "peng-robinson", idealGas: "molecular" });
});

describe("charts from a Peng-Robinson ethane fluid", () => {
  it("dome: ascending T and P, liquid denser than vapour, h_vap > 0, closes at the critical point", () => {
    const dome = saturationFromModel(fluid, { points: 25 });
    expect(dome.saturation.length).toBeGreaterThan(20);
    for (let i = 1; i < dome.saturation.length; i++) {
      expect(dome.saturation[i].temperatureK).toBeGreaterThan(dome.saturation[i - 1].temperatureK);
      expect(dome.saturation[i].pressurePa).toBeGreaterThan(dome.saturation[i - 1].pressurePa);
    }
    for (const r of dome.saturation) {
      expect(r.liquid.densityMolPerM3!).toBeGreaterThan(r.vapor.densityMolPerM3!);
      expect(r.vapor.enthalpyJPerMol! - r.liquid.enthalpyJPerMol!).toBeGreaterThan(0);
    }
    const top = dome.saturation.at(-1)!;
    expect(top.temperatureK / dome.critical.temperatureK).toBeGreaterThan(0.999);
    expect(Math.abs(top.vapor.enthalpyJPerMol! - top.liquid.enthalpyJPerMol!)).toBeLessThan(
      0.2 *
        Math.abs(
          dome.saturation[0].vapor.enthalpyJPerMol! - dome.saturation[0].liquid.enthalpyJPerMol!,
        ),
    );
  });

  it("P-v isotherms: the equal-area tie line sits at the saturation pressure", async () => {
    const curves = isothermsFromModel(fluid.model, [250, 280, 305.3, 350], { points: 150 });
    const satLow = saturationAtTemperature(fluid.model, 250);
    expect(curves[0].equalArea!.pressurePa / satLow.pressurePa).toBeCloseTo(1, 8);
    expect(curves[3].equalArea).toBeUndefined(); // above Tc
    const spec = isothermChart({
      isotherms: curves,
      ...saturationFromModel(fluid.model, { points: 20 }),
    });
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
  });

  it("P-h: an isotherm runs flat across the dome; the jump is the enthalpy of vaporization", async () => {
    const T = 250;
    const iso = isothermOnPressureEnthalpy(fluid, T, logGrid(1e5, 1e7, 40));
    const sat = saturationAtTemperature(fluid.model, T);
    const flat = iso.points.filter((p) => p.pressurePa === sat.pressurePa);
    expect(flat.length).toBe(2);
    expect(flat[0].enthalpyJPerMol - flat[1].enthalpyJPerMol).toBeCloseTo(
      sat.enthalpyOfVaporizationJPerMol,
      3,
    );
    const dome = saturationFromModel(fluid, { points: 20 });
    const sStar = dome.critical.entropyJPerMolK! + 5;
    const isentrope = isentropeOnPressureEnthalpy(fluid, sStar, logGrid(1e5, 1e7, 25));
    expect(
      isentrope.points.filter((p) => Number.isFinite(p.enthalpyJPerMol)).length,
    ).toBeGreaterThan(20);
    // Along an isentrope dh = v dP > 0: enthalpy rises with pressure.
    const hs = isentrope.points.map((p) => p.enthalpyJPerMol).filter(Number.isFinite);
    for (let i = 1; i < hs.length; i++) expect(hs[i]).toBeGreaterThan(hs[i - 1]);
    // Ethane molar mass 30.069 g/mol (from memory of IUPAC standard atomic weights).
    const spec = pressureEnthalpyChart(
      { ...dome, isotherms: [iso], isentropes: [isentrope] },
      { molarMassKgPerMol: 0.030069 },
    );
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
    expect(chartMeta(spec)!.warnings).toEqual([]);
  });

  it("T-s: an isobar runs flat across the dome at its saturation temperature", async () => {
    const isobar = isobarOnTemperatureEntropy(fluid, 1e6, linearGrid(160, 350, 40));
    const flat = isobar.points.filter(
      (p, i, all) => i > 0 && p.temperatureK === all[i - 1].temperatureK,
    );
    expect(flat.length).toBe(1);
    const spec = temperatureEntropyChart({
      ...saturationFromModel(fluid, { points: 20 }),
      isobars: [isobar],
    });
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
  });

  it("departures, compressibility and a property surface compile, with progress callbacks", async () => {
    let calls = 0;
    const dep = departuresFromFluid(fluid, [250, 350], logGrid(1e5, 5e6, 12), {
      onProgress: () => calls++,
    });
    expect(calls).toBe(24);
    // Below Tc the jump from vapour to liquid is drawn at the vapour pressure: two points there.
    const psat = saturationAtTemperature(fluid.model, 250).pressurePa;
    const atSat = dep[0].points.filter((p) => p.pressurePa === psat);
    expect(atSat.length).toBe(2);
    expect(atSat[1].h! - atSat[0].h!).toBeCloseTo(
      -saturationAtTemperature(fluid.model, 250).enthalpyOfVaporizationJPerMol,
      3,
    );
    // Residual enthalpy of a real gas is negative at moderate pressure (attractive forces).
    expect(dep[1].points[5].h!).toBeLessThan(0);
    expect(schemaErrors(departureChart(dep, { property: ["h", "s"] }))).toEqual([]);
    const z = compressibilityFromFluid(fluid, [1.1, 1.5, 2], linearGrid(0.1, 8, 20));
    // Z -> 1 as Pr -> 0 (ideal-gas limit); Z < 1 at Tr = 1.1, Pr = 1 region.
    expect(z[2].points[0].z).toBeGreaterThan(0.95);
    expect(z[0].points[5].z).toBeLessThan(0.9);
    expect((await compileSpec(compressibilityChart(z))).warnings).toEqual([]);
    const surf = surfaceFromFluid(fluid, linearGrid(200, 400, 8), logGrid(1e5, 1e7, 8), {
      name: "Compressibility factor Z",
      kind: "dimensionless",
      pick: (s) => s.Z,
    });
    const spec = propertySurfaceChart(surf, { levels: 5 });
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
  });
});
