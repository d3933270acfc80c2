/** Types of checkRecords.mjs (plain JavaScript so it runs without a build step). */
export interface RecordCheck {
  name: string;
  ok: boolean;
  message: string;
}
export const DEFAULT_CHROMIUM_PATH: string;
export function checkRecords(
  htmlFiles: string[],
  options?: { chromiumPath?: string; timeoutMs?: number },
): Promise<RecordCheck[]>;
