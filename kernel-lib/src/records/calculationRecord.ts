/**
 * A calculation record that a notebook fills as it goes: the question, the inputs (as given and in
 * SI, with their sources), the models (citations, reference state, validity, k_ij provenance), the
 * results tables and charts (each tied to the model and inputs it used), the warnings the engine
 * raised, the cautions, and the environment. It shows itself in a cell (`show()`), and
 * `isochor run` writes it as `<notebook>.record.html` and `<notebook>.record.md` (with each chart
 * as `<notebook>.record-C1.svg` ... beside it, drawn by the Markdown).
 *
 *   startRecord({ question }) -> input() / model() -> results() / chart() -> answer() -> show()
 *                                 ids I1.., M1..       ids T1.., C1.. (basis: M and I ids)
 *
 * Every string given here is plain text: the renderers escape it for HTML and Markdown.
 */
import { randomBytes } from "node:crypto";
import { InputError, type ResultWarning } from "../errors.js";
import type { ResultTable, TableColumn } from "../tables/columns.js";
import { isResultTable } from "../tables/columns.js";
import { chartMeta } from "../charts/chartSpec.js";
import { chartFigure } from "../display/chartHtml.js";
import { chartTitle } from "../display/chartTitle.js";
import { displaySession } from "../display/displaySession.js";
import { displayHtml, inTslabKernel } from "../display/tslabDisplay.js";
import { vegaRuntimeScript } from "../display/vegaRuntime.js";
import type { VegaLiteSpec } from "../display/vegaLiteSpec.js";
import { escapeHtml } from "../display/escapeHtml.js";
import { runEnvironment, type RunEnvironment } from "./environment.js";
import {
  modelEntry,
  type ModelEntry,
  type ModelEntryOptions,
  type RecordableModel,
} from "./modelEntry.js";
import { checkSafetyTopics, processSafetyCaution, type SafetyTopic } from "./processCaution.js";
import {
  calculationRecordDocument,
  calculationRecordFragment,
  calculationRecordPiece,
} from "./calculationHtml.js";
import { calculationRecordMarkdown } from "./calculationMarkdown.js";
import { basisLinks, resolveBasis } from "./recordBasis.js";
import type {
  CalculationRecordContent,
  RecordBasis,
  RecordedChart,
  RecordedInput,
  RecordedMethod,
  RecordedTable,
  RecordItem,
  ResolvedBasis,
} from "./recordContent.js";
import { recordedInput, type RecordInputOptions } from "./recordInput.js";
import { recordTableText, type RecordResultsOptions } from "./recordTable.js";
import { INSPECT, optionalText, requireText, withSummary } from "./recordText.js";
import { RecordWarnings } from "./recordWarnings.js";
import type { StepResult } from "../process/types.js";
import { recordStep, type RecordedStep, type RecordStepOptions } from "./recordStep.js";
import {
  registerRecord,
  type RenderFilesOptions,
  type RenderedRecordFiles,
} from "./recordRegistry.js";

// The record's content types live in recordContent.ts (the renderers read them without importing
// the record); they are re-exported here, where the public index has always found them.
export type {
  CalculationRecordContent,
  RecordBasis,
  RecordedChart,
  RecordedInput,
  RecordedMethod,
  RecordedTable,
  RecordedWarning,
  ResolvedBasis,
} from "./recordContent.js";
export type { RecordInputOptions } from "./recordInput.js";
export type { RecordResultsOptions } from "./recordTable.js";
export { basisLinks, basisText } from "./recordBasis.js";

/** Options of {@link startRecord}. */
export interface StartRecordOptions {
  /** The question the calculation answers (plain text). Required. */
  question: string;
  /** Short title. Default: the question. */
  title?: string;
  /** Who prepared the calculation (plain text). Default: not shown. */
  author?: string;
  /** Site, unit or equipment (plain text), e.g. "Corvid Point Refinery (invented), FG-100". */
  site?: string;
  /**
   * Safety topics this calculation touches. Any topic adds the standard caution automatically
   * (see {@link processSafetyCaution}). Default: none.
   */
  topics?: SafetyTopic[];
  /** Register the record so `isochor run` writes its files. Default true. */
  register?: boolean;
  /**
   * Show each results table, chart and answer in the cell that adds it, so the record grows in
   * the notebook as it is filled. Default: true inside a tslab kernel (or `isochor run`), false
   * elsewhere (scripts, tests).
   */
  live?: boolean;
}

/** Options of {@link CalculationRecord.chart}. */
export interface RecordChartOptions extends RecordBasis {
  /** Caption under the chart (plain text). Default: none. */
  caption?: string;
}

/**
 * A calculation record being filled. Create it with {@link startRecord}.
 */
export class CalculationRecord {
  readonly anchor: string;
  readonly title: string;
  readonly question: string;
  readonly author?: string;
  readonly site?: string;
  readonly createdAt: Date;
  readonly environment: RunEnvironment;
  /** Tables, charts and answers show in the cell that adds them. */
  readonly live: boolean;
  private readonly topicList: SafetyTopic[];
  private readonly inputList: RecordedInput[] = [];
  private readonly modelList: ModelEntry[] = [];
  private readonly methodList: RecordedMethod[] = [];
  private readonly itemList: RecordItem[] = [];
  private readonly warningList = new RecordWarnings();
  private readonly cautionList: string[] = [];
  private readonly answerList: string[] = [];
  private readonly pending = new Set<Promise<unknown>>();
  private tableCount = 0;
  private chartCount = 0;
  /** The static SVG of each chart, by chart id (for the Markdown form's image files). */
  private readonly chartSvgs = new Map<string, string>();

  /** @internal Use {@link startRecord}. */
  constructor(options: StartRecordOptions) {
    if (options === null || typeof options !== "object") {
      throw new InputError({
        input: "options",
        unit: "-",
        validRange: "{ question: string, ... }",
        received: options,
      });
    }
    this.question = requireText(options.question, "options.question");
    this.title = optionalText(options.title, "options.title") ?? this.question;
    this.author = optionalText(options.author, "options.author");
    this.site = optionalText(options.site, "options.site");
    this.topicList = checkSafetyTopics(options.topics, "options.topics");
    this.createdAt = new Date();
    this.environment = runEnvironment(process.cwd());
    this.anchor = "rec-" + randomBytes(4).toString("hex");
    if (options.live !== undefined && typeof options.live !== "boolean") {
      throw new InputError({
        input: "options.live",
        unit: "-",
        validRange: "true or false",
        received: options.live,
      });
    }
    this.live = options.live ?? inTslabKernel();
  }

  /** One line for a notebook cell that ends with the record (e.g. `rec.answer(...)`). */
  [INSPECT](): string {
    const count = (n: number, what: string) => `${n} ${what}${n === 1 ? "" : "s"}`;
    const tables = this.itemList.filter((i) => i.kind === "table").length;
    return (
      `calculation record "${this.title}": ${count(this.inputList.length, "input")}, ` +
      `${count(this.modelList.length, "model")}, ${count(tables, "table")}, ` +
      `${count(this.itemList.length - tables, "chart")}, ${count(this.warningList.size, "warning")}` +
      ` (rec.show() displays it)`
    );
  }

  /** Safety topics of this record. */
  get topics(): readonly SafetyTopic[] {
    return [...this.topicList];
  }

  /** Tags the record with safety topics (the standard caution then appears). Returns the record. */
  tag(...topics: SafetyTopic[]): this {
    for (const t of checkSafetyTopics(topics, "topics")) {
      if (!this.topicList.includes(t)) this.topicList.push(t);
    }
    return this;
  }

  /**
   * Records an input: the value as given, converted to SI through units/.
   * @param label What it is, e.g. "NHT-2 recycle gas pressure".
   * @param value A number, or a list of numbers (a composition).
   * @param unit Unit as written ("barg", "degC", "kJ/kg", ...) or "-" for dimensionless.
   * @returns The recorded input; use `.valueSI` in the calculation and pass it to `results()`.
   * @example const P = rec.input("inlet pressure", 32, "barg", { source: "DCS tag PT-2101, invented" });
   */
  input(
    label: string,
    value: number | readonly number[],
    unit: string,
    options: RecordInputOptions = {},
  ): RecordedInput {
    const recorded = recordedInput(`I${this.inputList.length + 1}`, label, value, unit, options);
    this.inputList.push(recorded);
    return recorded;
  }

  /**
   * Records a model: from a Fluid it pulls the citation, reference state, validity, ideal-gas
   * routes, k_ij sources and the pairs defaulted to zero (which also become a warning).
   * @example const m = rec.model(gas, { label: "Fuel-gas streams, Peng-Robinson" });
   */
  model(subject: RecordableModel, options: ModelEntryOptions = {}): ModelEntry {
    const entry = modelEntry(`M${this.modelList.length + 1}`, subject, options);
    Object.defineProperty(entry, INSPECT, {
      value: () => `${entry.id} ${entry.label}: ${entry.name} (recorded)`,
      enumerable: false,
    });
    this.modelList.push(entry);
    if (entry.defaultedPairs.length > 0) {
      this.addWarning(
        {
          code: "model-limitation",
          message: `k_ij set to zero for lack of a tabulated value: ${entry.defaultedPairs.join(", ")}`,
        },
        entry.id,
      );
    }
    return entry;
  }

  /**
   * Adds an entry to the "Method and assumptions" section: what was computed and how, with its
   * assumptions (a process step's `method`, a note on a correlation's use, ...).
   * @example rec.method("Cooler E-101", result.method)
   */
  method(label: string, text: string): RecordedMethod {
    const entry: RecordedMethod = {
      id: `A${this.methodList.length + 1}`,
      label: requireText(label, "label"),
      text: requireText(text, "text"),
    };
    this.methodList.push(entry);
    return entry;
  }

  /**
   * Records a process step: its inlets as inputs, the fluid's model, its method and assumptions,
   * its caution, the path chart (the heat curve of a heater, cooler or exchanger; the P-h path
   * otherwise), the stream table, the power and duty, and its warnings (see records/recordStep.ts).
   * @example await rec.step(cooler(gas, { outletTemperatureK: 313.15 }), { label: "E-101 cooler" })
   */
  async step(result: StepResult, options: RecordStepOptions = {}): Promise<RecordedStep> {
    return recordStep(this, result, options);
  }

  /**
   * Records a results table (rendered with tables/), with a Basis column linking each row to the
   * model entry and inputs it used. Warnings carried by the rows (`row.warnings`) are collected.
   * @param rows Row objects, SI values (e.g. FluidState objects or your own).
   * @param columns Column specs of tables/ (units to show, significant figures).
   * @example rec.results(states, cols, { caption: "Inlet states", model: m, inputs: [T, P] })
   * @example rec.results(stateTable(states, { names }), { caption: "Inlet states", model: m })
   */
  results(table: ResultTable, options?: RecordResultsOptions): RecordedTable;
  results(
    rows: readonly Record<string, unknown>[],
    columns: readonly TableColumn[],
    options?: RecordResultsOptions,
  ): RecordedTable;
  results(
    first: readonly Record<string, unknown>[] | ResultTable,
    second?: readonly TableColumn[] | RecordResultsOptions,
    third?: RecordResultsOptions,
  ): RecordedTable {
    // a table of stateTable / stepTable: its options, overridden by the ones given here
    const rows = isResultTable(first) ? first.rows : first;
    const columns = isResultTable(first) ? first.columns : (second as readonly TableColumn[]);
    const options: RecordResultsOptions = isResultTable(first)
      ? { ...first.options, ...(second as RecordResultsOptions | undefined) }
      : (third ?? {});
    const id = `T${this.tableCount + 1}`;
    const caption = optionalText(options.caption, "options.caption");
    if (!Array.isArray(rows)) {
      throw new InputError({
        input: "rows",
        unit: "-",
        validRange: "an array of objects",
        received: rows,
      });
    }
    if (options.rowBasis !== undefined && typeof options.rowBasis !== "function") {
      throw new InputError({
        input: "options.rowBasis",
        unit: "-",
        validRange: "a function (row, index) => { model, inputs }",
        received: options.rowBasis,
      });
    }
    const tableBasis = this.resolveBasis(options, "options");
    const bases = rows.map((row, i) =>
      options.rowBasis
        ? this.resolveBasis({ ...options, ...options.rowBasis(row, i) }, `rowBasis(row ${i})`)
        : tableBasis,
    );
    const { html, markdown } = recordTableText(
      rows,
      columns,
      { ...options, title: caption !== undefined ? `${id}. ${caption}` : id },
      bases,
      this.anchor,
    );
    rows.forEach((row) => this.collectWarnings(row, { from: id }));
    this.tableCount += 1;
    const table: RecordedTable = withSummary(
      { id, caption, html, markdown, rows: rows.length },
      `${id} recorded (${caption !== undefined ? `${caption}, ` : ""}${rows.length} rows)`,
    );
    this.itemList.push({ kind: "table", table });
    if (this.live) displayHtml(this.scoped(html));
    return table;
  }

  /**
   * Records a chart: drawn now (static SVG), live in the HTML record. Warnings the chart builder
   * raised (`usermeta.isochor.warnings`) are collected.
   * @example await rec.chart(pressureEnthalpyChart(data), { caption: "Letdown path", model: m })
   */
  async chart(spec: VegaLiteSpec, options: RecordChartOptions = {}): Promise<RecordedChart> {
    if (spec === null || typeof spec !== "object" || Array.isArray(spec)) {
      throw new InputError({
        input: "spec",
        unit: "-",
        validRange: "a Vega-Lite spec object",
        received: spec,
      });
    }
    const caption = optionalText(options.caption, "options.caption");
    const basis = this.resolveBasis(options, "options");
    this.chartCount += 1;
    const id = `C${this.chartCount}`;
    const slot: { kind: "chart"; chart: RecordedChart } = {
      kind: "chart",
      chart: { id, caption, basis, html: "" },
    };
    this.itemList.push(slot); // keeps its place even if another chart finishes first
    const work = chartFigure(spec, { caption: caption !== undefined ? `${id}. ${caption}` : id });
    this.pending.add(work);
    try {
      const { html, svg } = await work;
      this.chartSvgs.set(id, svg);
      const title = chartTitle(spec);
      slot.chart = withSummary({ id, title, caption, basis, html }, `${id} recorded (chart)`);
    } catch (error) {
      this.itemList.splice(this.itemList.indexOf(slot), 1);
      throw error;
    } finally {
      this.pending.delete(work);
    }
    for (const w of chartMeta(spec)?.warnings ?? []) {
      this.addWarning({ code: "accuracy", message: w }, id);
    }
    if (this.live) {
      const session = displaySession();
      const runtime = session.runtimeSent ? "" : vegaRuntimeScript() + "\n";
      displayHtml(
        runtime +
          this.scoped(
            slot.chart.html +
              `<div class="calc-basis">Basis of ${id}: ${basisLinks(this.anchor, basis)}</div>`,
          ),
      );
      session.runtimeSent = true;
    }
    return slot.chart;
  }

  /**
   * Collects the warnings of results: a ResultWarning, a list of them, an object with `warnings`
   * (a state, a saturation result, ...), or a list of such objects. De-duplicated by message.
   * @param options.from Where they came from (plain text or an id). Default: not given.
   * @returns How many warnings were found in `source`.
   */
  collectWarnings(source: unknown, options: { from?: string } = {}): number {
    const from = optionalText(options.from, "options.from");
    return this.warningList.collect(source, from);
  }

  /**
   * Adds a caution. Without text, the standard caution for process calculations that can hurt
   * someone (it names the record's topics).
   */
  caution(text?: string): this {
    const given = optionalText(text, "text");
    const caution = given ?? processSafetyCaution(this.topicList);
    if (!this.cautionList.includes(caution)) this.cautionList.push(caution);
    return this;
  }

  /** States the answer to the question (plain text; may be called more than once). */
  answer(text: string): this {
    const answer = requireText(text, "text");
    this.answerList.push(answer);
    if (this.live)
      displayHtml(this.scoped(`<div class="calc-answer"><p>${escapeHtml(answer)}</p></div>`));
    return this;
  }

  /** Wraps a piece of the record for display in a cell, with the record's styles. */
  private scoped(html: string): string {
    return calculationRecordPiece(html);
  }

  /** A snapshot of the content, with the automatic caution when the record has safety topics. */
  content(): CalculationRecordContent {
    const standard = processSafetyCaution(this.topicList);
    const hasStandard = this.cautionList.some((c) => c.startsWith(standard.slice(0, 40)));
    const cautions =
      this.topicList.length > 0 && !hasStandard
        ? [standard, ...this.cautionList]
        : [...this.cautionList];
    return {
      anchor: this.anchor,
      title: this.title,
      question: this.question,
      author: this.author,
      site: this.site,
      createdAt: this.createdAt,
      environment: this.environment,
      topics: [...this.topicList],
      inputs: [...this.inputList],
      models: [...this.modelList],
      methods: [...this.methodList],
      items: this.itemList.filter((i) => i.kind === "table" || i.chart.html !== ""),
      warnings: this.warningList.list(),
      cautions,
      answers: [...this.answerList],
    };
  }

  /** Waits for charts still being drawn (started without `await`). */
  async settled(): Promise<void> {
    while (this.pending.size > 0) await Promise.allSettled([...this.pending]);
  }

  /** The record as an HTML fragment (scoped styles, no runtime), for a notebook cell. */
  html(): string {
    return calculationRecordFragment(this.content());
  }

  /** The record as a standalone HTML document (charts live, nothing loaded from the network). */
  async document(): Promise<string> {
    await this.settled();
    return calculationRecordDocument(this.content());
  }

  /**
   * The record as Markdown (charts are listed; they are drawn in the HTML record, and in the
   * Markdown files `isochor run` writes, which come with the charts as SVG files).
   */
  async markdown(): Promise<string> {
    await this.settled();
    return calculationRecordMarkdown(this.content());
  }

  /** Shows the record so far in the current tslab cell. */
  async show(): Promise<void> {
    await this.settled();
    const session = displaySession();
    const hasCharts = this.itemList.some((i) => i.kind === "chart");
    const includeRuntime = hasCharts && !session.runtimeSent;
    displayHtml((includeRuntime ? vegaRuntimeScript() + "\n" : "") + this.html());
    if (includeRuntime) session.runtimeSent = true;
  }

  private addWarning(warning: ResultWarning, from: string | undefined): void {
    this.warningList.add(warning, from);
  }

  private resolveBasis(basis: RecordBasis, where: string): ResolvedBasis {
    return resolveBasis(basis, where, this.modelList, this.inputList);
  }

  /**
   * @internal What the runner asks for. With `imageBase`, every chart is also an SVG file named
   * `<imageBase>-<chart id>.svg`, which the Markdown shows (it is written beside the Markdown).
   */
  async renderFiles(options: RenderFilesOptions = {}): Promise<RenderedRecordFiles> {
    await this.settled();
    const content = this.content();
    const base = options.imageBase;
    // chart id -> image file name (none without an image base)
    const fileOf = new Map<string, string>();
    if (base !== undefined)
      for (const id of this.chartSvgs.keys()) fileOf.set(id, `${base}-${id}.svg`);
    const images = [...fileOf].map(([id, file]) => ({ file, content: this.chartSvgs.get(id)! }));
    return {
      html: calculationRecordDocument(content),
      markdown: calculationRecordMarkdown(content, { chartImage: (id) => fileOf.get(id) }),
      images,
    };
  }
}

/**
 * Starts a calculation record. In a notebook run by `isochor run` the record is also written as
 * `<notebook>.record.html` and `<notebook>.record.md` beside the notebook's own record.
 * @example
 * const rec = startRecord({
 *   question: "How far does the SGP-4 overhead gas cool across its letdown valve?",
 *   site: "Corvid Point Refinery (invented)",
 *   topics: ["low-metal-temperature"],
 * });
 */
export function startRecord(options: StartRecordOptions): CalculationRecord {
  const record = new CalculationRecord(options);
  if (options.register ?? true) {
    registerRecord({ title: record.title, renderFiles: (o) => record.renderFiles(o) });
  }
  return record;
}
