/**
 * tables/: results as formatted tables (browser-safe).
 *
 *   rows (SI, molar) + column specs --resolveColumns (units/ fromSI, significant figures)-->
 *   tableHtml (notebook, records) | tableText (terminal) | tableMarkdown (Markdown records)
 *   states, streams, step results --stateTable / stepTable--> { rows, columns, options } (the same)
 */
export { formatSignificant } from "./formatNumber.js";
export type { FormatNumberOptions } from "./formatNumber.js";
export type { NumberColumn, TextColumn, TableColumn, TableOptions } from "./columns.js";
export type { ResultTable } from "./columns.js";
export { isResultTable } from "./columns.js";
export { stateTable, stepTable } from "./stateTable.js";
export type {
  StateTableOptions,
  StepTableOptions,
  StateColumnName,
  StepColumnName,
  CustomStepColumn,
  TableStep,
  CustomStateColumn,
  TableState,
} from "./stateTable.js";
export { tableHtml } from "./tableHtml.js";
export { tableText, tableMarkdown } from "./tableText.js";
export { phaseWord } from "./phaseWords.js";
