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
import { lnKOf, warmSplit } from "./warmSplit.js";

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
    T0: number,
    P0: number,
    flashAt: (T: number, P: number) => Equilibrium | undefined,
  ): Equilibrium | undefined => {
    const v = 1 / rho;
    let T = T0;
    let lnP = Math.log(P0);
    const first = flashAt(T, Math.exp(lnP));
    if (first === undefined) return undefined;
    let eq = first;
    let r = residual(eq, u, v);
    let norm = Math.max(Math.abs(r[0]), Math.abs(r[1]));
    const jacobian = (): [number, number, number, number] | undefined => {
      const dT = 1e-5 * T;
      const dl = 1e-5;
      const ea = flashAt(T + dT, Math.exp(lnP));
      const eb = flashAt(T, Math.exp(lnP + dl));
      if (ea === undefined || eb === undefined) return undefined;
      const a = residual(ea, u, v);
      const b = residual(eb, u, v);
      return [(a[0] - r[0]) / dT, (b[0] - r[0]) / dl, (a[1] - r[1]) / dT, (b[1] - r[1]) / dl];
    };
    let fresh = false;
    if (J === undefined) {
      J = jacobian();
      if (J === undefined) return undefined;
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
      const eqNew = flashAt(T + dT, Math.exp(lnP + dl));
      if (eqNew === undefined) return undefined;
      const rNew = residual(eqNew, u, v);
      const normNew = Math.max(Math.abs(rNew[0]), Math.abs(rNew[1]));
      if (!(normNew < norm)) {
        if (fresh) return undefined;
        J = jacobian();
        if (J === undefined) return undefined;
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
        if (J === undefined) return undefined;
        fresh = true;
      }
    }
    return norm <= specTolerance ? eq : undefined;
  };
  // the phases of the latest result: ln K of a two-phase one (the warm split's start), or one
  // phase; undefined before the first result and after a three-phase one
  let last: { lnK?: readonly number[]; single: boolean } | undefined;
  const remember = (eq: Equilibrium): Equilibrium => {
    const lnK = lnKOf(eq);
    last =
      eq.phases.length === 1
        ? { single: true }
        : lnK !== undefined
          ? { lnK, single: false }
          : undefined;
    return eq;
  };
  /**
   * The warm start: the phases of the latest result kept (a two-phase split from its K-values,
   * warmSplit.ts, or one phase by Newton's method on T at the fixed density; one phase before
   * the first result), its (T, P) then given to the full flash, which must meet u and v. When
   * the one-phase trial's full flash finds two phases, the two-phase trial follows from that
   * flash's K-values. Undefined when no trial is accepted.
   */
  const warm = (
    u: number,
    rho: number,
    z: readonly number[],
    guessT: number,
    guessP: number,
  ): Equilibrium | undefined => {
    let start = last ?? { single: true };
    let warmK: readonly number[] | undefined;
    let T = guessT;
    let P = guessP;
    for (let attempt = 0; attempt < 2; attempt++) {
      if (start.single) {
        let st = fluid.stateAtTRho(T, rho, z);
        const scale = Math.max(Math.abs(u), R * T);
        for (let k = 0; ; k++) {
          const r = st.molar.u - u;
          if (Math.abs(r) <= 1e-12 * scale) break;
          if (!(st.molar.cv > 0) || k > 30) return undefined;
          let dT = -r / st.molar.cv;
          if (Math.abs(dT) > 0.1 * T) dT = Math.sign(dT) * 0.1 * T;
          T += dT;
          st = fluid.stateAtTRho(T, rho, z);
        }
        P = st.pressurePa;
        // inside the spinodal a one-phase state at this density can have P <= 0
        if (!(P > 0 && T > 0)) return undefined;
      } else {
        let lnK = start.lnK!;
        const eq = newton(u, rho, T, P, (t, p) => {
          const e = warmSplit(fluid, t, p, z, lnK);
          if (e !== undefined) lnK = lnKOf(e) ?? lnK;
          return e;
        });
        if (eq === undefined) return undefined;
        T = eq.temperatureK;
        P = eq.pressurePa;
        warmK = lnKOf(eq);
      }
      // the full flash (all stability tests), warm-started from the trial's split
      const full = fluid.flashTP(
        T,
        P,
        z,
        warmK === undefined ? flash : { ...flash, initialLnK: warmK },
      );
      const r = residual(full, u, 1 / rho);
      if (Math.max(Math.abs(r[0]), Math.abs(r[1])) <= specTolerance) return full;
      const lnK = lnKOf(full);
      if (!start.single || lnK === undefined) return undefined;
      start = { lnK, single: false };
    }
    return undefined;
  };
  return {
    get fallbacks() {
      return fallbacks;
    },
    solve(u, rho, z, guessT, guessP) {
      let eq: Equilibrium | undefined;
      try {
        eq = warm(u, rho, z, guessT, guessP);
      } catch (e) {
        if (!(e instanceof SolverError)) throw e;
        eq = undefined;
      }
      if (eq !== undefined) return remember(eq);
      try {
        eq = newton(u, rho, guessT, guessP, (t, p) => fluid.flashTP(t, p, z, flash));
      } catch (e) {
        if (!(e instanceof SolverError)) throw e;
        eq = undefined;
      }
      if (eq !== undefined) return remember(eq);
      fallbacks++;
      J = undefined;
      return remember(
        fluid.flashUV(u, rho, z, {
          ...flash,
          initialGuessK: guessT,
          initialGuessPa: guessP,
          specTolerance,
        }),
      );
    },
  };
}
