/** Types of notebookPageCheck.mjs (plain JavaScript so it runs without a build step). */
export interface NotebookPageCheck {
  name: string;
  ok: boolean;
  message: string;
}
export interface CheckNotebookPageOptions {
  /** Chromium binary. Default /usr/lib/chromium/chromium. */
  chromiumPath?: string;
  /** Longest wait for the server, the kernel and the outputs, ms. Default 90000 (generous: `npm test` runs it beside other tests). */
  timeoutMs?: number;
}
/** Null when the check can run here, otherwise the reason it cannot. */
export function notebookPageUnavailable(chromiumPath?: string): string | null;
export function checkNotebookPage(options?: CheckNotebookPageOptions): Promise<NotebookPageCheck[]>;
