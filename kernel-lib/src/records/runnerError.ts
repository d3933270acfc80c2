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
}

/** A notebook could not be read, or one of its cells failed. Nothing was written for it. */
export class RunnerError extends IsochorError implements RunnerProblem {
  readonly notebook: string;
  readonly cellNumber?: number;
  readonly cellCount?: number;
  readonly detail: string;
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
  }
}
