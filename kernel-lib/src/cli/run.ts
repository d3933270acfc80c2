/** `isochor run`: placeholder until the records runner lands (see records/). */
import type { CliIo } from "./io.js";

export async function runCommand(_argv: string[], io: CliIo): Promise<number> {
  io.stderr("isochor run: not built yet\n");
  return 1;
}
