/**
 * The result of a process step (valve, compressor stage or train, expander, pump, heater,
 * cooler, exchanger, mixer, separator): the streams in and out, the power or duty for the
 * streams' flows, the path of states for the P-h, T-s and process-path charts, the warnings with
 * their basis, the caution, the method text, and the balances closed before the result left.
 *
 * Sign convention: power and duty are positive INTO the fluid (a compressor's power and a
 * heater's duty are positive; a turbine's power and a cooler's duty are negative).
 */
import type { ResultWarning } from "../errors.js";
import type { Equilibrium } from "../phase/flash/types.js";
import type { Stream } from "./stream.js";

/** What a process warning is about. */
export type ProcessCondition =
  | "liquid-at-suction"
  | "low-temperature"
  | "below-minimum-design-metal-temperature"
  | "high-discharge-temperature"
  | "two-phase-path"
  | "two-phase-outlet"
  | "wet-expander-exit"
  | "temperature-cross"
  | "pump-cavitation-margin"
  | "knock-out-liquid"
  | "other";

/** A warning of a process step, with the basis (the rule or limit it applies). */
export interface ProcessWarning extends ResultWarning {
  readonly code: "process-condition";
  readonly condition: ProcessCondition;
  /** The basis of the warning: the limit, who set it, where the rule comes from. */
  readonly basis: string;
}

/** The balances a step closed before returning (result checks itself before it leaves). */
export interface StepCheck {
  /**
   * |sum F_in h_in + power + duty - sum F_out h_out| / scale, with scale = sum over streams of
   * F max(|h|, R T) plus |power| + |duty|. The outlet states are the flashed ones, the power and
   * duty those from the specification, so this is a real check of the flash and the bookkeeping.
   */
  readonly energyBalanceRelativeError: number;
  /** max_i |sum F_in z_i - sum F_out z_i| / sum F_in (component moles). */
  readonly massBalanceRelativeError: number;
  /** The tolerance the balances were held to (a SolverError otherwise). */
  readonly tolerance: number;
}

/** The result of a process step. */
export interface StepResult {
  /** "valve", "compressor", "compressor-train", "turbine", "pump", "heater", "cooler", ... */
  readonly kind: string;
  readonly inlets: readonly Stream[];
  /** The main outlet (the compressed gas, the valve outlet, a separator's vapour). */
  readonly outlet: Stream;
  /** Every outlet, the main one first (separators and trains add liquids). */
  readonly outlets: readonly Stream[];
  /** W, positive into the fluid (compressor, pump), negative out of it (turbine). */
  readonly powerW?: number;
  /** W, positive into the fluid (heater), negative out of it (cooler). */
  readonly dutyW?: number;
  /** J/mol of the (first) inlet, positive into the fluid. */
  readonly specificWorkJPerMol?: number;
  /** The states along the path, inlet first, for the P-h, T-s and process-path charts. */
  readonly path: readonly Equilibrium[];
  readonly warnings: readonly ResultWarning[];
  /** The usual caution of process results ({@link PROCESS_CAUTION}). */
  readonly caution: string;
  /** "Method and assumptions": what was computed and how, in a paragraph for a record. */
  readonly method: string;
  /** The balances closed before the result was returned. */
  readonly check: StepCheck;
}

/** The caution every process result carries. */
export const PROCESS_CAUTION =
  "For screening and checking only. Equipment limits, surge and stonewall, mechanical design, " +
  "materials and minimum design metal temperature, and relief and depressuring come from the " +
  "vendor's data, the site's codes and standards, and a licensed engineer's review; do not size, " +
  "buy or operate equipment on these numbers alone.";
