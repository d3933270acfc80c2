/**
 * Node-only: reads a CSV file from disk and parses it with parsePvtCsv (the browser-safe parser).
 * Not exported from core.ts (it imports fs); exported from index.ts for notebooks and the CLI.
 */
import * as fs from "node:fs";
import { InputError } from "../errors.js";
import { parsePvtCsv } from "./parsePvtCsv.js";
import type { ParsePvtCsvOptions } from "./parsePvtCsv.js";
import type { PvtDataset } from "./types.js";

/** Reads `path` (UTF-8) and parses it; error messages name the file. */
export function readPvtCsvFile(
  path: string,
  options: Omit<ParsePvtCsvOptions, "source"> = {},
): PvtDataset {
  let text: string;
  try {
    text = fs.readFileSync(path, "utf8");
  } catch (e) {
    throw new InputError({
      input: "file",
      unit: "-",
      validRange: "a readable CSV file",
      received: path,
      hint: e instanceof Error ? e.message : String(e),
    });
  }
  return parsePvtCsv(text, { ...options, source: path });
}
