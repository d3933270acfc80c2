/**
 * Guide labels (isentropes on P-h) keep clear of the state-point label of a process path and of
 * the critical-point label. Geometry checked in pixels from the fixed axis ranges of the chart.
 */
import { describe, expect, it } from "vitest";
import { pressureEnthalpyChart } from "../../../kernel-lib/src/charts/pressureEnthalpy.js";
import { withProcessPath } from "../../../kernel-lib/src/charts/processPath.js";
import { logGrid } from "../../../kernel-lib/src/charts/sampling.js";
import { chartMeta } from "../../../kernel-lib/src/charts/chartSpec.js";
import { compileSpec, schemaErrors } from "./specCheck.js";

// Drawing data only: a straight isentrope in (h, log P); no thermodynamics is asserted.
const pressures = logGrid(1e5, 1e7, 40);
const isentrope = {
  entropyJPerMolK: 100,
  points: pressures.map((p) => ({
    pressurePa: p,
    enthalpyJPerMol: 20000 + 3000 * Math.log10(p / 1e5),
  })),
};
const W = 520;
const H = 340;
const options = {
  width: W,
  height: H,
  pressureRangePa: [1e5, 1e7] as const,
  enthalpyRangeJPerMol: [18000, 28000] as const,
};
/** Pixel position of a point in display units (kJ/mol, MPa) on these fixed axes. */
const px = (hKJ: number, pMPa: number) => ({
  x: ((hKJ - 18) / 10) * W,
  y: (1 - Math.log(pMPa / 0.1) / Math.log(100)) * H,
});

function labelRows(spec: ReturnType<typeof pressureEnthalpyChart>, role: string, field: string) {
  return (
    spec.layer as { mark: { type?: string }; data?: { values?: Record<string, unknown>[] } }[]
  )
    .filter((l) => l.mark.type === "text")
    .flatMap((l) => l.data?.values ?? [])
    .filter((r) => r["labelRole"] === role && field in r);
}

describe("isentrope labels on a P-h diagram", () => {
  it("move off a state point that sits where the label would go", async () => {
    const base = pressureEnthalpyChart({ isentropes: [isentrope] }, options);
    const [first] = labelRows(base, "guide", "label");
    // The state is put exactly at the label's first choice along the line.
    const statePa = (first.y as number) * 1e6;
    const stateH = (first.x as number) * 1e3;
    const spec = withProcessPath(base, [
      { label: "compressor suction", pressurePa: statePa, enthalpyJPerMol: stateH },
    ]);
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
    const guide = labelRows(spec, "guide", "label");
    expect(guide).toHaveLength(1); // kept, not dropped: the line has free room
    const state = px(first.x as number, first.y as number);
    const label = px(guide[0].x as number, guide[0].y as number);
    // State tag "1 compressor suction": bold 10.5 px from (x + 7, y - 7) rightwards, about
    // 150 px wide and 11 px tall; the isentrope label starts at (x + 3, y - 4), 9 px tall.
    const clearVertically = label.y - 4 > state.y - 7 + 3 || label.y - 4 < state.y - 7 - 10.5 - 9;
    const clearHorizontally = label.x + 3 > state.x + 7 + 150 || label.x + 3 + 120 < state.x + 7;
    expect(clearVertically || clearHorizontally).toBe(true);
    // It stays on its own line (coordinates are written with 7 significant figures).
    const onLine = isentrope.points.some(
      (p) =>
        Math.abs(p.enthalpyJPerMol / 1e3 / (guide[0].x as number) - 1) < 1e-6 &&
        Math.abs(p.pressurePa / 1e6 / (guide[0].y as number) - 1) < 1e-6,
    );
    expect(onLine).toBe(true);
    expect(chartMeta(spec)!.chart).toBe("pressure-enthalpy");
  });

  it("keep clear of the critical-point label", () => {
    // Critical point at the label's first choice (60 % along the line).
    const probe = labelRows(
      pressureEnthalpyChart({ isentropes: [isentrope] }, options),
      "guide",
      "label",
    )[0];
    const spec = pressureEnthalpyChart(
      {
        isentropes: [isentrope],
        critical: {
          temperatureK: 300,
          pressurePa: (probe.y as number) * 1e6,
          enthalpyJPerMol: (probe.x as number) * 1e3,
        },
      },
      options,
    );
    const [label] = labelRows(spec, "guide", "label");
    expect(label.x === probe.x && label.y === probe.y).toBe(false);
  });

  it("several isentropes: labels do not overlap each other", () => {
    const isentropes = [0, 1, 2, 3].map((k) => ({
      entropyJPerMolK: 100 + k,
      points: pressures.map((p) => ({
        pressurePa: p,
        enthalpyJPerMol: 20000 + 150 * k + 3000 * Math.log10(p / 1e5),
      })),
    }));
    const spec = pressureEnthalpyChart({ isentropes }, options);
    const labels = labelRows(spec, "guide", "label").map((r) => px(r.x as number, r.y as number));
    for (let i = 0; i < labels.length; i++) {
      for (let j = i + 1; j < labels.length; j++) {
        // Boxes 9 px tall and about 110 px wide ("s = 10x J/(mol·K)" at 9 px).
        const apart =
          Math.abs(labels[i].y - labels[j].y) >= 9 || Math.abs(labels[i].x - labels[j].x) >= 110;
        expect(apart).toBe(true);
      }
    }
  });
});
