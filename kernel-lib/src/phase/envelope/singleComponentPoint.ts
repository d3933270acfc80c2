/**
 * The saturation point of a feed in which only one component is present (z = a pure component
 * inside a mixture model): the two phases have the same composition, so they differ only by
 * their density root, and the condition is ln phi_i(vapour root) = ln phi_i(liquid root) at T, P
 * (equal fugacity of the pure component). Newton's method on ln P at given T, or on ln T at given
 * P, with d ln phi / dP and d ln phi / dT of state/fugacity.ts:
 *   dF/d ln P = P (v_V - v_L) / RT,   dF/d ln T = T (d ln phi_V/dT - d ln phi_L/dT),
 * started from Wilson's vapour-pressure estimate (the K-factor equation with K = 1). Where an
 * iterate has only one root, the unknown is moved away from that root's side.
 */
import { PhaseUnavailableError } from "../../errors.js";
import { fugacityDerivatives, phaseFugacityAtTP } from "../../state/fugacity.js";
import type { WilsonConstants } from "../stability.js";
import type { SaturationSystem } from "./saturationSystem.js";
import type { VerifiedPoint } from "./verifyPoint.js";
import { wilsonLnK } from "./wilson.js";
import { wilsonLnReducedVaporPressure } from "../wilson.js";

/** Solves the pure-component condition with T or P given; verified, or a PhaseUnavailableError. */
export function singleComponentPoint(
  sys: SaturationSystem,
  given: { temperatureK: number } | { pressurePa: number },
  constants: readonly WilsonConstants[] | undefined,
  tolerance: number,
  maxIterations: number,
): { point: VerifiedPoint; iterations: number } {
  const i = sys.present[0];
  const model = sys.model;
  const atT = "temperatureK" in given;
  const c = constants?.[i];
  let T = atT ? given.temperatureK : c ? c.criticalTemperatureK * 0.7 : 300;
  let P = atT ? (c ? Math.exp(wilsonLnK([c], T, 1)[0]) : 1e5) : given.pressurePa;
  if (!atT && c) {
    // Wilson's vapour pressure solved for T: ln(P/Pc) = a (1 - Tc/T), a = ln(Psat/Pc) at T = Tc/2
    const a =
      wilsonLnReducedVaporPressure(
        c.criticalTemperatureK / 2,
        c.criticalTemperatureK,
        c.acentricFactor,
      ) / -1;
    T = c.criticalTemperatureK / (1 + Math.log(c.criticalPressurePa / P) / a);
    if (!(T > 0)) T = 0.7 * c.criticalTemperatureK;
  }
  const where = (): string => (atT ? `at T = ${T} K` : `at P = ${P} Pa`);
  for (let it = 0; it <= maxIterations; it++) {
    const v = phaseFugacityAtTP(model, T, P, sys.z, "vapor");
    const l = phaseFugacityAtTP(model, T, P, sys.z, "liquid");
    if (!(l.densityMolPerM3 > v.densityMolPerM3 * (1 + 1e-6))) {
      // one root only: move towards the other phase's side
      const liquidLike = v.Z < 0.3;
      if (atT) P *= liquidLike ? 0.8 : 1.25;
      else T *= liquidLike ? 1.03 : 0.97;
      continue;
    }
    const F = v.lnPhi[i] - l.lnPhi[i];
    if (Math.abs(F) <= tolerance) {
      return {
        point: {
          temperatureK: T,
          pressurePa: P,
          x: sys.z.slice(),
          y: sys.z.slice(),
          // the x phase is the feed of a bubble point (liquid), y of a dew point (vapour)
          densityX: sys.beta <= 0.5 ? l.densityMolPerM3 : v.densityMolPerM3,
          densityY: sys.beta <= 0.5 ? v.densityMolPerM3 : l.densityMolPerM3,
          fugacityResidual: Math.abs(F),
          maxLnK: 0,
        },
        iterations: it,
      };
    }
    if (it === maxIterations) break;
    const dv = fugacityDerivatives(model, T, v.densityMolPerM3, sys.z);
    const dl = fugacityDerivatives(model, T, l.densityMolPerM3, sys.z);
    if (atT) {
      const slope = P * (dv.dLnPhiDP[i] - dl.dLnPhiDP[i]);
      const step = Math.max(-0.5, Math.min(0.5, -F / slope));
      P *= Math.exp(step);
    } else {
      const slope = T * (dv.dLnPhiDT[i] - dl.dLnPhiDT[i]);
      const step = Math.max(-0.1, Math.min(0.1, -F / slope));
      T *= Math.exp(step);
    }
    if (!(T > 0 && P > 0 && T < Infinity && P < Infinity)) break;
  }
  throw new PhaseUnavailableError(
    `no saturation point of the single component ${model.info.componentIds[i]} present in z ${where()} after ${maxIterations} Newton iterations: at or above its critical point the model has no two roots (last iterate T = ${T} K, P = ${P} Pa)`,
  );
}
