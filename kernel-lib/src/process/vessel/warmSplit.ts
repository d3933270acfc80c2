/**
 * Trial points of the vessel's iterations: the two-phase split at (T, P) of feed z from nearby
 * K-values (the previous point's), by the split iteration of the isothermal flash
 * (phase/flash/twoPhaseSplit.ts: successive substitution with dominant-eigenvalue acceleration,
 * then Newton on the Gibbs energy; Michelsen 1982, Fluid Phase Equilib. 9, 21-40), verified
 * like every split (equal fugacity, material balance, Gibbs energy below the feed's single phase,
 * no trivial solution: phase/flash/verifyEquilibrium.ts) but WITHOUT the stability tests of the
 * phases. A split that passes proves the feed unstable (at least two phases), but a third phase
 * could still be missing: these points only steer an iteration (the Newton iterates of the
 * contents' (u, v) solve, the interior points of the choke search), and the state each iteration
 * returns is computed again by the full flash (flashTP with its stability tests) and must agree.
 * Returns undefined when the split does not converge or fails the verification; the caller then
 * takes the full flash.
 */
import { SolverError } from "../../errors.js";
import type { Fluid } from "../../fluid/defineFluid.js";
import { prepareFeed } from "../../phase/flash/flashTP.js";
import { convergeTwoPhase } from "../../phase/flash/twoPhaseSplit.js";
import type { Equilibrium } from "../../phase/flash/types.js";
import { assembleEquilibrium } from "../../phase/flash/verifyEquilibrium.js";

/** Split iteration settings: those of flashTP's defaults (tolerance 1e-11, Newton after 6). */
const SPLIT = { tolerance: 1e-11, newtonAfter: 6, maxIterations: 60 };

/** ln(K_i) = ln(y_i / x_i) of a two-phase equilibrium (vapour over liquid), else undefined. */
export function lnKOf(eq: Equilibrium): number[] | undefined {
  if (eq.phases.length !== 2) return undefined;
  const y = eq.phases[0].state.x;
  const x = eq.phases[1].state.x;
  const out = new Array<number>(y.length).fill(0);
  for (let i = 0; i < y.length; i++) if (y[i] > 0 && x[i] > 0) out[i] = Math.log(y[i] / x[i]);
  return out;
}

/** The verified two-phase split at (T, P) from lnK, or undefined (see the file header). */
export function warmSplit(
  fluid: Fluid,
  temperatureK: number,
  pressurePa: number,
  z: readonly number[],
  lnK: readonly number[],
): Equilibrium | undefined {
  const { z: zz, present } = prepareFeed(z);
  if (present.length < 2) return undefined;
  try {
    const out = convergeTwoPhase(fluid.model, temperatureK, pressurePa, zz, present, lnK, SPLIT);
    if (!out.converged) return undefined;
    return assembleEquilibrium(fluid, temperatureK, pressurePa, zz, present, out.phases, {
      iterations: out.iterations,
      method: "two-phase split from nearby K-values (trial point, no stability test)",
      warnings: [],
    });
  } catch (e) {
    if (e instanceof SolverError) return undefined;
    throw e;
  }
}
