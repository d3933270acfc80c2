/**
 * Agreement with the component table (kernel-lib/src/components): the same ids, consistent molar
 * masses, and third-law entropies at 298.15 K within 0.15 % (propylene 0.3 %, see below). The
 * table's entropies come from other sources (see its `sources` fields), so this checks two
 * independent sets of data against each other.
 */
import { describe, expect, it } from "vitest";
import { getComponent } from "../../../../kernel-lib/src/components/index.js";
import {
  getMolecule,
  idealGasFromMolecule,
  listMolecules,
} from "../../../../kernel-lib/src/idealgas/molecular/index.js";

/**
 * S(298.15 K) tolerance. Propylene 0.3 %: its methyl torsion's recalled parameters (barrier
 * 1.98-2.17 kcal/mol, torsion 174-188 cm-1) move S by 1.1 J/(mol K) (0.4 %); with the values
 * shipped it reads 0.2 % above the table's 267.0.
 */
const entropyTolerance = (id: string): number => (id === "propylene" ? 0.003 : 0.0015);

describe("molecular data against the component table", () => {
  for (const id of listMolecules()) {
    const tol = entropyTolerance(id);
    it(`${id}: same id, molar mass within 0.05 %, S(298.15 K) within ${100 * tol} %`, () => {
      const component = getComponent(id);
      expect(component.id).toBe(id);
      const m = getMolecule(id).molarMassKgPerMol;
      expect(Math.abs(m - component.molarMassKgPerMol) / m).toBeLessThan(5e-4);
      const s = idealGasFromMolecule(id).entropyStandard(298.15);
      expect(Math.abs(s - component.absoluteEntropyJPerMolK) / s).toBeLessThan(tol);
    });
  }
});
