/**
 * The registry of reference fluids shipped with isochor. Only equations whose coefficients were
 * verified against the publication's printed tables (status "reference") are listed here; a data
 * file that could not be verified stays out of the registry.
 */
import { UnknownNameError } from "../../errors.js";
import type { ReferenceFluidData } from "./fluidData.js";
import { buildReferenceFluid, type ReferenceFluid } from "./referenceFluid.js";
import water from "./data/water.json";
import carbonDioxide from "./data/carbon-dioxide.json";
import methane from "./data/methane.json";
import nitrogen from "./data/nitrogen.json";

const DATA: Readonly<Record<string, ReferenceFluidData>> = {
  water: water as ReferenceFluidData,
  "carbon-dioxide": carbonDioxide as ReferenceFluidData,
  methane: methane as ReferenceFluidData,
  nitrogen: nitrogen as ReferenceFluidData,
};

const built = new Map<string, ReferenceFluid>();

/** Component ids that have a reference equation, e.g. ["water"]. */
export function referenceFluidIds(): string[] {
  return Object.keys(DATA).filter((id) => DATA[id].status === "reference");
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
  const data = DATA[componentId];
  if (!data || data.status !== "reference") {
    const ids = referenceFluidIds();
    const near = ids.filter(
      (id) =>
        typeof componentId === "string" &&
        (id.includes(componentId.toLowerCase()) || componentId.toLowerCase().includes(id)),
    );
    throw new UnknownNameError("reference fluid", String(componentId), near.length ? near : ids);
  }
  const fluid = buildReferenceFluid(data);
  built.set(componentId, fluid);
  return fluid;
}
