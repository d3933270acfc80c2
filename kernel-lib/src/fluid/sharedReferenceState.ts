/**
 * Several fluids on one stated zero of h and s, for charts and tables that compare models.
 *
 * Each model keeps its own zero otherwise: a reference equation its publication's convention
 * (IAPWS-95: u = s = 0 for the saturated liquid at the triple point), a cubic the formation basis
 * or the zero its fluid was given. Put side by side, h of one state then differs by hundreds of
 * kJ/mol between models. Here every fluid's ideal part is moved (idealgas/shiftedMixture.ts,
 * constant shifts per component) so that each pure ideal gas has h = 0 and s = 0 at the same
 * T0 and P0 (default 25 degC and 1 bar, the explorers' basis). Differences between states of one
 * model and all phase equilibria are unchanged; at (T0, P0) two models' h differ exactly by their
 * residual parts, elsewhere also by the difference of their ideal-gas heat capacities integrated
 * from T0.
 */
import { requirePositive } from "../validate.js";
import { InputError } from "../errors.js";
import { zeroAtIdealGas } from "../idealgas/shiftedMixture.js";
import type { ReferenceState } from "../idealgas/types.js";
import { defineFluid, type Fluid } from "./defineFluid.js";

/** Options of {@link sharedReferenceState}. */
export interface SharedReferenceOptions {
  /** Temperature of the zero, K. Default 298.15 (25 degC). */
  temperatureK?: number;
  /** Pressure of the zero, Pa. Default 1e5 (1 bar). */
  pressurePa?: number;
}

/** The fluids on the shared zero, the zero, and the sentence to put in a caption or note. */
export interface SharedReference {
  /** The given fluids, in order, each rebound to the shared zero (same model, k_ij, cp route). */
  readonly fluids: Fluid[];
  /** The shared zero ("zero-at"); every state of these fluids carries it. */
  readonly referenceState: ReferenceState;
  /** The zero in words, e.g. "h = 0 and s = 0 for the ideal gas at 25 degC and 1 bar, for every model". */
  readonly description: string;
}

/**
 * Rebinds fluids of different models to one zero of h and s, so that a chart or table comparing
 * them shows differences of physics, not of conventions. Say `description` in the caption.
 * @example
 * ```ts
 * const { fluids: [sw, pr], description } = sharedReferenceState([spanWagner, pengRobinson]);
 * sw.state({ T, P }).molar.h - pr.state({ T, P }).molar.h; // the models' difference
 * ```
 */
export function sharedReferenceState(
  fluids: readonly Fluid[],
  options: SharedReferenceOptions = {},
): SharedReference {
  if (!Array.isArray(fluids) || fluids.length === 0) {
    throw new InputError({
      input: "fluids",
      unit: "-",
      validRange: "a non-empty array of fluids from defineFluid",
      received: fluids,
    });
  }
  const T0 = requirePositive("options.temperatureK", options.temperatureK ?? 298.15, "K");
  const P0 = requirePositive("options.pressurePa", options.pressurePa ?? 1e5, "Pa");
  const rebound = fluids.map((f, i) => {
    if (f === null || typeof f !== "object" || !f.spec || !f.idealGas) {
      throw new InputError({
        input: `fluids[${i}]`,
        unit: "-",
        validRange: "a fluid from defineFluid",
        received: f,
      });
    }
    // the fluid's own ideal part (with whatever zero it had) moved to the shared zero; the
    // spec's reference state is dropped, the moved ideal part carries the new one
    return defineFluid({
      ...f.spec,
      idealGas: zeroAtIdealGas(f.idealGas, T0, P0),
      referenceState: undefined,
    });
  });
  return {
    fluids: rebound,
    referenceState: rebound[0].idealGas.referenceState,
    description: `h = 0 and s = 0 for the ideal gas at ${celsiusText(T0)} and ${barText(P0)}, for every model`,
  };
}

/** "25 degC" (rounded to 0.01 K). */
function celsiusText(temperatureK: number): string {
  return `${Number((temperatureK - 273.15).toFixed(2))} degC`;
}

/** "1 bar" (to 6 significant figures). */
function barText(pressurePa: number): string {
  return `${Number((pressurePa / 1e5).toPrecision(6))} bar`;
}
