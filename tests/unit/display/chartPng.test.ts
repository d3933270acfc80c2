import { withTheme } from "../../../kernel-lib/src/charts/theme.js";
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { describe, expect, it } from "vitest";
import {
  chartPng,
  savePng,
  systemFontsAvailable,
} from "../../../kernel-lib/src/display/chartPng.js";
import { renderSvg } from "../../../kernel-lib/src/display/renderSvg.js";
import type { VegaLiteSpec } from "../../../kernel-lib/src/display/vegaLiteSpec.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { requiredUnderCI } from "../requiredUnderCI.js";

const spec: VegaLiteSpec = {
  width: 240,
  height: 160,
  data: {
    values: [
      { t: 300, p: 1 },
      { t: 350, p: 3 },
      { t: 400, p: 8 },
    ],
  },
  mark: "line",
  encoding: {
    x: { field: "t", type: "quantitative", title: "Temperature / K" },
    y: { field: "p", type: "quantitative", title: "Pressure / bar" },
  },
};

// PNG signature and IHDR layout: PNG specification (W3C/ISO 15948), sections 5.2 and 11.2.2.
const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

function pngSize(png: Uint8Array): { width: number; height: number } {
  const view = new DataView(png.buffer, png.byteOffset, png.byteLength);
  expect(String.fromCharCode(...png.slice(12, 16))).toBe("IHDR");
  return { width: view.getUint32(16), height: view.getUint32(20) };
}

requiredUnderCI(systemFontsAvailable(), "a system font (Debian fonts-dejavu-core)");

describe.skipIf(!systemFontsAvailable())("chartPng", () => {
  it("writes a PNG whose size is the SVG size times the scale", async () => {
    const svg = await renderSvg(withTheme(spec)); // chartPng themes a raw spec;
    const svgWidth = Number(/<svg[^>]* width="(\d+)"/.exec(svg)?.[1]);
    const svgHeight = Number(/<svg[^>]* height="(\d+)"/.exec(svg)?.[1]);
    const png1 = await chartPng(spec, { scale: 1 });
    const png2 = await chartPng(spec); // default scale 2
    expect([...png1.slice(0, 8)]).toEqual(PNG_SIGNATURE);
    expect(pngSize(png1)).toEqual({ width: svgWidth, height: svgHeight });
    expect(pngSize(png2)).toEqual({ width: 2 * svgWidth, height: 2 * svgHeight });
  });

  it("refuses a bad scale or a missing font file", async () => {
    for (const scale of [0, -1, Number.NaN, Number.POSITIVE_INFINITY, 11]) {
      await expect(chartPng(spec, { scale })).rejects.toThrow(InputError);
    }
    await expect(chartPng(spec, { fontFiles: ["/no/such/font.ttf"] })).rejects.toThrow(/fontFiles/);
  });

  it("savePng writes the file and reports its pixel size", async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-png-"));
    try {
      const file = path.join(dir, "sub", "chart.png");
      const info = await savePng(spec, file, { scale: 1.5 });
      const bytes = new Uint8Array(fs.readFileSync(file));
      expect([...bytes.slice(0, 8)]).toEqual(PNG_SIGNATURE);
      expect(pngSize(bytes)).toEqual({ width: info.widthPx, height: info.heightPx });
      expect(info.path).toBe(file);
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
