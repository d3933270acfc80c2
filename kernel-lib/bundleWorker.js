/**
 * The second step of the kernel-lib build (`npm run build`, after tsc): bundles the sweep worker's
 * entry, dist/parallel/sweepWorker.js, with everything it requires from dist into one file,
 * dist/parallel/sweepWorker.bundle.js (with a source map back to the TypeScript sources). A worker
 * thread then loads one file instead of about 110 modules, which is most of what starting a worker
 * costs (parallel/workerPool.ts). The code is the same JavaScript tsc wrote, so workers compute
 * exactly what the main thread computes. The pool uses the bundle when it is not older than the
 * entry (a later tsc-only build falls back to the module-by-module entry, never to stale code).
 *
 * Run by the build (`node bundleWorker.js`) and by the `isochor` launcher's first-use compile.
 */
"use strict";
/* eslint-disable @typescript-eslint/no-require-imports -- CommonJS, required by the launcher */
const path = require("node:path");

const parallelDir = path.join(__dirname, "dist", "parallel");
const ENTRY = path.join(parallelDir, "sweepWorker.js");
const BUNDLE = path.join(parallelDir, "sweepWorker.bundle.js");

/** Writes the bundle; returns its path. Throws when esbuild is missing or the bundle fails. */
function bundleWorker() {
  const esbuild = require(require.resolve("esbuild", { paths: [__dirname] }));
  esbuild.buildSync({
    entryPoints: [ENTRY],
    // paths in the bundle's comments relative to kernel-lib/, whatever the working folder
    absWorkingDir: __dirname,
    outfile: BUNDLE,
    bundle: true,
    platform: "node",
    target: "node20",
    format: "cjs",
    // only the library's own modules go in; the worker needs no package from node_modules
    packages: "external",
    sourcemap: true,
    logLevel: "warning",
  });
  return BUNDLE;
}

module.exports = { bundleWorker, ENTRY, BUNDLE };

if (require.main === module) {
  const file = bundleWorker();
  const kib = require("node:fs").statSync(file).size / 1024;
  console.log(`${path.relative(process.cwd(), file)}: ${kib.toFixed(0)} KiB`);
}
