/**
 * The calculation records started in the current notebook session, so that `isochor run` can write
 * each one as its own files after the last cell. Kept on a global symbol (like the display session)
 * so that the runner's copy of the library and the notebook's copy agree; the runner empties it
 * before each notebook.
 */

/** Options of {@link RegisteredRecord.renderFiles}. */
export interface RenderFilesOptions {
  /**
   * File name stem for the chart images the Markdown shows (`<imageBase>-C1.svg`, ...), relative
   * to the Markdown file. Without it the Markdown lists the charts and draws none.
   */
  readonly imageBase?: string;
}

/** The files of one record: HTML document, Markdown text, and the Markdown's chart images. */
export interface RenderedRecordFiles {
  readonly html: string;
  readonly markdown: string;
  /** SVG files to write beside the Markdown (absent from an older library copy: none). */
  readonly images?: readonly { readonly file: string; readonly content: string }[];
}

/** What the runner needs from a record (a stable, minimal shape across library copies). */
export interface RegisteredRecord {
  /** Short title, for messages. */
  readonly title: string;
  /** The standalone HTML document and the Markdown text, once every pending chart is drawn. */
  renderFiles(options?: RenderFilesOptions): Promise<RenderedRecordFiles>;
}

interface RecordRegistry {
  records: RegisteredRecord[];
}

const KEY = Symbol.for("isochor.records.calculationRecords");

function registry(): RecordRegistry {
  const holder = globalThis as unknown as Record<symbol, RecordRegistry | undefined>;
  let found = holder[KEY];
  if (!found) {
    found = { records: [] };
    holder[KEY] = found;
  }
  return found;
}

/** Adds a record started in this session. */
export function registerRecord(record: RegisteredRecord): void {
  registry().records.push(record);
}

/** The records started since the last reset, in order. */
export function registeredRecords(): readonly RegisteredRecord[] {
  return [...registry().records];
}

/** Forgets every record (the runner calls it before each notebook). */
export function resetRecordRegistry(): void {
  registry().records = [];
}
