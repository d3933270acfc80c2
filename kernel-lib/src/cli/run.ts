/**
 * `isochor run [--out <dir>] <notebook.ipynb...>`: executes notebooks in-process through tslab
 * (no Jupyter) and writes, for each, the executed notebook and an HTML record of the run, plus the
 * calculation records the notebook started with startRecord (HTML and Markdown).
 * Exit codes: 0 all notebooks ran; 1 a notebook is missing, not a notebook, or a cell failed (then
 * its executed notebook and run record up to that cell are written, marked FAILED, and no
 * calculation record); 2 usage error.
 */
import * as path from "node:path";
import { IsochorError } from "../errors.js";
import { RunnerError } from "../records/runnerError.js";
import type { RunProgress } from "../records/runNotebooks.js";
import { parseCliArgs } from "./cliArgs.js";
import type { CliIo } from "./io.js";

const USAGE = `usage: isochor run [--out <dir>] <notebook.ipynb...>

Executes each notebook top to bottom in a fresh TypeScript session (tslab, in-process, no Jupyter)
and writes into the output folder:
  <name>.ipynb          the executed notebook
  <name>.html           the record of the run (every cell and output)
  <name>.record.html    the calculation record started in the notebook with startRecord()
  <name>.record.md      the same record as Markdown (a second record: <name>.record-2.*)
  <name>.record-C1.svg  each chart of the record, shown by the Markdown

A cell that fails stops the run (exit status 1): the executed notebook and the run record are
written up to and including that cell, titled and bannered "FAILED at cell N", and no calculation
record is written.

options:
  --out <dir>                output folder (default: out/records under the current directory)
  --cell-timeout <seconds>   interrupt and fail a cell that runs longer, in s (default 600)
  -h, --help                 show this help

Units are those of the notebooks (isochor computes in SI: K, Pa, mol, J, m3); times are in s.

example:
  npx isochor run --out out/records notebooks/00-start-here.ipynb
`;

interface ParsedArgs {
  outDir: string;
  cellTimeoutMs?: number;
  notebooks: string[];
}

const OPTIONS = {
  out: { needs: "a folder" },
  "cell-timeout": { needs: "a number of seconds > 0" },
} as const;

function parseArgs(argv: string[], cwd: string): ParsedArgs | { error: string } | "help" {
  const args = parseCliArgs(argv, OPTIONS);
  if (args === "help" || "error" in args) return args;
  const { out, "cell-timeout": timeout } = args.values;
  if (out === "") return { error: "--out needs a folder" };
  let cellTimeoutMs: number | undefined;
  if (timeout !== undefined) {
    const seconds = Number(timeout);
    if (timeout.trim() === "" || !(seconds > 0) || !Number.isFinite(seconds)) {
      return {
        error: `--cell-timeout needs a number of seconds > 0; received ${JSON.stringify(timeout)}`,
      };
    }
    cellTimeoutMs = seconds * 1000;
  }
  if (args.positionals.length === 0) return { error: "no notebook given" };
  return {
    outDir: out !== undefined ? path.resolve(cwd, out) : path.join(cwd, "out", "records"),
    notebooks: [...args.positionals],
    cellTimeoutMs,
  };
}

function seconds(ms: number): string {
  return `${(ms / 1000).toFixed(1)} s`;
}

/** A path as the user would type it: relative to cwd when inside it, else absolute. */
function shown(cwd: string, file: string): string {
  const relative = path.relative(cwd, file);
  return relative === ""
    ? "."
    : relative.startsWith("..") || path.isAbsolute(relative)
      ? file
      : relative;
}

function progressPrinter(io: CliIo, cwd: string): (event: RunProgress) => void {
  return (event) => {
    switch (event.kind) {
      case "notebook-start":
        io.stdout(
          `[${event.index}/${event.count}] ${event.notebook} (${event.codeCells} code cells)\n`,
        );
        break;
      case "session-ready":
        io.stdout(`      TypeScript session ready (${seconds(event.elapsedMs)})\n`);
        break;
      case "cell-done":
        io.stdout(
          `      cell ${event.cellNumber} (code ${event.codeCellIndex}/${event.codeCells})` +
            ` ${event.ok ? "ok" : "FAILED"}  ${seconds(event.cellMs)}  [${seconds(event.elapsedMs)}]\n`,
        );
        break;
      case "notebook-done":
        io.stdout(
          `      done in ${seconds(event.elapsedMs)} -> ${shown(cwd, event.recordPath)}, ` +
            `${shown(cwd, event.executedPath)}\n`,
        );
        for (const file of event.calculationRecordPaths ?? []) {
          io.stdout(`      calculation record -> ${shown(cwd, file)}\n`);
        }
        break;
      default:
        break;
    }
  };
}

export async function runCommand(argv: string[], io: CliIo): Promise<number> {
  const parsed = parseArgs(argv, io.cwd);
  if (parsed === "help") {
    io.stdout(USAGE);
    return 0;
  }
  if ("error" in parsed) {
    io.stderr(`isochor run: ${parsed.error}\n\n${USAGE}`);
    return 2;
  }
  // Loaded here so `isochor --help` does not pay for tslab and TypeScript.
  const { runNotebooks } = await import("../records/runNotebooks.js");
  const started = performance.now();
  const previousCwd = process.cwd();
  try {
    // Notebook paths are resolved against io.cwd (the runner resolves against process.cwd()).
    process.chdir(io.cwd);
    const records = await runNotebooks(parsed.notebooks, {
      outDir: parsed.outDir,
      cellTimeoutMs: parsed.cellTimeoutMs,
      onProgress: progressPrinter(io, io.cwd),
    });
    io.stdout(
      `isochor run: ${records.length} notebook${records.length === 1 ? "" : "s"} ran in ` +
        `${seconds(performance.now() - started)}; records in ${shown(io.cwd, parsed.outDir)}\n`,
    );
    return 0;
  } catch (error) {
    if (error instanceof RunnerError) {
      // Problems found before any cell ran (missing file, not a notebook) stop everything; a failed
      // cell or an unwritable calculation record loses that notebook's records only.
      const beforeRun =
        error.cellNumber === undefined && !error.detail.startsWith("its calculation record");
      const consequence = beforeRun
        ? "No notebook was run."
        : error.failedRecordPath !== undefined
          ? `Written up to the failing cell and marked FAILED: ${shown(io.cwd, error.failedRecordPath)}` +
            `${error.failedNotebookPath !== undefined ? `, ${shown(io.cwd, error.failedNotebookPath)}` : ""}` +
            `. No calculation record written for ${error.notebook}.`
          : `No record written for ${error.notebook}.`;
      io.stderr(`isochor run: ${error.message}\n${consequence}\n`);
      return 1;
    }
    if (error instanceof IsochorError) {
      io.stderr(`isochor run: ${error.message}\n`);
      return 1;
    }
    throw error;
  } finally {
    process.chdir(previousCwd);
  }
}
