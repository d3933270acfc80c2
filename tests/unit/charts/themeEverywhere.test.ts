/**
 * Every chart builder gives its spec the project's theme (issue 17, item 3: the P-V-T charts were
 * once in the charting library's stock look). Two guards: each exported `...Chart` builder of
 * charts/index.ts lives in a file that builds its top level through topLevel() (which sets the
 * theme) or writes `config: themeConfig()`; and the builders that need no fluid, run on drawing
 * data, return a spec whose config is the theme itself. The browser check
 * (chartLooksBrowser.test.ts) sees the theme drawn.
 */
import { readFileSync, readdirSync } from "node:fs";
import * as path from "node:path";
import { describe, expect, it } from "vitest";
import * as charts from "../../../kernel-lib/src/charts/index.js";
import { themeConfig } from "../../../kernel-lib/src/charts/theme.js";
import { TC, vdwIsotherm } from "./vdwData.js";
import { syntheticSaturation, SYNTHETIC_CRITICAL, syntheticPhIsotherm } from "./sampleDiagrams.js";

const dir = path.resolve(__dirname, "../../../kernel-lib/src/charts");
const builders = Object.keys(charts).filter((k) => /Chart$/.test(k));

describe("the theme on every chart builder", () => {
  it("every exported builder's file sets the theme", () => {
    expect(builders.length).toBeGreaterThanOrEqual(13);
    const files = readdirSync(dir).filter((f) => f.endsWith(".ts"));
    for (const name of builders) {
      const file = files.find((f) =>
        new RegExp(`export function ${name}\\b`).test(readFileSync(path.join(dir, f), "utf8")),
      );
      expect(file, `${name}: defining file`).toBeDefined();
      const text = readFileSync(path.join(dir, file!), "utf8");
      expect(/topLevel\(|config: themeConfig\(\)/.test(text), `${name} in ${file}`).toBe(true);
    }
  });

  it("builders run on drawing data return the theme as their config", () => {
    const specs = [
      charts.pressureEnthalpyChart({
        saturation: syntheticSaturation(),
        critical: SYNTHETIC_CRITICAL,
        isotherms: [{ temperatureK: 300, points: syntheticPhIsotherm(0.8) }],
      }),
      charts.temperatureEntropyChart({
        saturation: syntheticSaturation(),
        critical: SYNTHETIC_CRITICAL,
      }),
      charts.isothermChart({
        isotherms: [{ temperatureK: 1.2 * TC, points: vdwIsotherm(1.2) }],
      }),
      charts.processPathChart([
        { pressurePa: 1e6, enthalpyJPerMol: 1000 },
        { pressurePa: 3e6, enthalpyJPerMol: 3000 },
      ]),
    ];
    for (const spec of specs) expect(spec.config).toEqual(themeConfig());
    // one notation for axis units: "Name / unit" (ISO 80000-1), never "Name [unit]"
    const titles = specs.flatMap((spec) =>
      [...JSON.stringify(spec).matchAll(/"title":"([^"]*)"/g)].map((m) => m[1]),
    );
    expect(titles.some((t) => / \/ /.test(t))).toBe(true);
    expect(titles.filter((t) => /\[[^\]]*\]/.test(t))).toEqual([]);
  });
});
