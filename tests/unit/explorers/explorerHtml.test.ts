import { createRequire } from "node:module";
import * as path from "node:path";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { resetDisplaySession } from "../../../kernel-lib/src/display/displaySession.js";
import { RUNTIME_MARKER_ATTRIBUTE } from "../../../kernel-lib/src/display/vegaRuntime.js";
import { explorerHtml } from "../../../kernel-lib/src/explorers/explorerHtml.js";
import { showExplorer } from "../../../kernel-lib/src/explorers/showExplorer.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

const HOSTILE = `</script><script>alert("x")</script><img src=x onerror=alert(1)> & 'q'`;

function stateJson(html: string): unknown {
  const m =
    /<script type="application\/json" class="isochor-explorer-state">([\s\S]*?)<\/script>/.exec(
      html,
    );
  expect(m).not.toBeNull();
  return JSON.parse(m![1]);
}

describe("explorerHtml", () => {
  it("escapes every user string: title in the alt text, the status and the state JSON", async () => {
    const html = await explorerHtml("isotherms", {
      components: "methane",
      title: HOSTILE,
      caption: HOSTILE,
      model: "peng-robinson",
    });
    expect(html).not.toContain("<script>alert");
    expect(html).not.toContain("<img src=x");
    expect(html).toContain("&lt;/script&gt;&lt;script&gt;alert(&quot;x&quot;)");
    // the state round-trips through its JSON element, title included
    const state = stateJson(html) as { title: string; kind: string };
    expect(state.title).toBe(HOSTILE);
    expect(state.kind).toBe("isotherms");
    // exactly two script elements of its own: the JSON state and the boot script
    expect(html.match(/<script/g)?.length).toBe(2);
    // static fallback: an SVG image, and the chart marker the record checker counts
    expect(html).toContain('src="data:image/svg+xml;base64,');
    expect(html).toContain('data-isochor-chart="static"');
  });

  it("carries a starting table for the P-h explorer", async () => {
    const html = await explorerHtml("pressure-enthalpy", { components: "propane" });
    expect(html).toContain('class="isochor-table"');
    expect(html).toContain("state point");
  });

  it("refuses bad fragment options", async () => {
    await expect(
      explorerHtml("isotherms", { components: "methane", runtimeWaitMs: -1 }),
    ).rejects.toThrow(InputError);
  });
});

// tslab's display API hands each display to jupyter.lastWriteDisplayData; captured here as the
// records runner does.
const requireFromRoot = createRequire(path.resolve(__dirname, "../../../package.json"));
const jupyter = requireFromRoot("tslab/dist/jupyter") as {
  lastWriteDisplayData: null | ((data: { data: Record<string, string> }, update: boolean) => void);
};

describe("showExplorer", () => {
  let shown: string[];
  beforeEach(() => {
    shown = [];
    resetDisplaySession();
    jupyter.lastWriteDisplayData = (message) => void shown.push(message.data["text/html"]);
  });
  afterEach(() => {
    jupyter.lastWriteDisplayData = null;
  });

  const onceScripts = (html: string): string[] =>
    [...html.matchAll(new RegExp(`<script ${RUNTIME_MARKER_ATTRIBUTE}="([^"]*)"`, "g"))].map(
      (m) => m[1].split(" ")[0],
    );

  it("sends the chart runtime and the bundle with the first output of a session only", async () => {
    await showExplorer("isotherms", { components: "methane", model: "peng-robinson" });
    await showExplorer("isotherms", { components: "methane", model: "peng-robinson" });
    resetDisplaySession();
    await showExplorer("isotherms", { components: "methane", model: "peng-robinson" });
    expect(shown.map(onceScripts)).toEqual([
      ["chart-runtime", "explorers"],
      [],
      ["chart-runtime", "explorers"],
    ]);
    // one output per call
    expect(shown.length).toBe(3);
  });

  it("gives the claim back when the explorer cannot be built", async () => {
    await expect(
      showExplorer("isotherms", { components: "methane", temperatureK: NaN }),
    ).rejects.toThrow(InputError);
    await showExplorer("isotherms", { components: "methane", model: "peng-robinson" });
    expect(onceScripts(shown[0])).toEqual(["chart-runtime", "explorers"]);
  });
});
