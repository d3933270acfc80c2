import { describe, expect, it } from "vitest";
import { createCubicModel } from "../../../kernel-lib/src/eos/cubic/cubicModel.js";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";

// Peng & Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59, eqs. 17-18: sqrt(alpha) = 1 + m (1 - sqrt(Tr)),
// m = 0.37464 + 1.54226 w - 0.26992 w^2, which reaches zero at Tr = (1 + 1/m)^2 (closed form of
// that equation). checkValidity warns from there on, whatever the mixture cache held before.
describe("cubic checkValidity: the Soave-type alpha passes its minimum at Tr = (1 + 1/m)^2", () => {
  const methane = getComponent("methane");
  const w = methane.acentricFactor;
  const m = 0.37464 + 1.54226 * w - 0.26992 * w * w;
  const tMin = methane.criticalTemperatureK * (1 + 1 / m) ** 2;
  const warns = (T: number, x: number[], model = createCubicModel("peng-robinson", [methane])) =>
    (model.checkValidity?.(T, 1, x) ?? []).filter((v) => v.code === "model-limitation").length;

  it("no warning just below, one just above", () => {
    expect(warns(tMin * 0.999, [1])).toBe(0);
    expect(warns(tMin * 1.001, [1])).toBe(1);
  });

  it("the answer does not depend on the state evaluated before (mixture cache)", () => {
    const model = createCubicModel("peng-robinson", [methane]);
    model.residual(300, 100, [1]);
    expect(warns(tMin * 1.001, [1], model)).toBe(1);
    model.residual(tMin * 1.001, 100, [1]);
    expect(warns(tMin * 0.999, [1], model)).toBe(0);
  });

  it("a mixture names the component whose alpha has passed its minimum", () => {
    const model = createCubicModel("peng-robinson", [methane, getComponent("n-decane")]);
    const msgs = (model.checkValidity?.(tMin * 1.001, 1, [0.5, 0.5]) ?? []).map((v) => v.message);
    expect(msgs.some((s) => s.startsWith("methane:"))).toBe(true);
  });
});
