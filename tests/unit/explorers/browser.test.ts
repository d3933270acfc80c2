// The explorers in headless Chromium (tests/browser/explorersCheck.mjs): each goes live, a slider
// input redraws a changed chart, a drag moves the P-h state point, a "<script>" title shows as
// text, and no request leaves file://. Uses the build (kernel-lib/dist, widgets/dist): `npm test`
// builds first. Skipped when Chromium is absent, except with CI=true, where that fails.
import { existsSync } from "node:fs";
import * as path from "node:path";
import { describe, expect, it } from "vitest";
import { checkExplorers, DEFAULT_CHROMIUM_PATH } from "../../browser/explorersCheck.mjs";

const chromiumPath = process.env.ISOCHOR_CHROMIUM ?? DEFAULT_CHROMIUM_PATH;
const haveChromium = existsSync(chromiumPath);
const root = path.resolve(__dirname, "../../..");

describe("explorers in Chromium", () => {
  it.runIf(!haveChromium && process.env.CI === "true")("needs Chromium under CI", () => {
    expect.fail(`Chromium not found at ${chromiumPath} (required with CI=true)`);
  });

  it.skipIf(!haveChromium)(
    "go live, redraw on slider input and drag, show a <script> label as text, stay offline",
    async () => {
      for (const built of [
        "kernel-lib/dist/explorers/explorerHtml.js",
        "widgets/dist/isochor-widgets.js",
      ]) {
        expect(existsSync(path.join(root, built)), `${built} missing: run npm run build`).toBe(
          true,
        );
      }
      const results = await checkExplorers({ chromiumPath });
      const failed = results.filter((r) => !r.ok).map((r) => `${r.name}: ${r.message}`);
      expect(failed).toEqual([]);
      // every check ran (3 x live + 3 x slider + drag + escaping + RequireJS + network)
      expect(results.length).toBe(10);
    },
    180_000,
  );
});
