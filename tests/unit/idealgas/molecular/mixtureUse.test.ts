/**
 * The molecular route used unchanged by the mixture and reference-state code of idealgas/, and
 * compared with the correlation route (two independent data sets: spectroscopic constants versus
 * the component table's fitted cp polynomials and tabulated entropies).
 */
import { describe, expect, it } from "vitest";
import { getComponent } from "../../../../kernel-lib/src/components/index.js";
import {
  idealGasFromCorrelation,
  idealGasMixture,
} from "../../../../kernel-lib/src/idealgas/index.js";
import { idealGasFromMolecule } from "../../../../kernel-lib/src/idealgas/molecular/index.js";

// An invented Corvid Point Refinery fuel-gas blend (mole fractions), for illustration only.
const ids = ["methane", "ethane", "hydrogen", "nitrogen", "carbon-dioxide"];
const x = [0.7, 0.1, 0.1, 0.05, 0.05];

describe("molecular route inside idealGasMixture", () => {
  const molecular = idealGasMixture(ids.map((id) => idealGasFromMolecule(id)));
  const correlation = idealGasMixture(ids.map((id) => idealGasFromCorrelation(getComponent(id))));

  it("gives the same mixture properties as the correlation route within 0.5 % (cp) and 0.3 % (s)", () => {
    for (const t of [300, 600, 1000]) {
      const a = molecular.at(t, 2e6, x);
      const b = correlation.at(t, 2e6, x);
      expect(Math.abs(a.cp - b.cp) / b.cp).toBeLessThan(0.005);
      expect(Math.abs(a.s - b.s) / Math.abs(b.s)).toBeLessThan(0.003);
      // Formation basis: both routes take h_f from the table, so h differs only by the
      // sensible enthalpy; allow 0.5 % of the sensible part plus 10 J/mol.
      const sensible = Math.abs(a.h - b.h);
      expect(sensible).toBeLessThan(0.005 * Math.abs(b.cp * (t - 298.15)) + 10);
      expect(a.referenceState.kind).toBe("formation");
      expect(a.warnings).toEqual([]);
    }
  });

  it("an extrapolated temperature carries the shared warning instead of failing", () => {
    const p = molecular.at(1600, 1e5, x);
    expect(p.warnings.length).toBeGreaterThan(0);
    expect(Number.isFinite(p.h)).toBe(true);
  });
});
