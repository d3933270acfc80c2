// End to end: a notebook that fills a calculation record (startRecord) is run by the records
// runner; the runner writes <name>.record.html, <name>.record.md and the Markdown's chart images
// (<name>.record-C1.svg, ...) beside the notebook's record,
// removes stale calculation records of that notebook, and both HTML files pass the browser check
// with the script payload of the notebook shown as text. The notebook resolves "isochor" through
// node_modules to kernel-lib/dist, so this needs a build; without one it is skipped.
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runNotebooks } from "../../../kernel-lib/src/records/runNotebooks.js";
import type { NotebookRecord } from "../../../kernel-lib/src/records/runNotebooks.js";
import { checkRecords, DEFAULT_CHROMIUM_PATH } from "../../browser/checkRecords.mjs";
import { requiredUnderCI } from "../requiredUnderCI.js";

const built = fs.existsSync(
  path.resolve(__dirname, "../../../kernel-lib/dist/records/calculationRecord.js"),
);
const chromium = process.env.ISOCHOR_CHROMIUM ?? DEFAULT_CHROMIUM_PATH;
const PAYLOAD = "<script>window.__isochorInjected=1</script>";

requiredUnderCI(built, "the build (kernel-lib/dist: npm test builds before vitest)");
requiredUnderCI(fs.existsSync(chromium), `Chromium at ${chromium}`);

describe.skipIf(!built)("a notebook with a calculation record (needs kernel-lib/dist)", () => {
  let outDir: string;
  let records: NotebookRecord[];
  let recordHtml: string;
  let recordMd: string;
  let notebookHtml: string;

  beforeAll(async () => {
    outDir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-calc-run-"));
    // A stale second record and a stale chart image from an earlier run: the notebook now starts
    // one record with one chart, so they must go.
    fs.writeFileSync(path.join(outDir, "calculation-record.record-2.html"), "stale");
    fs.writeFileSync(path.join(outDir, "calculation-record.record-C7.svg"), "stale");
    records = await runNotebooks([path.join(__dirname, "fixtures", "calculation-record.ipynb")], {
      outDir,
    });
    recordHtml = fs.readFileSync(path.join(outDir, "calculation-record.record.html"), "utf8");
    recordMd = fs.readFileSync(path.join(outDir, "calculation-record.record.md"), "utf8");
    notebookHtml = fs.readFileSync(path.join(outDir, "calculation-record.html"), "utf8");
  }, 120_000);
  afterAll(() => fs.rmSync(outDir, { recursive: true, force: true }));

  it("writes the record as HTML and Markdown and reports them; stale records are removed", () => {
    expect(fs.readdirSync(outDir).sort()).toEqual([
      "calculation-record.html",
      "calculation-record.ipynb",
      "calculation-record.record-C1.svg",
      "calculation-record.record.html",
      "calculation-record.record.md",
    ]);
    expect(records[0].calculationRecords).toEqual([
      {
        title: `Is the ${PAYLOAD} stream far from ideal?`,
        htmlPath: path.join(outDir, "calculation-record.record.html"),
        markdownPath: path.join(outDir, "calculation-record.record.md"),
      },
    ]);
  });

  it("carries the inputs in both units, the model, the traced result, the caution and the chart", () => {
    // 40 barg = 40e5 + 101325 Pa (NIST SP 811 App. B.8: bar and standard atmosphere are exact).
    expect(recordHtml).toContain("4101325 Pa");
    expect(recordHtml).toContain("313.15 K");
    expect(recordHtml).toContain("Peng");
    expect(recordHtml).toMatch(
      /<a href="#rec-[0-9a-f]+-M1">M1<\/a>; <a href="#rec-[0-9a-f]+-I1">I1<\/a>, <a href="#rec-[0-9a-f]+-I2">I2<\/a>/,
    );
    expect(recordHtml).toContain("pressure containment");
    expect(recordHtml.match(/<figure class="isochor-chart" /g)).toHaveLength(1);
    expect(recordHtml.split("data-isochor-once=")).toHaveLength(2); // one runtime, in the head
    expect(recordMd).toContain("| I2 | inlet pressure | 40 barg | 4101325 Pa |");
    // the Markdown draws its chart from an SVG file beside it, alt text escaped
    expect(recordMd).toContain("**C1** (chart): Z of the stream \\<script\\>. Basis: M1.");
    expect(recordMd).toContain(
      "![C1: Z of the stream \\<script\\>](calculation-record.record-C1.svg)",
    );
    const svg = fs.readFileSync(path.join(outDir, "calculation-record.record-C1.svg"), "utf8");
    expect(svg).toMatch(/^<svg /);
    expect(svg).not.toContain("<script");
    // Tables, chart and answer showed as they were added (live), and rec.show() put the whole
    // record into the notebook's own record as well; chart ids are not repeated.
    expect(notebookHtml).toContain('class="isochor-calc"');
    expect(notebookHtml.match(/<figure class="isochor-chart" /g)).toHaveLength(2);
    const ids = [...notebookHtml.matchAll(/<figure class="isochor-chart" id="([^"]+)"/g)].map(
      (m) => m[1],
    );
    expect(new Set(ids).size).toBe(2);
  });

  it("escapes the notebook's script payload everywhere", () => {
    const outsideRuntime = (html: string) =>
      html.replace(/<script data-isochor-once[\s\S]*?<\/script>/g, "");
    expect(outsideRuntime(recordHtml)).not.toContain(PAYLOAD);
    expect(outsideRuntime(notebookHtml)).not.toContain("<script>window.__isochorInjected");
    expect(recordMd).not.toMatch(/(^|[^\\])<script>/m);
  });

  it.skipIf(!fs.existsSync(chromium))(
    "both records go live in headless Chromium, payload shown as text, no script run",
    async () => {
      const results = await checkRecords([path.join(outDir, "calculation-record.html")], {
        chromiumPath: chromium,
        expectText: [PAYLOAD],
      });
      // The notebook's record shows the chart twice (as added, and in the whole record at show()):
      // both copies must go live, so they cannot share an element id.
      expect(results).toEqual([
        {
          name: "calculation-record.html",
          ok: true,
          message: "2 charts live, no request outside file://, no page errors",
        },
        {
          name: "calculation-record.record.html",
          ok: true,
          message: "1 chart live, no request outside file://, no page errors",
        },
      ]);
    },
    90_000,
  );
});
