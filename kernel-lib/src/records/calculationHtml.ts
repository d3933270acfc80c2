/**
 * HTML of a calculation record: an engineering calculation sheet, numbered sections, print-ready.
 *
 *   head block   "Calculation record" kicker, title, facts (prepared, by, site, isochor, commit)
 *   1 Question   2 Answer   3 Cautions (boxed)   4 Inputs (as given | SI | source)
 *   5 Models (citation, reference state, validity, ideal gas, k_ij)   6 Results (tables, charts)
 *   7 Warnings   8 Environment
 *
 * Every string from the caller is escaped; the only markup not built here comes from tables/ and
 * display/chartHtml, which escape their own text. Anchors are `<record anchor>-<id>` so two records
 * on one page never collide. Styles are scoped under `.isochor-calc` so the fragment can sit in a
 * notebook cell without touching the page around it.
 */
import { randomBytes } from "node:crypto";
import { escapeHtml } from "../display/escapeHtml.js";
import { vegaRuntimeScript } from "../display/vegaRuntime.js";
import { shortMethod, type ModelEntry } from "./modelEntry.js";
import { basisLinks } from "./recordBasis.js";
import type { CalculationRecordContent, RecordedInput } from "./recordContent.js";
import { formatRecordDate } from "./recordDate.js";
import { fullNumber as num, fullValues as values } from "./recordNumbers.js";
import { recordDocumentHead } from "./recordHtml.js";
import { hasMoreThanCitation, memoryStatement, shortCitation } from "./sourceNotes.js";

// Sizes in px, not rem: the classic notebook page sets html { font-size: 10px }, which drew the
// whole record (60rem wide then) about 580 px wide, with every column and margin shrunk alike.
const CSS = `
.isochor-calc { --c-ink:#1f2a33; --c-muted:#5b6770; --c-rule:#c9d1d7; --c-band:#f3f5f6;
  --c-accent:#1f5f7a; --c-caution:#9a3b12; --c-warn:#7a5a00;
  color:var(--c-ink); font:14px/1.5 system-ui,"Segoe UI","DejaVu Sans",Helvetica,Arial,sans-serif;
  max-width:960px; }
.isochor-calc * { box-sizing:border-box; }
.isochor-calc .calc-head { border:2px solid var(--c-ink); display:grid;
  grid-template-columns: 1fr auto; margin-bottom:19.2px; }
.isochor-calc .calc-head .calc-titlebox { padding:11.2px 14.4px; border-right:1px solid var(--c-ink); }
.isochor-calc .calc-kicker { font-size:11.2px; letter-spacing:.16em; text-transform:uppercase;
  color:var(--c-accent); font-weight:700; }
.isochor-calc h1.calc-title { font-size:21.6px; line-height:1.25; margin:3.2px 0 0; }
.isochor-calc dl.calc-facts { margin:0; display:grid; grid-template-columns:max-content minmax(144px,256px);
  font-size:12.48px; }
.isochor-calc dl.calc-facts dt, .isochor-calc dl.calc-facts dd { margin:0; padding:2.88px 9.6px;
  border-bottom:1px solid var(--c-rule); }
.isochor-calc dl.calc-facts dt { color:var(--c-muted); text-transform:uppercase; letter-spacing:.06em;
  font-size:10.88px; padding-top:4px; }
.isochor-calc dl.calc-facts dd { font-variant-numeric:tabular-nums; overflow-wrap:anywhere; }
.isochor-calc section.calc-section { margin:0 0 20.8px; }
.isochor-calc h2 { font-size:16px; margin:0 0 8px; padding-bottom:3.2px; border-bottom:1px solid var(--c-ink);
  display:flex; gap:9.6px; align-items:baseline; }
.isochor-calc h2 .num { color:var(--c-accent); font-variant-numeric:tabular-nums; min-width:19.2px; }
.isochor-calc h3 { font-size:14.72px; margin:12.8px 0 4.8px; }
.isochor-calc p { margin:4.8px 0; }
.isochor-calc .calc-question { font-size:16.32px; }
.isochor-calc .calc-answer { border-left:4px solid var(--c-accent); background:var(--c-band); padding:8px 12.8px; }
.isochor-calc .calc-caution { border:2px solid var(--c-caution); padding:8.8px 12.8px; margin:6.4px 0; }
.isochor-calc .calc-caution b { color:var(--c-caution); text-transform:uppercase; letter-spacing:.08em;
  font-size:12px; display:block; margin-bottom:2.4px; }
.isochor-calc table.calc-grid { border-collapse:collapse; width:100%; font-size:13.44px; }
.isochor-calc table.calc-grid th, .isochor-calc table.calc-grid td { border-bottom:1px solid var(--c-rule);
  padding:3.52px 8px; text-align:left; vertical-align:top; }
.isochor-calc table.calc-grid th { font-size:11.2px; text-transform:uppercase; letter-spacing:.06em;
  color:var(--c-muted); font-weight:600; border-bottom:1px solid var(--c-ink); }
.isochor-calc td.num { text-align:right; font-variant-numeric:tabular-nums; white-space:nowrap; }
.isochor-calc .calc-id { font-weight:700; color:var(--c-accent); white-space:nowrap; }
.isochor-calc .calc-model { border-top:1px solid var(--c-rule); padding-top:6.4px; margin-top:9.6px; }
.isochor-calc .calc-model:first-of-type { border-top:0; margin-top:0; }
.isochor-calc dl.calc-kv { display:grid; grid-template-columns:minmax(88px,160px) minmax(0,1fr); margin:3.2px 0;
  font-size:13.76px; }
.isochor-calc dl.calc-kv dt { color:var(--c-muted); }
.isochor-calc dl.calc-kv dd { margin:0 0 3.2px; min-width:0; }
.isochor-calc td, .isochor-calc dd, .isochor-calc code, .isochor-calc p, .isochor-calc li { overflow-wrap:anywhere; }
.isochor-calc h1, .isochor-calc h3, .isochor-calc a, .isochor-calc summary, .isochor-calc details div,
.isochor-calc figcaption, .isochor-calc caption { overflow-wrap:anywhere; }
.isochor-calc details.calc-note summary { cursor:pointer; }
.isochor-calc details.calc-note[open] summary { color:var(--c-muted); }
.isochor-calc details.calc-note div { font-size:12.16px; color:var(--c-muted); margin:3.2px 0 4.8px; }
@media (max-width:640px) {
  .isochor-calc dl.calc-kv { grid-template-columns:minmax(0,1fr); }
  .isochor-calc dl.calc-kv dt { margin-top:4.8px; }
}
.isochor-calc .calc-item { margin:11.2px 0 16px; overflow-x:auto; }
.isochor-calc .calc-basis { font-size:12.48px; color:var(--c-muted); }
.isochor-calc .calc-basis-cell { white-space:nowrap; font-size:12.8px; }
.isochor-calc table.calc-small { font-size:12.48px; }
.isochor-calc a { color:var(--c-accent); }
.isochor-calc ul.calc-warnings { margin:3.2px 0; padding-left:19.2px; }
.isochor-calc ul.calc-warnings li { margin:2.4px 0; }
.isochor-calc .calc-code { font:600 11.52px ui-monospace,"DejaVu Sans Mono",monospace; color:var(--c-warn);
  text-transform:uppercase; }
.isochor-calc .muted { color:var(--c-muted); }
.isochor-calc figure.isochor-chart img { max-width:100%; height:auto; }
.isochor-calc code { font:13.12px ui-monospace,"DejaVu Sans Mono",monospace; }
@media print {
  .isochor-calc { font-size:9.5pt; max-width:none; }
  .isochor-calc section.calc-section, .isochor-calc .calc-item, .isochor-calc .calc-model { break-inside:avoid; }
  .isochor-calc h2 { break-after:avoid; }
  .isochor-calc a { color:inherit; text-decoration:none; }
  .isochor-calc .calc-answer { background:none; }
}
`;

const PAGE_CSS = `
html { background:#e9edf0; }
.isochor-calc { max-width:none; }
body { margin:0 auto; max-width:64rem; background:#fff; padding:2rem 2.4rem 2.6rem; }
footer.calc-foot { margin-top:2rem; border-top:1px solid #c9d1d7; padding-top:.5rem; font-size:.75rem; color:#5b6770;
  font-family:system-ui,"DejaVu Sans",Arial,sans-serif; }
@media print { html { background:none; } body { padding:0; max-width:none; } @page { size:A4; margin:15mm 14mm 17mm; } }
`;

function e(text: string | undefined): string {
  return escapeHtml(text ?? "");
}

function section(n: number, title: string, body: string): string {
  return `<section class="calc-section"><h2><span class="num">${n}</span>${e(title)}</h2>${body}</section>`;
}

function inputRows(anchor: string, inputs: readonly RecordedInput[]): string {
  if (inputs.length === 0) return `<p class="muted">No inputs recorded.</p>`;
  const rows = inputs.map((i) => {
    const notes = [
      i.source !== undefined ? e(i.source) : `<span class="muted">source not given</span>`,
      i.note !== undefined ? e(i.note) : "",
      i.atmosphericPressurePa !== undefined
        ? `gauge converted with atmospheric pressure ${num(i.atmosphericPressurePa)} Pa`
        : "",
      i.difference ? "a difference (no offset)" : "",
    ].filter((s) => s !== "");
    return (
      `<tr id="${anchor}-${i.id}"><td class="calc-id">${i.id}</td><td>${e(i.label)}</td>` +
      `<td class="num">${values(i.value)} ${e(i.unit === "-" ? "" : i.unit)}</td>` +
      `<td class="num">${values(i.valueSI)} ${e(i.unitSI === "-" ? "" : i.unitSI)}</td>` +
      `<td>${notes.join("<br>")}</td></tr>`
    );
  });
  return (
    `<table class="calc-grid"><thead><tr><th>Id</th><th>Quantity</th><th>As given</th><th>SI (used)</th>` +
    `<th>Source</th></tr></thead><tbody>${rows.join("")}</tbody></table>`
  );
}

/** A provenance note as its one-line citation, the full note folded away when it says more. */
function sourceNote(note: string): string {
  if (!hasMoreThanCitation(note)) return e(note);
  return (
    `<details class="calc-note"><summary>${e(shortCitation(note))}</summary>` +
    `<div>${e(note)}</div></details>`
  );
}

function modelBlock(anchor: string, m: ModelEntry): string {
  const kv: string[] = [];
  const add = (k: string, v: string) => kv.push(`<dt>${e(k)}</dt><dd>${v}</dd>`);
  add("Model", `${e(m.name)} <span class="muted">(<code>${e(m.modelId)}</code>)</span>`);
  add("Citation", e(m.citation));
  add("Components", e(m.componentIds.join(", ")) || `<span class="muted">none listed</span>`);
  if (m.referenceState !== undefined) add("Reference state", e(m.referenceState));
  add(
    "Validity",
    m.validity.length > 0
      ? m.validity.map(e).join("<br>")
      : `<span class="muted">no range known to the library; see the citation</span>`,
  );
  if (m.idealGas.length > 0) {
    add(
      "Ideal gas",
      `<table class="calc-grid calc-small"><thead><tr><th>Component</th><th>Route</th><th>Valid T</th><th>Source</th></tr></thead><tbody>` +
        m.idealGas
          .map(
            (g) =>
              `<tr><td>${e(g.componentId)}</td><td>${e(shortMethod(g.method))}</td>` +
              `<td class="num">${num(g.validTemperatureK.min)}-${num(g.validTemperatureK.max)} K</td><td>${sourceNote(g.source)}</td></tr>`,
          )
          .join("") +
        `</tbody></table>`,
    );
  }
  const memory = memoryStatement(m);
  if (memory !== undefined) add("Recalled data", e(memory));
  const known = m.interaction.filter((p) => !m.defaultedPairs.includes(p.pair));
  if (known.length > 0) {
    add(
      "k_ij",
      `<table class="calc-grid calc-small"><thead><tr><th>Pair</th><th>k_ij</th><th>Source</th></tr></thead><tbody>` +
        known
          .map(
            (p) =>
              `<tr><td>${e(p.pair)}</td><td class="num">${num(p.kij)}</td><td>${sourceNote(p.source)}</td></tr>`,
          )
          .join("") +
        `</tbody></table>`,
    );
  }
  if (m.defaultedPairs.length > 0)
    add("Defaulted k_ij", `set to zero (no value known): ${e(m.defaultedPairs.join(", "))}`);
  for (const n of m.notes) add("Note", e(n));
  return (
    `<div class="calc-model" id="${anchor}-${m.id}"><h3><span class="calc-id">${m.id}</span> ${e(m.label)}</h3>` +
    `<dl class="calc-kv">${kv.join("")}</dl></div>`
  );
}

/**
 * Gives every chart in `html` a fresh element id. A chart shown in a cell as it was added and again
 * in the whole record (show()) would otherwise have one id twice on the page, and only the first
 * copy would go live. Ids come from display/chartHtml ("isochor-chart-" + 12 hex digits).
 */
export function rekeyCharts(html: string): string {
  const fresh = new Map<string, string>();
  return html.replace(/isochor-chart-[0-9a-f]{12}(?![0-9a-f])/g, (id) => {
    let next = fresh.get(id);
    if (next === undefined) {
      next = "isochor-chart-" + randomBytes(6).toString("hex");
      fresh.set(id, next);
    }
    return next;
  });
}

/** The record as an HTML fragment (no runtime script, scoped styles). */
export function calculationRecordFragment(c: CalculationRecordContent): string {
  const env = c.environment;
  const facts: string[] = [];
  const fact = (k: string, v: string) => facts.push(`<dt>${e(k)}</dt><dd>${v}</dd>`);
  fact("Prepared", formatRecordDate(c.createdAt));
  if (c.author !== undefined) fact("By", e(c.author));
  if (c.site !== undefined) fact("Site", e(c.site));
  fact("isochor", e(env.isochorVersion));
  fact(
    "Commit",
    env.gitCommit === "unknown"
      ? "unknown"
      : `<code>${e(env.gitCommit.slice(0, 12))}</code>${env.gitDirty ? " + local changes" : ""}`,
  );
  fact("Record", `<code>${e(c.anchor)}</code>`);

  let n = 0;
  const parts: string[] = [];
  parts.push(section(++n, "Question", `<p class="calc-question">${e(c.question)}</p>`));
  if (c.answers.length > 0) {
    parts.push(
      section(
        ++n,
        "Answer",
        `<div class="calc-answer">${c.answers.map((a) => `<p>${e(a)}</p>`).join("")}</div>`,
      ),
    );
  }
  if (c.cautions.length > 0) {
    parts.push(
      section(
        ++n,
        "Cautions",
        c.cautions
          .map((t) => `<div class="calc-caution" role="note"><b>Caution</b>${e(t)}</div>`)
          .join(""),
      ),
    );
  }
  parts.push(section(++n, "Inputs", inputRows(c.anchor, c.inputs)));
  parts.push(
    section(
      ++n,
      "Models",
      c.models.length > 0
        ? c.models.map((m) => modelBlock(c.anchor, m)).join("")
        : `<p class="muted">No model recorded.</p>`,
    ),
  );
  if (c.methods !== undefined && c.methods.length > 0) {
    parts.push(
      section(
        ++n,
        "Method and assumptions",
        c.methods
          .map(
            (a) =>
              `<div class="calc-method" id="${c.anchor}-${a.id}"><p><b>${e(a.id)}. ${e(a.label)}.</b> ${e(a.text)}</p></div>`,
          )
          .join(""),
      ),
    );
  }
  const items = c.items.map((item) => {
    // Charts get fresh ids in every rendering (see rekeyCharts); tables have none.
    if (item.kind === "table")
      return `<div class="calc-item" id="${c.anchor}-${item.table.id}">${item.table.html}</div>`;
    const chart = item.chart;
    return (
      `<div class="calc-item" id="${c.anchor}-${chart.id}">${rekeyCharts(chart.html)}` +
      `<div class="calc-basis">Basis of ${chart.id}: ${basisLinks(c.anchor, chart.basis)}</div></div>`
    );
  });
  parts.push(
    section(
      ++n,
      "Results",
      items.length > 0
        ? `<p class="calc-basis">Each row and chart names its basis: the model entry (M) and inputs (I) it was computed from.</p>${items.join("")}`
        : `<p class="muted">No results recorded.</p>`,
    ),
  );
  parts.push(
    section(
      ++n,
      "Warnings raised",
      c.warnings.length > 0
        ? `<ul class="calc-warnings">${c.warnings
            .map((w) => {
              const detail = [w.from.join(", "), w.count > 1 ? `${w.count} times` : ""]
                .filter((t) => t !== "")
                .join("; ");
              return (
                `<li><span class="calc-code">${e(w.code)}</span> ${e(w.message)}` +
                (detail !== "" ? ` <span class="muted">(${e(detail)})</span>` : "") +
                `</li>`
              );
            })
            .join("")}</ul>`
        : `<p>None: no result passed to this record carried a warning.</p>`,
    ),
  );
  parts.push(
    section(
      n + 1,
      "Environment",
      `<dl class="calc-kv"><dt>isochor</dt><dd>${e(env.isochorVersion)}</dd>` +
        `<dt>Git commit</dt><dd><code>${e(env.gitCommit)}</code>${env.gitDirty ? " (working tree had uncommitted changes)" : ""}</dd>` +
        `<dt>Node</dt><dd>${e(env.nodeVersion)}</dd>` +
        `<dt>tslab</dt><dd>${e(env.tslabVersion)} (TypeScript ${e(env.typescriptVersion)})</dd>` +
        `<dt>Prepared</dt><dd>${formatRecordDate(c.createdAt)}</dd></dl>`,
    ),
  );
  return (
    `<div class="isochor-calc" id="${c.anchor}"><style>${CSS}</style>` +
    `<header class="calc-head"><div class="calc-titlebox"><div class="calc-kicker">Calculation record</div>` +
    `<h1 class="calc-title">${e(c.title)}</h1></div><dl class="calc-facts">${facts.join("")}</dl></header>` +
    parts.join("\n") +
    `</div>`
  );
}

/** A piece of a record (a table, chart or answer shown as it is added), with the record's styles. */
export function calculationRecordPiece(html: string): string {
  return `<div class="isochor-calc"><style>${CSS}</style>${html}</div>`;
}

/** The record as a standalone HTML document: charts live from the inline runtime, no network. */
export function calculationRecordDocument(c: CalculationRecordContent): string {
  const hasCharts = c.items.some((i) => i.kind === "chart");
  return `${recordDocumentHead({
    isochorVersion: c.environment.isochorVersion,
    generatedBy: "calculation record",
    title: c.title,
    css: PAGE_CSS,
    headScripts: hasCharts ? vegaRuntimeScript() : "",
  })}${calculationRecordFragment(c)}
<footer class="calc-foot">Calculation record ${e(c.anchor)} written by isochor ${e(c.environment.isochorVersion)}. Charts are drawn from data embedded in this page; nothing is loaded from the network. A Markdown copy of this record has the same content without the charts.</footer>
</body>
</html>
`;
}
