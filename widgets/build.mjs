// Bundles the browser side with esbuild: the engine core (kernel-lib/src/core.ts, which must stay free
// of Node-only modules) plus the explorers, as one IIFE that defines `window.isochorWidgets`.
// A Node-only import in the core fails this build, which is how browser-safety is enforced.
import { build } from "esbuild";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

const here = dirname(fileURLToPath(import.meta.url));

export async function buildWidgets({ minify = true } = {}) {
  const result = await build({
    entryPoints: [join(here, "src", "index.ts")],
    outfile: join(here, "dist", "isochor-widgets.js"),
    bundle: true,
    platform: "browser",
    format: "iife",
    globalName: "isochorWidgets",
    target: ["es2022"],
    minify,
    sourcemap: false,
    metafile: true,
    logLevel: "warning",
  });
  return result;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const result = await buildWidgets();
  const bytes = Object.values(result.metafile.outputs)[0].bytes;
  console.log(`widgets/dist/isochor-widgets.js: ${(bytes / 1024).toFixed(0)} KiB`);
}
