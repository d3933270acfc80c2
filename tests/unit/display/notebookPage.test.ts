// A real classic-notebook page through run, refresh (without saving, kernel still running) and
// re-run (tests/browser/notebookPageCheck.mjs): the chart and the explorer go live both times, the
// second time from the runtime the notebook server serves (/nbextensions/isochor/), since the
// kernel sends the inline copy once per session. Uses the build (kernel-lib/dist, widgets/dist):
// `npm test` builds first. Skipped with the reason when Chromium, Debian's Jupyter or the build is
// absent, except with CI=true, where that fails.
import { describe, expect, it } from "vitest";
import { checkNotebookPage, notebookPageUnavailable } from "../../browser/notebookPageCheck.mjs";

const unavailable = notebookPageUnavailable(process.env.ISOCHOR_CHROMIUM);

describe("charts and explorers in a real notebook page", () => {
  it.runIf(unavailable !== null && process.env.CI === "true")("needs the page under CI", () => {
    expect.fail(`notebook page check cannot run: ${unavailable}`);
  });

  it.skipIf(unavailable !== null)(
    `go live after run, refresh and re-run${unavailable ? ` (skipped: ${unavailable})` : ""}`,
    async () => {
      const results = await checkNotebookPage({ chromiumPath: process.env.ISOCHOR_CHROMIUM });
      const failed = results.filter((r) => !r.ok).map((r) => `${r.name}: ${r.message}`);
      expect(failed).toEqual([]);
      // every check ran: first run, refresh, re-run live, served by the server, no errors, notes
      expect(results.length).toBe(6);
    },
    300_000,
  );
});
