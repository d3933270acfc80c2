import { describe, expect, it } from "vitest";
import { CHART_STATE_ATTRIBUTE, chartHtml } from "../../../kernel-lib/src/display/chartHtml.js";
import { escapeHtml, jsonForScript } from "../../../kernel-lib/src/display/escapeHtml.js";
import { RUNTIME_MARKER_ATTRIBUTE } from "../../../kernel-lib/src/display/vegaRuntime.js";
import type { VegaLiteSpec } from "../../../kernel-lib/src/display/vegaLiteSpec.js";
import { themeConfig } from "../../../kernel-lib/src/charts/theme.js";

const hostile = '</script><script>alert("x")</script>';
const spec: VegaLiteSpec = {
  title: hostile,
  data: {
    values: [
      { stream: hostile, rateKgPerS: 3 },
      { stream: "feed", rateKgPerS: 5 },
    ],
  },
  mark: "bar",
  encoding: {
    x: { field: "stream", type: "nominal", title: hostile },
    y: { field: "rateKgPerS", type: "quantitative" },
  },
};

function scriptElements(html: string): string[] {
  return html.match(/<script[^>]*>/g) ?? [];
}

describe("chartHtml", () => {
  it("contains the static SVG (as an image), the spec as data, one boot script, and the static marker", async () => {
    const html = await chartHtml(spec);
    // Inline <svg> would be stripped by the classic notebook's sanitizer when untrusted; an image is kept.
    expect(html).not.toContain("<svg");
    const image =
      /<div class="isochor-chart-static"><img width="(\d+)" height="(\d+)" alt="([^"]*)" src="data:image\/svg\+xml;base64,([A-Za-z0-9+/=]+)"><\/div>/.exec(
        html,
      );
    expect(image).not.toBeNull();
    const svg = Buffer.from(image?.[4] ?? "", "base64").toString("utf8");
    expect(svg.startsWith("<svg")).toBe(true);
    expect(svg).toContain(`width="${image?.[1]}"`);
    expect(svg.match(/aria-roledescription="bar"/g)).toHaveLength(2);
    expect(image?.[3]).toBe(escapeHtml(hostile)); // alt text: the title, escaped
    expect(html).toContain(`${CHART_STATE_ATTRIBUTE}="static"`);
    // Exactly two script elements: the spec (JSON data, not code) and the boot script.
    expect(scriptElements(html)).toEqual([
      '<script type="application/json" class="isochor-chart-spec">',
      "<script>",
    ]);
    expect(html).not.toContain(RUNTIME_MARKER_ATTRIBUTE);
  });

  it("keeps hostile labels as text: no extra script element, spec JSON round-trips", async () => {
    const html = await chartHtml(spec, { caption: hostile });
    expect(scriptElements(html)).toHaveLength(2);
    expect(html).not.toContain('<script>alert("x")');
    expect(html).toContain(
      `<figcaption class="isochor-chart-caption" style="font-size:0.9em;opacity:0.8">${escapeHtml(hostile)}</figcaption>`,
    );
    const json =
      /<script type="application\/json" class="isochor-chart-spec">([\s\S]*?)<\/script>/.exec(
        html,
      )?.[1];
    expect(json).toBeDefined();
    // the raw spec comes back with the project's theme merged in, nothing else changed
    expect(JSON.parse(json as string)).toEqual({ ...spec, config: themeConfig() });
  });

  it("keeps a spec's own config block (the theme goes only where there is none)", async () => {
    const own = { ...spec, config: { background: "#ffffff" } };
    const html = await chartHtml(own);
    const json = /class="isochor-chart-spec">([\s\S]*?)<\/script>/.exec(html)?.[1];
    expect(JSON.parse(json as string).config).toEqual({ background: "#ffffff" });
  });

  it("puts the runtime first, once, only when asked", async () => {
    const html = await chartHtml(spec, { includeRuntime: true });
    expect(html.startsWith(`<script ${RUNTIME_MARKER_ATTRIBUTE}="chart-runtime vega@`)).toBe(true);
    expect(html.split(RUNTIME_MARKER_ATTRIBUTE)).toHaveLength(2);
  });

  it("gives every chart its own id", async () => {
    const ids = await Promise.all([chartHtml(spec), chartHtml(spec)]).then((all) =>
      all.map((h) => /<figure class="isochor-chart" id="([^"]+)"/.exec(h)?.[1]),
    );
    expect(ids[0]).toMatch(/^isochor-chart-[0-9a-f]{12}$/);
    expect(ids[0]).not.toBe(ids[1]);
  });

  it("refuses bad options", async () => {
    await expect(chartHtml(spec, { runtimeWaitMs: Number.NaN })).rejects.toThrow(/runtimeWaitMs/);
    await expect(chartHtml(spec, { runtimeWaitMs: -1 })).rejects.toThrow(/runtimeWaitMs/);
    await expect(chartHtml(spec, { caption: 42 as unknown as string })).rejects.toThrow(/caption/);
  });
});

describe("escapeHtml and jsonForScript", () => {
  it("escapes the five HTML-significant characters", () => {
    expect(escapeHtml(`<a href="x" title='y'>&</a>`)).toBe(
      "&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;",
    );
  });
  it("writes JSON with no <, >, & or line separators, that parses back", () => {
    const value = { label: "</script><!-- & \u2028 \u2029 -->" };
    const text = jsonForScript(value);
    expect(text).not.toMatch(/[<>&\u2028\u2029]/);
    expect(JSON.parse(text)).toEqual(value);
  });
});
