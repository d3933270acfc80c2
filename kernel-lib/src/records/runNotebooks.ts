/**
 * The records runner: executes notebooks in-process through tslab and writes, per notebook,
 * the executed notebook (nbformat 4) and a standalone HTML calculation record.
 *
 *   check every path (exists, nbformat 4, no two outputs with one name)      nothing run yet
 *   for each notebook:  TslabSession in its folder -> cells in order -> outputs captured
 *                       success: <name>.ipynb and <name>.html written to temp names, then renamed,
 *                       plus <name>.record.html / .record.md for each calculation record the
 *                       notebook started (startRecord; the second is <name>.record-2.*, ...)
 *                       first failing cell: <name>.ipynb and <name>.html up to and including it,
 *                       marked FAILED at that cell (title, banner, metadata), no calculation
 *                       record; then RunnerError (notebook, cell, error, the files written)
 *
 * A failed notebook loses any calculation record of it left by an earlier run, and its run record
 * is replaced by the FAILED one, so no file in the output folder claims to be the complete record
 * of a notebook that does not run today.
 */
import * as fs from "node:fs";
import * as path from "node:path";
import { InputError } from "../errors.js";
import { runEnvironment } from "./environment.js";
import type { RunEnvironment } from "./environment.js";
import { firstHeading } from "./markdown.js";
import type { CodeCell, Notebook, NotebookOutput } from "./notebookFormat.js";
import { joinText, readNotebook } from "./notebookFormat.js";
import { recordHtml } from "./recordHtml.js";
import { RunnerError } from "./runnerError.js";
import {
  registeredRecords,
  resetRecordRegistry,
  type RenderedRecordFiles,
} from "./recordRegistry.js";
import { TslabSession } from "./tslabSession.js";

/** Progress events, for a terminal display. */
export type RunProgress =
  | { kind: "notebook-start"; notebook: string; index: number; count: number; codeCells: number }
  | { kind: "session-ready"; notebook: string; elapsedMs: number }
  | {
      kind: "cell-start";
      notebook: string;
      cellNumber: number;
      codeCellIndex: number;
      codeCells: number;
    }
  | {
      kind: "cell-done";
      notebook: string;
      cellNumber: number;
      codeCellIndex: number;
      codeCells: number;
      cellMs: number;
      elapsedMs: number;
      ok: boolean;
    }
  | {
      kind: "notebook-done";
      notebook: string;
      elapsedMs: number;
      recordPath: string;
      executedPath: string;
      /** Calculation records written (HTML and Markdown paths), in the order started. */
      calculationRecordPaths: string[];
    };

/** Options of {@link runNotebooks}. */
export interface RunNotebooksOptions {
  /** Output folder, created if missing. Default "out/records" under the current directory. */
  outDir?: string;
  /** Receives progress events. Default: none. */
  onProgress?: (event: RunProgress) => void;
  /** A cell running longer than this (ms) is interrupted and fails. Default 600000 (10 min). */
  cellTimeoutMs?: number;
}

/** What was written for one notebook. */
export interface NotebookRecord {
  notebook: string;
  title: string;
  executedPath: string;
  recordPath: string;
  codeCells: number;
  elapsedMs: number;
  /** Calculation records the notebook started (startRecord), as written files. */
  calculationRecords: Array<{ title: string; htmlPath: string; markdownPath: string }>;
}

interface PlannedNotebook {
  name: string;
  absolute: string;
  notebook: Notebook;
  stem: string;
  outDir: string;
  executedPath: string;
  recordPath: string;
}

/** File names of the n-th calculation record of a notebook (n from 1). */
function calculationRecordFiles(planned: PlannedNotebook, n: number): { html: string; md: string } {
  const base = path.join(planned.outDir, `${planned.stem}.record${n === 1 ? "" : `-${n}`}`);
  return { html: `${base}.html`, md: `${base}.md` };
}

/** Calculation-record files of this notebook in the output folder (from any run). */
function existingCalculationRecords(planned: PlannedNotebook): string[] {
  const escaped = planned.stem.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  const pattern = new RegExp(`^${escaped}\\.record(-\\d+)?(\\.html|\\.md|-C\\d+\\.svg)$`);
  try {
    return fs
      .readdirSync(planned.outDir)
      .filter((f) => pattern.test(f))
      .map((f) => path.join(planned.outDir, f));
  } catch {
    return [];
  }
}

/** Writes `content` to a temporary file beside `target` (renamed into place once all are written). */
function writeTemp(target: string, content: string): string {
  const temp = path.join(path.dirname(target), `.${path.basename(target)}.${process.pid}.partial`);
  fs.writeFileSync(temp, content);
  return temp;
}

function removeQuietly(file: string): void {
  try {
    fs.rmSync(file, { force: true });
  } catch {
    // best effort: nothing else can be done
  }
}

function plan(paths: string[], outDir: string): PlannedNotebook[] {
  if (!Array.isArray(paths) || paths.length === 0) {
    throw new InputError({
      input: "paths",
      unit: "-",
      validRange: "one or more notebook paths",
      received: paths,
    });
  }
  const byStem = new Map<string, string>();
  return paths.map((name) => {
    if (typeof name !== "string" || name.length === 0) {
      throw new InputError({
        input: "paths",
        unit: "-",
        validRange: "non-empty path strings",
        received: name,
      });
    }
    const absolute = path.resolve(name);
    const notebook = readNotebook(absolute, name);
    const stem = path.basename(absolute).replace(/\.ipynb$/i, "");
    const clash = byStem.get(stem);
    if (clash !== undefined) {
      throw new RunnerError({
        notebook: name,
        detail: `has the same file name as ${clash}; their records would overwrite each other in ${outDir}`,
      });
    }
    byStem.set(stem, name);
    return {
      name,
      absolute,
      notebook,
      stem,
      outDir,
      executedPath: path.join(outDir, `${stem}.ipynb`),
      recordPath: path.join(outDir, `${stem}.html`),
    };
  });
}

/** A notebook saved with tslab's JavaScript kernel ("jslab") runs as JavaScript; all others as TypeScript. */
function isJavaScriptNotebook(notebook: Notebook): boolean {
  const kernelspec = notebook.metadata.kernelspec as
    { name?: unknown; language?: unknown } | undefined;
  const languageInfo = notebook.metadata.language_info as { name?: unknown } | undefined;
  return (
    kernelspec?.name === "jslab" ||
    kernelspec?.language === "javascript" ||
    (kernelspec === undefined && languageInfo?.name === "javascript")
  );
}

function titleOf(notebook: Notebook, absolute: string): string {
  for (const cell of notebook.cells) {
    if (cell.cell_type !== "markdown") continue;
    const heading = firstHeading(joinText(cell.source));
    if (heading) return heading;
  }
  return path.basename(absolute).replace(/\.ipynb$/i, "");
}

/**
 * The executed notebook as nbformat 4 JSON (one space indent, like Jupyter). After a failed cell:
 * the cells up to and including it, and `metadata.isochor.run.failed` says where and why.
 */
function executedNotebookJson(
  notebook: Notebook,
  env: RunEnvironment,
  startedAt: Date,
  failure?: { cellNumber: number; detail: string },
): string {
  const metadata = {
    ...notebook.metadata,
    isochor: {
      run: {
        date: startedAt.toISOString(),
        isochorVersion: env.isochorVersion,
        gitCommit: env.gitCommit,
        node: env.nodeVersion,
        tslab: env.tslabVersion,
        ...(failure
          ? {
              failed: {
                cellNumber: failure.cellNumber,
                cellCount: notebook.cells.length,
                error: failure.detail,
              },
            }
          : {}),
      },
    },
  };
  const cells = failure ? notebook.cells.slice(0, failure.cellNumber) : notebook.cells;
  return JSON.stringify({ ...notebook, metadata, cells }, null, 1) + "\n";
}

/** Writes every file to a temporary name first, then renames them all into place. */
function writeAll(files: ReadonlyArray<{ target: string; content: string }>): void {
  const temps: string[] = [];
  try {
    for (const f of files) temps.push(writeTemp(f.target, f.content));
    files.forEach((f, i) => fs.renameSync(temps[i], f.target));
  } catch (error) {
    temps.forEach(removeQuietly);
    throw error;
  }
}

async function runOne(
  planned: PlannedNotebook,
  index: number,
  count: number,
  options: RunNotebooksOptions,
): Promise<NotebookRecord> {
  const { name, absolute, notebook } = planned;
  const progress = options.onProgress ?? (() => {});
  const cells = notebook.cells;
  const codeCellNumbers = cells.flatMap((c, i) => (c.cell_type === "code" ? [i + 1] : []));
  const started = performance.now();
  const startedAt = new Date();
  progress({
    kind: "notebook-start",
    notebook: name,
    index,
    count,
    codeCells: codeCellNumbers.length,
  });
  const env = runEnvironment(path.dirname(absolute));
  resetRecordRegistry();
  const session = TslabSession.open(path.dirname(absolute), {
    cellTimeoutMs: options.cellTimeoutMs,
    isJS: isJavaScriptNotebook(notebook),
  });
  const cellTimesMs: Array<number | undefined> = cells.map(() => undefined);
  let failure: RunnerError | undefined;
  try {
    progress({ kind: "session-ready", notebook: name, elapsedMs: performance.now() - started });
    let executionCount = 0;
    const earlier: NotebookOutput[][] = [];
    for (let c = 0; c < codeCellNumbers.length; c++) {
      const cellNumber = codeCellNumbers[c];
      const cell = cells[cellNumber - 1] as CodeCell;
      const source = joinText(cell.source);
      if (source.trim() === "") continue; // as Jupyter: empty cells are not executed
      progress({
        kind: "cell-start",
        notebook: name,
        cellNumber,
        codeCellIndex: c + 1,
        codeCells: codeCellNumbers.length,
      });
      executionCount += 1;
      const run = await session.execute(source, executionCount, earlier);
      cell.execution_count = executionCount;
      cell.outputs = run.outputs;
      earlier.push(run.outputs);
      cellTimesMs[cellNumber - 1] = run.elapsedMs;
      progress({
        kind: "cell-done",
        notebook: name,
        cellNumber,
        codeCellIndex: c + 1,
        codeCells: codeCellNumbers.length,
        cellMs: run.elapsedMs,
        elapsedMs: performance.now() - started,
        ok: run.ok,
      });
      if (!run.ok) {
        const error = run.error;
        const firstLine = source.split("\n").find((l) => l.trim() !== "") ?? "";
        failure = new RunnerError({
          notebook: name,
          cellNumber,
          cellCount: cells.length,
          detail:
            `${error ? `${error.ename}: ${error.evalue}` : "the cell failed"}` +
            `\n  cell begins: ${firstLine.trim().slice(0, 120)}`,
        });
        break;
      }
    }
  } finally {
    session.close();
  }
  if (failure !== undefined)
    writeFailedRun(planned, failure, { env, startedAt, started, cellTimesMs });

  const elapsedMs = performance.now() - started;
  const title = titleOf(notebook, absolute);
  const html = recordHtml({
    title,
    notebookName: name,
    executedNotebookFile: path.basename(planned.executedPath),
    startedAt,
    elapsedMs,
    environment: env,
    cells,
    cellTimesMs,
  });
  // Calculation records the notebook started; rendered after the run (charts already drawn).
  const startedRecords = registeredRecords();
  resetRecordRegistry();
  const calculationRecords: NotebookRecord["calculationRecords"] = [];
  const files: Array<{ target: string; content: string }> = [
    { target: planned.executedPath, content: executedNotebookJson(notebook, env, startedAt) },
    { target: planned.recordPath, content: html },
  ];
  for (let i = 0; i < startedRecords.length; i++) {
    const target = calculationRecordFiles(planned, i + 1);
    let rendered: RenderedRecordFiles;
    try {
      rendered = await startedRecords[i].renderFiles({
        imageBase: path.basename(target.md, ".md"),
      });
    } catch (error) {
      throw new RunnerError({
        notebook: name,
        detail: `its calculation record "${startedRecords[i].title}" could not be written: ${error instanceof Error ? error.message : String(error)}`,
      });
    }
    const { html: recordHtmlText, markdown } = rendered;
    files.push(
      { target: target.html, content: recordHtmlText },
      { target: target.md, content: markdown },
      ...(rendered.images ?? []).map((image) => ({
        target: path.join(planned.outDir, image.file),
        content: image.content,
      })),
    );
    calculationRecords.push({
      title: startedRecords[i].title,
      htmlPath: target.html,
      markdownPath: target.md,
    });
  }
  const keep = new Set(files.map((f) => f.target));
  const stale = existingCalculationRecords(planned).filter((f) => !keep.has(f));
  writeAll(files);
  stale.forEach(removeQuietly);
  progress({
    kind: "notebook-done",
    notebook: name,
    elapsedMs,
    recordPath: planned.recordPath,
    executedPath: planned.executedPath,
    calculationRecordPaths: calculationRecords.flatMap((r) => [r.htmlPath, r.markdownPath]),
  });
  return {
    notebook: name,
    title,
    executedPath: planned.executedPath,
    recordPath: planned.recordPath,
    codeCells: codeCellNumbers.length,
    elapsedMs,
    calculationRecords,
  };
}

/**
 * Writes the run of a notebook that failed at a cell: the executed notebook and the HTML record up
 * to and including that cell, both marked FAILED there; removes the notebook's calculation
 * records of earlier runs (its own are not written: they would be incomplete). Then throws the
 * failure, naming the files written.
 */
function writeFailedRun(
  planned: PlannedNotebook,
  failure: RunnerError,
  run: {
    env: RunEnvironment;
    startedAt: Date;
    started: number;
    cellTimesMs: Array<number | undefined>;
  },
): never {
  resetRecordRegistry();
  const stopped = { cellNumber: failure.cellNumber!, detail: failure.detail };
  const html = recordHtml({
    title: titleOf(planned.notebook, planned.absolute),
    notebookName: planned.name,
    executedNotebookFile: path.basename(planned.executedPath),
    startedAt: run.startedAt,
    elapsedMs: performance.now() - run.started,
    environment: run.env,
    cells: planned.notebook.cells,
    cellTimesMs: run.cellTimesMs,
    failure: stopped,
  });
  existingCalculationRecords(planned).forEach(removeQuietly);
  writeAll([
    {
      target: planned.executedPath,
      content: executedNotebookJson(planned.notebook, run.env, run.startedAt, stopped),
    },
    { target: planned.recordPath, content: html },
  ]);
  throw new RunnerError({
    notebook: failure.notebook,
    cellNumber: failure.cellNumber,
    cellCount: failure.cellCount,
    detail: failure.detail,
    failedRecordPath: planned.recordPath,
    failedNotebookPath: planned.executedPath,
  });
}

/**
 * Executes notebooks in order, in-process, and writes their executed copies and HTML records.
 * Stops at the first failing cell.
 * @param paths Notebook files (.ipynb, nbformat 4).
 * @param options See {@link RunNotebooksOptions}.
 * @returns One entry per notebook, in order.
 * @throws RunnerError naming the notebook (and the cell, with its error) when a file is missing or
 *   not a notebook, or a cell fails. For a failed cell the executed notebook and the HTML record
 *   up to and including it are written, marked FAILED (`failedRecordPath`, `failedNotebookPath`);
 *   otherwise nothing is written for that notebook. Either way its calculation records of earlier
 *   runs are removed.
 */
export async function runNotebooks(
  paths: string[],
  options: RunNotebooksOptions = {},
): Promise<NotebookRecord[]> {
  const outDir = path.resolve(options.outDir ?? path.join("out", "records"));
  if (options.cellTimeoutMs !== undefined && !(options.cellTimeoutMs > 0)) {
    throw new InputError({
      input: "options.cellTimeoutMs",
      unit: "ms",
      validRange: "> 0",
      received: options.cellTimeoutMs,
    });
  }
  const planned = plan(paths, outDir);
  fs.mkdirSync(outDir, { recursive: true });
  const records: NotebookRecord[] = [];
  for (let i = 0; i < planned.length; i++) {
    try {
      records.push(await runOne(planned[i], i + 1, planned.length, options));
    } catch (error) {
      if (!(error instanceof RunnerError && error.failedRecordPath !== undefined)) {
        removeQuietly(planned[i].executedPath);
        removeQuietly(planned[i].recordPath);
      }
      existingCalculationRecords(planned[i]).forEach(removeQuietly);
      resetRecordRegistry();
      throw error;
    }
  }
  return records;
}
