/**
 * The standalone HTML calculation record of one executed notebook: one file, no network, readable
 * on screen and on paper. Layout:
 *
 *   header   kicker, title (first markdown heading), facts: notebook, run date, cells, duration,
 *            isochor version + git commit, Node / tslab / TypeScript versions, completion statement
 *   main     markdown cells as prose; code cells as numbered source blocks with their outputs
 *
 * A run that failed at a cell gives a record that cannot pass for a complete one: the title
 * starts "FAILED at cell N", a banner in place of the completion statement says which cell failed
 * and why, the cells stop at the failing one (marked FAILED), and the footer repeats it.
 *   footer   how the record was produced
 *
 * Scripts that a page needs once (RUNTIME_MARKER_ATTRIBUTE, e.g. the chart runtime) are lifted out
 * of the outputs into the head, one copy each, so charts go live once the page has loaded.
 * Every string from the notebook is escaped except HTML outputs, which are the notebook's own
 * display output and go in as displayed in Jupyter.
 */
import { stripAnsi } from "./stripAnsi.js";
import { escapeHtml } from "../display/escapeHtml.js";
import { RUNTIME_MARKER_ATTRIBUTE } from "../display/vegaRuntime.js";
import type { RunEnvironment } from "./environment.js";
import { renderMarkdown } from "./markdown.js";
import { formatRecordDate } from "./recordDate.js";
import type { NotebookCell, NotebookOutput } from "./notebookFormat.js";
import { joinText } from "./notebookFormat.js";

/** What a record shows. */
export interface RecordInput {
  title: string;
  /** Notebook path as given on the command line (shown, escaped). */
  notebookName: string;
  /** File name of the executed notebook written beside the record. */
  executedNotebookFile: string;
  startedAt: Date;
  elapsedMs: number;
  environment: RunEnvironment;
  cells: NotebookCell[];
  /** Run time of each cell in ms (undefined for cells not executed). */
  cellTimesMs: Array<number | undefined>;
  /** The run stopped at this cell (1-based, among all cells) for this reason. Default: it ran to the end. */
  failure?: { cellNumber: number; detail: string };
}

const ONCE_SCRIPT = new RegExp(
  `<script ${RUNTIME_MARKER_ATTRIBUTE}="([^"]*)">([\\s\\S]*?)</script>`,
  "g",
);

/** Removes once-per-page scripts from an HTML output, collecting the first copy of each. */
function liftOnceScripts(html: string, lifted: Map<string, string>): string {
  return html.replace(ONCE_SCRIPT, (whole: string, key: string) => {
    if (!lifted.has(key)) lifted.set(key, whole);
    return "";
  });
}

function text(value: unknown): string {
  return Array.isArray(value) ? value.join("") : String(value ?? "");
}

function pre(className: string, content: string): string {
  return `<pre class="${className}">${escapeHtml(stripAnsi(content))}</pre>`;
}

/**
 * The record's own guarantee that it loads nothing: no fetch, frame, font or image from anywhere
 * but the page itself (data: URIs). Inline scripts run (charts); vega compiles its expressions
 * with Function, hence 'unsafe-eval'.
 */
export const CONTENT_SECURITY_POLICY = [
  "default-src 'none'",
  "script-src 'unsafe-inline' 'unsafe-eval'",
  "style-src 'unsafe-inline'",
  "img-src data:",
  "font-src data:",
  "connect-src 'none'",
  "form-action 'none'",
  "base-uri 'none'",
].join("; ");

/**
 * A record document from its doctype to the opening `<body>` (with the newline after it): the
 * CONTENT_SECURITY_POLICY, a generator tag "isochor <version> (<generatedBy>)", the title
 * "<title> - calculation record", the page's CSS and the scripts its head needs. The version and
 * the title are escaped here; `css` and `headScripts` go in as given.
 */
export function recordDocumentHead(page: {
  isochorVersion: string;
  generatedBy: string;
  title: string;
  css: string;
  headScripts: string;
}): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="Content-Security-Policy" content="${CONTENT_SECURITY_POLICY}">
<meta name="generator" content="isochor ${escapeHtml(page.isochorVersion)} (${page.generatedBy})">
<title>${escapeHtml(page.title)} - calculation record</title>
<style>${page.css}</style>
${page.headScripts}
</head>
<body>
`;
}

const IMAGE_TYPES = ["image/png", "image/jpeg", "image/gif"];

/** Renders one rich output bundle, richest type first. */
function renderBundle(data: Record<string, unknown>, lifted: Map<string, string>): string {
  if ("text/html" in data)
    return `<div class="html">${liftOnceScripts(text(data["text/html"]), lifted)}</div>`;
  if ("image/svg+xml" in data) {
    // As an <img>: an SVG document shown this way cannot run scripts or load anything.
    const b64 = Buffer.from(text(data["image/svg+xml"]), "utf8").toString("base64");
    return `<div class="image"><img alt="SVG output" src="data:image/svg+xml;base64,${b64}"></div>`;
  }
  for (const type of IMAGE_TYPES) {
    if (type in data) {
      const b64 = text(data[type]).replace(/[^A-Za-z0-9+/=]/g, "");
      return `<div class="image"><img alt="${type} output" src="data:${type};base64,${b64}"></div>`;
    }
  }
  if ("text/markdown" in data)
    return `<div class="markdown">${renderMarkdown(text(data["text/markdown"]))}</div>`;
  if ("application/json" in data)
    return pre("text", JSON.stringify(data["application/json"], null, 2));
  if ("text/latex" in data) return pre("text", text(data["text/latex"]));
  if ("text/plain" in data) return pre("text", text(data["text/plain"]));
  return `<p class="note">Output of type ${escapeHtml(Object.keys(data).join(", "))} not shown.</p>`;
}

function renderOutput(output: NotebookOutput, lifted: Map<string, string>): string {
  switch (output.output_type) {
    case "stream":
      return pre(output.name === "stderr" ? "stream stderr" : "stream", joinText(output.text));
    case "display_data":
      return renderBundle(output.data, lifted);
    case "execute_result":
      return `<div class="result">${renderBundle(output.data, lifted)}</div>`;
    case "error":
      return pre(
        "error",
        [`${output.ename}: ${output.evalue}`, ...output.traceback.slice(1)].join("\n"),
      );
  }
}

function formatSeconds(ms: number): string {
  if (ms < 1000) return `${(ms / 1000).toFixed(2)} s`;
  if (ms < 60_000) return `${(ms / 1000).toFixed(1)} s`;
  return `${Math.floor(ms / 60_000)} min ${Math.round((ms % 60_000) / 1000)} s`;
}

const CSS = `
:root { --ink:#1e2830; --muted:#5d6971; --rule:#d3d9de; --paper:#ffffff; --code:#f4f6f7;
  --accent:#8c4a1f; --ok:#2f6b3f; --warn:#8a5a00; }
* { box-sizing: border-box; }
html { background: #eceff1; }
body { margin: 0 auto; max-width: 62rem; background: var(--paper); color: var(--ink);
  font: 15px/1.55 system-ui, "Segoe UI", "DejaVu Sans", Helvetica, Arial, sans-serif; padding: 2.2rem 2.6rem 3rem; }
header.record-head { border-bottom: 3px double var(--ink); padding-bottom: 1rem; margin-bottom: 1.6rem; }
.kicker { text-transform: uppercase; letter-spacing: .14em; font-size: .72rem; color: var(--accent); font-weight: 600; }
h1.record-title { font-size: 1.75rem; line-height: 1.2; margin: .3rem 0 .9rem; }
dl.facts { display: grid; grid-template-columns: max-content 1fr; gap: .15rem 1.2rem; margin: 0; font-size: .86rem; }
dl.facts dt { color: var(--muted); }
dl.facts dd { margin: 0; font-variant-numeric: tabular-nums; }
dl.facts code { font-size: .82rem; }
p.completion { margin: .9rem 0 0; padding: .45rem .7rem; border-left: 4px solid var(--ok); background: #f1f6f2; font-size: .88rem; }
p.dirty { border-left-color: var(--warn); background: #fbf6ea; }
.kicker.failed { color: #9b1c1c; }
div.failed-banner { margin: .9rem 0 0; padding: .6rem .8rem; border: 3px solid #9b1c1c; background: #fbeeee; font-size: .92rem; }
div.failed-banner b { color: #9b1c1c; text-transform: uppercase; letter-spacing: .06em; }
section.failed-cell { border-left: 4px solid #9b1c1c; padding-left: .6rem; }
section.failed-cell .cell-label b, .cell-label .failed { color: #9b1c1c; }
section.cell { margin: 0 0 1.3rem; }
section.markdown-cell h1, section.markdown-cell h2, section.markdown-cell h3 { line-height: 1.25; margin: 1.4rem 0 .5rem; }
section.markdown-cell h1 { font-size: 1.4rem; } section.markdown-cell h2 { font-size: 1.2rem; }
section.markdown-cell table { border-collapse: collapse; } section.markdown-cell td, section.markdown-cell th { border: 1px solid var(--rule); padding: .2rem .5rem; }
.cell-label { display: flex; justify-content: space-between; font-size: .72rem; color: var(--muted);
  text-transform: uppercase; letter-spacing: .08em; border-top: 1px solid var(--rule); padding-top: .25rem; margin-bottom: .3rem; }
.cell-label b { color: var(--accent); font-weight: 600; }
pre { margin: 0; white-space: pre-wrap; word-break: break-word; font: 13px/1.45 ui-monospace, "DejaVu Sans Mono", Menlo, Consolas, monospace; }
pre.source { background: var(--code); border-left: 3px solid var(--ink); padding: .55rem .8rem; }
.outputs { margin: .35rem 0 0 0; padding-left: .8rem; border-left: 3px solid var(--rule); }
.outputs > * { margin: .3rem 0; }
pre.stream, pre.text { padding: .15rem 0; }
pre.stderr { color: var(--warn); }
pre.error { color: #9b1c1c; }
.result { position: relative; }
.html table { border-collapse: collapse; font-size: .88rem; font-variant-numeric: tabular-nums; }
.html th, .html td { border-bottom: 1px solid var(--rule); padding: .2rem .6rem; text-align: right; }
.html th { text-align: left; }
.image img, .html svg { max-width: 100%; height: auto; }
figcaption.isochor-chart-caption { font-size: .85rem; color: var(--muted); }
.missing-image, p.note { color: var(--muted); font-style: italic; }
footer { margin-top: 2.4rem; border-top: 1px solid var(--rule); padding-top: .6rem; font-size: .78rem; color: var(--muted); }
@media print {
  html { background: none; }
  body { max-width: none; padding: 0; font-size: 10pt; }
  @page { size: A4; margin: 16mm 14mm 18mm; }
  pre { font-size: 8.5pt; }
  pre.source { border-left-width: 2px; }
  .outputs > * { break-inside: avoid; }
  .cell-label { break-after: avoid; }
  section.markdown-cell h1, section.markdown-cell h2, section.markdown-cell h3 { break-after: avoid; }
  p.completion, div.failed-banner { background: none; }
}
`;

/** "cell 4 was not run, and " / "cells 4 to 9 were not run, and " / "" after the last cell. */
function notRun(failedCell: number, cellCount: number): string {
  if (failedCell >= cellCount) return "";
  return failedCell + 1 === cellCount
    ? `cell ${cellCount} was not run, and `
    : `cells ${failedCell + 1} to ${cellCount} were not run, and `;
}

/** Builds the record's HTML text. */
export function recordHtml(input: RecordInput): string {
  const lifted = new Map<string, string>();
  const env = input.environment;
  const codeCells = input.cells.filter((c) => c.cell_type === "code").length;
  const failure = input.failure;
  const shownCells = failure ? input.cells.slice(0, failure.cellNumber) : input.cells;
  const title = failure ? `FAILED at cell ${failure.cellNumber}: ${input.title}` : input.title;
  const body: string[] = [];
  shownCells.forEach((cell, index) => {
    const number = index + 1;
    const source = joinText(cell.source);
    if (cell.cell_type === "markdown") {
      body.push(
        `<section class="cell markdown-cell" id="cell-${number}">${renderMarkdown(source, cell.attachments)}</section>`,
      );
      return;
    }
    if (cell.cell_type === "raw") {
      body.push(
        `<section class="cell raw-cell" id="cell-${number}">${pre("text", source)}</section>`,
      );
      return;
    }
    const time = input.cellTimesMs[index];
    const failed = failure?.cellNumber === number;
    const label =
      `<div class="cell-label"><span><b>Cell ${number}</b>` +
      (cell.execution_count !== null
        ? ` &middot; run ${cell.execution_count}`
        : " &middot; empty, not run") +
      (failed ? ` &middot; <span class="failed">FAILED</span>` : "") +
      `</span><span>${time !== undefined ? formatSeconds(time) : ""}</span></div>`;
    const outputs = cell.outputs.map((o) => renderOutput(o, lifted)).join("\n");
    body.push(
      `<section class="cell code-cell${failed ? " failed-cell" : ""}" id="cell-${number}">${label}` +
        (source.trim() !== ""
          ? `<pre class="source"><code>${escapeHtml(source)}</code></pre>`
          : "") +
        (outputs ? `<div class="outputs">${outputs}</div>` : "") +
        `</section>`,
    );
  });
  const commit =
    env.gitCommit === "unknown"
      ? "unknown (not a git checkout)"
      : `<code>${escapeHtml(env.gitCommit.slice(0, 12))}</code>` +
        (env.gitDirty ? " with uncommitted changes" : "");
  const statement = failure
    ? `<div class="failed-banner" role="alert"><b>Failed at cell ${failure.cellNumber} of ${input.cells.length}</b>: ` +
      `${escapeHtml(stripAnsi(failure.detail.split("\n")[0]))}.<br>This record stops at the <a href="#cell-${failure.cellNumber}">failing cell</a>: ` +
      notRun(failure.cellNumber, input.cells.length) +
      `no calculation record of this notebook was written. It is NOT the record of a complete calculation.</div>`
    : undefined;
  const completion = env.gitDirty
    ? `All ${codeCells} code cells ran to completion, in order, in one fresh session. The working tree had uncommitted changes: commit ${escapeHtml(env.gitCommit.slice(0, 12))} alone does not reproduce this record.`
    : `All ${codeCells} code cells ran to completion, in order, in one fresh session.`;
  return `${recordDocumentHead({
    isochorVersion: env.isochorVersion,
    generatedBy: "isochor run",
    title,
    css: CSS,
    headScripts: [...lifted.values()].join("\n"),
  })}<header class="record-head">
<div class="kicker${failure ? " failed" : ""}">Calculation record${failure ? " &middot; INCOMPLETE: the run FAILED" : ""}</div>
<h1 class="record-title">${escapeHtml(title)}</h1>
<dl class="facts">
<dt>Notebook</dt><dd>${escapeHtml(input.notebookName)}</dd>
<dt>Run</dt><dd>${formatRecordDate(input.startedAt)} &middot; ${input.cells.length} cells (${codeCells} code)${failure ? `, stopped at cell ${failure.cellNumber}` : ""} &middot; ${formatSeconds(input.elapsedMs)}</dd>
<dt>isochor</dt><dd>${escapeHtml(env.isochorVersion)} &middot; commit ${commit}</dd>
<dt>Environment</dt><dd>Node ${escapeHtml(env.nodeVersion)} &middot; tslab ${escapeHtml(env.tslabVersion)} (TypeScript ${escapeHtml(env.typescriptVersion)})</dd>
</dl>
${statement ?? `<p class="completion${env.gitDirty ? " dirty" : ""}">${completion}</p>`}
</header>
<main>
${body.join("\n")}
</main>
<footer>${failure ? `<b>This run FAILED at cell ${failure.cellNumber}; the record is incomplete.</b> ` : ""}Produced by <code>isochor run</code> from ${escapeHtml(input.notebookName)}; the executed notebook is ${escapeHtml(input.executedNotebookFile)}, beside this file. Charts are drawn from data embedded in this page; nothing is loaded from the network.</footer>
</body>
</html>
`;
}
