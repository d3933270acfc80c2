/* eslint-disable @typescript-eslint/no-explicit-any -- the tests read into plain JSON specs */
import { describe, expect, it } from "vitest";
import { departureChart } from "../../../kernel-lib/src/charts/departures.js";
import { compressibilityChart } from "../../../kernel-lib/src/charts/compressibility.js";
import { propertySurfaceChart } from "../../../kernel-lib/src/charts/propertySurface.js";
import { gridIsolines } from "../../../kernel-lib/src/charts/isolines.js";
import { modelVsDataChart } from "../../../kernel-lib/src/charts/modelVsData.js";
import { chartMeta } from "../../../kernel-lib/src/charts/chartSpec.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { allLayers, compileSpec, renderSvgText, roundFloats, schemaErrors } from "./specCheck.js";
import { R } from "./vdwData.js";

const enc = (l: Record<string, unknown>) => l.encoding as any;
const values = (l: Record<string, unknown>) => (l.data as any).values as any[];

/**
 * van der Waals residuals at (T, v), closed form (e.g. Smith, Van Ness and Abbott, "Introduction
 * to Chemical Engineering Thermodynamics", 7th ed., 2005, ch. 6): u_res = -a/v,
 * s_res(T,v) = R ln(1 - b/v), h_res = u_res + P v - R T. Constants a, b are methane-like
 * (a = 27 R^2 Tc^2 / (64 Pc), b = R Tc / (8 Pc), Tc = 190.6 K, Pc = 4.599 MPa). Drawing data.
 */
function vdwDepartures(T: number) {
  const Tc = 190.6;
  const Pc = 4.599e6;
  const a = (27 * R * R * Tc * Tc) / (64 * Pc);
  const b = (R * Tc) / (8 * Pc);
  return Array.from({ length: 40 }, (_, i) => {
    const rho = 50 + i * 200;
    const v = 1 / rho;
    const P = (R * T) / (v - b) - a / (v * v);
    const u = -a / v;
    return {
      pressurePa: P,
      densityMolPerM3: rho,
      u,
      h: u + P * v - R * T,
      s: R * Math.log(1 - b / v),
      uncertainty: { h: 20 + 0.01 * Math.abs(u) },
    };
  });
}

describe("departureChart", () => {
  const curves = [250, 300, 400].map((T) => ({ temperatureK: T, points: vdwDepartures(T) }));

  it("validates and compiles, single and multi-panel", async () => {
    for (const spec of [
      departureChart(curves),
      departureChart(curves, { property: ["h", "s", "u"], x: "density" }),
    ]) {
      expect(schemaErrors(spec)).toEqual([]);
      expect((await compileSpec(spec)).warnings).toEqual([]);
    }
  });

  it("labels the residual with its convention and unit; one series per isotherm; band from k u", () => {
    const layers = allLayers(
      departureChart(curves, { property: "h", units: { system: "SI", pressure: "bar" } }),
    );
    const line = layers.find((l) => enc(l).strokeDash)!;
    expect(enc(line).y.title).toBe("Residual enthalpy h − hⁱᵍ / kJ/mol");
    expect(enc(line).x.title).toBe("Pressure P / bar");
    expect(new Set(values(line).map((r) => r.series)).size).toBe(3);
    const band = layers.find((l) => enc(l).y2)!;
    const row = values(band)[0];
    const p = curves
      .flatMap((c) => c.points)
      .find((q) => Math.abs(q.pressurePa / 1e5 - row.x) < 1e-9)!;
    expect(row.hi - row.lo).toBeCloseTo((4 * p.uncertainty.h) / 1000, 9); // 2k u with k = 2
    const sPanel = allLayers(departureChart(curves, { property: "s", convention: "TV" })).find(
      (l) => enc(l).strokeDash,
    )!;
    expect(enc(sPanel).y.title).toBe("Residual entropy s − sⁱᵍ (same T, ρ) / J/(mol·K)");
  });

  it("one panel per property", () => {
    const spec = departureChart(curves, { property: ["h", "s", "a", "g"] });
    expect((spec.concat as unknown[]).length).toBe(4);
  });

  it("several panels: full names as panel titles, axis titles short enough for the panel", () => {
    const height = 240;
    const spec = departureChart(curves, { property: ["h", "s"], height, width: 300 });
    const panels = spec.concat as { title: { text: string }; layer: Record<string, unknown>[] }[];
    expect(panels.map((p) => p.title.text)).toEqual([
      "Residual enthalpy h − hⁱᵍ",
      "Residual entropy s − sⁱᵍ (same T, P)",
    ]);
    for (const panel of panels) {
      const title = String(enc(panel.layer.at(-1)!).y.title);
      // Rotated 11.5 px axis title, about 0.62 em per character (common practice, no source):
      // it must fit the panel height, else Vega pads the whole chart to make room.
      expect(0.62 * 11.5 * title.length).toBeLessThan(height);
    }
    expect(enc(panels[1].layer.at(-1)!).y.title).toBe("s − sⁱᵍ / J/(mol·K)");
  });

  it("refuses bad input", () => {
    expect(() => departureChart([])).toThrow(InputError);
    expect(() => departureChart(curves, { property: "cp" as any })).toThrow(/property/);
    expect(() => departureChart(curves, { coverageFactor: NaN })).toThrow(/coverageFactor/);
    expect(() => departureChart([{ temperatureK: -1, points: [] }])).toThrow(/temperatureK/);
  });
});

describe("compressibilityChart", () => {
  // Z from the truncated virial equation Z = 1 + (B Pc/(R Tc)) Pr/Tr with the Pitzer-Curl/Abbott
  // B0 = 0.083 - 0.422/Tr^1.6 (Smith, Van Ness and Abbott, 7th ed., eq. 3.65), omega = 0. Drawing data.
  const iso = [1.1, 1.5, 2].map((tr) => ({
    reducedTemperature: tr,
    points: Array.from({ length: 20 }, (_, i) => {
      const pr = 0.05 + i * 0.1;
      return { reducedPressure: pr, z: 1 + ((0.083 - 0.422 / Math.pow(tr, 1.6)) * pr) / tr };
    }),
  }));

  it("validates, compiles, axes dimensionless, series per Tr", async () => {
    const spec = compressibilityChart(iso, { logX: true });
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
    const line = allLayers(spec).find((l) => enc(l).strokeDash)!;
    expect(enc(line).x.title).toBe("Reduced pressure Pr = P/Pc");
    expect(enc(line).y.title).toBe("Compressibility factor Z = Pv/(RT)");
    expect(enc(line).x.scale.type).toBe("log");
    expect([...new Set(values(line).map((r) => r.series))]).toEqual([
      "Tr = 1.1",
      "Tr = 1.5",
      "Tr = 2",
    ]);
  });

  it("snapshot (floats rounded)", () => {
    const small = iso.map((c) => ({ ...c, points: c.points.slice(0, 3) }));
    expect(roundFloats(compressibilityChart(small), 4)).toMatchSnapshot();
  });
});

describe("gridIsolines", () => {
  const xs = [300, 320, 340, 360, 380, 400];
  const ys = [1e5, 3e5, 1e6, 3e6, 1e7];

  it("isolines of f(T, P) = T are the lines T = level (linear interpolation is exact)", () => {
    const values = xs.map((x) => ys.map(() => x));
    const iso = gridIsolines({ xs, ys, values }, [330, 375]);
    expect(iso.map((i) => i.level)).toEqual([330, 375]);
    for (const line of iso[0].lines) for (const p of line) expect(p.x).toBeCloseTo(330, 9);
    for (const line of iso[1].lines) for (const p of line) expect(p.x).toBeCloseTo(375, 9);
    // The isoline spans the whole pressure range of the grid.
    const pys = iso[0].lines.flat().map((p) => p.y);
    expect(Math.min(...pys)).toBeCloseTo(1e5, 6);
    expect(Math.max(...pys)).toBeCloseTo(1e7, 3);
  });

  it("isolines of f = ln P are P = exp(level) with log interpolation", () => {
    const values = xs.map(() => ys.map((y) => Math.log(y)));
    const iso = gridIsolines({ xs, ys, values }, [Math.log(2e6)], { logY: true });
    for (const p of iso[0].lines.flat()) expect(p.y / 2e6).toBeCloseTo(1, 9);
  });

  it("a closed isoline around a peak stays closed", () => {
    const gx = [0, 1, 2, 3, 4];
    const peak = gx.map((x) => gx.map((y) => -((x - 2) ** 2) - (y - 2) ** 2));
    const iso = gridIsolines({ xs: gx, ys: gx, values: peak }, [-1.5]);
    const line = iso[0].lines[0];
    expect(line.length).toBeGreaterThan(4);
    for (const p of line) expect(Math.hypot(p.x - 2, p.y - 2)).toBeLessThan(1.5);
  });

  it("refuses ragged grids", () => {
    expect(() => gridIsolines({ xs: [1, 2], ys: [1, 2], values: [[1, 2], [3]] }, [1])).toThrow(
      InputError,
    );
    expect(() => gridIsolines({ xs: [1], ys: [1, 2], values: [[1, 2]] }, [1])).toThrow(InputError);
  });
});

describe("propertySurfaceChart", () => {
  const temperaturesK = Array.from({ length: 15 }, (_, i) => 250 + 15 * i);
  const pressuresPa = Array.from({ length: 12 }, (_, j) => 1e5 * Math.pow(10, (2 * j) / 11));
  // Ideal-gas molar density P/(RT) (closed form), with a NaN hole: drawing data.
  const grid = temperaturesK.map((T, i) =>
    pressuresPa.map((P, j) => (i === 3 && j === 4 ? NaN : P / (R * T))),
  );
  const data = {
    temperaturesK,
    pressuresPa,
    values: grid,
    quantity: { name: "Molar density ρ", kind: "molarDensity" as const },
    critical: { temperatureK: 369.8, pressurePa: 4.25e6 },
    saturation: [
      { temperatureK: 260, pressurePa: 3.0e5, liquid: {}, vapor: {} },
      { temperatureK: 300, pressurePa: 1.0e6, liquid: {}, vapor: {} },
      { temperatureK: 340, pressurePa: 2.5e6, liquid: {}, vapor: {} },
    ],
  };

  it("validates and compiles; heat map cells, isolines, critical point, log P", async () => {
    const spec = propertySurfaceChart(data, { levels: 6 });
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
    const layers = allLayers(spec);
    const rect = layers.find((l) => (l.mark as any).type === "rect")!;
    expect(values(rect).length).toBe(15 * 12 - 1);
    expect(enc(rect).y.scale.type).toBe("log");
    expect(enc(rect).color.title).toBe("Molar density ρ / kmol/m³");
    expect(enc(rect).x.title).toBe("Temperature T / K");
    const iso = layers.find((l) => enc(l).detail && values(l).some((r) => r.level !== undefined))!;
    expect(new Set(values(iso).map((r) => r.level)).size).toBeGreaterThanOrEqual(3);
    expect(layers.some((l) => (l.mark as any).shape === "diamond")).toBe(true);
    expect(chartMeta(spec)!.warnings.join(" ")).toMatch(/1 grid cell/);
  });

  it("the compiled chart has a colour-bar legend titled with the quantity and unit", async () => {
    const { vega } = await compileSpec(propertySurfaceChart(data, { levels: 6 }));
    const legends =
      (vega as { legends?: { title?: string; fill?: string; stroke?: string }[] }).legends ?? [];
    expect(legends.map((l) => l.title)).toEqual(["Molar density ρ / kmol/m³"]);
    // A colour bar of the fill alone (a legend merged with the stroke draws as symbols).
    expect(legends[0].fill).toBeDefined();
    expect(legends[0].stroke).toBeUndefined();
  });

  it("explicit isoline levels in SI land where the field has that value", () => {
    const spec = propertySurfaceChart(
      {
        ...data,
        values: temperaturesK.map((T) => pressuresPa.map(() => T)),
        quantity: { name: "T copy", kind: "temperature" },
      },
      { levels: [300], units: { system: "SI", temperature: "degC" } },
    );
    const iso = allLayers(spec).find(
      (l) => enc(l).detail && values(l).some((r) => r.level !== undefined),
    )!;
    for (const r of values(iso)) expect(r.x).toBeCloseTo(300 - 273.15, 9);
    expect(values(iso)[0].level).toBe("26.85");
  });

  it("shows the quantity name as text", async () => {
    const spec = propertySurfaceChart({
      ...data,
      quantity: { name: "</text><script>x</script>", kind: "dimensionless" },
    });
    const svg = await renderSvgText(spec);
    expect(svg.includes("<script>")).toBe(false);
  });

  it("refuses bad grids", () => {
    expect(() =>
      propertySurfaceChart({ ...data, pressuresPa: [...pressuresPa].reverse() }),
    ).toThrow(/ascending/);
    expect(() => propertySurfaceChart({ ...data, values: grid.slice(1) })).toThrow(/values/);
    expect(() =>
      propertySurfaceChart({ ...data, values: grid.map((c) => c.map(() => NaN)) }),
    ).toThrow(/finite/);
    expect(() => propertySurfaceChart(data, { levels: 0 })).toThrow(/levels/);
  });
});

describe("modelVsDataChart", () => {
  const model = [
    {
      label: "model 350 K",
      points: Array.from({ length: 11 }, (_, i) => ({ x: 1e6 * i, y: 100 + 2e-5 * i * 1e6 })),
    },
  ];
  const data = [
    {
      label: "Corvid Point lab",
      points: [
        { x: 2.5e6, y: 1.01 * (100 + 50) },
        { x: 7e6, y: 0.98 * (100 + 140) },
        { x: 2e7, y: 1 },
      ],
    },
  ];
  const input = {
    x: { name: "Pressure P", kind: "pressure" as const },
    y: { name: "Molar density ρ", kind: "molarDensity" as const },
    model,
    data,
  };

  it("validates, compiles, two panels sharing x", async () => {
    const spec = modelVsDataChart(input);
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
    expect((spec.vconcat as unknown[]).length).toBe(2);
  });

  it("relative deviations by interpolation on the model (linear model: exact)", () => {
    const spec = modelVsDataChart(input);
    const lower = (spec.vconcat as any[])[1];
    const pts = values(lower.layer[1]);
    expect(pts.length).toBe(2); // the point at 20 MPa lies outside the model curve
    expect(pts[0].r).toBeCloseTo(1, 10);
    expect(pts[1].r).toBeCloseTo(-2, 10);
    expect(enc(lower.layer[1]).y.title).toBe("Deviation (data − model)/model / %");
    expect(chartMeta(spec)!.warnings.join(" ")).toMatch(/outside the model curve/);
  });

  it("absolute deviations in the property's display unit (differences: no offset)", () => {
    const spec = modelVsDataChart(
      { ...input, y: { name: "Temperature", kind: "temperature" } },
      { residual: "absolute", units: "field" },
    );
    const lower = (spec.vconcat as any[])[1];
    const pts = values(lower.layer[1]);
    // data - model = 1.5 K = 2.7 degF of difference (1 degF = 5/9 K)
    expect(pts[0].r).toBeCloseTo(1.5 * 1.8, 10);
  });

  it("refuses data with no model to compare to", () => {
    expect(() =>
      modelVsDataChart({
        ...input,
        model: [...model, { label: "other", points: model[0].points }],
      }),
    ).toThrow(/modelLabel/);
    expect(() => modelVsDataChart({ ...input, data: [] })).toThrow(InputError);
  });
});

describe("propertySurfaceChart on a fine grid", () => {
  it("caps the heat map cells, keeps the grid's corners, says so once", () => {
    const ts = Array.from({ length: 200 }, (_, i) => 250 + i);
    const ps = Array.from({ length: 200 }, (_, j) => 1e5 * Math.pow(10, (2 * j) / 199));
    const values = ts.map((T) => ps.map((P) => P / (R * T)));
    const spec = propertySurfaceChart(
      {
        temperaturesK: ts,
        pressuresPa: ps,
        values,
        quantity: { name: "ρ ideal gas", kind: "molarDensity" },
      },
      { maxHeatmapCells: 2500 },
    );
    const rect = allLayers(spec).find((l) => (l.mark as any).type === "rect")!;
    const cells = values.length && (rect.data as any).values.length;
    expect(cells).toBeLessThanOrEqual(2601); // stride 4: 50 samples + the last on each axis
    const xs = (rect.data as any).values.map((r: any) => r.x);
    const x2s = (rect.data as any).values.map((r: any) => r.x2);
    expect(Math.min(...xs)).toBeLessThan(250);
    expect(Math.max(...x2s)).toBeGreaterThan(449);
    expect(chartMeta(spec)!.warnings.filter((w) => /every 4th/.test(w)).length).toBe(1);
  });
});
