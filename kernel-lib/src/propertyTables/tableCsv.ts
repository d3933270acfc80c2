/**
 * A property table as CSV: the metadata block as `# key: value` lines (JSON values), then the
 * header `name [unit]` (the convention of the P-V-T import, pvt/parsePvtCsv.ts) and one row per
 * point. Numbers are written in the shortest form that reads back to the same double; a failed
 * point's cells are empty. Three flag columns end each row: `phases [-]` (count),
 * `phase [-]` (kind name) and `error [-]` (error name, empty when none).
 */
import type { PropertyTable } from "./propertyTable.js";
import { codeName } from "./propertyTable.js";

/** The CSV text of a table (lines end with \n). */
export function tableCsv(table: PropertyTable): string {
  const m = table.metadata;
  const lines: string[] = [];
  for (const [key, value] of Object.entries(m)) lines.push(`# ${key}: ${JSON.stringify(value)}`);
  const header = table.columns.map((c) => `${c} [${m.units[c]}]`);
  header.push("phases [-]", "phase [-]", "error [-]");
  lines.push(header.join(","));
  const cols = table.columns.map((c) => table.values[c]!);
  const n = table.phaseCount.length;
  const kinds = Object.keys(m.phaseKinds);
  const kindOf = (k: number) => kinds.find((name) => m.phaseKinds[name] === k) ?? "";
  for (let i = 0; i < n; i++) {
    const row: string[] = [];
    for (const col of cols) row.push(Number.isFinite(col[i]) ? String(col[i]) : "");
    const error = table.errorCode[i];
    row.push(
      String(table.phaseCount[i]),
      table.phaseKind[i] === 0 ? "" : kindOf(table.phaseKind[i]),
      error === 0 ? "" : codeName(m.errorCodes, error),
    );
    lines.push(row.join(","));
  }
  return lines.join("\n") + "\n";
}
