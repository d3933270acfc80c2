/**
 * The cache key of a fluid definition in the worker pool (workerPool.ts): a SHA-256 digest of a
 * canonical text of the definition, so that equal definitions share one fluid in each worker and
 * different ones never do. The text is faithful to every value a definition can hold as plain
 * data: numbers by their shortest round-trip text with -0, NaN and the infinities kept apart,
 * typed arrays tagged with their kind, object keys sorted, undefined written out. A value it
 * cannot write (a function, a Map, a class instance) gives no key: such a definition is sent to
 * the worker with every sweep instead of being cached.
 */
import { createHash } from "node:crypto";

function canonical(value: unknown, out: string[], seen: Set<object>): boolean {
  switch (typeof value) {
    case "undefined":
      out.push("u");
      return true;
    case "boolean":
      out.push(value ? "t" : "f");
      return true;
    case "number":
      out.push(Object.is(value, -0) ? "n-0" : `n${String(value)}`);
      return true;
    case "bigint":
      out.push(`b${value.toString()}`);
      return true;
    case "string":
      out.push(`s${JSON.stringify(value)}`);
      return true;
    case "object":
      break;
    default:
      return false;
  }
  if (value === null) {
    out.push("z");
    return true;
  }
  if (seen.has(value)) return false;
  seen.add(value);
  try {
    if (ArrayBuffer.isView(value)) {
      if (value instanceof DataView) return false;
      out.push(`v${value.constructor.name}[`);
      const view = value as unknown as ArrayLike<number | bigint>;
      for (let i = 0; i < view.length; i++) {
        if (!canonical(view[i], out, seen)) return false;
        out.push(",");
      }
      out.push("]");
      return true;
    }
    if (Array.isArray(value)) {
      out.push("a[");
      for (let i = 0; i < value.length; i++) {
        if (!canonical(value[i], out, seen)) return false;
        out.push(",");
      }
      out.push("]");
      return true;
    }
    const proto: unknown = Object.getPrototypeOf(value);
    if (proto !== Object.prototype && proto !== null) return false;
    out.push("o{");
    for (const k of Object.keys(value).sort()) {
      out.push(JSON.stringify(k), ":");
      if (!canonical((value as Record<string, unknown>)[k], out, seen)) return false;
      out.push(",");
    }
    out.push("}");
    return true;
  } finally {
    seen.delete(value);
  }
}

/** The cache key of a fluid definition, or undefined when it holds something not plain data. */
export function specKey(spec: unknown): string | undefined {
  const out: string[] = [];
  if (!canonical(spec, out, new Set())) return undefined;
  return createHash("sha256").update(out.join("")).digest("hex");
}
