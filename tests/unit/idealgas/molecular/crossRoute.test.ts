/**
 * Agreement with the component table (kernel-lib/src/components): the same ids, consistent molar
 * masses, and third-law entropies at 298.15 K within 0.15 %. The table's entropies come from other
 * sources (see its `sources` fields), so this checks two independent sets of data against each other.
 */
import { describe, expect, it } from "vitest";
import { getComponent } from "../../../../kernel-lib/src/components/index.js";
import {
  getMolecule,
  idealGasFromMolecule,
  listMolecules,
} from "../../../../kernel-lib/src/idealgas/molecular/index.js";

describe("molecular data against the component table", () => {
  for (const id of listMolecules()) {
    it(`${id}: same id, molar mass within 0.05 %, S(298.15 K) within 0.15 %`, () => {
      const component = getComponent(id);
      expect(component.id).toBe(id);
      const m = getMolecule(id).molarMassKgPerMol;
      expect(Math.abs(m - component.molarMassKgPerMol) / m).toBeLessThan(5e-4);
      const s = idealGasFromMolecule(id).entropyStandard(298.15);
      expect(Math.abs(s - component.absoluteEntropyJPerMolK) / s).toBeLessThan(0.0015);
    });
  }
});
