/**
 * Component lookup by id, name, formula, CAS number or synonym. Matching ignores case, spaces,
 * hyphens, underscores, commas and apostrophes ("N-Butane", "n butane", "nbutane" all match). A name
 * that matches nothing is refused with UnknownNameError carrying the closest names (edit distance);
 * a name that matches several components (a formula shared by isomers) with AmbiguousNameError.
 */
import { UnknownNameError } from "../errors.js";
import { AmbiguousNameError } from "./ambiguousNameError.js";
import { editDistance } from "../numerics/editDistance.js";
import { tableComponents } from "./table.js";
import type { Component } from "./types.js";

/** Options for `getComponent`. */
export interface GetComponentOptions {
  /**
   * Extra components (from `defineComponent` or petroleum characterisation) searched before the
   * table; one with the same id as a table component replaces it for this lookup. Default: none.
   */
  include?: readonly Component[];
  /** How many suggestions an UnknownNameError carries. Default 3. */
  maxSuggestions?: number;
}

/** Normalised lookup key: lower case without spaces, hyphens, underscores, commas, apostrophes, dots. */
export function normalizeComponentName(name: string): string {
  return name.toLowerCase().replace(/[\s\-_,'.]/g, "");
}

/** Characters of an unknown name compared for suggestions (the table's longest key is far shorter). */
const MAX_NAME_COMPARED = 64;

function keysOf(c: Component): string[] {
  return [c.id, c.name, c.formula, c.casNumber, ...c.synonyms]
    .filter((k) => k !== "")
    .map(normalizeComponentName);
}

/**
 * Finds a component by id, name, formula, CAS number or synonym.
 *
 * @example getComponent("nC4").id === "n-butane"; getComponent("7783-06-4").formula === "H2S"
 * @throws UnknownNameError when nothing matches (with the closest names)
 * @throws AmbiguousNameError when several components match (e.g. "C4H10")
 */
export function getComponent(
  nameOrIdOrFormulaOrCas: string,
  options: GetComponentOptions = {},
): Component {
  if (typeof nameOrIdOrFormulaOrCas !== "string" || nameOrIdOrFormulaOrCas.trim() === "") {
    throw new UnknownNameError("component", String(nameOrIdOrFormulaOrCas), []);
  }
  const all = searchList(options.include ?? []);
  const key = normalizeComponentName(nameOrIdOrFormulaOrCas);
  // An exact id match wins over everything else.
  const byId = all.find((c) => normalizeComponentName(c.id) === key);
  if (byId) return byId;
  const matches = all.filter((c) => keysOf(c).includes(key));
  if (matches.length === 1) return matches[0];
  if (matches.length > 1) {
    throw new AmbiguousNameError(
      "component",
      nameOrIdOrFormulaOrCas,
      matches.map((c) => c.id),
    );
  }
  // Suggestions compare at most the first MAX_NAME_COMPARED characters (names in the table are far
  // shorter), so a huge string is refused in milliseconds instead of a quadratic edit distance.
  const head = key.slice(0, MAX_NAME_COMPARED);
  const scored: { id: string; distance: number }[] = [];
  for (const c of all) {
    const distance = Math.min(...keysOf(c).map((k) => editDistance(head, k)));
    scored.push({ id: c.id, distance });
  }
  scored.sort((a, b) => a.distance - b.distance);
  const suggestions = scored.slice(0, options.maxSuggestions ?? 3).map((s) => s.id);
  throw new UnknownNameError("component", nameOrIdOrFormulaOrCas, suggestions);
}

/** Every table component (plus `include`, which replace table entries of the same id), in table order. */
export function listComponents(
  options: { include?: readonly Component[] } = {},
): readonly Component[] {
  return searchList(options.include ?? []);
}

function searchList(include: readonly Component[]): readonly Component[] {
  if (include.length === 0) return tableComponents();
  const ids = new Set(include.map((c) => c.id));
  return [...include, ...tableComponents().filter((c) => !ids.has(c.id))];
}

/**
 * A Component passed through unchanged, or a name looked up with `getComponent`. Lets functions
 * accept either `"methane"` or a component built in a cell.
 */
export function resolveComponent(
  nameOrComponent: string | Component,
  options: GetComponentOptions = {},
): Component {
  if (
    typeof nameOrComponent === "object" &&
    nameOrComponent !== null &&
    typeof nameOrComponent.id === "string"
  ) {
    return nameOrComponent;
  }
  return getComponent(nameOrComponent as string, options);
}
