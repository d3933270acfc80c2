// The calculation record inside a notebook page: the classic notebook sets the root font size to
// 10 px, so sizes in rem shrank the record to about 580 px; long paths must wrap, not overflow.
import { describe, expect, it } from "vitest";
import { calculationRecordPiece } from "../../../kernel-lib/src/records/calculationHtml.js";

const css = (): string => {
  const html = calculationRecordPiece("<p>x</p>");
  const m = /<style>([\s\S]*?)<\/style>/.exec(html);
  if (!m) throw new Error("no style element in the record piece");
  return m[1];
};

describe("record styles do not depend on the page's root font size", () => {
  it("uses no rem units (a notebook page's html font size must not shrink the record)", () => {
    // media queries are exempt in principle (their rem is the initial 16 px), but none use it now
    expect(css()).not.toMatch(/\d\s*rem\b/);
  });
  it("is at most 960 px wide and fills a narrower output area", () => {
    expect(css()).toMatch(/\.isochor-calc \{[^}]*max-width:960px/);
  });
  it("lets long text (file paths, source notes) wrap anywhere in cells, notes and links", () => {
    const rules = css();
    for (const sel of ["td", "dd", "code", "p", "li", "a", "summary", "details div", "caption"]) {
      const re = new RegExp(`\\.isochor-calc ${sel}[^{]*\\{[^}]*overflow-wrap:anywhere`);
      const grouped = new RegExp(`\\.isochor-calc ${sel}\\s*,[^{]*\\{[^}]*overflow-wrap:anywhere`);
      expect(re.test(rules) || grouped.test(rules), sel).toBe(true);
    }
  });
});
