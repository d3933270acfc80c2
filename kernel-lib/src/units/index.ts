// Public exports of units/: reading and writing quantities at the edges of the library.
export type { Dimension } from "./dimension.js";
export { SI_UNITS, DIMENSIONS, isDimension } from "./dimension.js";
export type { UnitDefinition } from "./unitTable.js";
export { lookupUnit, listUnits } from "./lookupUnit.js";
export {
  setDefaultAtmosphericPressure,
  getDefaultAtmosphericPressure,
  resetDefaultAtmosphericPressure,
} from "./atmosphericPressure.js";
export { toSI, fromSI, convertUnit } from "./convert.js";
export type { UnitConversionOptions } from "./convert.js";
export { parseQuantity, formatQuantity } from "./quantity.js";
export type { ParsedQuantity, FormatQuantityOptions } from "./quantity.js";
export {
  FLOW_UNITS,
  NAMED_REFERENCE_CONDITIONS,
  lookupFlowUnit,
  resolveReferenceConditions,
  idealGasMolarVolumeM3PerMol,
  molarFlowToSI,
  molarFlowFromSI,
} from "./flow.js";
export type {
  FlowKind,
  FlowUnitDefinition,
  ReferenceConditions,
  ReferenceConditionsSpec,
  FlowConversionContext,
} from "./flow.js";
