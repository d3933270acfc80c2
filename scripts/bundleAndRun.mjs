// Bundles one TypeScript entry of kernel-lib/bench with esbuild into out/bench/<name>.js and runs
// it with node, passing the command-line arguments on; used by `npm run bench` and
// `npm run campaign`. Exits with the child's status.
import { spawnSync } from "node:child_process";
import { createRequire } from "node:module";
import { fileURLToPath } from "node:url";
import * as path from "node:path";

const require = createRequire(import.meta.url);
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");

/** @param {string} entry path below kernel-lib/bench, e.g. "run.ts" */
export function bundleAndRun(entry) {
  const outfile = path.join(root, "out", "bench", entry.replace(/\.ts$/, ".js"));
  require("esbuild").buildSync({
    entryPoints: [path.join(root, "kernel-lib", "bench", entry)],
    bundle: true,
    platform: "node",
    target: "node20",
    format: "cjs",
    outfile,
    sourcemap: false,
    logLevel: "warning",
  });
  const result = spawnSync(process.execPath, [outfile, ...process.argv.slice(2)], {
    stdio: "inherit",
  });
  process.exit(result.status ?? 1);
}
