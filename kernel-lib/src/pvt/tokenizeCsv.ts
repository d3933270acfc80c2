/**
 * CSV tokenizer (RFC 4180: comma-separated fields, optional double quotes, "" for a quote inside a
 * quoted field), keeping the 1-based line and field number of every cell so that errors can point
 * at them. Lines whose first non-blank character is `#` are comments (returned separately: data
 * files carry their provenance there); blank lines are skipped. Browser-safe: takes a string.
 */
import { PvtFormatError } from "./pvtFormatError.js";

export interface CsvRow {
  /** 1-based line number in the text. */
  line: number;
  /** Cell texts, trimmed of surrounding blanks (quotes removed). */
  cells: string[];
}

export interface CsvText {
  rows: CsvRow[];
  /** Comment lines, without the leading `#`, with their line numbers. */
  comments: { line: number; text: string }[];
}

/** Splits CSV text into rows of trimmed cells; `source` names the file in error messages. */
export function tokenizeCsv(text: string, source: string): CsvText {
  const rows: CsvRow[] = [];
  const comments: { line: number; text: string }[] = [];
  const lines = text.replace(/^\uFEFF/, "").split(/\r\n|\n|\r/);
  for (let i = 0; i < lines.length; i++) {
    const raw = lines[i] ?? "";
    const lineNo = i + 1;
    const trimmed = raw.trim();
    if (trimmed === "") continue;
    if (trimmed.startsWith("#")) {
      comments.push({ line: lineNo, text: trimmed.slice(1).trim() });
      continue;
    }
    rows.push({ line: lineNo, cells: splitLine(raw, lineNo, source) });
  }
  return { rows, comments };
}

function splitLine(raw: string, lineNo: number, source: string): string[] {
  const cells: string[] = [];
  let cell = "";
  let inQuotes = false;
  let quoted = false;
  for (let k = 0; k < raw.length; k++) {
    const ch = raw[k];
    if (inQuotes) {
      if (ch === '"') {
        if (raw[k + 1] === '"') {
          cell += '"';
          k++;
        } else inQuotes = false;
      } else cell += ch;
    } else if (ch === '"' && cell.trim() === "") {
      inQuotes = true;
      quoted = true;
      cell = "";
    } else if (ch === ",") {
      cells.push(quoted ? cell : cell.trim());
      cell = "";
      quoted = false;
    } else cell += ch;
  }
  if (inQuotes) {
    throw new PvtFormatError({
      source,
      line: lineNo,
      column: cells.length + 1,
      expected: "a closing double quote before the end of the line",
      found: "an unterminated quoted cell",
    });
  }
  cells.push(quoted ? cell : cell.trim());
  return cells;
}
