/** Types of explorersCheck.mjs (plain JavaScript so it runs without a build step). */
export interface ExplorerCheck {
  name: string;
  ok: boolean;
  message: string;
}
export const DEFAULT_CHROMIUM_PATH: string;
export interface CheckExplorersOptions {
  /** Chromium binary. Default /usr/lib/chromium/chromium. */
  chromiumPath?: string;
  /** Where to write the test page (kept). Default: a temporary file, removed afterwards. */
  pageFile?: string;
}
export function checkExplorers(options?: CheckExplorersOptions): Promise<ExplorerCheck[]>;
