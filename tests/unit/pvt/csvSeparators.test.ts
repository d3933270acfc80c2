import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import * as path from "node:path";
import { describe, expect, it } from "vitest";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { parsePvtCsv, PvtFormatError } from "../../../kernel-lib/src/pvt/index.js";
import { readPvtCsvFile } from "../../../kernel-lib/src/pvt/readPvtCsvFile.js";

// The same two rows in each dialect; values invented (demo data, no source needed).
const COMMA = "T [K],rho [mol/L],P [bar]\n300,1,23.5\n320,1,25.1\n";
const SEMICOLON = "T [K];rho [mol/L];P [bar]\n300;1;23.5\n320;1;25.1\n";
const TAB = "T [K]\trho [mol/L]\tP [bar]\n300\t1\t23.5\n320\t1\t25.1\n";

function refusal(text: string, options = {}): PvtFormatError {
  try {
    parsePvtCsv(text, { source: "lab.csv", ...options });
  } catch (e) {
    if (e instanceof PvtFormatError) return e;
    throw e;
  }
  throw new Error("expected a refusal, got a data set");
}

describe("CSV separators and byte-order mark", () => {
  const expected = parsePvtCsv(COMMA).points;

  it("detects semicolon- and tab-separated files from the header and reads the same points", () => {
    expect(expected).toHaveLength(2);
    expect(expected[1]?.pressurePa).toBeCloseTo(25.1e5, 6); // 1 bar = 1e5 Pa (SI definition)
    expect(parsePvtCsv(SEMICOLON).points).toEqual(expected);
    expect(parsePvtCsv(TAB).points).toEqual(expected);
  });

  it("takes an explicit separator", () => {
    expect(parsePvtCsv(SEMICOLON, { separator: ";" }).points).toEqual(expected);
    expect(parsePvtCsv(TAB, { separator: "\t" }).points).toEqual(expected);
  });

  it("refuses a file whose header uses another separator than the one given, naming it", () => {
    const e = refusal(SEMICOLON, { separator: "," });
    expect(e.message).toContain('";"');
    expect(e.message).toContain("separator");
    expect(refusal(TAB, { separator: ";" }).message).toContain("tab");
  });

  it("refuses an unknown separator option", () => {
    expect(() => parsePvtCsv(COMMA, { separator: "|" as unknown as ";" })).toThrow(InputError);
  });

  it("accepts a UTF-8 byte-order mark in a string and in a file (the header is not misread)", () => {
    expect(parsePvtCsv("\uFEFF" + SEMICOLON).points).toEqual(expected);
    const dir = mkdtempSync(path.join(tmpdir(), "isochor-csv-"));
    const file = path.join(dir, "bom.csv");
    writeFileSync(file, Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(COMMA)]));
    const d = readPvtCsvFile(file);
    expect(d.points.map((p) => p.pressurePa)).toEqual(expected.map((p) => p.pressurePa));
    expect(d.columns[0]?.header).toBe("T [K]");
  });

  it("keeps a semicolon inside a quoted comma-separated cell", () => {
    const d = parsePvtCsv('T [K],rho [mol/L],"P [bar]"\n300,1,"23.5"\n');
    expect(d.points[0]?.pressurePa).toBeCloseTo(23.5e5, 6);
  });
});
