import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import { idealGasFromCorrelation } from "../../../kernel-lib/src/idealgas/correlationPure.js";
import { idealGasMixture } from "../../../kernel-lib/src/idealgas/mixture.js";
import {
  describeReferenceState,
  zeroAtReferenceState,
} from "../../../kernel-lib/src/idealgas/referenceState.js";
import type { IdealGasPure } from "../../../kernel-lib/src/idealgas/types.js";
import { R } from "../../../kernel-lib/src/constants.js";
import { InputError, OutOfRangeError } from "../../../kernel-lib/src/errors.js";
import { expectReference, referenceValue } from "../../fixtures/referenceValues.js";

const names = ["methane", "ethane", "propane", "nitrogen", "carbon-dioxide", "hydrogen-sulfide"];
const pures = names.map((n) => idealGasFromCorrelation(getComponent(n)));
const gas = idealGasMixture(pures);
const zeroRef = zeroAtReferenceState(273.15, 101325);
const gasZero = idealGasMixture(pures, { referenceState: zeroRef });

const composition = fc
  .array(fc.double({ min: 0, max: 1, noNaN: true }), {
    minLength: names.length,
    maxLength: names.length,
  })
  .filter((w) => w.reduce((a, b) => a + b, 0) > 1e-3)
  .map((w) => {
    const total = w.reduce((a, b) => a + b, 0);
    const x = w.map((v) => v / total);
    x[x.length - 1] = Math.max(0, 1 - x.slice(0, -1).reduce((a, b) => a + b, 0));
    return x;
  })
  .filter((x) => Math.abs(x.reduce((a, b) => a + b, 0) - 1) <= 1e-12);
const temperature = fc.double({ min: 275, max: 1400, noNaN: true }); // inside every range (+10 %)
const pressure = fc.double({ min: 1e3, max: 1e8, noNaN: true });

describe("ideal-gas mixture: identities over random states (fast-check; closed forms)", () => {
  it("g = h - Ts, a = u - Ts, h - u = RT, cp - cv = R", () => {
    fc.assert(
      fc.property(temperature, pressure, composition, (t, p, x) => {
        for (const m of [gas, gasZero]) {
          const r = m.at(t, p, x);
          const scale = Math.abs(r.h) + t * Math.abs(r.s) + 1;
          expect(Math.abs(r.g - (r.h - t * r.s)) / scale).toBeLessThan(1e-12);
          expect(Math.abs(r.a - (r.u - t * r.s)) / scale).toBeLessThan(1e-12);
          expect(Math.abs(r.h - r.u - R * t) / scale).toBeLessThan(1e-12);
          expect(r.cp - r.cv).toBeCloseTo(R, 10);
        }
      }),
      { numRuns: 200 },
    );
  });

  it("dh/dT = cp and ds/dT = cp/T (central differences, step 1e-3 K)", () => {
    fc.assert(
      fc.property(temperature, pressure, composition, (t, p, x) => {
        const d = 1e-3;
        const up = gas.at(t + d, p, x);
        const dn = gas.at(t - d, p, x);
        const mid = gas.at(t, p, x);
        expect(Math.abs((up.h - dn.h) / (2 * d) - mid.cp) / mid.cp).toBeLessThan(1e-5);
        expect(Math.abs(((up.s - dn.s) / (2 * d)) * t - mid.cp) / mid.cp).toBeLessThan(1e-5);
      }),
      { numRuns: 100 },
    );
  });

  it("entropy of mixing is >= 0 and equals -R sum x ln x", () => {
    fc.assert(
      fc.property(temperature, pressure, composition, (t, p, x) => {
        const mixed = gas.at(t, p, x).s;
        let separate = 0;
        let ideal = 0;
        x.forEach((xi, i) => {
          if (xi === 0) return;
          const unit = names.map((_, j) => (j === i ? 1 : 0));
          separate += xi * gas.at(t, p, unit).s;
          ideal -= R * xi * Math.log(xi);
        });
        expect(mixed - separate).toBeGreaterThanOrEqual(-1e-9);
        expect(mixed - separate).toBeCloseTo(ideal, 8);
      }),
      { numRuns: 200 },
    );
  });

  it("s falls by R ln(P2/P1) with pressure; h does not depend on pressure", () => {
    const x = [0.8, 0.1, 0.05, 0.03, 0.01, 0.01];
    const a = gas.at(400, 1e5, x);
    const b = gas.at(400, 5e6, x);
    expect(a.s - b.s).toBeCloseTo(R * Math.log(50), 10);
    expect(b.h).toBe(a.h);
  });
});

describe("reference states", () => {
  it("formation basis: pure methane at 298.15 K, 1 bar has h = Hf and s = S(298.15) (JANAF values in the table)", () => {
    const r = gas.at(298.15, 1e5, [1, 0, 0, 0, 0, 0]);
    // JANAF Hf and S of CH4, from memory of Chase (1998): tests/fixtures/janaf.json
    const janaf = (key: string) => referenceValue("janaf.json", key);
    expectReference(r.h / 1000, janaf("methane/298.15/Hf"), "formation-basis");
    expectReference(r.s, janaf("methane/298.15/S"), "formation-basis");
    expect(r.referenceState).toEqual({ kind: "formation" });
  });

  it("zero-at: each pure has h = 0 and s = 0 at (T0, P0); a mixture keeps only its mixing entropy", () => {
    for (let i = 0; i < names.length; i++) {
      const x = names.map((_, j) => (j === i ? 1 : 0));
      const r = gasZero.at(273.15, 101325, x);
      expect(Math.abs(r.h)).toBeLessThan(1e-9);
      expect(Math.abs(r.s)).toBeLessThan(1e-12);
      expect(r.referenceState).toBe(zeroRef);
    }
    const r = gasZero.at(273.15, 101325, [0.5, 0.5, 0, 0, 0, 0]);
    expect(r.s).toBeCloseTo(R * Math.log(2), 12);
  });

  it("the two bases differ by a constant per component (same differences)", () => {
    const x = [0.7, 0.2, 0.1, 0, 0, 0];
    const d1 = gas.at(600, 2e6, x).h - gas.at(350, 1e5, x).h;
    const d2 = gasZero.at(600, 2e6, x).h - gasZero.at(350, 1e5, x).h;
    expect(d1).toBeCloseTo(d2, 8);
    expect(describeReferenceState(zeroRef)).toContain("273.15 K");
  });

  it("the mixture accepts any IdealGasPure (a hand-written monatomic gas, cp = 5R/2, closed form)", () => {
    const mono: IdealGasPure = {
      componentId: "argon",
      method: "closed form (monatomic)",
      source: "cp = 5R/2; S(298.15 K) from memory of NIST-JANAF argon",
      validTemperatureK: { min: 10, max: 10000 },
      cp: () => 2.5 * R,
      enthalpyFrom298: (t) => 2.5 * R * (t - 298.15),
      entropyStandard: (t) =>
        referenceValue("janaf.json", "argon/298.15/S").value + 2.5 * R * Math.log(t / 298.15),
    };
    const m = idealGasMixture([mono]);
    const r = m.at(1000, 1e5, [1]);
    // Closed form for a monatomic ideal gas: S(1000 K) = S(298.15 K) + 5/2 R ln(1000/298.15) = 179.9995
    // with S(298.15 K) = 154.845 (from memory of NIST-JANAF, Chase 1998); H - H298 = 5/2 R (701.85 K).
    expectReference(r.s, referenceValue("janaf.json", "argon/1000/S"), "closed-form");
    expectReference(r.h / 1000, referenceValue("janaf.json", "argon/1000/dH"), "closed-form");
  });
});

describe("bad input", () => {
  it("refuses NaN, non-positive or infinite T and P", () => {
    const x = [1, 0, 0, 0, 0, 0];
    for (const bad of [NaN, 0, -1, Infinity]) {
      expect(() => gas.at(bad, 1e5, x)).toThrow(InputError);
      expect(() => gas.at(300, bad, x)).toThrow(InputError);
    }
  });
  it("refuses mole fractions that are negative, NaN, of wrong length or not summing to 1", () => {
    expect(() => gas.at(300, 1e5, [1.1, -0.1, 0, 0, 0, 0])).toThrow(InputError);
    expect(() => gas.at(300, 1e5, [NaN, 1, 0, 0, 0, 0])).toThrow(InputError);
    expect(() => gas.at(300, 1e5, [1])).toThrow(/one mole fraction per component/);
    expect(() => gas.at(300, 1e5, [0.5, 0.5 + 2e-9, 0, 0, 0, 0])).toThrow(/sum of x/);
    expect(() => gas.at(300, 1e5, [0.5, 0.5 + 5e-10, 0, 0, 0, 0])).not.toThrow();
  });
  it("warns when extrapolating and refuses far outside; zero fractions are not evaluated", () => {
    const m = idealGasMixture([
      idealGasFromCorrelation(getComponent("propylene")), // Poling polynomial, 50-1000 K
      idealGasFromCorrelation(getComponent("methane")), // 200-1500 K
    ]);
    const r = m.at(1050, 1e5, [0.5, 0.5]);
    expect(r.warnings).toHaveLength(1);
    expect(r.warnings[0].code).toBe("extrapolated");
    expect(r.warnings[0].message).toContain("propylene");
    expect(m.at(900, 1e5, [0.5, 0.5]).warnings).toHaveLength(0);
    expect(() => m.at(1200, 1e5, [0.5, 0.5])).toThrow(OutOfRangeError);
    expect(m.at(1200, 1e5, [0, 1]).warnings).toHaveLength(0);
  });
  it("refuses an empty list, a non-pure and a bad zero-at state", () => {
    expect(() => idealGasMixture([])).toThrow(InputError);
    expect(() => idealGasMixture([{} as IdealGasPure])).toThrow(InputError);
    expect(() => zeroAtReferenceState(NaN, 1e5)).toThrow(InputError);
    expect(() => zeroAtReferenceState(300, -1)).toThrow(InputError);
    expect(() =>
      idealGasMixture(pures, { referenceState: { kind: "fluid-convention", description: "x" } }).at(
        300,
        1e5,
        [1, 0, 0, 0, 0, 0],
      ),
    ).toThrow(InputError);
  });
});

describe("component warnings reach the result", () => {
  it("a Joback-cp component passes its accuracy warning on, once", () => {
    const m = idealGasMixture([
      idealGasFromCorrelation(getComponent("methylcyclohexane")),
      idealGasFromCorrelation(getComponent("toluene")),
    ]);
    const r = m.at(400, 1e5, [0.5, 0.5]);
    expect(r.warnings.filter((w) => w.code === "accuracy")).toHaveLength(1);
    expect(r.warnings[0].message).toContain("Joback");
    expect(m.at(400, 1e5, [0, 1]).warnings).toHaveLength(0);
  });
});
