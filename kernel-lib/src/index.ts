/**
 * isochor: real-fluid thermodynamic properties for TypeScript notebooks.
 * `core` is the browser-safe engine; `display` and `records` need Node (tslab kernel, CLI).
 */
export * from "./core.js";
export * from "./display/index.js";
export * from "./records/index.js";
export * from "./progress/index.js";
export { readPvtCsvFile } from "./pvt/readPvtCsvFile.js";
export * from "./explorers/index.js";
export * from "./parallel/index.js";
export * from "./propertyTables/index.js";
