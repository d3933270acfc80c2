// How charts look, in headless Chromium (tests/browser/chartLooksCheck.mjs): the isotherm
// explorer's first view stays inside its plot, no label is clipped by the plot frame (P-h explorer
// with the point in the dome, a P-h and a T-s diagram with a process path ending at the plot's
// edge), point labels do not overlap, and every chart carries the theme. Uses the build
// (kernel-lib/dist): `npm test` builds first. Skipped when Chromium is absent, except with
// CI=true, where that fails.
import { existsSync } from "node:fs";
import * as path from "node:path";
import { describe, expect, it } from "vitest";
import { DEFAULT_CHROMIUM_PATH } from "../../browser/explorersCheck.mjs";
import { checkChartLooks } from "../../browser/chartLooksCheck.mjs";

const chromiumPath = process.env.ISOCHOR_CHROMIUM ?? DEFAULT_CHROMIUM_PATH;
const haveChromium = existsSync(chromiumPath);
const root = path.resolve(__dirname, "../../..");

describe("chart looks in Chromium", () => {
  it.runIf(!haveChromium && process.env.CI === "true")("needs Chromium under CI", () => {
    expect.fail(`Chromium not found at ${chromiumPath} (required with CI=true)`);
  });

  it.skipIf(!haveChromium)(
    "lines inside the plot, labels inside the frame and apart, theme on every chart",
    async () => {
      const built = "kernel-lib/dist/display/renderSvg.js";
      expect(existsSync(path.join(root, built)), `${built} missing: run npm run build`).toBe(true);
      const results = await checkChartLooks({ chromiumPath });
      const failed = results.filter((r) => !r.ok).map((r) => `${r.name}: ${r.message}`);
      expect(failed).toEqual([]);
      // 1 explorer check + 4 charts x (inside frame, apart) + theme
      expect(results.length).toBe(10);
    },
    120_000,
  );
});
