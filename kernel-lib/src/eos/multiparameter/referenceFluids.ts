/**
 * The registry of reference fluids shipped with isochor. Only equations whose coefficients were
 * verified against the publication's printed tables (status "reference") are listed here; a data
 * file that could not be verified stays out of the registry.
 */
import { UnknownNameError } from "../../errors.js";
import type { ReferenceFluidData } from "./fluidData.js";
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

/** Component ids that have a reference equation, e.g. ["water"]. */
export function referenceFluidIds(): string[] {
  return Object.keys(DATA).filter((id) => DATA[id].status === "reference");
}

/**
 * The data record of a shipped reference equation (the fluid itself, bound with its density
 * solver: `referenceFluid`, fluid/referenceFluids.ts).
 *
 * @param componentId lower-case hyphenated component id, e.g. "water".
 * @throws UnknownNameError if no verified reference equation is shipped for the id.
 */
export function referenceFluidData(componentId: string): ReferenceFluidData {
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
  return data;
}
