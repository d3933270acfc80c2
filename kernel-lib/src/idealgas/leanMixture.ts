/**
 * The lean path of an ideal-gas mixture, for the state layer's hot loop: it writes h, s, u, a, g,
 * cp and cv into the caller's record instead of building a frozen result, and reports false when
 * the call needs the general path (a warning or an error is possible: then call `at`). The inputs
 * are taken as already checked (T > 0, P > 0, valid mole fractions), as the state layer does.
 */
import type { IdealGasMixture } from "./types.js";

/** Molar ideal-gas values written by the lean path, J/mol and J/(mol K). */
export interface IdealGasValues {
  h: number;
  s: number;
  u: number;
  a: number;
  g: number;
  cp: number;
  cv: number;
}

/** Writes the mixture's values at (T, P, x) into `out`; false when the general path is needed. */
export type LeanIdealGas = (
  temperatureK: number,
  pressurePa: number,
  x: readonly number[],
  out: IdealGasValues,
) => boolean;

// keyed by the (frozen) mixture, so a user's own IdealGasMixture simply has no entry
const registry = new WeakMap<IdealGasMixture, LeanIdealGas>();

/** Records the lean path of a mixture built by idealGasMixture. */
export function registerLeanIdealGas(mixture: IdealGasMixture, lean: LeanIdealGas): void {
  registry.set(mixture, lean);
}

/** The lean path of a mixture, or undefined for a mixture from elsewhere. */
export function leanIdealGasOf(mixture: IdealGasMixture): LeanIdealGas | undefined {
  return registry.get(mixture);
}
