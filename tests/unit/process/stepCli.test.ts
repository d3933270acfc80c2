/**
 * `isochor step` (cli/step.ts, stepRequest.ts, schema/step-request.schema.json): request and
 * response field names, the numbers against the library's own step functions, bad requests
 * refused with their JSON path and exit code 2.
 */
import { describe, expect, it } from "vitest";
import { runStepRequest, stepCommand } from "../../../kernel-lib/src/cli/step.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { defineStream } from "../../../kernel-lib/src/process/stream.js";
import { cooler } from "../../../kernel-lib/src/process/heater.js";
import { PROCESS_CAUTION } from "../../../kernel-lib/src/process/types.js";
import { fakeIo } from "../eval/fakeIo.js";

const fluid = { model: "peng-robinson", components: ["methane", "propane"], x: [0.8, 0.2] };
const inlet = { T: 350, P: 2e6, flow: { value: 36, unit: "kmol/h" } };

async function run(
  request: unknown,
): Promise<{ code: number; body: Record<string, unknown>; err: string }> {
  const io = fakeIo(JSON.stringify(request));
  const code = await stepCommand([], io);
  return { code, body: JSON.parse(io.out) as Record<string, unknown>, err: io.err };
}

describe("isochor step: responses", () => {
  it("a cooler: the response fields, and the numbers of the library's cooler", async () => {
    const { code, body } = await run({ ...fluid, inlet, step: { kind: "cooler", T: 220 } });
    expect(code).toBe(0);
    for (const key of ["outlet", "outlets", "power", "duty", "specificWork", "path", "warnings"])
      expect(body).toHaveProperty(key);
    const gas = defineFluid({ components: ["methane", "propane"], model: "peng-robinson" });
    const s = defineStream({
      fluid: gas,
      z: [0.8, 0.2],
      T: 350,
      P: 2e6,
      flow: { value: 36, unit: "kmol/h" },
    });
    const r = cooler(s, { outletTemperatureK: 220 });
    expect(body.duty).toBeCloseTo(r.dutyW, 6);
    expect(body.power).toBe(0);
    const outlet = body.outlet as Record<string, unknown>;
    expect(outlet.T).toBe(220);
    expect(outlet.P).toBe(2e6);
    expect(outlet).toHaveProperty("phases");
    expect(outlet.molarFlow).toBeCloseTo(10, 12); // 36 kmol/h = 10 mol/s
    expect(body.caution).toBe(PROCESS_CAUTION);
    expect(
      (body.check as { energyBalanceRelativeError: number }).energyBalanceRelativeError,
    ).toBeLessThan(1e-9);
    const curve = body.heatCurve as { marker?: string }[];
    expect(curve.some((p) => p.marker === "dew")).toBe(
      r.heatCurve.saturationPoints.some((m) => m.kind === "dew"),
    );
    expect((body.path as unknown[]).length).toBe(r.path.length);
  });

  it("a separator lists every phase in outlets; a mixer takes inlets", async () => {
    const sep = runStepRequest({
      ...fluid,
      x: [0.5, 0.5],
      inlet: { ...inlet, T: 240 },
      step: { kind: "separator" },
    });
    expect(sep.outlets.length).toBe(2);
    expect(sep.outlets.map((o) => (o as { phase?: string }).phase)).toEqual(["vapor", "liquid"]);
    const total = sep.outlets.reduce((m, o) => m + o.molarFlow, 0);
    expect(Math.abs(total - 10)).toBeLessThan(1e-12);
    const mix = runStepRequest({
      ...fluid,
      inlet,
      inlets: [{ T: 300, P: 1.5e6, x: [0.5, 0.5], flow: { value: 1, unit: "kg/s" } }],
      step: { kind: "mixer" },
    });
    expect((mix.outlet as { P?: number }).P).toBe(1.5e6);
    expect(mix.duty).toBe(0);
  });

  it("an exchanger reports its minimum approach and both curves", () => {
    const r = runStepRequest({
      model: "reference",
      components: ["water"],
      inlet: { T: 400, P: 101325, flow: { value: 1, unit: "mol/s" } },
      step: {
        kind: "exchanger",
        duty: 30e3,
        cold: { T: 300, P: 5e5, flow: { value: 6, unit: "mol/s" } },
      },
    });
    expect(r.minimumApproach?.location).toBe("inside");
    expect(r.outlets.length).toBe(2);
    expect(r.duty).toBe(30e3);
    expect(r.curves?.hot.some((p) => p.marker === "dew")).toBe(true);
  });
});

describe("isochor step: the steps of the other process files", () => {
  it("a valve: no power, no duty, the outlet at the given pressure", () => {
    const r = runStepRequest({ ...fluid, inlet, step: { kind: "valve", P: 5e5 } });
    expect(r.kind).toBe("valve");
    expect(r.power).toBe(0);
    expect((r.outlet as { P?: number }).P).toBe(5e5);
    // Joule-Thomson cooling of a methane/propane gas
    expect((r.outlet as { T?: number }).T).toBeLessThan(350);
  });

  it("a compressor stage: power into the fluid, specificWork = power / molar flow", () => {
    const r = runStepRequest({
      ...fluid,
      inlet,
      step: { kind: "compressor", P: 5e6, polytropicEfficiency: 0.78 },
    });
    expect(r.power).toBeGreaterThan(0);
    expect(Math.abs(r.specificWork - r.power / 10) / r.specificWork).toBeLessThan(1e-12);
  });
});

describe("isochor step: turbine, pump and trains", () => {
  const water = { model: "reference", components: ["water"] };
  it("a steam turbine gives power out of the fluid (negative)", () => {
    const r = runStepRequest({
      ...water,
      inlet: { T: 700, P: 40e5, flow: { value: 10, unit: "t/h" } },
      step: { kind: "turbine", P: 1e5, isentropicEfficiency: 0.8 },
    });
    expect(r.kind).toBe("turbine");
    expect(r.power).toBeLessThan(0);
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
  });

  it("a pump takes its efficiency from isentropicEfficiency", () => {
    const r = runStepRequest({
      ...water,
      inlet: { T: 300, P: 1e5, flow: { value: 20, unit: "kg/s" } },
      step: { kind: "pump", P: 20e5, isentropicEfficiency: 0.7 },
    });
    expect(r.power).toBeGreaterThan(0);
    // the ideal pump work v dP / eta, about 20 kg/s * (19e5 Pa / 996.5 kg/m3) / 0.7 = 54.5 kW
    // (hand calculation, liquid density of water at 300 K from memory of the steam tables)
    expect(Math.abs(r.power - 54.5e3) / 54.5e3).toBeLessThan(0.01);
  });

  it("a two-stage train with intercooling lists every outlet", () => {
    const r = runStepRequest({
      ...fluid,
      inlet: { T: 300, P: 10e5, flow: { value: 1, unit: "mol/s" } },
      step: {
        kind: "compressor",
        P: 60e5,
        stages: 2,
        polytropicEfficiency: 0.78,
        intercoolerT: 313.15,
      },
    });
    expect(r.kind).toBe("compressor-train");
    expect(r.power).toBeGreaterThan(0);
    expect((r.outlet as { P?: number }).P).toBeCloseTo(60e5, 6);
  });
});

describe("isochor step: bad requests", () => {
  const cases: [string, unknown, string][] = [
    [
      "flow without a unit",
      { ...fluid, inlet: { T: 300, P: 1e6, flow: { value: 1 } }, step: { kind: "heater", T: 320 } },
      "$.inlet.flow.unit",
    ],
    [
      "unknown flow unit",
      {
        ...fluid,
        inlet: { T: 300, P: 1e6, flow: { value: 1, unit: "furlongs" } },
        step: { kind: "heater", T: 320 },
      },
      "$.inlet.flow.unit",
    ],
    [
      "standard volume without reference",
      {
        ...fluid,
        inlet: { T: 300, P: 1e6, flow: { value: 1000, unit: "Sm3/h" } },
        step: { kind: "heater", T: 320 },
      },
      "$.inlet.flow.reference",
    ],
    ["unknown step kind", { ...fluid, inlet, step: { kind: "reactor" } }, "$.step.kind"],
    [
      "both T and duty",
      { ...fluid, inlet, step: { kind: "heater", T: 400, duty: 1e3 } },
      "$.step.duty",
    ],
    ["neither T nor duty", { ...fluid, inlet, step: { kind: "cooler" } }, "$.step.T"],
    [
      "a field the kind does not take",
      { ...fluid, inlet, step: { kind: "separator", duty: 5 } },
      "$.step.duty",
    ],
    ["a heater that cools", { ...fluid, inlet, step: { kind: "heater", T: 300 } }, "$.step.T"],
    ["negative T", { ...fluid, inlet, step: { kind: "cooler", T: -5 } }, "$.step.T"],
    ["mixer without inlets", { ...fluid, inlet, step: { kind: "mixer" } }, "$.inlets"],
    [
      "mixer outlet above lowest inlet",
      { ...fluid, inlet, inlets: [inlet], step: { kind: "mixer", P: 3e6 } },
      "$.step.P",
    ],
    [
      "inlet x not summing to 1",
      { ...fluid, inlet, inlets: [{ ...inlet, x: [0.5, 0.4] }], step: { kind: "mixer" } },
      "$.inlets[0].x",
    ],
    [
      "exchanger without cold stream",
      { ...fluid, inlet, step: { kind: "exchanger", duty: 1 } },
      "$.step.cold",
    ],
    [
      "misspelt field",
      { ...fluid, inlet, step: { kind: "cooler", temperature: 300 } },
      "$.step.temperature",
    ],
    [
      "fluid x of the wrong size",
      { ...fluid, x: [1], inlet, step: { kind: "cooler", T: 300 } },
      "$.x",
    ],
    [
      "efficiency above 1",
      { ...fluid, inlet, step: { kind: "compressor", P: 5e6, isentropicEfficiency: 1.5 } },
      "$.step.isentropicEfficiency",
    ],
    [
      "a valve outlet above its inlet",
      { ...fluid, inlet, step: { kind: "valve", P: 3e6 } },
      "$.step.P",
    ],
    ["a valve without P", { ...fluid, inlet, step: { kind: "valve" } }, "$.step.P"],
    [
      "a train without an intercooler temperature",
      {
        ...fluid,
        inlet,
        step: { kind: "compressor", P: 6e6, stages: 2, isentropicEfficiency: 0.8 },
      },
      "$.step.intercoolerT",
    ],
    [
      "a turbine outlet above its inlet",
      { ...fluid, inlet, step: { kind: "turbine", P: 3e6, isentropicEfficiency: 0.8 } },
      "$.step.P",
    ],
  ];
  for (const [what, request, path] of cases) {
    it(`refuses ${what} at ${path} with exit 2`, async () => {
      const { code, body, err } = await run(request);
      expect(code).toBe(2);
      const error = body.error as { code: string; path: string; message: string };
      expect(error.code).toBe("bad-request");
      expect(error.path).toBe(path);
      expect(err).toContain(path);
    });
  }

  it("refuses text that is not JSON, with exit 2", async () => {
    const io = fakeIo("{ not json");
    expect(await stepCommand([], io)).toBe(2);
    expect(JSON.parse(io.out).error.path).toBe("$");
  });
});
