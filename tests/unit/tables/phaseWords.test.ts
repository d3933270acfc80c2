/**
 * Phase kinds are identifiers ("vapor"); tables print the reader's word ("vapour"), the spelling
 * of the project's prose, so a table never shows "vapor" beside a "saturated vapour" row.
 */
import { describe, expect, it } from "vitest";
import { phaseWord } from "../../../kernel-lib/src/tables/phaseWords.js";
import { tableHtml } from "../../../kernel-lib/src/tables/tableHtml.js";
import { tableText } from "../../../kernel-lib/src/tables/tableText.js";

describe("phase words", () => {
  it("spells phase kinds and lists of them as the reader's words", () => {
    expect(phaseWord("vapor")).toBe("vapour");
    expect(phaseWord("vapor+liquid")).toBe("vapour+liquid");
    expect(phaseWord("vapor+liquid+liquid-2")).toBe("vapour+liquid+liquid-2");
    expect(phaseWord("liquid")).toBe("liquid");
    expect(phaseWord("supercritical")).toBe("supercritical");
  });

  it("leaves other text alone (a user's own label is not a phase kind)", () => {
    expect(phaseWord("vapor line 3")).toBe("vapor line 3");
    expect(phaseWord("Vapor")).toBe("Vapor");
    expect(phaseWord("")).toBe("");
  });

  it("tables print the word in text cells, HTML and text alike", () => {
    const rows = [
      { name: "saturated vapour", phase: "vapor" },
      { name: "feed", phase: "vapor+liquid" },
    ];
    const columns = [
      { key: "name", label: "State", text: true as const },
      { key: "phase", label: "Phase", text: true as const },
    ];
    for (const out of [tableHtml(rows, columns), tableText(rows, columns)]) {
      expect(out).toContain("vapour+liquid");
      expect(out).not.toMatch(/\bvapor\b/);
    }
  });
});
