/**
 * A measured-data file (or array set) that cannot be read as P-V-T data. Carries where the problem
 * is (source name, 1-based line, 1-based column = field number, and the column's header) and what
 * was expected there, so an engineer can open the file and fix it.
 */
import { IsochorError } from "../errors.js";

/** Where and what: the file, line, column and header of a refused cell, and what was expected. */
export interface PvtFormatProblem {
  /** File name or "<arrays>" / "<string>" for data given in a cell. */
  source: string;
  /** 1-based line in the file (for arrays: 1-based point index). */
  line: number;
  /** 1-based column (CSV field number); 0 when the problem is the whole line. */
  column: number;
  /** Header text of that column, when known, e.g. "P [bar]". */
  header?: string;
  /** What was expected there, e.g. "a number > 0". */
  expected: string;
  /** What was found (shown quoted). */
  found: string;
  /** Optional hint: what to do instead. */
  hint?: string;
}

/** A refused data file, with the place and what was expected. */
export class PvtFormatError extends IsochorError implements PvtFormatProblem {
  readonly source: string;
  readonly line: number;
  readonly column: number;
  readonly header?: string;
  readonly expected: string;
  readonly found: string;
  readonly hint?: string;
  constructor(p: PvtFormatProblem) {
    const where =
      `${p.source}:${p.line}` +
      (p.column > 0 ? `:${p.column}` : "") +
      (p.header !== undefined ? ` (column ${JSON.stringify(p.header)})` : "");
    super(
      "bad-input",
      `${where}: expected ${p.expected}; found ${p.found}` + (p.hint ? `. ${p.hint}` : ""),
    );
    this.source = p.source;
    this.line = p.line;
    this.column = p.column;
    this.header = p.header;
    this.expected = p.expected;
    this.found = p.found;
    this.hint = p.hint;
  }
}
