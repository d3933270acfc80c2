/**
 * The property surface's critical-point label takes a slot inside the plot (labelPlacement.ts)
 * like the P-h and T-s diagrams: a critical point in the top-right corner of the grid must not put
 * its label outside the frame. Drawing data only, no thermodynamics asserted.
 */
import { describe, expect, it } from "vitest";
import { propertySurfaceChart } from "../../../kernel-lib/src/charts/propertySurface.js";
import { schemaErrors } from "./specCheck.js";

type Layer = {
  mark: { type?: string; align?: string; dx?: number; dy?: number };
  data?: { values?: Record<string, unknown>[] };
  transform?: { filter: { equal: number } }[];
};

function surface(criticalAt: { temperatureK: number; pressurePa: number }) {
  const temperaturesK = [250, 275, 300, 325, 350];
  const pressuresPa = [1e5, 1e6, 1e7];
  const values = temperaturesK.map((T) => pressuresPa.map((P) => T / 300 + P / 1e7));
  return propertySurfaceChart(
    {
      temperaturesK,
      pressuresPa,
      values,
      quantity: { name: "Z", kind: "dimensionless" },
      critical: { ...criticalAt, densityMolPerM3: 10000 },
    },
    { width: 400, height: 300 },
  );
}

/** The slot chosen for the critical label and its text mark. */
function criticalSlot(spec: { layer?: unknown }) {
  const layers = (spec.layer as Layer[]).filter((l) =>
    (l.data?.values ?? []).some((r) => r["labelGroup"] === "critical"),
  );
  expect(layers.length).toBeGreaterThan(1);
  const slot = layers[0].data!.values![0]["labelSlot"] as number;
  return layers.find((l) => l.transform?.[0].filter.equal === slot)!.mark;
}

describe("property surface: the critical-point label", () => {
  it("is placed (a valid spec, the label in one of its slots)", () => {
    const spec = surface({ temperatureK: 300, pressurePa: 1e6 });
    expect(schemaErrors(spec)).toEqual([]);
    expect(["left", "right", "center"]).toContain(criticalSlot(spec).align);
  });

  it("turns to the left of a point at the right edge (unplaced, it would run out of the frame)", () => {
    // the first slot is above right (align "left"); at the right edge only a left slot fits
    for (const pressurePa of [0.98e7, 1e6, 1.2e5]) {
      const mark = criticalSlot(surface({ temperatureK: 349.5, pressurePa }));
      expect(mark.align, `${pressurePa} Pa`).toBe("right");
    }
  });
});
