import { describe, expect, it } from "vitest";
import { familyThreshold } from "../../../kernel-lib/src/pvt/familyThreshold.js";
import { expectReference, referenceValue } from "../../fixtures/referenceValues.js";

describe("familyThreshold (Bonferroni with the A&S 26.2.12 normal tail)", () => {
  it("matches normal quantiles: z(1 - 0.025/100) = 3.4808 and z(1 - 0.025/1000) = 4.0556 (standard normal tables, from memory)", () => {
    // tests/fixtures/normal-quantiles.json
    const z = (key: string) => referenceValue("normal-quantiles.json", key);
    expectReference(familyThreshold(100), z("z(1-0.025/100)"));
    expectReference(familyThreshold(1000), z("z(1-0.025/1000)"));
  });
  it("never goes below the floor of 3, also for one check or nonsense counts", () => {
    expect(familyThreshold(1)).toBe(3);
    expect(familyThreshold(0)).toBe(3);
    expect(familyThreshold(Number.NaN)).toBe(3);
  });
});
