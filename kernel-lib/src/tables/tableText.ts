/**
 * A result table as plain text (terminal, logs, Markdown): units under the heads, text
 * left-aligned, numbers aligned on the decimal point.
 */
import {
  resolveColumns,
  tableArguments,
  type ResultTable,
  type ResolvedColumn,
  type TableColumn,
  type TableOptions,
} from "./columns.js";
import { escapeMarkdown } from "./escapeMarkdown.js";
import { checkRows } from "./tableHtml.js";

/**
 * Builds a plain-text table.
 * @example console.log(tableText(states, columns, { caption: "Corvid Point flare header" }))
 */
export function tableText(table: ResultTable, options?: TableOptions): string;
export function tableText(
  rows: readonly Record<string, unknown>[],
  columns: readonly TableColumn[],
  options?: TableOptions,
): string;
export function tableText(
  first: readonly Record<string, unknown>[] | ResultTable,
  second?: readonly TableColumn[] | TableOptions,
  third?: TableOptions,
): string {
  const { rows, columns, options } = tableArguments(first, second, third);
  checkRows(rows);
  const cols = resolveColumns(columns, options);
  const cells = rows.map((row) => cols.map((c) => oneLine(c.cell(row))));
  const aligned = cols.map((c, j) =>
    alignColumn(
      c,
      cells.map((r) => r[j]),
    ),
  );
  const widths = cols.map((c, j) =>
    Math.max(oneLine(c.label).length, c.unit.length, ...aligned[j].map((s) => s.length), 1),
  );
  const pad = (s: string, w: number, right: boolean) => (right ? s.padStart(w) : s.padEnd(w));
  const lines: string[] = [];
  if (options.caption !== undefined) lines.push(oneLine(options.caption));
  lines.push(
    cols
      .map((c, j) => pad(oneLine(c.label), widths[j], c.numeric))
      .join("  ")
      .trimEnd(),
  );
  if (cols.some((c) => c.unit))
    lines.push(
      cols
        .map((c, j) => pad(c.unit, widths[j], c.numeric))
        .join("  ")
        .trimEnd(),
    );
  lines.push(widths.map((w) => "-".repeat(w)).join("  "));
  rows.forEach((_, i) =>
    lines.push(
      cols
        .map((c, j) => pad(aligned[j][i], widths[j], c.numeric))
        .join("  ")
        .trimEnd(),
    ),
  );
  if (options.note !== undefined) lines.push(oneLine(options.note));
  return lines.join("\n");
}

/** Builds a Markdown (pipe) table; cells are escaped with {@link escapeMarkdown} (one line each). */
export function tableMarkdown(table: ResultTable, options?: TableOptions): string;
export function tableMarkdown(
  rows: readonly Record<string, unknown>[],
  columns: readonly TableColumn[],
  options?: TableOptions,
): string;
export function tableMarkdown(
  first: readonly Record<string, unknown>[] | ResultTable,
  second?: readonly TableColumn[] | TableOptions,
  third?: TableOptions,
): string {
  const { rows, columns, options } = tableArguments(first, second, third);
  checkRows(rows);
  const cols = resolveColumns(columns, options);
  const esc = escapeMarkdown;
  const head = cols.map((c) => esc(c.unit ? `${c.label} (${c.unit})` : c.label));
  const lines = [
    `| ${head.join(" | ")} |`,
    `| ${cols.map((c) => (c.numeric ? "---:" : ":---")).join(" | ")} |`,
    ...rows.map((row) => `| ${cols.map((c) => esc(c.cell(row))).join(" | ")} |`),
  ];
  if (options.caption !== undefined) lines.unshift(esc(options.caption), "");
  if (options.note !== undefined) lines.push("", esc(options.note));
  return lines.join("\n");
}

/** Pads numbers so their decimal points (or ends) line up. */
function alignColumn(column: ResolvedColumn, values: string[]): string[] {
  if (!column.numeric) return values;
  const split = values.map((v) => {
    const m = /^(-?\d+)(\.\d+)?(e-?\d+)?$/.exec(v);
    return m ? { int: m[1], rest: (m[2] ?? "") + (m[3] ?? "") } : { int: v, rest: "" };
  });
  const restWidth = Math.max(0, ...split.map((s) => s.rest.length));
  const intWidth = Math.max(0, ...split.map((s) => s.int.length));
  return split.map((s) => s.int.padStart(intWidth) + s.rest.padEnd(restWidth));
}

/** Collapses control characters and line breaks so a cell stays on one line. */
function oneLine(text: string): string {
  // eslint-disable-next-line no-control-regex
  return text.replace(/[\u0000-\u001f\u007f\u2028\u2029]+/g, " ");
}
