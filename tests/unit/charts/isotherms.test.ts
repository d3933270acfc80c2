/* eslint-disable @typescript-eslint/no-explicit-any -- the tests read into plain JSON specs */
import { describe, expect, it } from "vitest";
import { isothermChart } from "../../../kernel-lib/src/charts/isotherms.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { allLayers, compileSpec, renderSvgText, roundFloats, schemaErrors } from "./specCheck.js";
import { PC, TC, VC, vdwIsotherm } from "./vdwData.js";

// van der Waals coexistence at Tr = 0.9: Pr_sat ~ 0.647, vr_liq ~ 0.603, vr_vap ~ 2.349
// (from memory of Johnston, "Advances in Thermodynamics of the van der Waals Fluid", 2014,
// coexistence table). Used only to place a tie line in the chart; not asserted as physics.
const equalArea = {
  pressurePa: 0.647 * PC,
  liquidDensityMolPerM3: 1 / (0.603 * VC),
  vaporDensityMolPerM3: 1 / (2.349 * VC),
};

function sample() {
  return {
    isotherms: [
      { temperatureK: 0.9 * TC, points: vdwIsotherm(0.9), equalArea },
      { temperatureK: TC, points: vdwIsotherm(1) },
      { temperatureK: 1.2 * TC, points: vdwIsotherm(1.2) },
    ],
    saturation: [
      {
        temperatureK: 0.9 * TC,
        pressurePa: equalArea.pressurePa,
        liquid: { densityMolPerM3: equalArea.liquidDensityMolPerM3 },
        vapor: { densityMolPerM3: equalArea.vaporDensityMolPerM3 },
      },
      // Tr = 0.8: Pr ~ 0.383, vr 0.5336 / 4.175 (from memory of the same table; drawing only).
      {
        temperatureK: 0.8 * TC,
        pressurePa: 0.383 * PC,
        liquid: { densityMolPerM3: 1 / (0.5336 * VC) },
        vapor: { densityMolPerM3: 1 / (4.175 * VC) },
      },
    ],
    critical: { temperatureK: TC, pressurePa: PC, densityMolPerM3: 1 / VC },
  };
}

describe("isothermChart", () => {
  it("validates against the Vega-Lite schema and compiles", async () => {
    const spec = isothermChart(sample());
    expect(schemaErrors(spec)).toEqual([]);
    const { warnings } = await compileSpec(spec);
    expect(warnings).toEqual([]);
  });

  it("labels axes with quantity and unit, SI and field", () => {
    const si = allLayers(isothermChart(sample()));
    const line = si.find((l) => (l.encoding as any)?.color);
    expect((line!.encoding as any).x.title).toBe("Molar volume v / m³/kmol");
    expect((line!.encoding as any).y.title).toBe("Pressure P / MPa");
    expect((line!.encoding as any).x.scale.type).toBe("log");
    const field = allLayers(isothermChart(sample(), { units: "field", x: "density" }));
    const fl = field.find((l) => (l.encoding as any)?.color);
    expect((fl!.encoding as any).x.title).toBe("Molar density ρ / lbmol/ft³");
    expect((fl!.encoding as any).y.title).toBe("Pressure P / psia");
    expect((fl!.encoding as any).x.scale.type).toBe("linear");
  });

  it("draws one series per isotherm, the tie line and both lobes", () => {
    const layers = allLayers(isothermChart(sample()));
    const line = layers.find((l) => (l.encoding as any)?.color)!;
    const series = new Set(((line.data as any).values as any[]).map((r) => r.series));
    expect(series.size).toBe(3);
    expect([...series][0]).toBe("171.5 K");
    const rule = layers.find((l) => (l.mark as any).type === "rule")!;
    const tie = (rule.data as any).values[0];
    expect(tie.y).toBeCloseTo(0.647 * 4.599, 6);
    const lobes = layers.find((l) => (l.mark as any).type === "area" && (l.encoding as any).y2)!;
    const ys = ((lobes.data as any).values as any[]).map((r) => r.y - r.y2);
    // A loop crosses the tie line: points both below and above it.
    expect(ys.some((d) => d > 0)).toBe(true);
    expect(ys.some((d) => d < 0)).toBe(true);
  });

  it("caps the pressure axis at twice the critical pressure by default", () => {
    const layers = allLayers(isothermChart(sample()));
    const line = layers.find((l) => (l.encoding as any)?.color)!;
    expect((line.encoding as any).y.scale.domain[1]).toBeCloseTo(2 * 4.599, 9);
  });

  it("converts units: degF labels and psia values", () => {
    const spec = isothermChart(sample(), { units: "field" });
    const line = allLayers(spec).find((l) => (l.encoding as any)?.color)!;
    const labels = [...new Set(((line.data as any).values as any[]).map((r) => r.series))];
    // 171.54 K = -150.9 degF (T/K * 9/5 - 459.67)
    expect(labels[0]).toBe("-150.9 °F");
  });

  it("snapshot (floats rounded)", () => {
    const spec = isothermChart({
      isotherms: [{ temperatureK: 200, points: vdwIsotherm(1.05, 6) }],
    });
    expect(roundFloats(spec, 4)).toMatchSnapshot();
  });

  it("renders user labels as text, never as expressions", async () => {
    const data = sample();
    (data.isotherms[0] as any).label = "<script>alert(1)</script>";
    (data.isotherms[1] as any).label = "datum.x + ' injected'";
    const spec = isothermChart(data, {
      title: "{{datum.y}} <b>title</b>",
      subtitle: "signal: width",
    });
    expect(schemaErrors(spec)).toEqual([]);
    const svg = await renderSvgText(spec);
    expect(svg.includes("&lt;script&gt;alert(1)&lt;/script&gt;")).toBe(true);
    expect(svg.includes("<script>")).toBe(false);
    // The expression-like label arrives verbatim (not evaluated) in the legend's description.
    expect(svg.includes("Isotherm: datum.x + ' injected'")).toBe(true);
    expect(svg.includes(">{{datum.y}} &lt;b&gt;title&lt;/b&gt;</text>")).toBe(true);
  });

  it("refuses bad input with typed errors", () => {
    expect(() => isothermChart({ isotherms: [] })).toThrow(InputError);
    expect(() => isothermChart({ isotherms: [{ temperatureK: NaN, points: [] }] })).toThrow(
      /temperatureK/,
    );
    expect(() => isothermChart(sample(), { x: "volume" as any })).toThrow(InputError);
    expect(() => isothermChart(sample(), { pressureRangePa: [5, 1] })).toThrow(/pressureRangePa/);
    expect(() => isothermChart(sample(), { width: -3 })).toThrow(/width/);
    expect(() => isothermChart(sample(), { units: "imperial" as any })).toThrow(/unit system/);
  });
});
