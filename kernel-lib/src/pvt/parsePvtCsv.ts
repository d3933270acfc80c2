/**
 * Reads measured P-V-T data from CSV text (browser-safe: takes a string; the Node CLI reads the
 * file). Headers carry units: `T [K]`, `rho [mol/L]` or `v [cm3/mol]`, `P [MPa]`, and optional
 * standard uncertainties `u(T) [K]`, `u(rho) [...]` or `u(v) [...]`, `u(P) [...]` in any unit
 * the units module knows for that dimension (columnUnits.ts). Lines starting with `#` are comments (provenance).
 *
 * Fields are separated by commas, semicolons or tabs (options.separator, detected from the header
 * by default); a UTF-8 byte-order mark is accepted.
 *
 * Refused, with file, line and column and what was expected: a missing or unknown column, a
 * header without a unit, a unit that does not parse, a row with the wrong number of cells, a
 * non-numeric or empty cell, a zero or negative value (after conversion to SI), and repeats of
 * the same (T, density) whose pressures conflict. Nothing is silently dropped.
 */
import { InputError } from "../errors.js";
import { PvtFormatError } from "./pvtFormatError.js";
import { columnUnitToSI, isAffineToSI } from "./columnUnits.js";
import type { AffineToSI, ColumnQuantity } from "./columnUnits.js";
import { settleRepeats } from "./settleRepeats.js";
import { separatorCounts, tokenizeCsv } from "./tokenizeCsv.js";
import type { CsvSeparator } from "./tokenizeCsv.js";
import type { PvtDataset, PvtPoint } from "./types.js";

/** Options of {@link parsePvtCsv}. */
export interface ParsePvtCsvOptions {
  /** Name shown in error messages, e.g. the file path. Default "<string>". */
  source?: string;
  /** Molar mass, kg/mol: needed only when a column is a mass density or specific volume. */
  molarMassKgPerMol?: number;
  /**
   * Field separator: ",", ";" or "\t" (tab). Default "auto": the one that occurs most in the
   * header line (a comma when none does).
   */
  separator?: CsvSeparator;
}

type Role = "T" | "rho" | "v" | "P" | "uT" | "urho" | "uv" | "uP";

const ROLE_QUANTITY: Record<Role, ColumnQuantity> = {
  T: "temperature",
  rho: "density",
  v: "volume",
  P: "pressure",
  uT: "temperature",
  urho: "density",
  uv: "volume",
  uP: "pressure",
};

const NAMES: Record<string, "T" | "rho" | "v" | "P"> = {
  T: "T",
  t: "T",
  temperature: "T",
  rho: "rho",
  ρ: "rho",
  density: "rho",
  v: "v",
  V: "v",
  volume: "v",
  P: "P",
  p: "P",
  pressure: "P",
};

const KNOWN = "T, rho (or v), P, u(T), u(rho) (or u(v)), u(P)";

interface Column {
  role: Role;
  header: string;
  index: number;
  toSI: AffineToSI;
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

function parseHeader(
  header: string,
  index: number,
  line: number,
  source: string,
  molarMass: number | undefined,
): Column {
  const m = /^(.+?)\s*[[(]([^\])]*)[\])]\s*$/.exec(header);
  const fail = (expected: string, found: string, hint?: string): never => {
    throw new PvtFormatError({ source, line, column: index + 1, header, expected, found, hint });
  };
  // u(X) [unit]: the name itself contains parentheses, so match it first.
  const um = /^u\s*\(\s*([^)]+?)\s*\)\s*\[([^\]]*)\]\s*$/.exec(header);
  let role: Role | undefined;
  let unit: string;
  if (um) {
    const base = NAMES[um[1] ?? ""];
    if (base === undefined)
      fail(`an uncertainty column of one of: ${KNOWN}`, JSON.stringify(header));
    role = ("u" + base) as Role;
    unit = um[2] ?? "";
  } else if (m) {
    const base = NAMES[(m[1] ?? "").trim()];
    if (base === undefined) {
      fail(
        `a column named one of: ${KNOWN}`,
        JSON.stringify(header),
        "remove or rename the column",
      );
    }
    role = base;
    unit = m[2] ?? "";
  } else {
    const bare = NAMES[header.trim()];
    return fail(
      "a header of the form name [unit], e.g. T [K] or P [MPa]",
      JSON.stringify(header),
      bare !== undefined ? "add the unit in square brackets" : `known columns: ${KNOWN}`,
    );
  }
  const r = role as Role;
  if (unit.trim() === "")
    fail(`a unit in the brackets of ${JSON.stringify(header)}`, "an empty unit");
  const conv = columnUnitToSI(ROLE_QUANTITY[r], unit, molarMass);
  if (!isAffineToSI(conv)) return fail(conv.expected, `unit ${JSON.stringify(unit)}`, conv.hint);
  return { role: r, header, index, toSI: conv };
}

/** Parses CSV text into an SI data set; see the file header for what is refused. */
export function parsePvtCsv(text: string, options: ParsePvtCsvOptions = {}): PvtDataset {
  const source = options.source ?? "<string>";
  const separator = options.separator ?? "auto";
  if (![",", ";", "\t", "auto"].includes(separator)) {
    throw new InputError({
      input: "options.separator",
      unit: "-",
      validRange: '",", ";", "\\t" (tab) or "auto"',
      received: separator,
    });
  }
  const { rows, comments, separator: used } = tokenizeCsv(text, source, separator);
  const headerRow = rows[0];
  if (!headerRow) {
    throw new PvtFormatError({
      source,
      line: 1,
      column: 0,
      expected: `a header line with columns ${KNOWN}`,
      found: "no header and no data",
    });
  }
  const columns: Column[] = [];
  const byRole = new Map<Role, Column>();
  headerRow.cells.forEach((h, i) => {
    const counts = separatorCounts(h);
    const other = ([",", ";", "\t"] as const).find((sep) => sep !== used && counts[sep] > 0);
    if (other !== undefined && !/\[[^\]]*$/.test(h.slice(0, h.indexOf(other)))) {
      const name = (sep: string) => (sep === "\t" ? "tab" : JSON.stringify(sep));
      throw new PvtFormatError({
        source,
        line: headerRow.line,
        column: i + 1,
        header: h,
        expected: `columns separated by ${name(used)} (the separator ${separator === "auto" ? "detected in the header" : "given in options.separator"})`,
        found: `a header cell that contains ${name(other)}: the file looks ${name(other)}-separated; pass separator: ${JSON.stringify(other)} (or "auto")`,
      });
    }
    const c = parseHeader(h, i, headerRow.line, source, options.molarMassKgPerMol);
    const earlier = byRole.get(c.role);
    if (earlier) {
      throw new PvtFormatError({
        source,
        line: headerRow.line,
        column: i + 1,
        header: h,
        expected: `each quantity once (column ${earlier.index + 1} is already ${JSON.stringify(earlier.header)})`,
        found: "a second column for the same quantity",
      });
    }
    byRole.set(c.role, c);
    columns.push(c);
  });
  const missing = (what: string) =>
    new PvtFormatError({
      source,
      line: headerRow.line,
      column: 0,
      expected: `a ${what} column`,
      found: `only ${headerRow.cells.map((c) => JSON.stringify(c)).join(", ")}`,
    });
  if (!byRole.has("T")) throw missing("temperature (T [unit])");
  if (!byRole.has("P")) throw missing("pressure (P [unit])");
  if (!byRole.has("rho") && !byRole.has("v"))
    throw missing("density (rho [unit]) or volume (v [unit])");
  const conflict = (a: Role, b: Role) => {
    const ca = byRole.get(a);
    const cb = byRole.get(b);
    if (ca && cb) {
      throw new PvtFormatError({
        source,
        line: headerRow.line,
        column: cb.index + 1,
        header: cb.header,
        expected: `either ${JSON.stringify(ca.header)} or this column, not both`,
        found: "both a density and a volume column",
      });
    }
  };
  conflict("rho", "v");
  conflict("urho", "uv");
  if (byRole.has("urho") && byRole.has("v")) conflict("v", "urho");
  if (byRole.has("uv") && byRole.has("rho")) conflict("rho", "uv");

  const points: PvtPoint[] = [];
  for (const row of rows.slice(1)) {
    if (row.cells.length !== columns.length) {
      throw new PvtFormatError({
        source,
        line: row.line,
        column: Math.min(row.cells.length, columns.length) + 1,
        expected: `${columns.length} cells (as in the header)`,
        found: `${row.cells.length} cells`,
      });
    }
    const values = new Map<Role, number>();
    for (const c of columns) {
      const cell = row.cells[c.index] ?? "";
      const fail = (expected: string, found: string) =>
        new PvtFormatError({
          source,
          line: row.line,
          column: c.index + 1,
          header: c.header,
          expected,
          found,
        });
      if (!NUMBER.test(cell)) {
        throw fail("a number", cell === "" ? "an empty cell" : JSON.stringify(cell));
      }
      const raw = Number(cell);
      const isU = c.role.startsWith("u");
      const si = isU ? raw * c.toSI.scale : raw * c.toSI.scale + c.toSI.offset;
      if (!(si > 0 && si < Infinity)) {
        throw fail(
          isU ? "a standard uncertainty > 0" : `a value > 0 ${c.toSI.siUnit} (absolute)`,
          `${cell}` + (c.toSI.offset !== 0 ? ` (= ${si} ${c.toSI.siUnit})` : ""),
        );
      }
      values.set(c.role, si);
    }
    let rho: number;
    let uRho: number | undefined;
    if (values.has("rho")) {
      rho = values.get("rho") as number;
      uRho = values.get("urho");
    } else {
      const v = values.get("v") as number;
      rho = 1 / v;
      const uv = values.get("uv");
      uRho = uv === undefined ? undefined : uv / (v * v);
    }
    points.push({
      temperatureK: values.get("T") as number,
      densityMolPerM3: rho,
      pressurePa: values.get("P") as number,
      uTemperatureK: values.get("uT"),
      uDensityMolPerM3: uRho,
      uPressurePa: values.get("uP"),
      line: row.line,
    });
  }
  if (points.length === 0) {
    throw new PvtFormatError({
      source,
      line: headerRow.line + 1,
      column: 0,
      expected: "at least one data line after the header",
      found: "none",
    });
  }
  const pCol = byRole.get("P") as Column;
  const { kept, setAside } = settleRepeats(points, source, pCol.header, pCol.index + 1);
  return {
    source,
    points: kept,
    setAside,
    columns: columns.map((c) => ({
      header: c.header,
      quantity: c.role,
      unit: c.toSI.siUnit + (c.toSI.note ? ` (${c.toSI.note})` : ""),
    })),
    comments: comments.map((c) => c.text),
  };
}
