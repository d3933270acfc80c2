import { describe, expect, it } from "vitest";
import { petroleumPseudoComponent } from "../../../kernel-lib/src/petroleum/pseudoComponent.js";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import { idealGasFromCorrelation } from "../../../kernel-lib/src/idealgas/correlationPure.js";
import { idealGasMixture } from "../../../kernel-lib/src/idealgas/mixture.js";
import { zeroAtReferenceState } from "../../../kernel-lib/src/idealgas/referenceState.js";
import { InputError, OutOfRangeError } from "../../../kernel-lib/src/errors.js";

describe("petroleumPseudoComponent", () => {
  const cut = petroleumPseudoComponent({
    id: "corvid-heavy-naphtha",
    normalBoilingPointK: 420,
    specificGravity: 0.76,
  });

  it("returns a validated Component with sources and the origin", () => {
    expect(cut.origin).toBe("petroleum-pseudo-component");
    expect(cut.molarMassKgPerMol).toBeGreaterThan(0.1);
    expect(cut.molarMassKgPerMol).toBeLessThan(0.15);
    expect(cut.criticalTemperatureK).toBeGreaterThan(cut.normalBoilingPointK);
    expect(cut.sources.critical).toContain("Riazi & Daubert (1980)");
    expect(cut.sources.heatCapacity).toContain("Kesler & Lee (1976)");
    expect(Number.isNaN(cut.enthalpyOfFormationJPerMol)).toBe(true);
    expect(cut.warnings).toHaveLength(0);
    expect(Object.isFrozen(cut)).toBe(true);
  });

  it("is usable in an ideal-gas mixture with a zero-at reference state; the formation basis is refused", () => {
    const pures = [idealGasFromCorrelation(getComponent("methane")), idealGasFromCorrelation(cut)];
    const m = idealGasMixture(pures, {
      referenceState: zeroAtReferenceState(298.15, 1e5),
      components: [getComponent("methane"), cut],
    });
    const r = m.at(500, 2e5, [0.9, 0.1]);
    expect(r.h).toBeGreaterThan(0);
    expect(() => idealGasMixture(pures).at(500, 2e5, [0.9, 0.1])).toThrow(InputError);
    expect(getComponent("corvid heavy naphtha", { include: [cut] })).toBe(cut);
  });

  it("uses a measured molar mass when given, and each method when asked", () => {
    const withM = petroleumPseudoComponent({
      id: "c",
      normalBoilingPointK: 420,
      specificGravity: 0.76,
      molarMassKgPerMol: 0.125,
    });
    expect(withM.molarMassKgPerMol).toBe(0.125);
    expect(withM.sources.critical).toContain("molar mass user-supplied");
    for (const method of ["riazi-daubert-1987", "kesler-lee-1976"] as const) {
      const c = petroleumPseudoComponent({
        id: "c",
        normalBoilingPointK: 420,
        specificGravity: 0.76,
        criticalPropertyMethod: method,
      });
      expect(Math.abs(c.criticalTemperatureK / cut.criticalTemperatureK - 1)).toBeLessThan(0.02);
    }
  });

  it("refuses input outside the range unless overridden, then carries the warning", () => {
    expect(() =>
      petroleumPseudoComponent({ id: "v", normalBoilingPointK: 780, specificGravity: 0.95 }),
    ).toThrow(OutOfRangeError);
    const heavy = petroleumPseudoComponent({
      id: "v",
      normalBoilingPointK: 780,
      specificGravity: 0.95,
      allowOutsideRange: true,
    });
    expect(heavy.warnings.map((w) => w.code)).toContain("outside-validity");
  });

  it("refuses bad input with typed errors", () => {
    for (const bad of [NaN, -1, 0, Infinity]) {
      expect(() =>
        petroleumPseudoComponent({ id: "x", normalBoilingPointK: bad, specificGravity: 0.8 }),
      ).toThrow(InputError);
      expect(() =>
        petroleumPseudoComponent({ id: "x", normalBoilingPointK: 400, specificGravity: bad }),
      ).toThrow(InputError);
    }
    expect(() =>
      petroleumPseudoComponent({ id: "", normalBoilingPointK: 400, specificGravity: 0.8 }),
    ).toThrow(InputError);
    expect(() =>
      petroleumPseudoComponent({
        id: "x",
        normalBoilingPointK: 400,
        specificGravity: 0.8,
        criticalPropertyMethod: "guess" as never,
      }),
    ).toThrow(InputError);
  });
});
