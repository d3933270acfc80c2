/**
 * Point labels (critical point, process-path states) take a slot around their point that stays
 * inside the plot, clear of other labels and of drawn lines; linear axes get 1-2-5 minimum tick
 * steps; a one-entry legend is dropped and its series named in the subtitle. Geometry in pixels
 * from the fixed axis ranges; drawing data only, no thermodynamics asserted.
 */
import { describe, expect, it } from "vitest";
import { pressureEnthalpyChart } from "../../../kernel-lib/src/charts/pressureEnthalpy.js";
import { withProcessPath } from "../../../kernel-lib/src/charts/processPath.js";
import { POINT_LABEL_SLOTS } from "../../../kernel-lib/src/charts/pointLabels.js";
import { linearMinStep, step125 } from "../../../kernel-lib/src/charts/linearTicks.js";
import { isothermChart } from "../../../kernel-lib/src/charts/isotherms.js";
import { compileSpec, schemaErrors } from "./specCheck.js";
import { TC, vdwIsotherm } from "./vdwData.js";

const W = 520;
const H = 340;
const options = {
  width: W,
  height: H,
  pressureRangePa: [1e5, 1e7] as const,
  enthalpyRangeJPerMol: [18000, 28000] as const,
};
/** A guide line far left, out of the way (a P-h chart needs something to draw). */
const far = {
  isentropes: [
    {
      entropyJPerMolK: 50,
      points: [1e5, 1e6, 1e7].map((p) => ({ pressurePa: p, enthalpyJPerMol: 18300 })),
    },
  ],
};
type Layer = {
  mark: { type?: string; dx?: number; dy?: number; align?: string; fontSize?: number };
  data?: { values?: Record<string, unknown>[] };
  transform?: { filter: { equal: number } }[];
};
/** The slot and label rows of a point-label family. */
function placed(spec: { layer?: unknown }, group: string) {
  const layers = (spec.layer as Layer[]).filter((l) =>
    (l.data?.values ?? []).some((r) => r["labelGroup"] === group),
  );
  expect(layers.length).toBeGreaterThan(1);
  return (layers[0].data!.values ?? []).map((r) => {
    const slot = r["labelSlot"] as number;
    const layer = layers.find((l) => l.transform?.[0].filter.equal === slot)!;
    return { row: r, slot, mark: layer.mark };
  });
}
const px = (hKJ: number, pMPa: number) => ({
  x: ((hKJ - 18) / 10) * W,
  y: (1 - Math.log(pMPa / 0.1) / Math.log(100)) * H,
});
/** Estimated text box (0.68 em per bold character, as the placement estimates it). */
function box(p: { x: number; y: number }, mark: Layer["mark"], text: string) {
  const size = mark.fontSize ?? 10;
  const w = 0.68 * size * text.length;
  const x = p.x + (mark.dx ?? 0);
  const x0 = mark.align === "left" ? x : mark.align === "right" ? x - w : x - w / 2;
  const y = p.y + (mark.dy ?? 0);
  return { x0, x1: x0 + w, y0: y - 0.6 * size, y1: y + 0.6 * size };
}

describe("point labels", () => {
  it("the critical label leaves the slot an isotherm runs through", async () => {
    // An isotherm running up and to the right from the critical point through the first slot.
    const critical = { temperatureK: 300, pressurePa: 1e6, enthalpyJPerMol: 22000 };
    const through = {
      temperatureK: 300,
      points: [0, 1, 2, 3, 4].map((k) => ({
        pressurePa: 1e6 * Math.pow(1.5, k),
        enthalpyJPerMol: 22000 + 600 * k,
      })),
    };
    const free = placed(pressureEnthalpyChart({ ...far, critical }, options), "critical");
    expect(free[0].slot).toBe(0);
    const spec = pressureEnthalpyChart({ ...far, critical, isotherms: [through] }, options);
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
    expect(placed(spec, "critical")[0].slot).not.toBe(0);
  });

  it("path tags stay inside the plot and do not overlap, even for close states at the edge", () => {
    const states = [
      { label: "suction", pressurePa: 1e6, enthalpyJPerMol: 21000 },
      { label: "after strainer", pressurePa: 1.05e6, enthalpyJPerMol: 21050 },
      { label: "discharge", pressurePa: 6e6, enthalpyJPerMol: 27950 }, // at the right edge
    ];
    const spec = withProcessPath(pressureEnthalpyChart(far, options), states);
    const tags = placed(spec, `path-${(pressureEnthalpyChart(far, options).layer as []).length}`);
    const boxes = tags.map((t, i) =>
      box(
        px(states[i].enthalpyJPerMol / 1e3, states[i].pressurePa / 1e6),
        t.mark,
        String(t.row["tag"]),
      ),
    );
    for (const b of boxes) {
      expect(b.x0).toBeGreaterThanOrEqual(0);
      expect(b.x1).toBeLessThanOrEqual(W);
      expect(b.y0).toBeGreaterThanOrEqual(0);
      expect(b.y1).toBeLessThanOrEqual(H);
    }
    expect(tags[2].mark.align).toBe("right"); // the last one turned to the left of its point
    const apart = (a: (typeof boxes)[0], b: (typeof boxes)[0]) =>
      a.x1 <= b.x0 || b.x1 <= a.x0 || a.y1 <= b.y0 || b.y1 <= a.y0;
    expect(apart(boxes[0], boxes[1])).toBe(true);
  });

  it("without placement every row shows in the first slot, once", () => {
    expect(POINT_LABEL_SLOTS[0]).toMatchObject({ align: "left" });
    const spec = pressureEnthalpyChart(
      { ...far, critical: { temperatureK: 300, pressurePa: 1e6, enthalpyJPerMol: 22000 } },
      options,
    );
    const rows = placed(spec, "critical");
    expect(rows).toHaveLength(1);
  });
});

describe("linear tick steps", () => {
  it("are 1-2-5 numbers", () => {
    expect(step125(0.7)).toBe(1);
    expect(step125(1.3)).toBe(2);
    expect(step125(42)).toBe(50);
    expect(step125(80)).toBe(100);
    expect(step125(0.0031)).toBe(0.005);
  });

  it("wide labels on a narrow axis get a wider 1-2-5 step, never 40 or 80", () => {
    // h from -4500 to -3000 kJ/kg on 520 px: labels like "−4500" (5-6 characters)
    const step = linearMinStep(-4500, -3000, 520, true)!;
    expect([100, 200, 500]).toContain(step);
    const narrow = linearMinStep(-4500, -3000, 200, true)!;
    expect(narrow).toBeGreaterThan(step - 1e-9);
    expect(linearMinStep(1, 1, 520, true)).toBeUndefined();
  });

  it("are set on the linear axes of a builder's spec", () => {
    const spec = pressureEnthalpyChart(far, options) as { layer: Layer[] };
    const x = (
      spec.layer as unknown as { encoding?: { x?: { axis?: { tickMinStep?: number } } } }[]
    )
      .map((l) => l.encoding?.x?.axis?.tickMinStep)
      .filter((v) => v !== undefined);
    expect(x.length).toBeGreaterThan(0);
    expect([1, 2, 5]).toContain(x[0]! / Math.pow(10, Math.floor(Math.log10(x[0]!))));
  });
});

describe("legends", () => {
  it("a one-entry legend is dropped and the series named in the subtitle", async () => {
    const spec = isothermChart(
      { isotherms: [{ temperatureK: 1.2 * TC, points: vdwIsotherm(1.2), label: "at 1.2 Tc" }] },
      { subtitle: "van der Waals" },
    );
    const text = JSON.stringify(spec);
    expect(text).toContain('"legend":null');
    expect((spec.title as unknown as { subtitle: string[] }).subtitle).toEqual([
      "van der Waals",
      "Isotherm: at 1.2 Tc",
    ]);
    expect(schemaErrors(spec)).toEqual([]);
    expect((await compileSpec(spec)).warnings).toEqual([]);
    const two = isothermChart({
      isotherms: [
        { temperatureK: 1.2 * TC, points: vdwIsotherm(1.2) },
        { temperatureK: 1.3 * TC, points: vdwIsotherm(1.3) },
      ],
    });
    expect(JSON.stringify(two)).not.toContain('"legend":null');
  });
});
