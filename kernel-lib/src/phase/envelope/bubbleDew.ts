/**
 * Bubble and dew points by name: the saturation points of vapour fraction 0 and 1
 * (saturationPoint.ts), refused with a PhaseUnavailableError when the point found is of the other
 * kind (e.g. a "bubble point" request at a temperature above the mixture's critical temperature,
 * where the equations with the feed as the x phase lead to an upper dew point).
 */
import type { FluidBinding } from "../../state/types.js";
import {
  requireKind,
  saturationPointAtPressure,
  saturationPointAtTemperature,
  type MixtureSaturationPoint,
  type SaturationPointOptions,
} from "./saturationPoint.js";

/** Options of the bubble- and dew-point functions (the vapour fraction is theirs). */
export type BubbleDewOptions = Omit<SaturationPointOptions, "vaporFraction">;

/**
 * Bubble point of the mixture z at T (K): the pressure where the liquid z forms its first bubble.
 * @example bubblePointAtTemperature(fluid, 300, [0.5, 0.5]).pressurePa
 */
export function bubblePointAtTemperature(
  binding: FluidBinding,
  temperatureK: number,
  z: readonly number[],
  options: BubbleDewOptions = {},
): MixtureSaturationPoint {
  const p = saturationPointAtTemperature(binding, temperatureK, z, {
    ...options,
    vaporFraction: 0,
  });
  return requireKind(p, "bubble", `at T = ${temperatureK} K`);
}

/** Bubble point of the mixture z at P (Pa): the temperature of the first bubble. */
export function bubblePointAtPressure(
  binding: FluidBinding,
  pressurePa: number,
  z: readonly number[],
  options: BubbleDewOptions = {},
): MixtureSaturationPoint {
  const p = saturationPointAtPressure(binding, pressurePa, z, { ...options, vaporFraction: 0 });
  return requireKind(p, "bubble", `at P = ${pressurePa} Pa`);
}

/** Dew point of the mixture z at T (K): the pressure where the vapour z forms its first drop. */
export function dewPointAtTemperature(
  binding: FluidBinding,
  temperatureK: number,
  z: readonly number[],
  options: BubbleDewOptions = {},
): MixtureSaturationPoint {
  const p = saturationPointAtTemperature(binding, temperatureK, z, {
    ...options,
    vaporFraction: 1,
  });
  return requireKind(p, "dew", `at T = ${temperatureK} K`);
}

/** Dew point of the mixture z at P (Pa): the temperature of the first drop. */
export function dewPointAtPressure(
  binding: FluidBinding,
  pressurePa: number,
  z: readonly number[],
  options: BubbleDewOptions = {},
): MixtureSaturationPoint {
  const p = saturationPointAtPressure(binding, pressurePa, z, { ...options, vaporFraction: 1 });
  return requireKind(p, "dew", `at P = ${pressurePa} Pa`);
}
