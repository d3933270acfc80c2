// Records that read like a calculation: one-line citations with the full provenance note folded
// away, one statement of the data recalled from memory, and a layout that fits a notebook cell
// (about 580 px wide) without tall narrow blocks or a path running off the edge.
import { describe, expect, it } from "vitest";
import { startRecord } from "../../../kernel-lib/src/records/calculationRecord.js";
import { hasMoreThanCitation, shortCitation } from "../../../kernel-lib/src/records/sourceNotes.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";

const fresh = () =>
  startRecord({
    question: "What does the Corvid Point demethanizer overhead do across its letdown valve?",
    site: "Corvid Point Gas Plant (invented)",
    register: false,
  });

const gas = defineFluid({ components: ["methane", "ethane", "propane"], model: "peng-robinson" });
const methaneNote = getComponent("methane").sources.heatCapacity;

describe("one-line citations", () => {
  it("cuts a note at its first clause outside brackets, at most 90 characters, at a word", () => {
    expect(
      shortCitation("Perry's Handbook, 8th ed. (2008), Table 2-156: Aly-Lee form; from memory"),
    ).toBe("Perry's Handbook, 8th ed. (2008), Table 2-156");
    // a colon inside brackets does not cut
    expect(shortCitation("Smith (1999: NASA form), fit; rest")).toBe(
      "Smith (1999: NASA form), fit",
    );
    const long = `${"word ".repeat(40)}end`;
    const c = shortCitation(long);
    expect(c.length).toBeLessThanOrEqual(90);
    expect(c.endsWith("…")).toBe(true);
    expect(c).not.toMatch(/wor…$/); // whole words only
    expect(hasMoreThanCitation("Short source")).toBe(false);
  });
  it("the methane cp note (hundreds of characters) becomes a short line", () => {
    expect(methaneNote.length).toBeGreaterThan(300);
    expect(shortCitation(methaneNote).length).toBeLessThanOrEqual(90);
  });
});

describe("the model section in HTML", () => {
  const rec = fresh();
  rec.model(gas, { label: "Overhead gas" });
  const html = rec.html();
  it("shows each long note once, folded inside <details>, with the short line as its summary", () => {
    const summary = `<details class="calc-note"><summary>`;
    expect(html).toContain(summary);
    // the full methane note is still there (folded), exactly once in the model section
    const escaped = methaneNote.replace(/&/g, "&amp;").replace(/'/g, "&#39;");
    const count = html.split(escaped.slice(0, 120)).length - 1;
    expect(count).toBe(1);
    const before = html.indexOf(escaped.slice(0, 120));
    expect(html.lastIndexOf(summary, before)).toBeGreaterThan(-1);
  });
  it("states which data were recalled from memory and how they were checked", () => {
    expect(html).toContain("Recalled data");
    expect(html).toMatch(
      /Recalled from memory of the cited sources[^<]*heat-capacity data of methane, ethane, propane/,
    );
    expect(html).toContain("tests/unit/idealgas");
  });
});

describe("the model section in Markdown", () => {
  const rec = fresh();
  rec.model(gas, { label: "Overhead gas" });
  it("a short line per component with a note number, the full notes listed once below", async () => {
    const md = await rec.markdown();
    const line = md.split("\n").find((l) => l.startsWith("- Ideal gas, methane:"));
    expect(line).toBeDefined();
    expect(line!.length).toBeLessThan(260);
    expect(line).toMatch(/\[M1\.\d+\]$/);
    expect(md).toContain("Source notes of M1:");
    const num = /\[(M1\.\d+)\]$/.exec(line!)![1];
    const listed = md.split("\n").filter((l) => l.startsWith(`- [${num}] `));
    expect(listed).toHaveLength(1);
    expect(listed[0].length).toBeGreaterThan(300);
    expect(md).toMatch(/- Recalled data: Recalled from memory/);
  });
});

describe("the record inside a notebook cell (about 580 px)", () => {
  const rec = fresh();
  rec.model(gas, { label: "Overhead gas" });
  const path =
    "/home/engineer/corvid-point/gas-plant/demethanizer/letdown-study/campaign-2026/inputs.csv";
  rec.input("overhead pressure", 28, "barg", { source: `logged in ${path}` });
  const html = rec.html();
  it("wraps long words and paths instead of letting them overflow (overflow-wrap)", () => {
    expect(html).toMatch(
      /\.isochor-calc td, \.isochor-calc dd, \.isochor-calc code[^{]*\{ overflow-wrap:anywhere; \}/,
    );
    expect(html).toContain(path);
  });
  it("the key-value grid may shrink its value column and stacks below 640 px", () => {
    // sizes in px: a notebook page's root font size (10 px in the classic notebook) must not
    // shrink the record (tests/unit/records/recordWidth.test.ts)
    expect(html).toContain("grid-template-columns:minmax(88px,160px) minmax(0,1fr)");
    expect(html).toMatch(
      /@media \(max-width:640px\) \{\s*\.isochor-calc dl\.calc-kv \{ grid-template-columns:minmax\(0,1fr\); \}/,
    );
  });
});
