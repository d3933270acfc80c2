/**
 * The layer order of kernel-lib/src (DEVELOPERS.md, "Layers"): a module may import its own folder,
 * its own layer's peers and any lower layer, never a higher one. Every import and re-export of
 * every source file is read with the TypeScript compiler's pre-processor (type-only imports
 * count: a type from above is a dependency on above too). A new top-level folder or root file
 * must be placed in LAYERS before this test passes.
 */
import * as fs from "node:fs";
import * as path from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";

const SRC = path.resolve(__dirname, "../../../kernel-lib/src");

/**
 * Lowest first. Entries of one row are peers (may import each other); a row may import every row
 * above it. Rows split the numbered layers of the guide where the guide says which way a pair
 * goes (petroleum may use components; departure builds models on eos; process above pvt is not
 * decided, so they are peers).
 */
const LAYERS: readonly (readonly string[])[] = [
  ["errors.ts", "validate.ts", "constants.ts"],
  ["units", "numerics"],
  ["components"],
  ["petroleum"],
  ["idealgas"],
  ["eos"],
  ["departure"],
  ["state", "transport"],
  ["phase"],
  ["fluid"],
  ["process", "pvt"],
  ["charts", "tables", "explorers"],
  ["display", "progress", "records", "cli"],
  ["core.ts"],
  ["index.ts"],
];

/**
 * Deliberate exceptions, each with its reason: source file -> imported file (relative to src), or
 * -> every file of a folder when `to` ends in "/".
 */
const EXCEPTIONS: readonly { from: string; to: string; reason: string }[] = [
  {
    from: "charts/chartSpec.ts",
    to: "display/vegaLiteSpec.ts",
    reason:
      "type only: the public Vega-Lite spec type lives in display/; it belongs in charts/ (charts/ is being reworked on its own branch)",
  },
  {
    from: "pvt/departureBandChart.ts",
    to: "display/vegaLiteSpec.ts",
    reason: "type only, the same Vega-Lite spec type (pvt/ is being split on its own branch)",
  },
  {
    from: "pvt/departureResidualChart.ts",
    to: "display/vegaLiteSpec.ts",
    reason: "type only, the same Vega-Lite spec type (pvt/ is being split on its own branch)",
  },
  ...["explorers/explorerHtml.ts", "explorers/showExplorer.ts", "explorers/widgetsBundle.ts"].map(
    (from) => ({
      from,
      to: "display/",
      reason:
        "the Node-side half of explorers/ (one HTML output with the widgets bundle, shown through the kernel's display) renders through display/; the browser-safe explorer logic does not import it",
    }),
  ),
];

/** Row of a path relative to src ("state/stateAt.ts" -> the row of "state"); -1 when unplaced. */
function layerOf(relative: string): number {
  const top = relative.split("/")[0];
  return LAYERS.findIndex((row) => row.includes(top));
}

/** Why an import from `from` to `to` (both relative to src) breaks the order, or undefined. */
export function violation(from: string, to: string): string | undefined {
  if (from.split("/")[0] === to.split("/")[0]) return undefined; // within one folder
  const a = layerOf(from);
  const b = layerOf(to);
  if (b <= a) return undefined;
  const excepted = (e: (typeof EXCEPTIONS)[number]): boolean =>
    e.from === from && (e.to === to || (e.to.endsWith("/") && to.startsWith(e.to)));
  if (EXCEPTIONS.some(excepted)) return undefined;
  return `${from} (layer of ${from.split("/")[0]}) imports ${to} (higher: ${to.split("/")[0]})`;
}

function sourceFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return sourceFiles(full);
    return e.name.endsWith(".ts") ? [full] : [];
  });
}

/** Relative imports of a file, as paths relative to src with the .ts extension. */
function importsOf(file: string): string[] {
  const info = ts.preProcessFile(fs.readFileSync(file, "utf8"), true, true);
  return info.importedFiles
    .map((f) => f.fileName)
    .filter((name) => name.startsWith("."))
    .map((name) => {
      const target = path.resolve(path.dirname(file), name).replace(/\.js$/, ".ts");
      return path.relative(SRC, target).split(path.sep).join("/");
    });
}

const files = sourceFiles(SRC).map((f) => ({
  full: f,
  relative: path.relative(SRC, f).split(path.sep).join("/"),
}));

describe("layers of kernel-lib/src (lower layers never import higher ones)", () => {
  it("every top-level folder and root file has a place in the order", () => {
    const tops = [...new Set(files.map((f) => f.relative.split("/")[0]))];
    expect(tops.filter((t) => layerOf(t) < 0)).toEqual([]);
  });

  it("no import goes up", () => {
    const found: string[] = [];
    for (const f of files) {
      for (const target of importsOf(f.full)) {
        const v = violation(f.relative, target);
        if (v !== undefined) found.push(v);
      }
    }
    expect(found).toEqual([]);
  });

  it("the rule catches an upward import and allows downward ones and the listed exceptions", () => {
    // state/ importing phase/ (the stability test) or fluid/ is what this test exists to stop
    expect(violation("state/stateAt.ts", "phase/stability.ts")).toMatch(/higher: phase/);
    expect(violation("eos/multiparameter/x.ts", "state/stateAt.ts")).toMatch(/higher: state/);
    expect(violation("components/x.ts", "idealgas/cpCorrelation.ts")).toMatch(/higher/);
    expect(violation("phase/stability.ts", "state/rootChoice.ts")).toBeUndefined();
    expect(violation("records/a.ts", "records/b.ts")).toBeUndefined();
    expect(violation("units/x.ts", "numerics/editDistance.ts")).toBeUndefined();
    expect(violation("tables/tableHtml.ts", "display/escapeHtml.ts")).toMatch(/higher: display/);
    expect(violation("explorers/showExplorer.ts", "display/renderSvg.ts")).toBeUndefined();
  });

  it("the import reader sees imports, type imports and re-exports", () => {
    const stateAt = files.find((f) => f.relative === "state/stateAt.ts")!;
    expect(importsOf(stateAt.full)).toEqual(
      expect.arrayContaining(["state/properties.ts", "eos/types.ts", "errors.ts"]),
    );
    const core = files.find((f) => f.relative === "core.ts")!;
    expect(importsOf(core.full)).toEqual(expect.arrayContaining(["fluid/index.ts"]));
  });
});
