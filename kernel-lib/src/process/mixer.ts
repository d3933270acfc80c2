/**
 * Adiabatic mixer: streams of one fluid joined at the lowest inlet pressure (or a given lower
 * one). Steady flow, no heat, no work:
 *   F = sum F_i,  F z = sum F_i z_i,  F h_out = sum F_i h_i,
 * and the outlet is the flash at (P_out, h_out) (phase/flash/stateFunctionFlash.ts), so its
 * phases come from the stability test.
 */
import { InputError, type ResultWarning } from "../errors.js";
import type { StateFlashOptions } from "../phase/flash/stateFunctionFlash.js";
import { requirePositive } from "../validate.js";
import { closeBalances } from "./balance.js";
import { temperatureWarnings } from "./warnings.js";
import { streamEnthalpyJPerMol, streamFromEquilibrium, type Stream } from "./stream.js";
import { PROCESS_CAUTION, type StepResult } from "./types.js";

/** Options of {@link mixer}. */
export interface MixerSpec {
  /** Outlet pressure, Pa, at most the lowest inlet pressure. Default: the lowest inlet pressure. */
  outletPressurePa?: number;
  /** Minimum design metal temperature, K: an outlet below it is warned. */
  minimumDesignMetalTemperatureK?: number;
  /** Name of the outlet stream. Default "mixed". */
  name?: string;
  /** Options of the (P, h) flash. */
  flash?: StateFlashOptions;
}

/** Result of {@link mixer}. */
export interface MixerResult extends StepResult {
  readonly kind: "mixer";
  readonly dutyW: 0;
}

/**
 * Mixes streams of one fluid adiabatically.
 * @example mixer([fuelGasA, fuelGasB]).outlet.state.temperatureK
 */
export function mixer(inlets: readonly Stream[], spec: MixerSpec = {}): MixerResult {
  if (!(Array.isArray(inlets) && inlets.length >= 1)) {
    throw new InputError({
      input: "inlets",
      unit: "-",
      validRange: "a list of at least one stream",
      received: inlets,
    });
  }
  const fluid = inlets[0].fluid;
  const ids = fluid.componentIds.join(",");
  inlets.forEach((s, i) => {
    if (
      s.fluid !== fluid &&
      (s.fluid.componentIds.join(",") !== ids || s.fluid.model.info.name !== fluid.model.info.name)
    ) {
      throw new InputError({
        input: `inlets[${i}].fluid`,
        unit: "-",
        validRange: `the fluid of inlets[0] (${ids}, ${fluid.model.info.name}): streams of different fluids cannot be mixed here`,
        received: `${s.fluid.componentIds.join(",")}, ${s.fluid.model.info.name}`,
      });
    }
  });
  const n = fluid.componentIds.length;
  let F = 0;
  let H = 0;
  let Pmin = Infinity;
  const moles = new Array<number>(n).fill(0);
  for (const s of inlets) {
    F += s.molarFlowMolPerS;
    if (s.molarFlowMolPerS > 0) {
      H += s.molarFlowMolPerS * streamEnthalpyJPerMol(s);
      Pmin = Math.min(Pmin, s.state.pressurePa);
    }
    for (let i = 0; i < n; i++) moles[i] += s.molarFlowMolPerS * s.z[i];
  }
  if (!(F > 0)) {
    throw new InputError({
      input: "inlets",
      unit: "mol/s",
      validRange: "a total flow > 0",
      received: F,
    });
  }
  let P = Pmin;
  if (spec.outletPressurePa !== undefined) {
    P = requirePositive("spec.outletPressurePa", spec.outletPressurePa, "Pa");
    if (P > Pmin) {
      throw new InputError({
        input: "spec.outletPressurePa",
        unit: "Pa",
        validRange: `at most the lowest inlet pressure ${Pmin} Pa (a mixer does not compress)`,
        received: P,
      });
    }
  }
  const z = moles.map((m) => m / F);
  const h = H / F;
  // start from the flow-weighted inlet temperature
  let Tguess = 0;
  for (const s of inlets) Tguess += (s.molarFlowMolPerS / F) * s.state.temperatureK;
  const eq = fluid.flashPH(P, h, z, { initialGuessK: Tguess, ...spec.flash });
  const outlet = streamFromEquilibrium(fluid, z, eq, F, spec.name ?? "mixed");
  const check = closeBalances("mixer", inlets, [outlet], 0, 0);
  const mdmt =
    spec.minimumDesignMetalTemperatureK === undefined
      ? undefined
      : requirePositive(
          "spec.minimumDesignMetalTemperatureK",
          spec.minimumDesignMetalTemperatureK,
          "K",
        );
  const warnings: ResultWarning[] = [
    ...temperatureWarnings(eq, "mixer outlet", mdmt),
    ...eq.warnings,
  ];
  const method =
    `Adiabatic mixing of ${inlets.length} streams: total flow, component flows and enthalpy summed; ` +
    `outlet at ${spec.outletPressurePa === undefined ? "the lowest inlet pressure" : "the given pressure"} by a flash at (P, h) (outer search on T around isothermal flashes with stability tests, Michelsen 1987). ` +
    `Energy balance closed to ${check.energyBalanceRelativeError.toExponential(1)} relative, material balance to ${check.massBalanceRelativeError.toExponential(1)}.`;
  return {
    kind: "mixer",
    inlets: [...inlets],
    outlet,
    outlets: [outlet],
    dutyW: 0,
    path: [...inlets.map((s) => s.state), eq],
    warnings,
    caution: PROCESS_CAUTION,
    method,
    check,
  };
}
