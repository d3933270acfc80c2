/**
 * The heat-curve chart (charts/heatCurve.ts): schema-valid and compilable specs, units on the
 * axes, bubble/dew markers and the pinch rule, labels only as data, bad input named.
 */
import { describe, expect, it } from "vitest";
import { heatCurveChart } from "../../../kernel-lib/src/charts/heatCurve.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { allLayers, compileSpec, schemaErrors } from "./specCheck.js";

// invented numbers of the Corvid Point scenario's shape (a condensing hot stream, a cold liquid)
const hot = {
  label: "hot: overhead vapour",
  points: [
    { heatW: 0, temperatureK: 320 },
    { heatW: 2e5, temperatureK: 330, marker: "bubble" as const },
    { heatW: 8e5, temperatureK: 345, marker: "dew" as const },
    { heatW: 1e6, temperatureK: 390 },
  ],
};
const cold = {
  label: "cold: feed <script>",
  points: [
    { heatW: 0, temperatureK: 300 },
    { heatW: 1e6, temperatureK: 370 },
  ],
};

describe("heatCurveChart", () => {
  it("is a valid, compilable Vega-Lite spec with markers and pinch", async () => {
    const spec = heatCurveChart({
      curves: [hot, cold],
      pinch: { heatW: 8e5, hotTemperatureK: 345, coldTemperatureK: 356 - 15 },
    });
    expect(schemaErrors(spec)).toEqual([]);
    const { warnings } = await compileSpec(spec);
    expect(warnings).toEqual([]);
    const layers = allLayers(spec as Record<string, unknown>);
    const marks = layers.map((l) => (l.mark as { type: string }).type);
    expect(marks).toContain("rule");
    const texts = layers
      .filter((l) => (l.mark as { type: string }).type === "text")
      .flatMap((l) => (l.data as { values: { text: string }[] }).values.map((v) => v.text));
    expect(texts).toContain("bubble point 330 K");
    expect(texts).toContain("dew point 345 K");
    expect(texts).toContain("minimum approach 4 K");
    // default SI axis units: kW and K
    expect(JSON.stringify(spec)).toContain("Heat transferred Q / kW");
    // labels travel as data only
    expect(JSON.stringify(spec.layer)).toContain("cold: feed <script>");
  });

  it("follows the unit choice (degC, MW)", () => {
    const spec = heatCurveChart(
      { curves: [hot] },
      { units: { system: "SI", temperature: "degC", power: "MW" } },
    );
    const rows = (
      allLayers(spec as Record<string, unknown>)[0].data as { values: { x: number; y: number }[] }
    ).values;
    expect(rows[3].x).toBeCloseTo(1, 12);
    expect(rows[3].y).toBeCloseTo(390 - 273.15, 9);
  });

  it("refuses bad data with the input named", () => {
    expect(() => heatCurveChart({ curves: [] })).toThrow(InputError);
    expect(() =>
      heatCurveChart({ curves: [{ label: "x", points: [{ heatW: 0, temperatureK: -1 }] }] }),
    ).toThrow(/data\.curves\[0\]\.points\[0\]\.temperatureK/);
  });
});
