import { describe, expect, it } from "vitest";
import {
  compareWithModel,
  departuresFromPvt,
  surfaceResidualModel,
} from "../../../kernel-lib/src/pvt/index.js";
import {
  departureBandChart,
  departureResidualChart,
} from "../../../kernel-lib/src/charts/index.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { themeConfig } from "../../../kernel-lib/src/charts/theme.js";
import { compileSpec, schemaErrors } from "../charts/specCheck.js";
import { campaign, geometric, range } from "./campaign.js";
import { pressurePR } from "./pengRobinsonTruth.js";

describe("departureBandChart", () => {
  const result = departuresFromPvt(
    campaign({
      densities: geometric(200, 6000, 6),
      temperatures: range(310, 370, 4),
      pressure: pressurePR,
      relativeUP: 2e-4,
      seed: 3,
    }),
    { monteCarloSamples: 0 },
  );

  it("validates against the Vega-Lite schema and compiles, with bands of +/- 2 u around every state", async () => {
    const spec = departureBandChart(result, { quantity: "s" });
    expect(spec.config).toEqual(themeConfig()); // the project's look, as every builder
    expect(schemaErrors(spec)).toEqual([]);
    const { warnings } = await compileSpec(spec);
    expect(warnings).toEqual([]);
    type Layer = {
      mark: { type: string; color?: string; stroke?: string; fillOpacity?: number };
      encoding: { color?: { scale?: { range: string[] }; legend?: unknown } };
      data: { values: { value: number; lower: number; upper: number; u: number }[] };
    };
    const layers = spec.layer as Layer[];
    const bands = layers.filter((l) => l.mark.type === "area");
    expect(bands).toHaveLength(4); // one band per isotherm
    const rows = bands.flatMap((l) => l.data.values);
    expect(rows).toHaveLength(4 * 6);
    // readable where four overlap: light fill, outline in the isotherm's line colour, and the
    // legend from the lines (its swatches are the line colours)
    const line = layers.find((l) => l.mark.type === "line")!;
    const colours = line.encoding.color!.scale!.range;
    bands.forEach((b, i) => {
      expect(b.mark.fillOpacity).toBeLessThanOrEqual(0.1);
      expect(b.mark.stroke).toBe(colours[i]);
      expect(b.mark.color).toBe(colours[i]);
      expect(b.encoding.color).toBeUndefined();
    });
    expect(line.encoding.color!.legend).toBeUndefined();
    for (const r of rows) {
      expect(r.upper - r.value).toBeCloseTo(2 * r.u, 12);
      expect(r.value - r.lower).toBeCloseTo(2 * r.u, 12);
    }
  });

  it("overlays a model as a layer after the bands and the lines, named in the subtitle", async () => {
    const cmp = compareWithModel(result, surfaceResidualModel(result.surfaceFit.surface));
    const spec = departureBandChart(result, { model: { label: "surface fit", points: cmp } });
    expect((spec.layer as unknown[]).length).toBe(result.isotherms.length + 2);
    expect(JSON.stringify(spec.title)).toMatch(/dashed: surface fit/);
    expect(schemaErrors(spec)).toEqual([]);
    await compileSpec(spec);
  });

  it("residual chart: data minus model with the data's band around zero; schema-valid and compiles", async () => {
    const cmp = compareWithModel(result, surfaceResidualModel(result.surfaceFit.surface));
    const spec = departureResidualChart(result, cmp, { quantity: "s", modelLabel: "surface fit" });
    expect(spec.config).toEqual(themeConfig());
    expect(schemaErrors(spec)).toEqual([]);
    const { warnings } = await compileSpec(spec);
    expect(warnings).toEqual([]);
    const rows = (spec.layer as { data: { values: { difference?: number }[] } }[])[
      result.isotherms.length
    ]!.data.values;
    expect(rows).toHaveLength(cmp.length);
    expect(rows[0]!.difference).toBe(cmp[0]!.difference.s);
    expect(() => departureResidualChart(result, [])).toThrow(InputError);
  });

  it("refuses an unknown quantity and a bad coverage factor", () => {
    expect(() => departureBandChart(result, { quantity: "x" as "h" })).toThrow(InputError);
    expect(() => departureBandChart(result, { coverageFactor: Number.NaN })).toThrow(InputError);
  });
});
