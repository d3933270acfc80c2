/**
 * A results table of a calculation record: rendered with tables/ (HTML and Markdown) with a Basis
 * column that links each row to the model entry and inputs it used.
 */
import { randomBytes } from "node:crypto";
import type { TableColumn, TableOptions } from "../tables/columns.js";
import { tableHtml } from "../tables/tableHtml.js";
import { tableMarkdown } from "../tables/tableText.js";
import { basisLinks, basisText } from "./recordBasis.js";
import type { RecordBasis, ResolvedBasis } from "./recordContent.js";

/** Options of {@link CalculationRecord.results}. */
export interface RecordResultsOptions extends TableOptions, RecordBasis {
  /** Basis of one row, when rows differ (overrides `model` / `inputs` for that row). */
  rowBasis?: (row: Record<string, unknown>, index: number) => RecordBasis;
}

/**
 * The table's HTML (Basis cells are links to `#<anchor>-<id>`) and Markdown (Basis in words).
 * @param title The caption as shown, e.g. "T1. Inlet states".
 * @param bases The resolved basis of each row.
 */
export function recordTableText(
  rows: readonly Record<string, unknown>[],
  columns: readonly TableColumn[],
  options: TableOptions & { title: string },
  bases: readonly ResolvedBasis[],
  anchor: string,
): { html: string; markdown: string } {
  // The Basis cell goes through tables/ as a random token (escaped like any text), then the token
  // is replaced by links built here; user text cannot forge a token it cannot guess.
  const nonce = randomBytes(6).toString("hex");
  const token = (i: number) => `isochor-basis-${nonce}-${i}-end`;
  const basisKey = `__isochorBasis_${nonce}`;
  const withToken = rows.map((row, i) => ({ ...row, [basisKey]: token(i) }));
  const withText = rows.map((row, i) => ({ ...row, [basisKey]: basisText(bases[i]) }));
  const tableColumns: TableColumn[] = [...columns, { key: basisKey, label: "Basis", text: true }];
  const tableOptions: TableOptions = {
    caption: options.title,
    note: options.note,
    units: options.units,
    molarMassKgPerMol: options.molarMassKgPerMol,
    missing: options.missing,
  };
  let html = tableHtml(withToken, tableColumns, tableOptions);
  bases.forEach((b, i) => {
    html = html.replace(token(i), basisLinks(anchor, b));
  });
  const markdown = tableMarkdown(withText, tableColumns, tableOptions);
  return { html, markdown };
}
