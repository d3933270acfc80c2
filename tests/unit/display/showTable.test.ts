import { createRequire } from "node:module";
import * as path from "node:path";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { showTable } from "../../../kernel-lib/src/display/showTable.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { stateTable } from "../../../kernel-lib/src/tables/stateTable.js";
import { tableHtml } from "../../../kernel-lib/src/tables/tableHtml.js";

// tslab's display API hands each display to jupyter.lastWriteDisplayData; captured here, as in
// showChart.test.ts
const requireFromRoot = createRequire(path.resolve(__dirname, "../../../package.json"));
const jupyter = requireFromRoot("tslab/dist/jupyter") as {
  lastWriteDisplayData: null | ((data: { data: Record<string, string> }, update: boolean) => void);
};

describe("showTable", () => {
  let shown: string[];
  beforeEach(() => {
    shown = [];
    jupyter.lastWriteDisplayData = (message) => void shown.push(message.data["text/html"]);
  });
  afterEach(() => {
    jupyter.lastWriteDisplayData = null;
  });

  const methane = defineFluid({ components: ["methane"], model: "peng-robinson" });
  const states = [methane.state({ T: 300, P: 50e5 })];

  it("shows a stateTable in one call, as tableHtml renders it; options override the table's", () => {
    const table = stateTable(states, { names: ["C1 at 50 bar"] });
    showTable(table, { caption: "Methane" });
    expect(shown).toHaveLength(1);
    expect(shown[0]).toBe(tableHtml(table, { caption: "Methane" }));
    expect(shown[0]).toContain("C1 at 50 bar");
    expect(shown[0]).toContain(">Methane</caption>");
  });

  it("also takes rows and column specs", () => {
    showTable([{ a: 1 }], [{ key: "a", label: "A", digits: 2 }]);
    expect(shown[0]).toContain(">1.0</td>");
  });

  it("outside a notebook cell: says what to use instead", () => {
    jupyter.lastWriteDisplayData = null;
    expect(() => showTable(stateTable(states))).toThrow(/showTable.*tableHtml\(\)/);
  });
});
