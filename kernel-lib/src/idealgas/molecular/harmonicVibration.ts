/**
 * Vibrational contribution of harmonic oscillators, energies measured from the zero-point level.
 *
 * For each mode with x = theta_v / T (theta_v = h c nu / kB) and degeneracy d:
 *   (h - h0)/(R T) = d x / (e^x - 1)
 *   cv/R           = d x^2 e^x / (e^x - 1)^2
 *   s/R            = d [ x / (e^x - 1) - ln(1 - e^-x) ]
 * McQuarrie, Statistical Mechanics (2000), ch. 6 (diatomic) and ch. 8 (polyatomic, normal modes).
 *
 * Using observed fundamentals (not harmonic constants omega_e) absorbs part of the anharmonicity at
 * low T. At high T anharmonicity and vibration-rotation coupling add to cp (for N2 at 3000 K the
 * harmonic model is low by roughly 1 %; for H2 it is worse): see the notes in molecules.json.
 */
import { R } from "../../constants.js";
import { wavenumberToKelvin } from "./spectroscopicUnits.js";
import type { ThermoContribution } from "./types.js";

/** A mode as wavenumber (cm^-1) and degeneracy. */
export interface HarmonicMode {
  readonly wavenumberInvCm: number;
  readonly degeneracy: number;
}

/** Sum of harmonic-oscillator contributions of `modes` at temperature T (K). */
export function harmonicVibrationContribution(
  modes: readonly HarmonicMode[],
  temperatureK: number,
): ThermoContribution {
  let cpOverR = 0;
  let hOverRT = 0;
  let sOverR = 0;
  for (const mode of modes) {
    const x = wavenumberToKelvin(mode.wavenumberInvCm) / temperatureK;
    const emx = Math.exp(-x);
    const em1 = -Math.expm1(-x); // 1 - e^-x, accurate for small x
    const xOverExpm1 = (x * emx) / em1; // x / (e^x - 1)
    hOverRT += mode.degeneracy * xOverExpm1;
    cpOverR += (mode.degeneracy * x * x * emx) / (em1 * em1);
    sOverR += mode.degeneracy * (xOverExpm1 - Math.log(em1));
  }
  return { cp: R * cpOverR, enthalpyFrom0K: R * temperatureK * hOverRT, entropy: R * sOverR };
}
