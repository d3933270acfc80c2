/**
 * A property table as Apache Parquet (read by pandas, polars, DuckDB, Spark, Arrow), written by
 * hyparquet-writer (DEVELOPERS.md, "Dependencies and why"): one DOUBLE column per property
 * (NaN at failed points), INT32 columns `phases`, `phaseKind` and `errorCode`, and the metadata
 * block as key-value metadata ("isochor" holds the whole block as JSON; "units" the units).
 * hyparquet-writer is an ES module: loaded with a real `import()` (as vega is).
 */
import * as fs from "node:fs";
import type { PropertyTable } from "./propertyTable.js";
import { tableCsv } from "./tableCsv.js";
import { tableJson } from "./tableJson.js";
import { InputError } from "../errors.js";

/** File formats of {@link writePropertyTable}. */
export type TableFormat = "csv" | "json" | "parquet";

/** The Parquet bytes of a table. */
export async function tableParquet(table: PropertyTable): Promise<Uint8Array> {
  const writer = await import("hyparquet-writer");
  const int32 = (name: string, data: Uint8Array) => ({
    name,
    data: Int32Array.from(data),
    type: "INT32" as const,
    nullable: false,
  });
  const columnData = [
    ...table.columns.map((c) => ({
      name: c,
      data: table.values[c]!,
      type: "DOUBLE" as const,
      nullable: false,
    })),
    int32("phases", table.phaseCount),
    int32("phaseKind", table.phaseKind),
    int32("errorCode", table.errorCode),
  ];
  const buffer = writer.parquetWriteBuffer({
    columnData,
    kvMetadata: [
      { key: "isochor", value: JSON.stringify(table.metadata) },
      { key: "units", value: JSON.stringify(table.metadata.units) },
    ],
  });
  return new Uint8Array(buffer);
}

/**
 * Writes a table to `file` as CSV, JSON or Parquet (format from the option, else from the file
 * extension .csv, .json or .parquet).
 */
export async function writePropertyTable(
  file: string,
  table: PropertyTable,
  options: { format?: TableFormat } = {},
): Promise<void> {
  const ext = /\.(csv|json|parquet)$/i.exec(file)?.[1]?.toLowerCase() as TableFormat | undefined;
  const format = options.format ?? ext;
  if (!(format === "csv" || format === "json" || format === "parquet")) {
    throw new InputError({
      input: "options.format",
      unit: "-",
      validRange: '"csv", "json" or "parquet" (or a file ending in .csv, .json or .parquet)',
      received: format ?? file,
    });
  }
  if (format === "csv") fs.writeFileSync(file, tableCsv(table));
  else if (format === "json") fs.writeFileSync(file, tableJson(table));
  else fs.writeFileSync(file, await tableParquet(table));
}
