/**
 * The browser-safe engine: everything here runs in Node and in a browser bundle (widgets/).
 * No Node-only module (fs, path, child_process, vega's Node renderer) may be imported from here.
 *
 * Pipeline:  units (edges) -> components + ideal gas -> eos (residual Helmholtz models)
 *            -> departure (integrators) -> state (properties, phases, inversions) -> charts (specs)
 */
export * from "./errors.js";
export * from "./constants.js";
export * from "./validate.js";
export * from "./units/index.js";
export * from "./numerics/index.js";
export * from "./components/index.js";
export * from "./idealgas/index.js";
export * from "./petroleum/index.js";
export * from "./eos/index.js";
export * from "./departure/index.js";
export * from "./state/index.js";
export * from "./transport/index.js";
export * from "./phase/index.js";
export * from "./fluid/index.js";
export * from "./charts/index.js";
export * from "./tables/index.js";
export * from "./pvt/index.js";
export type * from "./eos/types.js";
export type * from "./idealgas/types.js";
export { STANDARD_PRESSURE_PA, STANDARD_TEMPERATURE_K } from "./idealgas/types.js";
