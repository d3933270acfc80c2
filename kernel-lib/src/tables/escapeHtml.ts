/**
 * HTML escaping for every user-supplied string that reaches a chart fragment or a record.
 * Text escaping covers element content and double- or single-quoted attribute values.
 */

const HTML_ESCAPES: Record<string, string> = {
  "&": "&amp;",
  "<": "&lt;",
  ">": "&gt;",
  '"': "&quot;",
  "'": "&#39;",
};

/** Escapes `& < > " '` so that `text` shows as text in HTML content and attribute values. */
export function escapeHtml(text: string): string {
  return String(text).replace(/[&<>"']/g, (c) => HTML_ESCAPES[c]);
}

/**
 * Serialises a value as JSON that is safe inside an HTML `<script>` element: `<`, `>`, `&` and the
 * JavaScript line separators U+2028/U+2029 become \u escapes, so no string in the data can close
 * the element or start a comment. `JSON.parse` of the element's text returns the original value.
 */
export function jsonForScript(value: unknown): string {
  return JSON.stringify(value).replace(/[<>&\u2028\u2029]/g, (c) => {
    return "\\u" + c.charCodeAt(0).toString(16).padStart(4, "0");
  });
}
