/**
 * What a calculation record holds, as the renderers (calculationHtml.ts, calculationMarkdown.ts)
 * read it: the recorded inputs, tables, charts and warnings, and the read-only snapshot of the
 * whole record. The record (calculationRecord.ts) fills these; nothing here renders.
 */
import type { RunEnvironment } from "./environment.js";
import type { ModelEntry } from "./modelEntry.js";
import type { SafetyTopic } from "./processCaution.js";

/** An input as recorded: value as given, value in SI, where it came from. */
export interface RecordedInput {
  /** Record-local id, "I1", "I2", ... */
  readonly id: string;
  readonly label: string;
  /** The value as given, in `unit`. */
  readonly value: number | readonly number[];
  /** The unit as given ("-" for a dimensionless value). */
  readonly unit: string;
  /** The value in SI (`unitSI`), what the calculation uses. */
  readonly valueSI: number | readonly number[];
  /** SI unit on the library's molar basis, e.g. "Pa" ("-" for dimensionless). */
  readonly unitSI: string;
  readonly source?: string;
  readonly note?: string;
  /** Atmospheric pressure used for a gauge unit, Pa. */
  readonly atmosphericPressurePa?: number;
  /** The value is a difference (no offset, no atmosphere). */
  readonly difference: boolean;
}

/** What a result or chart was computed from: a model entry and inputs, by object or id. */
export interface RecordBasis {
  model?: ModelEntry | string;
  inputs?: ReadonlyArray<RecordedInput | string>;
}

/** A resolved basis: ids only. */
export interface ResolvedBasis {
  modelId?: string;
  inputIds: string[];
}

/** A results table as recorded. */
export interface RecordedTable {
  readonly id: string;
  readonly caption?: string;
  /** The table's HTML with a Basis column of links (escaped text; links made by the record). */
  readonly html: string;
  readonly markdown: string;
  readonly rows: number;
}

/** A chart as recorded. */
export interface RecordedChart {
  readonly id: string;
  readonly title?: string;
  readonly caption?: string;
  readonly basis: ResolvedBasis;
  /** The chart fragment (static SVG plus live view); the runtime is not included. */
  readonly html: string;
}

/** A warning collected into the record, de-duplicated. */
export interface RecordedWarning {
  readonly code: string;
  readonly message: string;
  /** Where it was raised (table or chart ids, labels), de-duplicated. */
  readonly from: string[];
  /** How many times it was collected. */
  readonly count: number;
}

/** A "Method and assumptions" entry: what was computed and how (a step's method, a note). */
export interface RecordedMethod {
  /** Record-local id, "A1", "A2", ... */
  readonly id: string;
  /** What it is about, e.g. "Cooler E-101". */
  readonly label: string;
  /** The method and its assumptions (plain text). */
  readonly text: string;
}

/** A table or a chart of the record, in the order they were added. */
export type RecordItem =
  { kind: "table"; table: RecordedTable } | { kind: "chart"; chart: RecordedChart };

/** The record's content, for renderers (read-only snapshot). */
export interface CalculationRecordContent {
  readonly anchor: string;
  readonly title: string;
  readonly question: string;
  readonly author?: string;
  readonly site?: string;
  readonly createdAt: Date;
  readonly environment: RunEnvironment;
  readonly topics: readonly SafetyTopic[];
  readonly inputs: readonly RecordedInput[];
  readonly models: readonly ModelEntry[];
  /** "Method and assumptions" entries (shown when there are any). */
  readonly methods?: readonly RecordedMethod[];
  /** Tables and charts in the order they were added. */
  readonly items: ReadonlyArray<RecordItem>;
  readonly warnings: readonly RecordedWarning[];
  readonly cautions: readonly string[];
  readonly answers: readonly string[];
}
