/**
 * The result shapes of the mixture flashes (phase/flash/): an equilibrium of one to three phases
 * at a temperature and pressure, each phase a full single-phase state, with the checks that were
 * run on it before it was returned.
 */
import type { ResultWarning } from "../../errors.js";
import type { ModelInfo } from "../../eos/types.js";
import type { FluidState } from "../../state/types.js";
import type { StabilityResult } from "../stability.js";

/**
 * Label of an equilibrium phase: the vapour is always the lightest phase; two liquids are
 * "liquid" (the lighter) and "liquid-2" (the denser).
 */
export type PhaseKind = "vapor" | "liquid" | "liquid-2";

/** One phase of an equilibrium. */
export interface EquilibriumPhase {
  readonly kind: PhaseKind;
  /** mol of this phase per mol of feed. */
  readonly amount: number;
  /** The full single-phase state at T, P and the phase's own composition (stateAtTRho). */
  readonly state: FluidState;
}

/** What was verified before the result was returned. */
export interface EquilibriumCheck {
  /** max_i |ln f_i(a) - ln f_i(b)| over present components and every pair of phases (0 for one phase). */
  readonly maxLnFugacityDifference: number;
  /** (G_split - G_feed) / (n R T), <= 0 (0 for one phase). */
  readonly gibbsChangeOverRT: number;
  /** max_i |sum_k amount_k x_ik - z_i| (0 for one phase). */
  readonly materialBalanceError: number;
  /** Iterations of the flash (successive substitution plus Newton; the outer loop for state-function flashes). */
  readonly iterations: number;
  /** What was run, e.g. "stability test + successive substitution (GDEM) + Newton". */
  readonly method: string;
}

/** A phase equilibrium at T and P. */
export interface Equilibrium {
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Feed mole fractions (a copy). */
  readonly z: readonly number[];
  /** Vapour first, then liquids by increasing density. */
  readonly phases: readonly EquilibriumPhase[];
  readonly check: EquilibriumCheck;
  /**
   * The tangent-plane test that decided the number of phases: of the feed when one phase is
   * returned (its verdict "stable"), of the phase of largest amount when two are returned.
   * Undefined for one present component (nothing to test) and for saturated pure fluids.
   */
  readonly stability?: StabilityResult;
  readonly model: ModelInfo;
  readonly warnings: readonly ResultWarning[];
}

/** The specification of a state-function flash and how closely the result meets it. */
export interface SpecificationResidual {
  /** Which function was specified: "h" (J/mol), "s" (J/(mol K)), "u" (J/mol) and "v" (m3/mol). */
  readonly property: "h" | "s" | "u" | "v";
  readonly target: number;
  readonly achieved: number;
  /** |achieved - target| / scale, with the scale stated in `scale`. */
  readonly relativeError: number;
  /** The scale of the relative error (e.g. max(|h|, R T) for an enthalpy). */
  readonly scale: number;
}

/** An equilibrium found from a state-function specification (P-h, P-s, T-s, u-v). */
export interface StateFunctionEquilibrium extends Equilibrium {
  /** One entry per specified function (two for u-v). */
  readonly specification: readonly SpecificationResidual[];
}
