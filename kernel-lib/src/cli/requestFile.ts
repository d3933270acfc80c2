/**
 * Reads the JSON request of a batch command (`isochor eval`, `isochor step`) from a file or
 * standard input. A file that cannot be read is reported on stderr; text that is not JSON gets
 * the commands' error object ({ code, message, path: "$" }) on stdout and the message on stderr.
 * Either way the command exits 2.
 */
import * as fs from "node:fs";
import * as path from "node:path";
import { RequestError } from "../errors.js";
import type { CliIo } from "./io.js";

/** The parsed request, or the exit status after a reported failure. */
export type RequestRead = { readonly raw: unknown } | { readonly exit: number };

/** Reads and parses the request `file` (undefined or "-": standard input) for `command`. */
export async function readJsonRequest(
  command: string,
  file: string | undefined,
  io: CliIo,
): Promise<RequestRead> {
  let text: string;
  try {
    text =
      file === undefined || file === "-"
        ? await io.readStdin()
        : fs.readFileSync(path.resolve(io.cwd, file), "utf8");
  } catch (e) {
    io.stderr(
      `isochor ${command}: cannot read ${file ?? "standard input"}: ${e instanceof Error ? e.message : String(e)}\n`,
    );
    return { exit: 2 };
  }
  try {
    // a UTF-8 byte-order mark (some editors write one) is not part of the JSON text
    return { raw: JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text) };
  } catch (e) {
    const err = new RequestError(
      "$",
      `not valid JSON: ${e instanceof Error ? e.message : String(e)}`,
    );
    io.stdout(
      JSON.stringify({ error: { code: err.code, message: err.message, path: err.path } }) + "\n",
    );
    io.stderr(`isochor ${command}: ${err.message}\n`);
    return { exit: 2 };
  }
}
