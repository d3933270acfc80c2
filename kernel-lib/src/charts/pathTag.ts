/**
 * The text beside a numbered state of a path (process path, path over a phase envelope): its
 * number and its label, "2 discharge". No number for a lone state (nothing to order), and none
 * added to a label that already starts with the user's own numbering ("1 suction", "(2) valve
 * outlet", "3: cooler"), which would otherwise read "1 1 suction".
 */

/** Does the label start with a number of its own: "1 x", "1. x", "(1) x", "1a: x", or just "1"? */
const OWN_NUMBER = /^\s*\(?\d+[a-z]?[).:]?(\s|$)/i;

/** Text beside state `index` (0-based) of `count`, with the user's `label` if any. */
export function pathTag(label: string | undefined, index: number, count: number): string {
  if (count === 1) return label ?? "";
  if (label === undefined) return String(index + 1);
  return OWN_NUMBER.test(label) ? label : `${index + 1} ${label}`;
}
