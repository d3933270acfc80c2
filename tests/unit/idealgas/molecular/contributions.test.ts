/**
 * Each partition-function contribution against an independent closed form.
 */
import { describe, expect, it } from "vitest";
import { R } from "../../../../kernel-lib/src/constants.js";
import { translationalContribution } from "../../../../kernel-lib/src/idealgas/molecular/translation.js";
import { linearRotorContribution } from "../../../../kernel-lib/src/idealgas/molecular/linearRotor.js";
import { linearRotorLevelsContribution } from "../../../../kernel-lib/src/idealgas/molecular/linearRotorLevels.js";
import { nonlinearRotorContribution } from "../../../../kernel-lib/src/idealgas/molecular/nonlinearRotor.js";
import { harmonicVibrationContribution } from "../../../../kernel-lib/src/idealgas/molecular/harmonicVibration.js";
import { electronicContribution } from "../../../../kernel-lib/src/idealgas/molecular/electronic.js";
import {
  SECOND_RADIATION_CONSTANT_CM_K,
  wavenumberToKelvin,
} from "../../../../kernel-lib/src/idealgas/molecular/spectroscopicUnits.js";
import { expectReference, referenceValue } from "../../../fixtures/referenceValues.js";

describe("spectroscopic units", () => {
  it("second radiation constant c2 = 1.438776877e-2 m K", () => {
    // c2 = 1.438 776 877e-2 m K (exact): CODATA 2018 recommended values, from memory
    // (tests/fixtures/codata-2018.json).
    expectReference(SECOND_RADIATION_CONSTANT_CM_K / 100, referenceValue("codata-2018.json", "c2"));
  });
});

describe("translation (Sackur-Tetrode)", () => {
  it("matches the CODATA Sackur-Tetrode constant S0/R = -1.15170753706 (1 K, 100 kPa, m = 1 u)", () => {
    // S0/R = -1.151 707 537 06 at T = 1 K, p = 100 kPa: CODATA 2018, from memory
    // (tests/fixtures/codata-2018.json). s/R = S0/R + 3/2 ln(M / (g/mol)) + 5/2 ln(T / K).
    const s0 = referenceValue("codata-2018.json", "S0/R(1K,100kPa)");
    for (const [molarMassGPerMol, t] of [
      [4.002602, 298.15],
      [39.948, 1000],
      [1, 1],
      [200, 50],
    ]) {
      const s = translationalContribution(molarMassGPerMol / 1000, t).entropy / R;
      const shift = 1.5 * Math.log(molarMassGPerMol) + 2.5 * Math.log(t);
      expectReference(s - shift, s0);
    }
  });

  it("cp = 5/2 R and h - h0 = 5/2 R T (includes pV = RT)", () => {
    const c = translationalContribution(0.028, 500);
    expect(c.cp).toBe(2.5 * R);
    expect(c.enthalpyFrom0K).toBeCloseTo(2.5 * R * 500, 9);
  });
});

describe("rigid rotors", () => {
  it("explicit level sum (sigma = 1) follows the Mulholland high-T expansion", () => {
    // Mulholland (1928) Euler-Maclaurin expansion, from memory of McQuarrie, Statistical
    // Mechanics (2000), ch. 6:
    // q = (T/theta)(1 + u/3 + u^2/15 + 4u^3/315 + ...), u = theta/T, hence (series worked out here)
    // s/R = ln(1/u) + 1 - u^2/90 - 16u^3/2835 + O(u^4),  cv/R = 1 + u^2/45 + 16u^3/945 + O(u^4).
    const bInvCm = 1.92253;
    const theta = wavenumberToKelvin(bInvCm);
    for (const ratio of [10, 30, 100]) {
      const t = ratio * theta;
      const sum = linearRotorLevelsContribution(bInvCm, 1, { even: 1, odd: 1 }, t);
      const u = theta / t;
      const sSeries = Math.log(1 / u) + 1 - (u * u) / 90 - (16 * u ** 3) / 2835;
      const cvSeries = 1 + (u * u) / 45 + (16 * u ** 3) / 945;
      expect(Math.abs(sum.entropy / R - sSeries)).toBeLessThan(0.05 * u ** 4);
      expect(Math.abs(sum.cp / R - cvSeries)).toBeLessThan(0.05 * u ** 4);
      const classical = linearRotorContribution(bInvCm, 1, t);
      expect(classical.entropy / R).toBeCloseTo(Math.log(1 / u) + 1, 12);
    }
  });

  it("H2 at 20 K: only J = 0 (para) and J = 1 (ortho, weight 3 x 3) count: two-level closed form", () => {
    const b = 59.322;
    const t = 20;
    const delta = 2 * wavenumberToKelvin(b); // E(J=1) - E(J=0) = 2 B
    const r = 9 * Math.exp(-delta / t);
    const c = linearRotorLevelsContribution(b, 2, { even: 1, odd: 3 }, t);
    // Two-level (Schottky) functions; prefactor 2 / (sigma (1 + 3)) = 1/4 (McQuarrie 2000, ch. 6).
    // J = 2 (weight 5, 512 K up) adds about 2.5e-8 to cv/R: tolerance 5e-8.
    expect(c.cp / R).toBeCloseTo(((delta / t) ** 2 * r) / (1 + r) ** 2, 7);
    expect(c.entropy / R).toBeCloseTo(Math.log((1 + r) / 4) + ((delta / t) * r) / (1 + r), 7);
    expect(c.enthalpyFrom0K / R).toBeCloseTo((delta * r) / (1 + r), 7);
  });

  it("H2 level sum tends to the classical sigma = 2 rotor at high T", () => {
    const c = linearRotorLevelsContribution(59.322, 2, { even: 1, odd: 3 }, 3000);
    const cl = linearRotorContribution(59.322, 2, 3000);
    // Mulholland: s differs by R theta^2 / (90 T^2) ~ 1e-4 R at 3000 K.
    expect(Math.abs(c.entropy - cl.entropy)).toBeLessThan(2e-3);
  });

  it("nonlinear rotor: spherical top q = sqrt(pi)/sigma (T/theta)^(3/2)", () => {
    // McQuarrie (2000), ch. 8 (spherical top), from memory.
    const b = 5.241;
    const theta = wavenumberToKelvin(b);
    const c = nonlinearRotorContribution([b, b, b], 12, 298.15);
    const q = (Math.sqrt(Math.PI) / 12) * (298.15 / theta) ** 1.5;
    expect(c.entropy).toBeCloseTo(R * (Math.log(q) + 1.5), 10);
    expect(c.cp).toBeCloseTo(1.5 * R, 12);
    expect(c.enthalpyFrom0K).toBeCloseTo(1.5 * R * 298.15, 9);
  });
});

describe("harmonic vibrations", () => {
  it("Einstein function at x = 1: cv/R = e/(e - 1)^2", () => {
    const t = 1000;
    const nu = t / SECOND_RADIATION_CONSTANT_CM_K; // x = 1
    const c = harmonicVibrationContribution([{ wavenumberInvCm: nu, degeneracy: 2 }], t);
    expect(c.cp / R).toBeCloseTo((2 * Math.E) / (Math.E - 1) ** 2, 12);
    expect(c.enthalpyFrom0K / (R * t)).toBeCloseTo(2 / (Math.E - 1), 12);
    expect(c.entropy / R).toBeCloseTo(2 * (1 / (Math.E - 1) - Math.log(1 - 1 / Math.E)), 12);
  });

  it("classical limit (x -> 0): cv -> R per mode; frozen (x -> inf): all -> 0 without NaN", () => {
    const hot = harmonicVibrationContribution([{ wavenumberInvCm: 1e-3, degeneracy: 1 }], 3000);
    expect(hot.cp / R).toBeCloseTo(1, 9);
    const cold = harmonicVibrationContribution([{ wavenumberInvCm: 4000, degeneracy: 1 }], 20);
    expect(cold.cp).toBeLessThan(1e-100);
    expect(cold.entropy).toBeLessThan(1e-100);
    expect(Number.isNaN(cold.enthalpyFrom0K)).toBe(false);
  });
});

describe("where the naive oscillator formula fails", () => {
  it("x = 1e-12: expm1-based functions stay exact, the naive e^x - 1 loses 4 digits", () => {
    // Series (closed form): cv/R = 1 - x^2/12, s/R = 1 - ln x + O(x^2), (h - h0)/RT = 1 - x/2.
    const x = 1e-12;
    const t = 3000;
    const c = harmonicVibrationContribution(
      [{ wavenumberInvCm: (x * t) / SECOND_RADIATION_CONSTANT_CM_K, degeneracy: 1 }],
      t,
    );
    const sExact = 1 - Math.log(x);
    expect(Math.abs(c.entropy / R - sExact)).toBeLessThan(1e-9);
    expect(c.cp / R).toBeCloseTo(1, 10);
    expect(c.enthalpyFrom0K / (R * t)).toBeCloseTo(1, 10);
    // The textbook formula evaluated literally:
    const naiveS = x / (Math.exp(x) - 1) - Math.log(1 - Math.exp(-x));
    expect(Math.abs(naiveS - sExact)).toBeGreaterThan(1e-6);
  });
});

describe("electronic levels", () => {
  it("O2 at 298.15 K: only the triplet ground state counts, s = R ln 3", () => {
    const c = electronicContribution(
      [
        { energyInvCm: 0, degeneracy: 3 },
        { energyInvCm: 7918.1, degeneracy: 2 },
      ],
      298.15,
    );
    expect(c.entropy).toBeCloseTo(R * Math.log(3), 10);
    expect(c.cp).toBeLessThan(1e-12);
  });

  it("NO: two doublets 119.8 cm^-1 apart, two-level closed form", () => {
    const t = 200;
    const x = wavenumberToKelvin(119.8) / t;
    const c = electronicContribution(
      [
        { energyInvCm: 0, degeneracy: 2 },
        { energyInvCm: 119.8, degeneracy: 2 },
      ],
      t,
    );
    const p = Math.exp(-x) / (1 + Math.exp(-x));
    expect(c.cp / R).toBeCloseTo(x * x * p * (1 - p), 12);
    expect(c.entropy / R).toBeCloseTo(Math.log(2 + 2 * Math.exp(-x)) + x * p, 12);
  });
});
