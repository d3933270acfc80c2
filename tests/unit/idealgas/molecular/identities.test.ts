/**
 * Thermodynamic identities over random molecules and temperatures (fast-check):
 *   dh/dT = cp and ds/dT = cp/T (at constant standard pressure),
 * checked by central differences with step 1e-3 T (truncation error O(step^2) ~ 1e-6 relative).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  idealGasFromMolecule,
  listMolecules,
  type TorsionTreatment,
} from "../../../../kernel-lib/src/idealgas/molecular/index.js";
import { expectReference, referenceValue } from "../../../fixtures/referenceValues.js";

const ids = listMolecules();
const torsions: TorsionTreatment[] = ["hindered-rotor", "harmonic", "free-rotor"];

describe("property identities (fast-check)", () => {
  it("dh/dT = cp and ds/dT = cp/T for every shipped molecule over its valid range", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...ids),
        fc.constantFrom(...torsions),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (id, torsion, fraction) => {
          const gas = idealGasFromMolecule(id, { torsion, maxTemperatureK: 3000 });
          const { min, max } = gas.validTemperatureK;
          const t = min * 1.01 + fraction * (max * 0.99 - min * 1.01);
          const dt = 1e-3 * t;
          const cp = gas.cp(t);
          const dh = (gas.enthalpyFrom298(t + dt) - gas.enthalpyFrom298(t - dt)) / (2 * dt);
          const ds = (gas.entropyStandard(t + dt) - gas.entropyStandard(t - dt)) / (2 * dt);
          expect(Math.abs(dh - cp) / cp).toBeLessThan(1e-5);
          expect(Math.abs(ds * t - cp) / cp).toBeLessThan(1e-5);
        },
      ),
      { numRuns: 200 },
    );
  });

  it("cp >= 5/2 R (translation) and s > 0 everywhere in the valid range", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...ids),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (id, fraction) => {
          const gas = idealGasFromMolecule(id);
          const { min, max } = gas.validTemperatureK;
          const t = min + fraction * (max - min);
          expect(gas.cp(t)).toBeGreaterThanOrEqual(2.5 * 8.314462618 - 1e-9);
          expect(gas.entropyStandard(t)).toBeGreaterThan(0);
        },
      ),
      { numRuns: 100 },
    );
  });

  it("h(T) - h(298.15) equals the difference of h - h(0 K)", () => {
    const gas = idealGasFromMolecule("methane");
    for (const t of [100, 500, 1500]) {
      expect(gas.enthalpyFrom298(t)).toBeCloseTo(
        gas.enthalpyFrom0K(t) - gas.enthalpyFrom0K(298.15),
        8,
      );
    }
    // h(298.15) - h(0) = 10.016 kJ/mol for CH4: from memory of NIST-JANAF (Chase 1998), in
    // tests/fixtures/janaf.json
    expectReference(
      gas.enthalpyFrom0K(298.15) / 1000,
      referenceValue("janaf.json", "methane/298.15/H-H0"),
    );
  });
});
