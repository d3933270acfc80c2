/**
 * A zero-filled {@link ResidualDerivativesDraft}: every derivative a model may write (aDDD and
 * aDDT included) present from the start and `dnA` undefined, so every record made here has one
 * object shape, whether a model fills it in once (a residual call's result) or over and over (a
 * reused scratch record of the (T, P) path).
 */
import type { ResidualDerivativesDraft } from "./types.js";

/** A new zero-filled derivatives record (a, aD, aDD, aT, aTT, aDT, aDDD, aDDT; dnA undefined). */
export function zeroResidualDraft(): ResidualDerivativesDraft {
  return {
    a: 0,
    aD: 0,
    aDD: 0,
    aT: 0,
    aTT: 0,
    aDT: 0,
    aDDD: 0,
    aDDT: 0,
    dnA: undefined,
  };
}
