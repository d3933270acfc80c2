/** Bad input to the process steps is refused with a typed error naming the input. */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { defineStream } from "../../../kernel-lib/src/process/stream.js";
import { valve } from "../../../kernel-lib/src/process/valve.js";
import { compressorStage } from "../../../kernel-lib/src/process/compressor.js";
import { compressorTrain } from "../../../kernel-lib/src/process/compressorTrain.js";
import { turbine } from "../../../kernel-lib/src/process/turbine.js";
import { pump } from "../../../kernel-lib/src/process/pump.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

const gas = defineFluid({ components: ["methane", "propane"], model: "peng-robinson" });
const feed = defineStream({
  fluid: gas,
  z: [0.9, 0.1],
  T: 300,
  P: 20e5,
  flow: { value: 10, unit: "kmol/h" },
});

function refused(fn: () => unknown, input: RegExp): void {
  let caught: unknown;
  try {
    fn();
  } catch (e) {
    caught = e;
  }
  expect(caught).toBeInstanceOf(InputError);
  expect((caught as InputError).input).toMatch(input);
}

describe("process steps refuse bad input", () => {
  it("efficiencies: negative, zero, above 1, NaN, a percentage, none, both", () => {
    for (const eta of [-0.5, 0, 1.2, NaN, 78]) {
      refused(
        () => compressorStage(feed, { outletPressurePa: 40e5, isentropicEfficiency: eta }),
        /isentropicEfficiency/,
      );
      refused(
        () => compressorStage(feed, { outletPressurePa: 40e5, polytropicEfficiency: eta }),
        /polytropicEfficiency/,
      );
      refused(
        () => turbine(feed, { outletPressurePa: 5e5, isentropicEfficiency: eta }),
        /isentropicEfficiency/,
      );
    }
    expect(() =>
      compressorStage(feed, { outletPressurePa: 40e5, isentropicEfficiency: 78 }),
    ).toThrow(/0.78/);
    refused(
      () => compressorStage(feed, { outletPressurePa: 40e5 }),
      /isentropicEfficiency \/ polytropicEfficiency/,
    );
    refused(
      () =>
        compressorStage(feed, {
          outletPressurePa: 40e5,
          isentropicEfficiency: 0.8,
          polytropicEfficiency: 0.8,
        }),
      /isentropicEfficiency \/ polytropicEfficiency/,
    );
  });

  it("pressures: valve and turbine outlet above the inlet, compressor outlet below", () => {
    refused(() => valve(feed, { outletPressurePa: 30e5 }), /outletPressurePa/);
    refused(() => valve(feed, { outletPressurePa: -1 }), /outletPressurePa/);
    refused(
      () => turbine(feed, { outletPressurePa: 30e5, isentropicEfficiency: 0.8 }),
      /outletPressurePa/,
    );
    refused(
      () => turbine(feed, { outletPressurePa: 20e5, isentropicEfficiency: 0.8 }),
      /outletPressurePa/,
    );
    refused(
      () => compressorStage(feed, { outletPressurePa: 10e5, isentropicEfficiency: 0.8 }),
      /outletPressurePa/,
    );
    refused(
      () => compressorStage(feed, { outletPressurePa: NaN, isentropicEfficiency: 0.8 }),
      /outletPressurePa/,
    );
  });

  it("a pump fed with vapour", () => {
    refused(() => pump(feed, { outletPressurePa: 40e5, efficiency: 0.7 }), /^inlet$/);
    expect(() => pump(feed, { outletPressurePa: 40e5, efficiency: 0.7 })).toThrow(/liquid/);
  });

  it("a flow without units, a standard volume without reference conditions", () => {
    const base = { fluid: gas, z: [0.9, 0.1], T: 300, P: 20e5 };
    refused(() => defineStream({ ...base, flow: { value: 10 } as never }), /flow.unit/);
    refused(() => defineStream({ ...base, flow: 10 as never }), /^flow$/);
    refused(() => defineStream({ ...base, flow: { value: 10, unit: "Nm3/h" } }), /flow.reference/);
    refused(
      () => defineStream({ ...base, flow: { value: 10, unit: "MMSCFD", reference: "standard" } }),
      /flow.reference/,
    );
  });

  it("trains: stages, interstage pressures, intercooler temperatures, limits", () => {
    const spec = {
      outletPressurePa: 60e5,
      polytropicEfficiency: 0.78,
      intercoolerTemperatureK: 310,
    };
    refused(() => compressorTrain(feed, spec), /stages/);
    refused(() => compressorTrain(feed, { ...spec, stages: 0 }), /stages/);
    refused(
      () => compressorTrain(feed, { ...spec, interstagePressuresPa: [10e5] }),
      /interstagePressuresPa\[0\]/,
    );
    refused(
      () => compressorTrain(feed, { ...spec, stages: 3, intercoolerTemperatureK: [310] }),
      /intercoolerTemperatureK/,
    );
    refused(
      () => compressorTrain(feed, { ...spec, stages: 2, intercoolerTemperatureK: -5 }),
      /intercoolerTemperatureK/,
    );
    refused(
      () =>
        compressorStage(feed, {
          outletPressurePa: 40e5,
          isentropicEfficiency: 0.8,
          dischargeTemperatureLimitK: -1,
        }),
      /dischargeTemperatureLimitK/,
    );
    refused(() => valve(feed, { outletPressurePa: 5e5, pathPoints: 1 }), /pathPoints/);
    refused(() => valve(null as never, { outletPressurePa: 5e5 }), /inlet/);
  });
});
