/** Types of chartLooksCheck.mjs (plain JavaScript so it runs without a build step). */
export interface LooksCheck {
  name: string;
  ok: boolean;
  message: string;
}
export interface CheckChartLooksOptions {
  /** Chromium binary. Default /usr/lib/chromium/chromium. */
  chromiumPath?: string;
  /** Where to write the test page (kept). Default: a temporary file, removed afterwards. */
  pageFile?: string;
}
export function buildLookCharts(): Promise<Record<string, unknown>>;
export function writeLooksPage(file: string): Promise<string[]>;
export function checkChartLooks(options?: CheckChartLooksOptions): Promise<LooksCheck[]>;
