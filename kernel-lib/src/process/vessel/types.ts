/**
 * The input and result shapes of the vessel depressurisation and filling model
 * (simulateVessel.ts). SI throughout: K, Pa, m, m3, kg, mol, J, W, s.
 */
import type { ResultWarning } from "../../errors.js";
import type { ModelInfo } from "../../eos/types.js";
import type { Fluid } from "../../fluid/defineFluid.js";
import type { FluidState } from "../../state/types.js";
import type { FlashOptions } from "../../phase/flash/flashTP.js";
import type { VesselShape } from "./geometry.js";
import type { ContentsTransport } from "./heatTransfer.js";

/** The wall as one lump of metal at one temperature. */
export interface WallSpec {
  /** Wall thickness, m (with the inner area and the density gives the mass). */
  readonly thicknessM: number;
  /** Metal density, kg/m3. Default 7850 (carbon steel, common practice, no source). */
  readonly densityKgPerM3?: number;
  /** Metal specific heat capacity, J/(kg K). Default 470 (carbon steel near 300 K, common practice, no source). */
  readonly heatCapacityJPerKgK?: number;
  /** Wall mass, kg, overriding thickness x area x density (e.g. with nozzles and supports). */
  readonly massKg?: number;
}

/** The initial contents: one phase at (T, P), or a gas over a liquid layer. */
export type InitialContents =
  | {
      readonly temperatureK: number;
      readonly pressurePa: number;
      /** Mole fractions (omit for a pure fluid). */
      readonly z?: readonly number[];
    }
  | {
      readonly temperatureK: number;
      readonly pressurePa: number;
      /** The gas above the liquid: its mole fractions. */
      readonly vapor: { readonly y: readonly number[] };
      /** The liquid layer: its mole fractions and its level above the bottom, m. */
      readonly liquid: { readonly x: readonly number[]; readonly levelM: number };
    };

/** An orifice or valve on the vessel. */
export interface OutletSpec {
  /** Orifice (or valve equivalent) diameter, m. */
  readonly diameterM: number;
  /** Discharge coefficient, 0 < Cd <= 1. */
  readonly dischargeCoefficient: number;
  /** Pressure downstream, Pa. Default 101325. */
  readonly backPressurePa?: number;
  /**
   * What leaves: "vapor" (an outlet at the top: the vapour phase; the liquid when there is no
   * vapour), "liquid" (at the bottom: the densest phase) or "mixture" (the contents as a whole).
   * Default "vapor".
   */
  readonly draws?: "vapor" | "liquid" | "mixture";
}

/** A supply that fills the vessel through an orifice (filling: the same machinery reversed). */
export interface SupplySpec {
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Supply mole fractions (omit for a pure fluid). */
  readonly z?: readonly number[];
  readonly diameterM: number;
  readonly dischargeCoefficient: number;
}

/** Heat exchange through a lumped wall. */
export interface WallHeatSpec {
  readonly kind: "wall";
  /**
   * Inside: "natural-convection" (default; the correlations of heatTransfer.ts with the
   * contents' transport properties, gas and liquid wetted areas separately) or a given
   * coefficient, W/(m2 K).
   */
  readonly inside?: "natural-convection" | { readonly coefficientWPerM2K: number };
  /**
   * Outside: still air at ambient temperature (natural convection), a given coefficient and
   * ambient temperature, a given heat flux into the wall (W/m2 of the wetted-by-flux area: the
   * whole outer surface) with the basis the user names (e.g. the fire heat input formula of the
   * applicable standard, stated by the user), or insulated.
   */
  readonly outside:
    | { readonly kind: "air"; readonly ambientK: number }
    | {
        readonly kind: "coefficient";
        readonly coefficientWPerM2K: number;
        readonly ambientK: number;
      }
    | { readonly kind: "heat-flux"; readonly fluxWPerM2: number; readonly basis: string }
    | { readonly kind: "insulated" };
  /**
   * Viscosity and thermal conductivity of a single-phase state of the contents (needed for
   * natural convection inside). Default: the fluid's own `transportOfState` (transport/: Chung
   * et al. 1988, or the IAPWS releases for water).
   */
  readonly transport?: (state: FluidState) => ContentsTransport;
}

/** When to stop (the first reached). At least one of pressurePa and timeS. */
export interface UntilSpec {
  /** Target pressure, Pa (the user's choice: no default depressuring target is assumed). */
  readonly pressurePa?: number;
  /** Time, s. */
  readonly timeS?: number;
}

/** Progress of a long run. */
export interface VesselProgress {
  readonly timeS: number;
  readonly pressurePa: number;
  readonly steps: number;
  /** Fraction done, 0-1, by pressure (toward the target) or time, whichever is further. */
  readonly fraction: number;
}

/** Everything {@link simulateVessel} needs. */
export interface VesselSpec {
  readonly fluid: Fluid;
  readonly shape: VesselShape;
  /** The wall (needed for heat exchange; optional when adiabatic). */
  readonly wall?: WallSpec;
  readonly initial: InitialContents;
  /** Outlets (depressurisation). */
  readonly outlets?: readonly OutletSpec[];
  /** A supply (filling). */
  readonly supply?: SupplySpec;
  /** "adiabatic" (default) or a lumped wall. */
  readonly heat?: "adiabatic" | WallHeatSpec;
  readonly until: UntilSpec;
  /** Minimum design metal temperature, K: compared with the minimum temperatures in the result. */
  readonly minimumDesignMetalTemperatureK?: number;
}

/** Options of {@link simulateVessel}. */
export interface VesselOptions {
  /**
   * Relative tolerance of the integrator (Dormand-Prince). Default 1e-6 (the ten-component
   * blowdown of the bench: time to target within 2e-7 and minimum T within 1e-4 K of 1e-7).
   */
  relativeTolerance?: number;
  /** Longest run time when no time is given, s. Default 1e6. */
  maxTimeS?: number;
  /** Most integration steps. Default 20000. */
  maxSteps?: number;
  /** Called after each accepted step. */
  onProgress?: (p: VesselProgress) => void;
  /**
   * Options of every phase-equilibrium calculation of the run (flashTP, flashPS, flashUV), e.g.
   * `{ extraTrials: "none" }` for Wilson starts only in the stability tests (faster; a second
   * liquid that Wilson's K-factors miss is then possible: not for water-rich contents).
   */
  flash?: FlashOptions;
}

/** The time series of a run (one entry per accepted step). */
export interface VesselSeries {
  readonly timeS: readonly number[];
  readonly pressurePa: readonly number[];
  /** Contents temperature (all phases at one temperature), K. */
  readonly temperatureK: readonly number[];
  /**
   * Wall temperature, K. Absent for an adiabatic run: the wall is not modelled there (see
   * VesselResult.wallModelled), and no wall temperature is reported.
   */
  readonly wallTemperatureK?: readonly number[];
  /** Mass of the contents, kg. */
  readonly massKg: readonly number[];
  /** Net mass flow out (negative when filling), kg/s. */
  readonly massFlowKgPerS: readonly number[];
  /** Molar fraction of the contents in liquid phases, mol/mol. */
  readonly liquidFraction: readonly number[];
  /** Liquid volume, m3. */
  readonly liquidVolumeM3: readonly number[];
  /** Number of phases of the contents. */
  readonly phaseCount: readonly number[];
  /** Is the (first) outlet choked. */
  readonly choked: readonly boolean[];
}

/** Result of {@link simulateVessel}. */
export interface VesselResult {
  readonly kind: "depressurisation" | "filling";
  readonly series: VesselSeries;
  readonly minimum: {
    readonly temperatureK: number;
    readonly timeS: number;
    /** The coldest wall temperature, K, and when (absent for an adiabatic run). */
    readonly wallTemperatureK?: number;
    readonly wallTimeS?: number;
  };
  /**
   * True when the wall is modelled (a lumped wall exchanging heat); false for an adiabatic run,
   * where the series and the minimum carry no wall temperature.
   */
  readonly wallModelled: boolean;
  readonly maximum: { readonly temperatureK: number; readonly timeS: number };
  /** Time to the target pressure, s (undefined when not reached). */
  readonly timeToTargetS?: number;
  readonly stoppedBecause: "target-pressure" | "time" | "equalised" | "empty";
  /** Net mass out (negative when filled), kg. */
  readonly massReleasedKg: number;
  /** Closure of the balances at the end, from the final equilibrium state. */
  readonly balance: {
    /** |m_contents + m_out - m_0| / m_0 */
    readonly massRelativeError: number;
    /** |U + U_wall + H_out - Q_ext - E_0| / scale */
    readonly energyRelativeError: number;
    /** The scale of the energy error: max(|U_0|, |H_out|, |Q_ext|), J. */
    readonly energyScaleJ: number;
  };
  /** Phase changes of the contents (time, phases before and after, what it means). */
  readonly phaseChanges: readonly { timeS: number; from: number; to: number; note: string }[];
  readonly volumeM3: number;
  readonly wallMassKg?: number;
  readonly minimumDesignMetalTemperatureK?: number;
  /** Prominent cautions: read them. */
  readonly cautions: readonly string[];
  /** What the model leaves out. */
  readonly notModelled: readonly string[];
  readonly warnings: readonly ResultWarning[];
  readonly model: ModelInfo;
  readonly integration: {
    readonly method: string;
    readonly acceptedSteps: number;
    readonly rejectedSteps: number;
    readonly evaluations: number;
    readonly relativeTolerance: number;
  };
}
