/**
 * The equilibrium of the vessel contents at given molar internal energy u and density rho, from a
 * nearby known equilibrium (the previous evaluation of the time integration): Newton's method on
 * (T, ln P) around the isothermal flash (phase/flash/flashTP.ts, with its stability tests, so the
 * number of phases is found at every iterate), with a forward-difference Jacobian kept between
 * calls (chord steps while the residual falls fast, a fresh Jacobian otherwise). The nested
 * (u, v) flash of phase/flash (flashUV: outer search on T, inner on ln P, after Michelsen 1999)
 * answers the same question from no start; it is taken whenever this iteration does not converge.
 * The result meets u and v to the same relative tolerance as flashUV (1e-9 by default; scale
 * max(|u|, R T) for u, v for v) and is verified by flashTP (equal fugacities), so either route
 * returns a verified equilibrium.
 */
import { R } from "../../constants.js";
import { SolverError } from "../../errors.js";
import type { Fluid } from "../../fluid/defineFluid.js";
import { overallProperty } from "../../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../../phase/flash/types.js";
import type { FlashOptions } from "../../phase/flash/flashTP.js";

/** A warm-started (u, v) solver with its remembered Jacobian. */
export interface ContentsFlash {
  /** The equilibrium at u (J/mol), rho (mol/m3), z near (guessT K, guessP Pa). */
  solve(u: number, rho: number, z: readonly number[], guessT: number, guessP: number): Equilibrium;
  /** Calls that needed the nested flashUV. */
  readonly fallbacks: number;
}

/** Creates the solver for a fluid; `specTolerance` as in flashUV (default 1e-9). */
export function contentsFlash(
  fluid: Fluid,
  specTolerance = 1e-9,
  flash: FlashOptions = {},
): ContentsFlash {
  let J: [number, number, number, number] | undefined; // d(ru, rv)/d(T, lnP)
  let fallbacks = 0;
  const residual = (eq: Equilibrium, u: number, v: number): [number, number] => {
    const scale = Math.max(Math.abs(u), R * eq.temperatureK);
    return [(overallProperty(eq, "u") - u) / scale, (overallProperty(eq, "v") - v) / v];
  };
  const newton = (
    u: number,
    rho: number,
    z: readonly number[],
    T0: number,
    P0: number,
  ): Equilibrium | undefined => {
    const v = 1 / rho;
    let T = T0;
    let lnP = Math.log(P0);
    let eq = fluid.flashTP(T, Math.exp(lnP), z, flash);
    let r = residual(eq, u, v);
    let norm = Math.max(Math.abs(r[0]), Math.abs(r[1]));
    const jacobian = (): [number, number, number, number] => {
      const dT = 1e-5 * T;
      const dl = 1e-5;
      const a = residual(fluid.flashTP(T + dT, Math.exp(lnP), z, flash), u, v);
      const b = residual(fluid.flashTP(T, Math.exp(lnP + dl), z, flash), u, v);
      return [(a[0] - r[0]) / dT, (b[0] - r[0]) / dl, (a[1] - r[1]) / dT, (b[1] - r[1]) / dl];
    };
    let fresh = false;
    if (J === undefined) {
      J = jacobian();
      fresh = true;
    }
    for (let k = 0; k < 12; k++) {
      if (norm <= specTolerance * 0.1) return eq;
      const [a, b, c, d] = J;
      const det = a * d - b * c;
      if (!(Math.abs(det) > 0) || !Number.isFinite(det)) return undefined;
      let dT = -(d * r[0] - b * r[1]) / det;
      let dl = -(-c * r[0] + a * r[1]) / det;
      // keep the step local (a warm start is near)
      const s = Math.max(Math.abs(dT) / (0.1 * T), Math.abs(dl) / 0.2, 1);
      dT /= s;
      dl /= s;
      const eqNew = fluid.flashTP(T + dT, Math.exp(lnP + dl), z, flash);
      const rNew = residual(eqNew, u, v);
      const normNew = Math.max(Math.abs(rNew[0]), Math.abs(rNew[1]));
      if (!(normNew < norm)) {
        if (fresh) return undefined;
        J = jacobian();
        fresh = true;
        continue;
      }
      const slow = normNew > 0.2 * norm;
      T += dT;
      lnP += dl;
      eq = eqNew;
      r = rNew;
      norm = normNew;
      fresh = false;
      if (slow && norm > specTolerance * 0.1) {
        J = jacobian();
        fresh = true;
      }
    }
    return norm <= specTolerance ? eq : undefined;
  };
  return {
    get fallbacks() {
      return fallbacks;
    },
    solve(u, rho, z, guessT, guessP) {
      let eq: Equilibrium | undefined;
      try {
        eq = newton(u, rho, z, guessT, guessP);
      } catch (e) {
        if (!(e instanceof SolverError)) throw e;
        eq = undefined;
      }
      if (eq !== undefined) return eq;
      fallbacks++;
      J = undefined;
      return fluid.flashUV(u, rho, z, {
        ...flash,
        initialGuessK: guessT,
        initialGuessPa: guessP,
        specTolerance,
      });
    },
  };
}
