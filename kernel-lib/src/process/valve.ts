/**
 * Throttling valve: an isenthalpic expansion (steady flow, adiabatic, no work, kinetic energy
 * change neglected: h_out = h_in). The outlet is the verified (P, h) flash (phase/flash/
 * stateFunctionFlash.ts), so it carries its phases and their amounts; the Joule-Thomson cooling
 * is T_in - T_out. The path is the (P, h) flash at pressures evenly spaced between inlet and
 * outlet (every point a real state of the isenthalp, for the P-h and T-s charts).
 */
import { InputError } from "../errors.js";
import type { StateFlashOptions } from "../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../phase/flash/types.js";
import { closeBalances } from "./balance.js";
import { streamEnthalpyJPerMol, streamFromEquilibrium, type Stream } from "./stream.js";
import { PROCESS_CAUTION, type StepResult } from "./types.js";
import {
  checkOptionalTemperature,
  describePhases,
  isLiquidPhase,
  liquidFraction,
  processWarning,
  temperatureWarnings,
} from "./warnings.js";

/** Specification of a {@link valve}. */
export interface ValveSpec {
  /** Outlet pressure, Pa (absolute), at most the inlet pressure. */
  readonly outletPressurePa: number;
  /** Warn when the outlet is colder than this, K. No default (0 degC is always checked). */
  readonly minimumDesignMetalTemperatureK?: number;
  /** States on the path, ends included (>= 2). Default 6. */
  readonly pathPoints?: number;
  /** Options of the (P, h) flashes. */
  readonly flash?: StateFlashOptions;
  /** Name of the outlet stream. Default "<inlet name> after valve". */
  readonly outletName?: string;
}

/** The result of a {@link valve}. */
export interface ValveResult extends StepResult {
  readonly kind: "valve";
  /** T_in - T_out, K (positive: Joule-Thomson cooling). */
  readonly temperatureDropK: number;
  /** Vapour mole fraction at the outlet. */
  readonly outletVaporFraction: number;
  /** Liquid leaving (all liquid phases), mol/s and kg/s. */
  readonly liquidMolarFlowMolPerS: number;
  readonly liquidMassFlowKgPerS: number;
}

/** Checks the inlet of a step. */
export function checkInlet(inlet: Stream, input = "inlet"): void {
  if (!(
    typeof inlet === "object" &&
    inlet !== null &&
    typeof inlet.molarFlowMolPerS === "number" &&
    inlet.state !== undefined
  )) {
    throw new InputError({
      input,
      unit: "-",
      validRange: "a stream from defineStream or a step's outlet",
      received: inlet,
    });
  }
}

/** Checks a count of path points (an integer >= 2). */
export function checkPathPoints(n: number, input = "pathPoints"): number {
  if (!(Number.isInteger(n) && n >= 2 && n <= 1000)) {
    throw new InputError({
      input,
      unit: "-",
      validRange: "an integer from 2 to 1000",
      received: n,
    });
  }
  return n;
}

/** Pressures from P1 to P2, n points, evenly spaced. */
export function pressuresBetween(P1: number, P2: number, n: number): number[] {
  return Array.from({ length: n }, (_, i) => (i === n - 1 ? P2 : P1 + ((P2 - P1) * i) / (n - 1)));
}

/**
 * Throttles a stream to a lower pressure at constant enthalpy.
 *
 * @example
 * ```ts
 * const r = valve(feed, { outletPressurePa: 6e5 });
 * r.outlet.state.temperatureK; // K
 * r.temperatureDropK; // Joule-Thomson cooling, K
 * ```
 * @throws InputError for an outlet pressure above the inlet's or not positive; SolverError when
 *   a flash or the energy balance fails.
 */
export function valve(inlet: Stream, spec: ValveSpec): ValveResult {
  checkInlet(inlet);
  const P1 = inlet.state.pressurePa;
  const P2 = spec.outletPressurePa;
  if (!(typeof P2 === "number" && P2 > 0 && P2 <= P1)) {
    throw new InputError({
      input: "outletPressurePa",
      unit: "Pa",
      validRange: `> 0 and at most the inlet pressure ${P1} Pa (a valve only lowers the pressure)`,
      received: P2,
    });
  }
  checkOptionalTemperature("minimumDesignMetalTemperatureK", spec.minimumDesignMetalTemperatureK);
  const n = checkPathPoints(spec.pathPoints ?? 6);
  const { fluid, z } = inlet;
  const h = streamEnthalpyJPerMol(inlet);
  const path: Equilibrium[] = [inlet.state];
  for (const P of pressuresBetween(P1, P2, n).slice(1)) {
    path.push(fluid.flashPH(P, h, z, spec.flash));
  }
  const outEq = path[path.length - 1];
  const outlet = streamFromEquilibrium(
    fluid,
    z,
    outEq,
    inlet.molarFlowMolPerS,
    spec.outletName ?? (inlet.name ? `${inlet.name} after valve` : "valve outlet"),
  );
  const check = closeBalances("valve", [inlet], [outlet], 0, 0);
  const liquid = liquidFraction(outEq);
  let liquidMass = 0;
  outEq.phases.forEach((p, i) => {
    if (isLiquidPhase(outEq, i)) liquidMass += p.amount * p.state.molarMassKgPerMol;
  });
  const warnings = [
    ...temperatureWarnings(outEq, "the valve outlet", spec.minimumDesignMetalTemperatureK),
  ];
  if (outEq.phases.length > 1) {
    warnings.push(
      processWarning(
        "two-phase-outlet",
        `the valve outlet is two-phase (${describePhases(outEq)}): ${(liquid * 100).toPrecision(3)} % of the moles leave as liquid`,
        "the (P, h) flash of the outlet found more than one phase; a two-phase outlet needs the downstream line and the valve trim sized for flashing flow (common practice, no source)",
      ),
    );
  }
  const T1 = inlet.state.temperatureK;
  const T2 = outEq.temperatureK;
  return {
    kind: "valve",
    inlets: [inlet],
    outlet,
    outlets: [outlet],
    powerW: 0,
    dutyW: 0,
    specificWorkJPerMol: 0,
    path,
    warnings,
    caution: PROCESS_CAUTION,
    method:
      `Isenthalpic throttling from ${P1} Pa to ${P2} Pa: steady flow, adiabatic, no work, change of kinetic energy neglected, so h_out = h_in = ${h.toPrecision(8)} J/mol. ` +
      `The outlet and ${n - 2} intermediate states are (P, h) flashes (outer search on T around the isothermal flash with stability tests, Michelsen 1987/1999) of ${fluid.model.info.name}; ` +
      `the outlet is ${describePhases(outEq)}. Energy balance closed to ${check.energyBalanceRelativeError.toExponential(2)} relative.`,
    check,
    temperatureDropK: T1 - T2,
    outletVaporFraction: 1 - liquid,
    liquidMolarFlowMolPerS: inlet.molarFlowMolPerS * liquid,
    liquidMassFlowKgPerS: inlet.molarFlowMolPerS * liquidMass,
  };
}
