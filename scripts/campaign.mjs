// `npm run campaign`: bundles kernel-lib/bench/flashCampaign.ts (the robustness campaign of the
// mixture flashes) with esbuild into out/bench/flashCampaign.js and runs it with node, passing any
// arguments on (e.g. `npm run campaign -- --count 1000`; see flashCampaign.ts).
import { spawnSync } from "node:child_process";
import { createRequire } from "node:module";
import { fileURLToPath } from "node:url";
import * as path from "node:path";

const require = createRequire(import.meta.url);
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const outfile = path.join(root, "out", "bench", "flashCampaign.js");

require("esbuild").buildSync({
  entryPoints: [path.join(root, "kernel-lib", "bench", "flashCampaign.ts")],
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
