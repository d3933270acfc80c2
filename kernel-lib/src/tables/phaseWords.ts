/**
 * Phase words as printed for a reader. The library's phase kinds are identifiers ("vapor",
 * "liquid", "liquid-2", "supercritical", "two-phase"), fixed by the API and the eval format; the
 * text a reader sees (notebooks, records, tables, chart labels) spells the word "vapour", as the
 * rest of the project's prose does. Tables, records and explorers print a phase kind through
 * {@link phaseWord}, so a table never shows "vapor" beside a "saturated vapour" row.
 */

/** A cell made only of phase kinds, one or several joined by "+" or ", ". */
const PHASE_LIST =
  /^(vapor|liquid(-\d+)?|supercritical|two-phase|three-phase|solid)((\+|, )(vapor|liquid(-\d+)?|supercritical|solid))*$/;

/** The reader's word for a phase kind (or a list of them): "vapor" -> "vapour"; other text as is. */
export function phaseWord(text: string): string {
  return PHASE_LIST.test(text) ? text.replace(/\bvapor\b/g, "vapour") : text;
}
