// End to end: a notebook that imports "isochor" and shows two charts, run by the records runner,
// then the record opened in headless Chromium. The notebook resolves "isochor" through
// node_modules to kernel-lib/dist, so this needs a build (npm run build); without one it is skipped.
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runNotebooks } from "../../../kernel-lib/src/records/runNotebooks.js";
import { checkRecords, DEFAULT_CHROMIUM_PATH } from "../../browser/checkRecords.mjs";
import { requiredUnderCI } from "../requiredUnderCI.js";

const built = fs.existsSync(
  path.resolve(__dirname, "../../../kernel-lib/dist/display/showChart.js"),
);
const chromium = process.env.ISOCHOR_CHROMIUM ?? DEFAULT_CHROMIUM_PATH;

requiredUnderCI(built, "the build (kernel-lib/dist: npm test builds before vitest)");
requiredUnderCI(fs.existsSync(chromium), `Chromium at ${chromium}`);

describe.skipIf(!built)("a notebook with two charts (needs kernel-lib/dist)", () => {
  let outDir: string;
  let html: string;
  let executed: { cells: Array<{ outputs?: Array<{ data?: Record<string, string> }> }> };

  beforeAll(async () => {
    outDir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-charts-"));
    await runNotebooks([path.join(__dirname, "fixtures", "charts.ipynb")], { outDir });
    html = fs.readFileSync(path.join(outDir, "charts.html"), "utf8");
    executed = JSON.parse(fs.readFileSync(path.join(outDir, "charts.ipynb"), "utf8"));
  }, 60_000);
  afterAll(() => fs.rmSync(outDir, { recursive: true, force: true }));

  it("sends the runtime with the first chart of the session only", () => {
    const first = executed.cells[1].outputs?.[0].data?.["text/html"] ?? "";
    const second = executed.cells[2].outputs?.[0].data?.["text/html"] ?? "";
    expect(first).toContain('data-isochor-once="chart-runtime');
    expect(second).toContain('data-isochor-chart="static"');
    expect(second).not.toContain("data-isochor-once");
  });

  it("inlines the runtime once, in the head, and keeps both charts and the escaped caption", () => {
    expect(html.split("data-isochor-once=")).toHaveLength(2);
    expect(html.indexOf("data-isochor-once=")).toBeLessThan(html.indexOf("</head>"));
    expect(html.match(/<figure class="isochor-chart" /g)).toHaveLength(2);
    expect(html).toContain("&lt;script&gt;alert(1)&lt;/script&gt;</figcaption>");
  });

  it.skipIf(!fs.existsSync(chromium))(
    "goes live in headless Chromium with no request outside file://",
    async () => {
      const [result] = await checkRecords([path.join(outDir, "charts.html")], {
        chromiumPath: chromium,
      });
      expect(result).toEqual({
        name: "charts.html",
        ok: true,
        message: "2 charts live, no request outside file://, no page errors",
      });
    },
    60_000,
  );
});
