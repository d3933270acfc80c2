// Several models on one stated zero (issue item 13): charts and tables that compare models must
// show differences of physics, not of each model's own zero.
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { sharedReferenceState } from "../../../kernel-lib/src/fluid/sharedReferenceState.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

const spanWagner = defineFluid({
  components: ["carbon-dioxide"],
  model: referenceFluid("carbon-dioxide"),
});
const pengRobinson = defineFluid({ components: ["carbon-dioxide"], model: "peng-robinson" });

describe("sharedReferenceState: every model on one zero of h and s", () => {
  const shared = sharedReferenceState([spanWagner, pengRobinson]);
  const [sw, pr] = shared.fluids;

  it("before: the two models' own zeros put h of one state hundreds of kJ/mol apart", () => {
    // the formation basis of the cubic (CO2: -393.5 kJ/mol) against Span and Wagner's convention
    const a = spanWagner.state({ T: 298.15, P: 50e5 }).molar.h;
    const b = pengRobinson.state({ T: 298.15, P: 50e5 }).molar.h;
    expect(Math.abs(a - b)).toBeGreaterThan(1e5);
  });

  it("at the zero's temperature the models' h differ exactly by their residual parts", () => {
    // both ideal parts are zero at 298.15 K (the ideal-gas h does not depend on P)
    for (const P of [1e5, 20e5, 50e5]) {
      const a = sw.state({ T: 298.15, P });
      const b = pr.state({ T: 298.15, P });
      const residualDifference = a.residual!.h - b.residual!.h;
      expect(Math.abs(a.molar.h - b.molar.h - residualDifference), `${P} Pa`).toBeLessThan(1e-6);
      // and s too, at 1 bar where both ideal parts have s = 0
      if (P === 1e5) {
        const ds = a.molar.s - b.molar.s - (a.residual!.s - b.residual!.s);
        expect(Math.abs(ds)).toBeLessThan(1e-9);
      }
    }
  });

  it("elsewhere the models differ by residual parts plus the small difference of their ideal-gas cp", () => {
    // Span-Wagner's ideal part and the table's cp (GRI-Mech 3.0 above 200 K) are both fits to the
    // JANAF CO2 table; within 0.3 % of cp (common practice, no source) the ideal-gas h from
    // 298.15 to 400 K (about 3.9 kJ/mol) agrees to 12 J/mol
    const a = sw.state({ T: 400, P: 100e5 });
    const b = pr.state({ T: 400, P: 100e5 });
    const residualDifference = a.residual!.h - b.residual!.h;
    expect(Math.abs(a.molar.h - b.molar.h - residualDifference)).toBeLessThan(12);
  });

  it("differences between states of one model are unchanged", () => {
    for (const [own, moved] of [
      [spanWagner, sw],
      [pengRobinson, pr],
    ] as const) {
      const dOwn = own.state({ T: 350, P: 80e5 }).molar.h - own.state({ T: 300, P: 10e5 }).molar.h;
      const dMoved =
        moved.state({ T: 350, P: 80e5 }).molar.h - moved.state({ T: 300, P: 10e5 }).molar.h;
      expect(Math.abs(dMoved - dOwn)).toBeLessThan(1e-7 * Math.abs(dOwn));
      // the saturation pressure (phase equilibrium) is unchanged too
      const p0 = own.state({ T: 280, vaporFraction: 0 }).pressurePa;
      const p1 = moved.state({ T: 280, vaporFraction: 0 }).pressurePa;
      expect(Math.abs(p1 / p0 - 1)).toBeLessThan(1e-9);
    }
  });

  it("states carry the shared zero and the description says it", () => {
    const r = sw.state({ T: 300, P: 1e5 }).referenceState;
    expect(r).toEqual({ kind: "zero-at", temperatureK: 298.15, pressurePa: 1e5 });
    expect(pr.state({ T: 300, P: 1e5 }).referenceState).toEqual(r);
    expect(shared.description).toBe(
      "h = 0 and s = 0 for the ideal gas at 25 degC and 1 bar, for every model",
    );
    const other = sharedReferenceState([pengRobinson], {
      temperatureK: 273.15,
      pressurePa: 101325,
    });
    expect(other.description).toContain("0 degC and 1.01325 bar");
  });

  it("refuses an empty list and things that are not fluids", () => {
    expect(() => sharedReferenceState([])).toThrow(InputError);
    expect(() => sharedReferenceState([{} as never])).toThrow(/fluids\[0\]/);
    expect(() => sharedReferenceState([pengRobinson], { temperatureK: -1 })).toThrow(InputError);
  });
});
