// Public exports of propertyTables/ (Node side): sweeps as CSV, JSON and Parquet tables.
export { propertyTable, tableOfSweep, isochorVersion } from "./propertyTable.js";
export type { PropertyTable, PropertyTableRequest, TableMetadata } from "./propertyTable.js";
export { tableCsv } from "./tableCsv.js";
export { tableJson } from "./tableJson.js";
export { tableParquet, writePropertyTable } from "./tableParquet.js";
export type { TableFormat } from "./tableParquet.js";
