import type { QuantityKind } from "../displayUnits.js";

/** Name (plain text) and kind of a sampled quantity. */
export interface DisplayQuantityKindInput {
  name: string;
  kind: QuantityKind;
}
