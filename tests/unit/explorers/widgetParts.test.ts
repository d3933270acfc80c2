import { describe, expect, it } from "vitest";
import { createExplorerState } from "../../../kernel-lib/src/explorers/createExplorerState.js";
import { ExplorerModel, readState } from "../../../widgets/src/explorers/explorerModel.js";
import { splitData } from "../../../widgets/src/explorers/liveChart.js";
import { sliderPosition, sliderValue } from "../../../widgets/src/explorers/controls.js";
import type { SliderControl } from "../../../kernel-lib/src/explorers/explorerControls.js";

describe("ExplorerModel (widget-protocol model)", () => {
  it("announces changes on save_changes, per key and once overall", () => {
    const state = createExplorerState("isotherms", { components: "methane" });
    const model = new ExplorerModel(state);
    const heard: string[] = [];
    model.on("change", () => heard.push("change"));
    model.on("change:temperatureK", () => heard.push("T"));
    model.set("temperatureK", state.kind === "isotherms" ? state.temperatureK : 0); // unchanged
    model.save_changes();
    expect(heard).toEqual([]);
    model.set({ temperatureK: 150, model: "van-der-waals" });
    expect(heard).toEqual([]); // nothing before save_changes
    model.save_changes();
    expect(heard).toEqual(["T", "change"]);
    expect(readState(model, Object.keys(state))).toMatchObject({
      temperatureK: 150,
      model: "van-der-waals",
    });
    model.off("change");
    model.set("temperatureK", 160);
    model.save_changes();
    expect(heard).toEqual(["T", "change", "T"]);
  });
});

describe("splitData", () => {
  const spec = (title: string, ys: number[]) => ({
    title,
    layer: [
      { data: { values: ys.map((y, x) => ({ x, y })) }, mark: "line" },
      { data: { values: [{ x: 0, y: 0 }] }, mark: "point" },
    ],
    usermeta: { isochor: { warnings: [String(ys.length)] } },
  });

  it("moves inline data to named data sets; equal skeletons differ only in data", () => {
    const a = splitData(spec("T", [1, 2, 3]));
    const b = splitData(spec("T", [4, 5, 6, 7]));
    const c = splitData(spec("other title", [1, 2, 3]));
    expect(Object.keys(a.datasets)).toEqual(["d0", "d1"]);
    expect(a.datasets.d0).toHaveLength(3);
    expect(JSON.stringify(a.spec)).not.toContain('"values"');
    expect(a.skeleton).toBe(b.skeleton); // warnings in usermeta do not count
    expect(a.skeleton).not.toBe(c.skeleton);
  });
});

describe("slider mapping", () => {
  const lin: SliderControl = {
    type: "slider",
    key: "t",
    label: "T",
    quantity: "temperature",
    min: 200,
    max: 400,
    value: 300,
    steps: 400,
  };
  const log: SliderControl = { ...lin, quantity: "pressure", min: 1e4, max: 1e7, log: true };
  it("maps positions to values and back, ends exact", () => {
    for (const c of [lin, log]) {
      expect(sliderValue(c, 0)).toBe(c.min);
      expect(sliderValue(c, c.steps)).toBe(c.max);
      for (const p of [1, 57, 200, 399]) expect(sliderPosition(c, sliderValue(c, p))).toBe(p);
    }
    expect(sliderValue(log, 200)).toBeCloseTo(Math.sqrt(1e4 * 1e7), 6);
  });
});
