/** Types of checkRecords.mjs (plain JavaScript so it runs without a build step). */
export interface RecordCheck {
  name: string;
  ok: boolean;
  message: string;
}
export const DEFAULT_CHROMIUM_PATH: string;
/** Global that security payloads set; it must stay undefined. */
export const INJECTION_FLAG: string;
export interface CheckRecordsOptions {
  /** Chromium binary. Default /usr/lib/chromium/chromium. */
  chromiumPath?: string;
  /** Time for all charts of a record to go live, ms. Default 20000. */
  timeoutMs?: number;
  /** Strings each page must show as literal text (outside script/style). Default none. */
  expectText?: string[];
  /** Strings every live chart of each page must draw (its SVG text). Default none. */
  expectChartText?: string[];
  /** Window properties that must stay undefined. Default [INJECTION_FLAG]. */
  forbiddenGlobals?: string[];
  /** Also check x.record.html, x.record-N.html beside each x.html. Default true. */
  siblings?: boolean;
}
export function checkRecords(
  htmlFiles: string[],
  options?: CheckRecordsOptions,
): Promise<RecordCheck[]>;
