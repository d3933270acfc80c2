/**
 * `fluid.spec` is what worker threads rebuild a fluid from (parallel/): it must stay the
 * definition the fluid was built with when the caller edits its own arrays afterwards.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";

describe("fluid.spec", () => {
  it("keeps the k_ij matrix, overrides and translations the fluid was built with", () => {
    const kij = [
      [0, 0.02],
      [0.02, 0],
    ];
    const methane = { acentricFactor: 0.011 };
    const constants = [methane, undefined];
    const volumeTranslation = [0, 0];
    const fluid = defineFluid({
      components: ["methane", "ethane"],
      model: "peng-robinson",
      kij,
      constants,
      volumeTranslation,
    });
    const before = JSON.stringify(fluid.spec);
    kij[0][1] = 0.5;
    kij[1][0] = 0.5;
    methane.acentricFactor = 0.3;
    volumeTranslation[1] = 1e-6;
    expect(JSON.stringify(fluid.spec)).toBe(before);
    expect(fluid.spec.kij?.[0][1]).toBe(0.02);
  });
});
