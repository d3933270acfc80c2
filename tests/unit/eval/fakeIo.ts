/** A captured CliIo for the `isochor eval` tests: stdin given, stdout and stderr collected. */
import type { CliIo } from "../../../kernel-lib/src/cli/io.js";

export function fakeIo(stdin: string): CliIo & { out: string; err: string } {
  const io = {
    out: "",
    err: "",
    stdout(t: string) {
      io.out += t;
    },
    stderr(t: string) {
      io.err += t;
    },
    readStdin: () => Promise.resolve(stdin),
    cwd: process.cwd(),
  };
  return io;
}
