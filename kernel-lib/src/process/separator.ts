/**
 * Separator (flash drum, knock-out drum, three-phase separator): the inlet flashed at a given T
 * and P (phase/flash/flashTP.ts), or adiabatically at a given P (flash at (P, h_in),
 * stateFunctionFlash.ts), each equilibrium phase leaving as its own stream: the vapour, the
 * liquid and the second (denser) liquid. Ideal separation (no entrainment, no carry-under).
 *
 * Balances: each outlet's flow is F beta_k and its composition the phase's x_k, so
 * sum_k F beta_k x_ik = F z_i to the flash's verified material balance (1e-12); the duty is
 * Q = sum_k F beta_k h_k - F h_in (0 for the adiabatic drum, to the flash's tolerance).
 */
import type { ResultWarning } from "../errors.js";
import type { Equilibrium, EquilibriumPhase } from "../phase/flash/types.js";
import { overallProperty, type StateFlashOptions } from "../phase/flash/stateFunctionFlash.js";
import { requirePositive } from "../validate.js";
import { closeBalances } from "./balance.js";
import { requirePositiveFlow, requireSpecObject, temperatureWarnings } from "./warnings.js";
import { streamEnthalpyJPerMol, streamFromEquilibrium, type Stream } from "./stream.js";
import { PROCESS_CAUTION, type StepResult } from "./types.js";

/** Specification of {@link separator}. */
export interface SeparatorSpec {
  /** Drum temperature, K. Default: adiabatic (the flash at the drum P and the inlet's h). */
  temperatureK?: number;
  /** Drum pressure, Pa. Default: the inlet pressure. */
  pressurePa?: number;
  /** Minimum design metal temperature, K: a drum below it is warned. */
  minimumDesignMetalTemperatureK?: number;
  /** Prefix of the outlet names. Default: the inlet's name or "separator". */
  name?: string;
  /** Options of the flash. */
  flash?: StateFlashOptions;
}

/** Result of {@link separator}. */
export interface SeparatorResult extends StepResult {
  readonly kind: "separator";
  /** Heat into the drum, W (0 when adiabatic). */
  readonly dutyW: number;
  /** The equilibrium in the drum. */
  readonly equilibrium: Equilibrium;
  /** The outlets by phase; undefined where the phase is absent. */
  readonly vapor?: Stream;
  readonly liquid?: Stream;
  readonly liquid2?: Stream;
  /** max_i |sum_k F_k x_ik - F z_i| / F over the components, mol/mol. */
  readonly materialBalanceError: number;
  /** |sum_k m_k - m_in| / m_in, kg/kg. */
  readonly massBalanceRelativeError: number;
}

/** A one-phase equilibrium of one phase of a drum (the outlet stream's state). */
function phaseEquilibrium(eq: Equilibrium, p: EquilibriumPhase): Equilibrium {
  return {
    temperatureK: eq.temperatureK,
    pressurePa: eq.pressurePa,
    z: p.state.x.slice(),
    phases: [{ kind: p.kind, amount: 1, state: p.state }],
    check: {
      maxLnFugacityDifference: 0,
      gibbsChangeOverRT: 0,
      materialBalanceError: 0,
      iterations: 0,
      method: `the ${p.kind} phase of a verified separator flash (${eq.check.method})`,
    },
    model: eq.model,
    warnings: [],
  };
}

/**
 * Separates a stream into its equilibrium phases at (T, P), or adiabatically at P.
 * @example separator(cooled, { pressurePa: 30e5 }).liquid?.molarFlowMolPerS
 */
export function separator(inlet: Stream, spec: SeparatorSpec = {}): SeparatorResult {
  requireSpecObject(spec, "{ temperatureK?, pressurePa? }");
  const F = inlet.molarFlowMolPerS;
  requirePositiveFlow("inlet.molarFlowMolPerS", F);
  const fluid = inlet.fluid;
  const z = inlet.z;
  const P =
    spec.pressurePa === undefined
      ? inlet.state.pressurePa
      : requirePositive("spec.pressurePa", spec.pressurePa, "Pa");
  const hIn = streamEnthalpyJPerMol(inlet);
  const adiabatic = spec.temperatureK === undefined;
  const eq = adiabatic
    ? fluid.flashPH(P, hIn, z, { initialGuessK: inlet.state.temperatureK, ...spec.flash })
    : fluid.flashTP(requirePositive("spec.temperatureK", spec.temperatureK as number, "K"), P, z);
  const duty = adiabatic ? 0 : F * (overallProperty(eq, "h") - hIn);
  const prefix = spec.name ?? inlet.name ?? "separator";
  const byKind: Partial<Record<EquilibriumPhase["kind"], Stream>> = {};
  const outlets: Stream[] = [];
  for (const p of eq.phases) {
    const s = streamFromEquilibrium(
      fluid,
      p.state.x,
      phaseEquilibrium(eq, p),
      F * p.amount,
      `${prefix} ${p.kind === "liquid-2" ? "second liquid" : p.kind === "vapor" ? "vapour" : "liquid"}`,
    );
    byKind[p.kind] = s;
    outlets.push(s);
  }
  // material balance per component, and in kg
  let worst = 0;
  for (let i = 0; i < z.length; i++) {
    let sum = 0;
    for (const s of outlets) sum += s.molarFlowMolPerS * s.z[i];
    worst = Math.max(worst, Math.abs(sum - F * z[i]) / F);
  }
  let massOut = 0;
  for (const s of outlets) massOut += s.molarFlowMolPerS * s.molarMassKgPerMol;
  const massIn = F * inlet.molarMassKgPerMol;
  const massRel = Math.abs(massOut - massIn) / massIn;
  // an adiabatic drum's duty is the flash's residual on h: check it as zero duty
  const check = closeBalances("separator", [inlet], outlets, 0, duty);
  const mdmt =
    spec.minimumDesignMetalTemperatureK === undefined
      ? undefined
      : requirePositive(
          "spec.minimumDesignMetalTemperatureK",
          spec.minimumDesignMetalTemperatureK,
          "K",
        );
  const warnings: ResultWarning[] = [...temperatureWarnings(eq, "separator", mdmt), ...eq.warnings];
  const method =
    (adiabatic
      ? "Adiabatic separator: flash at the drum P and the inlet enthalpy (outer search on T around isothermal flashes, Michelsen 1987). "
      : "Separator at the given T and P: isothermal flash with stability tests (phases found, not assumed). ") +
    `Each phase leaves as its own stream (${eq.phases.map((p) => p.kind).join(", ")}); ideal separation, no entrainment. ` +
    `Material balance ${worst.toExponential(1)} mol/mol, mass ${massRel.toExponential(1)} kg/kg, energy ${check.energyBalanceRelativeError.toExponential(1)} relative.`;
  const main = byKind.vapor ?? outlets[0];
  return {
    kind: "separator",
    inlets: [inlet],
    outlet: main,
    outlets,
    dutyW: duty,
    path: [inlet.state, eq],
    warnings,
    caution: PROCESS_CAUTION,
    method,
    check,
    equilibrium: eq,
    vapor: byKind.vapor,
    liquid: byKind.liquid,
    liquid2: byKind["liquid-2"],
    materialBalanceError: worst,
    massBalanceRelativeError: massRel,
  };
}
