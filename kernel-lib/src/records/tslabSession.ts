/**
 * One notebook's in-process tslab session: tslab's own converter (TypeScript 5.0 language service
 * rooted at the notebook's folder) and executor, as the tslab kernel creates them, with the kernel's
 * I/O replaced by capture into nbformat outputs. No Jupyter, no Python, no sockets.
 *
 * What the kernel does and this mirrors (tslab/dist/jupyter.js, handleExecuteImpl):
 *  - process.stdout/stderr writes during a cell become "stream" outputs;
 *  - `require("tslab").display.*` calls `jupyter.lastWriteDisplayData(data, update)`: new displays
 *    become "display_data", updates replace every earlier output with the same display id;
 *  - the executor's console interface gets the last expression's value (`log`) and errors and
 *    TypeScript diagnostics (`error`); execute() resolves false when the cell failed.
 * Differences, on purpose: the last value becomes an "execute_result" (the kernel prints it as
 * stdout), a failure becomes an "error" output, and the global `console` is pointed at the capture
 * too (so capture works where a test runner has replaced console).
 */
import { Console } from "node:console";
import * as path from "node:path";
import { Writable } from "node:stream";
import * as util from "node:util";
import { resetDisplaySession } from "../display/displaySession.js";
import { stripAnsi } from "./stripAnsi.js";
import type { ErrorOutput, NotebookOutput } from "./notebookFormat.js";

/** The subset of tslab's internal modules used here (tslab 1.0.22, dist/*.js). */
interface TslabConverter {
  close(): void;
}
interface TslabExecutor {
  execute(src: string): Promise<boolean>;
  interrupt(): void;
  close(): void;
}
interface TslabInternals {
  createConverter(options: { isJS?: boolean; isBrowser?: boolean }): TslabConverter;
  createExecutor(
    rootDir: string,
    convs: { node: TslabConverter; browser: TslabConverter; close(): void },
    console: { log(...args: unknown[]): void; error(...args: unknown[]): void },
  ): TslabExecutor;
  jupyter: { lastWriteDisplayData: null | ((data: DisplayMessage, update: boolean) => void) };
}
interface DisplayMessage {
  data: Record<string, unknown>;
  metadata?: Record<string, unknown>;
  transient?: { display_id?: string };
}

/** Directory of the tslab package that the library and notebooks resolve. */
export function tslabPackageDir(): string {
  return path.dirname(require.resolve("tslab/package.json"));
}

function loadTslab(): TslabInternals {
  const dir = tslabPackageDir();
  /* eslint-disable @typescript-eslint/no-require-imports */
  const converter = require(path.join(dir, "dist/converter.js")) as Pick<
    TslabInternals,
    "createConverter"
  >;
  const executor = require(path.join(dir, "dist/executor.js")) as Pick<
    TslabInternals,
    "createExecutor"
  >;
  const jupyter = require(path.join(dir, "dist/jupyter.js")) as TslabInternals["jupyter"];
  /* eslint-enable @typescript-eslint/no-require-imports */
  return { ...converter, ...executor, jupyter };
}

/** Result of one cell. */
export interface CellRun {
  ok: boolean;
  outputs: NotebookOutput[];
  /** The error output when ok is false. */
  error?: ErrorOutput;
  elapsedMs: number;
}

/** Options of {@link TslabSession.open}. */
export interface TslabSessionOptions {
  /** JavaScript notebooks (tslab's "jslab" kernel): cells are JavaScript, not TypeScript. Default false. */
  isJS?: boolean;
  /** A cell still running after this long (ms) is interrupted and fails. Default 600000 (10 min). */
  cellTimeoutMs?: number;
}

/** Formats an error the way the notebook shows it, as an nbformat error output. */
function errorOutput(reported: unknown[][]): ErrorOutput {
  const errorArgs = reported.find((args) => args[0] instanceof Error);
  if (errorArgs) {
    const error = errorArgs[0] as Error;
    const stack = stripAnsi(error.stack ?? `${error.name}: ${error.message}`);
    return {
      output_type: "error",
      ename: error.name,
      evalue: error.message,
      traceback: stack.split("\n"),
    };
  }
  const lines = reported.map((args) => stripAnsi(util.format(...args)));
  const diagnostic = reported.length > 0 && reported[0][0] === "%s%d:%d - %s";
  if (reported.length === 0) {
    return {
      output_type: "error",
      ename: "Error",
      evalue: "the cell failed without a message",
      traceback: [],
    };
  }
  return {
    output_type: "error",
    ename: diagnostic ? "TypeScript" : "Error",
    evalue: lines.join("\n"),
    traceback: lines,
  };
}

export class TslabSession {
  /** Display id of each output created by a display that can be updated later (newDisplay()). */
  private readonly displayIds = new WeakMap<NotebookOutput, string>();

  private constructor(
    private readonly tslab: TslabInternals,
    private readonly executor: TslabExecutor,
    private readonly notebookDir: string,
    private readonly previousCwd: string,
    private readonly cellTimeoutMs: number,
    private readonly sink: { log: (args: unknown[]) => void; error: (args: unknown[]) => void },
  ) {}

  /**
   * Starts a session rooted at `notebookDir` (it becomes the process's working directory until
   * close(), as in the kernel, so relative imports and files resolve from the notebook's folder).
   */
  static open(notebookDir: string, options: TslabSessionOptions = {}): TslabSession {
    const cellTimeoutMs = options.cellTimeoutMs ?? 600_000;
    if (!(cellTimeoutMs > 0))
      throw new Error(`cellTimeoutMs must be > 0 ms; received ${cellTimeoutMs}`);
    const tslab = loadTslab();
    const previousCwd = process.cwd();
    process.chdir(notebookDir);
    try {
      const node = tslab.createConverter({ isJS: options.isJS ?? false, isBrowser: false });
      let browser: TslabConverter | undefined;
      const convs = {
        node,
        get browser(): TslabConverter {
          browser ??= tslab.createConverter({ isJS: options.isJS ?? false, isBrowser: true });
          return browser;
        },
        close(): void {
          node.close();
          browser?.close();
        },
      };
      const sink = { log: (_args: unknown[]) => {}, error: (_args: unknown[]) => {} };
      const executor = tslab.createExecutor(notebookDir, convs, {
        log: (...args) => sink.log(args),
        error: (...args) => sink.error(args),
      });
      resetDisplaySession();
      return new TslabSession(tslab, executor, notebookDir, previousCwd, cellTimeoutMs, sink);
    } catch (error) {
      process.chdir(previousCwd);
      throw error;
    }
  }

  /**
   * Executes one cell and captures its outputs.
   * @param source The cell's code.
   * @param executionCount The count shown on execute_result outputs.
   * @param earlierOutputs Outputs of earlier cells, for display updates by id.
   */
  async execute(
    source: string,
    executionCount: number,
    earlierOutputs: NotebookOutput[][],
  ): Promise<CellRun> {
    const outputs: NotebookOutput[] = [];
    const reportedErrors: unknown[][] = [];
    const pushStream = (name: "stdout" | "stderr", text: string): void => {
      const last = outputs[outputs.length - 1];
      if (last && last.output_type === "stream" && last.name === name)
        last.text = (last.text as string) + text;
      else outputs.push({ output_type: "stream", name, text });
    };
    const streamOf = (name: "stdout" | "stderr"): Writable =>
      new Writable({
        write(chunk: Buffer | string, _encoding, done): void {
          pushStream(name, typeof chunk === "string" ? chunk : chunk.toString("utf8"));
          done();
        },
      });
    const hookWrite =
      (name: "stdout" | "stderr") =>
      (chunk: unknown, ...rest: unknown[]): boolean => {
        pushStream(
          name,
          typeof chunk === "string" ? chunk : Buffer.from(chunk as Uint8Array).toString("utf8"),
        );
        const callback = rest.find((r) => typeof r === "function") as (() => void) | undefined;
        callback?.();
        return true;
      };

    this.sink.log = (args) => {
      outputs.push({
        output_type: "execute_result",
        execution_count: executionCount,
        data: { "text/plain": util.format(...args) },
        metadata: {},
      });
    };
    this.sink.error = (args) => void reportedErrors.push(args);
    this.tslab.jupyter.lastWriteDisplayData = (message, update) => {
      const id = message.transient?.display_id;
      const output: NotebookOutput = {
        output_type: "display_data",
        data: { ...message.data },
        metadata: { ...(message.metadata ?? {}) },
      };
      if (update && id) {
        for (const list of [...earlierOutputs, outputs]) {
          for (const old of list) {
            if (this.displayIds.get(old) === id) {
              (old as { data: Record<string, unknown> }).data = output.data;
            }
          }
        }
        return;
      }
      if (id) this.displayIds.set(output, id);
      outputs.push(output);
    };

    const stdoutWrite = process.stdout.write;
    const stderrWrite = process.stderr.write;
    const globalConsole = globalThis.console;
    let uncaught: unknown;
    const onUncaught = (error: unknown): void => {
      uncaught ??= error;
      this.executor.interrupt();
    };
    process.stdout.write = hookWrite("stdout") as typeof process.stdout.write;
    process.stderr.write = hookWrite("stderr") as typeof process.stderr.write;
    globalThis.console = new Console({ stdout: streamOf("stdout"), stderr: streamOf("stderr") });
    process.on("uncaughtException", onUncaught);
    process.on("unhandledRejection", onUncaught);
    const timer = setTimeout(() => this.executor.interrupt(), this.cellTimeoutMs);
    const started = performance.now();
    let ok: boolean;
    try {
      ok = await this.executor.execute(source);
    } catch (error) {
      reportedErrors.push([error]);
      ok = false;
    } finally {
      clearTimeout(timer);
      process.stdout.write = stdoutWrite;
      process.stderr.write = stderrWrite;
      globalThis.console = globalConsole;
      process.off("uncaughtException", onUncaught);
      process.off("unhandledRejection", onUncaught);
    }
    const elapsedMs = performance.now() - started;
    if (uncaught !== undefined) {
      ok = false;
      reportedErrors.unshift([uncaught instanceof Error ? uncaught : new Error(String(uncaught))]);
    }
    if (ok) {
      // Diagnostics of %module cells are reported while execute() still succeeds: keep as stderr.
      for (const args of reportedErrors) pushStream("stderr", util.format(...args) + "\n");
      return { ok, outputs, elapsedMs };
    }
    const timedOut =
      elapsedMs >= this.cellTimeoutMs &&
      reportedErrors.some(
        (a) => a[0] instanceof Error && a[0].message === "Interrupted asynchronously",
      );
    const error = timedOut
      ? errorOutput([
          [new Error(`the cell ran longer than ${this.cellTimeoutMs} ms and was interrupted`)],
        ])
      : errorOutput(reportedErrors);
    outputs.push(error);
    return { ok, outputs, error, elapsedMs };
  }

  /** Closes the TypeScript services and restores the working directory. */
  close(): void {
    this.tslab.jupyter.lastWriteDisplayData = null;
    try {
      this.executor.close();
    } finally {
      process.chdir(this.previousCwd);
    }
  }

  /** The folder the session runs in. */
  get directory(): string {
    return this.notebookDir;
  }
}
