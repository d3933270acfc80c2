/**
 * Reduced isotherms Z(Tr, Pr) of a fluid for the compressibility chart: Z of the stable state at
 * T = Tr Tc, P = Pr Pc, through the sweep engine (a row of typed arrays per isotherm,
 * sampleSweep.ts; the same numbers as state/stateAtTP). Tc and Pc default to the model's own critical
 * point (phase/locateCriticalPoint) for a pure fluid; give them for a mixture (pseudo-critical).
 */
import { InputError } from "../../errors.js";
import { locateCriticalPoint } from "../../phase/criticalPoint.js";
import type { FluidBinding } from "../../state/types.js";
import { requirePositive } from "../../validate.js";
import type { ReducedIsotherm } from "../compressibility.js";
import type { SampleProgress } from "./sampleGuard.js";
import { sweepTPRows } from "./sampleSweep.js";

/** Options of {@link compressibilityFromFluid}. */
export interface CompressibilitySampleOptions {
  /** Mole fractions. Default [1]. */
  x?: readonly number[];
  /** Critical (or pseudo-critical) temperature, K. Default: the model's critical point. */
  criticalTemperatureK?: number;
  /** Critical (or pseudo-critical) pressure, Pa. Default: the model's critical point. */
  criticalPressurePa?: number;
  /** Progress callback (items done, total). */
  onProgress?: SampleProgress;
}

/**
 * Samples Z on reduced isotherms.
 * @example compressibilityChart(compressibilityFromFluid(fluid, [1.1, 1.3, 1.5, 2], linearGrid(0.1, 10, 100)))
 */
export function compressibilityFromFluid(
  fluid: FluidBinding,
  reducedTemperatures: readonly number[],
  reducedPressures: readonly number[],
  options: CompressibilitySampleOptions = {},
): ReducedIsotherm[] {
  const x = options.x ?? [1];
  let Tc = options.criticalTemperatureK;
  let Pc = options.criticalPressurePa;
  if (Tc === undefined || Pc === undefined) {
    if (x.length !== 1) {
      throw new InputError({
        input: "criticalTemperatureK, criticalPressurePa",
        unit: "K, Pa",
        validRange: "given for a mixture (pseudo-critical values)",
        received: [Tc, Pc],
      });
    }
    const cp = locateCriticalPoint(fluid.model);
    Tc = Tc ?? cp.temperatureK;
    Pc = Pc ?? cp.pressurePa;
  }
  requirePositive("criticalTemperatureK", Tc, "K");
  requirePositive("criticalPressurePa", Pc, "Pa");
  const total = reducedTemperatures.length * reducedPressures.length;
  let done = 0;
  reducedPressures.forEach((pr, j) => requirePositive(`reducedPressures[${j}]`, pr, "-"));
  reducedTemperatures.forEach((tr, i) => requirePositive(`reducedTemperatures[${i}]`, tr, "-"));
  const onProgress = options.onProgress;
  // a mixture that splits at a point has no single-phase Z there: a gap (NaN) the chart reports
  const { rows } = sweepTPRows(
    fluid,
    reducedTemperatures.map((tr) => tr * (Tc as number)),
    reducedPressures.map((pr) => pr * (Pc as number)),
    x,
    ["Z"],
    { onPoint: onProgress && (() => onProgress(++done, total)) },
  );
  return reducedTemperatures.map((tr, i) => ({
    reducedTemperature: tr,
    points: reducedPressures.map((pr, j) => ({ reducedPressure: pr, z: rows[i].Z[j] })),
  }));
}
