/* eslint-disable @typescript-eslint/no-explicit-any -- the tests read into plain JSON specs */
import { POINT_LABEL_SLOTS } from "../../../kernel-lib/src/charts/pointLabels.js";
import { describe, expect, it } from "vitest";
import { pressureEnthalpyChart } from "../../../kernel-lib/src/charts/pressureEnthalpy.js";
import { temperatureEntropyChart } from "../../../kernel-lib/src/charts/temperatureEntropy.js";
import { processPathChart, withProcessPath } from "../../../kernel-lib/src/charts/processPath.js";
import { chartMeta } from "../../../kernel-lib/src/charts/chartSpec.js";
import { InputError, UnknownNameError } from "../../../kernel-lib/src/errors.js";
import { allLayers, compileSpec, renderSvgText, roundFloats, schemaErrors } from "./specCheck.js";
import { SYNTHETIC_CRITICAL, syntheticPhIsotherm, syntheticSaturation } from "./sampleDiagrams.js";

/** Plotted coordinates keep 7 significant figures (charts/axisPlan.ts plotValue): compare to 1e-6. */
function expectRelative(actual: number, expected: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-6 * Math.abs(expected));
}

const enc = (l: Record<string, unknown>) => l.encoding as any;
const values = (l: Record<string, unknown>) => (l.data as any).values as any[];

function phData() {
  return {
    saturation: syntheticSaturation(),
    critical: SYNTHETIC_CRITICAL,
    isotherms: [0.8, 1, 1.2].map((tr) => ({
      temperatureK: tr * 369.8,
      points: syntheticPhIsotherm(tr),
    })),
    isentropes: [
      {
        entropyJPerMolK: 90,
        points: syntheticPhIsotherm(1.1).map((p) => ({
          ...p,
          enthalpyJPerMol: p.enthalpyJPerMol + 500,
        })),
      },
    ],
  };
}

// Propane molar mass 44.0956 g/mol (from memory of the IUPAC standard atomic weights, C 12.011,
// H 1.008); used here only as a scale for the per-kg basis.
const M_PROPANE = 0.0440956;

describe("pressureEnthalpyChart", () => {
  it("validates, compiles without warnings", async () => {
    const spec = pressureEnthalpyChart(phData());
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
  });

  it("has a log pressure axis and quantity/unit titles on every layer", () => {
    const layers = allLayers(pressureEnthalpyChart(phData()));
    for (const l of layers) {
      expect(enc(l).y.scale.type).toBe("log");
      expect(enc(l).y.title).toBe("Pressure P / MPa");
      expect(enc(l).x.title).toBe("Molar enthalpy h / kJ/mol");
    }
  });

  it("draws one series per isotherm, 4 quality lines, the isentrope and the critical point", () => {
    const layers = allLayers(pressureEnthalpyChart(phData()));
    const iso = layers.find((l) => enc(l).color)!;
    expect(new Set(values(iso).map((r) => r.series)).size).toBe(3);
    expect(enc(iso).strokeDash.scale.range.length).toBe(3);
    const qualityLine = layers.find((l) =>
      values(l).some((r) => String(r.series).startsWith("q = ")),
    )!;
    expect(new Set(values(qualityLine).map((r) => r.series))).toEqual(
      new Set(["q = 0.2", "q = 0.4", "q = 0.6", "q = 0.8"]),
    );
    expect(layers.some((l) => values(l).some((r) => r.series === "s = 90 J/(mol·K)"))).toBe(true);
    expect(layers.some((l) => (l.mark as any).shape === "diamond")).toBe(true);
  });

  it("quality lines follow the lever rule between liquid and vapour", () => {
    const rows = syntheticSaturation();
    const layers = allLayers(pressureEnthalpyChart({ saturation: rows }, { qualities: [0.25] }));
    const q = values(layers.find((l) => values(l).some((r) => r.series === "q = 0.25"))!).filter(
      (r) => r.series === "q = 0.25",
    );
    rows.forEach((r, i) => {
      const hl = r.liquid.enthalpyJPerMol!;
      const hv = r.vapor.enthalpyJPerMol!;
      expectRelative(q[i].x, (hl + 0.25 * (hv - hl)) / 1000);
      expectRelative(q[i].y, r.pressurePa / 1e6);
    });
  });

  it("per-kg basis in field units: Btu/lb and psia", () => {
    const spec = pressureEnthalpyChart(phData(), { molarMassKgPerMol: M_PROPANE, units: "field" });
    const layers = allLayers(spec);
    const iso = layers.find((l) => enc(l).color)!;
    expect(enc(iso).x.title).toBe("Specific enthalpy h / Btu/lb");
    expect(enc(iso).y.title).toBe("Pressure P / psia");
    const first = phData().isotherms[0].points[0];
    const row = values(iso)[0];
    // 1 Btu/lb = 2326 J/kg exactly (International Table Btu, NIST SP 811 App. B.9)
    expectRelative(row.x, first.enthalpyJPerMol / M_PROPANE / 2326);
    // 1 psi = 6894.757293168 Pa (NIST SP 811 App. B.9: 6.894757 E+03)
    expectRelative(row.y, first.pressurePa / 6894.757293168361);
    expect(chartMeta(spec)?.molarMassKgPerMol).toBe(M_PROPANE);
    expect(chartMeta(spec)?.units.pressure).toBe("psia");
  });

  it("leaves non-positive pressures out of the log axis and says so once", () => {
    const data = phData();
    data.isotherms[0].points = [
      ...data.isotherms[0].points,
      { pressurePa: -5, enthalpyJPerMol: 1 },
      { pressurePa: 0, enthalpyJPerMol: 2 },
    ];
    const spec = pressureEnthalpyChart(data);
    const warnings = chartMeta(spec)!.warnings;
    expect(warnings.length).toBe(1);
    expect(warnings[0]).toMatch(/2 point\(s\)/);
  });

  it("refuses bad input", () => {
    expect(() => pressureEnthalpyChart({})).toThrow(InputError);
    expect(() => pressureEnthalpyChart(phData(), { qualities: [1.2] })).toThrow(/qualities\[0\]/);
    expect(() => pressureEnthalpyChart(phData(), { molarMassKgPerMol: 0 })).toThrow(
      /molarMassKgPerMol/,
    );
    expect(() => pressureEnthalpyChart(phData(), { pressureRangePa: [0, 1e6] })).toThrow(
      /pressureRangePa/,
    );
    expect(() => pressureEnthalpyChart(phData(), { units: { pressure: "psi" } })).toThrow();
    expect(() => pressureEnthalpyChart(phData(), { units: { pressure: "furlong" } })).toThrow(
      UnknownNameError,
    );
    const bad = phData();
    bad.saturation[0].pressurePa = NaN;
    expect(() => pressureEnthalpyChart(bad)).toThrow(/saturation\[0\]\.pressurePa/);
  });

  it("snapshot of a small diagram (floats rounded)", () => {
    const rows = syntheticSaturation().filter((_, i) => i % 4 === 0);
    const spec = pressureEnthalpyChart(
      { saturation: rows, critical: SYNTHETIC_CRITICAL },
      { qualities: [0.5] },
    );
    expect(roundFloats(spec, 4)).toMatchSnapshot();
  });
});

describe("temperatureEntropyChart", () => {
  const isobars = [1e6, 3e6].map((p) => ({
    pressurePa: p,
    points: Array.from({ length: 30 }, (_, i) => ({
      temperatureK: 250 + 8 * i,
      entropyJPerMolK: 40 + 2.2 * i - 10 * Math.log(p / 1e6),
    })),
  }));

  it("validates, compiles, labels T and s with units, one series per isobar", async () => {
    const spec = temperatureEntropyChart(
      { saturation: syntheticSaturation(), critical: SYNTHETIC_CRITICAL, isobars },
      { units: { system: "SI", temperature: "degC", pressure: "bar" } },
    );
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
    const layers = allLayers(spec);
    const lines = layers.find((l) => enc(l).color)!;
    expect(enc(lines).y.title).toBe("Temperature T / °C");
    expect(enc(lines).x.title).toBe("Molar entropy s / J/(mol·K)");
    expect(enc(lines).y.scale.type).toBe("linear");
    expect([...new Set(values(lines).map((r) => r.series))]).toEqual(["10 bar", "30 bar"]);
    // 250 K = -23.15 degC (offset 273.15 K, definition of the Celsius scale)
    expectRelative(values(lines)[0].y, -23.15);
  });

  it("refuses empty data", () => {
    expect(() => temperatureEntropyChart({})).toThrow(InputError);
  });
});

describe("process paths", () => {
  const path = [
    {
      label: "suction",
      pressurePa: 1.2e6,
      temperatureK: 300,
      enthalpyJPerMol: 27000,
      entropyJPerMolK: 95,
    },
    {
      label: "discharge",
      pressurePa: 3.1e6,
      temperatureK: 360,
      enthalpyJPerMol: 29500,
      entropyJPerMolK: 96,
    },
    {
      label: "after cooler",
      pressurePa: 3.0e6,
      temperatureK: 320,
      enthalpyJPerMol: 14000,
      entropyJPerMolK: 50,
    },
  ];

  it("overlays on a P-h diagram in the diagram's units without changing it", async () => {
    const base = pressureEnthalpyChart(phData(), { units: "field", molarMassKgPerMol: M_PROPANE });
    const before = JSON.stringify(base);
    const spec = withProcessPath(base, path);
    expect(JSON.stringify(base)).toBe(before);
    // the line, the points, and one label layer per candidate slot around each point
    const added3 = 2 + POINT_LABEL_SLOTS.length;
    expect((spec.layer as unknown[]).length).toBe((base.layer as unknown[]).length + added3);
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
    const added = (spec.layer as any[]).slice(-added3);
    expect(enc(added[0]).y.scale.type).toBe("log");
    expect(enc(added[0]).x.title).toBe("Specific enthalpy h / Btu/lb");
    expectRelative(values(added[0])[1].x, 29500 / M_PROPANE / 2326);
    expect(values(added[2]).map((r) => r.tag)).toEqual([
      "1 suction",
      "2 discharge",
      "3 after cooler",
    ]);
  });

  it("draws on T-s axes on its own and shows labels as text", async () => {
    const spec = processPathChart(
      [{ ...path[0], label: "<img src=x onerror=alert(1)>" }, path[1]],
      { diagram: "temperature-entropy" },
    );
    expect(schemaErrors(spec)).toEqual([]);
    const svg = await renderSvgText(spec);
    expect(svg.includes("<img")).toBe(false);
    expect(svg.includes("&lt;img src=x onerror=alert(1)&gt;")).toBe(true);
  });

  it("refuses specs it did not build and incomplete states", () => {
    expect(() => withProcessPath({ mark: "point" }, path)).toThrow(InputError);
    expect(() => processPathChart([{ pressurePa: 1e5 }])).toThrow(/enthalpyJPerMol/);
    expect(() => processPathChart([], {})).toThrow(/states/);
    expect(() => processPathChart(path, { diagram: "h-s" as any })).toThrow(/diagram/);
  });
});
