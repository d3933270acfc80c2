/**
 * Markdown escaping of plain text (browser-safe), for every Markdown the library writes: table
 * cells (tableMarkdown) and calculation records. CommonMark backslash escapes of the characters
 * that start inline markup, including `<` and `&`, so no HTML can pass through a Markdown
 * renderer; control characters and line breaks collapse to one space, so the text stays on its
 * line (a table cell, a list item).
 */

/** Escapes text for Markdown inline content, on one line. */
export function escapeMarkdown(text: string): string {
  return (
    String(text)
      // eslint-disable-next-line no-control-regex
      .replace(/[\u0000-\u001f\u007f\u2028\u2029]+/g, " ")
      .replace(/[\\`*_{}[\]<>!|&~]/g, (c) => `\\${c}`)
  );
}

/**
 * Escapes text that starts a line (a paragraph, a quote): as {@link escapeMarkdown}, and a block
 * marker at its start (heading, list, numbered list, rule) stays text.
 */
export function escapeMarkdownBlock(text: string): string {
  return escapeMarkdown(text)
    .replace(/^(\s*)([#+=-])/, "$1\\$2")
    .replace(/^(\s*\d+)([.)])/, "$1\\$2");
}
