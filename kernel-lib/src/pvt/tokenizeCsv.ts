/**
 * CSV tokenizer (RFC 4180: separated fields, optional double quotes, "" for a quote inside a
 * quoted field; the separator a comma, a semicolon or a tab, given or detected from the header
 * line; a UTF-8 byte-order mark at the start is dropped), keeping the 1-based line and field number of every cell so that errors can point
 * at them. Lines whose first non-blank character is `#` are comments (returned separately: data
 * files carry their provenance there); blank lines are skipped. Browser-safe: takes a string.
 */
import { PvtFormatError } from "./pvtFormatError.js";

/** One data row of a CSV text with its line number. */
export interface CsvRow {
  /** 1-based line number in the text. */
  line: number;
  /** Cell texts, trimmed of surrounding blanks (quotes removed). */
  cells: string[];
}

/** Field separator of a CSV file; "auto" takes the one that occurs most in the header line. */
export type CsvSeparator = "," | ";" | "\t" | "auto";

/** A tokenized CSV text: data rows, comments and the separator used. */
export interface CsvText {
  rows: CsvRow[];
  /** The separator used (detected or given). */
  separator: "," | ";" | "\t";
  /** Comment lines, without the leading `#`, with their line numbers. */
  comments: { line: number; text: string }[];
}

/**
 * Splits CSV text into rows of trimmed cells; `source` names the file in error messages.
 * @param separator the field separator. Default "auto": of comma, semicolon and tab, the one that
 *   occurs most (outside quotes) in the first line that is neither blank nor a comment (the
 *   header); a comma when none occurs.
 */
export function tokenizeCsv(
  text: string,
  source: string,
  separator: CsvSeparator = "auto",
): CsvText {
  const rows: CsvRow[] = [];
  const comments: { line: number; text: string }[] = [];
  const lines = text.replace(/^\uFEFF/, "").split(/\r\n|\n|\r/);
  const header = lines.find((l) => l.trim() !== "" && !l.trim().startsWith("#")) ?? "";
  const sep = separator === "auto" ? detectSeparator(header) : separator;
  for (let i = 0; i < lines.length; i++) {
    const raw = lines[i] ?? "";
    const lineNo = i + 1;
    const trimmed = raw.trim();
    if (trimmed === "") continue;
    if (trimmed.startsWith("#")) {
      comments.push({ line: lineNo, text: trimmed.slice(1).trim() });
      continue;
    }
    rows.push({ line: lineNo, cells: splitLine(raw, lineNo, source, sep) });
  }
  return { rows, comments, separator: sep };
}

function splitLine(raw: string, lineNo: number, source: string, sep: string): string[] {
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
    } else if (ch === sep) {
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

/** Occurrences of each candidate separator outside double quotes in `line`. */
export function separatorCounts(line: string): { ",": number; ";": number; "\t": number } {
  const counts = { ",": 0, ";": 0, "\t": 0 };
  let inQuotes = false;
  for (const ch of line) {
    if (ch === '"') inQuotes = !inQuotes;
    else if (!inQuotes && (ch === "," || ch === ";" || ch === "\t")) counts[ch]++;
  }
  return counts;
}

function detectSeparator(header: string): "," | ";" | "\t" {
  const counts = separatorCounts(header);
  let best: "," | ";" | "\t" = ",";
  for (const sep of [";", "\t"] as const) if (counts[sep] > counts[best]) best = sep;
  return best;
}
