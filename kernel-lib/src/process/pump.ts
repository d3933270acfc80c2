/**
 * Pump: adiabatic compression of a liquid with an isentropic (hydraulic) efficiency: the
 * isentropic discharge by the (P, s) flash, w = (h2s - h1) / eta, the discharge by the (P, h)
 * flash at h1 + w. The rise in temperature comes from the real fluid, not from an assumed
 * incompressible liquid. The inlet must be liquid (one liquid phase): a pump fed with vapour or
 * a two-phase stream is refused.
 */
import { InputError } from "../errors.js";
import { STANDARD_GRAVITY } from "../units/unitTable.js";
import { overallProperty, type StateFlashOptions } from "../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../phase/flash/types.js";
import { closeBalances } from "./balance.js";
import { checkEfficiency } from "./efficiency.js";
import { streamFromEquilibrium, type Stream } from "./stream.js";
import { PROCESS_CAUTION, type ProcessWarning, type StepResult } from "./types.js";
import { checkInlet } from "./valve.js";
import {
  checkOptionalTemperature,
  describePhases,
  isLiquidPhase,
  temperatureWarnings,
} from "./warnings.js";

/** Specification of a {@link pump}. */
export interface PumpSpec {
  /** Discharge pressure, Pa (absolute), above the suction pressure. */
  readonly outletPressurePa: number;
  /** Efficiency (isentropic, hydraulic), 0 < eta <= 1. */
  readonly efficiency: number;
  readonly minimumDesignMetalTemperatureK?: number;
  readonly flash?: StateFlashOptions;
  readonly outletName?: string;
}

/** The result of a {@link pump}. */
export interface PumpResult extends StepResult {
  readonly kind: "pump";
  readonly efficiency: number;
  /** T_out - T_in, K. */
  readonly temperatureRiseK: number;
  /** (P2 - P1) / (rho_in g), m of liquid at the suction density (g = 9.80665 m/s2). */
  readonly differentialHeadM: number;
  readonly isentropicOutlet: Equilibrium;
}

/**
 * Pumps a liquid stream to a higher pressure.
 *
 * @example
 * ```ts
 * const r = pump(condensate, { outletPressurePa: 45e5, efficiency: 0.7 });
 * r.powerW; r.temperatureRiseK;
 * ```
 * @throws InputError for an inlet that is not one liquid phase, an efficiency outside (0, 1], a
 *   discharge pressure not above the suction; SolverError when a flash or a balance fails.
 */
export function pump(inlet: Stream, spec: PumpSpec): PumpResult {
  checkInlet(inlet);
  const eta = checkEfficiency("efficiency", spec.efficiency);
  const eq = inlet.state;
  if (!(eq.phases.length === 1 && isLiquidPhase(eq, 0))) {
    throw new InputError({
      input: "inlet",
      unit: "-",
      validRange: "a liquid stream (one liquid phase at the suction)",
      received: `${inlet.name ?? "a stream"} that is ${describePhases(eq)} at ${eq.temperatureK} K, ${eq.pressurePa} Pa`,
      hint: "a pump is fed with liquid; compress a vapour with compressorStage, or cool the stream below its bubble point first",
    });
  }
  const P1 = eq.pressurePa;
  const P2 = spec.outletPressurePa;
  if (!(typeof P2 === "number" && P2 > P1 && P2 < Infinity)) {
    throw new InputError({
      input: "outletPressurePa",
      unit: "Pa",
      validRange: `above the suction pressure ${P1} Pa`,
      received: P2,
    });
  }
  checkOptionalTemperature("minimumDesignMetalTemperatureK", spec.minimumDesignMetalTemperatureK);
  const { fluid, z } = inlet;
  const F = inlet.molarFlowMolPerS;
  const h1 = overallProperty(eq, "h");
  const s1 = overallProperty(eq, "s");
  const isentropicOutlet = fluid.flashPS(P2, s1, z, spec.flash);
  const work = (overallProperty(isentropicOutlet, "h") - h1) / eta;
  const outEq = fluid.flashPH(P2, h1 + work, z, spec.flash);
  const outlet = streamFromEquilibrium(
    fluid,
    z,
    outEq,
    F,
    spec.outletName ?? (inlet.name ? `${inlet.name} pumped` : "pump discharge"),
  );
  const powerW = F * work;
  const check = closeBalances("pump", [inlet], [outlet], powerW, 0);
  const warnings: ProcessWarning[] = temperatureWarnings(
    eq.temperatureK < outEq.temperatureK ? eq : outEq,
    "the pump",
    spec.minimumDesignMetalTemperatureK,
  );
  const rhoMass = eq.phases[0].state.densityKgPerM3;
  return {
    kind: "pump",
    inlets: [inlet],
    outlet,
    outlets: [outlet],
    powerW,
    specificWorkJPerMol: work,
    path: [eq, outEq],
    warnings,
    caution: PROCESS_CAUTION,
    method: `Adiabatic pump from ${P1} Pa to ${P2} Pa on ${fluid.model.info.name}, efficiency ${eta}: isentropic discharge by the (P, s) flash, w = (h2s - h1) / eta, discharge by the (P, h) flash at h1 + w (the liquid's compressibility and thermal expansion are in the model). Power is the fluid power (no motor or coupling losses); NPSH is not checked. Energy balance closed to ${check.energyBalanceRelativeError.toExponential(2)} relative.`,
    check,
    efficiency: eta,
    temperatureRiseK: outEq.temperatureK - eq.temperatureK,
    differentialHeadM: (P2 - P1) / (rhoMass * STANDARD_GRAVITY),
    isentropicOutlet,
  };
}
