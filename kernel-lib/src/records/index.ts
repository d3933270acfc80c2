/**
 * records/: execute notebooks without Jupyter and write calculation records.
 *
 *   readNotebook -> TslabSession (tslab converter + executor, outputs captured) -> executed .ipynb
 *                                                                               -> recordHtml
 *   startRecord (in a cell) -> input/model/results/chart/answer -> show() in the cell
 *                           -> registry -> runner writes <name>.record.html, <name>.record.md
 *                                          and the Markdown's chart images <name>.record-C1.svg ...
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
export { startRecord, CalculationRecord } from "./calculationRecord.js";
export type {
  StartRecordOptions,
  RecordedInput,
  RecordInputOptions,
  RecordBasis,
  ResolvedBasis,
  RecordResultsOptions,
  RecordedTable,
  RecordChartOptions,
  RecordedChart,
  RecordedWarning,
  CalculationRecordContent,
  RecordedMethod,
} from "./calculationRecord.js";
export type { RecordStepOptions, RecordedStep } from "./recordStep.js";
export type { ModelEntry, ModelEntryOptions, RecordableModel } from "./modelEntry.js";
export { processSafetyCaution, SAFETY_TOPICS, isSafetyTopic } from "./processCaution.js";
export type { SafetyTopic } from "./processCaution.js";
export { escapeMarkdown } from "../tables/escapeMarkdown.js";
