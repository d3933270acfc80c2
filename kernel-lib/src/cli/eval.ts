/** `isochor eval`: placeholder until the engine lands (see state/). */
import type { CliIo } from "./io.js";

export async function evalCommand(_argv: string[], io: CliIo): Promise<number> {
  io.stderr("isochor eval: not built yet\n");
  return 1;
}
