/**
 * records/: execute notebooks without Jupyter and write calculation records.
 *
 *   readNotebook -> TslabSession (tslab converter + executor, outputs captured) -> executed .ipynb
 *                                                                               -> recordHtml
 */
export { runNotebooks } from "./runNotebooks.js";
export type { RunNotebooksOptions, RunProgress, NotebookRecord } from "./runNotebooks.js";
export { RunnerError } from "./runnerError.js";
export type { RunnerProblem } from "./runnerError.js";
export { readNotebook, parseNotebook } from "./notebookFormat.js";
export type {
  Notebook,
  NotebookCell,
  NotebookOutput,
  CodeCell,
  MarkdownCell,
  RawCell,
  StreamOutput,
  DisplayDataOutput,
  ExecuteResultOutput,
  ErrorOutput,
  MultilineString,
} from "./notebookFormat.js";
export { recordHtml } from "./recordHtml.js";
export type { RecordInput } from "./recordHtml.js";
export type { RunEnvironment } from "./environment.js";
