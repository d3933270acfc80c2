/**
 * Reference fluids bound for use: the reference equation of a data record (eos/multiparameter)
 * with its stable-density solver (phase/referenceDensity.ts, which needs the exact saturation
 * state) as the model's `densityRoots`. The fluid carries its own ideal part and reference state;
 * its states come from state/referenceStates.ts.
 */
import {
  buildReferenceEquation,
  type ReferenceFluid,
} from "../eos/multiparameter/referenceFluid.js";
import type { ReferenceFluidData } from "../eos/multiparameter/fluidData.js";
import { referenceFluidData } from "../eos/multiparameter/referenceFluids.js";
import { referenceDensityRoots } from "../phase/referenceDensity.js";

const built = new Map<string, ReferenceFluid>();

/**
 * Builds a {@link ReferenceFluid} from its data record (the shipped files, or a user's own in the
 * same format).
 *
 * @throws InputError naming the first malformed field of the record.
 */
export function buildReferenceFluid(data: ReferenceFluidData): ReferenceFluid {
  return buildReferenceEquation(data, referenceDensityRoots);
}

/**
 * The reference equation of a fluid, as a ResidualModel with its extras.
 *
 * @param componentId lower-case hyphenated component id, e.g. "water".
 * @example
 * ```ts
 * const water = referenceFluid("water"); // IAPWS-95
 * water.critical.temperatureK; // 647.096
 * ```
 * @throws UnknownNameError if no verified reference equation is shipped for the id.
 */
export function referenceFluid(componentId: string): ReferenceFluid {
  const cached = built.get(componentId);
  if (cached) return cached;
  const fluid = buildReferenceFluid(referenceFluidData(componentId));
  built.set(componentId, fluid);
  return fluid;
}
