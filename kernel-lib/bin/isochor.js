#!/usr/bin/env node
/**
 * The `isochor` command as npm links it (`npx isochor ...` right after `npm ci`): runs the compiled
 * command line, dist/cli/main.js. In a fresh clone nothing is compiled yet, so the first use
 * compiles the package once with the workspace's TypeScript (tsc, up to a minute; then bundles the
 * sweep worker, bundleWorker.js), saying so on stderr; later uses start at once. After changing
 * the sources, `npm run build` compiles again.
 */
"use strict";
/* eslint-disable @typescript-eslint/no-require-imports -- a CommonJS launcher, run by node as is */
const fs = require("node:fs");
const path = require("node:path");
const { spawnSync } = require("node:child_process");

const packageDir = path.resolve(__dirname, "..");
const entry = path.join(packageDir, "dist", "cli", "main.js");

/** Compiles the package with tsc; returns a problem in words, or undefined when it worked. */
function build() {
  let tsc;
  try {
    tsc = require.resolve("typescript/bin/tsc", { paths: [packageDir] });
  } catch {
    return "TypeScript is not installed here; run `npm ci` in the isochor repository first.";
  }
  process.stderr.write(
    "isochor: first use: compiling the package (dist/ is missing; this takes up to a minute) ...\n",
  );
  const result = spawnSync(process.execPath, [tsc, "-p", path.join(packageDir, "tsconfig.json")], {
    stdio: ["ignore", "inherit", "inherit"],
  });
  if (result.status !== 0 || !fs.existsSync(entry)) {
    return "the compile failed (messages above); fix them or run `npm run build` to see them again.";
  }
  try {
    // the sweep worker as one file (faster worker start); without it workers load dist module by module
    require(path.join(packageDir, "bundleWorker.js")).bundleWorker();
  } catch (e) {
    process.stderr.write(
      `isochor: the sweep worker bundle was not made (${e.message}); sweeps still run.\n`,
    );
  }
  process.stderr.write(
    "isochor: compiled. The explorers' browser bundle is built by `npm run build`.\n",
  );
  return undefined;
}

if (!fs.existsSync(entry)) {
  const problem = build();
  if (problem !== undefined) {
    process.stderr.write(`isochor: ${problem}\n`);
    process.exit(1);
  }
}
const cli = require(entry);
if (typeof cli.runMain !== "function") {
  process.stderr.write("isochor: dist/ is older than this launcher; run `npm run build`.\n");
  process.exit(1);
}
cli.runMain();
