/**
 * Expander or turbine on the real fluid: adiabatic expansion with an isentropic efficiency
 * (w = eta_s (h2s - h1), the isentropic exit by the (P, s) flash, the exit by the (P, h) flash)
 * or a polytropic efficiency (the exact path dh = eta_p v dP, polytropicPath.ts). A wet exit is
 * handled by the flashes: its vapour fraction (the quality of a pure fluid) and liquid flow are
 * reported and warned about. Power is negative: it leaves the fluid.
 */
import { InputError } from "../errors.js";
import { overallProperty, type StateFlashOptions } from "../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../phase/flash/types.js";
import { closeBalances } from "./balance.js";
import { oneEfficiency } from "./efficiency.js";
import {
  integratePolytropicPath,
  type PolytropicPath,
  type PolytropicPathOptions,
} from "./polytropicPath.js";
import { streamFromEquilibrium, type Stream } from "./stream.js";
import { PROCESS_CAUTION, type ProcessWarning, type StepResult } from "./types.js";
import { checkInlet } from "./valve.js";
import {
  checkOptionalTemperature,
  describePhases,
  isLiquidPhase,
  liquidFraction,
  processWarning,
  temperatureWarnings,
} from "./warnings.js";

/** Specification of a {@link turbine}. */
export interface TurbineSpec {
  /** Exit pressure, Pa (absolute), below the inlet pressure. */
  readonly outletPressurePa: number;
  /** Isentropic efficiency, 0 < eta <= 1. Give this or `polytropicEfficiency`. */
  readonly isentropicEfficiency?: number;
  /** Polytropic efficiency, 0 < eta <= 1 (the exact path is integrated). */
  readonly polytropicEfficiency?: number;
  /**
   * Warn when the exit vapour fraction is below this (erosion of the last blades by liquid).
   * Default 0.88 (common practice for condensing steam turbines, no source).
   */
  readonly minimumExitVaporFraction?: number;
  /** Warn when the exit is colder than this, K. */
  readonly minimumDesignMetalTemperatureK?: number;
  readonly polytropic?: PolytropicPathOptions;
  readonly flash?: StateFlashOptions;
  readonly outletName?: string;
}

/** The result of a {@link turbine}. */
export interface TurbineResult extends StepResult {
  readonly kind: "turbine";
  readonly efficiencyBasis: "isentropic" | "polytropic";
  /** Given, or implied: (h2 - h1) / (h2s - h1). */
  readonly isentropicEfficiency: number;
  readonly polytropicEfficiency?: number;
  readonly pressureRatio: number;
  readonly outletTemperatureK: number;
  readonly isentropicOutlet: Equilibrium;
  /** h1 - h2s, J/mol (positive: the isentropic enthalpy drop). */
  readonly isentropicEnthalpyDropJPerMol: number;
  /** Vapour mole fraction at the exit (the quality of a pure fluid, on a molar basis = mass basis). */
  readonly exitVaporFraction: number;
  readonly exitLiquidMolarFlowMolPerS: number;
  readonly exitLiquidMassFlowKgPerS: number;
  readonly polytropicPath?: PolytropicPath;
}

/**
 * Expands a stream through a turbine or expander.
 *
 * @example
 * ```ts
 * const r = turbine(steam, { outletPressurePa: 0.12e5, isentropicEfficiency: 0.78 });
 * -r.powerW!; // W delivered
 * r.exitVaporFraction; // quality
 * ```
 * @throws InputError for an efficiency outside (0, 1], an exit pressure not below the inlet's;
 *   SolverError when a flash or a balance fails.
 */
export function turbine(inlet: Stream, spec: TurbineSpec): TurbineResult {
  checkInlet(inlet);
  const { basis, eta } = oneEfficiency(spec);
  const P1 = inlet.state.pressurePa;
  const P2 = spec.outletPressurePa;
  if (!(typeof P2 === "number" && P2 > 0 && P2 < P1)) {
    throw new InputError({
      input: "outletPressurePa",
      unit: "Pa",
      validRange: `> 0 and below the inlet pressure ${P1} Pa (a turbine lowers the pressure)`,
      received: P2,
    });
  }
  const qMin = spec.minimumExitVaporFraction ?? 0.88;
  if (!(qMin >= 0 && qMin <= 1)) {
    throw new InputError({
      input: "minimumExitVaporFraction",
      unit: "-",
      validRange: "between 0 and 1",
      received: qMin,
    });
  }
  checkOptionalTemperature("minimumDesignMetalTemperatureK", spec.minimumDesignMetalTemperatureK);
  const { fluid, z } = inlet;
  const F = inlet.molarFlowMolPerS;
  const h1 = overallProperty(inlet.state, "h");
  const s1 = overallProperty(inlet.state, "s");
  const isentropicOutlet = fluid.flashPS(P2, s1, z, spec.flash);
  const h2s = overallProperty(isentropicOutlet, "h");
  let outEq: Equilibrium;
  let work: number;
  let path: readonly Equilibrium[];
  let poly: PolytropicPath | undefined;
  let methodText: string;
  if (basis === "isentropic") {
    work = eta * (h2s - h1);
    outEq = fluid.flashPH(P2, h1 + work, z, spec.flash);
    path = [inlet.state, outEq];
    methodText = `Isentropic efficiency ${eta}: isentropic exit by the (P, s) flash at ${P2} Pa and s1; w = eta_s (h2s - h1); exit by the (P, h) flash at h1 + w. The path holds the two ends only.`;
  } else {
    poly = integratePolytropicPath(fluid, z, inlet.state, P2, eta, {
      ...spec.polytropic,
      flash: spec.flash,
    });
    outEq = poly.outlet;
    path = poly.path;
    work = poly.enthalpyChangeJPerMol;
    methodText = `Polytropic efficiency ${eta}: the exact path dh = eta_p v dP, ${poly.method}. Isentropic exit by the (P, s) flash.`;
  }
  const outlet = streamFromEquilibrium(
    fluid,
    z,
    outEq,
    F,
    spec.outletName ?? (inlet.name ? `${inlet.name} expanded` : "turbine exit"),
  );
  const powerW = F * work;
  const check = closeBalances("turbine", [inlet], [outlet], powerW, 0);
  const liquid = liquidFraction(outEq);
  let liquidMass = 0;
  outEq.phases.forEach((p, i) => {
    if (isLiquidPhase(outEq, i)) liquidMass += p.amount * p.state.molarMassKgPerMol;
  });
  const warnings: ProcessWarning[] = [
    ...temperatureWarnings(outEq, "the turbine exit", spec.minimumDesignMetalTemperatureK),
  ];
  if (liquid > 0 && 1 - liquid < qMin) {
    warnings.push(
      processWarning(
        "wet-expander-exit",
        `the exit is wet: vapour fraction ${(1 - liquid).toPrecision(4)} (${describePhases(outEq)}), below ${qMin}`,
        `liquid at the exit erodes the last blades; the minimum exit vapour fraction ${qMin} (${spec.minimumExitVaporFraction === undefined ? "default: common practice for condensing steam turbines, no source" : "given by the caller"})`,
      ),
    );
  } else if (liquid > 0) {
    warnings.push(
      processWarning(
        "two-phase-outlet",
        `the exit is two-phase: ${describePhases(outEq)}`,
        "the flash of the exit found a liquid phase",
      ),
    );
  }
  return {
    kind: "turbine",
    inlets: [inlet],
    outlet,
    outlets: [outlet],
    powerW,
    specificWorkJPerMol: work,
    path,
    warnings,
    caution: PROCESS_CAUTION,
    method: `Adiabatic expansion from ${P1} Pa to ${P2} Pa on ${fluid.model.info.name}, steady flow, kinetic energy neglected. ${methodText} Power = molar flow x work, negative (out of the fluid); gas power only (no mechanical, gearbox or generator losses). Energy balance closed to ${check.energyBalanceRelativeError.toExponential(2)} relative.`,
    check,
    efficiencyBasis: basis,
    isentropicEfficiency: basis === "isentropic" ? eta : work / (h2s - h1),
    polytropicEfficiency: basis === "polytropic" ? eta : undefined,
    pressureRatio: P1 / P2,
    outletTemperatureK: outEq.temperatureK,
    isentropicOutlet,
    isentropicEnthalpyDropJPerMol: h1 - h2s,
    exitVaporFraction: 1 - liquid,
    exitLiquidMolarFlowMolPerS: F * liquid,
    exitLiquidMassFlowKgPerS: F * liquidMass,
    polytropicPath: poly,
  };
}
