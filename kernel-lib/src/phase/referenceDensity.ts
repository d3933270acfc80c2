/**
 * Density at given (T, P) for a reference equation: only the physically meaningful (stable) root.
 * It needs the exact saturation state (this layer's), so a reference equation (eos/multiparameter)
 * receives it as its `densityRoots` where the fluid is bound (fluid/referenceFluids.ts).
 *
 * Why not a generic root scan: multiparameter equations such as IAPWS-95 oscillate wildly inside
 * the two-phase region (pressures of +-1e11 Pa at 400 K), and a scan finds spurious "roots" there
 * with dP/drho > 0. This routine stays on the stable branches instead:
 * - T at or above the critical temperature: P(rho) rises monotonically; Brent's method on a
 *   bracket grown from the dilute gas.
 * - Below it, well away from the saturation pressure (more than 2 % by the ancillary equation) and
 *   below 0.995 T_c: Newton's method from the ideal-gas density for the vapour (P(rho) concave on
 *   the vapour branch: iterates approach from below, never overshooting) or from the ancillary
 *   liquid density for the liquid (P(rho) convex there: iterates approach from above).
 * - Otherwise: the exact saturation state (phase/saturation.ts) fixes the branch ends, then Brent on
 *   the vapour branch (0, rho_V] or the liquid branch [rho_L, ...).
 * Metastable roots are not returned. Brent: R. P. Brent, Algorithms for Minimization without
 * Derivatives (1973), ch. 4; Newton: the safeguards stated above.
 */
import { SolverError } from "../errors.js";
import type { ResidualModel } from "../eos/types.js";
import { dPdRho, pressureFromResidual } from "../eos/residualRelations.js";
import { findRootBrent } from "../numerics/brent.js";
import { locateCriticalPoint } from "./criticalPoint.js";
import { saturationAtTemperature } from "./saturation.js";
import { PURE } from "./pureFluid.js";

/** What the density solver needs from a reference fluid. */
export interface DensitySolverFluid extends ResidualModel {
  readonly gasConstant: number;
  saturationEstimate(temperatureK: number): {
    pressurePa: number;
    liquidDensityMolPerM3: number;
    vaporDensityMolPerM3: number;
  };
}

/** The stable density root (mol/m3) at T (K) and P (Pa), as a one-element list. */
export function referenceDensityRoots(
  fluid: DensitySolverFluid,
  temperatureK: number,
  pressurePa: number,
): number[] {
  const T = temperatureK;
  const P = pressurePa;
  const RT = fluid.gasConstant * T;
  const Rg = fluid.gasConstant;
  const pressure = (rho: number): number =>
    pressureFromResidual(T, rho, fluid.residual(T, rho, PURE).aD, Rg);
  const critical = locateCriticalPoint(fluid);
  const Tc = critical.temperatureK;
  const rhoC = critical.densityMolPerM3;

  const growUntilAbove = (start: number): number => {
    let hi = start;
    for (let k = 0; k < 200 && pressure(hi) < P; k++) hi *= 1.5;
    return hi;
  };

  if (T >= Tc) {
    const lo = (1e-6 * P) / RT;
    const hi = growUntilAbove(Math.max((2 * P) / RT, rhoC));
    return [findRootBrent((rho) => pressure(rho) - P, lo, hi).value];
  }

  const est = fluid.saturationEstimate(T);
  if (T < 0.995 * Tc && Math.abs(P / est.pressurePa - 1) > 0.02) {
    const vapor = P < est.pressurePa;
    let rho = vapor ? P / RT : est.liquidDensityMolPerM3;
    for (let k = 0; k < 50; k++) {
      const d = fluid.residual(T, rho, PURE);
      const f = pressureFromResidual(T, rho, d.aD, Rg) - P;
      const df = dPdRho(T, d, Rg);
      if (!(df > 0)) break;
      const step = f / df;
      const next = rho - step;
      if (!(next > 0)) break;
      rho = next;
      if (Math.abs(step) <= 1e-14 * rho) {
        // Accept only a root on its own side of the ancillary saturation density.
        const ok = vapor
          ? rho < est.vaporDensityMolPerM3 * 1.02
          : rho > est.liquidDensityMolPerM3 * 0.98;
        if (ok) return [rho];
        break;
      }
    }
  }

  // Exact phase boundary, then Brent on the stable branch.
  const sat = saturationAtTemperature(fluid, T);
  if (P <= sat.pressurePa) {
    const lo = (1e-6 * P) / RT;
    const root = findRootBrent((rho) => pressure(rho) - P, lo, sat.vaporDensityMolPerM3);
    return [root.value];
  }
  const hi = growUntilAbove(sat.liquidDensityMolPerM3 * 1.01);
  if (!(pressure(hi) >= P)) {
    throw new SolverError(
      "reference density at (T, P)",
      `no liquid density reaches P = ${P} Pa at T = ${T} K (tried up to ${hi} mol/m3)`,
    );
  }
  return [findRootBrent((rho) => pressure(rho) - P, sat.liquidDensityMolPerM3, hi).value];
}
