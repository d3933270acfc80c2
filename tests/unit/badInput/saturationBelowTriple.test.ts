/**
 * Bad-input issue item 1 and 7: saturation below the triple point. A requested pressure is met
 * (the metastable vapour-liquid line, with a warning naming the triple point) or refused with a
 * message naming the triple point; never clamped to the bracket end. The messages must name the
 * model's own triple point (its published value is checked against tests/fixtures elsewhere), so
 * the expected text is built from the model's field, not written here.
 */
import { describe, expect, it } from "vitest";
import { runEvalRequest } from "../../../kernel-lib/src/cli/eval.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { referenceStateTP } from "../../../kernel-lib/src/state/referenceStates.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { PhaseUnavailableError } from "../../../kernel-lib/src/errors.js";
import {
  saturationAtPressure,
  saturationAtTemperature,
} from "../../../kernel-lib/src/phase/saturation.js";

const co2 = referenceFluid("carbon-dioxide");
const water = referenceFluid("water");

/** "the triple point (T K" with the model's own triple-point temperature. */
function tripleText(fluid: typeof water): RegExp {
  return new RegExp(`triple point \\(${String(fluid.triple.temperatureK).replace(".", "\\.")} K`);
}

describe("saturation at a pressure below the triple-point pressure", () => {
  it("reference CO2 at 344342 Pa: the pressure is met or refused naming the triple point", () => {
    const res = runEvalRequest({
      model: "reference",
      components: ["carbon-dioxide"],
      states: [{ P: 344342, saturated: "liquid" }],
    }).states[0] as Record<string, unknown>;
    if ("error" in res) {
      expect(JSON.stringify(res.error)).toMatch(/triple point/);
    } else {
      expect(Math.abs((res.P as number) / 344342 - 1)).toBeLessThan(1e-9);
      expect((res.T as number) < co2.triple.temperatureK).toBe(true);
      expect(JSON.stringify(res.warnings)).toMatch(/triple point/);
    }
  });

  it("reference water at 300 Pa, quality 0.5: met (metastable, warned) at 300 Pa", () => {
    const res = runEvalRequest({
      model: "reference",
      components: ["water"],
      states: [{ P: 300, quality: 0.5 }],
    }).states[0] as Record<string, unknown>;
    if ("error" in res) {
      expect(JSON.stringify(res.error)).toMatch(/triple point/);
    } else {
      expect(Math.abs((res.P as number) / 300 - 1)).toBeLessThan(1e-9);
      expect(JSON.stringify(res.warnings)).toMatch(/triple point/);
    }
  });

  it("a pressure below what the equation's extrapolation range reaches is refused", () => {
    // water: the extrapolation range ends at 200 K (eos/multiparameter/data/water.json), where the
    // metastable saturation pressure of the equation is far above 1e-6 Pa
    expect(() => saturationAtPressure(water, 1e-6)).toThrow(PhaseUnavailableError);
    expect(() => saturationAtPressure(water, 1e-6)).toThrow(tripleText(water));
    expect(() => saturationAtPressure(co2, 1)).toThrow(tripleText(co2));
  });

  it("the saturation pressure at the returned temperature is the requested one", () => {
    for (const P of [5e5, 4e5, 3e5]) {
      const sat = saturationAtPressure(co2, P);
      expect(Math.abs(sat.pressurePa / P - 1)).toBeLessThan(1e-9);
      expect(
        Math.abs(saturationAtTemperature(co2, sat.temperatureK).pressurePa / P - 1),
      ).toBeLessThan(1e-9);
    }
  });

  it("a cubic below the lowest temperature searched is refused, not clamped", () => {
    // no triple point: the search floor is a fraction of Tc; the pressure must be met or refused
    let sat;
    try {
      sat = saturationAtPressure(defineFluid({ components: ["methane"] }).model, 1e-3);
    } catch (e) {
      expect(e).toBeInstanceOf(PhaseUnavailableError);
      return;
    }
    expect(Math.abs(sat.pressurePa / 1e-3 - 1)).toBeLessThan(1e-9);
  });
});

describe("saturation at a temperature below the triple point", () => {
  it("water at 200 K and 1 bar says below the triple point (solid region)", () => {
    expect(() => referenceStateTP(water, 200, 1e5)).toThrow(/triple point/);
    expect(() => referenceStateTP(water, 200, 1e5)).toThrow(/solid/);
    const res = runEvalRequest({
      model: "reference",
      components: ["water"],
      states: [{ T: 200, P: 1e5 }],
    }).states[0] as { error: { code: string; message: string } };
    // the reason leads; how the search failed follows only as detail
    expect(res.error.code).toBe("phase-unavailable");
    expect(res.error.message).toMatch(
      new RegExp(
        `^no vapour-liquid saturation state at T = 200 K: below the ${tripleText(water).source}.*solid region`,
      ),
    );
  });

  it("a temperature below the triple point is met with a warning naming it", () => {
    const sat = saturationAtTemperature(co2, 210);
    expect(sat.temperatureK).toBe(210);
    expect(sat.warnings.map((w) => w.message).join()).toMatch(tripleText(co2));
  });
});
