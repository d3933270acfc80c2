/**
 * Types of the P-V-T route (departuresFromPvt.ts): its options, its result, its progress reports.
 */
import type { DepartureSet } from "./departureSet.js";
import type { FitVirialSurfaceOptions, VirialSurfaceFit } from "./fitVirialSurface.js";
import type { IsochoreFit, IsochoreFitOptions } from "./isochoreFit.js";
import type { BridgeOptions } from "./lowDensityBridge.js";
import type { PvtDiagnostic } from "./pvtDiagnostic.js";
import type { SetAsidePoint } from "./types.js";

/** Options of the P-V-T route (departuresFromPvt.ts); every one has a default. */
export interface PvtRouteOptions {
  /** "isochores", "surface", or "auto" (isochores when the data allow). Default "auto". */
  route?: "auto" | "isochores" | "surface";
  /** Isotherms to report, K. Default: the measured temperatures (clustered) that enough isochores cover. */
  isothermsK?: readonly number[];
  /** Temperatures closer than this are one isotherm, K. Default 0.05. */
  isothermToleranceK?: number;
  /** Relative density spread accepted within one isochore. Default 2e-3. */
  isochoreTolerance?: number;
  /** Fewest distinct temperatures for an isochore to be fitted. Default 3. */
  minIsochoreTemperatures?: number;
  /** Fewest nodes (isochores) on an isotherm. Default 3. */
  minIsothermNodes?: number;
  /**
   * Isochore route, stated u(P) only: a point whose residual on its isochore fit exceeds this many
   * effective standard uncertainties is set aside (worst first, one at a time, refitting; at most
   * 5 % of the points) and listed with the reason. Default 4.5 (a normal deviate beyond 4.5 has a
   * probability of 7e-6, so a genuine point is almost never set aside; common practice, no source).
   * Infinity turns the screening off.
   */
  outlierThreshold?: number;
  /**
   * Integrate across a density gap where a measured isochore does not cover the isotherm's
   * temperature. Default false: such a gap is where an isochoric campaign usually meets the
   * two-phase region (the fluid could not be measured there as one phase), so the isotherm stops
   * before it, with a refusal that says so.
   */
  integrateAcrossGaps?: boolean;
  /**
   * Critical temperature of the fluid, K, when known (the CLI takes it from --component): below it,
   * a warning reminds that a dome between two nodes with no isochore in between cannot be seen.
   */
  criticalTemperatureK?: number;
  isochore?: IsochoreFitOptions;
  surface?: FitVirialSurfaceOptions;
  bridge?: BridgeOptions;
  /** Monte Carlo samples (0 to skip). Default 200. */
  monteCarloSamples?: number;
  /** Seed of the Monte Carlo generator (reported in the result). Default 20261201. */
  seed?: number;
  /** Also compute the linearised estimate. Default true. */
  linearised?: boolean;
  /** Gas constant, J/(mol K). Default CODATA 2018 (constants.ts). */
  gasConstant?: number;
  /**
   * Called as the analysis advances (browser-safe: a plain callback). The Node side shows it with
   * the progress module (`stagedProgress()` of progress/, as `isochor pvt` does). Default: none.
   * @example departuresFromPvt(data, { onProgress: (p) => console.log(p.stage, p.done, p.total) })
   */
  onProgress?: (progress: PvtRouteProgress) => void;
}

/** Where the analysis is: the stage and how far it got within it. */
export interface PvtRouteProgress {
  /** The stage, in the order they run. */
  stage: PvtRouteStage;
  /** Items done within the stage. */
  done: number;
  /** Items in the stage. */
  total: number;
  /** Name of the items, e.g. "isochores", "samples". */
  unit: string;
}

/** Stages of the route (see departuresFromPvt.ts). */
export type PvtRouteStage =
  "surface fit" | "outlier screen" | "isochore fits" | "isotherms" | "Monte Carlo" | "linearised";

/** One state on an isotherm: smoothed pressure, departures and their standard uncertainties. */
export interface PvtState {
  densityMolPerM3: number;
  /** Smoothed pressure at (T, rho), Pa. */
  pressurePa: number;
  residual: DepartureSet;
  /** Combined standard uncertainty: propagated (Monte Carlo, or linearised if MC is off) and the method estimate. */
  uncertainty: DepartureSet;
  monteCarlo?: DepartureSet;
  linearised?: DepartureSet;
  /**
   * Method error estimate: quadrature + low-density-bridge truncation (isochore route) and the
   * change of the result when every fit order is raised by one, on the surface route always (a
   * truncated global expansion is its main systematic risk; without it the coverage test of the
   * surface route gave 86 % for nominal 95 %) and on the isochore route when no u(P) was stated
   * (the scatter then measures the fit's own misfit, whose effect on slopes is systematic).
   */
  method: DepartureSet;
}

/** One reported isotherm: its states, B and C, and (isochore route) the low-density bridge. */
export interface PvtIsotherm {
  temperatureK: number;
  states: PvtState[];
  /** Second virial coefficient, m3/mol, and its standard uncertainty. */
  B: number;
  uB: number;
  /** Third virial coefficient, m6/mol2, where the data allow. */
  C?: number;
  uC?: number;
  /** Isochore route: the bridge from zero density to the first node. */
  bridge?: {
    toDensityMolPerM3: number;
    aJPerMol: number;
    uAJPerMol: number;
    sJPerMolK: number;
    uSJPerMolK: number;
    degree: number;
  };
}

/** Result of {@link departuresFromPvt}: isotherms, the fits behind them, diagnostics. */
export interface PvtRouteResult {
  route: "isochores" | "surface";
  isotherms: PvtIsotherm[];
  surfaceFit: VirialSurfaceFit;
  isochoreFits: IsochoreFit[];
  diagnostics: PvtDiagnostic[];
  setAside: SetAsidePoint[];
  uncertaintyMethod: {
    monteCarlo?: { seed: number; samples: number };
    linearised: boolean;
    sigmaSource: "stated" | "from-scatter";
  };
  gasConstant: number;
}
