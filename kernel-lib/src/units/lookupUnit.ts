/**
 * Finds a unit from the way an engineer wrote it. Matching is exact and case-sensitive (MPa is
 * not mPa) after removing spaces, "·", "⋅" and "*", and writing "°" as "deg" and "³" as "3", so
 * "J/(mol·K)", "J/(mol K)" and "J/(molK)" are one unit. Ambiguous strings ("psi", "g") throw
 * AmbiguousUnitError with the choices; unknown ones throw UnknownNameError with the closest units.
 */
import { AmbiguousUnitError, InputError, UnknownNameError } from "../errors.js";
import { editDistance } from "../numerics/editDistance.js";
import type { Dimension } from "./dimension.js";
import { AMBIGUOUS_UNITS, UNIT_TABLE, type UnitDefinition } from "./unitTable.js";

/** The matching key of a unit string: separators removed, degree signs spelled out. */
export function unitKey(text: string): string {
  return text
    .normalize("NFKC")
    .replace(/[°º]/g, "deg")
    .replace(/³/g, "3")
    .replace(/²/g, "2")
    .replace(/[\s·⋅*]+/g, "");
}

const BY_KEY = new Map<string, UnitDefinition>();
for (const def of UNIT_TABLE) {
  for (const name of [def.symbol, ...def.aliases]) {
    const key = unitKey(name);
    const existing = BY_KEY.get(key);
    if (existing && existing !== def) {
      throw new Error(`units table: "${name}" names both ${existing.symbol} and ${def.symbol}`);
    }
    BY_KEY.set(key, def);
  }
}
const AMBIGUOUS = new Map(Object.entries(AMBIGUOUS_UNITS).map(([k, v]) => [unitKey(k), v]));

/** Up to `count` known unit symbols closest to `text` (case-insensitive edit distance). */
export function closestUnits(text: string, count = 3, dimension?: Dimension): string[] {
  const key = unitKey(text).toLowerCase();
  const scored: { symbol: string; distance: number }[] = [];
  for (const def of UNIT_TABLE) {
    if (dimension && def.dimension !== dimension) continue;
    let best = Infinity;
    for (const name of [def.symbol, ...def.aliases]) {
      best = Math.min(best, editDistance(key, unitKey(name).toLowerCase()));
    }
    scored.push({ symbol: def.symbol, distance: best });
  }
  scored.sort((a, b) => a.distance - b.distance || a.symbol.localeCompare(b.symbol));
  const limit = Math.max(2, Math.ceil(key.length / 2));
  return scored
    .filter((s) => s.distance <= limit)
    .slice(0, count)
    .map((s) => s.symbol);
}

/**
 * The definition of a unit.
 *
 * @param unit - The unit as written, e.g. "kJ/(kg K)", "barg", "°C".
 * @param dimension - If given, the unit must measure this dimension (e.g. "pressure").
 * @example
 * ```ts
 * lookupUnit("psig").gauge; // true
 * lookupUnit("psi"); // throws AmbiguousUnitError: write one of: psia, psig
 * ```
 * @throws AmbiguousUnitError, UnknownNameError, or InputError (wrong dimension, not a string).
 */
export function lookupUnit(unit: string, dimension?: Dimension): UnitDefinition {
  if (typeof unit !== "string" || unit.trim() === "") {
    throw new InputError({
      input: "unit",
      unit: "-",
      validRange: 'a unit string such as "K", "barg" or "kJ/(kg K)"',
      received: unit,
    });
  }
  const key = unitKey(unit);
  const def = BY_KEY.get(key);
  if (!def) {
    const choices = AMBIGUOUS.get(key);
    if (choices) throw new AmbiguousUnitError(unit, choices);
    throw new UnknownNameError("unit", unit, closestUnits(unit, 3, dimension));
  }
  if (dimension && def.dimension !== dimension) {
    throw new InputError({
      input: "unit",
      unit: unit,
      validRange: `a ${dimension} unit (e.g. ${UNIT_TABLE.filter((u) => u.dimension === dimension)
        .slice(0, 4)
        .map((u) => u.symbol)
        .join(", ")})`,
      received: `${unit} (a ${def.dimension} unit)`,
    });
  }
  return def;
}

/** Symbols of all known units, optionally of one dimension. */
export function listUnits(dimension?: Dimension): string[] {
  return UNIT_TABLE.filter((u) => !dimension || u.dimension === dimension).map((u) => u.symbol);
}
