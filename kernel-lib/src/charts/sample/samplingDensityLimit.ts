/**
 * The highest density to sample an isotherm to (internal). A cubic has a hard limit, its
 * co-volume (maxDensity = 1/b). A multiparameter reference equation has none (maxDensity is
 * Infinity): its published range ends at the melting line instead. The densest fluid state in
 * that range near the lowest temperature is the saturated liquid at the triple point (e.g. CO2:
 * 1178.46 kg/m3 at 216.592 K, Span and Wagner 1996, Table 3), and the compressed liquid at higher
 * temperatures within the chart's pressure range (up to a few times the critical pressure) is no
 * denser than that. So the limit used is `headroom` times the saturated-liquid density at the
 * model's lowest temperature: the triple point, else the low end of its published validity range.
 */
import { maxOf } from "../../numerics/extent.js";
import { InputError } from "../../errors.js";
import type { ResidualModel } from "../../eos/types.js";
import { saturationAtTemperature } from "../../phase/saturation.js";
import { tryPoint } from "./sampleGuard.js";

/** Structural view of what a reference equation carries (see eos/multiparameter). */
interface LowerLimitHints {
  readonly triple?: {
    readonly temperatureK: number;
    readonly liquidDensityMolPerM3?: number;
  };
  readonly data?: {
    readonly molarMassKgPerMol?: number;
    readonly triple?: { readonly liquidDensityKgPerM3?: number };
    readonly validity?: { readonly temperatureK?: { readonly min?: number } };
  };
}

/**
 * Lowest temperature (K) of a model's own range for a pure fluid: the larger of its published
 * triple-point temperature and the low end of its published validity range; undefined when the
 * model publishes neither (cubics: no lower limit of their own).
 */
export function modelLowestTemperatureK(model: ResidualModel): number | undefined {
  const hints = model as ResidualModel & LowerLimitHints;
  const candidates = [hints.triple?.temperatureK, hints.data?.validity?.temperatureK?.min].filter(
    (t): t is number => typeof t === "number" && t > 0 && Number.isFinite(t),
  );
  return candidates.length > 0 ? maxOf(candidates) : undefined;
}

/** How a sampling density limit was obtained (for messages). */
export interface DensityLimit {
  /** mol/m3 */
  readonly densityMolPerM3: number;
  /** e.g. "the model's maximum density" or "1.05 x saturated liquid at 216.592 K". */
  readonly source: string;
}

/**
 * Density limit for sampling an isotherm of `model` at T (mol/m3).
 * @param headroom Factor on the saturated-liquid density when the model has no finite maximum
 *   density. Default 1.05.
 * @throws InputError when the model has neither a finite maximum density nor a lower temperature
 *   limit to take a liquid density from (pass `maxDensityMolPerM3` to the sampler then).
 */
export function samplingDensityLimit(
  model: ResidualModel,
  temperatureK: number,
  x: readonly number[],
  headroom = 1.05,
): DensityLimit {
  const own = model.maxDensity(temperatureK, x);
  if (own > 0 && Number.isFinite(own)) {
    return { densityMolPerM3: own, source: "the model's maximum density" };
  }
  const lowest = x.length === 1 ? modelLowestTemperatureK(model) : undefined;
  if (lowest !== undefined) {
    const sat = tryPoint(() => saturationAtTemperature(model, lowest));
    const hints = model as ResidualModel & LowerLimitHints;
    const published =
      hints.data?.triple?.liquidDensityKgPerM3 !== undefined &&
      hints.data.molarMassKgPerMol !== undefined
        ? hints.data.triple.liquidDensityKgPerM3 / hints.data.molarMassKgPerMol
        : undefined;
    const rhoL = sat?.liquidDensityMolPerM3 ?? published;
    if (rhoL !== undefined && rhoL > 0 && Number.isFinite(rhoL)) {
      return {
        densityMolPerM3: headroom * rhoL,
        source: `${headroom} x the saturated-liquid density at ${lowest} K`,
      };
    }
  }
  throw new InputError({
    input: "maxDensityMolPerM3",
    unit: "mol/m3",
    validRange:
      "given (a finite density to sample to): the model has no finite maximum density " +
      "and no triple point or validity range to take a liquid density from",
    received: own,
  });
}
