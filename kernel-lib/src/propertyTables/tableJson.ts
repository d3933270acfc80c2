/**
 * A property table as JSON: { metadata, columns: { name: [numbers] }, units, phaseCount,
 * phaseKind, errorCode } with null for a failed point's values (JSON has no NaN).
 */
import type { PropertyTable } from "./propertyTable.js";

/** The JSON text of a table. */
export function tableJson(table: PropertyTable): string {
  const columns: Record<string, (number | null)[]> = {};
  for (const c of table.columns) {
    columns[c] = Array.from(table.values[c]!, (v) => (Number.isFinite(v) ? v : null));
  }
  return JSON.stringify({
    metadata: table.metadata,
    columns,
    phaseCount: Array.from(table.phaseCount),
    phaseKind: Array.from(table.phaseKind),
    errorCode: Array.from(table.errorCode),
  });
}
