/**
 * The parts of Jupyter's nbformat 4 that the runner reads and writes, and the reader that refuses
 * anything else with a RunnerError. Field names are nbformat's own (snake_case), per the nbformat 4
 * JSON schema (nbformat.v4.schema.json, "required" lists).
 */
import { randomBytes } from "node:crypto";
import * as fs from "node:fs";
import { RunnerError } from "./runnerError.js";

/** nbformat stores text either as one string or as a list of lines (each keeping its "\n"). */
export type MultilineString = string | string[];

export interface StreamOutput {
  output_type: "stream";
  name: "stdout" | "stderr";
  text: MultilineString;
}
export interface DisplayDataOutput {
  output_type: "display_data";
  data: Record<string, unknown>;
  metadata: Record<string, unknown>;
}
export interface ExecuteResultOutput {
  output_type: "execute_result";
  execution_count: number | null;
  data: Record<string, unknown>;
  metadata: Record<string, unknown>;
}
export interface ErrorOutput {
  output_type: "error";
  ename: string;
  evalue: string;
  traceback: string[];
}
export type NotebookOutput = StreamOutput | DisplayDataOutput | ExecuteResultOutput | ErrorOutput;

export interface CodeCell {
  cell_type: "code";
  id?: string;
  metadata: Record<string, unknown>;
  source: MultilineString;
  outputs: NotebookOutput[];
  execution_count: number | null;
}
export interface MarkdownCell {
  cell_type: "markdown";
  id?: string;
  metadata: Record<string, unknown>;
  source: MultilineString;
  attachments?: Record<string, Record<string, string>>;
}
export interface RawCell {
  cell_type: "raw";
  id?: string;
  metadata: Record<string, unknown>;
  source: MultilineString;
  attachments?: Record<string, Record<string, string>>;
}
export type NotebookCell = CodeCell | MarkdownCell | RawCell;

export interface Notebook {
  nbformat: 4;
  nbformat_minor: number;
  metadata: Record<string, unknown>;
  cells: NotebookCell[];
}

/** Joins nbformat multiline text into one string. */
export function joinText(text: MultilineString | undefined): string {
  if (text === undefined) return "";
  return Array.isArray(text) ? text.join("") : text;
}

/** A cell id for 4.5 notebooks whose cells lack one (schema: 1-64 of [a-zA-Z0-9-_]). */
function newCellId(index: number): string {
  return `isochor-cell-${index + 1}-${randomBytes(4).toString("hex")}`;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return value !== null && typeof value === "object" && !Array.isArray(value);
}

function isMultiline(value: unknown): value is MultilineString {
  return (
    typeof value === "string" || (Array.isArray(value) && value.every((s) => typeof s === "string"))
  );
}

/**
 * Parses notebook JSON text, checking what the runner relies on: nbformat 4, a cells list, each
 * cell's type and source. Outputs of code cells are dropped (the run replaces them).
 * @param text File content.
 * @param name The notebook's path as the user gave it (for messages).
 * @throws RunnerError naming the file and the problem.
 */
export function parseNotebook(text: string, name: string): Notebook {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    throw new RunnerError({
      notebook: name,
      detail: `not a notebook: the file is not valid JSON (${error instanceof Error ? error.message : String(error)})`,
    });
  }
  if (!isRecord(json) || !Array.isArray(json.cells)) {
    throw new RunnerError({
      notebook: name,
      detail: 'not a notebook: no "cells" list at the top level',
    });
  }
  if (json.nbformat !== 4) {
    throw new RunnerError({
      notebook: name,
      detail: `not an nbformat 4 notebook (nbformat is ${JSON.stringify(json.nbformat)}); save it with Jupyter 4 or later`,
    });
  }
  const minor =
    typeof json.nbformat_minor === "number" &&
    Number.isInteger(json.nbformat_minor) &&
    json.nbformat_minor >= 0
      ? json.nbformat_minor
      : 0;
  const cells: NotebookCell[] = json.cells.map((cell: unknown, i: number) => {
    const where = `cell ${i + 1}`;
    if (!isRecord(cell) || !isMultiline(cell.source)) {
      throw new RunnerError({
        notebook: name,
        detail: `not a notebook: ${where} has no text "source"`,
      });
    }
    const metadata = isRecord(cell.metadata) ? cell.metadata : {};
    // nbformat 4.5 requires a cell id; 4.0-4.4 forbid one (their schemas allow no extra fields).
    const id =
      minor >= 5
        ? { id: typeof cell.id === "string" && cell.id !== "" ? cell.id : newCellId(i) }
        : {};
    switch (cell.cell_type) {
      case "code":
        return {
          cell_type: "code",
          ...id,
          metadata,
          source: cell.source,
          outputs: [],
          execution_count: null,
        };
      case "markdown":
      case "raw": {
        const attachments = isRecord(cell.attachments)
          ? { attachments: cell.attachments as Record<string, Record<string, string>> }
          : {};
        return { cell_type: cell.cell_type, ...id, metadata, source: cell.source, ...attachments };
      }
      default:
        throw new RunnerError({
          notebook: name,
          detail: `not a notebook: ${where} has cell_type ${JSON.stringify(cell.cell_type)} (expected code, markdown or raw)`,
        });
    }
  });
  return {
    nbformat: 4,
    nbformat_minor: minor,
    metadata: isRecord(json.metadata) ? json.metadata : {},
    cells,
  };
}

/** Reads and parses a notebook file. @throws RunnerError when missing, unreadable or not a notebook. */
export function readNotebook(filePath: string, name = filePath): Notebook {
  let text: string;
  try {
    text = fs.readFileSync(filePath, "utf8");
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const detail =
      code === "ENOENT"
        ? "no such file"
        : code === "EISDIR"
          ? "is a directory, not a notebook file"
          : `cannot be read (${(error as Error).message})`;
    throw new RunnerError({ notebook: name, detail });
  }
  return parseNotebook(text, name);
}
