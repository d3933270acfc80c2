// `isochor eval` with "transport": true adds viscosity and thermal conductivity (transport/) to
// single-phase entries; without it the response is unchanged.
import { describe, expect, it } from "vitest";
import { runEvalRequest } from "../../../kernel-lib/src/cli/eval.js";
import { RequestError } from "../../../kernel-lib/src/errors.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";

function states(request: unknown): Record<string, unknown>[] {
  return runEvalRequest(request).states as unknown as Record<string, unknown>[];
}

describe("eval: transport properties", () => {
  it("are absent unless asked for (an old request keeps its response)", () => {
    const [s] = states({
      model: "peng-robinson",
      components: ["methane"],
      states: [{ T: 300, P: 5e6 }],
    });
    expect(s).not.toHaveProperty("viscosity");
    expect(s).not.toHaveProperty("thermalConductivity");
  });

  it("equal the library's values for a single-phase state (Chung)", () => {
    const [s] = states({
      model: "peng-robinson",
      components: ["methane", "ethane"],
      x: [0.9, 0.1],
      transport: true,
      states: [{ T: 300, P: 5e6 }],
    });
    const t = defineFluid({ components: ["methane", "ethane"] }).transportAtTP(
      300,
      5e6,
      [0.9, 0.1],
    );
    expect(s.viscosity).toBe(t.viscosityPaS);
    expect(s.thermalConductivity).toBe(t.thermalConductivityWPerMK);
    expect(s.transportMethod).toBe("chung-1988");
  });

  it("water with model reference: IAPWS (about 890 uPa s at 25 degC, R12-08 Table 4 from memory)", () => {
    const [s] = states({
      model: "reference",
      components: ["water"],
      transport: true,
      states: [{ T: 298.15, P: 101325 }],
    });
    expect(s.transportMethod).toBe("iapws-2008-2011");
    expect(s.viscosity as number).toBeGreaterThan(885e-6);
    expect(s.viscosity as number).toBeLessThan(895e-6);
  });

  it("a two-phase entry gives null for both", () => {
    const [s] = states({
      model: "peng-robinson",
      components: ["propane"],
      transport: true,
      states: [{ T: 300, quality: 0.5 }],
    });
    expect(s.phase).toBe("two-phase");
    expect(s.viscosity).toBeNull();
    expect(s.thermalConductivity).toBeNull();
  });

  it("refuses a transport field that is not a boolean, with its path", () => {
    try {
      runEvalRequest({
        model: "peng-robinson",
        components: ["methane"],
        transport: "yes",
        states: [{ T: 300, P: 1e5 }],
      });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(RequestError);
      expect((e as RequestError).path).toBe("$.transport");
    }
  });
});
