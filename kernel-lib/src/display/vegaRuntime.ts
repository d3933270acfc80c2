/**
 * The inline chart runtime: vega, vega-lite and vega-embed minified builds, read from node_modules
 * and wrapped in one <script> element (about 830 KB). It is sent once per notebook session and once
 * per record, never per chart, and nothing is fetched from the internet (a page that missed the
 * session's copy loads the same text from its own notebook server: pageLoader.ts).
 *
 * The builds are UMD bundles. In the classic notebook RequireJS is present (`define.amd`), and a UMD
 * bundle would then register an anonymous AMD module instead of setting `window.vega` (and
 * RequireJS would complain about a mismatched anonymous define). So the bundles are evaluated inside
 * a function whose `define`, `module`, `exports` and `require` parameters are undefined, which sends
 * every bundle down its "browser global" branch. A second copy of the element is a no-op.
 */
import * as fs from "node:fs";
import * as path from "node:path";

/**
 * Attribute that marks a <script> element a page needs only once. Records keep one element per
 * distinct attribute value, in the page head, and drop the copies in cell outputs. The chart
 * runtime's value is "chart-runtime vega@x vega-lite@y vega-embed@z"; other bundles may use it too.
 */
export const RUNTIME_MARKER_ATTRIBUTE = "data-isochor-once";

const BUNDLES = [
  { pkg: "vega", file: "build/vega.min.js" },
  { pkg: "vega-lite", file: "build/vega-lite.min.js" },
  { pkg: "vega-embed", file: "build/vega-embed.min.js" },
] as const;

let cachedScript: string | undefined;

function packageDir(pkg: string): { dir: string; version: string } {
  // vega and vega-lite have `exports` maps without "./package.json" in some releases; resolve the
  // directory from the module search paths instead of require.resolve("<pkg>/package.json").
  for (const base of require.resolve.paths(pkg) ?? []) {
    const dir = path.join(base, pkg);
    const manifest = path.join(dir, "package.json");
    if (fs.existsSync(manifest)) {
      const { version } = JSON.parse(fs.readFileSync(manifest, "utf8")) as { version: string };
      return { dir, version };
    }
  }
  throw new Error(
    `isochor: the chart runtime needs the npm package ${pkg}, which is not installed`,
  );
}

/** The JavaScript of the runtime, without the <script> element. */
export function vegaRuntimeSource(): { source: string; versions: Record<string, string> } {
  const versions: Record<string, string> = {};
  const parts = BUNDLES.map(({ pkg, file }) => {
    const { dir, version } = packageDir(pkg);
    versions[pkg] = version;
    const code = fs.readFileSync(path.join(dir, file), "utf8");
    return `// ${pkg} ${version}\n${code.replace(/\/\/# sourceMappingURL=\S+\s*$/, "")}\n;`;
  });
  const source =
    "(function (define, module, exports, require) {\n" +
    'if (typeof globalThis.vegaEmbed === "function") return;\n' +
    parts.join("\n") +
    "\n}).call(globalThis, undefined, undefined, undefined, undefined);";
  return { source, versions };
}

/**
 * The inline runtime as one HTML `<script>` element, cached after the first call.
 * Defines the globals `vega`, `vegaLite` and `vegaEmbed`, with or without RequireJS on the page.
 */
export function vegaRuntimeScript(): string {
  if (cachedScript === undefined) {
    const { source, versions } = vegaRuntimeSource();
    const label = ["chart-runtime"]
      .concat(Object.entries(versions).map(([k, v]) => `${k}@${v}`))
      .join(" ");
    // "</script" cannot occur inside the element; escape it in case a future build contains it.
    const safe = source.replace(/<\/(script)/gi, "<\\/$1");
    cachedScript = `<script ${RUNTIME_MARKER_ATTRIBUTE}="${label}">\n${safe}\n</script>`;
  }
  return cachedScript;
}
