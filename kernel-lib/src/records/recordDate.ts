/**
 * The date format of every record (HTML run record, calculation record in HTML and Markdown):
 * UTC to the second, "2026-12-01 23:40:05 UTC".
 */
export function formatRecordDate(date: Date): string {
  return date
    .toISOString()
    .replace("T", " ")
    .replace(/\.\d+Z$/, " UTC");
}
