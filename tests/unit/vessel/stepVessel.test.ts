import { describe, expect, it } from "vitest";
import { RequestError } from "../../../kernel-lib/src/errors.js";
import { vesselSeriesCsv, vesselStepFromRequest } from "../../../kernel-lib/src/cli/stepVessel.js";
import { stepCommand } from "../../../kernel-lib/src/cli/step.js";
import { fakeIo } from "../eval/fakeIo.js";

const request = {
  model: "peng-robinson",
  components: ["methane"],
  inlet: { T: 298.15, P: 50e5 },
  step: {
    kind: "vessel",
    volume: 2,
    outlet: { diameter: 0.02, dischargeCoefficient: 0.8, backPressure: 1e5 },
    heat: "adiabatic",
    until: { P: 30e5 },
  },
};

function pathOf(raw: unknown): string {
  try {
    vesselStepFromRequest(raw);
  } catch (e) {
    expect(e).toBeInstanceOf(RequestError);
    return (e as RequestError).path;
  }
  throw new Error("not refused");
}

describe("vessel step of isochor step", () => {
  it("returns the series, the minimum and the cautions, and CSV of the series", () => {
    const r = vesselStepFromRequest(request);
    const n = r.series.time.length;
    expect(n).toBeGreaterThan(3);
    for (const key of ["P", "T", "mass", "massFlow", "liquidFraction"] as const) {
      expect(r.series[key]).toHaveLength(n);
    }
    expect(r.stoppedBecause).toBe("target-pressure");
    expect(r.series.P[n - 1]).toBeCloseTo(30e5, -1);
    expect(r.minimum.T).toBe(r.series.T[n - 1]);
    expect(r.cautions.join(" ")).toMatch(/licensed engineers/);
    const csv = vesselSeriesCsv(r).trim().split("\n");
    expect(csv[0]).toBe("time_s,P_Pa,T_K,Twall_K,mass_kg,massFlow_kg_per_s,liquidFraction");
    expect(csv).toHaveLength(n + 1);
    // adiabatic: the wall is not modelled, so no wall temperature (null, an empty CSV column)
    expect(r.wallModelled).toBe(false);
    expect(r.series.Twall).toBeNull();
    expect(r.minimum.Twall).toBeNull();
    expect(csv[1].split(",")[3]).toBe("");
    expect(csv[1].split(",")).toHaveLength(7);
  });

  it("reports the wall temperature of a run with a wall", () => {
    const r = vesselStepFromRequest({
      ...request,
      step: {
        ...request.step,
        wall: { thickness: 0.02 },
        heat: { inside: { coefficient: 100 }, outside: { kind: "air", ambientT: 293.15 } },
      },
    });
    expect(r.wallModelled).toBe(true);
    expect(r.series.Twall).toHaveLength(r.series.time.length);
    expect(r.minimum.Twall).toBeLessThan(298.15);
    const row = vesselSeriesCsv(r).trim().split("\n")[2].split(",");
    expect(Number(row[3])).toBeGreaterThan(200);
  });

  it("refuses bad fields with their JSON paths", () => {
    const step = request.step;
    expect(pathOf({ ...request, step: { ...step, volume: 0 } })).toBe("$.step.volume");
    expect(
      pathOf({ ...request, step: { ...step, outlet: { ...step.outlet, backPressure: 60e5 } } }),
    ).toBe("$.step.outlet.backPressure");
    expect(pathOf({ ...request, step: { ...step, kind: "valve" } })).toBe("$.step.kind");
    expect(pathOf({ ...request, inlet: { T: 300 } })).toBe("$.inlet.P");
    expect(pathOf({ ...request, components: ["unobtainium"] })).toMatch(/^\$\.components/);
    expect(pathOf({ ...request, step: { ...step, until: {} } })).toBe("$.step.until");
    // the bad-input catalogue's vessel cases, through the request (tests/unit/badInput)
    const out = step.outlet;
    expect(pathOf({ ...request, step: { ...step, volume: -2 } })).toBe("$.step.volume");
    expect(pathOf({ ...request, step: { ...step, outlet: { ...out, diameter: 2 } } })).toBe(
      "$.step.outlet.diameter",
    );
    expect(pathOf({ ...request, step: { ...step, outlet: { ...out, backPressure: 50e5 } } })).toBe(
      "$.step.outlet.backPressure",
    );
    for (const cd of [0, -0.5, 1.2]) {
      expect(
        pathOf({ ...request, step: { ...step, outlet: { ...out, dischargeCoefficient: cd } } }),
      ).toBe("$.step.outlet.dischargeCoefficient");
    }
    expect(pathOf({ ...request, step: { ...step, wall: { thickness: -0.01 } } })).toBe(
      "$.step.wall.thickness",
    );
    expect(pathOf({ ...request, step: { ...step, wall: { thickness: 0.01, mass: -5 } } })).toBe(
      "$.step.wall.mass",
    );
    expect(pathOf({ ...request, step: { ...step, until: { time: -1 } } })).toBe(
      "$.step.until.time",
    );
  });

  it("runs through isochor step: JSON by default, CSV with --csv and the cautions on stderr", async () => {
    const json = fakeIo(JSON.stringify(request));
    expect(await stepCommand([], json)).toBe(0);
    const body = JSON.parse(json.out) as { series: { time: number[] }; cautions: string[] };
    expect(body.series.time.length).toBeGreaterThan(3);
    const csv = fakeIo(JSON.stringify(request));
    expect(await stepCommand(["--csv"], csv)).toBe(0);
    expect(csv.out.split("\n")[0]).toBe(
      "time_s,P_Pa,T_K,Twall_K,mass_kg,massFlow_kg_per_s,liquidFraction",
    );
    expect(csv.out.trim().split("\n")).toHaveLength(body.series.time.length + 1);
    expect(csv.err).toMatch(/caution: .*licensed engineers/);
    const bad = fakeIo(JSON.stringify({ ...request, step: { ...request.step, volume: -1 } }));
    expect(await stepCommand([], bad)).toBe(2);
    expect(JSON.parse(bad.out).error.path).toBe("$.step.volume");
  });
});
