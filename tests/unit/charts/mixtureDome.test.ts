/* eslint-disable @typescript-eslint/no-explicit-any -- the tests read into plain JSON specs */
/**
 * Mixture domes on the P-h and T-s diagrams (charts/sample/mixtureDomeFromFluid.ts,
 * charts/domeLayers.ts mixtureEnergyDomeLayers): the dome's points are the envelope's, its h and s
 * are those of the saturated feed from the bubble- and dew-point solvers, a flash just inside the
 * dome at the same P has a vapour fraction near 0 or 1 and the dome's h, just outside it one phase;
 * the specs validate, compile and render; bad input is refused. Internal consistency checks (issue
 * 12, "Checks to include": flash vs envelope), no external reference values.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { mixtureDomeFromFluid } from "../../../kernel-lib/src/charts/sample/mixtureDomeFromFluid.js";
import { pressureEnthalpyChart } from "../../../kernel-lib/src/charts/pressureEnthalpy.js";
import { temperatureEntropyChart } from "../../../kernel-lib/src/charts/temperatureEntropy.js";
import { chartMeta } from "../../../kernel-lib/src/charts/chartSpec.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import type { ChartMixtureDome } from "../../../kernel-lib/src/charts/mixtureDomeInput.js";
import { allLayers, compileSpec, renderSvgText, schemaErrors } from "./specCheck.js";

// a light LPG-like feed (invented): its bubble line at 2 bar (213 K) stays inside the ideal-gas
// cp ranges of the table (200 K and up)
const gas = defineFluid({ components: ["ethane", "propane", "n-butane"], model: "peng-robinson" });
const z = [0.5, 0.3, 0.2];
const { mixtureDome: dome, envelope } = mixtureDomeFromFluid(gas, z, {
  vaporFractions: [0.25, 0.5, 0.75],
  envelopeOptions: { minimumPressurePa: 2e5 },
});
const values = (l: Record<string, unknown>) => (l.data as any).values as any[];

function overallH(T: number, P: number): { h: number; beta: number; phases: number } {
  const eq = gas.flashTP(T, P, z);
  const h = eq.phases.reduce((a, p) => a + p.amount * p.state.molar.h, 0);
  const v = eq.phases.find((p) => p.kind === "vapor");
  return { h, beta: v ? v.amount : 0, phases: eq.phases.length };
}

describe("mixtureDomeFromFluid", () => {
  it("has one boundary point per envelope point, at the same T and P, and closes", () => {
    expect(envelope.complete).toBe(true);
    expect(dome.complete).toBe(true);
    expect(dome.boundary.length).toBe(envelope.points.length);
    dome.boundary.forEach((b, i) => {
      expect(b.temperatureK).toBe(envelope.points[i].T);
      expect(b.pressurePa).toBe(envelope.points[i].P);
      expect(b.kind).toBe(envelope.points[i].kind);
    });
    expect(dome.boundary.some((b) => b.kind === "bubble")).toBe(true);
    expect(dome.boundary.some((b) => b.kind === "dew")).toBe(true);
  });

  it("the ends at the minimum pressure are the feed at its bubble and dew points", () => {
    const first = dome.boundary[0];
    const last = dome.boundary[dome.boundary.length - 1];
    for (const end of [first, last]) {
      const point =
        end.kind === "bubble"
          ? gas.bubblePointAtPressure(end.pressurePa, z)
          : gas.dewPointAtPressure(end.pressurePa, z);
      const feedState = end.kind === "bubble" ? point.liquid : point.vapor;
      expect(Math.abs(point.temperatureK - end.temperatureK)).toBeLessThan(1e-6);
      expect(Math.abs(feedState.molar.h - (end.enthalpyJPerMol as number))).toBeLessThan(1e-3);
      expect(Math.abs(feedState.molar.s - (end.entropyJPerMolK as number))).toBeLessThan(1e-6);
    }
    expect(new Set([first.kind, last.kind])).toEqual(new Set(["bubble", "dew"]));
  });

  it("a flash just inside the dome at the same P has beta near 0 (bubble) or 1 (dew) and the dome's h", () => {
    // one point of each kind well away from the critical point (the middle of each run below it)
    const P0 = 20e5;
    for (const kind of ["bubble", "dew"] as const) {
      const run = dome.boundary.filter((b) => b.kind === kind && b.pressurePa < 40e5);
      const b = run.reduce((best, p) =>
        Math.abs(Math.log(p.pressurePa / P0)) < Math.abs(Math.log(best.pressurePa / P0)) ? p : best,
      );
      const dT = 1e-3; // K
      const inside = overallH(b.temperatureK + (kind === "bubble" ? dT : -dT), b.pressurePa);
      const outside = overallH(b.temperatureK + (kind === "bubble" ? -dT : dT), b.pressurePa);
      expect(inside.phases).toBe(2);
      expect(outside.phases).toBe(1);
      if (kind === "bubble") expect(inside.beta).toBeLessThan(1e-3);
      else expect(inside.beta).toBeGreaterThan(1 - 1e-3);
      // the flash's h differs from the dome's by the heat of 1 mK of the two-phase feed (< 1 J/mol
      // for a latent heat of order 1e4 J/mol over a boiling range of tens of K) and by the 1 mK of
      // single-phase heating outside
      expect(Math.abs(inside.h - (b.enthalpyJPerMol as number))).toBeLessThan(1);
      expect(Math.abs(outside.h - (b.enthalpyJPerMol as number))).toBeLessThan(1);
    }
  });

  it("quality lines carry the flash's overall h and lie between the bubble and dew lines", () => {
    const lines = dome.qualityLines ?? [];
    expect(lines.map((l) => l.vaporFraction).sort()).toEqual([0.25, 0.5, 0.75]);
    const line = lines.find((l) => l.vaporFraction === 0.5);
    expect(line && line.points.length).toBeGreaterThan(5);
    // at the quality point nearest 20 bar, the feed's h lies between the bubble-point liquid and
    // the dew-point vapour at the same P (h rises with T through the two-phase region)
    const q = line!.points.reduce((best, p) =>
      Math.abs(Math.log(p.pressurePa / 20e5)) < Math.abs(Math.log(best.pressurePa / 20e5))
        ? p
        : best,
    );
    const hb = gas.bubblePointAtPressure(q.pressurePa, z).liquid.molar.h;
    const hd = gas.dewPointAtPressure(q.pressurePa, z).vapor.molar.h;
    expect(q.enthalpyJPerMol as number).toBeGreaterThan(hb);
    expect(q.enthalpyJPerMol as number).toBeLessThan(hd);
  });

  it("the critical point is the envelope's, with the feed's h there", () => {
    const c = envelope.critical[0];
    expect(dome.critical?.temperatureK).toBe(c.T);
    expect(dome.critical?.pressurePa).toBe(c.P);
    const s = gas.stateAtTP(c.T, c.P, z);
    expect(dome.critical?.enthalpyJPerMol).toBe(s.molar.h);
  });

  it("leaves out points below an ideal-gas range and says so", () => {
    // a methane-rich gas down to 1 bar: bubble points near 177 K, below n-butane's 200 K
    const lean = defineFluid({
      components: ["methane", "propane", "n-butane"],
      model: "peng-robinson",
    });
    const full = mixtureDomeFromFluid(lean, [0.8, 0.12, 0.08]);
    expect(full.mixtureDome.boundary.length).toBeLessThan(full.envelope.points.length);
    expect(full.mixtureDome.complete).toBe(false); // no fill over a boundary with a gap
    expect(full.mixtureDome.notes?.join(" ")).toMatch(/left out \(first reason: .*n-butane/);
  });

  it("refuses an envelope of another feed", () => {
    expect(() => mixtureDomeFromFluid(gas, [0.7, 0.2, 0.1], { envelope })).toThrow(InputError);
  });
});

describe("pressureEnthalpyChart and temperatureEntropyChart with a mixture dome", () => {
  const ph = pressureEnthalpyChart({ mixtureDome: dome }, { title: "Rich gas P-h" });
  const ts = temperatureEntropyChart({ mixtureDome: dome }, { units: "field" });

  it("validate against the Vega-Lite schema, compile and render", async () => {
    for (const spec of [ph, ts]) {
      expect(schemaErrors(spec)).toEqual([]);
      const { warnings } = await compileSpec(spec);
      expect(warnings).toEqual([]);
      const svg = await renderSvgText(spec);
      expect(svg).toContain("critical point");
      // the only notes: quality-line points within 0.1 K of the critical point, where the flash
      // refuses (typed error) rather than return an unconverged split
      for (const w of chartMeta(spec)!.warnings) expect(w).toMatch(/^vapour fraction 0.5: 2 point/);
    }
  });

  it("draw bubble and dew runs joined at the critical point, a fill and the quality lines", () => {
    const layers = allLayers(ph);
    const boundary = layers.find(
      (l: any) => l.mark?.type === "line" && l.mark?.strokeWidth === 2.2,
    ) as any;
    const rows = values(boundary);
    expect(new Set(rows.map((r) => r.series))).toEqual(new Set(["dew line", "bubble line"]));
    // exactly one point is on both runs: the critical point that joins them
    const key = (r: any) => `${r.x}|${r.y}`;
    const dew = new Set(rows.filter((r) => r.series === "dew line").map(key));
    const shared = rows.filter((r) => r.series === "bubble line" && dew.has(key(r)));
    expect(shared.length).toBe(1);
    const marks = layers.find((l: any) => l.mark?.shape === "diamond") as any;
    const mark = values(marks)[0];
    expect(Math.abs(mark.x / shared[0].x - 1)).toBeLessThan(1e-6);
    expect(Math.abs(mark.y / shared[0].y - 1)).toBeLessThan(1e-6);
    const fill = layers.find((l: any) => l.mark?.type === "line" && l.mark?.fill) as any;
    expect(values(fill).length).toBe(dome.boundary.length + 1);
    const labels = layers
      .filter((l: any) => l.mark?.type === "text")
      .flatMap((l: any) => values(l).map((r) => r.label));
    expect(labels).toContain("β = 0.5");
    expect(labels).toContain("critical point");
  });

  it("an incomplete dome is drawn without fill and says why", () => {
    const part: ChartMixtureDome = {
      boundary: dome.boundary.filter((b) => b.kind === "dew"),
      complete: false,
      notes: ["phase envelope incomplete: test note"],
    };
    const spec = pressureEnthalpyChart({ mixtureDome: part });
    expect(schemaErrors(spec)).toEqual([]);
    const w = chartMeta(spec)!.warnings;
    expect(w.some((m) => m.includes("not closed"))).toBe(true);
    expect(w).toContain("phase envelope incomplete: test note");
    expect(allLayers(spec).some((l: any) => l.mark?.fill)).toBe(false);
  });

  it("refuses malformed domes", () => {
    const bad = (d: unknown) => () => pressureEnthalpyChart({ mixtureDome: d as ChartMixtureDome });
    expect(bad({ boundary: "no" })).toThrow(InputError);
    expect(
      bad({ ...dome, boundary: [{ ...dome.boundary[0], kind: "steam" }], complete: false }),
    ).toThrow(InputError);
    expect(bad({ ...dome, boundary: [{ ...dome.boundary[0], pressurePa: NaN }] })).toThrow(
      InputError,
    );
    expect(bad({ ...dome, qualityLines: [{ vaporFraction: 1, points: [] }] })).toThrow(InputError);
  });
});
