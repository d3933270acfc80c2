import { createRequire } from "node:module";
import * as path from "node:path";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { resetDisplaySession } from "../../../kernel-lib/src/display/displaySession.js";
import { showChart } from "../../../kernel-lib/src/display/showChart.js";
import { RUNTIME_MARKER_ATTRIBUTE } from "../../../kernel-lib/src/display/vegaRuntime.js";
import type { VegaLiteSpec } from "../../../kernel-lib/src/display/vegaLiteSpec.js";

// tslab's display API hands each display to jupyter.lastWriteDisplayData (set by the kernel per
// request); here it is set to a capture, as the records runner does.
const requireFromRoot = createRequire(path.resolve(__dirname, "../../../package.json"));
const jupyter = requireFromRoot("tslab/dist/jupyter") as {
  lastWriteDisplayData: null | ((data: { data: Record<string, string> }, update: boolean) => void);
};

const spec: VegaLiteSpec = {
  data: { values: [{ x: 1, y: 2 }] },
  mark: "point",
  encoding: { x: { field: "x", type: "quantitative" }, y: { field: "y", type: "quantitative" } },
};

describe("showChart", () => {
  let shown: string[];
  beforeEach(() => {
    shown = [];
    resetDisplaySession();
    jupyter.lastWriteDisplayData = (message) => void shown.push(message.data["text/html"]);
  });
  afterEach(() => {
    jupyter.lastWriteDisplayData = null;
  });

  const carriesRuntime = (html: string): boolean => html.includes(RUNTIME_MARKER_ATTRIBUTE);

  it("displays one text/html output per chart; only the first of a session carries the runtime", async () => {
    await showChart(spec);
    await showChart(spec, { caption: "second" });
    await showChart(spec, { includeRuntime: true });
    expect(shown.map(carriesRuntime)).toEqual([true, false, true]);
    resetDisplaySession();
    await showChart(spec);
    expect(shown.map(carriesRuntime)).toEqual([true, false, true, true]);
  });

  it("sends the runtime once when two charts are started together", async () => {
    await Promise.all([showChart(spec), showChart(spec)]);
    expect(shown.map(carriesRuntime).sort()).toEqual([false, true]);
  });

  it("outside a notebook cell: says what to use instead, and the runtime is still due", async () => {
    jupyter.lastWriteDisplayData = null;
    await expect(showChart(spec)).rejects.toThrow(/use chartHtml\(\) for HTML or savePng\(\)/);
    jupyter.lastWriteDisplayData = (message) => void shown.push(message.data["text/html"]);
    await showChart(spec);
    expect(shown.map(carriesRuntime)).toEqual([true]);
  });
});
