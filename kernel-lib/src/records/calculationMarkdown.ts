/**
 * Markdown of a calculation record: the same sections and ids as the HTML record, for review in a
 * repository or a merge request. Charts cannot be drawn in Markdown: each is listed with its
 * caption and basis, and the HTML record has it.
 *
 * Every caller string is escaped (CommonMark backslash escapes of the characters that start
 * inline markup, including `<` and `&`, so no HTML can pass through a Markdown renderer, and of a
 * block marker at its start) and kept on one line.
 */
import { escapeMarkdown, escapeMarkdownBlock } from "../tables/escapeMarkdown.js";
import { shortMethod } from "./modelEntry.js";
import { basisText } from "./recordBasis.js";
import type { CalculationRecordContent } from "./recordContent.js";
import { formatRecordDate } from "./recordDate.js";
import { fullNumber as num, fullValues as values } from "./recordNumbers.js";
import { hasMoreThanCitation, memoryStatement, shortCitation } from "./sourceNotes.js";

// The escaping is tables/escapeMarkdown.ts (one for tables and records); kept importable here.
export { escapeMarkdown, escapeMarkdownBlock };

/** A value and its unit; a dimensionless value ("-") alone. */
function withUnit(value: string, unit: string): string {
  return unit === "" || unit === "\\-" || unit === "-" ? value : `${value} ${unit}`;
}

/** Options of {@link calculationRecordMarkdown}. */
export interface CalculationMarkdownOptions {
  /** The image file (relative to the Markdown) of a chart, by chart id; undefined: not drawn. */
  readonly chartImage?: (chartId: string) => string | undefined;
}

/** The record as Markdown text. */
export function calculationRecordMarkdown(
  c: CalculationRecordContent,
  options: CalculationMarkdownOptions = {},
): string {
  const m = escapeMarkdown;
  const env = c.environment;
  const out: string[] = [];
  out.push(`# Calculation record: ${m(c.title)}`, "");
  const facts = [
    `Prepared ${formatRecordDate(c.createdAt)}`,
    c.author !== undefined ? `by ${m(c.author)}` : undefined,
    c.site !== undefined ? `site: ${m(c.site)}` : undefined,
    `isochor ${m(env.isochorVersion)}, commit ${m(env.gitCommit)}${env.gitDirty ? " with local changes" : ""}`,
    `record ${m(c.anchor)}`,
  ].filter((s): s is string => s !== undefined);
  out.push(facts.join(" · "), "");
  let n = 0;
  const heading = (title: string) => out.push(`## ${++n}. ${title}`, "");
  heading("Question");
  out.push(escapeMarkdownBlock(c.question), "");
  if (c.answers.length > 0) {
    heading("Answer");
    c.answers.forEach((a) => out.push(`> ${escapeMarkdownBlock(a)}`, ">"));
    out.pop();
    out.push("");
  }
  if (c.cautions.length > 0) {
    heading("Cautions");
    c.cautions.forEach((t) => out.push(`> **CAUTION.** ${m(t)}`, ""));
  }
  heading("Inputs");
  if (c.inputs.length === 0) out.push("No inputs recorded.", "");
  else {
    out.push(
      "| Id | Quantity | As given | SI (used) | Source |",
      "| :--- | :--- | ---: | ---: | :--- |",
    );
    for (const i of c.inputs) {
      const notes = [
        i.source !== undefined ? m(i.source) : "source not given",
        i.note !== undefined ? m(i.note) : "",
        i.atmosphericPressurePa !== undefined
          ? `gauge converted with atmospheric pressure ${num(i.atmosphericPressurePa)} Pa`
          : "",
        i.difference ? "a difference (no offset)" : "",
      ].filter((s) => s !== "");
      out.push(
        `| ${i.id} | ${m(i.label)} | ${withUnit(values(i.value), m(i.unit))} | ` +
          `${withUnit(values(i.valueSI), m(i.unitSI))} | ${notes.join("; ")} |`,
      );
    }
    out.push("");
  }
  heading("Models");
  if (c.models.length === 0) out.push("No model recorded.", "");
  for (const model of c.models) {
    out.push(`### ${model.id}: ${m(model.label)}`, "");
    out.push(`- Model: ${m(model.name)} (${m(model.modelId)})`);
    out.push(`- Citation: ${m(model.citation)}`);
    out.push(`- Components: ${m(model.componentIds.join(", ")) || "none listed"}`);
    if (model.referenceState !== undefined)
      out.push(`- Reference state: ${m(model.referenceState)}`);
    out.push(
      `- Validity: ${model.validity.length > 0 ? model.validity.map(m).join(" ") : "no range known to the library; see the citation"}`,
    );
    // one-line citations here; a note that says more is listed once under the model, numbered
    const notes: string[] = [];
    const cite = (note: string): string => {
      if (!hasMoreThanCitation(note)) return m(note);
      let k = notes.indexOf(note);
      if (k < 0) k = notes.push(note) - 1;
      return `${m(shortCitation(note))} [${model.id}.${k + 1}]`;
    };
    for (const g of model.idealGas) {
      out.push(
        `- Ideal gas, ${m(g.componentId)}: ${m(shortMethod(g.method))}, ${num(g.validTemperatureK.min)}-${num(g.validTemperatureK.max)} K; ${cite(g.source)}`,
      );
    }
    for (const p of model.interaction.filter((q) => !model.defaultedPairs.includes(q.pair)))
      out.push(`- k\\_ij ${m(p.pair)} = ${num(p.kij)} (${cite(p.source)})`);
    const memory = memoryStatement(model);
    if (memory !== undefined) out.push(`- Recalled data: ${m(memory)}`);
    if (model.defaultedPairs.length > 0) {
      out.push(
        `- Defaulted k\\_ij (set to zero, no value known): ${m(model.defaultedPairs.join(", "))}`,
      );
    }
    for (const note of model.notes) out.push(`- Note: ${m(note)}`);
    out.push("");
    if (notes.length > 0) {
      out.push(`Source notes of ${model.id}:`, "");
      notes.forEach((note, k) => out.push(`- [${model.id}.${k + 1}] ${m(note)}`));
      out.push("");
    }
  }
  if (c.methods !== undefined && c.methods.length > 0) {
    heading("Method and assumptions");
    for (const a of c.methods) out.push(`**${a.id}. ${m(a.label)}.** ${m(a.text)}`, "");
  }
  heading("Results");
  if (c.items.length === 0) out.push("No results recorded.", "");
  else
    out.push(
      "Each row and chart names its basis: the model entry (M) and inputs (I) it was computed from.",
      "",
    );
  for (const item of c.items) {
    if (item.kind === "table") out.push(item.table.markdown, "");
    else {
      const chart = item.chart;
      const what = [chart.caption, chart.title]
        .find((s) => s !== undefined)
        ?.replace(/[.\s]+$/, "");
      const image = options.chartImage?.(chart.id);
      const where = image !== undefined ? "chart" : "chart, drawn in the HTML record";
      out.push(
        `**${chart.id}** (${where})${what !== undefined ? `: ${m(what)}` : ""}. Basis: ${basisText(chart.basis)}.`,
        "",
      );
      if (image !== undefined) {
        // the file name is made by the runner from the notebook's name; the alt text is escaped
        out.push(
          `![${m(chart.id + (what !== undefined ? `: ${what}` : ""))}](${encodeURI(image)})`,
          "",
        );
      }
    }
  }
  heading("Warnings raised");
  if (c.warnings.length === 0)
    out.push("None: no result passed to this record carried a warning.", "");
  else {
    for (const w of c.warnings) {
      const detail = [w.from.join(", "), w.count > 1 ? `${w.count} times` : ""]
        .filter((t) => t !== "")
        .join("; ");
      out.push(`- **${m(w.code)}** ${m(w.message)}${detail !== "" ? ` (${m(detail)})` : ""}`);
    }
    out.push("");
  }
  heading("Environment");
  out.push(
    `- isochor ${m(env.isochorVersion)}`,
    `- git commit ${m(env.gitCommit)}${env.gitDirty ? " (working tree had uncommitted changes)" : ""}`,
    `- Node ${m(env.nodeVersion)}; tslab ${m(env.tslabVersion)} (TypeScript ${m(env.typescriptVersion)})`,
    `- prepared ${formatRecordDate(c.createdAt)}`,
    "",
  );
  return out.join("\n");
}
