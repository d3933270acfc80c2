/**
 * A result table as an HTML fragment for notebook cells and calculation records: units under the
 * column heads, numbers right-aligned in tabular figures, every string escaped. Inline styles only
 * (no <style> element that could leak into the page), in the charts' palette.
 */
import { escapeHtml } from "./escapeHtml.js";
import { InputError } from "../errors.js";
import {
  resolveColumns,
  tableArguments,
  type ResultTable,
  type TableColumn,
  type TableOptions,
} from "./columns.js";
import { FONT_FAMILY, INK } from "../charts/theme.js";

/**
 * Builds an HTML table from rows and column specs, or from a table of stateTable / stepTable.
 * @example tableHtml(stateTable(states, { names: ["inlet", "outlet"] }))
 * @example tableHtml(states, [{ key: "name", label: "Stream", text: true }, { key: "temperatureK", label: "T", unit: "degC" }])
 */
export function tableHtml(table: ResultTable, options?: TableOptions): string;
export function tableHtml(
  rows: readonly Record<string, unknown>[],
  columns: readonly TableColumn[],
  options?: TableOptions,
): string;
export function tableHtml(
  first: readonly Record<string, unknown>[] | ResultTable,
  second?: readonly TableColumn[] | TableOptions,
  third?: TableOptions,
): string {
  const { rows, columns, options } = tableArguments(first, second, third);
  checkRows(rows);
  const cols = resolveColumns(columns, options);
  const cellStyle = "padding:3px 10px;border-bottom:1px solid " + INK.grid;
  const head = cols
    .map((c) => {
      const unit = c.unit
        ? `<br><span style="font-weight:400;color:#6b665c">${escapeHtml(c.unit)}</span>`
        : "";
      return `<th style="${cellStyle};text-align:${c.numeric ? "right" : "left"};font-weight:600;vertical-align:bottom">${escapeHtml(c.label)}${unit}</th>`;
    })
    .join("");
  const body = rows
    .map((row) => {
      const cells = cols
        .map(
          (c) =>
            `<td style="${cellStyle};text-align:${c.numeric ? "right;font-variant-numeric:tabular-nums" : "left"}">${escapeHtml(c.cell(row))}</td>`,
        )
        .join("");
      return `<tr>${cells}</tr>`;
    })
    .join("\n");
  const caption =
    options.caption !== undefined
      ? `<caption style="caption-side:top;text-align:left;font-weight:600;padding:4px 0;color:${INK.dome}">${escapeHtml(options.caption)}</caption>`
      : "";
  const note =
    options.note !== undefined
      ? `<tfoot><tr><td colspan="${cols.length}" style="padding:4px 10px;color:#6b665c;font-size:90%">${escapeHtml(options.note)}</td></tr></tfoot>`
      : "";
  return (
    `<table class="isochor-table" style="border-collapse:collapse;font-family:${escapeHtml(FONT_FAMILY)};font-size:13px;color:${INK.dome}">` +
    `${caption}<thead><tr>${head}</tr></thead>${note}<tbody>\n${body}\n</tbody></table>`
  );
}

/** Checks the rows argument (an array of objects). */
export function checkRows(rows: readonly Record<string, unknown>[]): void {
  if (!Array.isArray(rows) || rows.some((r) => r === null || typeof r !== "object")) {
    throw new InputError({
      input: "rows",
      unit: "-",
      validRange: "an array of objects",
      received: rows,
    });
  }
}
