/**
 * Saturation rows and the critical point of a pure-fluid model, for the dome of every diagram:
 * coexisting densities from phase/saturationAtTemperature, the critical point from
 * phase/locateCriticalPoint, and, when a fluid binding (model + ideal gas) is given, absolute
 * enthalpy and entropy of both phases from state/stateAtTRho.
 *
 * Temperatures are spaced more densely towards the critical point (uniform in sqrt(1 - T/Tc)),
 * where the dome closes steeply: the top of the dome comes out round, not flat.
 *
 * The dome starts at the model's own lowest temperature when it has one (a reference equation's
 * triple point or the low end of its validity range: water's 273.16 K, CO2's 216.592 K), else at
 * 0.55 Tc; the warnings say where it starts and why.
 */
import { maxOf, minOf } from "../../numerics/extent.js";
import { InputError, OutOfRangeError } from "../../errors.js";
import type { ResidualModel } from "../../eos/types.js";
import { locateCriticalPoint } from "../../phase/criticalPoint.js";
import { saturationAtTemperature } from "../../phase/saturation.js";
import { stateAtTRho } from "../../state/stateAt.js";
import type { FluidBinding } from "../../state/types.js";
import type { ChartCriticalPoint, ChartSaturationRow } from "../saturationInput.js";
import { tryPoint } from "./sampleGuard.js";
import { modelLowestTemperatureK } from "./samplingDensityLimit.js";

/** Options of {@link saturationFromModel}. */
export interface SaturationSampleOptions {
  /** Number of saturation temperatures. Default 40. */
  points?: number;
  /**
   * Lowest temperature as a fraction of the critical temperature. Default: the model's own
   * lowest temperature (triple point, low end of its validity range) when it has one, else 0.55.
   * An explicit value is used as given; points the model refuses are left out and reported.
   */
  fromReducedTemperature?: number;
  /** Highest temperature as a fraction of Tc. Default 0.9995. */
  toReducedTemperature?: number;
}

/** The dome of a pure fluid: saturation rows (ascending T) and the critical point. */
export interface SampledDome {
  saturation: ChartSaturationRow[];
  critical: ChartCriticalPoint;
  /** Temperatures (K) where no saturation state was found (left out). */
  skippedTemperaturesK: number[];
  /**
   * Notes for the chart (where the dome starts and why, points left out); the diagram builders
   * copy them into their warnings when the dome is spread into their data.
   */
  domeWarnings: string[];
}

/**
 * Samples the saturation dome of a pure fluid. Pass a fluid binding (e.g. from defineFluid) to get
 * enthalpies and entropies (P-h, T-s); a bare model gives densities and pressures (P-v, T-P).
 * @example const dome = saturationFromModel(fluid); pressureEnthalpyChart({ ...dome, isotherms })
 */
export function saturationFromModel(
  modelOrFluid: ResidualModel | FluidBinding,
  options: SaturationSampleOptions = {},
): SampledDome {
  const binding = "model" in modelOrFluid ? modelOrFluid : undefined;
  const model = binding ? binding.model : (modelOrFluid as ResidualModel);
  const n = options.points ?? 40;
  const loOption = options.fromReducedTemperature;
  const lo = loOption ?? 0.55;
  const hi = options.toReducedTemperature ?? 0.9995;
  if (!(Number.isInteger(n) && n >= 2 && n <= 2000)) {
    throw new InputError({
      input: "points",
      unit: "-",
      validRange: "an integer from 2 to 2000",
      received: n,
    });
  }
  if (!(lo > 0 && lo < hi && hi < 1)) {
    throw new InputError({
      input: "fromReducedTemperature, toReducedTemperature",
      unit: "-",
      validRange: "0 < from < to < 1",
      received: [lo, hi],
    });
  }
  const cp = locateCriticalPoint(model);
  const domeWarnings: string[] = [];
  // Start: the model's own lowest temperature (a reference equation's triple point or validity
  // limit) when it has one, so that a dome reaches down to where the fluid can be liquid (water's
  // to 0.01 degC, not flat at 0.55 Tc = 83 degC); else (cubics) 0.55 Tc.
  let tStart = lo * cp.temperatureK;
  const lowest = modelLowestTemperatureK(model);
  if (loOption === undefined && lowest !== undefined) {
    if (!(lowest < hi * cp.temperatureK)) {
      throw new InputError({
        input: "toReducedTemperature",
        unit: "-",
        validRange: `above the model's lowest temperature ${lowest} K / Tc ${cp.temperatureK} K`,
        received: hi,
      });
    }
    domeWarnings.push(
      `The saturation dome starts at ${round(lowest)} K, the lowest temperature of ` +
        `${model.info.name} (triple point or validity limit).`,
    );
    tStart = lowest;
  }
  const x = [1];
  const withEnergies = (T: number, rho: number) => {
    if (!binding) return { densityMolPerM3: rho };
    const s = stateAtTRho(binding, T, rho, x);
    return { densityMolPerM3: rho, enthalpyJPerMol: s.molar.h, entropyJPerMolK: s.molar.s };
  };
  const saturation: ChartSaturationRow[] = [];
  const skipped: number[] = [];
  // Uniform in w = sqrt(1 - Tr): dense near the critical point.
  const wLo = Math.sqrt(1 - hi);
  const wHi = Math.sqrt(1 - tStart / cp.temperatureK);
  let start: { liquidDensityMolPerM3: number; vaporDensityMolPerM3: number } | undefined;
  for (let i = 0; i < n; i++) {
    const w = wHi - ((wHi - wLo) * i) / (n - 1);
    // The first point exactly at the start (a triple point must not round to just below it).
    const T = i === 0 ? tStart : cp.temperatureK * (1 - w * w);
    const sat = tryPoint(() => {
      try {
        return saturationAtTemperature(model, T, start ? { start } : {});
      } catch (error) {
        // Only a start the user chose can reach outside the model's range: a gap, reported.
        if (error instanceof OutOfRangeError && loOption !== undefined) return undefined;
        throw error;
      }
    });
    if (!sat) {
      skipped.push(T);
      continue;
    }
    start = {
      liquidDensityMolPerM3: sat.liquidDensityMolPerM3,
      vaporDensityMolPerM3: sat.vaporDensityMolPerM3,
    };
    saturation.push({
      temperatureK: T,
      pressurePa: sat.pressurePa,
      liquid: withEnergies(T, sat.liquidDensityMolPerM3),
      vapor: withEnergies(T, sat.vaporDensityMolPerM3),
    });
  }
  const critical: ChartCriticalPoint = {
    temperatureK: cp.temperatureK,
    pressurePa: cp.pressurePa,
    densityMolPerM3: cp.densityMolPerM3,
  };
  if (binding) {
    const s = stateAtTRho(binding, cp.temperatureK, cp.densityMolPerM3, x);
    critical.enthalpyJPerMol = s.molar.h;
    critical.entropyJPerMolK = s.molar.s;
  }
  if (skipped.length > 0) {
    domeWarnings.push(
      `${skipped.length} saturation temperature(s) from ${round(minOf(skipped))} K to ` +
        `${round(maxOf(skipped))} K gave no saturation state (outside the model's range or ` +
        "no convergence) and are left out of the dome.",
    );
  }
  return { saturation, critical, skippedTemperaturesK: skipped, domeWarnings };
}

/** Temperature for a message, 0.01 K. */
function round(temperatureK: number): number {
  return Math.round(temperatureK * 100) / 100;
}
