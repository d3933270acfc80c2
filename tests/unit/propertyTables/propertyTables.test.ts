/**
 * Property tables read back by independent readers equal the arrays written: CSV by d3-dsv's
 * csvParse (a standard CSV parser), Parquet by hyparquet (the reader of the Parquet format the
 * writer's authors keep), JSON by JSON.parse; the metadata block travels with each.
 */
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { describe, expect, it } from "vitest";
import { csvParse } from "d3-dsv";
import { parquetMetadata, parquetReadObjects } from "hyparquet";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import {
  propertyTable,
  type PropertyTable,
} from "../../../kernel-lib/src/propertyTables/propertyTable.js";
import { tableCsv } from "../../../kernel-lib/src/propertyTables/tableCsv.js";
import { tableJson } from "../../../kernel-lib/src/propertyTables/tableJson.js";
import {
  tableParquet,
  writePropertyTable,
} from "../../../kernel-lib/src/propertyTables/tableParquet.js";

const gas = defineFluid({ components: ["methane", "propane"], model: "peng-robinson" });
const x = [0.9, 0.1];

function tpTable(): PropertyTable {
  return propertyTable(gas, {
    specification: "TP",
    first: { from: 200, to: 400, count: 6 },
    // the last pressure is beyond the model's physical limit: a failed column, kept and coded
    second: [1e5, 3e6, 8e6, 1e12],
    x,
    properties: ["h", "s", "rho", "cp", "quality"],
  });
}

function expectSame(read: ArrayLike<number>, written: Float64Array, label: string) {
  expect(read.length).toBe(written.length);
  for (let i = 0; i < written.length; i++) {
    const w = written[i];
    const r = read[i];
    if (Number.isNaN(w)) expect(Number.isNaN(r), `${label}[${i}]`).toBe(true);
    else expect(r, `${label}[${i}]`).toBe(w);
  }
}

describe("property tables", () => {
  it("a (T, P) table: inputs first, flags per point, some points split, a failed column", () => {
    const t = tpTable();
    expect(t.columns.slice(0, 2)).toEqual(["T", "P"]);
    expect(t.metadata.units.h).toBe("J/mol");
    expect(t.metadata.components).toEqual(["methane", "propane"]);
    expect(t.metadata.model.id).toBe("peng-robinson");
    expect(t.metadata.failed).toBe(6);
    expect(Array.from(t.phaseCount).some((c) => c === 2)).toBe(true);
  });

  it("CSV read back by d3-dsv equals the arrays; metadata and units in the file", () => {
    const t = tpTable();
    const text = tableCsv(t);
    const meta = text.split("\n").filter((l) => l.startsWith("#"));
    expect(meta.some((l) => l.startsWith('# model: {"id":"peng-robinson"'))).toBe(true);
    expect(meta.some((l) => l.startsWith("# referenceState:"))).toBe(true);
    expect(meta.some((l) => l.startsWith("# version:"))).toBe(true);
    const body = text
      .split("\n")
      .filter((l) => !l.startsWith("#"))
      .join("\n");
    const rows = csvParse(body);
    expect(rows.columns).toEqual([
      "T [K]",
      "P [Pa]",
      "h [J/mol]",
      "s [J/(mol K)]",
      "rho [mol/m3]",
      "cp [J/(mol K)]",
      "quality [mol/mol]",
      "phases [-]",
      "phase [-]",
      "error [-]",
    ]);
    for (const c of t.columns) {
      const header = `${c} [${t.metadata.units[c]}]`;
      const read = rows.map((r) => (r[header] === "" ? NaN : Number(r[header])));
      expectSame(read, t.values[c]!, c);
    }
    expect(rows.map((r) => Number(r["phases [-]"]))).toEqual(Array.from(t.phaseCount));
    expect(rows.filter((r) => r["error [-]"] === "bad-input").length).toBe(6);
    expect(rows.some((r) => r["phase [-]"] === "vapor-liquid")).toBe(true);
  });

  it("JSON read back equals the arrays, null at failed points", () => {
    const t = tpTable();
    const parsed = JSON.parse(tableJson(t)) as {
      metadata: { units: Record<string, string> };
      columns: Record<string, (number | null)[]>;
      errorCode: number[];
    };
    for (const c of t.columns) {
      expectSame(
        parsed.columns[c].map((v) => (v === null ? NaN : v)),
        t.values[c]!,
        c,
      );
    }
    expect(parsed.errorCode).toEqual(Array.from(t.errorCode));
    expect(parsed.metadata.units.rho).toBe("mol/m3");
  });

  it("Parquet read back by hyparquet equals the arrays, with the metadata block", async () => {
    const t = tpTable();
    const bytes = await tableParquet(t);
    const file = new Uint8Array(bytes).buffer;
    const rows = (await parquetReadObjects({ file })) as Record<string, number>[];
    expect(rows.length).toBe(t.phaseCount.length);
    for (const c of t.columns)
      expectSame(
        rows.map((r) => r[c]),
        t.values[c]!,
        c,
      );
    expect(rows.map((r) => r.phases)).toEqual(Array.from(t.phaseCount));
    expect(rows.map((r) => r.errorCode)).toEqual(Array.from(t.errorCode));
    const kv = parquetMetadata(file).key_value_metadata ?? [];
    const block = JSON.parse(kv.find((e) => e.key === "isochor")!.value!) as {
      model: { id: string };
      x: number[];
    };
    expect(block.model.id).toBe("peng-robinson");
    expect(block.x).toEqual(x);
  });

  it("a (P, h) table of pure methane written to files of each format", async () => {
    const methane = defineFluid({ components: ["methane"], model: "peng-robinson" });
    const h = [250.5, 300.5].map((T) => methane.stateAtTP(T, 5e6).molar.h);
    const t = propertyTable(methane, {
      specification: "PH",
      first: [5e6, 2e6],
      second: h,
      properties: ["T", "s"],
    });
    expect(t.columns).toEqual(["P", "h", "T", "s"]);
    expect(t.values.T![0]).toBeCloseTo(250.5, 6);
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-table-"));
    for (const ext of ["csv", "json", "parquet"]) {
      const file = path.join(dir, `methane.${ext}`);
      await writePropertyTable(file, t);
      expect(fs.statSync(file).size).toBeGreaterThan(100);
    }
    await expect(writePropertyTable(path.join(dir, "methane.txt"), t)).rejects.toThrow(/format/);
  });
});
