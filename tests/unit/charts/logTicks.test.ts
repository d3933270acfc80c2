/**
 * Log-axis ticks: explicit 1-2-5 values per decade, and rendered labels that never collide even
 * with a font wider than Vega's text-width estimate (DejaVu Sans digits advance 0.636 em, from
 * memory of the DejaVu Sans metrics; 0.64 em is used as the bound).
 */
import { describe, expect, it } from "vitest";
import { applyLogTicks, logTickValues } from "../../../kernel-lib/src/charts/logTicks.js";
import { departureChart, type DepartureCurve } from "../../../kernel-lib/src/charts/departures.js";
import { pressureEnthalpyChart } from "../../../kernel-lib/src/charts/pressureEnthalpy.js";
import { withProcessPath } from "../../../kernel-lib/src/charts/processPath.js";
import { logGrid } from "../../../kernel-lib/src/charts/sampling.js";
import { compileSpec, renderSvgText, schemaErrors } from "./specCheck.js";
import { SYNTHETIC_CRITICAL, syntheticPhIsotherm, syntheticSaturation } from "./sampleDiagrams.js";

/** x positions and texts of the bottom-axis labels of an SVG rendered by vega. */
function bottomAxisLabels(svg: string): { x: number; text: string }[][] {
  const groups = svg.split('role-axis-label"').slice(1);
  return (
    groups
      .map((g) => g.slice(0, g.indexOf("</g>")))
      .map((g) =>
        [...g.matchAll(/translate\(([-\d.e]+),(-?[\d.e]+)\)[^>]*>([^<]*)<\/text>/g)].map((m) => ({
          x: Number(m[1]),
          y: Number(m[2]),
          text: m[3],
        })),
      )
      // A horizontal axis: every label at the same height, below the axis line.
      .filter((list) => list.length > 1 && list.every((l) => l.y === list[0].y && l.y > 0))
      .map((list) => list.map(({ x, text }) => ({ x, text })))
  );
}

function expectNoCollision(labels: { x: number; text: string }[], fontPx: number): void {
  for (let i = 1; i < labels.length; i++) {
    const a = labels[i - 1];
    const b = labels[i];
    const halfWidths = (0.64 * fontPx * (a.text.length + b.text.length)) / 2;
    expect(b.x - a.x, `labels "${a.text}" and "${b.text}"`).toBeGreaterThanOrEqual(halfWidths + 2);
  }
}

describe("logTickValues", () => {
  it("1-2-5 per decade over a few decades", () => {
    expect(logTickValues(1, 300)).toEqual([1, 2, 5, 10, 20, 50, 100, 200]);
    expect(logTickValues(0.02, 20)).toEqual([0.02, 0.05, 0.1, 0.2, 0.5, 1, 2, 5, 10, 20]);
  });
  it("one per decade over many, every other decade over very many; finer within one", () => {
    expect(logTickValues(1e-4, 1e2)).toEqual([1e-4, 1e-3, 0.01, 0.1, 1, 10, 100]);
    expect(logTickValues(1, 1e10)).toEqual([1, 100, 1e4, 1e6, 1e8, 1e10]);
    expect(logTickValues(2, 9)).toEqual([2, 3, 5, 7]);
  });
  it("no ticks for bad ranges (NaN, <= 0, reversed, infinite)", () => {
    expect(logTickValues(NaN, 10)).toEqual([]);
    expect(logTickValues(0, 10)).toEqual([]);
    expect(logTickValues(-1, 10)).toEqual([]);
    expect(logTickValues(10, 1)).toEqual([]);
    expect(logTickValues(1, Infinity)).toEqual([]);
  });
  it("an axis setting already in the spec wins", () => {
    const body = {
      layer: [
        {
          data: { values: [{ x: 1 }, { x: 1000 }] },
          mark: "point",
          encoding: { x: { field: "x", scale: { type: "log" }, axis: { values: [1, 1000] } } },
        },
      ],
    };
    applyLogTicks(body);
    expect(body.layer[0].encoding.x.axis.values).toEqual([1, 1000]);
  });
});

describe("departure chart on a log pressure axis", () => {
  const curves: DepartureCurve[] = [250, 300].map((T) => ({
    temperatureK: T,
    // Drawing data only (the test checks tick labels, not thermodynamics).
    points: logGrid(1e5, 3e7, 30).map((p) => ({
      pressurePa: p,
      h: -p / (T * 10),
      s: -p / T / 1e3,
    })),
  }));

  for (const width of [300, 200, 520]) {
    it(`tick labels do not collide at width ${width} px (two panels, bar)`, async () => {
      const spec = departureChart(curves, {
        property: ["h", "s"],
        logX: true,
        width,
        height: 200,
        units: { system: "SI", pressure: "bar" },
      });
      expect(schemaErrors(spec)).toEqual([]);
      expect((await compileSpec(spec)).warnings).toEqual([]);
      const axes = bottomAxisLabels(await renderSvgText(spec));
      expect(axes.length).toBe(2);
      for (const labels of axes) {
        expect(labels.length).toBeGreaterThanOrEqual(3);
        expectNoCollision(labels, 10.5);
        expect(labels.map((l) => l.text)).not.toContain("3"); // 1-2-5, not 1-2-3-4
      }
    });
  }
});

describe("P-h diagram and a process path", () => {
  it("log pressure axis carries 1-2-5 values, refreshed when a path extends the range", () => {
    const spec = pressureEnthalpyChart({
      saturation: syntheticSaturation(),
      critical: SYNTHETIC_CRITICAL,
      isotherms: [{ temperatureK: 300, points: syntheticPhIsotherm(0.8) }],
    });
    const yAxisValues = (s: typeof spec) =>
      (s.layer as { encoding?: { y?: { axis?: { values?: number[] } } } }[])
        .map((l) => l.encoding?.y?.axis?.values)
        .filter((v) => v !== undefined);
    const before = yAxisValues(spec);
    expect(before.length).toBeGreaterThan(2);
    expect(new Set(before.map((v) => JSON.stringify(v))).size).toBe(1); // same on every layer
    expect(before[0]).toContain(1); // 1 MPa
    const withPath = withProcessPath(spec, [{ pressurePa: 5e7, enthalpyJPerMol: 20000 }]);
    const after = yAxisValues(withPath);
    expect(new Set(after.map((v) => JSON.stringify(v))).size).toBe(1);
    expect(after[0]).toContain(50); // 50 MPa: the path's state is on the axis
    expect(schemaErrors(withPath)).toEqual([]);
  });
});
