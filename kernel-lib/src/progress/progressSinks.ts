/**
 * Progress sinks (Node side). In a tslab kernel: one display output updated in place through
 * tslab's `newDisplay()`. Elsewhere: a terminal line rewritten with a carriage return when stderr
 * is a terminal, else only the final summary line on stderr; or nothing at all.
 */
import { inTslabKernel, newTslabDisplay } from "../display/tslabDisplay.js";
import { progressHtml, progressLine } from "./formatProgress.js";
import type { ProgressSink, ProgressSnapshot } from "./progressTypes.js";

/** A sink that shows nothing. */
export function silentSink(): ProgressSink {
  return { show: () => undefined };
}

/** A sink writing to a stream (default: process.stderr): live line on a terminal, summary always. */
export function streamSink(
  stream: { write(text: string): unknown; isTTY?: boolean } = process.stderr,
): ProgressSink {
  let live = false;
  return {
    show(s: ProgressSnapshot) {
      const line = progressLine(s);
      if (s.status === "running") {
        if (stream.isTTY) {
          stream.write(`\r${line}\u001b[K`);
          live = true;
        }
        return;
      }
      stream.write(`${live ? "\r" : ""}${line}${live ? "\u001b[K" : ""}\n`);
      live = false;
    },
  };
}

/** A sink that updates one tslab display output in place (HTML). */
export function tslabSink(display: { html(s: string): void }): ProgressSink {
  return { show: (s) => display.html(progressHtml(s)) };
}

/**
 * The sink for the current process: a tslab display when running inside a tslab kernel that can
 * display, else {@link streamSink} on stderr. tslab is only loaded when it is already loaded
 * (a kernel is running), so a plain Node script does not pay for loading TypeScript.
 */
export function autoSink(): ProgressSink {
  if (inTslabKernel()) {
    try {
      const display = newTslabDisplay();
      const sink = tslabSink(display);
      return {
        show(s) {
          try {
            sink.show(s);
          } catch {
            // Display not ready (e.g. executed outside a cell): fall back to stderr for good.
            this.show = streamSink().show;
            this.show(s);
          }
        },
      };
    } catch {
      // tslab not resolvable from here: fall through to stderr.
    }
  }
  return streamSink();
}
