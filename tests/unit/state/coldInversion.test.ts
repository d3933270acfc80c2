// A (P, h) or (P, s) inversion that runs into a component's ideal-gas heat-capacity range says which
// component's range stopped it and what to do (cold service: letdown, blowdown, LNG).
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { SolverError } from "../../../kernel-lib/src/errors.js";
import { idealGasFromCorrelation } from "../../../kernel-lib/src/idealgas/correlationPure.js";
import { idealGasMixture } from "../../../kernel-lib/src/idealgas/mixture.js";

const failure = (f: () => unknown): SolverError => {
  try {
    f();
  } catch (e) {
    if (e instanceof SolverError) return e;
    throw e;
  }
  throw new Error("expected a SolverError");
};

describe("inversions stopped by a heat-capacity range name the component and the way out", () => {
  // n-butane's Perry Aly-Lee correlation starts at 200 K (180 K with the 10 % margin); methane's
  // reaches 90 K (81 K with the margin)
  const gas = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
  const x = [0.98, 0.02];
  it("a target below what n-butane's range allows: the message names n-butane, 200 K and the options", () => {
    const at190 = gas.stateAtTP(190, 1e5, x, { phase: "vapor" });
    // 20 K of cooling below 190 K, about cp * 20 K less enthalpy (cp about 34 J/(mol K) here)
    const e = failure(() =>
      gas.temperatureAtPH(1e5, at190.molar.h - 34 * 20, x, { phase: "vapor" }),
    );
    expect(e.message).toContain("heat-capacity range of n-butane");
    expect(e.message).toMatch(/n-butane.*200 K to 1500 K/);
    expect(e.message).toContain("extrapolationMargin");
    expect(e.message).toContain("defineComponent");
    expect(e.message).not.toContain("no bracket");
  });
  it("the same target is reached for pure methane, whose range goes down to 90 K", () => {
    const methane = defineFluid({ components: ["methane"], model: "peng-robinson" });
    const at190 = methane.stateAtTP(190, 1e5, [1], { phase: "vapor" });
    const r = methane.temperatureAtPH(1e5, at190.molar.h - 34 * 20, [1], { phase: "vapor" });
    expect(r.temperatureK).toBeGreaterThan(165);
    expect(r.temperatureK).toBeLessThan(175);
  });
  it("a requested window wholly below the range names the component as well", () => {
    const e = failure(() =>
      gas.temperatureAtPH(1e5, -1e4, x, { minTemperatureK: 100, maxTemperatureK: 150 }),
    );
    expect(e.message).toContain("heat-capacity range of n-butane");
    expect(e.message).toContain("extrapolationMargin");
  });
  it("the way out the message gives works: with the margin it suggests the target is reached", () => {
    const at190 = gas.stateAtTP(190, 1e5, x, { phase: "vapor" });
    const target = at190.molar.h - 34 * 20;
    const e = failure(() => gas.temperatureAtPH(1e5, target, x, { phase: "vapor" }));
    const margin = Number(/extrapolationMargin: ([0-9.]+)/.exec(e.message)?.[1]);
    expect(margin).toBeGreaterThan(0.1);
    const options = { extrapolationMargin: margin };
    const wider = defineFluid({
      components: ["methane", "n-butane"],
      model: "peng-robinson",
      idealGas: idealGasMixture(
        [idealGasFromCorrelation("methane", options), idealGasFromCorrelation("n-butane", options)],
        options,
      ),
    });
    const r = wider.temperatureAtPH(1e5, target, x, { phase: "vapor" });
    expect(r.temperatureK).toBeLessThan(180);
    expect(r.temperatureK).toBeGreaterThan(200 * (1 - margin));
    expect(r.state.warnings.some((w) => w.code === "extrapolated")).toBe(true);
  });
});
