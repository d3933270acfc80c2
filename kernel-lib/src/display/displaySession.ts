/**
 * Per-kernel-session display state: whether the chart runtime has been sent to the page yet.
 * Kept on a global symbol rather than in a module variable, so that every copy of the library
 * loaded in one process (the runner's and a notebook's) agrees, and so the records runner can
 * start a fresh session for each notebook it executes.
 */
interface DisplaySession {
  runtimeSent: boolean;
  /**
   * Other once-per-page scripts already sent this session, by their RUNTIME_MARKER_ATTRIBUTE
   * value (e.g. the explorers' bundle). Cleared with the runtime flag.
   */
  scriptsSent: Set<string>;
}

const KEY = Symbol.for("isochor.display.session");

export function displaySession(): DisplaySession {
  const holder = globalThis as unknown as Record<symbol, DisplaySession | undefined>;
  let session = holder[KEY];
  if (!session) {
    session = { runtimeSent: false, scriptsSent: new Set() };
    holder[KEY] = session;
  }
  // a session made by an older copy of the library in the same process lacks the set
  session.scriptsSent ??= new Set();
  return session;
}

/**
 * Starts a fresh display session: the next chart shown carries the inline runtime again.
 * A page reloaded without restarting the kernel loads the runtime from its notebook server
 * (pageLoader.ts); where the server does not serve it, call this and re-run the cell. The
 * records runner calls it before each notebook.
 */
export function resetDisplaySession(): void {
  const session = displaySession();
  session.runtimeSent = false;
  session.scriptsSent.clear();
}
