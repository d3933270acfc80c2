/* eslint-disable @typescript-eslint/no-explicit-any -- the tests read into plain JSON specs */
import { describe, expect, it } from "vitest";
import { pressureEnthalpyChart } from "../../../kernel-lib/src/charts/pressureEnthalpy.js";
import { allLayers } from "./specCheck.js";
import { SYNTHETIC_CRITICAL, syntheticSaturation } from "./sampleDiagrams.js";

/** The rows of the text layer (none when no label is placed) of the quality-line labels ("q = ..."). */
function qualityLabels(spec: Record<string, unknown>): { x: number; y: number; label: string }[] {
  const layer = allLayers(spec).find(
    (l) =>
      (l.mark as any).type === "text" &&
      ((l.data as any)?.values ?? []).some((r: any) => String(r.label).startsWith("q = ")),
  );
  return layer ? (layer.data as any).values : [];
}

describe("quality-line labels of the P-h diagram", () => {
  const rows = syntheticSaturation();
  const data = { saturation: rows, critical: SYNTHETIC_CRITICAL };
  const pMin = rows[0].pressurePa;

  it("sit on the lowest saturation row when the whole dome is shown", () => {
    const labels = qualityLabels(pressureEnthalpyChart(data));
    expect(labels.map((l) => l.label)).toEqual(["q = 0.2", "q = 0.4", "q = 0.6", "q = 0.8"]);
    for (const l of labels) expect(l.y).toBeCloseTo(pMin / 1e6, 6);
  });

  it("move up to the lowest visible row when the pressure axis starts above the dome's foot", () => {
    // axis from 4x the lowest saturation pressure up to the critical pressure x 1.5
    const lo = 4 * pMin;
    const hi = 1.5 * SYNTHETIC_CRITICAL.pressurePa;
    const labels = qualityLabels(pressureEnthalpyChart(data, { pressureRangePa: [lo, hi] }));
    expect(labels).toHaveLength(4);
    // the first saturation row at least 4 % (log span) above the axis bottom
    const floor = Math.exp(Math.log(lo) + 0.04 * (Math.log(hi) - Math.log(lo)));
    const expected = rows.find((r) => r.pressurePa >= floor)!.pressurePa / 1e6;
    for (const l of labels) {
      expect(l.y).toBeGreaterThan(lo / 1e6);
      expect(l.y).toBeCloseTo(expected, 6);
    }
  });

  it("are left out for lines that never enter the visible window", () => {
    // an enthalpy window left of every quality line (the liquid side only)
    const hl = rows.map((r) => r.liquid.enthalpyJPerMol!);
    const labels = qualityLabels(
      pressureEnthalpyChart(
        { ...data, isotherms: [] },
        { enthalpyRangeJPerMol: [Math.min(...hl) - 2000, Math.min(...hl) + 500] },
      ),
    );
    expect(labels.length).toBeLessThan(4);
    const hMax = (Math.min(...hl) + 500) / 1000; // kJ/mol
    for (const l of labels) expect(l.x).toBeLessThan(hMax);
  });
});
