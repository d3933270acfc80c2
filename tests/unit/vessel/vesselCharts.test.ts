import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { simulateVessel } from "../../../kernel-lib/src/process/vessel/simulateVessel.js";
import {
  WALL_NOT_MODELLED,
  vesselHistoryChart,
  vesselPathOnEnvelopeChart,
} from "../../../kernel-lib/src/charts/vesselHistory.js";
import { compileSpec, renderSvgText, schemaErrors } from "../charts/specCheck.js";

const gas = defineFluid({ components: ["methane", "ethane"], model: "peng-robinson" });
const z = [0.9, 0.1];
const run = simulateVessel({
  fluid: gas,
  shape: { kind: "horizontal-cylinder", diameterM: 1.2, lengthM: 3 },
  wall: { thicknessM: 0.02 },
  initial: { temperatureK: 300, pressurePa: 60e5, z },
  outlets: [{ diameterM: 0.03, dischargeCoefficient: 0.8 }],
  heat: { kind: "wall", outside: { kind: "air", ambientK: 293.15 } },
  minimumDesignMetalTemperatureK: 244.15,
  until: { pressurePa: 25e5 },
});

describe("vessel charts", () => {
  it("the history chart validates, compiles, renders, and carries the MDMT rule and the caution", async () => {
    const spec = vesselHistoryChart(run, {
      units: { system: "SI", pressure: "bar", temperature: "degC" },
    });
    expect(schemaErrors(spec)).toEqual([]);
    const { warnings } = await compileSpec(spec);
    expect(warnings).toEqual([]);
    const svg = await renderSvgText(spec);
    expect(svg).toContain("MDMT");
    expect(JSON.stringify(spec)).toMatch(/licensed engineers/);
    // the rule sits at the MDMT in degC (244.15 K = -29 degC)
    expect(JSON.stringify(spec)).toContain('"y":-29');
  });

  it("an adiabatic run: no wall line or coldest-wall mark, the note that the wall is not modelled", async () => {
    const adiabatic = simulateVessel({
      fluid: gas,
      shape: { kind: "horizontal-cylinder", diameterM: 1.2, lengthM: 3 },
      initial: { temperatureK: 300, pressurePa: 60e5, z },
      outlets: [{ diameterM: 0.03, dischargeCoefficient: 0.8 }],
      until: { pressurePa: 40e5 },
    });
    // the result says so: no wall temperature in the series or the minimum
    expect(adiabatic.wallModelled).toBe(false);
    expect(adiabatic.series.wallTemperatureK).toBeUndefined();
    expect(adiabatic.minimum.wallTemperatureK).toBeUndefined();
    expect(adiabatic.minimum.wallTimeS).toBeUndefined();
    expect(adiabatic.cautions.join(" ")).toMatch(/wall is not modelled/);
    const spec = vesselHistoryChart(adiabatic);
    expect(schemaErrors(spec)).toEqual([]);
    const { warnings } = await compileSpec(spec);
    expect(warnings).toEqual([]);
    const text = JSON.stringify(spec);
    expect(text).not.toMatch(/"series":"wall"/);
    expect(text).not.toMatch(/coldest wall/);
    expect(text).toContain(WALL_NOT_MODELLED);
    // the walled run keeps its wall line and mark, without the note
    const walled = JSON.stringify(vesselHistoryChart(run));
    expect(walled).toMatch(/"series":"wall"/);
    expect(walled).toMatch(/coldest wall/);
    expect(walled).not.toContain(WALL_NOT_MODELLED);
  });

  it("the path on the phase envelope validates and compiles", async () => {
    const envelope = gas.envelope(z);
    const spec = vesselPathOnEnvelopeChart(run, envelope, { points: 5 });
    expect(schemaErrors(spec)).toEqual([]);
    await compileSpec(spec);
    expect(JSON.stringify(spec)).toMatch(/t = 0 s|t = 0\.00 s/);
  });
});
