// Public exports of components/: the component record, the built-in table, lookup and validation.
export type {
  Component,
  ComponentOrigin,
  ComponentSources,
  CpCorrelation,
  PolynomialCp,
  PolynomialCpSegment,
  AlyLeeCp,
} from "./types.js";
export {
  getComponent,
  listComponents,
  normalizeComponentName,
  resolveComponent,
} from "./getComponent.js";
export type { GetComponentOptions } from "./getComponent.js";
export { defineComponent } from "./defineComponent.js";
export type { ComponentSpec, DefineComponentOptions } from "./defineComponent.js";
export {
  checkMoleFractions,
  normalizeMoleFractions,
  moleFractionsFromAmounts,
} from "./composition.js";
export type { CheckMoleFractionsOptions } from "./composition.js";
export { AmbiguousNameError } from "./ambiguousNameError.js";
export { parseFormula } from "./formula.js";
export type { ElementCounts } from "./formula.js";
export { editDistance } from "../numerics/editDistance.js";
export { rackettCompressibility, rackettSaturatedLiquidVolume } from "./rackettLiquidVolume.js";
export type {
  RackettCompressibility,
  RackettComponent,
  RackettOptions,
} from "./rackettLiquidVolume.js";
