// `npm run bench`: bundles kernel-lib/bench/run.ts with esbuild into out/bench/run.js and runs it
// with node, passing any arguments on (e.g. `npm run bench -- pr- --processes 5` to select cases
// and change the number of fresh processes per case; see run.ts).
import { spawnSync } from "node:child_process";
import { createRequire } from "node:module";
import { fileURLToPath } from "node:url";
import * as path from "node:path";

const require = createRequire(import.meta.url);
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const outfile = path.join(root, "out", "bench", "run.js");

require("esbuild").buildSync({
  entryPoints: [path.join(root, "kernel-lib", "bench", "run.ts")],
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
