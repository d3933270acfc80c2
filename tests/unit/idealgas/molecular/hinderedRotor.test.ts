/**
 * Hindered internal rotor: the exact levels against the free-rotor and harmonic-oscillator limits
 * (closed forms; McQuarrie, Statistical Mechanics, 2000, ch. 6; Pitzer & Gwinn,
 * J. Chem. Phys. 10 (1942) 428 for the limits of the hindered rotor).
 */
import { describe, expect, it } from "vitest";
import {
  buildHinderedRotor,
  hinderedRotorHarmonicWavenumber,
} from "../../../../kernel-lib/src/idealgas/molecular/hinderedRotor.js";
import { harmonicVibrationContribution } from "../../../../kernel-lib/src/idealgas/molecular/harmonicVibration.js";
import {
  rotationalConstantFromMoment,
  wavenumberToKelvin,
} from "../../../../kernel-lib/src/idealgas/molecular/spectroscopicUnits.js";
import { InputError } from "../../../../kernel-lib/src/errors.js";
import { R } from "../../../../kernel-lib/src/constants.js";
import { expectReference, referenceValue } from "../../../fixtures/referenceValues.js";

const methyl = { barrierInvCm: 1012, fold: 3, symmetryNumber: 3, reducedMomentAmuA2: 1.578 };

describe("free-rotor limit (V0 -> 0)", () => {
  it("V0 = 0 reproduces the free-rotor levels B m^2 exactly", () => {
    const model = buildHinderedRotor({ ...methyl, barrierInvCm: 0 });
    const b = model.rotationalConstantInvCm;
    const expected = [0, 1, 1, 4, 4, 9, 9, 16, 16].map((k) => k * b);
    expected.forEach((e, i) => expect(model.levelsInvCm[i]).toBeCloseTo(e, 9));
  });

  it("tiny V0 approaches the classical free rotor q = sqrt(pi T/theta)/sigma at high T", () => {
    const model = buildHinderedRotor({ ...methyl, barrierInvCm: 1e-6 });
    const theta = wavenumberToKelvin(model.rotationalConstantInvCm);
    for (const t of [300, 1000, 3000]) {
      const c = model.contribution(t);
      const sClassical = R * (Math.log(Math.sqrt((Math.PI * t) / theta) / 3) + 0.5);
      // Euler-Maclaurin: the quantum sum differs from the integral by O(exp(-pi^2 T/theta)).
      expect(c.entropy).toBeCloseTo(sClassical, 6);
      expect(c.cp).toBeCloseTo(R / 2, 6);
      expect(c.enthalpyFrom0K).toBeCloseTo((R * t) / 2, 3);
    }
  });
});

describe("harmonic limit (V0 large)", () => {
  it("nu = n sqrt(V0 B) (closed form) for the methyl top: 312 cm^-1 against observed 289", () => {
    const b = rotationalConstantFromMoment(methyl.reducedMomentAmuA2);
    expect(hinderedRotorHarmonicWavenumber(methyl)).toBeCloseTo(3 * Math.sqrt(1012 * b), 10);
    // 16.8576 / I (amu A^2) = B (cm^-1): the standard conversion factor, from memory of
    // Herzberg, Molecular Spectra and Molecular Structure, vol. I (1950): tests/fixtures/herzberg-1950.json
    expectReference(b * 1.578, referenceValue("herzberg-1950.json", "B*I"));
  });

  it("the level spacing tends to the harmonic quantum as V0 grows (error ~ 1/sqrt(V0))", () => {
    let previousError = Infinity;
    for (const v0 of [1000, 4000, 16000, 64000]) {
      const rotor = { ...methyl, barrierInvCm: v0 };
      const model = buildHinderedRotor(rotor, { maxTemperatureK: 300 });
      const nu = hinderedRotorHarmonicWavenumber(rotor);
      // n-fold near-degenerate ground triplet, then the first excited triplet.
      expect(model.levelsInvCm[2]).toBeLessThan(1e-3 * nu);
      const spacing = model.levelsInvCm[3];
      const error = Math.abs(spacing - nu) / nu;
      // Mathieu-equation anharmonic correction: the first spacing is nu - (n^2 B)/4 (a quartic
      // perturbation), i.e. a relative error n^2 B / (4 nu), halving when V0 quadruples.
      const b = model.rotationalConstantInvCm;
      expect(Math.abs(spacing - (nu - (9 * b) / 4)) / nu).toBeLessThan(0.2 * error + 1e-4);
      expect(error).toBeLessThan(previousError * 0.55);
      previousError = error;
    }
  });

  it("thermodynamic functions tend to (n/sigma) x harmonic oscillator, at T = theta_v", () => {
    // Compare at T = h c nu / kB (x = 1), where the oscillator is half excited. n/sigma = 1 here,
    // so q_HR -> q_HO; the remaining difference is anharmonic, of relative order
    // kB T / V0 ~ sqrt(B / V0): it must shrink each time V0 quadruples.
    let previous = { cp: Infinity, s: Infinity };
    for (const v0 of [4000, 16000, 64000, 256000, 1024000]) {
      const rotor = { ...methyl, barrierInvCm: v0 };
      const nu = hinderedRotorHarmonicWavenumber(rotor);
      const t = wavenumberToKelvin(nu);
      const hr = buildHinderedRotor(rotor, { maxTemperatureK: t }).contribution(t);
      const ho = harmonicVibrationContribution([{ wavenumberInvCm: nu, degeneracy: 1 }], t);
      const err = {
        cp: Math.abs(hr.cp - ho.cp) / ho.cp,
        s: Math.abs(hr.entropy - ho.entropy) / ho.entropy,
      };
      expect(err.cp).toBeLessThan(previous.cp * 0.6);
      expect(err.s).toBeLessThan(previous.s * 0.6);
      previous = err;
    }
    expect(previous.cp).toBeLessThan(0.01);
    expect(previous.s).toBeLessThan(0.01);
  });
});

describe("classical hindered rotor and the Pitzer-Gwinn approximation", () => {
  // Classical partition function of V0/2 (1 - cos n phi) (closed form, Pitzer & Gwinn,
  // J. Chem. Phys. 10 (1942) 428):
  //   q_cl = (1/sigma) sqrt(pi T / theta_B) exp(-x) I0(x),  x = V0 / (2 kB T).
  // Pitzer-Gwinn: q_PG = q_cl * q_HO,quantum / q_HO,classical, with the harmonic wavenumber
  // n sqrt(V0 B); accurate to a few percent in q (McClurg, Flagan & Goddard, J. Chem. Phys. 106
  // (1997) 6675, from memory), i.e. a few hundredths of R in s.
  const lnI0 = (x: number) => {
    let term = 1;
    let sum = 1;
    for (let k = 1; k < 500 && term > 1e-17 * sum; k++) {
      term *= (x / 2) ** 2 / (k * k);
      sum += term;
    }
    return Math.log(sum);
  };
  const cases = [100, 1012, 4000].map((v0) => {
    const rotor = { ...methyl, barrierInvCm: v0 };
    const model = buildHinderedRotor(rotor);
    const thetaB = wavenumberToKelvin(model.rotationalConstantInvCm);
    const thetaV = wavenumberToKelvin(v0);
    const nu = hinderedRotorHarmonicWavenumber(rotor);
    const lnQcl = (t: number) =>
      Math.log(Math.sqrt((Math.PI * t) / thetaB) / 3) - thetaV / (2 * t) + lnI0(thetaV / (2 * t));
    const sCl = (t: number) => {
      const h = 1e-4 * t;
      return R * (lnQcl(t) + (t * (lnQcl(t + h) - lnQcl(t - h))) / (2 * h));
    };
    const sPg = (t: number) =>
      sCl(t) +
      harmonicVibrationContribution([{ wavenumberInvCm: nu, degeneracy: 1 }], t).entropy -
      R * (Math.log(t / wavenumberToKelvin(nu)) + 1);
    return { v0, model, sCl, sPg };
  });

  it("the quantum levels tend to the classical rotor at high T (3000 K: within 0.005 R)", () => {
    for (const c of cases) {
      expect(Math.abs(c.model.contribution(3000).entropy - c.sCl(3000)) / R).toBeLessThan(0.005);
    }
  });

  it("Pitzer-Gwinn agrees within 0.04 R in s from 100 K to 3000 K, barriers 100 to 4000 cm^-1", () => {
    for (const c of cases) {
      for (const t of [100, 300, 1000, 3000]) {
        expect(Math.abs(c.model.contribution(t).entropy - c.sPg(t)) / R).toBeLessThan(0.04);
      }
    }
  });
});

describe("basis convergence and input checks", () => {
  it("a larger basis does not change the thermodynamic functions", () => {
    const a = buildHinderedRotor(methyl);
    const b = buildHinderedRotor(methyl, { basisHalfWidth: 2 * a.basisHalfWidth });
    for (const t of [50, 400, 3000]) {
      expect(b.contribution(t).entropy).toBeCloseTo(a.contribution(t).entropy, 9);
      expect(b.contribution(t).cp).toBeCloseTo(a.contribution(t).cp, 9);
    }
  });

  it("refuses bad rotor constants with InputError naming the field", () => {
    expect(() => buildHinderedRotor({ ...methyl, barrierInvCm: NaN })).toThrow(InputError);
    expect(() => buildHinderedRotor({ ...methyl, barrierInvCm: -1 })).toThrow(/barrierInvCm/);
    expect(() => buildHinderedRotor({ ...methyl, fold: 2.5 })).toThrow(/fold/);
    expect(() => buildHinderedRotor({ ...methyl, symmetryNumber: 0 })).toThrow(/symmetryNumber/);
    expect(() => buildHinderedRotor({ ...methyl, reducedMomentAmuA2: Infinity })).toThrow(
      /reducedMomentAmuA2/,
    );
    expect(() => buildHinderedRotor(methyl, { basisHalfWidth: 0 })).toThrow(/basisHalfWidth/);
  });
});
