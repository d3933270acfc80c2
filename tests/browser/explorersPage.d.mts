/** Types of explorersPage.mjs. */
export const HOSTILE_TITLE: string;
export const PAGE_EXPLORERS: ReadonlyArray<{
  id: string;
  kind: string;
  options: Record<string, unknown>;
}>;
export function writeExplorersPage(
  file: string,
  options?: { requireJs?: boolean },
): Promise<string>;
