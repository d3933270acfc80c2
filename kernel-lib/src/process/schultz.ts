/**
 * The polytropic head by J. M. Schultz's method ("The polytropic analysis of centrifugal
 * compressors", J. Eng. Power 84 (1962) 69-82): the head of a polytropic path approximated from
 * the end states with a volume exponent n, corrected by the factor f found on the isentrope:
 *     n_s = ln(P2/P1) / ln(v1/v2s)                (isentropic volume exponent)
 *     f   = (h2s - h1) / [n_s/(n_s - 1) (P2 v2s - P1 v1)]
 *     H_p = f n/(n - 1) (P2 v2 - P1 v1),  n = ln(P2/P1) / ln(v1/v2)
 * and the discharge where h2 - h1 = H_p / eta_p (solved here on T2 at P2 by Brent's method on
 * single-phase states). Computed beside the exact path (polytropicPath.ts) to show the method's
 * error; for an ideal gas with constant cp the method is exact (f = 1).
 */
import { SolverError } from "../errors.js";
import type { Fluid } from "../fluid/defineFluid.js";
import { findRootBrent } from "../numerics/brent.js";
import { overallProperty } from "../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../phase/flash/types.js";

/** The result of Schultz's method, with its error against the exact path. */
export interface SchultzResult {
  /** n_s = ln(P2/P1) / ln(v1/v2s). */
  readonly isentropicVolumeExponent: number;
  /** Schultz's correction factor f. */
  readonly correctionFactor: number;
  /** n of the Schultz discharge. */
  readonly polytropicVolumeExponent: number;
  readonly dischargeTemperatureK: number;
  /** H_p, J/mol. */
  readonly polytropicHeadJPerMol: number;
  /** h2 - h1 = H_p / eta_p, J/mol. */
  readonly workJPerMol: number;
  /** (H_p,Schultz - H_p,exact) / H_p,exact. */
  readonly headRelativeError: number;
  /** (w_Schultz - w_exact) / w_exact. */
  readonly workRelativeError: number;
  /** T2,Schultz - T2,exact, K. */
  readonly dischargeTemperatureDifferenceK: number;
}

/**
 * Schultz's polytropic analysis of a compression from `inlet` (one phase) to P2 with polytropic
 * efficiency etaP, given the isentropic discharge; compared with the exact path's head, work and
 * discharge temperature.
 */
export function schultzCompression(
  fluid: Fluid,
  z: readonly number[],
  inlet: Equilibrium,
  isentropicOutlet: Equilibrium,
  etaP: number,
  exact: { headJPerMol: number; workJPerMol: number; dischargeTemperatureK: number },
): SchultzResult {
  const P1 = inlet.pressurePa;
  const P2 = isentropicOutlet.pressurePa;
  const h1 = overallProperty(inlet, "h");
  const v1 = overallProperty(inlet, "v");
  const h2s = overallProperty(isentropicOutlet, "h");
  const v2s = overallProperty(isentropicOutlet, "v");
  const lnPr = Math.log(P2 / P1);
  const ns = lnPr / Math.log(v1 / v2s);
  const f = (h2s - h1) / ((ns / (ns - 1)) * (P2 * v2s - P1 * v1));
  const headAt = (v2: number): { n: number; head: number } => {
    const n = lnPr / Math.log(v1 / v2);
    return { n, head: f * (n / (n - 1)) * (P2 * v2 - P1 * v1) };
  };
  const g = (T2: number): number => {
    const s = fluid.stateAtTP(T2, P2, z);
    return s.molar.h - h1 - headAt(1 / s.densityMolPerM3).head / etaP;
  };
  const Tlo = isentropicOutlet.temperatureK;
  let Thi = Math.max(exact.dischargeTemperatureK, Tlo) + 5;
  let k = 0;
  while (!(g(Thi) > 0)) {
    Thi += 20 * 2 ** k;
    if (++k > 30) {
      throw new SolverError(
        "Schultz (1962) discharge",
        `no temperature at ${P2} Pa above ${Tlo} K meets h2 - h1 = H_p / eta_p (tried up to ${Thi} K)`,
      );
    }
  }
  const T2 = findRootBrent(g, Tlo, Thi, { tolerance: 1e-10 * Tlo }).value;
  const s2 = fluid.stateAtTP(T2, P2, z);
  const { n, head } = headAt(1 / s2.densityMolPerM3);
  const work = s2.molar.h - h1;
  return {
    isentropicVolumeExponent: ns,
    correctionFactor: f,
    polytropicVolumeExponent: n,
    dischargeTemperatureK: T2,
    polytropicHeadJPerMol: head,
    workJPerMol: work,
    headRelativeError: (head - exact.headJPerMol) / exact.headJPerMol,
    workRelativeError: (work - exact.workJPerMol) / exact.workJPerMol,
    dischargeTemperatureDifferenceK: T2 - exact.dischargeTemperatureK,
  };
}
