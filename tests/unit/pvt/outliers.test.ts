import { describe, expect, it } from "vitest";
import { departuresFromPvt, pvtFromArrays } from "../../../kernel-lib/src/pvt/index.js";
import { campaign, geometric, range } from "./campaign.js";
import { pressurePR } from "./pengRobinsonTruth.js";

const spec = {
  densities: geometric(200, 6000, 6),
  temperatures: range(310, 370, 7),
  pressure: pressurePR,
  relativeUP: 2e-4,
  seed: 11,
};

describe("points set aside by the route are listed with the reason", () => {
  it("sets aside a gross outlier (a 0.5 % pressure error, 25 u(P)) and names its line", () => {
    const ds = campaign(spec);
    const k = 17; // an interior point of the third isochore
    const bad = { ...ds.points[k]!, pressurePa: ds.points[k]!.pressurePa * 1.005 };
    const points = ds.points.map((p, i) => (i === k ? bad : p));
    const r = departuresFromPvt({ ...ds, points }, { monteCarloSamples: 0 });
    expect(r.setAside).toHaveLength(1);
    expect(r.setAside[0]?.line).toBe(bad.line);
    expect(r.setAside[0]?.reason).toMatch(/^outlier: residual \d+\.\d u\(P\)/);
    expect(r.diagnostics.some((d) => d.code === "set-aside" && d.severity === "warning")).toBe(
      true,
    );
  });

  it("sets aside nothing in a clean noisy campaign (threshold 4.5 u)", () => {
    const r = departuresFromPvt(campaign(spec), { monteCarloSamples: 0 });
    expect(r.setAside).toEqual([]);
  });

  it("lists points that are not on any isochore (used in the surface fit only)", () => {
    const ds = campaign({ ...spec, seed: undefined, relativeUP: undefined });
    const extra = pvtFromArrays({
      temperatureK: [333],
      densityMolPerM3: [2500],
      pressurePa: [pressurePR(333, 2500)],
    });
    const points = [...ds.points, { ...extra.points[0]!, line: 999 }];
    const r = departuresFromPvt({ ...ds, points }, { monteCarloSamples: 0 });
    expect(r.setAside.map((s) => s.line)).toEqual([999]);
    expect(r.setAside[0]?.reason).toMatch(/surface fit only/);
  });
});
