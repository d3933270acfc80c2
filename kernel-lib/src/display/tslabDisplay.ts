/**
 * The one door to tslab's display (Node side): whether this process is a tslab kernel (or
 * `isochor run`, which runs tslab's executor in-process), and HTML shown in the current cell.
 * tslab is loaded lazily, and only when asked to display: it pulls in TypeScript.
 */

/** The part of tslab's public module used here. */
interface TslabModule {
  display: { html(s: string): void };
  newDisplay(): { html(s: string): void };
}

function tslabModule(): TslabModule {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  return require("tslab") as TslabModule;
}

/**
 * True when tslab's kernel side (tslab/dist/jupyter.js) is loaded in this process: a notebook
 * kernel or `isochor run`. Looks at the module cache only; loads nothing.
 */
export function inTslabKernel(): boolean {
  return Object.keys(require.cache).some((k) => /[\\/]tslab[\\/]dist[\\/]jupyter\.js$/.test(k));
}

/** Who displays, for the message when there is no cell to display in. */
export interface DisplayCaller {
  /** The public function that displays, e.g. "showChart". */
  readonly name: string;
  /** What to use outside a notebook cell, e.g. "use chartHtml() for HTML". */
  readonly otherwise: string;
}

/**
 * Displays HTML in the current tslab cell as one text/html output.
 * @param caller With it, a failure says that `caller.name` needs a notebook cell and what to use
 *   instead (tslab's own message is kept as the cause); without it, tslab's error passes as is.
 */
export function displayHtml(html: string, caller?: DisplayCaller): void {
  try {
    tslabModule().display.html(html);
  } catch (error) {
    if (caller === undefined) throw error;
    throw new Error(
      `${caller.name} displays in a tslab notebook cell (or under \`isochor run\`); outside one, ` +
        `${caller.otherwise}. tslab said: ` +
        (error instanceof Error ? error.message : String(error)),
      { cause: error },
    );
  }
}

/** A new display output of the current cell that can be updated in place (progress lines). */
export function newTslabDisplay(): { html(s: string): void } {
  return tslabModule().newDisplay();
}
