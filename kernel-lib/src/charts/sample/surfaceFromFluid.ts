/**
 * A property on a temperature-pressure grid for the property-surface chart: the stable state at
 * each (T, P). A quantity named by `property` (a sweep property: "h", "cp", "Z", "rhoMass", ...)
 * is computed through the sweep engine, a row of typed arrays per temperature (sampleSweep.ts,
 * the same numbers as stateAtTP); a quantity given only by `pick` is picked from the full state
 * of state/stateAtTP at each point (slower: one state object per point). Cells without a state
 * are NaN (left blank in the heat map). A 200 x 200 grid is 40 000 states: pass `onProgress`.
 *
 * A mixture (two or more components present) is tested for stability at every grid point
 * (tangent-plane test, phase/stability.ts): where it splits there is no single-phase value, so
 * the cell is left blank (NaN) and `domeWarnings` (which propertySurfaceChart copies into the
 * chart's warnings) says how many cells lie in the two-phase region. The test costs about 20
 * states per point; `checkStability: false` skips it (the cells then show single-phase values,
 * metastable or unstable inside the dome, and the warning says the split was not tested).
 */
import { InputError } from "../../errors.js";
import { stateAtTP } from "../../state/stateAt.js";
import type { FluidBinding, FluidState } from "../../state/types.js";
import { SWEEP_PROPERTIES, type SweepProperty } from "../../sweep/types.js";
import { requirePositive } from "../../validate.js";
import type { DisplayQuantityKindInput } from "./surfaceTypes.js";
import { mixtureSplitsAt, tryPoint, type SampleProgress } from "./sampleGuard.js";
import { sweepTPRows } from "./sampleSweep.js";

/**
 * What a surface shows: its name and kind, and either `property`, a sweep property in the
 * sweep's units (molar basis: J/mol, J/(mol K), mol/m3; see SWEEP_UNITS), or `pick`, any number
 * of the state. With both, `property` is computed and `pick` is not used.
 */
export type SurfaceQuantity = DisplayQuantityKindInput & {
  /** A sweep property (computed through the sweep engine). */
  property?: SweepProperty;
  /** Picks the value from the state at each point (any field of FluidState). */
  pick?: (state: FluidState) => number;
};

/** Options of {@link surfaceFromFluid}. */
export interface SurfaceSampleOptions {
  /** Mole fractions. Default [1]. */
  x?: readonly number[];
  /** Progress callback (states done, total). */
  onProgress?: SampleProgress;
  /** Mixtures: blank the cells where the mixture splits into phases (see the header). Default true. */
  checkStability?: boolean;
}

/**
 * Samples a property over T and P.
 * @example
 * propertySurfaceChart(surfaceFromFluid(fluid, temps, pressures, { name: "Compressibility factor Z", kind: "dimensionless", property: "Z" }))
 */
export function surfaceFromFluid(
  fluid: FluidBinding,
  temperaturesK: readonly number[],
  pressuresPa: readonly number[],
  quantity: SurfaceQuantity,
  options: SurfaceSampleOptions = {},
): {
  temperaturesK: number[];
  pressuresPa: number[];
  values: number[][];
  quantity: DisplayQuantityKindInput;
  /** Notes for the chart: cells in the two-phase region of a mixture (see the header). */
  domeWarnings: string[];
} {
  const x = options.x ?? [1];
  temperaturesK.forEach((t, i) => requirePositive(`temperaturesK[${i}]`, t, "K"));
  pressuresPa.forEach((p, j) => requirePositive(`pressuresPa[${j}]`, p, "Pa"));
  const total = temperaturesK.length * pressuresPa.length;
  let present = 0;
  for (const v of x) if (v > 0) present++;
  const mixture = present >= 2;
  const test = mixture && options.checkStability !== false;
  let split = 0;
  let done = 0;
  const property = quantity.property;
  const pick = quantity.pick;
  let values: number[][];
  if (property !== undefined) {
    if (!SWEEP_PROPERTIES.includes(property)) {
      throw new InputError({
        input: "quantity.property",
        unit: "-",
        validRange: SWEEP_PROPERTIES.join(", "),
        received: property,
      });
    }
    const onProgress = options.onProgress;
    const swept = sweepTPRows(fluid, temperaturesK, pressuresPa, x, [property], {
      checkStability: test,
      onPoint: onProgress && (() => onProgress(++done, total)),
    });
    split = swept.split;
    values = swept.rows.map((row) => Array.from(row[property]));
  } else if (typeof pick === "function") {
    values = temperaturesK.map((T) =>
      pressuresPa.map((P) => {
        const s = tryPoint(() => stateAtTP(fluid, T, P, x));
        let v = s ? pick(s) : NaN;
        if (s && test && mixtureSplitsAt(fluid.model, T, P, x)) {
          split++;
          v = NaN;
        }
        options.onProgress?.(++done, total);
        return v;
      }),
    );
  } else {
    throw new InputError({
      input: "quantity",
      unit: "-",
      validRange:
        "a quantity with `property` (a sweep property) or `pick` (a function of the state)",
      received: quantity,
    });
  }
  const domeWarnings: string[] = [];
  if (split > 0) {
    domeWarnings.push(
      `${split} of ${total} grid points lie in the two-phase region of this mixture (the tangent-plane test finds a split there): they have no single-phase value and are left blank; flashTP gives the phases there.`,
    );
  } else if (mixture && !test) {
    domeWarnings.push(
      "mixture surface sampled without the stability test (checkStability: false): inside the two-phase region the cells show single-phase values of the feed, which the real fluid does not have.",
    );
  }
  return {
    temperaturesK: [...temperaturesK],
    pressuresPa: [...pressuresPa],
    values,
    quantity: { name: quantity.name, kind: quantity.kind },
    domeWarnings,
  };
}
