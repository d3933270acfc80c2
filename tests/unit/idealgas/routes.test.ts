// Cross-route consistency: the correlation route (this folder) and the statistical-mechanics route
// (idealgas/molecular/) are independent (fitted cp data versus molecular constants), so agreement is
// a check of both. Neither is the reference here; the JANAF checks live in each route's own tests.
// Tolerances: cp 1.5 %, S 0.5 % (common practice for ideal-gas data of this kind, no source).
import { describe, expect, it } from "vitest";
import { getComponent, listComponents } from "../../../kernel-lib/src/components/getComponent.js";
import { idealGasFromCorrelation } from "../../../kernel-lib/src/idealgas/correlationPure.js";
import { idealGasMixture } from "../../../kernel-lib/src/idealgas/mixture.js";
import {
  idealGasFromMolecule,
  listMolecules,
} from "../../../kernel-lib/src/idealgas/molecular/index.js";

const tableIds = new Set(listComponents().map((c) => c.id));
const shared = listMolecules().filter((id) => tableIds.has(id));

describe("correlation route versus statistical-mechanics route", () => {
  it("shares at least ten molecules", () => {
    expect(shared.length).toBeGreaterThanOrEqual(10);
  });
  for (const id of shared) {
    it(`${id}: cp and S agree at 298.15, 500 and 1000 K`, () => {
      const corr = idealGasFromCorrelation(getComponent(id));
      const mol = idealGasFromMolecule(id);
      for (const t of [298.15, 500, 1000]) {
        const inside = (r: { min: number; max: number }) => t >= r.min && t <= r.max;
        if (!inside(corr.validTemperatureK) || !inside(mol.validTemperatureK)) continue;
        // Ammonia's umbrella (inversion) mode is a double well, far from harmonic: the routes differ
        // by 1.6 % in cp at 1000 K, so ammonia gets 2 % (known model limitation, see the report).
        const cpTolerance = id === "ammonia" ? 0.02 : 0.015;
        expect(Math.abs(mol.cp(t) / corr.cp(t) - 1), `cp ${t} K`).toBeLessThan(cpTolerance);
        expect(
          Math.abs(mol.entropyStandard(t) / corr.entropyStandard(t) - 1),
          `S ${t} K`,
        ).toBeLessThan(0.005);
      }
    });
  }
  it("a mixture takes pures from both routes unchanged", () => {
    const m = idealGasMixture([
      idealGasFromMolecule("methane"),
      idealGasFromCorrelation(getComponent("propane")),
    ]);
    const r = m.at(500, 3e6, [0.95, 0.05]);
    expect(Number.isFinite(r.h) && Number.isFinite(r.s)).toBe(true);
    const allCorr = idealGasMixture([
      idealGasFromCorrelation(getComponent("methane")),
      idealGasFromCorrelation(getComponent("propane")),
    ]).at(500, 3e6, [0.95, 0.05]);
    expect(Math.abs(r.s - allCorr.s)).toBeLessThan(0.5);
    expect(Math.abs(r.h - allCorr.h)).toBeLessThan(200);
  });
});
