/* eslint-disable @typescript-eslint/no-explicit-any -- the tests read into plain JSON specs */
/**
 * The phase-envelope chart (charts/phaseEnvelope.ts): schema-valid and compiling, branches joined
 * at the critical point, landmarks and quality lines present, a process path drawn over it, units,
 * an incomplete envelope's warning, and bad input.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { phaseEnvelopeChart } from "../../../kernel-lib/src/charts/phaseEnvelope.js";
import { chartMeta } from "../../../kernel-lib/src/charts/chartSpec.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { allLayers, compileSpec, renderSvgText, schemaErrors } from "./specCheck.js";

const gas = defineFluid({ components: ["methane", "propane", "n-butane"], model: "peng-robinson" });
const z = [0.8, 0.12, 0.08];
const env = gas.envelope(z, { vaporFractions: [0.1, 0.5, 0.9] });
const values = (l: Record<string, unknown>) => (l.data as any).values as any[];

describe("phaseEnvelopeChart", () => {
  const spec = phaseEnvelopeChart(env, {
    path: [
      { T: 320, P: 80e5, label: "separator" },
      { T: 290, P: 30e5, label: "after the valve" },
    ],
  });

  it("validates against the Vega-Lite schema, compiles and renders", async () => {
    expect(env.complete).toBe(true);
    expect(schemaErrors(spec)).toEqual([]);
    const { warnings } = await compileSpec(spec);
    expect(warnings).toEqual([]);
    const svg = await renderSvgText(spec);
    expect(svg).toContain("cricondentherm");
    expect(svg).toContain("after the valve");
  });

  it("draws both branches joined at the critical point, and the quality lines", () => {
    const lines = allLayers(spec).find((l: any) => l.mark?.type === "line" && l.encoding?.color);
    const rows = values(lines as any);
    const series = new Set(rows.map((r) => r.series));
    expect([...series]).toEqual([
      "dew line",
      "bubble line",
      "vapour fraction 0.1",
      "vapour fraction 0.9",
      "vapour fraction 0.5",
    ]);
    // the critical point (K, MPa in SI display units) ends the dew run and starts the bubble run
    const c = env.critical[0];
    const cx = Number(c.T.toPrecision(7));
    const cy = Number((c.P / 1e6).toPrecision(7));
    const at = rows.filter((r) => r.x === cx && r.y === cy);
    expect(at.map((r) => r.series).sort()).toEqual(["bubble line", "dew line"]);
    expect(new Set(at.map((r) => r.path)).size).toBe(2);
  });

  it("marks the critical point, cricondenbar and cricondentherm", () => {
    const marks = allLayers(spec).find((l: any) => l.encoding?.shape);
    const labels = values(marks as any).map((r) => r.label);
    expect(labels).toEqual(["critical point", "cricondenbar", "cricondentherm"]);
    const bar = values(marks as any)[1];
    expect(bar.y).toBeCloseTo(env.cricondenbar!.P / 1e6, 9);
  });

  it("field units convert the axes; an incomplete envelope becomes a chart warning", () => {
    const field = phaseEnvelopeChart(env, { units: "field" });
    expect(chartMeta(field)?.units).toEqual({ temperature: "degF", pressure: "psia" });
    const cut = phaseEnvelopeChart({
      ...env,
      complete: false,
      stoppedBecause: "the continuation could not get past T = 300 K, P = 5e6 Pa",
    });
    expect(chartMeta(cut)?.warnings[0]).toMatch(/incomplete: the continuation/);
    expect(schemaErrors(cut)).toEqual([]);
  });

  it("an empty envelope still gives a valid chart with a warning", async () => {
    const empty = phaseEnvelopeChart({ points: [], complete: false, stoppedBecause: "none" });
    expect(schemaErrors(empty)).toEqual([]);
    await compileSpec(empty);
    expect(chartMeta(empty)?.warnings.length).toBe(2);
  });

  it("refuses NaN coordinates with InputError", () => {
    expect(() =>
      phaseEnvelopeChart({ points: [{ T: NaN, P: 1e5, kind: "dew", segment: 0 }] }),
    ).toThrow(InputError);
    expect(() => phaseEnvelopeChart(env, { path: [{ T: 300, P: -1 }] })).toThrow(InputError);
  });
});
