import { describe, expect, it } from "vitest";
import { renderSvg } from "../../../kernel-lib/src/display/renderSvg.js";
import type { VegaLiteSpec } from "../../../kernel-lib/src/display/vegaLiteSpec.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

// Counts of marks and texts below are read off the spec itself (3 rows -> 3 points, 4 rows -> 4 bars).
const pointSpec: VegaLiteSpec = {
  data: {
    values: [
      { pressureBar: 1, z: 0.99 },
      { pressureBar: 20, z: 0.9 },
      { pressureBar: 40, z: 0.82 },
    ],
  },
  mark: "point",
  encoding: {
    x: { field: "pressureBar", type: "quantitative", title: "Pressure / bar" },
    y: { field: "z", type: "quantitative", title: "Compressibility factor Z / -" },
  },
};

function countMarks(svg: string, role: string): number {
  return (svg.match(new RegExp(`aria-roledescription="${role}"`, "g")) ?? []).length;
}

describe("renderSvg", () => {
  it("draws one symbol per data row and both axis titles", async () => {
    const svg = await renderSvg(pointSpec);
    expect(svg.startsWith("<svg")).toBe(true);
    expect(countMarks(svg, "point")).toBe(3);
    expect(svg).toContain(">Pressure / bar</text>");
    expect(svg).toContain(">Compressibility factor Z / -</text>");
  });

  it("draws four bars for four rows, with the chart size in the svg attributes", async () => {
    const spec: VegaLiteSpec = {
      width: 200,
      height: 100,
      data: {
        values: ["crude", "naphtha", "kerosene", "gas oil"].map((s, i) => ({
          stream: s,
          flowKgPerS: i + 1,
        })),
      },
      mark: "bar",
      encoding: {
        x: { field: "stream", type: "nominal" },
        y: { field: "flowKgPerS", type: "quantitative" },
      },
    };
    const svg = await renderSvg(spec);
    expect(countMarks(svg, "bar")).toBe(4);
    const width = Number(/<svg[^>]* width="(\d+)"/.exec(svg)?.[1]);
    expect(width).toBeGreaterThan(200); // plot width plus axis space
  });

  it("escapes a label containing markup as text", async () => {
    const spec: VegaLiteSpec = {
      ...pointSpec,
      encoding: {
        ...pointSpec.encoding,
        x: { field: "pressureBar", type: "quantitative", title: "<script>alert(1)</script>" },
      },
    };
    const svg = await renderSvg(spec);
    expect(svg).not.toContain("<script");
    expect(svg).toContain("&lt;script&gt;alert(1)&lt;/script&gt;");
  });

  it("refuses URL data, nested in layers too, and non-object specs", async () => {
    await expect(
      renderSvg({ data: { url: "https://example.invalid/x.csv" }, mark: "point" }),
    ).rejects.toThrow(InputError);
    await expect(
      renderSvg({ layer: [{ data: { url: "rows.json" }, mark: "line" }] }),
    ).rejects.toThrow(/spec\.layer\[0\]\.data\.url/);
    await expect(renderSvg(null as unknown as VegaLiteSpec)).rejects.toThrow(InputError);
    await expect(renderSvg([] as unknown as VegaLiteSpec)).rejects.toThrow(InputError);
  });

  it("reports a spec that does not compile as InputError, with vega-lite's message", async () => {
    const failure = renderSvg({ data: { values: [] }, mark: "no-such-mark" });
    await expect(failure).rejects.toThrow(InputError);
    await expect(failure).rejects.toThrow(/no-such-mark.*vega-lite said: /);
  });

  it("leaves the caller's spec and data rows untouched", async () => {
    const rows = [{ pressureBar: 1, z: 0.99 }];
    const spec: VegaLiteSpec = { ...pointSpec, data: { values: rows } };
    await renderSvg(spec);
    expect(Object.getOwnPropertySymbols(rows[0])).toHaveLength(0);
    expect(spec.data?.values).toBe(rows);
  });
});
