/**
 * Source notes in a calculation record: a one-line citation in the text, the full provenance note
 * folded away (HTML <details>, Markdown numbered notes), and one statement of which data were
 * recalled from memory and how they were checked, instead of the long note repeated per component.
 */
import type { ModelEntry } from "./modelEntry.js";

/** Longest one-line citation, characters (longer heads are cut at a word and end in "…"). */
const MAX_CITATION = 90;

/**
 * The one-line citation of a provenance note: its first clause (up to the first ":" or ";" outside
 * brackets), cut at a comma or word boundary to at most 90 characters.
 */
export function shortCitation(note: string): string {
  let depth = 0;
  let cut = note.length;
  for (let i = 0; i < note.length; i++) {
    const ch = note[i];
    if (ch === "(" || ch === "[") depth++;
    else if ((ch === ")" || ch === "]") && depth > 0) depth--;
    else if ((ch === ":" || ch === ";") && depth === 0) {
      cut = i;
      break;
    }
  }
  const head = note.slice(0, cut).trim();
  if (head.length <= MAX_CITATION) return head;
  // prefer the end of a phrase (a comma), else a word boundary
  const comma = head.lastIndexOf(", ", MAX_CITATION - 1);
  const space = head.lastIndexOf(" ", MAX_CITATION - 1);
  const at = comma > 40 ? comma : space > 40 ? space : MAX_CITATION - 1;
  return `${head.slice(0, at).replace(/[,\s]+$/, "")}…`;
}

/** True when the note says more than its one-line citation. */
export function hasMoreThanCitation(note: string): boolean {
  return shortCitation(note) !== note.trim();
}

/**
 * Which data of the model were recalled from memory (their notes say "from memory") and how they
 * were checked; undefined when no note says so.
 */
export function memoryStatement(m: ModelEntry): string | undefined {
  const cp = m.idealGas.filter((g) => /from memory/i.test(g.source)).map((g) => g.componentId);
  const kij = m.interaction
    .filter((p) => !m.defaultedPairs.includes(p.pair) && /from memory/i.test(p.source))
    .map((p) => p.pair);
  const parts: string[] = [];
  if (cp.length > 0) parts.push(`the ideal-gas heat-capacity data of ${cp.join(", ")}`);
  if (kij.length > 0) parts.push(`the k_ij of ${kij.join(", ")}`);
  if (parts.length === 0) return undefined;
  return (
    `Recalled from memory of the cited sources, not re-read from the print: ${parts.join("; ")}. ` +
    "How each was checked is in its note (comparison values and their sources)" +
    (cp.length > 0
      ? "; the library's tests compare the heat capacities with independently recalled table " +
        "values and, where molecular constants exist, with the statistical-mechanics route " +
        "(tests/unit/idealgas, tests/unit/components)."
      : ".")
  );
}
