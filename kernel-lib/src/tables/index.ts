/**
 * tables/: results as formatted tables (browser-safe).
 *
 *   rows (SI, molar) + column specs --resolveColumns (units/ fromSI, significant figures)-->
 *   tableHtml (notebook, records) | tableText (terminal) | tableMarkdown (Markdown records)
 */
export { formatSignificant } from "./formatNumber.js";
export type { FormatNumberOptions } from "./formatNumber.js";
export type { NumberColumn, TextColumn, TableColumn, TableOptions } from "./columns.js";
export { tableHtml } from "./tableHtml.js";
export { tableText, tableMarkdown } from "./tableText.js";
export { phaseWord } from "./phaseWords.js";
