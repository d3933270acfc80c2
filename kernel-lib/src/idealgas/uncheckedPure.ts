/**
 * The ideal-gas mixture's hot path: unchecked evaluators of a pure's correlation, registered by the
 * route that built the pure (correlationPure.ts) and found by the mixture once, at construction.
 * The public IdealGasPure methods check the temperature range on every call (and build warning
 * arrays); the mixture checks the range itself, once per component, and then calls these.
 */
import type { IdealGasPure } from "./types.js";
import type { CpAndIntegrals } from "./cpCorrelation.js";

/** A pure's ideal-gas functions without range checks (the caller has checked T). */
export interface UncheckedPure {
  /** Writes cp°(T), h°(T) - h°(298.15 K) and s°(T) - s°(298.15 K) (at 1 bar) into `out`. */
  evaluate(temperatureK: number, out: CpAndIntegrals): void;
  /** The same with lnT = Math.log(temperatureK) from the caller (one logarithm per mixture). */
  evaluateWithLog(temperatureK: number, lnT: number, out: CpAndIntegrals): void;
  /** Third-law entropy at 298.15 K and 1 bar, J/(mol K) (NaN when unknown). */
  readonly absoluteEntropy298: number;
}

// keyed by the (frozen) pure object, so a user's own IdealGasPure simply has no entry
const registry = new WeakMap<IdealGasPure, UncheckedPure>();

/** Records the unchecked evaluator of a pure built by a route of this library. */
export function registerUncheckedPure(pure: IdealGasPure, unchecked: UncheckedPure): void {
  registry.set(pure, unchecked);
}

/** The unchecked evaluator of a pure, or undefined for a pure from elsewhere. */
export function uncheckedPureOf(pure: IdealGasPure): UncheckedPure | undefined {
  return registry.get(pure);
}
