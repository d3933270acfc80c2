/**
 * Heater and cooler: a stream brought to an outlet temperature, or given a duty, at an outlet
 * pressure (default: the inlet's). Steady-flow energy balance without work, kinetic or potential
 * energy: Q = F (h_out - h_in). The outlet is a flash at (T, P) (phase/flash/flashTP.ts) or at
 * (P, h_in + Q / F) (stateFunctionFlash.ts), so its phases come from the stability test; the
 * heat curve along the path (heatCurve.ts) carries the exact bubble and dew points.
 */
import { InputError, type ResultWarning } from "../errors.js";
import type { Equilibrium } from "../phase/flash/types.js";
import { overallProperty, type StateFlashOptions } from "../phase/flash/stateFunctionFlash.js";
import { requireFinite, requirePositive } from "../validate.js";
import { closeBalances } from "./balance.js";
import { heatCurve, type HeatCurve, type HeatCurveOptions } from "./heatCurve.js";
import { requirePositiveFlow, requireSpecObject, temperatureWarnings } from "./warnings.js";
import { streamEnthalpyJPerMol, streamFromEquilibrium, type Stream } from "./stream.js";
import { PROCESS_CAUTION, type StepResult } from "./types.js";

/** Specification of {@link heater} and {@link cooler}: the outlet temperature OR the duty. */
export interface HeaterSpec {
  /** Outlet temperature, K. Give this or `dutyW`. */
  outletTemperatureK?: number;
  /** Heat into the fluid, W (negative for a cooler). Give this or `outletTemperatureK`. */
  dutyW?: number;
  /** Outlet pressure, Pa. Default: the inlet pressure (no pressure drop). */
  outletPressurePa?: number;
  /** Minimum design metal temperature, K: an outlet below it is warned. Default: none. */
  minimumDesignMetalTemperatureK?: number;
  /** Name of the outlet stream. Default: "<inlet name> out" or "outlet". */
  name?: string;
  /** Options of the heat curve (number of intervals, marker tolerance). */
  heatCurve?: HeatCurveOptions;
  /** Options of the (P, h) flashes. */
  flash?: StateFlashOptions;
}

/** Result of a heater or cooler. */
export interface HeaterResult extends StepResult {
  readonly kind: "heater" | "cooler";
  /** Heat into the fluid, W (negative for a cooler). */
  readonly dutyW: number;
  /** T against duty along the path, with the exact bubble and dew points. */
  readonly heatCurve: HeatCurve;
}

/**
 * A heater: the inlet heated to `outletTemperatureK`, or by `dutyW` (> 0).
 * @example heater(feed, { outletTemperatureK: 420, outletPressurePa: 19.5e5 }).dutyW
 */
export function heater(inlet: Stream, spec: HeaterSpec): HeaterResult {
  return heatStep("heater", inlet, spec);
}

/**
 * A cooler: the inlet cooled to `outletTemperatureK`, or by `dutyW` (< 0, heat into the fluid).
 * @example cooler(discharge, { outletTemperatureK: 313.15 }).heatCurve.saturationPoints
 */
export function cooler(inlet: Stream, spec: HeaterSpec): HeaterResult {
  return heatStep("cooler", inlet, spec);
}

function heatStep(kind: "heater" | "cooler", inlet: Stream, spec: HeaterSpec): HeaterResult {
  requireSpecObject(spec, "{ outletTemperatureK } or { dutyW }, with optional outletPressurePa");
  const hasT = spec.outletTemperatureK !== undefined;
  const hasQ = spec.dutyW !== undefined;
  if (hasT === hasQ) {
    throw new InputError({
      input: "spec",
      unit: "-",
      validRange: "exactly one of outletTemperatureK (K) and dutyW (W)",
      received: spec,
    });
  }
  const F = inlet.molarFlowMolPerS;
  requirePositiveFlow("inlet.molarFlowMolPerS", F, "> 0 (a heater needs a flow)");
  const fluid = inlet.fluid;
  const z = inlet.z;
  const P =
    spec.outletPressurePa === undefined
      ? inlet.state.pressurePa
      : requirePositive("spec.outletPressurePa", spec.outletPressurePa, "Pa");
  const mdmt =
    spec.minimumDesignMetalTemperatureK === undefined
      ? undefined
      : requirePositive(
          "spec.minimumDesignMetalTemperatureK",
          spec.minimumDesignMetalTemperatureK,
          "K",
        );
  const hIn = streamEnthalpyJPerMol(inlet);
  let outletEq: Equilibrium;
  let duty: number;
  if (hasT) {
    const T = requirePositive("spec.outletTemperatureK", spec.outletTemperatureK as number, "K");
    outletEq = fluid.flashTP(T, P, z);
    duty = F * (overallProperty(outletEq, "h") - hIn);
  } else {
    duty = requireFinite("spec.dutyW", spec.dutyW as number, "W");
    outletEq = fluid.flashPH(P, hIn + duty / F, z, {
      initialGuessK: inlet.state.temperatureK,
      ...spec.flash,
    });
  }
  if (kind === "heater" ? duty < 0 : duty > 0) {
    throw new InputError({
      input: hasT ? "spec.outletTemperatureK" : "spec.dutyW",
      unit: hasT ? "K" : "W",
      validRange:
        kind === "heater"
          ? "a specification that adds heat (duty >= 0); use cooler() to remove heat"
          : "a specification that removes heat (duty <= 0, heat into the fluid negative); use heater() to add heat",
      received: hasT ? spec.outletTemperatureK : spec.dutyW,
    });
  }
  const name = spec.name ?? (inlet.name !== undefined ? `${inlet.name} out` : "outlet");
  const outlet = streamFromEquilibrium(fluid, z, outletEq, F, name);
  const check = closeBalances(kind, [inlet], [outlet], 0, duty);
  const curve = heatCurve(fluid, z, inlet.state, outletEq, F, spec.heatCurve);
  const warnings: ResultWarning[] = [
    ...temperatureWarnings(outletEq, `${kind} outlet`, mdmt),
    ...curve.warnings,
    ...outletEq.warnings,
  ];
  const marks = curve.saturationPoints
    .map((m) => `${m.kind} point at ${m.temperatureK.toFixed(3)} K`)
    .join(", ");
  const method =
    `Steady-flow energy balance without work, kinetic or potential energy, Q = F (h_out - h_in). ` +
    (hasT
      ? `Outlet: isothermal flash at the outlet T and P (stability test, then substitution and Newton). `
      : `Outlet: flash at the outlet P and h_in + Q/F (outer search on T around isothermal flashes, Michelsen 1987). `) +
    `Heat curve: (P, h) flashes at ${curve.path.length} points, the enthalpy linear in the duty and the pressure falling linearly with the duty from inlet to outlet; ` +
    `bubble and dew points located exactly with the saturation functions${marks ? ` (${marks})` : " (none crossed)"}. ` +
    `Energy balance closed to ${check.energyBalanceRelativeError.toExponential(1)} relative.`;
  return {
    kind,
    inlets: [inlet],
    outlet,
    outlets: [outlet],
    dutyW: duty,
    path: curve.path,
    warnings,
    caution: PROCESS_CAUTION,
    method,
    check,
    heatCurve: curve,
  };
}
