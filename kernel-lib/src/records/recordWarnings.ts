/**
 * The warnings a calculation record collects from the results passed to it, de-duplicated by code
 * and message, each with where it was raised and how often.
 */
import type { ResultWarning } from "../errors.js";
import type { RecordedWarning } from "./recordContent.js";

function isWarning(value: unknown): value is ResultWarning {
  const v = value as Partial<ResultWarning> | null;
  return (
    v !== null &&
    typeof v === "object" &&
    typeof v.message === "string" &&
    typeof v.code === "string"
  );
}

/** De-duplicated warnings of one record. */
export class RecordWarnings {
  private readonly byKey = new Map<
    string,
    { code: string; message: string; from: Set<string>; count: number }
  >();

  /** How many distinct warnings were collected. */
  get size(): number {
    return this.byKey.size;
  }

  /** Adds one warning raised at `from` (an id or a label; undefined: not known). */
  add(warning: ResultWarning, from: string | undefined): void {
    const key = `${warning.code}\u0000${warning.message}`;
    let entry = this.byKey.get(key);
    if (!entry) {
      entry = { code: warning.code, message: warning.message, from: new Set(), count: 0 };
      this.byKey.set(key, entry);
    }
    entry.count += 1;
    if (from !== undefined) entry.from.add(from);
  }

  /**
   * Adds the warnings found in `source`: a ResultWarning, a list of them, an object with
   * `warnings`, or a list of such objects (three levels deep at most).
   * @returns How many warnings were found.
   */
  collect(source: unknown, from: string | undefined): number {
    let found = 0;
    const visit = (value: unknown, depth: number): void => {
      if (value === null || typeof value !== "object" || depth > 3) return;
      if (isWarning(value)) {
        this.add(value, from);
        found += 1;
        return;
      }
      if (Array.isArray(value)) {
        value.forEach((v) => visit(v, depth + 1));
        return;
      }
      const warnings = (value as { warnings?: unknown }).warnings;
      if (Array.isArray(warnings)) warnings.forEach((w) => visit(w, depth + 1));
    };
    visit(source, 0);
    return found;
  }

  /** A snapshot, in the order first collected. */
  list(): RecordedWarning[] {
    return [...this.byKey.values()].map((w) => ({
      code: w.code,
      message: w.message,
      from: [...w.from],
      count: w.count,
    }));
  }
}
