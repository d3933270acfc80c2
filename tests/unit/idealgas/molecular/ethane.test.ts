/**
 * Ethane: the torsion as a hindered rotor, a harmonic oscillator and a free rotor.
 */
import { describe, expect, it } from "vitest";
import { idealGasFromMolecule } from "../../../../kernel-lib/src/idealgas/molecular/index.js";

// s(400 K, 1 bar) = 246.45 J/(mol K): a value used in the trade (common practice, no source).
const S_400 = 246.45;

describe("ethane at 400 K and 1 bar", () => {
  const hindered = idealGasFromMolecule("ethane");
  const harmonic = idealGasFromMolecule("ethane", { torsion: "harmonic" });
  const free = idealGasFromMolecule("ethane", { torsion: "free-rotor" });

  it("hindered-rotor entropy within 0.3 J/(mol K) of 246.45", () => {
    expect(Math.abs(hindered.entropyStandard(400) - S_400)).toBeLessThan(0.3);
    expect(hindered.torsion).toBe("hindered-rotor");
  });

  it("harmonic torsion below, free rotor above: the limits bracket the hindered rotor", () => {
    // Physics: a 289 cm^-1 oscillator has fewer accessible states at 400 K than the real
    // torsion (whose levels bunch together towards the barrier top, 1012 cm^-1); the free rotor
    // has more (no barrier confines it). So s_HO < s_HR < s_free.
    const sHo = harmonic.entropyStandard(400);
    const sFree = free.entropyStandard(400);
    const sHr = hindered.entropyStandard(400);
    expect(sHo).toBeLessThan(S_400 - 0.5);
    expect(sFree).toBeGreaterThan(S_400 + 2);
    expect(sHo).toBeLessThan(sHr);
    expect(sHr).toBeLessThan(sFree);
  });

  it("cp at 298.15 K within 1 % of 52.49 J/(mol K)", () => {
    // 52.49 J/(mol K): from memory of the TRC Thermodynamic Tables / Chao, Wilhoit & Hall,
    // J. Phys. Chem. Ref. Data 2 (1973) 427 (ideal-gas ethane). Not verified against the print.
    expect(Math.abs(hindered.cp(298.15) - 52.49) / 52.49).toBeLessThan(0.01);
  });

  it("the torsion contributions are what the three treatments say", () => {
    const free400 = free.contributions(400).internalRotation;
    // Quantum free rotor at T >> theta (theta = B hc/k = 15.4 K): cv -> R/2 (closed form).
    expect(free400.cp / 8.314462618).toBeCloseTo(0.5, 3);
    expect(harmonic.contributions(400).internalRotation.entropy).toBe(0);
    // The hindered rotor's heat capacity exceeds both limits near T ~ V0/k (the well-known
    // maximum of the Pitzer hindered-rotor cp, above R at intermediate barriers).
    const hr = hindered.contributions(400).internalRotation.cp;
    expect(hr).toBeGreaterThan(free400.cp);
  });
});
