/**
 * A property on a temperature-pressure grid for the property-surface chart: the stable state at
 * each (T, P) from state/stateAtTP, the property picked from it. Cells without a state are NaN
 * (left blank in the heat map). A 200 x 200 grid is 40 000 states: pass `onProgress`.
 */
import { stateAtTP } from "../../state/stateAt.js";
import type { FluidBinding, FluidState } from "../../state/types.js";
import { requirePositive } from "../../validate.js";
import type { DisplayQuantityKindInput } from "./surfaceTypes.js";
import { tryPoint, type SampleProgress } from "./sampleGuard.js";

/** Options of {@link surfaceFromFluid}. */
export interface SurfaceSampleOptions {
  /** Mole fractions. Default [1]. */
  x?: readonly number[];
  /** Progress callback (states done, total). */
  onProgress?: SampleProgress;
}

/**
 * Samples a property over T and P.
 * @example
 * propertySurfaceChart(surfaceFromFluid(fluid, temps, pressures, { name: "Compressibility factor Z", kind: "dimensionless", pick: (s) => s.Z }))
 */
export function surfaceFromFluid(
  fluid: FluidBinding,
  temperaturesK: readonly number[],
  pressuresPa: readonly number[],
  quantity: DisplayQuantityKindInput & { pick: (state: FluidState) => number },
  options: SurfaceSampleOptions = {},
): {
  temperaturesK: number[];
  pressuresPa: number[];
  values: number[][];
  quantity: DisplayQuantityKindInput;
} {
  const x = options.x ?? [1];
  temperaturesK.forEach((t, i) => requirePositive(`temperaturesK[${i}]`, t, "K"));
  pressuresPa.forEach((p, j) => requirePositive(`pressuresPa[${j}]`, p, "Pa"));
  const total = temperaturesK.length * pressuresPa.length;
  let done = 0;
  const values = temperaturesK.map((T) =>
    pressuresPa.map((P) => {
      const s = tryPoint(() => stateAtTP(fluid, T, P, x));
      options.onProgress?.(++done, total);
      return s ? quantity.pick(s) : NaN;
    }),
  );
  return {
    temperaturesK: [...temperaturesK],
    pressuresPa: [...pressuresPa],
    values,
    quantity: { name: quantity.name, kind: quantity.kind },
  };
}
