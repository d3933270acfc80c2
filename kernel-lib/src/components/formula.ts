/**
 * Molecular formula parsing: "C2H6O" -> { C: 2, H: 6, O: 1 }. Plain formulas only (element symbols
 * with optional counts); no brackets, charges or hydrates, which the component table does not need.
 */
import { InputError } from "../errors.js";

/** Atom counts of a molecular formula, keyed by element symbol. */
export type ElementCounts = Readonly<Record<string, number>>;

/** Parses a plain molecular formula such as "C4H10" or "ClH". Throws InputError when malformed. */
export function parseFormula(formula: string): ElementCounts {
  const counts: Record<string, number> = {};
  const pattern = /([A-Z][a-z]?)(\d*)/g;
  let consumed = 0;
  for (const match of formula.matchAll(pattern)) {
    if (match.index !== consumed) break;
    const count = match[2] === "" ? 1 : Number(match[2]);
    counts[match[1]] = (counts[match[1]] ?? 0) + count;
    consumed += match[0].length;
  }
  if (formula.length === 0 || consumed !== formula.length) {
    throw new InputError({
      input: "formula",
      unit: "-",
      validRange: 'a plain molecular formula of element symbols and counts, e.g. "C2H6O"',
      received: formula,
    });
  }
  return counts;
}
