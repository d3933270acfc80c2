/**
 * Saturation rows and the critical point of a pure-fluid model, for the dome of every diagram:
 * coexisting densities from phase/saturationAtTemperature, the critical point from
 * phase/locateCriticalPoint, and, when a fluid binding (model + ideal gas) is given, absolute
 * enthalpy and entropy of both phases from state/stateAtTRho.
 *
 * Temperatures are spaced more densely towards the critical point (uniform in sqrt(1 - T/Tc)),
 * where the dome closes steeply: the top of the dome comes out round, not flat.
 */
import { InputError } from "../../errors.js";
import type { ResidualModel } from "../../eos/types.js";
import { locateCriticalPoint } from "../../phase/criticalPoint.js";
import { saturationAtTemperature } from "../../phase/saturation.js";
import { stateAtTRho } from "../../state/stateAt.js";
import type { FluidBinding } from "../../state/types.js";
import type { ChartCriticalPoint, ChartSaturationRow } from "../saturationInput.js";
import { tryPoint } from "./sampleGuard.js";

/** Options of {@link saturationFromModel}. */
export interface SaturationSampleOptions {
  /** Number of saturation temperatures. Default 40. */
  points?: number;
  /** Lowest temperature as a fraction of the critical temperature. Default 0.55. */
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
  const lo = options.fromReducedTemperature ?? 0.55;
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
  const wHi = Math.sqrt(1 - lo);
  let start: { liquidDensityMolPerM3: number; vaporDensityMolPerM3: number } | undefined;
  for (let i = 0; i < n; i++) {
    const w = wHi - ((wHi - wLo) * i) / (n - 1);
    const T = cp.temperatureK * (1 - w * w);
    const sat = tryPoint(() => saturationAtTemperature(model, T, start ? { start } : {}));
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
  return { saturation, critical, skippedTemperaturesK: skipped };
}
