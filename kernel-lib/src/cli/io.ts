/** The command line's view of the world, injectable so tests can capture output. */
import * as fs from "node:fs";

export interface CliIo {
  stdout(text: string): void;
  stderr(text: string): void;
  /** Reads all of standard input as UTF-8. */
  readStdin(): Promise<string>;
  /** Current working directory. */
  cwd: string;
  /** Whether stderr is a terminal (live progress lines are drawn only there). Default false. */
  stderrIsTTY?: boolean;
}

export function nodeIo(): CliIo {
  return {
    stdout: (t) => void process.stdout.write(t),
    stderr: (t) => void process.stderr.write(t),
    readStdin: () => Promise.resolve(fs.readFileSync(0, "utf8")),
    cwd: process.cwd(),
    stderrIsTTY: process.stderr.isTTY === true,
  };
}
