/** The records runner's typed error: which notebook, which cell, and what went wrong. */
import { IsochorError } from "../errors.js";

/** Where and why a run failed. */
export interface RunnerProblem {
  /** Notebook path as the user gave it. */
  notebook: string;
  /** 1-based position of the failing cell among all cells of the notebook, when a cell failed. */
  cellNumber?: number;
  /** Number of cells in the notebook, when known. */
  cellCount?: number;
  /** What went wrong, for an engineer (error name and message, or the file problem). */
  detail: string;
  /**
   * When a cell failed: the HTML record of the run up to and including that cell, written and
   * marked FAILED (title, banner). Undefined when nothing was written.
   */
  failedRecordPath?: string;
  /** When a cell failed: the executed notebook up to and including that cell. */
  failedNotebookPath?: string;
}

/**
 * A notebook could not be read, or one of its cells failed. For a failed cell the run up to it is
 * written, marked FAILED ({@link RunnerProblem.failedRecordPath}); otherwise nothing is.
 */
export class RunnerError extends IsochorError implements RunnerProblem {
  readonly notebook: string;
  readonly cellNumber?: number;
  readonly cellCount?: number;
  readonly detail: string;
  readonly failedRecordPath?: string;
  readonly failedNotebookPath?: string;
  constructor(problem: RunnerProblem) {
    const where =
      problem.cellNumber !== undefined
        ? `${problem.notebook}: cell ${problem.cellNumber}${problem.cellCount !== undefined ? ` of ${problem.cellCount}` : ""} failed`
        : `${problem.notebook}`;
    super("runner-failed", `${where}: ${problem.detail}`);
    this.notebook = problem.notebook;
    this.cellNumber = problem.cellNumber;
    this.cellCount = problem.cellCount;
    this.detail = problem.detail;
    this.failedRecordPath = problem.failedRecordPath;
    this.failedNotebookPath = problem.failedNotebookPath;
  }
}
