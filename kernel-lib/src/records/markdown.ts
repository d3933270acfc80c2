/**
 * Markdown cells in records, rendered by markdown-it (CommonMark) with raw HTML escaped, so a
 * notebook's text cannot inject markup or scripts into a record. Images load nothing from the
 * network: data: URIs and cell attachments are embedded, anything else is shown as a text note.
 */
import { escapeHtml } from "../display/escapeHtml.js";

/** The slice of markdown-it's API used here (markdown-it 15 ships no TypeScript types). */
interface MarkdownToken {
  attrGet(name: string): string | null;
  content: string;
  children: MarkdownToken[] | null;
}
interface MarkdownRenderer {
  render(source: string, env?: unknown): string;
  renderer: {
    rules: Record<
      string,
      | ((
          tokens: MarkdownToken[],
          index: number,
          options: unknown,
          env: unknown,
          self: unknown,
        ) => string)
      | undefined
    >;
  };
}
type MarkdownItConstructor = new (options: Record<string, unknown>) => MarkdownRenderer;

let renderer: MarkdownRenderer | undefined;

interface RenderEnv {
  attachments: Record<string, Record<string, string>>;
}

function markdownIt(): MarkdownRenderer {
  if (renderer) return renderer;
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const MarkdownIt = require("markdown-it") as MarkdownItConstructor;
  const md = new MarkdownIt({ html: false, linkify: false, typographer: false });
  md.renderer.rules.image = (tokens, index, _options, env) => {
    const token = tokens[index];
    const src = token.attrGet("src") ?? "";
    const alt = (token.children ?? []).map((c) => c.content).join("") || token.content;
    let dataUri: string | undefined;
    if (/^data:image\/(png|jpeg|gif|webp);base64,[A-Za-z0-9+/=\s]+$/.test(src)) dataUri = src;
    const attachment = /^attachment:(.+)$/.exec(src);
    if (attachment) {
      const bundle = (env as RenderEnv).attachments[attachment[1]] ?? {};
      const mime = Object.keys(bundle).find((m) => /^image\/(png|jpeg|gif|webp)$/.test(m));
      if (mime) dataUri = `data:${mime};base64,${String(bundle[mime]).replace(/\s/g, "")}`;
    }
    if (dataUri) return `<img src="${escapeHtml(dataUri)}" alt="${escapeHtml(alt)}">`;
    return `<span class="missing-image">[image not embedded: ${escapeHtml(alt || src)}]</span>`;
  };
  renderer = md;
  return md;
}

/** Renders one markdown cell's text to HTML (raw HTML in the text is shown escaped). */
export function renderMarkdown(
  source: string,
  attachments: Record<string, Record<string, string>> = {},
): string {
  return markdownIt().render(source, { attachments } satisfies RenderEnv);
}

/** The text of the first heading in markdown source, without inline markup; undefined if none. */
export function firstHeading(source: string): string | undefined {
  const match = /^[ \t]{0,3}#{1,6}[ \t]+(.+?)[ \t#]*$/m.exec(source);
  if (!match) return undefined;
  return match[1]
    .replace(/!?\[([^\]]*)\]\([^)]*\)/g, "$1")
    .replace(/[*_`~]/g, "")
    .trim();
}
