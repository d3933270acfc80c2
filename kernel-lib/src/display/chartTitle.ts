import type { VegaLiteSpec } from "./vegaLiteSpec.js";

/** A spec's title as one line of plain text (alt text, record captions); undefined without one. */
export function chartTitle(spec: VegaLiteSpec): string | undefined {
  const title = spec.title;
  if (typeof title === "string") return title;
  if (Array.isArray(title)) return title.join(" ");
  if (title && typeof title === "object") {
    return Array.isArray(title.text) ? title.text.join(" ") : String(title.text);
  }
  return undefined;
}
