/**
 * A table in the current notebook cell, in one call (Node side): a table of stateTable /
 * stepTable, or rows with their column specs, rendered with tables/tableHtml.
 */
import type { ResultTable, TableColumn, TableOptions } from "../tables/columns.js";
import { tableHtml } from "../tables/tableHtml.js";
import { displayHtml } from "./tslabDisplay.js";

const CALLER = { name: "showTable", otherwise: "use tableHtml() for HTML or tableText() for text" };

/**
 * Shows a table in the current cell.
 * @example showTable(stateTable([inlet, outlet], { names: ["inlet", "outlet"] }), { caption: "K-101" })
 */
export function showTable(table: ResultTable, options?: TableOptions): void;
export function showTable(
  rows: readonly Record<string, unknown>[],
  columns: readonly TableColumn[],
  options?: TableOptions,
): void;
export function showTable(
  first: readonly Record<string, unknown>[] | ResultTable,
  second?: readonly TableColumn[] | TableOptions,
  third?: TableOptions,
): void {
  const html = Array.isArray(first)
    ? tableHtml(
        first as readonly Record<string, unknown>[],
        second as readonly TableColumn[],
        third,
      )
    : tableHtml(first as ResultTable, second as TableOptions | undefined);
  displayHtml(html, CALLER);
}
