/**
 * The one model interface. Every equation of state in isochor is a residual Helmholtz energy
 * alpha_r(T, rho, x) = A_res / (n R T), relative to the ideal gas at the same T and density,
 * with its derivatives. Every property (pressure, departures, fugacity, heat capacities, speed of
 * sound, Joule-Thomson) is computed from these in one place (state/), never re-derived per model.
 *
 * Derivatives are "reduced" (multiplied by the variable), which keeps them dimensionless:
 *   aD  = rho   d(alpha_r)/d(rho)       aDD = rho^2 d2(alpha_r)/d(rho)^2
 *   aT  = T     d(alpha_r)/dT           aTT = T^2   d2(alpha_r)/dT^2
 *   aDT = rho T d2(alpha_r)/d(rho)dT
 * Then Z = 1 + aD, and for example u_res/RT = -aT, s_res/R = -a - aT (same T and density).
 */
import type { ResultWarning } from "../errors.js";
import type { HyperDual } from "../numerics/hyperDual.js";
import type { ModelComponent } from "./modelComponent.js";
import type { InteractionMatrix } from "./interaction/interactionTable.js";

export interface ResidualDerivatives {
  readonly a: number;
  readonly aD: number;
  readonly aDD: number;
  readonly aT: number;
  readonly aTT: number;
  readonly aDT: number;
  /** rho^3 d3(alpha_r)/d(rho)^3, when the model provides it (critical points). */
  readonly aDDD?: number;
  /**
   * rho^2 T d3(alpha_r)/d(rho)^2 dT = T d(aDD)/dT, when the model provides it (the phase label
   * of a mixture, state/phaseLabel.ts, then needs no difference in T).
   */
  readonly aDDT?: number;
  /**
   * d(n alpha_r)/d(n_i) at constant T, V and n_j (j != i), one per component, when requested
   * with `{ composition: true }`. ln phi_i = dnA[i] - ln Z.
   */
  readonly dnA?: readonly number[];
}

/**
 * {@link ResidualDerivatives} while a model or integrator fills it in: writable fields and a plain
 * `dnA` array (set after the rest when composition derivatives are asked for).
 */
export type ResidualDerivativesDraft = {
  -readonly [K in keyof Omit<ResidualDerivatives, "dnA">]: ResidualDerivatives[K];
} & { dnA?: number[] };

/** What to compute: composition derivatives cost extra, so they are requested explicitly. */
export interface ResidualRequest {
  readonly composition?: boolean;
}

/** How a model was built: shown in every result and record. */
export interface ModelInfo {
  /** Stable id, e.g. "peng-robinson" (the `isochor eval` model name). */
  readonly id: string;
  /** Human name, e.g. "Peng-Robinson (1976)". */
  readonly name: string;
  /** Full citation(s) of the equation. */
  readonly citation: string;
  /** Component ids, in the order of the composition vector. */
  readonly componentIds: readonly string[];
}

/** A (pseudo-)critical point used for phase labels: K, Pa, mol/m3. */
export interface PseudoCriticalPoint {
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly densityMolPerM3: number;
  /** How it was obtained, e.g. "critical point of the equation" or "Kay's rule". */
  readonly rule: string;
}

/** P(T, rho, x) in Pa with T in K and rho in mol/m3, written with HyperDual arithmetic. */
export type HyperDualPressure = (
  temperatureK: HyperDual,
  densityMolPerM3: HyperDual,
  x: readonly number[],
) => HyperDual;

/** Estimated absolute errors of integrated residual derivatives (departure/integrateIsotherm.ts). */
export interface IntegrationErrors {
  /** alpha_r */
  readonly a: number;
  /** T d(alpha_r)/dT, including the derivative error of a finite-difference evaluator. */
  readonly aT: number;
  /** T^2 d2(alpha_r)/dT2, same. */
  readonly aTT: number;
  /** d(n alpha_r)/dn_i, one per component (quadrature plus mole-fraction differencing). */
  readonly dnA?: readonly number[];
}

/** Residual derivatives obtained by integrating a pressure function, with their error estimates. */
export interface IntegratedResidual {
  readonly derivatives: ResidualDerivatives;
  readonly errorEstimate: IntegrationErrors;
  /** Pressure-function evaluations used (hyper-dual evaluations count once). */
  readonly evaluations: number;
  /** How the temperature derivatives were obtained. */
  readonly derivativeMethod: string;
}

/** Saturation starting values, e.g. from a reference equation's published ancillary equations. */
export interface SaturationEstimate {
  readonly pressurePa: number;
  /** mol/m3 */
  readonly liquidDensityMolPerM3: number;
  /** mol/m3 */
  readonly vaporDensityMolPerM3: number;
}

/** Where a state lies relative to a model's published range. */
export type ValidityStatus = "inside" | "extrapolated" | "outside";

/**
 * The model interface. Beside the required members, a model may declare optional capabilities
 * (closed-form roots, a pressure function, published points, its components' constants, ...);
 * callers test for the member (`if (model.saturationEstimate)`) and never cast to find one.
 */
export interface ResidualModel {
  readonly info: ModelInfo;
  /**
   * Molar gas constant the equation was fitted with, J/(mol K) (reference equations publish their
   * own, e.g. IAPWS-95). Absent: the CODATA value in constants.ts.
   */
  readonly gasConstant?: number;
  /** Residual Helmholtz energy and derivatives at T (K), molar density rho (mol/m3), mole fractions x. */
  residual(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
    request?: ResidualRequest,
  ): ResidualDerivatives;
  /**
   * Largest meaningful molar density at this T and x (close packing, e.g. 1/b for a cubic),
   * mol/m3; Infinity when the model has no such limit.
   */
  maxDensity(temperatureK: number, x: readonly number[]): number;
  /**
   * Optional: every density root of P(T, rho, x) = P, ascending, mol/m3 (closed form for cubics).
   * When absent the engine searches for roots numerically.
   */
  densityRoots?(temperatureK: number, pressurePa: number, x: readonly number[]): number[];
  /**
   * Optional (sweeps): {@link densityRoots} written into `out` (length >= 3), ascending, their
   * number returned; no allocation. Must give the same numbers as `densityRoots`.
   */
  densityRootsInto?(
    temperatureK: number,
    pressurePa: number,
    x: readonly number[],
    out: Float64Array,
  ): number;
  /**
   * Optional (sweeps): the derivatives of {@link residual} without composition derivatives,
   * written into `out` (no allocation). Must give the same numbers as `residual`.
   */
  residualInto?(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
    out: ResidualDerivativesDraft,
  ): void;
  /**
   * Optional (the state layer's (T, P) path): {@link residual} with composition derivatives,
   * every derivative (aDDT included) written into `out` and d(n alpha_r)/dn_i into
   * `dnA[0 .. n - 1]` (`out.dnA` is left alone); no allocation. Must give the same numbers as
   * `residual(T, rho, x, { composition: true })`.
   */
  residualWithCompositionInto?(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
    out: ResidualDerivativesDraft,
    dnA: number[],
  ): void;
  /**
   * Optional (added by the engine issue, additive): the pressure P(T, rho, x) in Pa alone, for
   * models where the full residual is expensive (pressure-function models integrate); root searches
   * use it when present. Must equal rho R T (1 + aD).
   */
  pressure?(temperatureK: number, densityMolPerM3: number, x: readonly number[]): number;
  /**
   * Optional (added by the engine issue, additive): the model's own critical point for a pure fluid
   * (exact for the cubics), or a pseudo-critical estimate for a mixture (a stated mixing rule). The
   * state layer uses it only to label phases ("vapor", "liquid", "supercritical").
   */
  pseudoCritical?(x: readonly number[]): PseudoCriticalPoint;
  /**
   * Optional: closed-form second composition derivatives of F = n alpha_r at constant T and V for
   * one mole (state/fugacity.ts says what each is); when absent they are taken by central
   * differences of dnA. Used by Newton steps of flashes, saturation points and envelopes.
   */
  compositionHessian?(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
  ): { readonly nFij: number[][]; readonly FiT: number[]; readonly rhoDdnA: number[] };
  /**
   * Optional: warnings for a state outside the model's validity range (empty when inside; the
   * empty list may be shared, so treat the result as read-only).
   */
  checkValidity?(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
  ): readonly ResultWarning[];
  /**
   * Optional: the model's pressure as a hyper-dual function, written independently of its
   * closed-form alpha_r (built-in models; the numeric departure route integrates it).
   */
  readonly pressureFunction?: HyperDualPressure;
  /**
   * Optional (models built from a pressure function, departure/pressureModel.ts): the residual
   * derivatives by integration, with error estimates and the evaluation count.
   */
  integrate?(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
    request?: ResidualRequest,
  ): IntegratedResidual;
  /**
   * Optional: the critical constants of the components, model order (built-in models with
   * corresponding-states parameters); the stability test starts from Wilson K-factors with them.
   */
  readonly components?: readonly ModelComponent[];
  /** Optional: the binary interaction parameters with their provenance (models with mixing rules). */
  readonly interactions?: InteractionMatrix;
  /** Optional (pure fluids, e.g. reference equations): saturation estimate at T, K. */
  saturationEstimate?(temperatureK: number): SaturationEstimate;
  /** Optional (pure fluids): the published critical point, K, mol/m3, Pa. */
  readonly critical?: {
    readonly temperatureK: number;
    readonly densityMolPerM3: number;
    readonly pressurePa: number;
  };
  /** Optional (pure fluids): the published triple point, K and Pa. */
  readonly triple?: { readonly temperatureK: number; readonly pressurePa: number };
  /**
   * Optional (models with a published range, e.g. reference equations): where (T, P) lies
   * relative to the range and its extrapolation range.
   */
  validityStatus?(temperatureK: number, pressurePa: number): ValidityStatus;
  /** Optional: the published range in words, for messages (with `validityStatus`). */
  readonly validityDescription?: string;
}
